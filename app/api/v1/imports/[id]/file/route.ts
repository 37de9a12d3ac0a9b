import { getBatch } from "@/db/imports";
import { notFound, uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { readStored } from "@/lib/storage/files";
import { csvDownloadHeaders } from "@/lib/http/download";

/** The file as it was uploaded. */
export const GET = route("stock.import", {}, async ({ principal, params }) => {
  const batch = await getBatch(principal.organisationId, uuidParam(params.id, "import"));
  if (!batch?.fileKey) throw notFound("No such import.");
  return new Response(await readStored(batch.fileKey), { headers: csvDownloadHeaders(batch.fileName) });
});
