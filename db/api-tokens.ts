import type { Knex } from "knex";
import { db } from "./index";
import type { Role } from "@/lib/auth/roles";

export async function insertApiToken(
  t: { organisationId: string; createdBy: string; name: string; role: Role; tokenHash: string },
  trx: Knex = db,
): Promise<string> {
  const [row] = await trx("api_tokens")
    .insert({ organisation_id: t.organisationId, created_by: t.createdBy, name: t.name, role: t.role, token_hash: t.tokenHash })
    .returning("id");
  return row.id;
}

export async function listApiTokens(organisationId: string) {
  return db("api_tokens")
    .where({ organisation_id: organisationId })
    .whereNull("revoked_at")
    .orderBy("created_at", "desc")
    .select("id", "name", "role", "created_at as createdAt", "last_used_at as lastUsedAt");
}

export async function revokeApiToken(organisationId: string, id: string, trx: Knex = db): Promise<number> {
  return trx("api_tokens").where({ organisation_id: organisationId, id }).whereNull("revoked_at").update({ revoked_at: trx.fn.now() });
}
