import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { freeItems } from "@/lib/kits/kit-service";
import { freeItemsQuerySchema } from "@/lib/kits/schemas";

/** Items in no kit on the kit's date that may be used that day; with `forTiedownId`, those that fit it. */
export const GET = route("fleet.view", { query: freeItemsQuerySchema }, async ({ principal, params, query }) =>
  freeItems(principal, uuidParam(params.id, "kit"), query),
);
