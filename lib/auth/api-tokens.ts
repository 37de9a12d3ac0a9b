import "server-only";
import { insertApiToken, liveApiTokensOf, revokeApiToken, setApiTokenRole } from "@/db/api-tokens";
import { audited, type Audit } from "@/db/audit";
import type { Tx } from "@/db";
import { notFound } from "@/lib/http/errors";
import { lowerRole, type Role } from "./roles";
import { hashSecret, newSecret } from "./secrets";
import type { Principal } from "./session";

/** Creates a bearer token; the secret is returned once and only its hash is stored. */
export async function createApiToken(actor: Principal, input: { name: string; role: Role }) {
  const secret = `lky_${newSecret(24)}`;
  await audited(actor, async (tx, audit) => {
    const id = await insertApiToken(
      { organisationId: actor.organisationId, createdBy: actor.userId, name: input.name, role: input.role, tokenHash: hashSecret(secret) },
      tx,
    );
    await audit({ action: "api_token.created", entity: "api_token", entityId: id, after: input });
  });
  return secret;
}

export async function revokeToken(actor: Principal, id: string) {
  await audited(actor, async (tx, audit) => {
    if (!(await revokeApiToken(actor.organisationId, id, tx))) throw notFound("No such API token.");
    await audit({ action: "api_token.revoked", entity: "api_token", entityId: id });
  });
}

/**
 * Lowers every live token of a person to at most their new role, with an audit row per
 * token. The token keeps working for what the new role allows; a later promotion does not
 * raise it again (make a new token for that). Runs inside the transaction of the change.
 */
export async function capTokensOf(organisationId: string, userId: string, role: Role, audit: Audit, tx: Tx): Promise<void> {
  for (const token of await liveApiTokensOf(organisationId, userId, tx)) {
    const capped = lowerRole(token.role, role);
    if (capped === token.role) continue;
    await setApiTokenRole(organisationId, token.id, capped, tx);
    await audit({ action: "api_token.capped", entity: "api_token", entityId: token.id, before: { role: token.role }, after: { role: capped } });
  }
}

/** Revokes every live token of a person (disabled, or a new password), with an audit row per token. */
export async function revokeTokensOf(organisationId: string, userId: string, reason: "person disabled" | "password reset", audit: Audit, tx: Tx): Promise<void> {
  for (const token of await liveApiTokensOf(organisationId, userId, tx)) {
    await revokeApiToken(organisationId, token.id, tx);
    await audit({ action: "api_token.revoked", entity: "api_token", entityId: token.id, after: { reason } });
  }
}
