import { getItem, listItems } from "@/db/items";
import { route } from "@/lib/http/route";
import { principalClock } from "@/lib/organisations/service";
import { itemListQuerySchema, listFilters } from "@/lib/stock/api-schemas";
import { itemInputSchema } from "@/lib/stock/schemas";
import { createItem } from "@/lib/stock/service";
import { toItemJson } from "@/lib/stock/item-json";

/** A page of stock: filters kind, status, yardId, due (overdue | 30d), q (tag code or serial). */
export const GET = route("stock.view", { query: itemListQuerySchema }, async ({ principal, query }) => {
  const clock = await principalClock(principal);
  const page = await listItems(principal.organisationId, listFilters(query, clock.today));
  return { data: page.data.map((row) => toItemJson(row, clock)), pageCount: page.pageCount, total: page.total };
});

export const POST = route("stock.edit", { body: itemInputSchema }, async ({ principal, body }) => {
  const id = await createItem(principal, body);
  return Response.json(toItemJson((await getItem(principal.organisationId, id))!, await principalClock(principal)), { status: 201 });
});
