import { z } from "zod";
import { addDays, isIsoDate } from "@/lib/time";
import { ITEM_KINDS, ITEM_STATUSES } from "./labels";

// Query and body shapes of the stock API, shared by the route handlers and the table.

const blank = (v: unknown) => (v === "" ? undefined : v);
const isoDate = (field: string) => z.string().refine(isIsoDate, `${field} is a date written YYYY-MM-DD`);

export const SORT_KEYS = ["tagCode", "kind", "grade", "size", "wllLb", "status", "yardName", "nextInspectionDue", "serial"] as const;

export const itemListQuerySchema = z.object({
  page: z.coerce.number().int().min(1, "page starts at 1").default(1),
  perPage: z.coerce.number().int().min(1).max(100, "perPage is at most 100").default(25),
  sort: z.preprocess(blank, z.enum(SORT_KEYS).default("tagCode")),
  order: z.preprocess(blank, z.enum(["asc", "desc"]).default("asc")),
  kind: z.preprocess(blank, z.enum(ITEM_KINDS).optional()),
  /** One status, or several with commas ("retired,lost"). */
  status: z.preprocess(
    (v) => (typeof v === "string" && v !== "" ? v.split(",").map((s) => s.trim()) : blank(v)),
    z.array(z.enum(ITEM_STATUSES, { error: `status is one of ${ITEM_STATUSES.join(", ")} (several with commas)` })).min(1).optional(),
  ),
  /** "no": only items without a WLL (they may not be counted in a tiedown); "yes": only items with one. */
  rated: z.preprocess(blank, z.enum(["no", "yes"], { error: 'rated is "no" (items without a WLL) or "yes" (items with one)' }).optional()),
  yardId: z.preprocess(blank, z.uuid("yardId is not a yard id").optional()),
  /** "current": not overdue (due today or later, or no inspection scheduled). */
  due: z.preprocess(blank, z.enum(["overdue", "current", "7d", "30d"], { error: "due is one of overdue, current, 7d, 30d" }).optional()),
  /** Inspection due on or after this date, and on or before `dueBy` (a week of the dashboard's chart). */
  dueFrom: z.preprocess(blank, isoDate("dueFrom").optional()),
  dueBy: z.preprocess(blank, isoDate("dueBy").optional()),
  q: z.preprocess(blank, z.string().trim().max(60).optional()),
});
export type ItemListQuery = z.output<typeof itemListQuerySchema>;

/** Days ahead that "due soon" looks (the list's "30d" filter and the home page's tile). */
export const DUE_SOON_DAYS = 30;

/** The list's "7d" filter, the daily digest's "due this week": today and the 6 days after. */
export const DUE_THIS_WEEK_DAYS = 6;

/**
 * The list query with its inspection filter as dates, counted from the organisation's today:
 * "overdue" is due before today; "current" is not overdue (due today or later, or never);
 * "7d" and "30d" are due from today to 6 or 30 days on, so that the overdue ones are never
 * counted as merely "due soon". `dueFrom` and `dueBy` pass through as dates.
 * @example listFilters({ due: "overdue", page: 1, perPage: 25, sort: "tagCode", order: "asc" }, "2026-12-01").dueBefore // "2026-12-01"
 * @example listFilters({ due: "30d", page: 1, perPage: 25, sort: "tagCode", order: "asc" }, "2026-12-01") // { …, dueFrom: "2026-12-01", dueBy: "2026-12-31" }
 */
export function listFilters<Q extends { due?: "overdue" | "current" | "7d" | "30d"; rated?: "no" | "yes" }>({ due, rated, ...query }: Q, today: string) {
  return {
    ...query,
    ...(rated === "no" && { unrated: true }),
    ...(rated === "yes" && { rated: true }),
    ...(due === "overdue" && { dueBefore: today }),
    ...(due === "current" && { notDueBefore: today }),
    ...(due === "7d" && { dueFrom: today, dueBy: addDays(today, DUE_THIS_WEEK_DAYS) }),
    ...(due === "30d" && { dueFrom: today, dueBy: addDays(today, DUE_SOON_DAYS) }),
  };
}

const answers = z
  .array(z.object({ id: z.string().min(1), defect: z.boolean({ error: "defect is true or false" }) }), { error: "answers lists every checklist point" })
  .min(1, "Answer the checklist.");
const note = z.string().trim().max(2000, "Keep the note under 2,000 characters.");
const reason = z.string().trim().min(3, "Give the reason in a few words.").max(2000, "Keep the reason under 2,000 characters.");

export const itemEventSchema = z.discriminatedUnion(
  "type",
  [
    z.object({ type: z.literal("check"), answers, note: note.optional() }),
    z.object({ type: z.literal("tag_out"), note: note.min(3, "Say what is wrong.") }),
    z.object({
      type: z.literal("inspection"),
      answers,
      measurements: z.record(z.string(), z.number({ error: "Measurements are numbers." }).min(0, "Measurements cannot be negative.")).default({}),
      verdict: z.enum(["in_service", "repair", "retire"], { error: "The verdict is in_service, repair or retire." }),
      note: note.optional(),
    }),
    z.object({ type: z.literal("return_to_service"), reason }),
    z.object({ type: z.literal("retired"), reason }),
    z.object({ type: z.literal("lost"), reason }),
    z.object({ type: z.literal("found"), reason }),
    z.object({ type: z.literal("correction"), eventId: z.number().int().positive(), note: note.min(3, "Say what was wrong.") }),
  ],
  { error: "type is one of check, tag_out, inspection, return_to_service, retired, lost, found, correction." },
);
export type ItemEventBody = z.output<typeof itemEventSchema>;
