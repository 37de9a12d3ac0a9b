import { listYards } from "@/db/items";
import { templateCsv } from "@/lib/import/csv-write";
import { route } from "@/lib/http/route";
import { attachment } from "@/lib/stock/import";

/** A CSV template: the columns the import reads, with example rows that import as they are. */
export const GET = route("stock.import", {}, async ({ principal }) => {
  const yards = await listYards(principal.organisationId);
  return new Response("\ufeff" + templateCsv(yards[0]?.name ?? null), { headers: attachment("linkyard-stock-template.csv") });
});
