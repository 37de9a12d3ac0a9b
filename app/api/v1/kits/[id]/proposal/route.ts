import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { kitAnswer, proposeForKit } from "@/lib/kits/kit-service";
import { proposalQuerySchema } from "@/lib/kits/schemas";

/**
 * A proposed kit from the gear free and usable on the kit's date: `{ tiedowns, check, pass,
 * missing, notes, items, applied }`, nothing saved. `?apply=true` replaces the draft's
 * tiedowns with it in one transaction and adds `kit`; 409 PROPOSAL_DOES_NOT_PASS,
 * ITEM_IN_OTHER_KIT (a race lost), KIT_NOT_DRAFT.
 */
export const POST = route("fleet.manage", { query: proposalQuerySchema }, async ({ principal, params, query }) => {
  const id = uuidParam(params.id, "kit");
  const answer = await proposeForKit(principal, id, query);
  return answer.applied ? { ...answer, kit: await kitAnswer(principal.organisationId, id) } : answer;
});
