import { randomUUID } from "node:crypto";
import type { Knex } from "knex";
import { db } from "./index";
import type { ItemKind } from "@/lib/stock/labels";
import { copyRows, copyText } from "./copy";
import { fieldColumns, fieldsFromColumns, ITEM_FIELD_COLUMNS, type ItemFields } from "./items";

// CSV import batches, the values an import replaced, saved column mappings, and the bulk
// writes of an import. Every function takes the organisation id and filters on it.

export interface BatchRow {
  id: string;
  createdAt: Date;
  finishedAt: Date | null;
  createdBy: string;
  createdByName: string | null;
  fileName: string;
  fileKey: string | null;
  fileBytes: number;
  rejectedKey: string | null;
  delimiter: string | null;
  encoding: string | null;
  mapping: Record<string, string | null>;
  validOnly: boolean;
  status: "running" | "committed" | "undone";
  rowsProcessed: number;
  bytesProcessed: number;
  rowsTotal: number;
  created: number;
  updated: number;
  unchanged: number;
  rejected: number;
  lastEventId: number | null;
  undoneAt: Date | null;
  undoneByName: string | null;
}

const BATCH_COLUMNS = [
  "b.id", "b.created_at as createdAt", "b.finished_at as finishedAt", "b.created_by as createdBy", "u.name as createdByName",
  "b.file_name as fileName", "b.file_key as fileKey", "b.file_bytes as fileBytes", "b.rejected_key as rejectedKey",
  "b.delimiter", "b.encoding", "b.mapping", "b.valid_only as validOnly", "b.status", "b.rows_processed as rowsProcessed",
  "b.bytes_processed as bytesProcessed", "b.rows_total as rowsTotal", "b.created_count as created", "b.updated_count as updated",
  "b.unchanged_count as unchanged", "b.rejected_count as rejected", "b.last_event_id as lastEventId", "b.undone_at as undoneAt",
  "v.name as undoneByName",
];

const batchBase = (trx: Knex = db) =>
  trx("import_batches as b").leftJoin("users as u", "u.id", "b.created_by").leftJoin("users as v", "v.id", "b.undone_by");

/** bigint columns come back from pg as strings. */
type BatchColumns = Omit<BatchRow, "fileBytes" | "bytesProcessed" | "lastEventId"> & {
  fileBytes: string | number;
  bytesProcessed: string | number;
  lastEventId: string | number | null;
};

const toBatch = (r: BatchColumns): BatchRow => ({
  ...r,
  fileBytes: Number(r.fileBytes),
  bytesProcessed: Number(r.bytesProcessed),
  lastEventId: r.lastEventId == null ? null : Number(r.lastEventId),
});

export async function batchIdTaken(id: string): Promise<boolean> {
  return Boolean(await db("import_batches").where({ id }).first("id"));
}

/** The batch row of an import that is starting: committed at once, so that its progress can be read. */
export async function insertBatch(b: {
  id: string; organisationId: string; createdBy: string; fileName: string; fileKey: string; fileBytes: number;
  delimiter: string; encoding: string; mapping: unknown; validOnly: boolean;
}): Promise<void> {
  await db("import_batches").insert({
    id: b.id, organisation_id: b.organisationId, created_by: b.createdBy, file_name: b.fileName, file_key: b.fileKey,
    file_bytes: b.fileBytes, delimiter: b.delimiter, encoding: b.encoding, mapping: JSON.stringify(b.mapping), valid_only: b.validOnly,
  });
}

/** Progress of a running import, written outside its transaction so that the page can poll it. */
export async function recordProgress(id: string, rowsProcessed: number, bytesProcessed: number): Promise<void> {
  await db("import_batches").where({ id, status: "running" }).update({ rows_processed: rowsProcessed, bytes_processed: bytesProcessed });
}

/** Removes the batch row of an import that did not go in (its transaction was rolled back). */
export async function deleteBatch(id: string): Promise<void> {
  await db("import_batches").where({ id, status: "running" }).delete();
}

export async function finishBatch(
  trx: Knex,
  id: string,
  f: { mapping: unknown; rowsTotal: number; created: number; updated: number; unchanged: number; rejected: number; rejectedKey: string | null; lastEventId: number | null; bytes: number },
): Promise<void> {
  await trx("import_batches").where({ id }).update({
    status: "committed", finished_at: trx.raw("clock_timestamp()"), mapping: JSON.stringify(f.mapping), rows_total: f.rowsTotal, rows_processed: f.rowsTotal,
    bytes_processed: f.bytes, created_count: f.created, updated_count: f.updated, unchanged_count: f.unchanged,
    rejected_count: f.rejected, rejected_key: f.rejectedKey, last_event_id: f.lastEventId,
  });
}

export async function listBatches(organisationId: string, limit = 100): Promise<BatchRow[]> {
  const rows: BatchColumns[] = await batchBase().where("b.organisation_id", organisationId).orderBy("b.created_at", "desc").limit(limit).select(BATCH_COLUMNS);
  return rows.map(toBatch);
}

export async function getBatch(organisationId: string, id: string, trx: Knex = db): Promise<BatchRow | undefined> {
  const row: BatchColumns | undefined = await batchBase(trx).where({ "b.organisation_id": organisationId, "b.id": id }).first(BATCH_COLUMNS);
  return row ? toBatch(row) : undefined;
}

export async function lockBatch(organisationId: string, id: string, trx: Knex) {
  return trx("import_batches").where({ organisation_id: organisationId, id }).forUpdate().first("id", "status", "last_event_id as lastEventId", "file_name as fileName", "created_count as created", "updated_count as updated");
}

/** Ids of the items an import added, by tag code. */
export async function createdItemIds(organisationId: string, batchId: string, limit?: number): Promise<string[]> {
  const q = db("items").where({ organisation_id: organisationId, import_batch_id: batchId }).orderBy("tag_code").pluck("id");
  return limit ? q.limit(limit) : q;
}

/** The items an import added, by tag code: what the done page lists beside "Print N tags". */
export async function createdItems(organisationId: string, batchId: string, limit: number) {
  return db("items")
    .where({ organisation_id: organisationId, import_batch_id: batchId })
    .orderBy("tag_code")
    .limit(limit)
    .select<{ id: string; tagCode: string; kind: ItemKind; grade: number | null; size: string | null; details: Record<string, unknown>; serial: string | null }[]>(
      "id", "tag_code as tagCode", "kind", "grade", "size", "details", "serial",
    );
}

/**
 * Whether any item of the batch (added or updated by it) has a history entry after the
 * import's own: the first such entry, or undefined.
 */
export async function laterEvent(organisationId: string, batchId: string, lastEventId: number, trx: Knex = db) {
  return trx("item_events as e")
    .join("items as i", "i.id", "e.item_id")
    .where("e.organisation_id", organisationId)
    .where("e.id", ">", lastEventId)
    .where((w) => w.where("i.import_batch_id", batchId).orWhereIn("e.item_id", trx("import_updates").where({ batch_id: batchId }).select("item_id")))
    .orderBy("e.id")
    .first("e.type", "i.tag_code as tagCode");
}

/** Serializes imports of one organisation: a second import waits for the first to finish. */
export async function lockOrganisationImports(trx: Knex, organisationId: string): Promise<void> {
  await trx.raw("SELECT pg_advisory_xact_lock(hashtext(?))", [`linkyard-import:${organisationId}`]);
}

// The writes of a commit, a chunk at a time, with COPY (db/copy.ts) inside the import's
// transaction: the new items and their history entries go straight into their tables (their
// ids are made here, so no round trip is needed to learn them); the changed items go through
// a temporary table and one UPDATE.

/** Who writes an import, and which. */
export interface ImportWriter {
  organisationId: string;
  batchId: string;
  actorId: string;
}

/** A new item an import adds: its fields, its tag code, its first inspection date and the note of its 'imported' entry. */
export interface ImportedItem {
  fields: ItemFields;
  tagCode: string;
  nextInspectionDue: string | null;
  note: string;
}

/** A stored item an import changes: the fields it writes (all but the kind), what they replace, and its 'edited' entry. */
export interface ImportedUpdate {
  itemId: string;
  fields: Omit<ItemFields, "kind">;
  before: Partial<ItemFields>;
  changes: Record<string, [unknown, unknown]>;
  note: string;
}

const CHANGED_FIELDS = ITEM_FIELD_COLUMNS.filter(([key]) => key !== "kind");
const NEW_ITEM_COLUMNS = ["id", "organisation_id", "tag_code", "status", "next_inspection_due", "import_batch_id", ...ITEM_FIELD_COLUMNS.map(([, column]) => column)];

/** The temporary table a commit's updates go through, dropped with the transaction. */
export async function createImportWriteTable(trx: Knex): Promise<void> {
  await trx.raw(
    `CREATE TEMP TABLE import_changed_items (seq integer NOT NULL, item_id uuid NOT NULL, grade integer, grade_marked boolean, size text,
       length_mm integer, marked_wll_lb integer, serial text, yard_id uuid, in_service_on date, cost_cents integer, details jsonb,
       wll_lb integer, wll_source text, before jsonb NOT NULL, after jsonb NOT NULL, changes jsonb NOT NULL, note text NOT NULL)
     ON COMMIT DROP`,
  );
}

/** The id of the last history entry this transaction's connection wrote (its own sequence value, not another's). */
async function lastEventId(trx: Knex): Promise<number> {
  const { rows } = await trx.raw("SELECT currval(pg_get_serial_sequence('item_events', 'id')) AS id");
  return Number(rows[0].id);
}

/** Adds new items of an import with their 'imported' history entries; answers the id of the last entry. */
export async function copyImportedItems(trx: Knex, w: ImportWriter, items: readonly ImportedItem[]): Promise<number | null> {
  if (!items.length) return null;
  // Both texts first: the items can then be let go while PostgreSQL writes (an import reads on meanwhile).
  const ids = items.map(() => randomUUID());
  const itemRows = copyText(
    items.map((item, i) => {
      const row: unknown[] = [ids[i], w.organisationId, item.tagCode, "in_service", item.nextInspectionDue, w.batchId];
      for (const [key] of ITEM_FIELD_COLUMNS) row.push(item.fields[key]);
      return row;
    }),
  );
  const eventRows = copyText(items.map((item, i) => [w.organisationId, ids[i], "imported", item.note, w.actorId]));
  await copyRows(trx, "items", NEW_ITEM_COLUMNS, itemRows);
  await copyRows(trx, "item_events", ["organisation_id", "item_id", "type", "note", "actor_id"], eventRows);
  return lastEventId(trx);
}

/**
 * Changes stored items of the organisation as an import's rows say, keeps what each change
 * replaced (for undo) and writes an 'edited' history entry for each; answers the id of the
 * last entry. An id that is not an item of the organisation changes nothing and is not recorded.
 */
export async function copyImportedUpdates(trx: Knex, w: ImportWriter, updates: readonly ImportedUpdate[]): Promise<number | null> {
  if (!updates.length) return null;
  const columns = CHANGED_FIELDS.map(([, column]) => column);
  await copyRows(
    trx, "import_changed_items", ["seq", "item_id", ...columns, "before", "after", "changes", "note"],
    updates.map((u, i) => [
      i, u.itemId, ...CHANGED_FIELDS.map(([key]) => u.fields[key as keyof typeof u.fields]),
      fieldColumns(u.before, "object"), fieldColumns(u.fields, "object"), u.changes, u.note,
    ]),
  );
  const { rows } = await trx.raw(
    `WITH upd AS (UPDATE items i SET ${columns.map((c) => `${c} = s.${c}`).join(", ")}, updated_at = now()
                  FROM import_changed_items s WHERE i.organisation_id = ? AND i.id = s.item_id RETURNING i.id),
          done AS (SELECT s.* FROM import_changed_items s JOIN upd ON upd.id = s.item_id),
          kept AS (INSERT INTO import_updates (batch_id, item_id, before, after) SELECT ?, item_id, before, after FROM done),
          ev AS (INSERT INTO item_events (organisation_id, item_id, type, note, changes, actor_id)
                 SELECT ?, item_id, 'edited', note, changes, ? FROM done ORDER BY seq RETURNING id)
     SELECT max(id) AS last FROM ev`,
    [w.organisationId, w.batchId, w.organisationId, w.actorId],
  );
  await trx.raw("TRUNCATE import_changed_items");
  return rows[0].last == null ? null : Number(rows[0].last);
}

export async function updatesOf(trx: Knex, batchId: string): Promise<{ itemId: string; before: Partial<ItemFields>; after: Partial<ItemFields> }[]> {
  const rows = await trx("import_updates").where({ batch_id: batchId }).select("item_id as itemId", "before", "after");
  return rows.map((r: { itemId: string; before: Record<string, unknown>; after: Record<string, unknown> }) => ({
    itemId: r.itemId,
    before: fieldsFromColumns(r.before),
    after: fieldsFromColumns(r.after),
  }));
}

/**
 * Retires every item an import added, frees their serials for a corrected file, and writes a
 * 'retired' history entry for each. Answers how many.
 */
export async function retireBatchItems(trx: Knex, organisationId: string, batchId: string, actorId: string): Promise<number> {
  const { rows } = await trx.raw(
    `WITH old AS (SELECT id, serial, status FROM items WHERE organisation_id = ? AND import_batch_id = ? FOR UPDATE),
          upd AS (UPDATE items i SET status = 'retired', serial = NULL, next_inspection_due = NULL, updated_at = now()
                  FROM old WHERE i.id = old.id RETURNING i.id, old.serial, old.status),
          ev AS (INSERT INTO item_events (organisation_id, item_id, type, note, changes, actor_id)
                 SELECT ?, id, 'retired', 'Import undone',
                        jsonb_build_object('status', jsonb_build_array(status, 'retired'))
                          || CASE WHEN serial IS NULL THEN '{}'::jsonb ELSE jsonb_build_object('serial', jsonb_build_array(serial, NULL)) END,
                        ? FROM upd RETURNING 1)
     SELECT count(*)::int AS n FROM ev`,
    [organisationId, batchId, organisationId, actorId],
  );
  return rows[0].n;
}

export async function markUndone(trx: Knex, batchId: string, actorId: string): Promise<void> {
  await trx("import_batches").where({ id: batchId }).update({ status: "undone", undone_at: trx.fn.now(), undone_by: actorId });
}

// Saved column mappings

export async function listMappings(organisationId: string) {
  return db("import_mappings").where({ organisation_id: organisationId }).orderBy("name").select("id", "name", "mapping", "updated_at as updatedAt");
}

/** Saves a mapping by name: one of the same name is replaced. Answers its id. */
export async function upsertMapping(organisationId: string, name: string, mapping: unknown, userId: string, trx: Knex): Promise<string> {
  const [row] = await trx("import_mappings")
    .insert({ organisation_id: organisationId, name, mapping: JSON.stringify(mapping), created_by: userId })
    .onConflict(["organisation_id", "name"])
    .merge({ mapping: JSON.stringify(mapping), updated_at: trx.fn.now() })
    .returning("id");
  return row.id;
}

/** Removes a saved mapping; answers whether there was one. */
export async function deleteMapping(organisationId: string, id: string, trx: Knex): Promise<boolean> {
  return (await trx("import_mappings").where({ organisation_id: organisationId, id }).delete()) > 0;
}
