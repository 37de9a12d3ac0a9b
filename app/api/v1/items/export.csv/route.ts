import { streamItems } from "@/db/items";
import { csvLine, EXPORT_HEADERS, exportRow } from "@/lib/import/csv-write";
import { route } from "@/lib/http/route";
import { principalClock } from "@/lib/organisations/service";
import { itemListQuerySchema, listFilters } from "@/lib/stock/api-schemas";
import { csvDownloadHeaders } from "@/lib/http/download";
import { itemVerdict } from "@/lib/stock/verdict";

/**
 * The stock as CSV, with the stock table's filters and sort (kind, status, yardId, due, q,
 * sort, order), every matching row, streamed, each with its verdict for today ("Usable today"). The file imports back as it is: its header
 * maps itself, and each row updates its item by tag code.
 * Owners and planners: the export carries costs and is made for editing and importing back;
 * a yard hand reads the stock on screen.
 */
export const GET = route("stock.edit", { query: itemListQuerySchema }, async ({ principal, query }) => {
  const clock = await principalClock(principal);
  const { today } = clock;
  const batches = streamItems(principal.organisationId, listFilters(query, today));
  const encoder = new TextEncoder();
  let started = false;
  const stream = new ReadableStream<Uint8Array>({
    async pull(controller) {
      if (!started) {
        started = true;
        controller.enqueue(encoder.encode("\ufeff" + csvLine([...EXPORT_HEADERS])));
        return;
      }
      try {
        const next = await batches.next();
        if (next.done) controller.close();
        else controller.enqueue(encoder.encode(next.value.map((item) => csvLine(exportRow(item, itemVerdict(item, clock)))).join("")));
      } catch (error) {
        console.error("stock export failed", error);
        controller.error(error);
      }
    },
    async cancel() {
      await batches.return(undefined);
    },
  });
  return new Response(stream, { headers: csvDownloadHeaders(`linkyard-stock-${today}.csv`) });
});
