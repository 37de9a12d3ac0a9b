import type { ItemStatus } from "./labels";
import { itemUsability } from "./usability";

// The stock at a glance for one day (the home page): how many items may be used, and why the
// others may not. Counted from buckets of items that share everything the verdict reads
// (status, rated or not, inspection overdue / due soon / later), so that the verdict itself
// (./usability.ts) answers for each bucket and nothing re-derives "overdue" here.

/** Items that share a verdict: as db/items.ts `stockBuckets` counts them. */
export interface GlanceBucket {
  status: ItemStatus;
  rated: boolean;
  due: "overdue" | "soon" | "later" | "none";
  /** The earliest inspection date in the bucket (YYYY-MM-DD), or null. */
  firstDue: string | null;
  count: number;
}

export interface StockGlance {
  /** In use today: the verdict says yes. */
  mayBeUsed: number;
  /** In service or tagged out, and the verdict says no: what must stay off the trailers today. */
  doNotUse: number;
  /** In service, but past its periodic inspection. */
  overdue: number;
  /** Tagged out, waiting for the owner or a designated person to inspect, return or retire it. */
  taggedOut: number;
  /** In service, not overdue, but without a WLL. */
  notRated: number;
  /** May be used today, and its inspection falls due within the next days (not overdue). */
  dueSoon: number;
  retiredOrLost: number;
}

/**
 * @example stockGlance([{ status: "in_service", rated: true, due: "overdue", firstDue: "2026-11-01", count: 3 }], "2026-12-01")
 * // { mayBeUsed: 0, doNotUse: 3, overdue: 3, taggedOut: 0, notRated: 0, dueSoon: 0, retiredOrLost: 0 }
 */
export function stockGlance(buckets: readonly GlanceBucket[], today: string): StockGlance {
  const out: StockGlance = { mayBeUsed: 0, doNotUse: 0, overdue: 0, taggedOut: 0, notRated: 0, dueSoon: 0, retiredOrLost: 0 };
  for (const b of buckets) {
    if (b.status === "retired" || b.status === "lost") {
      out.retiredOrLost += b.count;
      continue;
    }
    const verdict = itemUsability({ status: b.status, nextInspectionDue: b.firstDue, wllLb: b.rated ? 1 : null }, today);
    const codes = new Set(verdict.reasons.map((r) => r.code));
    if (verdict.ok) {
      out.mayBeUsed += b.count;
      if (b.due === "soon") out.dueSoon += b.count;
      continue;
    }
    out.doNotUse += b.count;
    if (codes.has("TAGGED_OUT")) out.taggedOut += b.count;
    else if (codes.has("INSPECTION_OVERDUE")) out.overdue += b.count;
    else if (codes.has("NOT_RATED")) out.notRated += b.count;
  }
  return out;
}
