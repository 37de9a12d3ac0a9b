import { getBatch } from "@/db/imports";
import { notFound, uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { readStored } from "@/lib/storage/files";
import { csvDownloadHeaders } from "@/lib/http/download";

/** The rows an import of valid rows only left out: the file's columns and an `error` column. */
export const GET = route("stock.import", {}, async ({ principal, params }) => {
  const batch = await getBatch(principal.organisationId, uuidParam(params.id, "import"));
  if (!batch?.rejectedKey) throw notFound("This import has no rejected rows.");
  return new Response(await readStored(batch.rejectedKey), { headers: csvDownloadHeaders(batch.fileName.replace(/(\.[a-z]+)?$/i, "-rejected.csv")) });
});
