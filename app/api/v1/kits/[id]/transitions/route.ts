import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { kitAnswer, transitionKit } from "@/lib/kits/kit-service";
import { transitionSchema } from "@/lib/kits/schemas";

/**
 * draft → ready and back (owners, planners); ready → loaded and loaded → returned by
 * scanning (every role). 409 with `code` TRANSITION_NOT_ALLOWED, KIT_DOES_NOT_PASS or
 * SCAN_MISMATCH (`missing`, `unexpected`); the kit's state is then unchanged.
 */
export const POST = route("kits.load", { body: transitionSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id, "kit");
  await transitionKit(principal, id, body);
  return kitAnswer(principal.organisationId, id);
});
