import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { kitAnswer, placeKit } from "@/lib/kits/kit-service";
import { placementSchema } from "@/lib/kits/schemas";

/**
 * Where the machine sits on the deck, `{ machineFrontFromDeckFront: {value, unit} | null }`;
 * draft kits only (409 KIT_NOT_DRAFT). Answers the kit, whose `placement` then carries the
 * tongue weight, the loaded weight against the GVWR and the findings.
 */
export const PUT = route("fleet.manage", { body: placementSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id, "kit");
  await placeKit(principal, id, body);
  return kitAnswer(principal.organisationId, id);
});
