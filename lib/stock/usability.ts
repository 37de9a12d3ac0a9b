import type { ItemStatus } from "./labels";

// The one answer to "may I use this?" for a piece of gear on a given day. Every screen, the
// API and the kit builder ask this function; none of them re-derive "overdue" on their own.

export type UsabilityCode = "TAGGED_OUT" | "RETIRED" | "LOST" | "INSPECTION_OVERDUE" | "NOT_RATED";

export interface UsabilityReason {
  code: UsabilityCode;
  message: string;
}

/** `ok` is true exactly when `reasons` is empty. */
export interface Usability {
  ok: boolean;
  reasons: UsabilityReason[];
}

/** What the verdict reads from an item (or an anchor point), as stored. */
export interface UsabilityInput {
  status: ItemStatus;
  /** YYYY-MM-DD, or null when no periodic inspection is scheduled. */
  nextInspectionDue: string | null;
  /** The effective WLL; null when the item cannot be rated. */
  wllLb: number | null;
}

const STATUS_REASONS: Partial<Record<ItemStatus, UsabilityReason>> = {
  tagged_out: {
    code: "TAGGED_OUT",
    message: "Tagged out: it may not be used until an owner or designated person inspects it or returns it to service.",
  },
  retired: { code: "RETIRED", message: "Retired: it may not be used again." },
  lost: { code: "LOST", message: "Marked lost: it may not be used until it is found and inspected." },
};

/**
 * Whether an item may be used on a day (`on`, YYYY-MM-DD in the organisation's time zone):
 * in service (49 CFR 393.104(b): no damaged or weakened components, so a tagged-out item is
 * out), its periodic inspection not past due (ASME B30.9 / B30.10 / B30.26 periodic
 * inspection; the interval is the organisation's setting), and rated (a part without a WLL
 * cannot be counted in a tiedown, 49 CFR 393.108). The inspection is due *on* its date and
 * overdue from the day after. Every reason that applies is listed, not only the first.
 *
 * @example
 * itemUsability({ status: "in_service", nextInspectionDue: "2026-11-30", wllLb: 5400 }, "2026-12-01")
 * // { ok: false, reasons: [{ code: "INSPECTION_OVERDUE", message: "Periodic inspection overdue since 2026-11-30: have it inspected before use." }] }
 */
export function itemUsability(item: UsabilityInput, on: string): Usability {
  const reasons: UsabilityReason[] = [];
  const byStatus = STATUS_REASONS[item.status];
  if (byStatus) reasons.push(byStatus);
  if (item.status !== "retired" && item.nextInspectionDue !== null && item.nextInspectionDue < on) {
    reasons.push({
      code: "INSPECTION_OVERDUE",
      message: `Periodic inspection overdue since ${item.nextInspectionDue}: have it inspected before use.`,
    });
  }
  if (item.wllLb === null || !(item.wllLb > 0)) {
    reasons.push({ code: "NOT_RATED", message: "No working load limit: it cannot be counted in a tiedown." });
  }
  return { ok: reasons.length === 0, reasons };
}
