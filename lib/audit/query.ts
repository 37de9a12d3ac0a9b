import { z } from "zod";
import { addDays, formatDateTime, isIsoDate, startOfDayIn } from "@/lib/time";
import { actionsOfKind, AUDIT_KINDS, auditKindWords, auditSubject, auditWords, type AuditKind } from "./actions";

// The audit log's filters (person, kind of change, period on the organisation's calendar,
// paging) as the page's address and the export's query read them, and a row in words. Pure.

const blank = (v: unknown) => (v === "" ? undefined : v);
const day = (field: string) => z.preprocess(blank, z.string().refine(isIsoDate, `${field} is a date written YYYY-MM-DD`).optional());

export const auditQuerySchema = z
  .object({
    person: z.preprocess(blank, z.string().trim().min(1).max(100, "person is a person's id").optional()),
    kind: z.preprocess(blank, z.enum(Object.keys(AUDIT_KINDS) as [AuditKind, ...AuditKind[]], { error: `kind is one of ${Object.keys(AUDIT_KINDS).join(", ")}` }).optional()),
    from: day("from"),
    to: day("to"),
    before: z.preprocess(blank, z.coerce.number().int("before is an entry number").positive("before is an entry number").optional()),
    format: z.preprocess(blank, z.enum(["json", "csv"], { error: "format is json or csv" }).default("json")),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { path: ["from"], message: "from comes after to: give the earlier date first." });
export type AuditQuery = z.output<typeof auditQuerySchema>;

/**
 * The query as the database's filters: days become the instants they start and end at in
 * the organisation's zone (`to` included to its last minute).
 * @example auditFilters({ kind: "imports", from: "2026-12-01", format: "json" }, "America/Chicago")
 * // { actorId: undefined, actions: ["items.imported", …], since: 2026-12-01T06:00:00Z, until: undefined, beforeId: undefined }
 */
export function auditFilters(q: Omit<AuditQuery, "format">, timeZone: string) {
  return {
    actorId: q.person,
    actions: q.kind ? actionsOfKind(q.kind) : undefined,
    since: q.from ? startOfDayIn(q.from, timeZone) : undefined,
    until: q.to ? startOfDayIn(addDays(q.to, 1), timeZone) : undefined,
    beforeId: q.before,
  };
}

/** What the log and its CSV read of a row (db/audit.ts AuditRow fits). */
export interface AuditLine {
  id: number;
  at: Date | string;
  action: string;
  entity: string;
  label: string | null;
  actorName: string | null;
  after: unknown;
}

/** The export's columns. */
export const AUDIT_HEADERS = ["When", "Time zone", "Who", "Kind of change", "What", "Concerning", "Entry number"] as const;

/**
 * A row in words, in the order of {@link AUDIT_HEADERS}; a change without a person came from
 * Linkyard itself or an e-mailed link.
 * @example auditLine({ id: 7, at: "2026-12-01T15:00:00Z", action: "item.retired", entity: "item", label: "3X4K-9P2M", actorName: "Olive", after: { reason: "Bent" } }, "America/Chicago")
 * // ["2026-12-01 09:00", "America/Chicago", "Olive", "Stock and item details", "Item retired", "Item 3X4K-9P2M: “Bent”", 7]
 */
export function auditLine(r: AuditLine, timeZone: string): [string, string, string, string, string, string, number] {
  return [formatDateTime(r.at, timeZone), timeZone, r.actorName ?? "Linkyard or an e-mailed link", auditKindWords(r.action), auditWords(r.action), auditSubject(r), r.id];
}
