import "server-only";
import { randomUUID } from "node:crypto";
import { createReadStream, createWriteStream, type WriteStream } from "node:fs";
import { rm, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { finished } from "node:stream/promises";
import type { Tx } from "@/db";
import { audited } from "@/db/audit";
import * as imports from "@/db/imports";
import { findItemsByKeys, listYards } from "@/db/items";
import type { Principal } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { AppError, conflict, forbidden } from "@/lib/http/errors";
import type { SpooledFile } from "@/lib/http/multipart";
import { inspectionIntervals, organisationClock } from "@/lib/organisations/service";
import { nextDue } from "@/lib/stock/intervals";
import type { ItemKind } from "@/lib/stock/labels";
import { freshTagCodes } from "@/lib/stock/tag-codes";
import { boundedMemo } from "@/lib/memo";
import { removeStored, storeFromDisk } from "@/lib/storage/files";
import { emptySummary, importBody, type ImportBody } from "./answers";
import { csvLine } from "./csv-write";
import { detectFileEncoding, ENCODING_WORDS, fileRefusal, MAX_IMPORT_BYTES } from "./file-check";
import { commitRefusal, keysSeenInMemory, runImport, type ImportStore, type ImportSummary, type PreparedCreate, type PreparedUpdate } from "./pipeline";
import { openCsv } from "./source";

// The CSV import of stock, from the uploaded file to the database and the file store (the
// reading and checking of rows is pipeline.ts; undo is undo.ts). A commit is ONE
// transaction: every row goes in, or, when the owner chose "only the valid rows", every
// valid row goes in and the rejected rows are kept as a file to fix and upload again; on
// any refusal or failure nothing of the file is left behind.
// The upload is read from disk as a stream and written in chunks of 1,000 rows (with COPY,
// db/imports.ts), so memory holds a chunk or two, the first 1,000 errors and the keys seen
// (serials, tag codes, items: a few MB for 100,000 rows).

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

/** Rows read and written at a time: memory holds one chunk, whatever the file's size. */
export const IMPORT_CHUNK_ROWS = 1000;
const TAG_SHEET_MAX = 200;

/** Counts the bytes read from the file, for the progress of a large import. */
async function* counted(source: AsyncIterable<Buffer>, into: { bytes: number }) {
  for await (const chunk of source) {
    into.bytes += chunk.length;
    yield chunk as Uint8Array;
  }
}

/** Checks a file (a dry run, nothing written) or commits it. */
export async function importStock(actor: Principal, request: ImportRequest): Promise<ImportAnswer> {
  if (!can(actor, "stock.import")) throw forbidden();
  const { file } = request;
  const refusal = fileRefusal(file.head, file.tooLarge ? MAX_IMPORT_BYTES + 1 : file.size);
  if (refusal) throw new AppError(refusal.status, refusal.message, [{ path: "file", message: refusal.message }]);

  const encoding = await detectFileEncoding(createReadStream(file.path, { highWaterMark: 64 * 1024 }));
  const read = { bytes: 0 };
  const csv = await openCsv(counted(createReadStream(file.path, { highWaterMark: 64 * 1024 }), read), encoding);
  const common = { fileName: file.name, encoding: ENCODING_WORDS[encoding], dryRun: request.dryRun, validOnly: request.validOnly };
  if ("error" in csv) {
    const summary = emptySummary();
    summary.errors.push({ line: 1, column: null, message: csv.error });
    summary.errorCount = 1;
    return { status: request.dryRun ? 200 : 422, body: importBody(summary, { ...common, delimiter: null, error: request.dryRun ? undefined : commitRefusal(summary, request.validOnly)! }) };
  }
  const yards = await listYards(actor.organisationId);
  const options = { mapping: request.mapping, yards, validOnly: request.validOnly, chunkSize: IMPORT_CHUNK_ROWS };
  const withDelimiter = { ...common, delimiter: csv.delimiterName };

  if (request.dryRun) {
    const summary = await runImport(csv.records, options, readingStore(actor.organisationId));
    return { status: 200, body: importBody(summary, withDelimiter) };
  }
  return commit(actor, request, csv.records, options, withDelimiter, read);
}

/** The store of a dry run: it reads stock and notes duplicates, and writes nothing. */
function readingStore(organisationId: string): ImportStore {
  return {
    // Stock as committed, read on a connection of its own: a commit's transaction is then
    // free to write the chunk before while the next is checked. (An item this file adds
    // cannot be matched by a later row anyway: its serial is a duplicate in the file.)
    findExisting: ({ serials, tagCodes }) => findItemsByKeys(organisationId, serials, tagCodes),
    firstSeen: keysSeenInMemory(),
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
  const intervals = await inspectionIntervals(org);
  const { today } = await organisationClock(org);

  await storeFromDisk(fileKey, request.file.path, request.file.size, "text/csv");
  await imports.insertBatch({
    id: batchId, organisationId: org, createdBy: actor.userId, fileName: request.file.name, fileKey, fileBytes: request.file.size,
    delimiter: common.delimiter ?? "", encoding: common.encoding, mapping: request.mapping ?? {}, validOnly: request.validOnly,
  });

  let committed = false;
  try {
    const { summary, storedRejected } = await audited(actor, async (trx, audit) => {
      await imports.lockOrganisationImports(trx, org);
      await imports.createImportWriteTable(trx);
      const writer = { organisationId: org, batchId, actorId: actor.userId };
      let lastEventId: number | null = null;
      let headers: string[] = [];
      const note = (line: number) => `Imported from ${request.file.name}, line ${line}`;
      // A file has few in-service dates: each date and kind's first inspection is worked out
      // once (2 µs a call, 0.2 s of 100,000 rows otherwise).
      const firstInspection = boundedMemo((d: { day: string; kind: ItemKind }) => nextDue(d.day, intervals[d.kind]), {
        limit: 10_000,
        key: (d) => `${d.day}|${d.kind}`,
      });

      // A chunk is written behind the reading: while PostgreSQL writes one chunk on the
      // transaction's connection, the next is read and checked. One chunk at a time is in
      // flight, and its failure stops the import at the next chunk or at the end.
      let writing: Promise<void> = Promise.resolve();
      const writeChunk = async (creates: PreparedCreate[], codes: string[], updates: PreparedUpdate[]) => {
        const last = [await writeCreates(trx, writer, creates, codes, (c) => firstInspection({ day: c.input.inServiceOn ?? today, kind: c.input.kind }), note), await writeUpdates(trx, writer, updates, note)];
        for (const id of last) if (id !== null) lastEventId = Math.max(lastEventId ?? 0, id);
      };
      // The new items' tag codes are drawn and checked on another connection too, while the
      // chunk before is written; the codes of this import's earlier chunks, not yet visible
      // there, are kept here.
      const codesOfImport = new Set<string>();
      const store: ImportStore = {
        ...readingStore(org),
        async write(creates, updates) {
          const codes = await freshTagCodes(creates.length, undefined, codesOfImport);
          for (const code of codes) codesOfImport.add(code);
          await writing;
          writing = writeChunk(creates, codes, updates);
          writing.catch(() => undefined); // handled where it is awaited
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

      let summary: ImportSummary;
      try {
        summary = await runImport(withHeaders, options, store);
      } finally {
        await writing.catch(() => undefined); // nothing may run on the transaction once it ends
      }
      await writing;
      const refusal = commitRefusal(summary, request.validOnly);
      // Thrown, so that the transaction rolls back; answered below as a 422.
      if (refusal) throw new Refused({ status: 422, body: importBody(summary, { ...common, error: refusal }) });
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
      await audit({
        action: "items.imported", entity: "import_batch", entityId: batchId,
        after: { fileName: request.file.name, created: summary.created, updated: summary.updated, unchanged: summary.unchanged, rejected: summary.rejected, validOnly: request.validOnly },
      });
      return { summary, storedRejected };
    });
    committed = true;
    const ids = summary.created && summary.created <= TAG_SHEET_MAX ? await imports.createdItemIds(org, batchId) : [];
    return {
      status: 201,
      body: importBody(summary, {
        ...common, batchId,
        tagSheet: ids.length ? `/tags/sheet?ids=${ids.join(",")}` : null,
        rejectedFile: storedRejected ? `/api/v1/imports/${batchId}/rejected.csv` : null,
      }),
    };
  } catch (error) {
    if (error instanceof Refused) return error.answer;
    throw error;
  } finally {
    if (!committed) {
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

/** A commit the file's rows refuse: its answer, carried out of the transaction it rolls back. */
class Refused {
  constructor(readonly answer: ImportAnswer) {}
}

async function writeCreates(
  trx: Tx, writer: imports.ImportWriter, creates: PreparedCreate[], codes: string[], dueOf: (create: PreparedCreate) => string, note: (line: number) => string,
): Promise<number | null> {
  return imports.copyImportedItems(
    trx, writer,
    creates.map((c, i) => ({ fields: c.row, tagCode: codes[i], nextInspectionDue: dueOf(c), note: note(c.line) })),
  );
}

function writeUpdates(trx: Tx, writer: imports.ImportWriter, updates: PreparedUpdate[], note: (line: number) => string): Promise<number | null> {
  return imports.copyImportedUpdates(
    trx, writer,
    updates.map((u) => {
      // The kind of an item never changes; everything else the row decides is written.
      const { kind: _kind, ...fields } = u.row;
      const { id: _id, tagCode: _tagCode, kind: _was, ...before } = u.existing;
      return { itemId: u.existing.id, fields, before: { ...before, details: before.details ?? {} }, changes: u.changes, note: note(u.line) };
    }),
  );
}
