// The import of one file, row by row in chunks, with the organisation's stock reached only
// through an ImportStore (the database in the app, a Map in the tests). Memory holds one
// chunk of rows, the first errors (capped), a few preview rows and the keys (serials, tag
// codes, items) seen so far with their line.
import { gradeMarkNote } from "@/lib/securement";
import type { ItemInput } from "@/lib/stock/schemas";
import { describeItem } from "@/lib/stock/describe";
import type { CsvFatal, CsvRecord } from "./csv";
import { autoMap, resolveMapping, uniqueHeaders, type ColumnMapping } from "./fields";
import type { ItemFields } from "@/db/items";
import { RowReader, rowChanges, storedFields, type ExistingItem, type ReadRow, type RowError } from "./row-reader";
import { quantitySerials } from "./values";

/**
 * The serials a row brings: its own, or, for a row with a quantity, one per item made
 * ("BR-7-01", "BR-7-02", …), each checked for duplicates like any other serial.
 */
function rowSerials(r: Pick<ReadRow, "serial" | "quantity">): string[] {
  if (r.quantity > 1) return quantitySerials(r.serial, r.quantity).filter((s): s is string => s !== undefined);
  return r.serial ? [r.serial] : [];
}

export interface PreparedCreate {
  line: number;
  input: ItemInput;
  row: ItemFields;
}

export interface PreparedUpdate {
  line: number;
  existing: ExistingItem;
  row: ItemFields;
  changes: Record<string, [unknown, unknown]>;
}

export interface ImportStore {
  /** Items of the organisation with any of these serials or tag codes. */
  findExisting(keys: { serials: string[]; tagCodes: string[] }): Promise<ExistingItem[]>;
  /** Notes keys as seen in this file; answers, for keys seen before, the line they were first on. */
  firstSeen(entries: { key: string; line: number }[]): Promise<Map<string, number>>;
  /** Writes a chunk of valid rows (a commit; a dry run has no write). */
  write?(creates: PreparedCreate[], updates: PreparedUpdate[]): Promise<void>;
  /** A rejected row, for the rejected-rows file of a valid-rows-only import. */
  rejected?(fields: readonly string[], messages: string[]): Promise<void>;
  /** Rows read so far, for the progress shown while a large file goes in. */
  progress?(rows: number): Promise<void>;
}

/**
 * The keys of a file seen so far, in memory: for a file at the size limit (some 500,000
 * rows) a few tens of MB, against a round trip to the database for every chunk.
 * @example const firstSeen = keysSeenInMemory(); await firstSeen([{ key: "s:A1", line: 2 }]); await firstSeen([{ key: "s:A1", line: 9 }]) // Map { "s:A1" => 2 }
 */
export function keysSeenInMemory(): ImportStore["firstSeen"] {
  const seen = new Map<string, number>();
  return async (entries) => {
    const earlier = new Map<string, number>();
    for (const { key, line } of entries) {
      const first = seen.get(key);
      if (first === undefined) seen.set(key, line);
      else earlier.set(key, first);
    }
    return earlier;
  };
}

export interface ImportOptions {
  /** The owner's column choices, by header; headers not named are mapped automatically. */
  mapping?: Record<string, string | null>;
  yards: readonly { id: string; name: string }[];
  /** Write the valid rows even when some rows are rejected. */
  validOnly?: boolean;
  chunkSize?: number;
  maxErrors?: number;
  previewRows?: number;
}

export interface PreviewRow {
  line: number;
  action: "create" | "update" | "unchanged";
  tagCode: string | null;
  description: string;
  kind: string;
  grade: number | null;
  size: string | null;
  markedWllLb: number | null;
  wllLb: number | null;
  wllSource: string | null;
  lengthMm: number | null;
  serial: string | null;
  yardName: string | null;
  inServiceOn: string | null;
  costCents: number | null;
  changes?: Record<string, [unknown, unknown]>;
  /** How many new items the row makes, when more than one (a quantity column). */
  quantity?: number;
}

export interface ImportSummary {
  headers: string[];
  mapping: ColumnMapping;
  /** The automatic mapping, for the mapping screen to show what was chosen and why. */
  autoMapping: ColumnMapping;
  unknownColumns: string[];
  setByLinkyard: string[];
  /** The first data rows as they are in the file, for the mapping screen. */
  sample: string[][];
  rows: number;
  created: number;
  updated: number;
  unchanged: number;
  rejected: number;
  errors: RowError[];
  errorCount: number;
  /** How rows that went in were read, where that needs saying (grade mark 40 read as grade 43); capped like errors. */
  notes?: RowError[];
  /** The file cannot be imported at all (broken quotes, no Kind column, …), valid rows or not. */
  fatal: boolean;
  preview: PreviewRow[];
}

const KIND_COLUMN_MISSING =
  "No column says what each item is. Add a Kind column (chain, ratchet binder, lever binder, web strap, hook, shackle…), or choose which of your columns is the Kind.";

/**
 * Reads, checks and (with a store that writes) imports the records of one CSV file.
 * @example const summary = await runImport(readRecords(text, ","), { yards }, store)
 */
export async function runImport(records: AsyncIterable<CsvRecord | CsvFatal>, options: ImportOptions, store: ImportStore): Promise<ImportSummary> {
  const chunkSize = options.chunkSize ?? 1000;
  const maxErrors = options.maxErrors ?? 1000;
  const previewRows = options.previewRows ?? 10;
  const summary: ImportSummary = {
    headers: [], mapping: {}, autoMapping: {}, unknownColumns: [], setByLinkyard: [], sample: [],
    rows: 0, created: 0, updated: 0, unchanged: 0, rejected: 0, errors: [], errorCount: 0, fatal: false, preview: [],
  };
  const addError = (e: RowError) => {
    summary.errorCount++;
    if (summary.errors.length < maxErrors) summary.errors.push(e);
  };
  const fail = (e: RowError) => {
    addError(e);
    summary.fatal = true;
    return summary;
  };

  const iterator = records[Symbol.asyncIterator]();
  const first = await iterator.next();
  if (first.done) return fail({ line: 1, column: null, message: "The file has no rows: the first line should name the columns, and each line after it one item." });
  if ("fatal" in first.value) return fail({ line: first.value.line, column: null, message: first.value.fatal });

  const headers = uniqueHeaders(first.value.fields.map((h) => h.trim()));
  const headerLine = first.value.line;
  const auto = autoMap(headers);
  const { mapping, problems } = resolveMapping(headers, options.mapping);
  Object.assign(summary, { headers, mapping, autoMapping: auto.mapping, setByLinkyard: auto.setByLinkyard });
  summary.unknownColumns = auto.unknown.filter((h) => mapping[h] === null);
  for (const p of problems) addError({ line: headerLine, column: p.column, message: p.message });
  const reader = new RowReader(headers, mapping, options.yards);
  const gradeColumn = reader.columns.find((c) => c.field === "grade");
  if (!reader.has("kind") && !reader.has("tagCode") && !reader.has("serial")) addError({ line: headerLine, column: null, message: KIND_COLUMN_MISSING });
  if (summary.errorCount) {
    summary.fatal = true;
    // still read a few rows for the mapping screen
    for (let i = 0; i < 3; i++) {
      const next = await iterator.next();
      if (next.done || "fatal" in next.value) break;
      summary.sample.push(next.value.fields.slice(0, headers.length));
    }
    return summary;
  }

  const yardName = (id: string | null) => (id ? (options.yards.find((y) => y.id === id)?.name ?? null) : null);
  let writing = true; // false once a row is rejected and only valid rows may not go in
  let chunk: CsvRecord[] = [];

  const flush = async () => {
    if (!chunk.length) return;
    const rows = chunk;
    chunk = [];
    // The row's problems start with what its cells say (its own array, added to below).
    const read = rows.map((r): ReadRow & { problems: RowError[] } => {
      const rr = reader.read(r.line, r.fields) as ReadRow & { problems: RowError[] };
      const problems = rr.errors;
      if (r.quoteProblem) problems.unshift({ line: r.line, column: null, message: r.quoteProblem });
      if (r.fields.length > headers.length && r.fields.slice(headers.length).some((f) => f.trim() !== "")) {
        problems.unshift({ line: r.line, column: null, message: `This row has ${r.fields.length} values but the header names ${headers.length} columns. A value that holds the delimiter must be in quotes.` });
      }
      rr.problems = problems;
      return rr;
    });
    const serialsOf = read.map(rowSerials);

    const serials = [...new Set(serialsOf.flat())];
    const tagCodes = [...new Set(read.flatMap((r) => (r.tagCode ? [r.tagCode] : [])))];
    const found = serials.length || tagCodes.length ? await store.findExisting({ serials, tagCodes }) : [];
    const bySerial = new Map(found.filter((f) => f.serial).map((f) => [f.serial!, f]));
    const byTag = new Map(found.map((f) => [f.tagCode, f]));

    // Which stored item each row updates, if any. A row with a quantity only makes new items.
    const matched = read.map((r, i) => {
      if (r.quantity > 1) {
        const serialsOfRow = serialsOf[i];
        const taken = serialsOfRow.map((s) => bySerial.get(s)).find(Boolean);
        if (taken) {
          r.problems.push({ line: r.line, column: reader.column("serial"), message: `Serial ${taken.serial} is already item ${taken.tagCode} in your stock. A row with a quantity makes new items, numbering the serial for each (${serialsOfRow[0]} …): give this row a serial of its own.` });
        } else if (serialsOfRow.some((s) => s.length > 80)) {
          r.problems.push({ line: r.line, column: reader.column("serial"), message: "With its number added for each item, this serial is longer than 80 characters: shorten it." });
        }
        return undefined;
      }
      if (r.tagCode) {
        const item = byTag.get(r.tagCode);
        if (!item) {
          r.problems.push({ line: r.line, column: reader.column("tagCode"), message: `No item in your stock has tag code ${r.tagCode}. Leave the tag code empty to add a new item.` });
          return undefined;
        }
        const owner = r.serial ? bySerial.get(r.serial) : undefined;
        if (owner && owner.id !== item.id) {
          r.problems.push({ line: r.line, column: reader.column("serial"), message: `Serial ${r.serial} belongs to item ${owner.tagCode}, not to ${item.tagCode}. Another item already has this serial or lot.` });
        }
        return item;
      }
      return r.serial ? bySerial.get(r.serial) : undefined;
    });

    // Each serial, tag code and stored item once per file. Keys are "s:serial", "t:tag code"
    // and "i:item id", in that order; a row's message is made only when a key repeats.
    const keysOf = read.map((r, i) => {
      const keys = serialsOf[i].map((serial) => `s:${serial}`);
      if (r.tagCode) keys.push(`t:${r.tagCode}`);
      if (matched[i]) keys.push(`i:${matched[i]!.id}`);
      return keys;
    });
    const duplicate = (r: ReadRow, item: ExistingItem | undefined, key: string, line: number): RowError => {
      const value = key.slice(2);
      if (key.startsWith("s:")) {
        return { line: r.line, column: reader.column("serial"), message: `Serial ${value} is already on line ${line}; each serial may appear once in the file${r.quantity > 1 ? " (a row with a quantity numbers its serial for each item)" : ""}.` };
      }
      if (key.startsWith("t:")) return { line: r.line, column: reader.column("tagCode"), message: `Tag code ${value} is already on line ${line}; each item may appear once in the file.` };
      return { line: r.line, column: r.tagCode ? reader.column("tagCode") : reader.column("serial"), message: `Line ${line} already updates item ${item!.tagCode}; each item may appear once in the file.` };
    };
    const inChunk = new Map<string, number>();
    const toStore: { key: string; line: number }[] = [];
    read.forEach((r, i) => {
      for (const key of keysOf[i]) {
        if (inChunk.has(key)) continue;
        inChunk.set(key, r.line);
        toStore.push({ key, line: r.line });
      }
    });
    const earlier = toStore.length ? await store.firstSeen(toStore) : new Map<string, number>();
    read.forEach((r, i) => {
      for (const key of keysOf[i]) {
        const firstLine = earlier.get(key) ?? (inChunk.get(key) !== r.line ? inChunk.get(key) : undefined);
        if (firstLine !== undefined) {
          r.problems.push(duplicate(r, matched[i], key, firstLine));
          break; // one duplicate message per row is enough
        }
      }
    });

    const creates: PreparedCreate[] = [];
    const updates: PreparedUpdate[] = [];
    for (let i = 0; i < read.length; i++) {
      const r = read[i];
      const existing = matched[i];
      // Each row is let go once checked, and a check that writes nothing keeps no items:
      // what lives for a whole chunk is what outlasts the runtime's young collections.
      (read as unknown[])[i] = undefined;
      const keep = Boolean(store.write) && writing;
      const kindProblem = r.problems.length > 0 && r.problems.some((p) => p.column === reader.column("kind"));
      const checked = kindProblem ? { errors: [] } : reader.validate(r, existing);
      let problems = r.problems;
      if ("errors" in checked && checked.errors.length) {
        const unreadable = new Set(r.problems.map((p) => p.column));
        problems = [...r.problems, ...checked.errors.filter((e) => !unreadable.has(e.column))];
      }
      if (problems.length || !("input" in checked)) {
        summary.rejected++;
        problems.forEach(addError);
        if (!options.validOnly) writing = false;
        await store.rejected?.(r.fields, problems.map((p) => (p.column ? `${p.column}: ${p.message}` : p.message)));
        continue;
      }
      const row = storedFields(checked.input, existing);
      const note = gradeColumn && gradeMarkNote(r.fields[gradeColumn.index] ?? "");
      if (note && (summary.notes ??= []).length < maxErrors) summary.notes.push({ line: r.line, column: gradeColumn.header, message: `${note}.` });
      if (existing) {
        const changes = rowChanges(existing, row, yardName);
        if (Object.keys(changes).length === 0) {
          summary.unchanged++;
          preview(r.line, "unchanged", row, existing.tagCode);
        } else {
          summary.updated++;
          if (keep) updates.push({ line: r.line, existing, row, changes });
          preview(r.line, "update", row, existing.tagCode, changes);
        }
      } else {
        const serials = r.quantity > 1 ? quantitySerials(checked.input.serial, r.quantity) : [checked.input.serial];
        if (keep && r.quantity === 1) creates.push({ line: r.line, input: checked.input, row });
        if (keep && r.quantity > 1) {
          for (const serial of serials) {
            const input = { ...checked.input, serial };
            creates.push({ line: r.line, input, row: serial === checked.input.serial ? row : storedFields(input) });
          }
        }
        summary.created += serials.length;
        preview(r.line, "create", r.quantity > 1 ? { ...row, serial: serials[0] ? `${serials[0]} … ${serials.at(-1)}` : null } : row, null, undefined, r.quantity);
      }
    }
    if (writing && store.write && (creates.length || updates.length)) await store.write(creates, updates);
    await store.progress?.(summary.rows);
  };

  const preview = (line: number, action: PreviewRow["action"], row: ItemFields, tagCode: string | null, changes?: Record<string, [unknown, unknown]>, quantity = 1) => {
    if (summary.preview.length >= previewRows) return;
    summary.preview.push({
      line, action, tagCode,
      description: describeItem({ kind: row.kind, grade: row.grade, size: row.size, details: row.details }),
      kind: row.kind, grade: row.grade, size: row.size, markedWllLb: row.markedWllLb, wllLb: row.wllLb, wllSource: row.wllSource,
      lengthMm: row.lengthMm, serial: row.serial, yardName: yardName(row.yardId),
      inServiceOn: row.inServiceOn, costCents: row.costCents, ...(changes && { changes }), ...(quantity > 1 && { quantity }),
    });
  };

  for (;;) {
    const next = await iterator.next();
    if (next.done) break;
    const record = next.value;
    if ("fatal" in record) {
      await flush();
      addError({ line: record.line, column: null, message: record.fatal });
      summary.fatal = true;
      break;
    }
    summary.rows++;
    if (summary.sample.length < 3) summary.sample.push(record.fields.slice(0, headers.length));
    chunk.push(record);
    if (chunk.length >= chunkSize) await flush();
  }
  await flush();
  if (summary.rows === 0 && !summary.fatal) {
    return fail({ line: headerLine + 1, column: null, message: "The file names its columns but has no items under them." });
  }
  return summary;
}

/** Whether a checked file may be committed, and if not, why, in words. */
export function commitRefusal(summary: ImportSummary, validOnly: boolean): string | null {
  if (summary.fatal) return "The file cannot be imported as it is; nothing was imported.";
  if (summary.rejected && !validOnly) {
    return `${summary.rejected.toLocaleString("en-US")} ${summary.rejected === 1 ? "row needs" : "rows need"} fixing; nothing was imported. Fix ${summary.rejected === 1 ? "it" : "them"} and upload again, or import only the valid rows.`;
  }
  if (summary.rejected && summary.created + summary.updated + summary.unchanged === 0) return "None of the rows can be imported; nothing was imported.";
  return null;
}
