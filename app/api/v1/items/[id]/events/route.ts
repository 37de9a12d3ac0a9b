import { getItem, listEvents } from "@/db/items";
import { notFound, uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { principalClock } from "@/lib/organisations/service";
import { itemEventSchema } from "@/lib/stock/api-schemas";
import { recordItemEvent } from "@/lib/stock/events";
import { toItemJson } from "@/lib/stock/item-json";

/** The item's service history, newest first. */
export const GET = route("stock.view", {}, async ({ principal, params }) => {
  const id = uuidParam(params.id);
  if (!(await getItem(principal.organisationId, id))) throw notFound("No such item.");
  return { data: await listEvents(principal.organisationId, id) };
});

/**
 * Records a check, tag-out, inspection or status change; the service checks the role per
 * type. A pre-use check of an item that may not be used is refused with 409 and the reasons.
 */
export const POST = route("items.check", { body: itemEventSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id);
  const result = await recordItemEvent(principal, id, body);
  const item = await getItem(principal.organisationId, id);
  return Response.json({ result: result ?? null, item: item ? toItemJson(item, await principalClock(principal)) : null }, { status: 201 });
});
