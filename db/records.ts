import type { Knex } from "knex";
import type { ItemKind, ItemStatus } from "@/lib/stock/labels";
import { db } from "./index";
import { applyFilters, type ItemFilters } from "./items";

// The inspection and service record an auditor or insurer asks for: every history entry of
// the chosen items in a period, with the item as it stands and who made the entry. Kit
// entries (loaded, returned) are left out: they record use, not inspection or service.

/** Which entries: of the items the stock list's filters select (or one item), in a period. */
export interface RecordFilters extends Pick<ItemFilters, "kind" | "status" | "q"> {
  itemId?: string;
  /** The first instant of the period, or null for the item's whole history. */
  since: Date | null;
  /** The instant after the period (exclusive). */
  until: Date;
}

/** One history entry of the record, with its item. */
export interface RecordEvent {
  id: number;
  at: Date;
  type: string;
  outcome: string | null;
  checklist: { id: string; label: string; defect: boolean }[] | null;
  measurements: { id: string; label: string; value: number; unit: string; limit: string; exceeded: boolean; source?: string }[] | null;
  note: string | null;
  changes: Record<string, [unknown, unknown]> | null;
  correctsEventId: number | null;
  actorName: string | null;
  /** Names of the photos and certificates filed with the entry. */
  files: string[];
  itemId: string;
  tagCode: string;
  kind: ItemKind;
  grade: number | null;
  size: string | null;
  serial: string | null;
  wllLb: number | null;
  /** The item's status now. */
  status: ItemStatus;
}

const RECORD_COLUMNS = [
  "e.id", "e.at", "e.type", "e.outcome", "e.checklist", "e.measurements", "e.note", "e.changes",
  "e.corrects_event_id as correctsEventId", "u.name as actorName",
  db.raw(`coalesce((select array_agg(a.original_name order by a.created_at) from attachments a
    where a.event_id = e.id and a.organisation_id = e.organisation_id), '{}') as files`),
  "i.id as itemId", "i.tag_code as tagCode", "i.kind", "i.grade", "i.size", "i.serial", "i.wll_lb as wllLb", "i.status",
];

function recordQuery(organisationId: string, f: RecordFilters): Knex.QueryBuilder {
  const query = db("item_events as e")
    .join("items as i", function () {
      this.on("i.id", "e.item_id").andOn("i.organisation_id", "e.organisation_id");
    })
    .leftJoin("users as u", "u.id", "e.actor_id")
    .where("e.organisation_id", organisationId)
    .whereNot("e.type", "kit")
    .where("e.at", "<", f.until);
  if (f.since) query.where("e.at", ">=", f.since);
  if (f.itemId) query.where("i.id", f.itemId);
  applyFilters(query, organisationId, { kind: f.kind, status: f.status, q: f.q });
  return query;
}

const toEvent = (r: RecordEvent & { id: string | number; correctsEventId: string | number | null }): RecordEvent => ({
  ...r,
  id: Number(r.id),
  correctsEventId: r.correctsEventId == null ? null : Number(r.correctsEventId),
});

/** How many entries the filters select. */
export async function countRecordEvents(organisationId: string, f: RecordFilters): Promise<number> {
  const [row] = await recordQuery(organisationId, f).count<{ count: string }[]>("e.id as count");
  return Number(row?.count ?? 0);
}

/** The entries, item by item (tag code), each item's oldest first; at most `limit`. */
export async function listRecordEvents(organisationId: string, f: RecordFilters, limit: number): Promise<RecordEvent[]> {
  const rows = await recordQuery(organisationId, f).orderBy([{ column: "i.tag_code" }, { column: "e.id" }]).limit(limit).select(RECORD_COLUMNS);
  return rows.map(toEvent);
}

/**
 * Every entry the filters select, in the order of {@link listRecordEvents}, read through a
 * server-side cursor a batch at a time (the CSV: memory holds one batch, whatever the period).
 * Stopping the iteration early closes the cursor.
 */
export async function* streamRecordEvents(organisationId: string, f: RecordFilters, batchSize = 1000): AsyncGenerator<RecordEvent[]> {
  const { sql, bindings } = recordQuery(organisationId, f).orderBy([{ column: "i.tag_code" }, { column: "e.id" }]).select(RECORD_COLUMNS).toSQL();
  const trx = await db.transaction({ readOnly: true });
  try {
    await trx.raw(`DECLARE record_export NO SCROLL CURSOR FOR ${sql}`, bindings);
    for (;;) {
      const { rows } = await trx.raw(`FETCH ${Math.max(1, Math.floor(batchSize))} FROM record_export`);
      if (!rows.length) break;
      yield rows.map(toEvent);
    }
  } finally {
    await trx.rollback().catch(() => undefined);
  }
}

/** The people who made the entries in the selection, with how many each: the report's "inspected by". */
export async function recordPeople(organisationId: string, f: RecordFilters): Promise<{ name: string | null; inspections: number; checks: number }[]> {
  const rows = (await recordQuery(organisationId, f)
    .groupBy("u.name")
    .orderBy("u.name")
    .select("u.name as name")
    .select(db.raw("count(*) filter (where e.type = 'inspection') as inspections"))
    .select(db.raw("count(*) filter (where e.type = 'check') as checks"))) as unknown as { name: string | null; inspections: string; checks: string }[];
  return rows.map((r) => ({ name: r.name, inspections: Number(r.inspections), checks: Number(r.checks) }));
}
