import { ITEM_KINDS, ITEM_STATUSES, KIND_LABELS, type ItemKind, type ItemStatus } from "@/lib/stock/labels";
import { addDays, addMonths, monthOf, monthWords, shortDate, weekStart } from "@/lib/time";

// The dashboard's charts as figures: each bar or slice with its words and the address of the
// rows behind it. Pure: db/dashboard.ts counts, these functions shape the counts on the
// organisation's calendar (weeks Monday to Sunday, months by the calendar), and the page
// draws them and lists them as tables.

/** Weeks of inspections the dashboard looks ahead. */
export const DUE_WEEKS = 12;
/** Months of tag-outs the dashboard looks back, this month included. */
export const TAG_OUT_MONTHS = 6;

/** The stock list's address for these filters (only the ones given). */
function stockHref(filters: Record<string, string | undefined>): string {
  const q = new URLSearchParams();
  for (const [k, v] of Object.entries(filters)) if (v) q.set(k, v);
  return `/stock?${q.toString()}`;
}

/**
 * The days the "due by week" chart covers: from today to the Sunday that ends the last week.
 * @example duePeriod("2026-12-03") // { from: "2026-12-03", to: "2027-02-21" }
 */
export function duePeriod(today: string, weeks = DUE_WEEKS): { from: string; to: string } {
  return { from: today, to: addDays(weekStart(today), weeks * 7 - 1) };
}

/** One week of the "due by week" chart. */
export interface DueWeek {
  /** First day counted (today for the first week, else the Monday). */
  from: string;
  /** The Sunday that ends the week. */
  to: string;
  /** "This week", "Next week", else "Week of 14 Dec". */
  label: string;
  /** Its dates in words: "3 Dec to 6 Dec". */
  dates: string;
  count: number;
  /** The stock list of exactly these items. */
  href: string;
}

/**
 * In-service items due for their periodic inspection, week by week from today. The first week
 * starts today (the days before are overdue, a figure of their own).
 * @example dueByWeek([{ day: "2026-12-04", count: 2 }, { day: "2026-12-08", count: 1 }], "2026-12-03", 2)
 * // [{ from: "2026-12-03", to: "2026-12-06", label: "This week", count: 2, … }, { from: "2026-12-07", to: "2026-12-13", label: "Next week", count: 1, … }]
 */
export function dueByWeek(days: readonly { day: string; count: number }[], today: string, weeks = DUE_WEEKS): DueWeek[] {
  const monday = weekStart(today);
  return Array.from({ length: weeks }, (_, i) => {
    const from = i === 0 ? today : addDays(monday, i * 7);
    const to = addDays(monday, i * 7 + 6);
    const count = days.filter((d) => d.day >= from && d.day <= to).reduce((sum, d) => sum + d.count, 0);
    const label = i === 0 ? "This week" : i === 1 ? "Next week" : `Week of ${shortDate(from)}`;
    return { from, to, label, dates: from === to ? shortDate(from) : `${shortDate(from)} to ${shortDate(to)}`, count, href: stockHref({ status: "in_service", dueFrom: from, dueBy: to }) };
  });
}

/** The words of each status on the dashboard (the stock list's filter words). */
export const STATUS_WORDS: Record<ItemStatus, string> = { in_service: "In service", tagged_out: "Tagged out", retired: "Retired", lost: "Lost" };

/** The stock by status, and by kind and status, each figure with its list's address. */
export interface GearCounts {
  total: number;
  byStatus: { status: ItemStatus; label: string; count: number; href: string }[];
  byKind: { kind: ItemKind; label: string; total: number; href: string; cells: { status: ItemStatus; count: number; href: string }[] }[];
}

/**
 * The stock counted by status (every status, zeros included) and by kind (only kinds the
 * organisation holds), each count linking to the stock list that shows exactly its items.
 * @example gearCounts([{ kind: "chain", status: "in_service", count: 3 }]).byStatus[0]
 * // { status: "in_service", label: "In service", count: 3, href: "/stock?status=in_service" }
 */
export function gearCounts(rows: readonly { kind: ItemKind; status: ItemStatus; count: number }[]): GearCounts {
  const count = (kind: ItemKind | null, status: ItemStatus | null) =>
    rows.filter((r) => (kind === null || r.kind === kind) && (status === null || r.status === status)).reduce((sum, r) => sum + r.count, 0);
  return {
    total: count(null, null),
    byStatus: ITEM_STATUSES.map((status) => ({ status, label: STATUS_WORDS[status], count: count(null, status), href: stockHref({ status }) })),
    byKind: ITEM_KINDS.filter((kind) => count(kind, null) > 0).map((kind) => ({
      kind,
      label: KIND_LABELS[kind],
      total: count(kind, null),
      href: stockHref({ kind }),
      cells: ITEM_STATUSES.map((status) => ({ status, count: count(kind, status), href: stockHref({ kind, status }) })),
    })),
  };
}

export type TagOutReason = "check_failed" | "damage_reported" | "inspection_repair" | "found";

/** Each way an item gets tagged out, in words. */
export const TAG_OUT_REASONS: { reason: TagOutReason; label: string }[] = [
  { reason: "check_failed", label: "Failed pre-use check" },
  { reason: "damage_reported", label: "Damage reported" },
  { reason: "inspection_repair", label: "Inspection: held for repair" },
  { reason: "found", label: "Found after being lost" },
];

/**
 * The days the tag-out chart covers: from the first of the month `months - 1` before this
 * one, to today (both included).
 * @example tagOutPeriod("2026-12-03") // { from: "2026-07-01", to: "2026-12-03" }
 */
export function tagOutPeriod(today: string, months = TAG_OUT_MONTHS): { from: string; to: string } {
  return { from: `${addMonths(monthOf(today), -(months - 1))}-01`, to: today };
}

/** One month of the tag-out chart. */
export interface TagOutMonth {
  month: string;
  label: string;
  counts: Record<TagOutReason, number>;
  total: number;
  /** The records of the month (to today for this month). */
  href: string;
}

/**
 * Tag-outs by reason, month by month, the oldest first; a month with none is there with zeros.
 * @example tagOutsByMonth([{ day: "2026-12-01", reason: "damage_reported", count: 2 }], "2026-12-03", 2).map((m) => m.total) // [0, 2]
 */
export function tagOutsByMonth(days: readonly { day: string; reason: TagOutReason; count: number }[], today: string, months = TAG_OUT_MONTHS): TagOutMonth[] {
  const first = monthOf(tagOutPeriod(today, months).from);
  return Array.from({ length: months }, (_, i) => {
    const month = addMonths(first, i);
    const counts = Object.fromEntries(TAG_OUT_REASONS.map(({ reason }) => [reason, 0])) as Record<TagOutReason, number>;
    for (const d of days) if (monthOf(d.day) === month) counts[d.reason] += d.count;
    const last = addDays(`${addMonths(month, 1)}-01`, -1);
    const to = last < today ? last : today;
    return { month, label: monthWords(month), counts, total: Object.values(counts).reduce((a, b) => a + b, 0), href: `/records?from=${month}-01&to=${to}` };
  });
}
