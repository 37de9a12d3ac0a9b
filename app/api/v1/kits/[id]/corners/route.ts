import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { fillCorners, kitAnswer } from "@/lib/kits/kit-service";
import { cornersSchema } from "@/lib/kits/schemas";

/** "Use the same for all four corners": answers the kit and, per corner, what was found and what was missing. */
export const POST = route("fleet.manage", { body: cornersSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id, "kit");
  const corners = await fillCorners(principal, id, body.fromTiedownId);
  return Response.json({ kit: await kitAnswer(principal.organisationId, id), corners }, { status: 201 });
});
