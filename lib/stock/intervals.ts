import { addDays } from "@/lib/time";
import { ITEM_KINDS, type ItemKind } from "./labels";

/**
 * Default days between periodic inspections. No federal rule sets an interval for cargo
 * tiedowns; these follow ASME B30.26 for rigging hardware ("not to exceed 1 year" in normal
 * service; verified, secondary copy) and common practice for webbing, which ages in sunlight.
 * An owner changes them in Settings.
 */
export const DEFAULT_INTERVAL_DAYS: Record<ItemKind, number> = {
  chain: 365,
  binder: 365,
  "web-strap": 180, // common practice: UV and abrasion age webbing faster
  "wire-rope": 365,
  hook: 365, // ASME B30.26: periodic inspection at most yearly in normal service
  shackle: 365, // ASME B30.26
  "rated-item": 365,
};

/** The organisation's intervals, with the defaults for kinds it has not set. */
export function intervalsWithDefaults(saved: Partial<Record<string, unknown>> | null | undefined): Record<ItemKind, number> {
  const out = { ...DEFAULT_INTERVAL_DAYS };
  for (const kind of ITEM_KINDS) {
    const v = saved?.[kind];
    if (typeof v === "number" && Number.isInteger(v) && v >= 1 && v <= 3650) out[kind] = v;
  }
  return out;
}

/**
 * The next due date after an inspection on `from` (YYYY-MM-DD): calendar days later.
 * @example nextDue("2026-01-31", 30) // "2026-03-02"
 */
export function nextDue(from: string, days: number): string {
  return addDays(from, days);
}
