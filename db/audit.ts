import type { Knex } from "knex";
import { db } from "./index";

export interface AuditEntry {
  organisationId: string;
  actorId: string | null;
  action: string; // e.g. "person.invited", "item.updated"
  entity: string;
  entityId?: string | null;
  before?: unknown;
  after?: unknown;
}

/** Every mutation writes one row, inside the same transaction as the change. */
export async function writeAudit(entry: AuditEntry, trx: Knex = db): Promise<void> {
  await trx("audit_log").insert({
    organisation_id: entry.organisationId,
    actor_id: entry.actorId,
    action: entry.action,
    entity: entry.entity,
    entity_id: entry.entityId ?? null,
    before: entry.before === undefined ? null : JSON.stringify(entry.before),
    after: entry.after === undefined ? null : JSON.stringify(entry.after),
  });
}

export async function listAudit(organisationId: string, limit = 100) {
  return db("audit_log as a")
    .leftJoin("users as u", "u.id", "a.actor_id")
    .where("a.organisation_id", organisationId)
    .orderBy("a.id", "desc")
    .limit(limit)
    .select("a.id", "a.action", "a.entity", "a.entity_id as entityId", "a.at", "u.name as actorName");
}
