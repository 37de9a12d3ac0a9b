import type { Knex } from "knex";
import type { ItemKind, ItemStatus } from "@/lib/stock/labels";
import { db, preparedFirst } from "./index";

// Stock queries. Every function takes the organisation id and filters on it, except the
// tag lookup, which finds the one item a printed code names. This file owns the shapes of
// an item as it is read (ItemRecord) and written (ItemFields, NewItem, ItemUpdate), and
// their mapping to the columns.

/** What an item's details decide: the same whether it came in by the form, the API or an import. */
export interface ItemFields {
  kind: ItemKind;
  grade: number | null;
  gradeMarked: boolean;
  size: string | null;
  lengthMm: number | null;
  markedWllLb: number | null;
  serial: string | null;
  yardId: string | null;
  /** YYYY-MM-DD */
  inServiceOn: string | null;
  costCents: number | null;
  details: Record<string, unknown>;
  /** The effective WLL the rated-limit engine gives the item; null when it cannot be rated. */
  wllLb: number | null;
  wllSource: string | null;
}

/** An item as every query answers it: one row per physical piece of gear, with its yard's name. */
export interface ItemRecord extends ItemFields {
  id: string;
  tagCode: string;
  status: ItemStatus;
  yardName: string | null;
  /** YYYY-MM-DD, or null when no periodic inspection is scheduled. */
  nextInspectionDue: string | null;
  lastCheckedAt: Date | null;
  /** Whether the last pre-use check passed; null when none is recorded. */
  lastCheckPassed: boolean | null;
  /** YYYY-MM-DD */
  lastInspectedOn: string | null;
}

const ITEM_COLUMNS = [
  "i.id", "i.tag_code as tagCode", "i.kind", "i.grade", "i.grade_marked as gradeMarked", "i.size",
  "i.length_mm as lengthMm", "i.marked_wll_lb as markedWllLb", "i.wll_lb as wllLb", "i.wll_source as wllSource",
  "i.serial", "i.status", "i.yard_id as yardId", "y.name as yardName",
  db.raw("to_char(i.next_inspection_due, 'YYYY-MM-DD') as \"nextInspectionDue\""),
  "i.last_checked_at as lastCheckedAt",
  "i.last_check_passed as lastCheckPassed",
  db.raw("to_char(i.last_inspected_on, 'YYYY-MM-DD') as \"lastInspectedOn\""),
  "i.details",
  db.raw("to_char(i.in_service_on, 'YYYY-MM-DD') as \"inServiceOn\""),
  "i.cost_cents as costCents",
];

/** The columns of ItemFields, by field. */
const FIELD_COLUMN = {
  kind: "kind", grade: "grade", gradeMarked: "grade_marked", size: "size", lengthMm: "length_mm", markedWllLb: "marked_wll_lb",
  serial: "serial", yardId: "yard_id", inServiceOn: "in_service_on", costCents: "cost_cents", details: "details", wllLb: "wll_lb",
  wllSource: "wll_source",
} as const satisfies Record<keyof ItemFields, string>;

/** Every item field with its column, in one fixed order (the columns of a bulk load). */
export const ITEM_FIELD_COLUMNS = Object.entries(FIELD_COLUMN) as [keyof ItemFields, string][];

/**
 * Item fields as columns (snake case): what an insert or an update writes (details as JSON
 * text), or what an import's undo record keeps inside its own JSON (details as an object).
 */
export function fieldColumns(fields: Partial<ItemFields>, details: "text" | "object" = "text"): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, column] of Object.entries(FIELD_COLUMN)) {
    const value = fields[key as keyof ItemFields];
    if (value !== undefined) out[column] = key === "details" && details === "text" ? JSON.stringify(value) : value;
  }
  return out;
}

/** The reverse of {@link fieldColumns}, for values kept as JSON columns (an import's undo record). */
export function fieldsFromColumns(columns: Record<string, unknown>): Partial<ItemFields> {
  const out: Record<string, unknown> = {};
  for (const [key, column] of Object.entries(FIELD_COLUMN)) if (column in columns) out[key] = columns[column];
  return out as Partial<ItemFields>;
}

function base(trx: Knex = db) {
  return trx("items as i").leftJoin("yards as y", "y.id", "i.yard_id");
}

export interface ItemFilters {
  kind?: string;
  /** Any of these statuses. */
  status?: readonly string[];
  yardId?: string;
  /** Only items without a WLL. */
  unrated?: boolean;
  /** Only items with a WLL. */
  rated?: boolean;
  /** Inspection not due before this date, or none scheduled: not overdue, when it is the organisation's today. */
  notDueBefore?: string;
  /** Inspection due before this date (YYYY-MM-DD): overdue, when it is the organisation's today. */
  dueBefore?: string;
  /** Inspection due on or after this date (YYYY-MM-DD). */
  dueFrom?: string;
  /** Inspection due on or before this date (YYYY-MM-DD). */
  dueBy?: string;
  q?: string;
}

export const SORTABLE = {
  tagCode: "i.tag_code",
  kind: "i.kind",
  grade: "i.grade",
  size: "i.size",
  wllLb: "i.wll_lb",
  status: "i.status",
  yardName: "y.name",
  nextInspectionDue: "i.next_inspection_due",
  serial: "i.serial",
} as const;
export type SortKey = keyof typeof SORTABLE;

export function applyFilters(query: Knex.QueryBuilder, organisationId: string, f: ItemFilters) {
  query.where("i.organisation_id", organisationId);
  if (f.kind) query.where("i.kind", f.kind);
  if (f.status?.length) query.whereIn("i.status", f.status);
  if (f.yardId) query.where("i.yard_id", f.yardId);
  if (f.unrated) query.where((w) => w.whereNull("i.wll_lb").orWhere("i.wll_lb", "<=", 0));
  if (f.rated) query.where("i.wll_lb", ">", 0);
  if (f.notDueBefore) query.where((w) => w.whereNull("i.next_inspection_due").orWhere("i.next_inspection_due", ">=", f.notDueBefore!));
  if (f.dueBefore) query.where("i.next_inspection_due", "<", f.dueBefore);
  if (f.dueFrom) query.where("i.next_inspection_due", ">=", f.dueFrom);
  if (f.dueBy) query.where("i.next_inspection_due", "<=", f.dueBy);
  if (f.q) {
    const q = f.q.trim().toUpperCase();
    const compact = q.replace(/[\s-]/g, "");
    query.where((w) => {
      w.where("i.tag_code", "like", `${compact.slice(0, 4)}${compact.length > 4 ? "-" + compact.slice(4) : ""}%`)
        .orWhereRaw("upper(i.serial) like ?", [`${q}%`]);
    });
  }
  return query;
}

/** One page of the stock list, with the page count for the table's pager. */
export async function listItems(
  organisationId: string,
  options: ItemFilters & { page: number; perPage: number; sort: SortKey; order: "asc" | "desc" },
): Promise<{ data: ItemRecord[]; pageCount: number; total: number }> {
  const counted = await applyFilters(base().count<{ count: string }[]>("i.id as count"), organisationId, options);
  const total = Number(counted[0]?.count ?? 0);
  const data = await applyFilters(base().select(ITEM_COLUMNS), organisationId, options)
    .orderByRaw(`${SORTABLE[options.sort]} ${options.order} nulls last, i.tag_code asc`)
    .limit(options.perPage)
    .offset((options.page - 1) * options.perPage);
  return { data, pageCount: Math.max(1, Math.ceil(total / options.perPage)), total };
}

/**
 * Every item the stock list's filters select, in the list's order, read through a server-side
 * cursor a batch at a time (for the CSV export: memory holds one batch, whatever the stock).
 * Stopping the iteration early closes the cursor.
 */
export async function* streamItems(
  organisationId: string,
  options: ItemFilters & { sort: SortKey; order: "asc" | "desc" },
  batchSize = 1000,
): AsyncGenerator<ItemRecord[]> {
  const { sql, bindings } = applyFilters(base().select(ITEM_COLUMNS), organisationId, options)
    .orderByRaw(`${SORTABLE[options.sort]} ${options.order} nulls last, i.tag_code asc`)
    .toSQL();
  const trx = await db.transaction({ readOnly: true });
  try {
    await trx.raw(`DECLARE stock_export NO SCROLL CURSOR FOR ${sql}`, bindings);
    for (;;) {
      const { rows } = await trx.raw(`FETCH ${Math.max(1, Math.floor(batchSize))} FROM stock_export`);
      if (!rows.length) break;
      yield rows as ItemRecord[];
    }
  } finally {
    await trx.rollback().catch(() => undefined);
  }
}

export async function getItem(organisationId: string, id: string, trx: Knex = db): Promise<ItemRecord | undefined> {
  return base(trx).where({ "i.organisation_id": organisationId, "i.id": id }).first(ITEM_COLUMNS);
}

export async function getItemsByIds(organisationId: string, ids: string[], trx: Knex = db): Promise<ItemRecord[]> {
  return base(trx).where("i.organisation_id", organisationId).whereIn("i.id", ids).orderBy("i.tag_code").select(ITEM_COLUMNS);
}

// The scan's lookup is the most frequent query of all: built once, prepared on each connection.
const byTag = preparedFirst<ItemRecord & { organisationId: string }>(
  "item_by_tag",
  base().where("i.tag_code", "").first([...ITEM_COLUMNS, "i.organisation_id as organisationId"]),
);

/** By printed tag code, in any organisation (callers check the organisation). */
export function findItemByTag(tagCode: string): Promise<(ItemRecord & { organisationId: string }) | undefined> {
  return byTag(tagCode);
}

export async function serialTaken(organisationId: string, serial: string, exceptId?: string, trx: Knex = db): Promise<boolean> {
  const q = trx("items").where({ organisation_id: organisationId, serial });
  if (exceptId) q.whereNot("id", exceptId);
  return Boolean(await q.first("id"));
}

/** Items of the organisation with any of these serials or tag codes (an import matches its rows with them). */
export async function findItemsByKeys(organisationId: string, serials: string[], tagCodes: string[], trx: Knex = db): Promise<ItemRecord[]> {
  // Two arrays as two parameters, not a parameter per key: a chunk of an import asks for a thousand.
  return base(trx)
    .where("i.organisation_id", organisationId)
    .where((w) => w.whereRaw("i.serial = ANY(?::text[])", [serials]).orWhereRaw("i.tag_code = ANY(?::text[])", [tagCodes]))
    .select(ITEM_COLUMNS);
}

/** Which of these tag codes an item already has, in any organisation (codes are unique). */
export async function existingTagCodes(codes: string[], trx: Knex = db): Promise<Set<string>> {
  return new Set(await trx("items").whereRaw("tag_code = ANY(?::text[])", [codes]).pluck("tag_code"));
}

/** A new item: its fields, its tag code, its first status and inspection date. */
export interface NewItem extends ItemFields {
  organisationId: string;
  tagCode: string;
  status: ItemStatus;
  nextInspectionDue: string | null;
  /** The import that added it, so that the import can be undone. */
  importBatchId?: string;
}

/** Inserts items; answers their ids in the same order. */
export async function insertItems(items: NewItem[], trx: Knex): Promise<string[]> {
  if (!items.length) return [];
  const rows = items.map((i) => ({
    ...fieldColumns(i),
    organisation_id: i.organisationId,
    tag_code: i.tagCode,
    status: i.status,
    next_inspection_due: i.nextInspectionDue,
    import_batch_id: i.importBatchId ?? null,
  }));
  const out = await trx("items").insert(rows).returning("id");
  return out.map((r: { id: string }) => r.id);
}

/**
 * What a change of an item may set besides its fields. `checked` records a pre-use check:
 * its outcome, and its time from the database's clock.
 */
export interface ItemUpdate extends Partial<ItemFields> {
  status?: ItemStatus;
  lastInspectedOn?: string;
  nextInspectionDue?: string | null;
  checked?: "pass" | "fail";
}

export async function updateItem(organisationId: string, id: string, update: ItemUpdate, trx: Knex): Promise<void> {
  const { status, lastInspectedOn, nextInspectionDue, checked, ...fields } = update;
  await trx("items")
    .where({ organisation_id: organisationId, id })
    .update({
      ...fieldColumns(fields),
      ...(status !== undefined && { status }),
      ...(lastInspectedOn !== undefined && { last_inspected_on: lastInspectedOn }),
      ...(nextInspectionDue !== undefined && { next_inspection_due: nextInspectionDue }),
      ...(checked && { last_checked_at: trx.fn.now(), last_check_passed: checked === "pass" }),
      updated_at: trx.fn.now(),
    });
}

export async function setYard(organisationId: string, ids: string[], yardId: string, trx: Knex): Promise<void> {
  await trx("items").where({ organisation_id: organisationId }).whereIn("id", ids).update({ yard_id: yardId, updated_at: trx.fn.now() });
}

/** Locks an item row for a state change (check, tag-out, inspection) inside a transaction. */
export async function lockItem(organisationId: string, id: string, trx: Knex) {
  return trx("items").where({ organisation_id: organisationId, id }).forUpdate().first("id", "kind", "status", "size", "tag_code as tagCode");
}

// Service history

export interface ItemEventInput {
  organisationId: string;
  itemId: string;
  type: string;
  outcome?: string | null;
  checklist?: unknown;
  measurements?: unknown;
  note?: string | null;
  changes?: unknown;
  correctsEventId?: number | null;
  actorId: string | null;
}

/** Appends history entries (never changed afterwards); answers their ids in the same order. */
export async function insertEvents(events: ItemEventInput[], trx: Knex): Promise<number[]> {
  if (!events.length) return [];
  const json = (v: unknown) => (v === undefined ? null : JSON.stringify(v));
  const rows = await trx("item_events")
    .insert(
      events.map((e) => ({
        organisation_id: e.organisationId,
        item_id: e.itemId,
        type: e.type,
        outcome: e.outcome ?? null,
        checklist: json(e.checklist),
        measurements: json(e.measurements),
        note: e.note ?? null,
        changes: json(e.changes),
        corrects_event_id: e.correctsEventId ?? null,
        actor_id: e.actorId,
      })),
    )
    .returning("id");
  return rows.map((r: { id: string | number }) => Number(r.id));
}

/** Whether an item has a history entry of that id (in the organisation). */
export async function eventExists(organisationId: string, itemId: string, eventId: number, trx: Knex = db): Promise<boolean> {
  return Boolean(await trx("item_events").where({ organisation_id: organisationId, item_id: itemId, id: eventId }).first("id"));
}

export async function listEvents(organisationId: string, itemId: string) {
  const events = await db("item_events as e")
    .leftJoin("users as u", "u.id", "e.actor_id")
    .where({ "e.organisation_id": organisationId, "e.item_id": itemId })
    .orderBy("e.id", "desc")
    .select(
      "e.id", "e.type", "e.outcome", "e.checklist", "e.measurements", "e.note", "e.changes",
      "e.corrects_event_id as correctsEventId", "e.at", "u.name as actorName",
    );
  const files = await db("attachments")
    .where({ organisation_id: organisationId, item_id: itemId })
    .select("id", "event_id as eventId", "purpose", "content_type as contentType", "size_bytes as sizeBytes", "original_name as originalName");
  return events.map((e) => ({
    ...e,
    id: Number(e.id),
    correctsEventId: e.correctsEventId == null ? null : Number(e.correctsEventId),
    attachments: files.filter((f) => Number(f.eventId) === Number(e.id)),
  }));
}

export async function insertAttachment(
  a: { organisationId: string; itemId: string; eventId: number | null; purpose: string; storageKey: string; contentType: string; sizeBytes: number; originalName: string; createdBy: string },
  trx: Knex,
) {
  await trx("attachments").insert({
    organisation_id: a.organisationId,
    item_id: a.itemId,
    event_id: a.eventId,
    purpose: a.purpose,
    storage_key: a.storageKey,
    content_type: a.contentType,
    size_bytes: a.sizeBytes,
    original_name: a.originalName,
    created_by: a.createdBy,
  });
}

export async function getAttachment(organisationId: string, id: string) {
  return db("attachments").where({ organisation_id: organisationId, id }).first("storage_key as storageKey", "content_type as contentType", "original_name as originalName");
}

// Yards

export async function listYards(organisationId: string) {
  return db("yards").where({ organisation_id: organisationId }).orderBy("name").select("id", "name");
}

export async function yardBelongs(organisationId: string, yardId: string, trx: Knex = db) {
  return Boolean(await getYard(organisationId, yardId, trx));
}

/** A yard of the organisation, or undefined. */
export async function getYard(organisationId: string, yardId: string, trx: Knex = db): Promise<{ id: string; name: string } | undefined> {
  return trx("yards").where({ organisation_id: organisationId, id: yardId }).first("id", "name");
}

// Dashboard counts

/** Items counted by what decides their verdict: status, rated or not, inspection overdue / due soon / later. */
export interface StockBucket {
  status: ItemStatus;
  rated: boolean;
  due: "overdue" | "soon" | "later" | "none";
  /** The earliest inspection date in the bucket (YYYY-MM-DD), or null. */
  firstDue: string | null;
  count: number;
}

/**
 * The organisation's stock in buckets of items that share a verdict on a day: by status,
 * rated or not, and inspection due before `today`, from `today` to `soonBy`, later, or never.
 */
export async function stockBuckets(organisationId: string, today: string, soonBy: string): Promise<StockBucket[]> {
  const rows = (await db("items")
    .where({ organisation_id: organisationId })
    .groupByRaw("1, 2, 3")
    .select(
      "status",
      db.raw("(wll_lb is not null and wll_lb > 0) as rated"),
      db.raw("case when next_inspection_due is null then 'none' when next_inspection_due < ? then 'overdue' when next_inspection_due <= ? then 'soon' else 'later' end as due", [today, soonBy]),
      db.raw("to_char(min(next_inspection_due), 'YYYY-MM-DD') as \"firstDue\""),
    )
    .count("id as count")) as unknown as { status: string; rated: boolean; due: string; firstDue: string | null; count: string }[];
  return rows.map((r) => ({ status: r.status as ItemStatus, rated: Boolean(r.rated), due: r.due as StockBucket["due"], firstDue: (r.firstDue as string | null) ?? null, count: Number(r.count) }));
}

// Public tag view rate limiting

export async function recordTagLookup(ip: string, found: boolean) {
  await db("tag_lookups").insert({ ip, found });
  // Only the last few minutes matter for the limit: drop this address's older rows.
  await db("tag_lookups").where({ ip }).where("at", "<", db.raw("now() - interval '1 day'")).delete();
}

export async function recentTagMisses(ip: string, since: Date): Promise<number> {
  const row = await db("tag_lookups").where({ ip, found: false }).where("at", ">", since).count<{ count: string }>("id as count").first();
  return Number(row?.count ?? 0);
}
