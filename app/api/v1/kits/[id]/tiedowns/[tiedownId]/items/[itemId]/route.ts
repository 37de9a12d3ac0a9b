import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { kitAnswer, removeItem } from "@/lib/kits/kit-service";

/** Takes an item out of a tiedown of a draft kit. */
export const DELETE = route("fleet.manage", {}, async ({ principal, params }) => {
  const id = uuidParam(params.id, "kit");
  await removeItem(principal, id, uuidParam(params.tiedownId, "tiedown"), uuidParam(params.itemId, "item"));
  return kitAnswer(principal.organisationId, id);
});
