import "server-only";
import { randomUUID } from "node:crypto";
import { createReadStream, createWriteStream, type WriteStream } from "node:fs";
import { rm, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { finished } from "node:stream/promises";
import type { Knex } from "knex";
import { db } from "@/db";
import { writeAudit } from "@/db/audit";
import * as imports from "@/db/imports";
import { listYards } from "@/db/items";
import { getOrganisationSettings } from "@/db/people";
import type { Principal } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { csvLine } from "@/lib/import/csv-write";
import { detectEncoding, ENCODING_WORDS, fileRefusal, MAX_IMPORT_BYTES } from "@/lib/import/file-check";
import { commitRefusal, runImport, type ImportStore, type ImportSummary, type PreparedCreate, type PreparedUpdate } from "@/lib/import/pipeline";
import type { ExistingItem } from "@/lib/import/row";
import { openCsv } from "@/lib/import/source";
import { AppError, conflict, forbidden, notFound } from "@/lib/http/errors";
import type { SpooledFile } from "@/lib/http/multipart";
import { removeStored, storeFromDisk } from "@/lib/storage/files";
import { newTagCode } from "@/lib/tags/code";
import { intervalsWithDefaults, nextDue } from "./intervals";
import type { ItemKind } from "./labels";

// The CSV import of stock. A commit is ONE transaction: every row goes in, or, when the owner
// chose "only the valid rows", every valid row goes in and the rejected rows are kept as a
// file to fix and upload again; on any refusal or failure nothing of the file is left behind.
// The upload is read from disk as a stream and written in chunks of 1,000 rows, so memory
// holds a chunk, the first 1,000 errors and the ids of the batch, whatever the file's size.

export interface ImportRequest {
  file: SpooledFile;
  mapping?: Record<string, string | null>;
  dryRun: boolean;
  validOnly: boolean;
  /** Chosen by the page so that it can poll the progress of the commit it starts. */
  batchId?: string;
}

export interface ImportAnswer {
  status: 200 | 201 | 422;
  body: ImportBody;
}

export type ImportBody = ImportSummary & {
  error?: string;
  batchId: string | null;
  dryRun: boolean;
  validOnly: boolean;
  fileName: string;
  delimiter: string | null;
  encoding: string;
  tagSheet: string | null;
  rejectedFile: string | null;
};

const CHUNK = 1000;
const TAG_SHEET_MAX = 200;
const today = () => new Date().toISOString().slice(0, 10);

/** Counts the bytes read from the file, for the progress of a large import. */
async function* counted(source: AsyncIterable<Buffer>, into: { bytes: number }) {
  for await (const chunk of source) {
    into.bytes += chunk.length;
    yield chunk as Uint8Array;
  }
}

function body(summary: ImportSummary, extra: Partial<ImportBody> & Pick<ImportBody, "fileName" | "encoding" | "delimiter" | "dryRun" | "validOnly">): ImportBody {
  const s = summary;
  // the counts and the errors first: what a caller reads
  return {
    ...(extra.error && { error: extra.error }),
    batchId: extra.batchId ?? null,
    dryRun: extra.dryRun,
    validOnly: extra.validOnly,
    fileName: extra.fileName,
    delimiter: extra.delimiter,
    encoding: extra.encoding,
    rows: s.rows, created: s.created, updated: s.updated, unchanged: s.unchanged, rejected: s.rejected,
    errors: s.errors, errorCount: s.errorCount, fatal: s.fatal, notes: s.notes ?? [],
    headers: s.headers, mapping: s.mapping, autoMapping: s.autoMapping, unknownColumns: s.unknownColumns, setByLinkyard: s.setByLinkyard,
    sample: s.sample, preview: s.preview,
    tagSheet: extra.tagSheet ?? null,
    rejectedFile: extra.rejectedFile ?? null,
  };
}

const emptySummary = (): ImportSummary => ({
  headers: [], mapping: {}, autoMapping: {}, unknownColumns: [], setByLinkyard: [], sample: [], rows: 0,
  created: 0, updated: 0, unchanged: 0, rejected: 0, errors: [], errorCount: 0, fatal: true, preview: [],
});

/** Checks a file (a dry run, nothing written) or commits it. */
export async function importStock(actor: Principal, request: ImportRequest): Promise<ImportAnswer> {
  if (!can(actor, "stock.import")) throw forbidden();
  const { file } = request;
  const refusal = fileRefusal(file.head, file.tooLarge ? MAX_IMPORT_BYTES + 1 : file.size);
  if (refusal) throw new AppError(refusal.status, refusal.message, [{ path: "file", message: refusal.message }]);

  const encoding = detectEncoding(file.head);
  const read = { bytes: 0 };
  const csv = await openCsv(counted(createReadStream(file.path, { highWaterMark: 64 * 1024 }), read), encoding);
  const common = { fileName: file.name, encoding: ENCODING_WORDS[encoding], dryRun: request.dryRun, validOnly: request.validOnly };
  if ("error" in csv) {
    const summary = emptySummary();
    summary.errors.push({ line: 1, column: null, message: csv.error });
    summary.errorCount = 1;
    return { status: request.dryRun ? 200 : 422, body: body(summary, { ...common, delimiter: null, error: request.dryRun ? undefined : commitRefusal(summary, request.validOnly)! }) };
  }
  const yards = await listYards(actor.organisationId);
  const options = { mapping: request.mapping, yards, validOnly: request.validOnly, chunkSize: CHUNK };
  const withDelimiter = { ...common, delimiter: csv.delimiterName };

  if (request.dryRun) {
    const trx = await db.transaction();
    try {
      await imports.createSeenTable(trx);
      const summary = await runImport(csv.records, options, readingStore(trx, actor.organisationId));
      return { status: 200, body: body(summary, withDelimiter) };
    } finally {
      await trx.rollback();
    }
  }
  return commit(actor, request, csv.records, options, withDelimiter, read);
}

/** The store of a dry run: it reads stock and notes duplicates, and writes nothing. */
function readingStore(trx: Knex, organisationId: string): ImportStore {
  return {
    findExisting: ({ serials, tagCodes }) => imports.findExisting(trx, organisationId, serials, tagCodes),
    firstSeen: (entries) => imports.firstSeen(trx, entries),
  };
}

async function commit(
  actor: Principal,
  request: ImportRequest,
  records: Parameters<typeof runImport>[0],
  options: Parameters<typeof runImport>[1],
  common: Pick<ImportBody, "fileName" | "encoding" | "delimiter" | "dryRun" | "validOnly">,
  read: { bytes: number },
): Promise<ImportAnswer> {
  const org = actor.organisationId;
  const batchId = request.batchId ?? randomUUID();
  if (await imports.batchIdTaken(batchId)) throw conflict("An import with this id exists already; start a new one.");
  const fileKey = `${org}/imports/${batchId}/original.csv`;
  const rejectedKey = `${org}/imports/${batchId}/rejected.csv`;
  const rejectedPath = path.join(tmpdir(), `linkyard-rejected-${batchId}.csv`);
  let rejectedOut: WriteStream | null = null;
  let rejectedStored = false;
  const intervals = intervalsWithDefaults((await getOrganisationSettings(org))?.inspectionIntervalDays);

  await storeFromDisk(fileKey, request.file.path, request.file.size, "text/csv");
  await imports.insertBatch({
    id: batchId, organisationId: org, createdBy: actor.userId, fileName: request.file.name, fileKey, fileBytes: request.file.size,
    delimiter: common.delimiter ?? "", encoding: common.encoding, mapping: request.mapping ?? {}, validOnly: request.validOnly,
  });

  const trx = await db.transaction();
  let done = false;
  try {
    await imports.lockOrganisationImports(trx, org);
    await imports.createSeenTable(trx);
    let lastEventId: number | null = null;
    let headers: string[] = [];
    const note = (line: number) => `Imported from ${request.file.name}, line ${line}`;

    const store: ImportStore = {
      ...readingStore(trx, org),
      async write(creates, updates) {
        if (creates.length) lastEventId = Math.max(lastEventId ?? 0, await writeCreates(trx, actor, batchId, creates, intervals, note));
        if (updates.length) lastEventId = Math.max(lastEventId ?? 0, await writeUpdates(trx, actor, batchId, updates, note));
      },
      async progress(rows) {
        await imports.recordProgress(batchId, rows, read.bytes);
      },
      ...(request.validOnly && {
        async rejected(fields, messages) {
          if (!rejectedOut) {
            rejectedOut = createWriteStream(rejectedPath);
            rejectedOut.write("\ufeff" + csvLine([...headers, "error"]));
          }
          const row = [...headers.map((_, i) => fields[i] ?? ""), messages.join(" | ")];
          if (!rejectedOut.write(csvLine(row))) await new Promise<void>((r) => rejectedOut!.once("drain", () => r()));
        },
      }),
    };
    // the rejected-rows file repeats the file's own header
    const withHeaders = (async function* () {
      let first = true;
      for await (const r of records) {
        if (first && !("fatal" in r)) headers = r.fields.map((h) => h.trim());
        first = false;
        yield r;
      }
    })();

    const summary = await runImport(withHeaders, options, store);
    const refusal = commitRefusal(summary, request.validOnly);
    if (refusal) {
      return { status: 422, body: body(summary, { ...common, error: refusal }) };
    }
    let storedRejected: string | null = null;
    if (rejectedOut) {
      const out = rejectedOut as WriteStream;
      out.end();
      await finished(out);
      await storeFromDisk(rejectedKey, rejectedPath, (await stat(rejectedPath)).size, "text/csv");
      rejectedStored = true;
      storedRejected = rejectedKey;
    }
    await imports.finishBatch(trx, batchId, {
      mapping: summary.mapping, rowsTotal: summary.rows, created: summary.created, updated: summary.updated, unchanged: summary.unchanged,
      rejected: summary.rejected, rejectedKey: storedRejected, lastEventId, bytes: request.file.size,
    });
    await writeAudit(
      {
        organisationId: org, actorId: actor.userId, action: "items.imported", entity: "import_batch", entityId: batchId,
        after: { fileName: request.file.name, created: summary.created, updated: summary.updated, unchanged: summary.unchanged, rejected: summary.rejected, validOnly: request.validOnly },
      },
      trx,
    );
    await trx.commit();
    done = true;
    const ids = summary.created && summary.created <= TAG_SHEET_MAX ? await imports.createdItemIds(org, batchId) : [];
    return {
      status: 201,
      body: body(summary, {
        ...common, batchId,
        tagSheet: ids.length ? `/tags/sheet?ids=${ids.join(",")}` : null,
        rejectedFile: storedRejected ? `/api/v1/imports/${batchId}/rejected.csv` : null,
      }),
    };
  } finally {
    if (!done) {
      await trx.rollback().catch(() => undefined);
      await imports.deleteBatch(batchId).catch((e) => console.error("import: could not remove the batch row", e));
      await removeStored(fileKey).catch(() => undefined);
      if (rejectedStored) await removeStored(rejectedKey).catch(() => undefined);
    }
    const out = rejectedOut as WriteStream | null;
    if (out && !out.closed) {
      out.end();
      await finished(out).catch(() => undefined);
    }
    await rm(rejectedPath, { force: true });
  }
}

/** Tag codes no item has yet, drawn at random and checked in one query per chunk. */
async function freshTagCodes(trx: Knex, count: number): Promise<string[]> {
  const codes = new Set<string>();
  for (let round = 0; codes.size < count; round++) {
    if (round > 5) throw new Error("could not draw free tag codes");
    const drawn = new Set<string>();
    while (drawn.size < count - codes.size) {
      const c = newTagCode();
      if (!codes.has(c)) drawn.add(c);
    }
    const taken = await imports.existingTagCodes(trx, [...drawn]);
    for (const c of drawn) if (!taken.has(c)) codes.add(c);
  }
  return [...codes];
}

async function writeCreates(
  trx: Knex, actor: Principal, batchId: string, creates: PreparedCreate[], intervals: Record<ItemKind, number>, note: (line: number) => string,
): Promise<number> {
  const codes = await freshTagCodes(trx, creates.length);
  const ids = await imports.insertItems(
    trx,
    creates.map((c, i) => ({
      ...c.row,
      details: JSON.stringify(c.row.details),
      organisation_id: actor.organisationId,
      tag_code: codes[i],
      status: "in_service",
      next_inspection_due: nextDue(c.input.inServiceOn ?? today(), intervals[c.input.kind]),
      import_batch_id: batchId,
    })),
  );
  return imports.insertEvents(
    trx,
    ids.map((id, i) => ({ organisation_id: actor.organisationId, item_id: id, type: "imported", note: note(creates[i].line), actor_id: actor.userId })),
  );
}

/** The stored columns of an item that an import may replace, as they were. */
function columnsOf(e: ExistingItem) {
  return {
    grade: e.grade, grade_marked: e.gradeMarked, size: e.size, length_mm: e.lengthMm, marked_wll_lb: e.markedWllLb, serial: e.serial,
    yard_id: e.yardId, in_service_on: e.inServiceOn, cost_cents: e.costCents, details: e.details ?? {}, wll_lb: e.wllLb, wll_source: e.wllSource,
  };
}

async function writeUpdates(trx: Knex, actor: Principal, batchId: string, updates: PreparedUpdate[], note: (line: number) => string): Promise<number> {
  for (const u of updates) {
    const { kind: _kind, ...row } = u.row;
    await imports.updateItemRow(trx, actor.organisationId, u.existing.id, { ...row, details: JSON.stringify(row.details) });
  }
  await imports.insertUpdates(
    trx,
    updates.map((u) => {
      const { kind: _kind, ...after } = u.row;
      return { batch_id: batchId, item_id: u.existing.id, before: JSON.stringify(columnsOf(u.existing)), after: JSON.stringify(after) };
    }),
  );
  return imports.insertEvents(
    trx,
    updates.map((u) => ({
      organisation_id: actor.organisationId, item_id: u.existing.id, type: "edited", note: note(u.line), changes: JSON.stringify(u.changes), actor_id: actor.userId,
    })),
  );
}

/**
 * Undoes an import while none of its items has been used since (no history entry after the
 * import's own).
 *
 * Why items are retired, not deleted: item history is append-only (a trigger refuses any
 * UPDATE or DELETE on item_events), so an item's 'imported' entry can never be removed, and an
 * item with history cannot be deleted either. Undo therefore retires every item the import
 * added, with a 'retired' entry noting "Import undone", and frees its serial so that the
 * corrected file can be imported again; the tags were never used, and the record of what
 * happened stays. Items the import updated get their previous values back, with an 'edited'
 * entry.
 */
export async function undoImport(actor: Principal, batchId: string): Promise<{ retired: number; restored: number }> {
  if (!can(actor, "stock.import")) throw forbidden();
  return db.transaction(async (trx) => {
    const batch = await imports.lockBatch(actor.organisationId, batchId, trx);
    if (!batch) throw notFound("No such import.");
    if (batch.status === "undone") throw conflict("This import has been undone already.");
    if (batch.status !== "committed") throw conflict("This import is still running.");
    if (Number(batch.created) + Number(batch.updated) === 0) throw conflict("Nothing to undo: the import changed no items.");
    const later = batch.lastEventId == null ? undefined : await imports.laterEvent(actor.organisationId, batchId, Number(batch.lastEventId), trx);
    if (later) throw conflict(undoBlockedMessage(later));
    const retired = await imports.retireBatchItems(trx, actor.organisationId, batchId, actor.userId);
    const updates = await imports.updatesOf(trx, batchId);
    const yards = new Map((await listYards(actor.organisationId)).map((y) => [y.id, y.name]));
    const events = [];
    for (const u of updates) {
      const before = u.before as Record<string, unknown>;
      const after = u.after as Record<string, unknown>;
      await imports.updateItemRow(trx, actor.organisationId, u.itemId, { ...before, details: JSON.stringify(before.details ?? {}) });
      const changes: Record<string, [unknown, unknown]> = {};
      for (const [k, v] of Object.entries(before)) {
        if (k === "wll_source" || JSON.stringify(after[k]) === JSON.stringify(v)) continue;
        if (k === "yard_id") changes.yardName = [yards.get(after[k] as string) ?? null, yards.get(v as string) ?? null];
        else changes[k.replace(/_([a-z])/g, (_m, c: string) => c.toUpperCase())] = [after[k], v];
      }
      events.push({ organisation_id: actor.organisationId, item_id: u.itemId, type: "edited", note: "Import undone", changes: JSON.stringify(changes), actor_id: actor.userId });
    }
    for (let i = 0; i < events.length; i += CHUNK) await imports.insertEvents(trx, events.slice(i, i + CHUNK));
    await imports.markUndone(trx, batchId, actor.userId);
    await writeAudit({ organisationId: actor.organisationId, actorId: actor.userId, action: "items.import_undone", entity: "import_batch", entityId: batchId, after: { retired, restored: updates.length } }, trx);
    return { retired, restored: updates.length };
  });
}

const EVENT_WORDS: Record<string, string> = {
  check: "a pre-use check", inspection: "an inspection", tag_out: "a tag-out", moved: "a move", edited: "an edit",
  retired: "a retirement", lost: "a loss report", found: "a found report", correction: "a correction", return_to_service: "a return to service", imported: "another import",
};

export function undoBlockedMessage(later: { type: string; tagCode: string }): string {
  return `Item ${later.tagCode} has ${EVENT_WORDS[later.type] ?? "a history entry"} recorded since this import, so the import can no longer be undone. Change or retire its items one by one instead.`;
}

/** Whether a batch can be undone now, and if not, why in words. */
export async function undoState(organisationId: string, batch: imports.BatchRow): Promise<{ canUndo: boolean; reason: string | null }> {
  if (batch.status === "undone") return { canUndo: false, reason: "Undone." };
  if (batch.status === "running") return { canUndo: false, reason: "Still running." };
  if (batch.created + batch.updated === 0) return { canUndo: false, reason: "Nothing to undo: the import changed no items." };
  const later = batch.lastEventId == null ? undefined : await imports.laterEvent(organisationId, batch.id, batch.lastEventId);
  return later ? { canUndo: false, reason: undoBlockedMessage(later) } : { canUndo: true, reason: null };
}

/** An import as the API answers it. */
export function batchJson(b: imports.BatchRow, undo?: { canUndo: boolean; reason: string | null }) {
  return {
    id: b.id,
    status: b.status,
    fileName: b.fileName,
    fileBytes: b.fileBytes,
    createdAt: new Date(b.createdAt).toISOString(),
    finishedAt: b.finishedAt ? new Date(b.finishedAt).toISOString() : null,
    createdBy: b.createdByName,
    validOnly: b.validOnly,
    delimiter: b.delimiter,
    encoding: b.encoding,
    mapping: b.mapping,
    rowsProcessed: b.rowsProcessed,
    progress: b.status === "running" ? (b.fileBytes ? Math.min(1, b.bytesProcessed / b.fileBytes) : 0) : 1,
    rows: b.rowsTotal,
    created: b.created,
    updated: b.updated,
    unchanged: b.unchanged,
    rejected: b.rejected,
    undoneAt: b.undoneAt ? new Date(b.undoneAt).toISOString() : null,
    undoneBy: b.undoneByName,
    file: b.fileKey ? `/api/v1/imports/${b.id}/file` : null,
    rejectedFile: b.rejectedKey ? `/api/v1/imports/${b.id}/rejected.csv` : null,
    ...(undo && { canUndo: undo.canUndo, undoBlockedBecause: undo.reason }),
  };
}
export type BatchJson = ReturnType<typeof batchJson>;

/** Download headers for a CSV file with a name people recognise. */
export function attachment(name: string): HeadersInit {
  const plain = name.replace(/[^\w.\- ]/g, "_").slice(0, 120) || "file.csv";
  return {
    "Content-Type": "text/csv; charset=utf-8",
    "Content-Disposition": `attachment; filename="${plain}"; filename*=UTF-8''${encodeURIComponent(name.slice(0, 120))}`,
    "Cache-Control": "private, no-store",
  };
}
