import { getItem } from "@/db/items";
import { notFound, uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { principalClock } from "@/lib/organisations/service";
import { itemInputSchema } from "@/lib/stock/schemas";
import { editItem } from "@/lib/stock/service";
import { toItemJson } from "@/lib/stock/item-json";

export const GET = route("stock.view", {}, async ({ principal, params }) => {
  const item = await getItem(principal.organisationId, uuidParam(params.id));
  if (!item) throw notFound("No such item.");
  return toItemJson(item, await principalClock(principal));
});

/** Replaces the item's details (the whole item, as the form sends it). */
export const PUT = route("stock.edit", { body: itemInputSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id);
  await editItem(principal, id, body);
  return toItemJson((await getItem(principal.organisationId, id))!, await principalClock(principal));
});
