import type { Knex } from "knex";
import { writeAudit } from "./audit";
import { db } from "./index";

// Load checks saved by name: the request as POST /api/v1/securement-checks takes it, who
// saved it and when, and whether it met the published minimums when it was saved. Every
// query takes the organisation id; another organisation's check is simply not found.

/** A saved check as the list shows it. */
export interface SavedCheckSummary {
  id: string;
  name: string;
  passAtSave: boolean;
  savedById: string;
  savedBy: string;
  savedAt: Date;
  updatedBy: string;
  updatedAt: Date;
}

/** A saved check with the request it holds. */
export interface SavedCheck extends SavedCheckSummary {
  request: unknown;
}

/** Who is changing a saved check: anyone may change their own; `mayChangeAny` may change every one. */
export interface SavedCheckActor {
  userId: string;
  mayChangeAny: boolean;
}

/** Why a change was not made: no such check here, not theirs to change, or the name is taken. */
export type SavedCheckRefusal = "missing" | "not-yours" | "name-taken";

const summaryColumns = [
  "c.id", "c.name", "c.pass_at_save as passAtSave", "c.created_by as savedById", "s.name as savedBy",
  "c.created_at as savedAt", "u.name as updatedBy", "c.updated_at as updatedAt",
];

function withPeople(q: Knex.QueryBuilder): Knex.QueryBuilder {
  return q.join("users as s", "s.id", "c.created_by").join("users as u", "u.id", "c.updated_by");
}

const isNameTaken = (error: unknown) =>
  typeof error === "object" && error !== null && (error as { code?: string }).code === "23505" && String((error as { constraint?: string }).constraint) === "saved_checks_name_unique";

/** The organisation's saved checks, most recently changed first. */
export async function listSavedChecks(organisationId: string, limit = 200): Promise<SavedCheckSummary[]> {
  return withPeople(db("saved_checks as c")).where("c.organisation_id", organisationId).orderBy("c.updated_at", "desc").limit(limit).select(summaryColumns);
}

/** One saved check, or undefined when the organisation has none with this id. */
export async function getSavedCheck(organisationId: string, id: string): Promise<SavedCheck | undefined> {
  return withPeople(db("saved_checks as c")).where({ "c.organisation_id": organisationId, "c.id": id }).first([...summaryColumns, "c.request"]);
}

/** Saves a new check by name, with its audit row; a name already used in the organisation is refused. */
export async function insertSavedCheck(
  organisationId: string,
  input: { name: string; request: unknown; passAtSave: boolean },
  userId: string,
): Promise<{ id: string } | { refused: "name-taken" }> {
  try {
    return await db.transaction(async (trx) => {
      const [row] = await trx("saved_checks")
        .insert({ organisation_id: organisationId, name: input.name, request: JSON.stringify(input.request), pass_at_save: input.passAtSave, created_by: userId, updated_by: userId })
        .returning("id");
      await writeAudit({ organisationId, actorId: userId, action: "saved_check.saved", entity: "saved_check", entityId: row.id, after: { name: input.name, passAtSave: input.passAtSave } }, trx);
      return { id: row.id as string };
    });
  } catch (error) {
    if (isNameTaken(error)) return { refused: "name-taken" };
    throw error;
  }
}

/** Replaces a saved check's name and request, with its audit row (before and after). */
export async function updateSavedCheck(
  organisationId: string,
  id: string,
  input: { name: string; request: unknown; passAtSave: boolean },
  actor: SavedCheckActor,
): Promise<{ id: string } | { refused: SavedCheckRefusal }> {
  try {
    return await db.transaction(async (trx) => {
      const before = await trx("saved_checks").where({ organisation_id: organisationId, id }).forUpdate().first("name", "pass_at_save as passAtSave", "created_by as createdBy");
      if (!before) return { refused: "missing" as const };
      if (!actor.mayChangeAny && before.createdBy !== actor.userId) return { refused: "not-yours" as const };
      await trx("saved_checks")
        .where({ organisation_id: organisationId, id })
        .update({ name: input.name, request: JSON.stringify(input.request), pass_at_save: input.passAtSave, updated_by: actor.userId, updated_at: trx.fn.now() });
      await writeAudit(
        { organisationId, actorId: actor.userId, action: "saved_check.updated", entity: "saved_check", entityId: id, before: { name: before.name, passAtSave: before.passAtSave }, after: { name: input.name, passAtSave: input.passAtSave } },
        trx,
      );
      return { id };
    });
  } catch (error) {
    if (isNameTaken(error)) return { refused: "name-taken" };
    throw error;
  }
}

/** Deletes a saved check, with its audit row. */
export async function deleteSavedCheck(organisationId: string, id: string, actor: SavedCheckActor): Promise<{ ok: true } | { refused: Exclude<SavedCheckRefusal, "name-taken"> }> {
  return db.transaction(async (trx) => {
    const before = await trx("saved_checks").where({ organisation_id: organisationId, id }).forUpdate().first("name", "created_by as createdBy");
    if (!before) return { refused: "missing" as const };
    if (!actor.mayChangeAny && before.createdBy !== actor.userId) return { refused: "not-yours" as const };
    await trx("saved_checks").where({ organisation_id: organisationId, id }).delete();
    await writeAudit({ organisationId, actorId: actor.userId, action: "saved_check.deleted", entity: "saved_check", entityId: id, before: { name: before.name } }, trx);
    return { ok: true as const };
  });
}
