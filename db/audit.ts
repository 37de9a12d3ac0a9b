import type { Knex } from "knex";
import type { AuditAction } from "@/lib/audit/actions";
import { db } from "./index";

export interface AuditEntry {
  organisationId: string;
  actorId: string | null;
  action: AuditAction;
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

/** Who makes a change: a principal fits. */
export interface AuditActor {
  organisationId: string;
  userId: string | null;
}

/** What an audit row says; the organisation and the actor come from the change unless given. */
export type AuditFact = Omit<AuditEntry, "organisationId" | "actorId"> & Partial<Pick<AuditEntry, "organisationId" | "actorId">>;

/** Writes an audit row in the transaction of the change it records. */
export type Audit = (fact: AuditFact) => Promise<void>;

/**
 * The one way a change is written: one transaction, in which the work writes its audit rows
 * through `audit`, so a change and its record commit or roll back together. The actor is
 * null when the change comes from an e-mailed link: each fact then names who and where.
 * @example await audited(actor, async (tx, audit) => { await updateThing(tx); await audit({ action: "item.updated", entity: "item", entityId: id }); })
 */
export function audited<T>(actor: AuditActor | null, work: (tx: Knex.Transaction, audit: Audit) => Promise<T>): Promise<T> {
  return db.transaction((tx) =>
    work(tx, async (fact) => {
      const organisationId = fact.organisationId ?? actor?.organisationId;
      // Without an actor (a link from an e-mail), each fact names its organisation.
      if (!organisationId) throw new Error(`audit row "${fact.action}" without an organisation`);
      await writeAudit({ actorId: actor?.userId ?? null, ...fact, organisationId }, tx);
    }),
  );
}

/** The latest audit rows, newest first. `action` is a string: rows outlive renamed actions. */
export async function listAudit(organisationId: string, limit = 100): Promise<{ id: string; action: string; entity: string; entityId: string | null; at: Date; actorName: string | null }[]> {
  return db("audit_log as a")
    .leftJoin("users as u", "u.id", "a.actor_id")
    .where("a.organisation_id", organisationId)
    .orderBy("a.id", "desc")
    .limit(limit)
    .select("a.id", "a.action", "a.entity", "a.entity_id as entityId", "a.at", "u.name as actorName");
}
