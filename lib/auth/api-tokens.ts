import "server-only";
import { db } from "@/db";
import { insertApiToken, revokeApiToken } from "@/db/api-tokens";
import { writeAudit } from "@/db/audit";
import { notFound } from "@/lib/http/errors";
import type { Role } from "./roles";
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
