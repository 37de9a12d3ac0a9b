import { deleteSavedCheck, getSavedCheck, updateSavedCheck } from "@/db/saved-checks";
import type { Principal } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { conflict, forbidden, notFound, uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { checkSecurement, maySaveOver, savedCheckAnswer, savedCheckInputSchema } from "@/lib/securement";

// One saved check: open it (its answer worked out against the current rules), save over it,
// delete it. Changing and deleting are for the person who saved it and for those who manage
// kits (owner, planner); another organisation's id is not found.

const actor = (p: Principal) => ({ userId: p.userId, mayChangeAny: can(p, "fleet.manage") });
const NOT_YOURS = "Only the person who saved this check, an owner or a planner may change or delete it.";
const NO_SUCH = "No such saved check.";

export const GET = route("securement.check", {}, async ({ principal, params }) => {
  const row = await getSavedCheck(principal.organisationId, uuidParam(params.id, "saved check"));
  if (!row) throw notFound(NO_SUCH);
  return savedCheckAnswer(row, maySaveOver(actor(principal), row.savedById));
});

export const PUT = route("securement.check", { body: savedCheckInputSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id, "saved check");
  const passAtSave = checkSecurement(body.request).pass;
  const done = await updateSavedCheck(principal.organisationId, id, { name: body.name, request: body.request, passAtSave }, actor(principal));
  if ("refused" in done) {
    if (done.refused === "missing") throw notFound(NO_SUCH);
    if (done.refused === "not-yours") throw forbidden(NOT_YOURS);
    throw conflict(`Another saved check is named "${body.name}".`, [{ path: "name", message: "This name is already used by a saved check." }]);
  }
  return savedCheckAnswer((await getSavedCheck(principal.organisationId, id))!, true);
});

export const DELETE = route("securement.check", {}, async ({ principal, params }) => {
  const done = await deleteSavedCheck(principal.organisationId, uuidParam(params.id, "saved check"), actor(principal));
  if ("refused" in done) throw done.refused === "missing" ? notFound(NO_SUCH) : forbidden(NOT_YOURS);
  return { ok: true };
});
