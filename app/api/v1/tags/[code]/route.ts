import { findItemByTag } from "@/db/items";
import { route } from "@/lib/http/route";
import { principalClock } from "@/lib/organisations/service";
import { badRequest, notFound } from "@/lib/http/errors";
import { toItemJson } from "@/lib/stock/item-json";
import { tagCodeFromPath } from "@/lib/tags/entry";

/** The item a tag code names, in the caller's organisation, with its usability verdict for
 *  today. Another organisation's code is answered exactly like an unknown one. */
export const GET = route("stock.view", {}, async ({ principal, params }) => {
  const code = tagCodeFromPath(params.code ?? "");
  if (!code) {
    throw badRequest("That is not a tag code.", [
      { path: "code", message: "A tag code is 8 characters from 34679ACDEFGHJKMNPQRTWXY, like K7XM-3HQA." },
    ]);
  }
  const item = await findItemByTag(code);
  if (!item || item.organisationId !== principal.organisationId) throw notFound("No item has this tag code.");
  return toItemJson(item, await principalClock(principal));
});
