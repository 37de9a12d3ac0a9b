import { getSavedCheck, insertSavedCheck, listSavedChecks } from "@/db/saved-checks";
import { can } from "@/lib/auth/roles";
import { conflict } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { checkSecurement, maySaveOver, savedCheckAnswer, savedCheckInputSchema } from "@/lib/securement";

// Load checks saved by name. Every role may list and save them (every role may run checks);
// see lib/securement/saved.ts for who may change or delete one.

/** The organisation's saved checks, most recently changed first. */
export const GET = route("securement.check", {}, async ({ principal }) => {
  const rows = await listSavedChecks(principal.organisationId);
  return { data: rows.map((r) => ({ ...r, mayChange: maySaveOver({ userId: principal.userId, mayChangeAny: can(principal, "fleet.manage") }, r.savedById) })) };
});

/** Saves a check under a new name: 201 with the saved check and its answer; 409 when the name is taken. */
export const POST = route("securement.check", { body: savedCheckInputSchema }, async ({ principal, body }) => {
  const passAtSave = checkSecurement(body.request).pass;
  const saved = await insertSavedCheck(principal.organisationId, { name: body.name, request: body.request, passAtSave }, principal.userId);
  if ("refused" in saved) throw conflict(`A check named "${body.name}" is already saved. Choose another name, or open that one and save over it.`, [{ path: "name", message: "This name is already used by a saved check." }]);
  const row = (await getSavedCheck(principal.organisationId, saved.id))!;
  return Response.json(savedCheckAnswer(row, true), { status: 201 });
});
