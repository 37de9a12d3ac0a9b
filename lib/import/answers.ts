// What the import API answers: a checked or committed file, and an import batch. Pure, so
// that the import screens read the same types.
import type { BatchRow } from "@/db/imports";
import type { ImportSummary } from "./pipeline";

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

/** The answer to a check or a commit: the summary first (what a caller reads), then the file's facts and links. */
export function importBody(summary: ImportSummary, extra: Partial<ImportBody> & Pick<ImportBody, "fileName" | "encoding" | "delimiter" | "dryRun" | "validOnly">): ImportBody {
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

/** The summary of a file that could not be read at all. */
export const emptySummary = (): ImportSummary => ({
  headers: [], mapping: {}, autoMapping: {}, unknownColumns: [], setByLinkyard: [], sample: [], rows: 0,
  created: 0, updated: 0, unchanged: 0, rejected: 0, errors: [], errorCount: 0, fatal: true, preview: [],
});

/** An import as the API answers it. */
export function batchJson(b: BatchRow, undo?: { canUndo: boolean; reason: string | null }) {
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
