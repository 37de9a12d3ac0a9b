import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { kitAnswer, patchKit } from "@/lib/kits/kit-service";
import { kitPatchSchema } from "@/lib/kits/schemas";

/** The kit: machine, trailer (anchor points judged for the kit's date), tiedowns, check, blockers, practice, pass. */
export const GET = route("fleet.view", {}, async ({ principal, params }) => kitAnswer(principal.organisationId, uuidParam(params.id, "kit")));

/** Job and site; in draft also whether the articulation is locked (where the machine sits: PUT …/placement). */
export const PATCH = route("fleet.manage", { body: kitPatchSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id, "kit");
  await patchKit(principal, id, body);
  return kitAnswer(principal.organisationId, id);
});
