import type { ItemRecord } from "@/db/items";
import { formatDay } from "@/lib/time";
import type { ItemStatus } from "./labels";
import { itemUsability, type Usability } from "./usability";

// The usability verdict of a stored item on the organisation's clock: what the API, the item
// page, the stock list and the tag's public view show. The rules are in ./usability.ts.

/** The organisation's time zone and its today (YYYY-MM-DD), as organisationClock() answers them. */
export interface Clock {
  timeZone: string;
  today: string;
}

type VerdictFields = Pick<ItemRecord, "status" | "nextInspectionDue" | "wllLb" | "lastCheckedAt" | "lastCheckPassed">;

/**
 * May this stored item be used today, on the organisation's clock? The last pre-use check's
 * time is read as a day in the organisation's time zone.
 * @example itemVerdict(item, { timeZone: "America/Chicago", today: "2026-12-01" }) // { ok: true, reasons: [], check: { done: false, … } }
 */
export function itemVerdict(item: VerdictFields, clock: Clock): Usability {
  return itemUsability(
    {
      status: item.status as ItemStatus,
      nextInspectionDue: item.nextInspectionDue,
      wllLb: item.wllLb,
      lastCheck: item.lastCheckedAt ? { on: formatDay(item.lastCheckedAt, clock.timeZone), passed: item.lastCheckPassed !== false } : null,
    },
    clock.today,
  );
}
