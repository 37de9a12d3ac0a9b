import { listAudit, streamAudit } from "@/db/audit";
import { AUDIT_HEADERS, auditFilters, auditLine, auditQuerySchema } from "@/lib/audit/query";
import { csvDownload } from "@/lib/http/download";
import { route } from "@/lib/http/route";
import { csvLine } from "@/lib/import/csv-write";
import { principalClock } from "@/lib/organisations/service";

/** Rows of the log a JSON page holds; `before` (the last row's number) asks for the next. */
const PAGE = 100;

/**
 * The audit log for owners: who changed what and when, `?person=&kind=&from=&to=` (days on
 * the organisation's clock), newest first. JSON pages of 100 (`before` for the next);
 * `format=csv` streams every row the filters select.
 */
export const GET = route("audit.view", { query: auditQuerySchema }, async ({ principal, query }) => {
  const { format, ...asked } = query;
  const { timeZone, today } = principalClock(principal);
  const filters = auditFilters(asked, timeZone);
  if (format === "json") {
    const rows = await listAudit(principal.organisationId, filters, PAGE);
    return {
      timeZone,
      data: rows.map((r) => {
        const [when, , who, kind, what, concerning] = auditLine(r, timeZone);
        return { id: r.id, at: r.at, when, who, kind, what, concerning, action: r.action, entity: r.entity, entityId: r.entityId };
      }),
      next: rows.length === PAGE ? rows[rows.length - 1].id : null,
    };
  }
  async function* lines() {
    for await (const rows of streamAudit(principal.organisationId, filters)) yield rows.map((r) => csvLine(auditLine(r, timeZone))).join("");
  }
  return csvDownload(`linkyard-audit-log-${today}.csv`, csvLine([...AUDIT_HEADERS]), lines(), "audit");
});
