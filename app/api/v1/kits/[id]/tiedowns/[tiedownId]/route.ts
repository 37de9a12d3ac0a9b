import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { kitAnswer, patchTiedown, removeTiedown } from "@/lib/kits/kit-service";
import { tiedownPatchSchema } from "@/lib/kits/schemas";

/** Changes a tiedown's anchor point, attachment, what it holds, label or machine point (draft only). */
export const PATCH = route("fleet.manage", { body: tiedownPatchSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id, "kit");
  await patchTiedown(principal, id, uuidParam(params.tiedownId, "tiedown"), body);
  return kitAnswer(principal.organisationId, id);
});

/** Removes a tiedown from a draft kit; its items are free for the date again. */
export const DELETE = route("fleet.manage", {}, async ({ principal, params }) => {
  const id = uuidParam(params.id, "kit");
  await removeTiedown(principal, id, uuidParam(params.tiedownId, "tiedown"));
  return kitAnswer(principal.organisationId, id);
});
