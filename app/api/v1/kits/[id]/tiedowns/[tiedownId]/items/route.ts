import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { addItems, kitAnswer } from "@/lib/kits/kit-service";
import { tiedownItemsSchema } from "@/lib/kits/schemas";

/** Adds items (scanned or picked from the free list) to a tiedown; the same 409s as a new tiedown. */
export const POST = route("fleet.manage", { body: tiedownItemsSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id, "kit");
  await addItems(principal, id, uuidParam(params.tiedownId, "tiedown"), body.itemIds);
  return Response.json(await kitAnswer(principal.organisationId, id), { status: 201 });
});
