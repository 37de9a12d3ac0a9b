import { route } from "@/lib/http/route";
import { moveSchema } from "@/lib/stock/schemas";
import { moveItems } from "@/lib/stock/service";

export const POST = route("stock.edit", { body: moveSchema }, async ({ principal, body }) => ({
  moved: await moveItems(principal, body.itemIds, body.yardId),
}));
