/**
 * The default working-load-limit tables of 49 CFR 393.108 ("Tables to §393.108"), with both
 * the kg and the lb columns exactly as published. The two columns are separately rounded
 * figures (e.g. grade 80, 5/16 in: 2,000 kg and 4,500 lb, while 4,500 lb is 2,041 kg): never
 * derive one from the other.
 *
 * Under 393.108(b) these are the WLLs of tiedown material that is not marked by its maker;
 * a marked WLL is used as marked.
 *
 * Each table and row carries its verification status (shared reference, §1.4):
 * - "verified": read in retrieved text. Sources, by table:
 *   - chain, synthetic webbing, wire rope 1/4–3/4 in: the JJK-108 copy of the tables (the
 *     chain table also in the independent FORD-108 copy);
 *   - wire rope 7/8 in and 1 in, manila, polypropylene, polyester and nylon rope: the 1994
 *     final rule's table (59 FR, 6 July 1994, "Tables to §393.102(b)(6)"), which the 2002
 *     §393.108 tables carried over (every row it shares with JJK-108 is identical); the
 *     manila table also in the New York State cargo manual's copy;
 *   - steel strapping row 1: secondary copies quoting the FMCSA rules.
 * - "from-memory": FROM MEMORY, not verified against the primary text (no copy found in the
 *   sources read): the double braided nylon rope table and steel strapping rows 2–8.
 *
 * @module
 */
import type { ChainGrade } from "./grades";
import type { SizedRow } from "./sizes";

/**
 * Whether a table value was read in retrieved text, or is FROM MEMORY (not verified against
 * the primary text).
 *
 * @example
 * const s: TableStatus = "from-memory";
 */
export type TableStatus = "verified" | "from-memory";

/**
 * One published WLL, in both published columns.
 *
 * @example
 * const cell: WllCell = { lb: 6600, kg: 2990 }; // grade 70, 3/8 in
 */
export interface WllCell {
  readonly lb: number;
  readonly kg: number;
}

/**
 * A row of a table with one WLL per size (webbing, wire rope, rope).
 *
 * @example
 * const row: SizeRow = { label: "4", inches: 4, mm: 100, lb: 4000, kg: 1810, status: "verified" };
 */
export interface SizeRow extends SizedRow, WllCell {
  readonly status: TableStatus;
}

/**
 * A row of the chain table: one size, one WLL per grade (grades 80 and 100 have no 7/16 in row).
 *
 * @example
 * CHAIN_TABLE.rows[2].grades[70]; // { lb: 6600, kg: 2990 }
 */
export interface ChainRow extends SizedRow {
  readonly grades: Readonly<Partial<Record<ChainGrade, WllCell>>>;
  readonly status: TableStatus;
}

/**
 * A row of the steel strapping table: width × thickness.
 *
 * @example
 * STEEL_STRAPPING_TABLE.rows[0]; // 1 1/4 × 0.029 in (31.7 × 0.74 mm): 1,190 lb, 540 kg
 */
export interface StrappingRow extends WllCell {
  readonly width: SizedRow;
  readonly thickness: SizedRow;
  readonly status: TableStatus;
}

/**
 * A 49 CFR 393.108 table: `title` for sentences ("49 CFR 393.108 chain table"), `source` for
 * citations ("49 CFR 393.108, chain table"), `status` of the table as a whole (the
 * least-verified of its rows).
 *
 * @example
 * WEBBING_TABLE.source; // "49 CFR 393.108, synthetic webbing table"
 */
export interface WllTable<R> {
  readonly id: string;
  readonly title: string;
  readonly source: string;
  readonly status: TableStatus;
  readonly rows: readonly R[];
}

function deepFreeze<T>(value: T): T {
  if (value && typeof value === "object") {
    for (const v of Object.values(value)) deepFreeze(v);
    Object.freeze(value);
  }
  return value;
}

const size = (label: string, inches: number, mm: number): SizedRow => ({ label, inches, mm });

// 49 CFR 393.108, chain table: WLL in kg (lb) by size mm (in) and grade
// (JJK-108 copy, verified; FORD-108 independent copy matches exactly).
// Note grade 80 at 5/16 in (4,500 lb) is below grade 70 at 5/16 in (4,700 lb) as published.
/**
 * 49 CFR 393.108, chain table (welded steel chain by grade 30/43/70/80/100 and size).
 * Status: verified (JJK-108 copy; FORD-108 copy identical).
 *
 * @example
 * CHAIN_TABLE.rows.find((r) => r.label === "3/8")?.grades[70]; // { lb: 6600, kg: 2990 }
 */
export const CHAIN_TABLE: WllTable<ChainRow> = deepFreeze({
  id: "chain",
  title: "49 CFR 393.108 chain table",
  source: "49 CFR 393.108, chain table",
  status: "verified",
  rows: [
    { ...size("1/4", 0.25, 7), status: "verified", grades: { 30: { kg: 580, lb: 1300 }, 43: { kg: 1180, lb: 2600 }, 70: { kg: 1430, lb: 3150 }, 80: { kg: 1570, lb: 3500 }, 100: { kg: 1950, lb: 4300 } } },
    { ...size("5/16", 0.3125, 8), status: "verified", grades: { 30: { kg: 860, lb: 1900 }, 43: { kg: 1770, lb: 3900 }, 70: { kg: 2130, lb: 4700 }, 80: { kg: 2000, lb: 4500 }, 100: { kg: 2600, lb: 5700 } } },
    { ...size("3/8", 0.375, 10), status: "verified", grades: { 30: { kg: 1200, lb: 2650 }, 43: { kg: 2450, lb: 5400 }, 70: { kg: 2990, lb: 6600 }, 80: { kg: 3200, lb: 7100 }, 100: { kg: 4000, lb: 8800 } } },
    { ...size("7/16", 0.4375, 11), status: "verified", grades: { 30: { kg: 1680, lb: 3700 }, 43: { kg: 3270, lb: 7200 }, 70: { kg: 3970, lb: 8750 } } },
    { ...size("1/2", 0.5, 13), status: "verified", grades: { 30: { kg: 2030, lb: 4500 }, 43: { kg: 4170, lb: 9200 }, 70: { kg: 5130, lb: 11300 }, 80: { kg: 5400, lb: 12000 }, 100: { kg: 6800, lb: 15000 } } },
    { ...size("5/8", 0.625, 16), status: "verified", grades: { 30: { kg: 3130, lb: 6900 }, 43: { kg: 5910, lb: 13000 }, 70: { kg: 7170, lb: 15800 }, 80: { kg: 8200, lb: 18100 }, 100: { kg: 10300, lb: 22600 } } },
  ],
});

// 49 CFR 393.108, synthetic webbing table: WLL kg (lb) by width mm (in) (JJK-108 copy, verified).
/**
 * 49 CFR 393.108, synthetic webbing table (by width). Status: verified (JJK-108 copy).
 * A 1 in width is not a row (the "1,000 lb per inch" rule of thumb is not regulatory).
 *
 * @example
 * WEBBING_TABLE.rows.find((r) => r.label === "4"); // { ..., lb: 4000, kg: 1810 }
 */
export const WEBBING_TABLE: WllTable<SizeRow> = deepFreeze({
  id: "webbing",
  title: "49 CFR 393.108 synthetic webbing table",
  source: "49 CFR 393.108, synthetic webbing table",
  status: "verified",
  rows: [
    { ...size("1 3/4", 1.75, 45), kg: 790, lb: 1750, status: "verified" },
    { ...size("2", 2, 50), kg: 910, lb: 2000, status: "verified" },
    { ...size("3", 3, 75), kg: 1360, lb: 3000, status: "verified" },
    { ...size("4", 4, 100), kg: 1810, lb: 4000, status: "verified" },
  ],
});

// 49 CFR 393.108, wire rope (6 x 37, fiber core) table: WLL kg (lb) by diameter mm (in).
// Rows 1/4 to 3/4 in: JJK-108 copy, verified. Rows 7/8 in and 1 in: verified against the
// 1994 final rule's table (59 FR, 6 July 1994), which the 2002 tables carried over; both are
// also one quarter of the published 6 x 19 fibre-core breaking strengths, 64,400 lb and
// 83,600 lb. (An earlier copy of these rows, from memory, said 15,700 and 20,700 lb: wrong.)
/**
 * 49 CFR 393.108, wire rope (6 × 37, fiber core) table. Every row verified: 1/4–3/4 in in
 * the JJK-108 copy, 7/8 in and 1 in in the 1994 final rule's table the 2002 rule carried over.
 *
 * @example
 * WIRE_ROPE_TABLE.rows.find((r) => r.label === "1/2")?.lb; // 5300
 */
export const WIRE_ROPE_TABLE: WllTable<SizeRow> = deepFreeze({
  id: "wire-rope",
  title: "49 CFR 393.108 wire rope (6 x 37, fiber core) table",
  source: "49 CFR 393.108, wire rope (6 x 37, fiber core) table",
  status: "verified",
  rows: [
    { ...size("1/4", 0.25, 7), kg: 640, lb: 1400, status: "verified" },
    { ...size("5/16", 0.3125, 8), kg: 950, lb: 2100, status: "verified" },
    { ...size("3/8", 0.375, 10), kg: 1360, lb: 3000, status: "verified" },
    { ...size("7/16", 0.4375, 11), kg: 1860, lb: 4100, status: "verified" },
    { ...size("1/2", 0.5, 13), kg: 2400, lb: 5300, status: "verified" },
    { ...size("5/8", 0.625, 16), kg: 3770, lb: 8300, status: "verified" },
    { ...size("3/4", 0.75, 20), kg: 4940, lb: 10900, status: "verified" },
    { ...size("7/8", 0.875, 22), kg: 7300, lb: 16100, status: "verified" }, // 1994 final rule's table; 1/4 of 64,400 lb
    { ...size("1", 1, 25), kg: 9480, lb: 20900, status: "verified" }, // 1994 final rule's table; 1/4 of 83,600 lb
  ],
});

/**
 * Rope fibres that have a 49 CFR 393.108 table.
 *
 * @example
 * ROPE_FIBRES.includes("double-braided-nylon"); // true
 */
export const ROPE_FIBRES = ["manila", "polypropylene", "polyester", "nylon", "double-braided-nylon"] as const;

/**
 * A rope fibre that has a table.
 *
 * @example
 * const f: RopeFibre = "polypropylene";
 */
export type RopeFibre = (typeof ROPE_FIBRES)[number];

// The rope tables share their size column: 10 (3/8), 11 (7/16), 13 (1/2), 16 (5/8), 20 (3/4), 25 (1).
// The 1/2 in row is 13 mm, as in the chain and wire rope tables (1994 final rule's table and
// the New York State cargo manual's copy; an earlier copy of this note said 12 mm: wrong).
const ROPE_SIZES = [size("3/8", 0.375, 10), size("7/16", 0.4375, 11), size("1/2", 0.5, 13), size("5/8", 0.625, 16), size("3/4", 0.75, 20), size("1", 1, 25)];

function ropeTable(id: RopeFibre, name: string, status: TableStatus, cells: ReadonlyArray<readonly [kg: number, lb: number]>): WllTable<SizeRow> {
  return deepFreeze({
    id: `rope-${id}`,
    title: `49 CFR 393.108 ${name} table`,
    source: `49 CFR 393.108, ${name} table`,
    status,
    rows: ROPE_SIZES.map((s, i) => ({ ...s, kg: cells[i]![0], lb: cells[i]![1], status })),
  });
}

/**
 * The five rope tables of 49 CFR 393.108, by fibre (WLL kg, lb by diameter). Manila,
 * polypropylene, polyester and nylon: verified against the 1994 final rule's table (which
 * the 2002 rule carried over; manila also in the New York State cargo manual's copy).
 * Double braided nylon: FROM MEMORY, not verified against the primary text (some copies
 * swap it with nylon; a rope maker's 3-strand nylon table agrees with the nylon row here).
 *
 * @example
 * ROPE_TABLES.polypropylene.rows[0]; // 3/8 in: 400 lb, 180 kg
 * ROPE_TABLES.manila.rows[2].mm;    // 13 (the 1/2 in row)
 */
export const ROPE_TABLES: Readonly<Record<RopeFibre, WllTable<SizeRow>>> = deepFreeze({
  // 49 CFR 393.108, manila rope table: verified (1994 final rule's table; NY State cargo manual copy).
  manila: ropeTable("manila", "manila rope", "verified", [[90, 205], [120, 265], [150, 315], [210, 465], [290, 640], [480, 1050]]),
  // 49 CFR 393.108, polypropylene fiber rope (3-strand and 8-strand) table: verified (1994 final rule's table).
  polypropylene: ropeTable("polypropylene", "polypropylene fiber rope", "verified", [[180, 400], [240, 525], [280, 625], [420, 925], [580, 1275], [950, 2100]]),
  // 49 CFR 393.108, polyester fiber rope (3-strand and 8-strand) table: verified (1994 final rule's table).
  polyester: ropeTable("polyester", "polyester fiber rope", "verified", [[250, 555], [340, 750], [440, 960], [680, 1500], [850, 1880], [1500, 3300]]),
  // 49 CFR 393.108, nylon rope table: verified (1994 final rule's table, "Nylon Rope").
  nylon: ropeTable("nylon", "nylon rope", "verified", [[130, 278], [190, 410], [240, 525], [420, 935], [640, 1420], [1140, 2520]]),
  // 49 CFR 393.108, double braided nylon rope table: FROM MEMORY, not verified against the primary text.
  "double-braided-nylon": ropeTable("double-braided-nylon", "double braided nylon rope", "from-memory", [[150, 336], [230, 502], [300, 655], [510, 1130], [830, 1840], [1470, 3250]]),
});

// 49 CFR 393.108, steel strapping table: WLL kg (lb) by width x thickness mm (in).
// Row 1 (1 1/4 x 0.029 in, 31.7 x 0.74 mm: 540 kg, 1,190 lb): verified (secondary copies
// quoting the FMCSA rules). Rows 2-8: FROM MEMORY, not verified against the primary text.
const W114 = size("1 1/4", 1.25, 31.7);
const W2 = size("2", 2, 50.8);
/**
 * 49 CFR 393.108, steel strapping table (width × thickness). Row 1 verified (secondary
 * copies); rows 2–8 FROM MEMORY, not verified against the primary text.
 *
 * @example
 * STEEL_STRAPPING_TABLE.rows[5]; // 1 1/4 × 0.057 in: 1,925 lb, 870 kg
 */
export const STEEL_STRAPPING_TABLE: WllTable<StrappingRow> = deepFreeze({
  id: "steel-strapping",
  title: "49 CFR 393.108 steel strapping table",
  source: "49 CFR 393.108, steel strapping table",
  status: "from-memory",
  rows: [
    { width: W114, thickness: size("0.029", 0.029, 0.74), kg: 540, lb: 1190, status: "verified" },
    { width: W114, thickness: size("0.031", 0.031, 0.79), kg: 540, lb: 1190, status: "from-memory" }, // FROM MEMORY
    { width: W114, thickness: size("0.035", 0.035, 0.89), kg: 540, lb: 1190, status: "from-memory" }, // FROM MEMORY
    { width: W114, thickness: size("0.044", 0.044, 1.12), kg: 770, lb: 1690, status: "from-memory" }, // FROM MEMORY
    { width: W114, thickness: size("0.050", 0.05, 1.27), kg: 770, lb: 1690, status: "from-memory" }, // FROM MEMORY
    { width: W114, thickness: size("0.057", 0.057, 1.47), kg: 870, lb: 1925, status: "from-memory" }, // FROM MEMORY
    { width: W2, thickness: size("0.044", 0.044, 1.12), kg: 1200, lb: 2650, status: "from-memory" }, // FROM MEMORY
    { width: W2, thickness: size("0.050", 0.05, 1.27), kg: 1200, lb: 2650, status: "from-memory" }, // FROM MEMORY
  ],
});
