// One CSV row to an item: the mapped cells are read (lib/import/values.ts), laid over the
// stored item when the row updates one, and then go through itemInputSchema, the same rules
// as the add-item form and the API, including the rated-limit engine. Every problem comes
// back as { column, message } with the column as the file names it.
import { z } from "zod";
import { boundedMemo } from "@/lib/memo";
import type { ItemFields, ItemRecord } from "@/db/items";
import { toFeet } from "@/lib/securement/units";
import { itemChanges, type ItemChanges } from "@/lib/stock/changes";
import { itemInputSchema, type ItemInput } from "@/lib/stock/schemas";
import type { ItemKind } from "@/lib/stock/labels";
import { itemFields, MANAGED_DETAILS } from "@/lib/stock/item-fields";
import { FIELD_COLUMN, headerWords, type ColumnMapping, type ImportField } from "./fields";
import {
  readChainRange, readCost, readDate, readGrade, readKind, readLength, readMarking, readMechanism,
  readQuantity, readSize, readTagCode, readWeight, readYard, unneutralise, type Read,
} from "./values";

export interface RowError {
  /** The line the row starts on, as a person counts lines in the file (header = 1). */
  line: number;
  /** The column as the file's header names it; null when the problem is the whole row or file. */
  column: string | null;
  message: string;
}

/** An item in stock that a row may update: what the import reads of the stored item. */
export type ExistingItem = Pick<ItemRecord, "id" | "tagCode" | keyof ItemFields>;

export type InputKey = keyof ItemInput;

/** The columns that are not item fields: the tag code (which item) and the quantity (how many). */
type RowKey = "tagCode" | "quantity";

const INPUT_OF: Record<Exclude<ImportField, RowKey>, InputKey> = {
  kind: "kind", marking: "marking", grade: "grade", size: "size", sizeMm: "size", wll: "markedWll", wllLb: "markedWll",
  wllKg: "markedWll", mechanism: "mechanism", chainRange: "chainSizeRange", length: "length", lengthFt: "length",
  lengthM: "length", ends: "ends", serial: "serial", yard: "yardId", inServiceOn: "inServiceOn", cost: "costCents",
};

/** Named in an error when the file has no column for the value at fault. */
const FALLBACK_COLUMN: Record<InputKey, string> = {
  kind: FIELD_COLUMN.kind, marking: FIELD_COLUMN.marking, markedWll: FIELD_COLUMN.wllLb, grade: FIELD_COLUMN.grade,
  size: FIELD_COLUMN.size, chainSizeRange: FIELD_COLUMN.chainRange, mechanism: FIELD_COLUMN.mechanism,
  length: FIELD_COLUMN.lengthFt, ends: FIELD_COLUMN.ends, serial: FIELD_COLUMN.serial, yardId: FIELD_COLUMN.yard,
  inServiceOn: FIELD_COLUMN.inServiceOn, costCents: FIELD_COLUMN.cost,
};

// The item schema compiled once into zod's generated fast path (z.compile): the same
// answers and the same issues, a few times fewer allocations per row of a large file.
const rowSchema = z.compile(itemInputSchema);

/** Distinct cells remembered per column (see RowReader.read). */
const REMEMBERED_CELLS = 500;

/** Freezes a value read from a cell, which rows then share. */
function frozen<T>(read: Read<T>): Read<T> {
  if ("value" in read && typeof read.value === "object" && read.value !== null) Object.freeze(read.value);
  return Object.freeze(read);
}

/** How a file's columns feed an item: which column fills which input, with its unit. */
export class RowReader {
  readonly columns: { index: number; header: string; field: ImportField; unit?: string }[];
  private readonly columnOf = new Map<InputKey | RowKey, string>();
  // A stock list repeats the same kinds, grades, sizes, yards and dates thousands of times:
  // each column remembers what its cells read as (bounded, frozen, as rows share them).
  private readonly remembered: ((cell: string) => Read<unknown>)[];
  // Every row provides the inputs the file has columns for (a blank cell provides "nothing"),
  // plus the mechanism when its kind names one: two sets, shared by the rows and never changed.
  private readonly provided: ReadonlySet<InputKey>;
  private readonly providedWithMechanism: ReadonlySet<InputKey>;

  constructor(
    readonly headers: readonly string[],
    mapping: ColumnMapping,
    private readonly yards: readonly { id: string; name: string }[],
  ) {
    this.columns = headers.flatMap((header, index) => {
      const field = mapping[header];
      if (!field) return [];
      const { weightUnit, lengthUnit } = headerWords(header);
      const unit =
        field === "wllLb" ? "lb" : field === "wllKg" ? "kg" : field === "wll" ? weightUnit
        : field === "lengthFt" ? "ft" : field === "lengthM" ? "m" : field === "length" ? lengthUnit
        : field === "sizeMm" ? "mm" : field === "size" || field === "chainRange" ? (lengthUnit === "mm" || lengthUnit === "in" ? lengthUnit : undefined)
        : undefined;
      return [{ index, header, field, unit }];
    });
    for (const c of this.columns) this.columnOf.set(c.field === "tagCode" || c.field === "quantity" ? c.field : INPUT_OF[c.field], c.header);
    this.remembered = this.columns.map((c) =>
      boundedMemo((cell: string) => frozen(this.readCell(c.field as Exclude<ImportField, RowKey>, cell, c.unit)), { limit: REMEMBERED_CELLS, key: (cell) => cell }),
    );
    const inputs = this.columns.flatMap((c) => (c.field === "tagCode" || c.field === "quantity" ? [] : [INPUT_OF[c.field]]));
    this.provided = new Set(inputs);
    this.providedWithMechanism = new Set([...inputs, "mechanism"]);
  }

  /** Whether the file has a column for an input. */
  has(key: InputKey | RowKey): boolean {
    return this.columnOf.has(key);
  }

  /** The file's column for an input, or the template's name for it. */
  column(key: InputKey | RowKey): string {
    return this.columnOf.get(key) ?? (key === "tagCode" || key === "quantity" ? FIELD_COLUMN[key] : FALLBACK_COLUMN[key]);
  }

  /** Reads the mapped cells of a row: the values it sets (a blank cell sets "nothing") and the cells it cannot read. */
  read(line: number, fields: readonly string[]): ReadRow {
    const values: Partial<Record<InputKey, unknown>> = {};
    const errors: RowError[] = [];
    let tagCode: string | undefined;
    let quantity = 1;
    let kindMechanism: "ratchet" | "lever" | undefined;
    for (let i = 0; i < this.columns.length; i++) {
      const c = this.columns[i];
      const cell = unneutralise(fields[c.index] ?? "").trim();
      if (c.field === "tagCode") {
        if (!cell) continue;
        const r = readTagCode(cell);
        if ("error" in r) errors.push({ line, column: c.header, message: r.error });
        else tagCode = r.value;
        continue;
      }
      if (c.field === "quantity") {
        if (!cell) continue;
        const r = readQuantity(cell);
        if ("error" in r) errors.push({ line, column: c.header, message: r.error });
        else quantity = r.value;
        continue;
      }
      const key = INPUT_OF[c.field];
      if (!cell) continue;
      // Serials and end fittings as written (rarely repeated); the rest remembered per column.
      const r: Read<unknown> = c.field === "serial" || c.field === "ends" ? { value: cell } : this.remembered[i](cell);
      if ("error" in r) {
        errors.push({ line, column: c.header, message: r.error });
        continue;
      }
      if (c.field === "kind") {
        const k = r.value as { kind: ItemKind; mechanism?: "ratchet" | "lever" };
        values.kind = k.kind;
        kindMechanism = k.mechanism;
      } else values[key] = r.value;
    }
    if (kindMechanism) {
      if (values.mechanism && values.mechanism !== kindMechanism) {
        errors.push({ line, column: this.column("mechanism"), message: `The kind says ${kindMechanism} binder but this column says ${values.mechanism}.` });
      }
      values.mechanism = kindMechanism;
    }
    const serial = typeof values.serial === "string" ? values.serial : undefined;
    if (quantity > 1 && tagCode) {
      errors.push({ line, column: this.column("quantity"), message: `A quantity makes new items, but this row names tag code ${tagCode}. Set the quantity to 1 to update that item, or leave the tag code empty.` });
    }
    const provided = kindMechanism ? this.providedWithMechanism : this.provided;
    return { line, fields, values, provided, tagCode, serial, quantity, errors, mechanismFromKind: Boolean(kindMechanism) };
  }

  private readCell(field: Exclude<ImportField, RowKey>, cell: string, unit: string | undefined): Read<unknown> {
    switch (field) {
      case "kind": return readKind(cell);
      case "marking": return readMarking(cell);
      case "grade": return readGrade(cell);
      case "size": case "sizeMm": return readSize(cell, unit as "in" | "mm" | undefined);
      case "wll": case "wllLb": case "wllKg": return readWeight(cell, unit as "lb" | "kg" | undefined);
      case "mechanism": return readMechanism(cell);
      case "chainRange": return readChainRange(cell, unit as "in" | "mm" | undefined);
      case "length": case "lengthFt": case "lengthM": return readLength(cell, unit as "ft" | "m" | "in" | "mm" | undefined);
      case "yard": return readYard(cell, this.yards);
      case "inServiceOn": return readDate(cell);
      case "cost": return readCost(cell);
      case "ends": case "serial": return { value: cell };
    }
  }

  /**
   * The item a read row describes, laid over the stored item when it updates one, through
   * the item schema. Returns the valid input or the problems by column.
   */
  validate(row: ReadRow, existing: ExistingItem | undefined): { input: ItemInput } | { errors: RowError[] } {
    const base: Partial<Record<InputKey, unknown>> = existing ? existingToInput(existing) : {};
    const merged: Partial<Record<InputKey, unknown>> = { ...base };
    for (const key of row.provided) merged[key] = row.values[key];
    if (existing && row.provided.has("kind") && merged.kind && merged.kind !== existing.kind) {
      return { errors: [{ line: row.line, column: this.column("kind"), message: `This row matches item ${existing.tagCode}, which is a ${existing.kind.replace("-", " ")}; the kind of an item cannot change. Give this row its own serial to add it as a new item.` }] };
    }
    if (existing && !row.provided.has("kind")) merged.kind = existing.kind;
    const markingGiven = row.provided.has("marking") && row.values.marking !== undefined;
    const markingTouched = row.provided.has("marking") || row.provided.has("markedWll") || row.provided.has("grade");
    if (!markingGiven && (!existing || markingTouched)) {
      // No marking in the file: a WLL means the WLL is marked, a grade means only the grade is.
      merged.marking = merged.markedWll ? "wll" : merged.grade ? "grade" : "none";
    }
    if (merged.kind === undefined) {
      return { errors: [{ line: row.line, column: this.column("kind"), message: this.has("kind") ? "Say what the item is: chain, ratchet binder, lever binder, web strap, wire rope, hook, shackle or rated item." : "This row matches no item in your stock, so it needs a Kind column saying what the item is." }] };
    }
    const parsed = rowSchema.safeParse(merged);
    if (parsed.success) return { input: parsed.data };
    const errors: RowError[] = [];
    const seen = new Set<string>();
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0] ?? "") as InputKey;
      let column: string;
      if (key === "marking" && !markingGiven) column = this.has("markedWll") || !this.has("grade") ? this.column("markedWll") : this.column("grade");
      else if (key === "mechanism" && row.mechanismFromKind) column = this.column("kind");
      else column = key ? this.column(key) : this.column("kind");
      const once = `${column}\u0000${issue.message}`;
      if (seen.has(once)) continue;
      seen.add(once);
      errors.push({ line: row.line, column, message: issue.message });
    }
    return { errors };
  }
}

export interface ReadRow {
  line: number;
  fields: readonly string[];
  values: Partial<Record<InputKey, unknown>>;
  /** Inputs the file has a column for: on an update, a blank cell in one of them clears the value. */
  provided: ReadonlySet<InputKey>;
  tagCode?: string;
  serial?: string;
  /** How many new items the row makes (1 when the file has no quantity). */
  quantity: number;
  errors: RowError[];
  mechanismFromKind: boolean;
}

/** A stored item in the shape the schema reads, so that a row can change some of it. */
export function existingToInput(e: ExistingItem): Partial<Record<InputKey, unknown>> {
  const d = e.details ?? {};
  return {
    kind: e.kind,
    marking: e.markedWllLb != null ? "wll" : e.gradeMarked ? "grade" : "none",
    markedWll: e.markedWllLb != null ? { value: e.markedWllLb, unit: "lb" } : undefined,
    grade: e.grade ?? undefined,
    size: e.size ?? undefined,
    chainSizeRange: Array.isArray(d.chainSizeRange) ? d.chainSizeRange : undefined,
    mechanism: typeof d.mechanism === "string" ? d.mechanism : undefined,
    ends: typeof d.ends === "string" ? d.ends : undefined,
    length: e.lengthMm != null ? { value: toFeet({ value: e.lengthMm, unit: "mm" }).value, unit: "ft" } : undefined,
    serial: e.serial ?? undefined,
    yardId: e.yardId ?? undefined,
    inServiceOn: e.inServiceOn ?? undefined,
    costCents: e.costCents ?? undefined,
  };
}

/** The stored fields for an item input; on an update, detail keys the import does not manage are kept. */
export function storedFields(input: ItemInput, existing?: ExistingItem): ItemFields {
  const row = itemFields(input);
  if (existing) {
    for (const [k, v] of Object.entries(existing.details ?? {})) if (!(MANAGED_DETAILS as readonly string[]).includes(k)) row.details[k] = v;
  }
  return row;
}

/**
 * What an update changes, as the item's history shows edits: { field: [before, after] }.
 * Empty when the row repeats what is stored.
 */
export function rowChanges(existing: ExistingItem, row: ItemFields, yardName: (id: string | null) => string | null): ItemChanges {
  return itemChanges({ ...existing, yardName: yardName(existing.yardId) }, { ...row, yardName: yardName(row.yardId) });
}
