import { csvDownload } from "@/lib/http/download";
import { route } from "@/lib/http/route";
import { csvLine } from "@/lib/import/csv-write";
import { recordQuerySchema } from "@/lib/records/query";
import { entryInWords, RECORD_HEADERS, recordRow } from "@/lib/records/rows";
import { recordBatches, recordReport, recordSelection } from "@/lib/records/service";

/**
 * The inspection and service record, `?from=&to=` (YYYY-MM-DD on the organisation's clock,
 * both included; default the year to today) for the stock list's filters (`kind`, `status`,
 * `q`) or one item (`itemId`). `format=csv` streams every entry as a spreadsheet that runs
 * nothing; JSON answers at most 5,000 entries, and more is a 400 naming `from`.
 * Owners and designated persons ("records.view"): the people who inspect and answer for it.
 */
export const GET = route("records.view", { query: recordQuerySchema }, async ({ principal, query }) => {
  const { format, ...asked } = query;
  if (format === "json") {
    const r = await recordReport(principal, asked);
    return {
      organisation: r.organisationName,
      period: r.period,
      timeZone: r.timeZone,
      total: r.total,
      people: r.people,
      events: r.events.map((e) => ({
        id: e.id,
        at: e.at,
        item: { id: e.itemId, tagCode: e.tagCode, kind: e.kind, grade: e.grade, size: e.size, serial: e.serial, wllLb: e.wllLb, status: e.status },
        type: e.type,
        correctsEventId: e.correctsEventId,
        files: e.files,
        ...entryInWords(e, r.timeZone),
      })),
    };
  }
  const selection = await recordSelection(principal, asked);
  async function* lines() {
    for await (const entries of recordBatches(principal, selection)) yield entries.map((e) => csvLine(recordRow(e, selection.timeZone))).join("");
  }
  const name = selection.item ? `linkyard-record-${selection.item.tagCode}-${selection.period.to}.csv` : `linkyard-records-${selection.period.from ?? "start"}-to-${selection.period.to}.csv`;
  return csvDownload(name, csvLine([...RECORD_HEADERS]), lines(), "records");
});
