import type { Knex } from "knex";
import { uniqueRefusal } from "./errors";
import { db } from "./index";

// Load checks saved by name: the request as POST /api/v1/securement-checks takes it, who
// saved it and when, and whether it met the published minimums when it was saved. Every
// query takes the organisation id; another organisation's check is simply not found. Who may
// change one is the service's rule (lib/securement-checks/service.ts).

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

/** What a save writes: the name, the request, and whether it passed when saved. */
export interface SavedCheckFields {
  name: string;
  request: unknown;
  passAtSave: boolean;
}

/** A saved check as a change locks it: what its audit row and the owner rule need. */
export interface LockedSavedCheck {
  name: string;
  passAtSave: boolean;
  createdBy: string;
}

const summaryColumns = [
  "c.id", "c.name", "c.pass_at_save as passAtSave", "c.created_by as savedById", "s.name as savedBy",
  "c.created_at as savedAt", "u.name as updatedBy", "c.updated_at as updatedAt",
];

function withPeople(q: Knex.QueryBuilder): Knex.QueryBuilder {
  return q.join("users as s", "s.id", "c.created_by").join("users as u", "u.id", "c.updated_by");
}

/** Whether a write was refused because the organisation already has a saved check of that name. */
export function savedCheckNameRefusal(error: unknown): boolean {
  return uniqueRefusal(error)?.key === "saved_checks_name_unique";
}

/** The organisation's saved checks, most recently changed first. */
export async function listSavedChecks(organisationId: string, limit = 200): Promise<SavedCheckSummary[]> {
  return withPeople(db("saved_checks as c")).where("c.organisation_id", organisationId).orderBy("c.updated_at", "desc").limit(limit).select(summaryColumns);
}

/** One saved check, or undefined when the organisation has none with this id. */
export async function getSavedCheck(organisationId: string, id: string): Promise<SavedCheck | undefined> {
  return withPeople(db("saved_checks as c")).where({ "c.organisation_id": organisationId, "c.id": id }).first([...summaryColumns, "c.request"]);
}

/** Saves a new check by name; a name already used in the organisation is refused by its unique key (savedCheckNameRefusal). */
export async function insertSavedCheck(organisationId: string, fields: SavedCheckFields, userId: string, trx: Knex): Promise<string> {
  const [row] = await trx("saved_checks")
    .insert({ organisation_id: organisationId, name: fields.name, request: JSON.stringify(fields.request), pass_at_save: fields.passAtSave, created_by: userId, updated_by: userId })
    .returning("id");
  return row.id;
}

/** Locks a saved check for a change, or undefined when the organisation has none with this id. */
export async function lockSavedCheck(organisationId: string, id: string, trx: Knex): Promise<LockedSavedCheck | undefined> {
  return trx("saved_checks").where({ organisation_id: organisationId, id }).forUpdate().first("name", "pass_at_save as passAtSave", "created_by as createdBy");
}

/** Replaces a saved check's name and request. */
export async function updateSavedCheck(organisationId: string, id: string, fields: SavedCheckFields, userId: string, trx: Knex): Promise<void> {
  await trx("saved_checks")
    .where({ organisation_id: organisationId, id })
    .update({ name: fields.name, request: JSON.stringify(fields.request), pass_at_save: fields.passAtSave, updated_by: userId, updated_at: trx.fn.now() });
}

export async function deleteSavedCheck(organisationId: string, id: string, trx: Knex): Promise<void> {
  await trx("saved_checks").where({ organisation_id: organisationId, id }).delete();
}
