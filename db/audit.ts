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

/** Which audit rows: by whom, which actions, in which period, older than a row (the next page). */
export interface AuditFilters {
  actorId?: string;
  /** Any of these actions (a kind of change). */
  actions?: readonly string[];
  /** From this instant (included). */
  since?: Date;
  /** Before this instant (excluded). */
  until?: Date;
  /** Only rows older than this one (paging, newest first). */
  beforeId?: number;
}

/** An audit row as the log shows it. `action` is a string: rows outlive renamed actions. */
export interface AuditRow {
  id: number;
  at: Date;
  action: string;
  entity: string;
  entityId: string | null;
  actorName: string | null;
  /** What the row concerns by name, where the log knows it: an item's tag code, a kit's job, a person's, machine's or trailer's name. */
  label: string | null;
  after: unknown;
}

function auditQuery(organisationId: string, f: AuditFilters) {
  const q = db("audit_log as a")
    .leftJoin("users as u", "u.id", "a.actor_id")
    .joinRaw("left join items as it on a.entity = 'item' and it.id::text = a.entity_id and it.organisation_id = a.organisation_id")
    .joinRaw("left join kits as k on a.entity = 'kit' and k.id::text = a.entity_id and k.organisation_id = a.organisation_id")
    .joinRaw("left join machines as m on a.entity = 'machine' and m.id::text = a.entity_id and m.organisation_id = a.organisation_id")
    .joinRaw("left join trailers as t on a.entity = 'trailer' and t.id::text = a.entity_id and t.organisation_id = a.organisation_id")
    .joinRaw("left join users as p on a.entity = 'user' and p.id = a.entity_id and p.organisation_id = a.organisation_id")
    .where("a.organisation_id", organisationId);
  if (f.actorId) q.where("a.actor_id", f.actorId);
  if (f.actions) q.whereIn("a.action", [...f.actions]);
  if (f.since) q.where("a.at", ">=", f.since);
  if (f.until) q.where("a.at", "<", f.until);
  if (f.beforeId) q.where("a.id", "<", f.beforeId);
  return q.select(
    "a.id", "a.at", "a.action", "a.entity", "a.entity_id as entityId", "u.name as actorName", "a.after",
    db.raw("coalesce(it.tag_code, k.job, m.name, t.name, p.name) as label"),
  );
}

/** Audit rows, newest first, at most `limit`. */
export async function listAudit(organisationId: string, f: AuditFilters = {}, limit = 100): Promise<AuditRow[]> {
  const rows = await auditQuery(organisationId, f).orderBy("a.id", "desc").limit(limit);
  return rows.map((r: AuditRow & { id: string | number }) => ({ ...r, id: Number(r.id) }));
}

/**
 * Every audit row the filters select, newest first, read through a server-side cursor a
 * batch at a time (the CSV). Stopping the iteration early closes the cursor.
 */
export async function* streamAudit(organisationId: string, f: AuditFilters, batchSize = 1000): AsyncGenerator<AuditRow[]> {
  const { sql, bindings } = auditQuery(organisationId, f).orderBy("a.id", "desc").toSQL();
  const trx = await db.transaction({ readOnly: true });
  try {
    await trx.raw(`DECLARE audit_export NO SCROLL CURSOR FOR ${sql}`, bindings);
    for (;;) {
      const { rows } = await trx.raw(`FETCH ${Math.max(1, Math.floor(batchSize))} FROM audit_export`);
      if (!rows.length) break;
      yield rows.map((r: AuditRow & { id: string | number }) => ({ ...r, id: Number(r.id) }));
    }
  } finally {
    await trx.rollback().catch(() => undefined);
  }
}

/** The people of the organisation who made a change in the log (the filter's choices), by name. */
export async function auditActors(organisationId: string): Promise<{ id: string; name: string }[]> {
  return db("users as u")
    .where("u.organisation_id", organisationId)
    .whereExists(db("audit_log as a").whereRaw("a.actor_id = u.id").where("a.organisation_id", organisationId).select(db.raw("1")))
    .orderBy("u.name")
    .select("u.id", "u.name");
}
