import type { ItemStatus } from "./labels";

// The one answer to "may I use this?" for a piece of gear on a given day. Every screen, the
// API and the kit builder ask this function; none of them re-derive "overdue" on their own.

export type UsabilityCode = "TAGGED_OUT" | "RETIRED" | "LOST" | "INSPECTION_OVERDUE" | "NOT_RATED";

export interface UsabilityReason {
  code: UsabilityCode;
  message: string;
}

/**
 * Where the day's pre-use check stands, for gear that may be used: `done` when a check
 * passed on the day asked. It is the next step, not a reason against use: the check is what
 * the person holding the item does now.
 */
export interface PreUseCheckStep {
  done: boolean;
  message: string;
}

/** `ok` is true exactly when `reasons` is empty. */
export interface Usability {
  ok: boolean;
  reasons: UsabilityReason[];
  /** Only when the caller gave the last check and the item may be used. */
  check?: PreUseCheckStep;
}

/** What the verdict reads from an item (or an anchor point), as stored. */
export interface UsabilityInput {
  status: ItemStatus;
  /** YYYY-MM-DD, or null when no periodic inspection is scheduled. */
  nextInspectionDue: string | null;
  /** The effective WLL; null when the item cannot be rated. */
  wllLb: number | null;
  /**
   * The last pre-use check: the day it was made (YYYY-MM-DD in the organisation's time zone)
   * and whether it passed; null when none is recorded. Left out where checks do not apply
   * (an anchor point, a kit for another day).
   */
  lastCheck?: { on: string; passed: boolean } | null;
}

/**
 * Whether a periodic inspection date is past on a day: due *on* its date, overdue from the day
 * after. The one place this comparison is made; screens ask {@link itemUsability}.
 * @example inspectionOverdue("2026-11-30", "2026-12-01") // true
 * @example inspectionOverdue("2026-12-01", "2026-12-01") // false
 */
export function inspectionOverdue(nextInspectionDue: string | null, on: string): boolean {
  return nextInspectionDue !== null && nextInspectionDue < on;
}

/** What each status asks of the person holding the item. */
const STATUS_REASONS: Partial<Record<ItemStatus, UsabilityReason>> = {
  tagged_out: {
    code: "TAGGED_OUT",
    message: "Tagged out: it may not be used until the owner or a designated person inspects it and returns it to service.",
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
 * The last pre-use check adds no reason of its own: a failed check tags the item out in the
 * same change (so TAGGED_OUT already says it), and only the owner or a designated person
 * puts it back in service afterwards, which answers that check. What the check adds, for
 * gear that may be used, is the day's step (`check`): a check that passed that day, or the
 * reminder to do one before use (ASME B30.9 / B30.10 / B30.26 "frequent" inspection before
 * use; common practice for tiedowns).
 *
 * @example
 * itemUsability({ status: "in_service", nextInspectionDue: "2026-11-30", wllLb: 5400 }, "2026-12-01")
 * // { ok: false, reasons: [{ code: "INSPECTION_OVERDUE", message: "Periodic inspection overdue since 2026-11-30: have it inspected before use." }] }
 * @example
 * itemUsability({ status: "in_service", nextInspectionDue: null, wllLb: 5400, lastCheck: { on: "2026-12-01", passed: true } }, "2026-12-01").check
 * // { done: true, message: "Pre-use check passed today: no defects found." }
 */
export function itemUsability(item: UsabilityInput, on: string): Usability {
  const reasons: UsabilityReason[] = [];
  const byStatus = STATUS_REASONS[item.status];
  if (byStatus) reasons.push(byStatus);
  if (item.status !== "retired" && inspectionOverdue(item.nextInspectionDue, on)) {
    reasons.push({
      code: "INSPECTION_OVERDUE",
      message: `Periodic inspection overdue since ${item.nextInspectionDue}: have it inspected before use.`,
    });
  }
  if (item.wllLb === null || !(item.wllLb > 0)) {
    reasons.push({ code: "NOT_RATED", message: "No working load limit: it cannot be counted in a tiedown." });
  }
  const ok = reasons.length === 0;
  if (!ok || item.lastCheck === undefined) return { ok, reasons };
  return { ok, reasons, check: checkStep(item.lastCheck, on) };
}

function checkStep(last: { on: string; passed: boolean } | null, on: string): PreUseCheckStep {
  if (last && last.on === on && last.passed) return { done: true, message: "Pre-use check passed today: no defects found." };
  if (!last) return { done: false, message: "No pre-use check on record: do one before you use it." };
  if (!last.passed) return { done: false, message: "Its last pre-use check found defects and it was returned to service since: check it before you use it." };
  return { done: false, message: `Last pre-use check on ${last.on}: check it again before you use it.` };
}

/** Each reason in a word or two, for a badge in a list (the full message is on the item's page). */
export const REASON_SHORT: Record<UsabilityCode, string> = {
  TAGGED_OUT: "tagged out",
  RETIRED: "retired",
  LOST: "lost",
  INSPECTION_OVERDUE: "inspection overdue",
  NOT_RATED: "no WLL",
};

/** The words a screen puts on a verdict: the one-line answer and what to do about it. */
export const VERDICT_WORDS = {
  ok: "Usable",
  notOk: "Do not use",
  /** What the person holding gear that may not be used does now. */
  setAside: "Set it aside, hang a red tag on it and tell the owner or a designated person.",
} as const;
