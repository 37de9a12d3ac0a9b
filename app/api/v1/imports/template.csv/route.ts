import { listYards } from "@/db/items";
import { templateCsv } from "@/lib/import/csv-write";
import { route } from "@/lib/http/route";
import { csvDownloadHeaders } from "@/lib/http/download";

/** A CSV template: the columns the import reads, with example rows that import as they are. */
export const GET = route("stock.import", {}, async ({ principal }) => {
  const yards = await listYards(principal.organisationId);
  return new Response("\ufeff" + templateCsv(yards[0]?.name ?? null), { headers: csvDownloadHeaders("linkyard-stock-template.csv") });
});
