import { notFound, uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { savedCheckInputSchema } from "@/lib/securement";
import { deleteSavedCheck, readSavedCheck, saveOverCheck } from "@/lib/securement-checks/service";

// One saved check: open it (its answer worked out against the current rules), save over it,
// delete it. Changing and deleting are for the person who saved it and for those who manage
// kits (owner, planner); another organisation's id is not found.

export const GET = route("securement.check", {}, async ({ principal, params }) => {
  const check = await readSavedCheck(principal, uuidParam(params.id, "saved check"));
  if (!check) throw notFound("No such saved check.");
  return check;
});

export const PUT = route("securement.check", { body: savedCheckInputSchema }, async ({ principal, params, body }) => saveOverCheck(principal, uuidParam(params.id, "saved check"), body));

export const DELETE = route("securement.check", {}, async ({ principal, params }) => {
  await deleteSavedCheck(principal, uuidParam(params.id, "saved check"));
  return { ok: true };
});
