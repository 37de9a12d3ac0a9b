import { getAttachment } from "@/db/items";
import { notFound, uuidParam } from "@/lib/http/errors";
import { storedFileHeaders } from "@/lib/http/download";
import { route } from "@/lib/http/route";
import { readStored } from "@/lib/storage/files";

/** A stored photo or certificate, for people of the item's organisation only. */
export const GET = route("stock.view", {}, async ({ principal, params }) => {
  const file = await getAttachment(principal.organisationId, uuidParam(params.id, "file"));
  if (!file) throw notFound("No such file.");
  return new Response(await readStored(file.storageKey), { headers: storedFileHeaders(file) });
});
