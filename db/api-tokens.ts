import type { Knex } from "knex";
import { db } from "./index";
import type { Role } from "@/lib/auth/roles";

// API tokens: bearer secrets for integrations. Only the hash of a secret is stored.

export async function insertApiToken(
  t: { organisationId: string; createdBy: string; name: string; role: Role; tokenHash: string },
  trx: Knex = db,
): Promise<string> {
  const [row] = await trx("api_tokens")
    .insert({ organisation_id: t.organisationId, created_by: t.createdBy, name: t.name, role: t.role, token_hash: t.tokenHash })
    .returning("id");
  return row.id;
}

export async function listApiTokens(organisationId: string): Promise<{ id: string; name: string; role: Role; createdAt: Date; lastUsedAt: Date | null }[]> {
  return db("api_tokens")
    .where({ organisation_id: organisationId })
    .whereNull("revoked_at")
    .orderBy("created_at", "desc")
    .select("id", "name", "role", "created_at as createdAt", "last_used_at as lastUsedAt");
}

export async function revokeApiToken(organisationId: string, id: string, trx: Knex = db): Promise<number> {
  return trx("api_tokens").where({ organisation_id: organisationId, id }).whereNull("revoked_at").update({ revoked_at: trx.fn.now() });
}

/** A live token by the hash of its secret, with the person who made it (who must not be disabled). */
export interface ActiveApiToken {
  id: string;
  organisationId: string;
  role: Role;
  userId: string;
  /** The maker's role now: the token never acts above it. */
  creatorRole: Role;
  name: string;
  email: string;
  lastUsedAt: Date | null;
  organisationName: string;
  timeZone: string;
}

export async function findActiveApiToken(tokenHash: string): Promise<ActiveApiToken | undefined> {
  return db("api_tokens as t")
    .join("users as u", "u.id", "t.created_by")
    .join("organisations as o", "o.id", "t.organisation_id")
    .where("t.token_hash", tokenHash)
    .whereNull("t.revoked_at")
    .whereNull("u.disabled_at")
    .first(
      "t.id", "t.organisation_id as organisationId", "t.role", "t.last_used_at as lastUsedAt", "u.id as userId", "u.role as creatorRole", "u.name", "u.email",
      "o.name as organisationName", "o.time_zone as timeZone",
    );
}

/** Records a token's use, unless one was recorded in the last `withinMinutes` (a read then writes nothing). */
export async function markApiTokenUsed(id: string, withinMinutes: number): Promise<void> {
  await db("api_tokens")
    .where({ id })
    .where((w) => w.whereNull("last_used_at").orWhere("last_used_at", "<", db.raw("now() - make_interval(mins => ?)", [withinMinutes])))
    .update({ last_used_at: db.fn.now() });
}

/** The live tokens a person made, for capping or revoking them when the person changes. */
export async function liveApiTokensOf(organisationId: string, userId: string, trx: Knex = db): Promise<{ id: string; role: Role }[]> {
  return trx("api_tokens").where({ organisation_id: organisationId, created_by: userId }).whereNull("revoked_at").orderBy("created_at").select("id", "role");
}

export async function setApiTokenRole(organisationId: string, id: string, role: Role, trx: Knex = db): Promise<void> {
  await trx("api_tokens").where({ organisation_id: organisationId, id }).update({ role });
}
