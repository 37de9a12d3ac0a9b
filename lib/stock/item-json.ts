import type { ItemRecord } from "@/db/items";
import { toKg } from "@/lib/securement/units";
import { describeItem } from "./describe";
import { STATUS_LABELS, type ItemStatus } from "./labels";
import { itemVerdict, type Clock } from "./verdict";

// An item as the API answers it (and the scan and stock screens read it), made from the
// stored record: the description and status in words, the WLL in lb and kg, the page's URL,
// and the usability verdict on the organisation's today (`usable`), which every screen shows
// instead of working out "overdue" for itself.

/** The item as every API and scan screen answers it, judged on the organisation's clock. */
export function toItemJson(row: ItemRecord, clock: Clock) {
  return {
    id: row.id,
    tagCode: row.tagCode,
    kind: row.kind,
    description: describeItem(row),
    grade: row.grade,
    size: row.size,
    lengthMm: row.lengthMm,
    status: row.status,
    statusLabel: STATUS_LABELS[row.status as ItemStatus]?.label ?? row.status,
    wllLb: row.wllLb,
    wllKg: row.wllLb == null ? null : Math.round(toKg({ value: row.wllLb, unit: "lb" }).value),
    wllSource: row.wllSource,
    markedWllLb: row.markedWllLb,
    serial: row.serial,
    yard: row.yardId ? { id: row.yardId, name: row.yardName } : null,
    nextInspectionDue: row.nextInspectionDue,
    lastCheckedAt: row.lastCheckedAt ? new Date(row.lastCheckedAt).toISOString() : null,
    lastInspectedOn: row.lastInspectedOn,
    usable: itemVerdict(row, clock),
    url: `/items/${row.id}`,
  };
}

export type ItemJson = ReturnType<typeof toItemJson>;
