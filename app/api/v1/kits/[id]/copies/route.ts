import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { copyKit, kitAnswer } from "@/lib/kits/kit-service";
import { copySchema } from "@/lib/kits/schemas";

/** A draft copy for another date; items not usable or not free that day are left out and listed. */
export const POST = route("fleet.manage", { body: copySchema }, async ({ principal, params, body }) => {
  const { id, leftOut } = await copyKit(principal, uuidParam(params.id, "kit"), body);
  return Response.json({ kit: await kitAnswer(principal.organisationId, id), leftOut }, { status: 201 });
});
