import "server-only";
import type { Knex } from "knex";
import { db } from "@/db";
import { insertApiToken, liveApiTokensOf, revokeApiToken, setApiTokenRole } from "@/db/api-tokens";
import { writeAudit } from "@/db/audit";
import { notFound } from "@/lib/http/errors";
import { lowerRole, type Role } from "./roles";
import { hashSecret, newSecret } from "./secrets";
import type { Principal } from "./session";

/** Creates a bearer token; the secret is returned once and only its hash is stored. */
export async function createApiToken(actor: Principal, input: { name: string; role: Role }) {
  const secret = `lky_${newSecret(24)}`;
  await db.transaction(async (trx) => {
    const id = await insertApiToken(
      { organisationId: actor.organisationId, createdBy: actor.userId, name: input.name, role: input.role, tokenHash: hashSecret(secret) },
      trx,
    );
    await writeAudit({ organisationId: actor.organisationId, actorId: actor.userId, action: "api_token.created", entity: "api_token", entityId: id, after: input }, trx);
  });
  return secret;
}

export async function revokeToken(actor: Principal, id: string) {
  await db.transaction(async (trx) => {
    if (!(await revokeApiToken(actor.organisationId, id, trx))) throw notFound("No such API token.");
    await writeAudit({ organisationId: actor.organisationId, actorId: actor.userId, action: "api_token.revoked", entity: "api_token", entityId: id }, trx);
  });
}

/** Who changed a person, for the audit rows of their tokens. */
interface Change {
  organisationId: string;
  actorId: string;
}

/**
 * Lowers every live token of a person to at most their new role, with an audit row per
 * token. The token keeps working for what the new role allows; a later promotion does not
 * raise it again (make a new token for that). Call inside the transaction of the change.
 */
export async function capTokensOf(change: Change, userId: string, role: Role, trx: Knex): Promise<void> {
  for (const token of await liveApiTokensOf(change.organisationId, userId, trx)) {
    const capped = lowerRole(token.role, role);
    if (capped === token.role) continue;
    await setApiTokenRole(change.organisationId, token.id, capped, trx);
    await writeAudit({ ...change, action: "api_token.capped", entity: "api_token", entityId: token.id, before: { role: token.role }, after: { role: capped } }, trx);
  }
}

/** Revokes every live token of a person (disabled, or a new password), with an audit row per token. */
export async function revokeTokensOf(change: Change, userId: string, reason: "person disabled" | "password reset", trx: Knex): Promise<void> {
  for (const token of await liveApiTokensOf(change.organisationId, userId, trx)) {
    await revokeApiToken(change.organisationId, token.id, trx);
    await writeAudit({ ...change, action: "api_token.revoked", entity: "api_token", entityId: token.id, after: { reason } }, trx);
  }
}
