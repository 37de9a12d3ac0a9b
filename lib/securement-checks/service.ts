import "server-only";
import { audited } from "@/db/audit";
import * as saved from "@/db/saved-checks";
import { can } from "@/lib/auth/roles";
import type { Principal } from "@/lib/auth/session";
import { conflict, forbidden, notFound } from "@/lib/http/errors";
import { checkSecurement, maySaveOver, savedCheckAnswer, type SavedCheckAnswer, type SavedCheckInput } from "@/lib/securement";

// Load checks saved by name (the engine's side is lib/securement/saved.ts). Every role may
// run checks, so every role may save, list, open and print them; changing or deleting one is
// for the person who saved it and for those who manage kits (owner, planner). Each change is
// one transaction with its audit row.

const NOT_YOURS = "Only the person who saved this check, an owner or a planner may change or delete it.";
const NO_SUCH = "No such saved check.";
const NAME_USED = "This name is already used by a saved check.";

function mustBeAllowed(actor: Principal) {
  if (!can(actor, "securement.check")) throw forbidden();
}

/** The actor as the owner rule reads it: anyone changes their own; those who manage kits change any. */
function changer(actor: Principal) {
  return { userId: actor.userId, mayChangeAny: can(actor, "fleet.manage") };
}

/** The organisation's saved checks, most recently changed first, each saying whether this actor may change it. */
export async function listSavedChecks(actor: Principal) {
  mustBeAllowed(actor);
  const rows = await saved.listSavedChecks(actor.organisationId);
  return rows.map((r) => ({ ...r, mayChange: maySaveOver(changer(actor), r.savedById) }));
}

/** One saved check with its answer worked out now, or undefined when the organisation has none with this id. */
export async function readSavedCheck(actor: Principal, id: string): Promise<SavedCheckAnswer | undefined> {
  mustBeAllowed(actor);
  const row = await saved.getSavedCheck(actor.organisationId, id);
  return row && savedCheckAnswer(row, maySaveOver(changer(actor), row.savedById));
}

/** Saves a check under a new name; 409 when the organisation already has one of that name. */
export async function saveCheck(actor: Principal, input: SavedCheckInput): Promise<SavedCheckAnswer> {
  mustBeAllowed(actor);
  const fields = { name: input.name, request: input.request, passAtSave: checkSecurement(input.request).pass };
  let id: string;
  try {
    id = await audited(actor, async (tx, audit) => {
      const created = await saved.insertSavedCheck(actor.organisationId, fields, actor.userId, tx);
      await audit({ action: "saved_check.saved", entity: "saved_check", entityId: created, after: { name: fields.name, passAtSave: fields.passAtSave } });
      return created;
    });
  } catch (error) {
    if (saved.savedCheckNameRefusal(error)) throw conflict(`A check named "${input.name}" is already saved. Choose another name, or open that one and save over it.`, [{ path: "name", message: NAME_USED }]);
    throw error;
  }
  return savedCheckAnswer((await saved.getSavedCheck(actor.organisationId, id))!, true);
}

/** Saves over a check: 404 when there is none, 403 when it is not the actor's to change, 409 when the new name is taken. */
export async function saveOverCheck(actor: Principal, id: string, input: SavedCheckInput): Promise<SavedCheckAnswer> {
  mustBeAllowed(actor);
  const fields = { name: input.name, request: input.request, passAtSave: checkSecurement(input.request).pass };
  try {
    await audited(actor, async (tx, audit) => {
      const before = await saved.lockSavedCheck(actor.organisationId, id, tx);
      if (!before) throw notFound(NO_SUCH);
      if (!maySaveOver(changer(actor), before.createdBy)) throw forbidden(NOT_YOURS);
      await saved.updateSavedCheck(actor.organisationId, id, fields, actor.userId, tx);
      await audit({ action: "saved_check.updated", entity: "saved_check", entityId: id, before: { name: before.name, passAtSave: before.passAtSave }, after: { name: fields.name, passAtSave: fields.passAtSave } });
    });
  } catch (error) {
    if (saved.savedCheckNameRefusal(error)) throw conflict(`Another saved check is named "${input.name}".`, [{ path: "name", message: NAME_USED }]);
    throw error;
  }
  return savedCheckAnswer((await saved.getSavedCheck(actor.organisationId, id))!, true);
}

/** Deletes a saved check: 404 when there is none, 403 when it is not the actor's to delete. */
export async function deleteSavedCheck(actor: Principal, id: string): Promise<void> {
  mustBeAllowed(actor);
  await audited(actor, async (tx, audit) => {
    const before = await saved.lockSavedCheck(actor.organisationId, id, tx);
    if (!before) throw notFound(NO_SUCH);
    if (!maySaveOver(changer(actor), before.createdBy)) throw forbidden(NOT_YOURS);
    await saved.deleteSavedCheck(actor.organisationId, id, tx);
    await audit({ action: "saved_check.deleted", entity: "saved_check", entityId: id, before: { name: before.name } });
  });
}
