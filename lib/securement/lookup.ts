/**
 * The table lookup: the default WLL of unmarked tiedown material, read from the
 * 49 CFR 393.108 tables (tables.ts) by material, grade or fibre, and size.
 *
 * Two 393.108 rules choose the row when the query does not (ECFRIO-108 / SC-108 text, verified):
 * - (c) synthetic cordage not labelled with its fibre counts as polypropylene rope; the
 *   answer also gives the manila figure, which is lower, in case the rope is manila (f);
 * - (d) welded steel chain not marked with its grade counts as grade 30 proof coil.
 * How a component's marking decides between its marking and these tables is marking.ts.
 *
 * @module
 */
import { boundedMemo } from "../memo";
import { RatingError } from "./errors";
import { SOURCES } from "./findings";
import { formatNumber } from "./format";
import type { GradeInput } from "./grades";
import { gradeMarkNote, isChainGrade, parseGrade } from "./grades";
import type { ParsedSize, SizeInput, SizedRow } from "./sizes";
import { findRow, nearestRows, parseSize } from "./sizes";
import type { ChainRow, RopeFibre, SizeRow, StrappingRow, TableStatus, WllTable } from "./tables";
import { CHAIN_TABLE, ROPE_FIBRES, ROPE_TABLES, STEEL_STRAPPING_TABLE, WEBBING_TABLE, WIRE_ROPE_TABLE } from "./tables";

/**
 * Tiedown materials that have a default table.
 *
 * @example
 * const m: Material = "wire-rope";
 */
export type Material = "chain" | "webbing" | "wire-rope" | "rope" | "steel-strapping";

/**
 * A query for a default (table) WLL. Which fields are needed depends on the material:
 * chain: `size` (and `grade`; none means grade 30, 393.108(d)); webbing: `width`; wire rope:
 * `size`; rope: `size` (and `fibre`; none means polypropylene, 393.108(c)); steel
 * strapping: `width` and `thickness`.
 *
 * @example
 * const q: RatingQuery = { material: "chain", grade: 70, size: "3/8 in" };
 */
export interface RatingQuery {
  readonly material: Material;
  readonly grade?: GradeInput | undefined;
  readonly size?: SizeInput | undefined;
  readonly width?: SizeInput | undefined;
  readonly thickness?: SizeInput | undefined;
  readonly fibre?: string | undefined;
}

/**
 * A default WLL read from a 49 CFR 393.108 table: both published columns, the table it
 * comes from, and whether it was read from a verified copy.
 *
 * - `basis`: `"table"` when the query named the grade or fibre; `"unmarked-rule"` when a
 *   393.108 rule for unmarked material chose the row (no grade → grade 30; no fibre →
 *   polypropylene), explained in `rule`.
 * - `row`: the row, named as published: "10 (3/8)", "31.7 x 0.74 (1 1/4 x 0.029)".
 * - `notes`: how the query was read, when that needs saying (grade mark 40 read as grade
 *   43; the manila figure beside a rope of unknown fibre). Absent when there is nothing to say.
 *
 * @example
 * defaultRating({ material: "chain", grade: 70, size: "3/8 in" });
 * // { material: "chain", wllLb: 6600, wllKg: 2990, source: "49 CFR 393.108, chain table",
 * //   status: "verified", basis: "table", grade: 70, row: "10 (3/8)", size: "3/8 in" }
 */
export interface DefaultRating {
  readonly material: Material;
  readonly wllLb: number;
  readonly wllKg: number;
  readonly source: string;
  readonly status: TableStatus;
  readonly basis: "table" | "unmarked-rule";
  readonly rule?: string;
  readonly grade?: number;
  readonly fibre?: RopeFibre;
  readonly row: string;
  readonly size: string;
  readonly notes?: readonly string[];
}

/**
 * A table value as published, pound column first: "2,650 lb (1,200 kg)".
 *
 * @example
 * formatTableWll({ wllLb: 2650, wllKg: 1200 }); // "2,650 lb (1,200 kg)"
 */
export function formatTableWll(r: { readonly wllLb: number; readonly wllKg: number }): string {
  return `${formatNumber(r.wllLb)} lb (${formatNumber(r.wllKg)} kg)`;
}

function requireSize(value: SizeInput | undefined, what: string, field: string, material: string): ParsedSize {
  if (value === undefined || value === "") {
    throw new RatingError("MISSING_SIZE", `${what} is needed to rate ${material} from the 49 CFR 393.108 table`, { field });
  }
  return parseSize(value);
}

function rowName(row: SizedRow): string {
  return `${row.mm} (${row.label})`;
}

function rateChain(gradeInput: GradeInput | undefined, sizeInput: SizeInput | undefined): DefaultRating {
  let grade: number;
  let basis: DefaultRating["basis"] = "table";
  let rule: string | undefined;
  const notes: string[] = [];
  if (gradeInput === undefined || gradeInput === "") {
    grade = 30;
    basis = "unmarked-rule";
    rule = `${SOURCES.unmarkedChain}: welded steel chain not marked with its grade or WLL is rated as grade 30 proof coil`;
  } else {
    const parsed = parseGrade(gradeInput);
    if (parsed === undefined || !isChainGrade(parsed)) {
      throw new RatingError(
        "UNKNOWN_GRADE",
        `Grade ${String(gradeInput)} is not a column of the 49 CFR 393.108 chain table (grades 30, 43, 70, 80, 100); use the WLL marked on the chain`,
        { field: "grade" },
      );
    }
    grade = parsed;
    const note = gradeMarkNote(gradeInput);
    if (note) notes.push(note);
  }
  const size = requireSize(sizeInput, "The chain size", "size", "chain");
  const row: ChainRow = findRow(size, CHAIN_TABLE.rows, CHAIN_TABLE.title);
  const cell = isChainGrade(grade) ? row.grades[grade] : undefined;
  if (!cell) {
    const withGrade = CHAIN_TABLE.rows.filter((r) => isChainGrade(grade) && r.grades[grade] !== undefined);
    const nearest = nearestRows(size, withGrade);
    throw new RatingError(
      "SIZE_NOT_IN_TABLE",
      `Size ${size.display} has no grade ${grade} entry in the ${CHAIN_TABLE.title}; nearest grade ${grade} sizes: ${nearest.join(", ")}`,
      { nearest, field: "size" },
    );
  }
  return {
    material: "chain",
    wllLb: cell.lb,
    wllKg: cell.kg,
    source: CHAIN_TABLE.source,
    status: row.status,
    basis,
    ...(rule === undefined ? {} : { rule }),
    grade,
    row: rowName(row),
    size: `${row.label} in`,
    ...(notes.length ? { notes } : {}),
  };
}

function rateBySize(material: Material, table: WllTable<SizeRow>, sizeInput: SizeInput | undefined, noun: "size" | "width", name: string): DefaultRating {
  const size = requireSize(sizeInput, `The ${name} ${noun}`, noun, name);
  const row = findRow(size, table.rows, table.title, noun === "size" ? "Size" : "Width", noun);
  return { material, wllLb: row.lb, wllKg: row.kg, source: table.source, status: row.status, basis: "table", row: rowName(row), size: `${row.label} in` };
}

function rateRope(fibreInput: string | undefined, sizeInput: SizeInput | undefined): DefaultRating {
  if (fibreInput === undefined || fibreInput === "") {
    // 49 CFR 393.108(c): unlabelled synthetic cordage counts as polypropylene. It may be
    // manila, whose table (393.108(f)) is lower: say so with both figures.
    const r = rateBySize("rope", ROPE_TABLES.polypropylene, sizeInput, "size", "rope");
    const manila = rateBySize("rope", ROPE_TABLES.manila, sizeInput, "size", "rope");
    return {
      ...r,
      basis: "unmarked-rule",
      rule: `${SOURCES.unmarkedCordage}: synthetic cordage not labelled with its fibre or WLL is rated as polypropylene fiber rope`,
      fibre: "polypropylene",
      notes: [manilaNote(r, manila)],
    };
  }
  if (!(ROPE_FIBRES as readonly string[]).includes(fibreInput)) {
    throw new RatingError("UNKNOWN_FIBRE", `Rope fibre "${fibreInput}" has no 49 CFR 393.108 table (tables: ${ROPE_FIBRES.join(", ")})`, { field: "fibre" });
  }
  const fibre = fibreInput as RopeFibre;
  return { ...rateBySize("rope", ROPE_TABLES[fibre], sizeInput, "size", "rope"), fibre };
}

/**
 * The caution beside a rope of unknown fibre rated as polypropylene: both figures.
 *
 * @example
 * manilaNote(defaultRating({ material: "rope", fibre: "polypropylene", size: "1/2" }), defaultRating({ material: "rope", fibre: "manila", size: "1/2" }));
 * // "Rated as polypropylene (49 CFR 393.108(c)): 625 lb (280 kg). If it is manila (natural fibre), 49 CFR 393.108(f) rates it lower: 315 lb (150 kg)"
 */
export function manilaNote(polypropylene: DefaultRating, manila: DefaultRating): string {
  return `Rated as polypropylene (${SOURCES.unmarkedCordage}): ${formatTableWll(polypropylene)}. If it is manila (natural fibre), ${SOURCES.unmarkedManila} rates it lower: ${formatTableWll(manila)}`;
}

function rateStrapping(widthInput: SizeInput | undefined, thicknessInput: SizeInput | undefined): DefaultRating {
  const width = requireSize(widthInput, "The strapping width", "width", "steel strapping");
  const thickness = requireSize(thicknessInput, "The strapping thickness", "thickness", "steel strapping");
  const widths: SizedRow[] = [];
  for (const r of STEEL_STRAPPING_TABLE.rows) if (!widths.includes(r.width)) widths.push(r.width);
  const w = findRow(width, widths, STEEL_STRAPPING_TABLE.title, "Width", "width");
  const rows = STEEL_STRAPPING_TABLE.rows.filter((r) => r.width === w);
  const t = findRow(thickness, rows.map((r) => r.thickness), `${STEEL_STRAPPING_TABLE.title} for ${w.label} in width`, "Thickness", "thickness");
  const row = rows.find((r) => r.thickness === t) as StrappingRow;
  return {
    material: "steel-strapping",
    wllLb: row.lb,
    wllKg: row.kg,
    source: STEEL_STRAPPING_TABLE.source,
    status: row.status,
    basis: "table",
    row: `${w.mm} x ${t.mm} (${w.label} x ${t.label})`,
    size: `${w.label} x ${t.label} in`,
  };
}

// The tables are constant and a plan names the same few sizes in every tiedown: each answer
// is kept by its query, frozen so no caller can change it for the next. Only numbers and
// short texts are kept. A refused query is worked out again each time (its RatingError is
// thrown fresh).
const QUERY_FIELDS = ["material", "grade", "size", "width", "thickness", "fibre"] as const;

function queryKey(query: RatingQuery): string | null {
  let key = "";
  for (const field of QUERY_FIELDS) {
    const value = query[field];
    if (value === undefined) key += "\u0001";
    else if (typeof value === "number") key += `\u0001#${value}`;
    else if (typeof value === "string" && value.length <= 64) key += `\u0001'${value}`;
    else return null;
  }
  return key;
}

function frozen(rating: DefaultRating): DefaultRating {
  if (rating.notes) Object.freeze(rating.notes);
  return Object.freeze(rating);
}

const keptRating = boundedMemo((query: RatingQuery) => frozen(rate(query)), { limit: 1000, key: queryKey });

/**
 * Looks up the default WLL of tiedown material in the 49 CFR 393.108 tables. The answer is
 * frozen (the same answer is shared by every caller that asks the same query).
 *
 * @throws {RatingError} `SIZE_NOT_IN_TABLE` (with `nearest`), `INVALID_SIZE`, `MISSING_SIZE`,
 *   `UNKNOWN_GRADE`, `UNKNOWN_FIBRE`, `UNKNOWN_MATERIAL`.
 * @example
 * defaultRating({ material: "chain", grade: 70, size: "3/8 in" }).wllLb;  // 6600
 * defaultRating({ material: "chain", size: "10 mm" }).wllKg;              // 1200 (no grade: grade 30)
 * defaultRating({ material: "chain", grade: 40, size: "3/8" }).grade;     // 43, with a note in `notes`
 * defaultRating({ material: "webbing", width: "4 in" }).wllLb;             // 4000
 * defaultRating({ material: "rope", size: "13 mm" }).fibre;                // "polypropylene" (the 1/2 in row)
 * defaultRating({ material: "steel-strapping", width: "1 1/4", thickness: "0.029" }).wllLb; // 1190
 */
export function defaultRating(query: RatingQuery): DefaultRating {
  return keptRating(query);
}

function rate(query: RatingQuery): DefaultRating {
  switch (query.material) {
    case "chain":
      return rateChain(query.grade, query.size);
    case "webbing":
      return rateBySize("webbing", WEBBING_TABLE, query.width ?? query.size, "width", "webbing");
    case "wire-rope":
      return rateBySize("wire-rope", WIRE_ROPE_TABLE, query.size, "size", "wire rope");
    case "rope":
      return rateRope(query.fibre, query.size);
    case "steel-strapping":
      return rateStrapping(query.width, query.thickness);
    default:
      throw new RatingError("UNKNOWN_MATERIAL", `Material "${String((query as { material: unknown }).material)}" has no 49 CFR 393.108 table`, { field: "material" });
  }
}
