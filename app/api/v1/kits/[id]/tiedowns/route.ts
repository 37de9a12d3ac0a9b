import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { addTiedown, kitAnswer } from "@/lib/kits/kit-service";
import { tiedownInputSchema } from "@/lib/kits/schemas";

/**
 * Adds a tiedown to a draft kit, with its items. 409 with `code`: ITEM_NOT_USABLE (and
 * `itemId`, `reasons`), ITEM_IN_OTHER_KIT (`itemId`, `kitId`), ANCHOR_NOT_USABLE, KIT_NOT_DRAFT.
 */
export const POST = route("fleet.manage", { body: tiedownInputSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id, "kit");
  await addTiedown(principal, id, body);
  return Response.json(await kitAnswer(principal.organisationId, id), { status: 201 });
});
