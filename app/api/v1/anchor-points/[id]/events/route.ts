import { getAnchorPoint, listAnchorEvents } from "@/db/fleet";
import { notFound, uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { anchorJson } from "@/lib/kits/answers";
import { toAnchor } from "@/lib/kits/assemble";
import { recordAnchorEvent } from "@/lib/kits/fleet-service";
import { anchorEventSchema } from "@/lib/kits/schemas";
import { principalClock } from "@/lib/organisations/service";

/** The anchor point's history, newest first. */
export const GET = route("fleet.view", {}, async ({ principal, params }) => {
  const id = uuidParam(params.id, "anchor point");
  if (!(await getAnchorPoint(principal.organisationId, id))) throw notFound("No such anchor point.");
  return { data: await listAnchorEvents(principal.organisationId, id) };
});

/**
 * Inspects an anchor point, takes it out of use (anyone), returns it to use (an owner or
 * designated person) or retires it (owner, planner); the service checks the role per type.
 */
export const POST = route("items.check", { body: anchorEventSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id, "anchor point");
  await recordAnchorEvent(principal, id, body);
  const anchor = (await getAnchorPoint(principal.organisationId, id))!;
  return Response.json(anchorJson(toAnchor(anchor, (await principalClock(principal)).today)), { status: 201 });
});
