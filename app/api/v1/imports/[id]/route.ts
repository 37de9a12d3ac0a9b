import { getBatch } from "@/db/imports";
import { notFound, uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { batchJson } from "@/lib/import/answers";
import { undoState } from "@/lib/import/undo";

/** One import: counts, and its progress while it runs (the import page polls this). */
export const GET = route("stock.import", {}, async ({ principal, params }) => {
  const batch = await getBatch(principal.organisationId, uuidParam(params.id, "import"));
  if (!batch) throw notFound("No such import.");
  return batchJson(batch, await undoState(principal.organisationId, batch));
});
