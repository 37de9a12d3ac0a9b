import { streamItems } from "@/db/items";
import { csvLine, EXPORT_HEADERS, exportRow } from "@/lib/import/csv-write";
import { route } from "@/lib/http/route";
import { principalClock } from "@/lib/organisations/service";
import { itemListQuerySchema, listFilters } from "@/lib/stock/api-schemas";
import { csvDownload } from "@/lib/http/download";
import { itemVerdict } from "@/lib/stock/verdict";

/**
 * The stock as CSV, with the stock table's filters and sort (kind, status, yardId, due, q,
 * sort, order), every matching row, streamed, each with its verdict for today ("Usable today"). The file imports back as it is: its header
 * maps itself, and each row updates its item by tag code.
 * Owners and planners: the export carries costs and is made for editing and importing back;
 * a yard hand reads the stock on screen.
 */
export const GET = route("stock.edit", { query: itemListQuerySchema }, async ({ principal, query }) => {
  const clock = principalClock(principal);
  const { today } = clock;
  async function* lines() {
    for await (const items of streamItems(principal.organisationId, listFilters(query, today))) {
      yield items.map((item) => csvLine(exportRow(item, itemVerdict(item, clock)))).join("");
    }
  }
  return csvDownload(`linkyard-stock-${today}.csv`, csvLine([...EXPORT_HEADERS]), lines(), "stock");
});
