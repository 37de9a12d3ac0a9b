import { z } from "zod";
import { ITEM_KINDS, ITEM_STATUSES } from "@/lib/stock/labels";
import { addDays, daysBetween, isIsoDate } from "@/lib/time";

// What a records request asks: a period of calendar days on the organisation's clock, and the
// items (the stock list's filters, or one item). Shared by the route, the records page and the
// printed report, so that all three read the same address the same way.

const blank = (v: unknown) => (v === "" ? undefined : v);
const day = (field: string) => z.preprocess(blank, z.string().refine(isIsoDate, `${field} is a date written YYYY-MM-DD`).optional());

/** The most entries a report on screen or on paper holds; the CSV streams any number. */
export const MAX_REPORT_EVENTS = 5000;

/** The period a report covers when none is asked: the year to today. */
export const DEFAULT_PERIOD_DAYS = 365;

export const recordQuerySchema = z.object({
  from: day("from"),
  to: day("to"),
  kind: z.preprocess(blank, z.enum(ITEM_KINDS, { error: `kind is one of ${ITEM_KINDS.join(", ")}` }).optional()),
  /** The items' status now: one, or several with commas. */
  status: z.preprocess(
    (v) => (typeof v === "string" && v !== "" ? v.split(",").map((s) => s.trim()) : blank(v)),
    z.array(z.enum(ITEM_STATUSES, { error: `status is one of ${ITEM_STATUSES.join(", ")} (several with commas)` })).min(1).optional(),
  ),
  q: z.preprocess(blank, z.string().trim().max(60, "q is at most 60 characters").optional()),
  itemId: z.preprocess(blank, z.uuid("itemId is not an item id").optional()),
  format: z.preprocess(blank, z.enum(["json", "csv"], { error: "format is json or csv" }).default("json")),
});
export type RecordQuery = z.output<typeof recordQuerySchema>;

/** A period of calendar days, both ends included; `from` null is an item's whole history. */
export interface Period {
  from: string | null;
  to: string;
}

/**
 * The period asked, with its defaults: to today, from a year before (for one item, from its
 * first entry). A period that ends before it starts, or starts after today, is refused,
 * naming the field.
 * @example recordPeriod({ to: "2026-12-01" }, "2026-12-03") // { period: { from: "2025-12-02", to: "2026-12-01" } }
 * @example recordPeriod({ from: "2026-12-05", to: "2026-12-01" }, "2026-12-03") // { issue: { path: "from", message: "from comes after to: …" } }
 */
export function recordPeriod(q: { from?: string; to?: string; itemId?: string }, today: string): { period: Period } | { issue: { path: string; message: string } } {
  const to = q.to ?? today;
  const from = q.from ?? (q.itemId ? null : addDays(to, -(DEFAULT_PERIOD_DAYS - 1)));
  if (from !== null && from > to) return { issue: { path: "from", message: `from comes after to: the period runs from ${from} to ${to}; give the earlier date first.` } };
  if (from !== null && from > today) return { issue: { path: "from", message: `from is after today (${today}): there is no record yet.` } };
  return { period: { from, to } };
}

/**
 * The period in words for the report's heading.
 * @example periodWords({ from: "2026-01-01", to: "2026-12-31" }) // "2026-01-01 to 2026-12-31 (365 days)"
 */
export function periodWords(p: Period, written: (day: string) => string = (d) => d): string {
  if (p.from === null) return `The whole history to ${written(p.to)}`;
  const days = daysBetween(p.from, p.to) + 1;
  return `${written(p.from)} to ${written(p.to)} (${days.toLocaleString("en-US")} ${days === 1 ? "day" : "days"})`;
}

/**
 * The address of the same selection elsewhere (the print page, the CSV), without empty values.
 * @example recordSearch({ from: "2026-01-01", to: "2026-12-31", status: ["in_service"], format: "json" }, { format: "csv" }) // "from=2026-01-01&to=2026-12-31&status=in_service&format=csv"
 */
export function recordSearch(q: Partial<RecordQuery>, extra: Record<string, string> = {}): string {
  const out = new URLSearchParams();
  for (const key of ["from", "to", "kind", "status", "q", "itemId"] as const) {
    const v = q[key];
    if (Array.isArray(v) ? v.length : v) out.set(key, Array.isArray(v) ? v.join(",") : String(v));
  }
  for (const [k, v] of Object.entries(extra)) out.set(k, v);
  return out.toString();
}

const KIND_PLURALS: Record<string, string> = {
  chain: "Chains", binder: "Chain binders", "web-strap": "Web straps", "wire-rope": "Wire ropes", hook: "Hooks", shackle: "Shackles", "rated-item": "Other rated items",
};
const STATUS_PLAIN: Record<string, string> = { in_service: "in service", tagged_out: "tagged out", retired: "retired", lost: "lost" };

/**
 * Which items a report covers, in words for its heading.
 * @example selectionWords({ kind: "chain", status: ["in_service", "tagged_out"] }) // "Chains, now in service or tagged out"
 * @example selectionWords({}, "3X4K-9P2M") // "Item 3X4K-9P2M"
 */
export function selectionWords(q: { kind?: string; status?: string[]; q?: string }, itemTag?: string | null): string {
  if (itemTag) return `Item ${itemTag}`;
  const parts = [q.kind ? KIND_PLURALS[q.kind] ?? q.kind : "All stock"];
  if (q.status?.length) parts.push(`now ${q.status.map((s) => STATUS_PLAIN[s] ?? s).join(" or ")}`);
  if (q.q) parts.push(`tag code or serial starting “${q.q}”`);
  return parts.join(", ");
}
