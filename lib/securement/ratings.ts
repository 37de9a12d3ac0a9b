/**
 * Working load limits of single components: the 49 CFR 393.108 default tables
 * ({@link defaultRating}) and the marking rules ({@link componentWll}).
 *
 * Rules applied (49 CFR 393.108, ECFRIO-108 / SC-108 text, verified):
 * - (b) a WLL marked by the maker is used as marked; the tables apply to unmarked material.
 * - (c) synthetic cordage not labelled with its fibre or WLL counts as polypropylene rope.
 * - (d) welded steel chain not marked with its grade or WLL counts as grade 30 proof coil.
 * - (e)(2) wire rope whose construction is not identified counts as 6 × 37 fiber core.
 *   (Requests carry no construction, so unmarked wire rope is always rated from that
 *   table; this is the conservative reading of (e)(1), which would rate a known
 *   construction from the Wire Rope Users Manual: enter such a rope's WLL as marked.)
 * - (f) unmarked manila rope is rated from the manila table.
 * - Binders, hooks, shackles and anchor points have no table: they need a marked WLL.
 *
 * @module
 */
import { RatingError } from "./errors";
import type { Finding } from "./findings";
import { SOURCES } from "./findings";
import { formatLbKg, formatNumber } from "./format";
import { GRADE_NAMES, isChainGrade, parseGrade } from "./grades";
import type { GradeInput } from "./grades";
import type { Component, ComponentType } from "./request";
import type { ParsedSize, SizeInput, SizedRow } from "./sizes";
import { findRow, nearestRows, parseSize } from "./sizes";
import type { ChainRow, RopeFibre, SizeRow, StrappingRow, TableStatus, WllTable } from "./tables";
import { CHAIN_TABLE, ROPE_FIBRES, ROPE_TABLES, STEEL_STRAPPING_TABLE, WEBBING_TABLE, WIRE_ROPE_TABLE } from "./tables";
import { settle, toLb } from "./units";

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
}

function requireSize(value: SizeInput | undefined, what: string, field: string, material: string): ParsedSize {
  if (value === undefined || value === "") {
    throw new RatingError("MISSING_SIZE", `${what} is needed to rate ${material} from the 49 CFR 393.108 table`, { field });
  }
  const parsed = parseSize(value);
  return parsed;
}

/** A table value as published: "2,650 lb (1,200 kg)". */
function formatTableWll(r: { wllLb: number; wllKg: number }): string {
  return `${formatNumber(r.wllLb)} lb (${formatNumber(r.wllKg)} kg)`;
}

function rowName(row: SizedRow): string {
  return `${row.mm} (${row.label})`;
}

function rateChain(gradeInput: GradeInput | undefined, sizeInput: SizeInput | undefined): DefaultRating {
  let grade: number;
  let basis: DefaultRating["basis"] = "table";
  let rule: string | undefined;
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
  };
}

function rateBySize(material: Material, table: WllTable<SizeRow>, sizeInput: SizeInput | undefined, noun: "size" | "width", name: string): DefaultRating {
  const size = requireSize(sizeInput, `The ${name} ${noun}`, noun, name);
  const row = findRow(size, table.rows, table.title, noun === "size" ? "Size" : "Width", noun);
  return { material, wllLb: row.lb, wllKg: row.kg, source: table.source, status: row.status, basis: "table", row: rowName(row), size: `${row.label} in` };
}

function rateRope(fibreInput: string | undefined, sizeInput: SizeInput | undefined): DefaultRating {
  let fibre: RopeFibre;
  let basis: DefaultRating["basis"] = "table";
  let rule: string | undefined;
  if (fibreInput === undefined || fibreInput === "") {
    fibre = "polypropylene";
    basis = "unmarked-rule";
    rule = `${SOURCES.unmarkedCordage}: synthetic cordage not labelled with its fibre or WLL is rated as polypropylene fiber rope`;
  } else if ((ROPE_FIBRES as readonly string[]).includes(fibreInput)) {
    fibre = fibreInput as RopeFibre;
  } else {
    throw new RatingError(
      "UNKNOWN_FIBRE",
      `Rope fibre "${fibreInput}" has no 49 CFR 393.108 table (tables: ${ROPE_FIBRES.join(", ")})`,
      { field: "fibre" },
    );
  }
  const rating = rateBySize("rope", ROPE_TABLES[fibre], sizeInput, "size", "rope");
  return { ...rating, basis, ...(rule === undefined ? {} : { rule }), fibre };
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

/**
 * Looks up the default WLL of tiedown material in the 49 CFR 393.108 tables.
 *
 * @throws {RatingError} `SIZE_NOT_IN_TABLE` (with `nearest`), `INVALID_SIZE`, `MISSING_SIZE`,
 *   `UNKNOWN_GRADE`, `UNKNOWN_FIBRE`, `UNKNOWN_MATERIAL`.
 * @example
 * defaultRating({ material: "chain", grade: 70, size: "3/8 in" }).wllLb;  // 6600
 * defaultRating({ material: "chain", size: "10 mm" }).wllKg;              // 1200 (no grade: grade 30)
 * defaultRating({ material: "webbing", width: "4 in" }).wllLb;             // 4000
 * defaultRating({ material: "rope", size: "1/2" }).fibre;                  // "polypropylene"
 * defaultRating({ material: "steel-strapping", width: "1 1/4", thickness: "0.029" }).wllLb; // 1190
 */
export function defaultRating(query: RatingQuery): DefaultRating {
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

/**
 * A finding about one component, before it is placed in a tiedown.
 *
 * @example
 * const f: ComponentFinding = { code: "MARKED_ABOVE_TABLE", severity: "warn", message: "...", source: "49 CFR 393.108(b)" };
 */
export type ComponentFinding = Omit<Finding, "tiedown" | "component" | "path"> & { readonly field?: string };

/**
 * The WLL of one component and how it was obtained.
 *
 * - `basis`: `"marked"` (393.108(b)), `"table"`, or `"unmarked-rule"` (393.108(c), (d)).
 * - `tableWllKg`: the table's own kg figure when the WLL came from a table (the engine's
 *   verdicts use `wllLb`; see check.ts).
 * - `status`: the table row's verification status, for table values.
 * - `findings`: warnings and notes about this component.
 *
 * @example
 * componentWll({ type: "chain", grade: 70, size: "5/16", marked: false });
 * // { type: "chain", wllLb: 1900, tableWllKg: 860, basis: "unmarked-rule", ... }
 */
export interface ComponentRating {
  readonly type: ComponentType;
  readonly description: string;
  readonly wllLb: number;
  readonly tableWllKg?: number;
  readonly basis: "marked" | "table" | "unmarked-rule";
  readonly source: string;
  readonly status?: TableStatus;
  readonly findings: readonly ComponentFinding[];
}

function markedLb(component: Component): number | undefined {
  const w = component.wll;
  if (w === undefined) return undefined;
  if (!Number.isFinite(w.value) || w.value <= 0) {
    throw new RatingError("MISSING_WLL", `The marked WLL must be a number above 0 (got ${String(w.value)} ${w.unit})`, { field: "wll" });
  }
  return settle(toLb(w).value);
}

function sizeText(value: SizeInput | undefined): string {
  if (value === undefined) return "";
  try {
    return `${parseSize(value).display} `;
  } catch {
    return `${String(value)} `;
  }
}

function describe(component: Component): string {
  const label = component.label ? `"${component.label}" ` : "";
  switch (component.type) {
    case "chain": {
      const g = component.grade === undefined ? undefined : parseGrade(component.grade);
      return `${label}${sizeText(component.size)}${g === undefined ? "" : `grade ${g} `}chain`.trim();
    }
    case "webbing":
      return `${label}${sizeText(component.width)}webbing`.trim();
    case "wire-rope":
      return `${label}${sizeText(component.size)}wire rope`.trim();
    case "rope":
      return `${label}${sizeText(component.size)}${component.fibre ? `${component.fibre.replace(/-/g, " ")} ` : ""}rope`.trim();
    case "steel-strapping":
      return `${label}${sizeText(component.width)}${component.thickness === undefined ? "" : `x ${sizeText(component.thickness)}`}steel strapping`.trim();
    case "anchor":
      return `${label}anchor point`.trim();
    case "hook":
    case "shackle": {
      const g = component.grade === undefined ? undefined : parseGrade(component.grade);
      return `${label}${g === undefined ? "" : `grade ${g} `}${component.type}`.trim();
    }
    default:
      return `${label}${component.type}`.trim();
  }
}

function ignoredWll(component: Component, reason: string): ComponentFinding[] {
  if (component.wll === undefined) return [];
  return [
    {
      code: "UNMARKED_WLL_IGNORED",
      severity: "warn",
      message: `It is entered as unmarked, so the entered WLL of ${component.wll.value} ${component.wll.unit} is not used; ${reason}`,
      source: SOURCES.marked,
      field: "wll",
    },
  ];
}

function fromTable(component: Component, rating: DefaultRating, basis: ComponentRating["basis"], source: string, findings: ComponentFinding[]): ComponentRating {
  return {
    type: component.type,
    description: describe(component),
    wllLb: rating.wllLb,
    tableWllKg: rating.wllKg,
    basis,
    source,
    status: rating.status,
    findings,
  };
}

function marked(component: Component, wllLb: number, findings: ComponentFinding[] = []): ComponentRating {
  return { type: component.type, description: describe(component), wllLb, basis: "marked", source: `${SOURCES.marked}: marked WLL`, findings };
}

function rateChainComponent(c: Extract<Component, { type: "chain" }>): ComponentRating {
  const grade = c.grade === undefined ? undefined : parseGrade(c.grade);
  if (c.marked !== false && c.grade !== undefined && grade === undefined) {
    throw new RatingError("UNKNOWN_GRADE", `Cannot read the chain grade "${String(c.grade)}"; write it as 30, 43, 70, 80 or 100 (or G70)`, { field: "grade" });
  }
  if (c.marked === false || (grade === undefined && c.wll === undefined)) {
    // 49 CFR 393.108(d): unmarked welded steel chain counts as grade 30 proof coil.
    const r = rateChain(30, c.size);
    const what = grade !== undefined && grade !== 30 ? `is entered as grade ${grade} but has no legible grade mark` : "has no grade mark";
    const findings: ComponentFinding[] = [
      ...(c.marked === false ? ignoredWll(c, `${SOURCES.unmarkedChain} rates it as grade 30 proof coil`) : []),
      {
        code: "RATED_AS_UNMARKED",
        severity: "info",
        message: `The ${r.size} chain ${what}, so it is rated as grade 30 proof coil: ${formatTableWll(r)}`,
        source: SOURCES.unmarkedChain,
      },
    ];
    return fromTable(c, r, "unmarked-rule", `${SOURCES.unmarkedChain}; ${CHAIN_TABLE.source} (grade 30)`, findings);
  }
  const wllLb = markedLb(c);
  if (wllLb !== undefined) {
    const findings: ComponentFinding[] = [];
    if (grade !== undefined && isChainGrade(grade) && c.size !== undefined) {
      let table: DefaultRating | undefined;
      try {
        table = rateChain(grade, c.size);
      } catch {
        table = undefined; // a marked WLL governs; a size outside the table is not an error here
      }
      if (table && wllLb > table.wllLb) {
        findings.push({
          code: "MARKED_ABOVE_TABLE",
          severity: "warn",
          message: `The marked WLL of ${formatLbKg(wllLb)} is above the ${CHAIN_TABLE.source} value for ${table.size} ${GRADE_NAMES[grade]} (${formatTableWll(table)}); the marking is used, but check the tag against the chain`,
          source: SOURCES.marked,
          field: "wll",
        });
      }
    }
    return marked(c, wllLb, findings);
  }
  const r = rateChain(grade as number, c.size);
  return fromTable(c, r, "table", `${CHAIN_TABLE.source} (grade ${r.grade})`, []);
}

function rateRopeComponent(c: Extract<Component, { type: "rope" }>): ComponentRating {
  const findings: ComponentFinding[] = [];
  const unmarkedSynthetic = c.marked === false && c.fibre !== "manila";
  if (c.marked === false) {
    findings.push(...ignoredWll(c, c.fibre === "manila" ? `${SOURCES.unmarkedManila} rates it from the manila rope table` : `${SOURCES.unmarkedCordage} rates it as polypropylene`));
  } else {
    const wllLb = markedLb(c);
    if (wllLb !== undefined) return marked(c, wllLb);
  }
  if (c.fibre === undefined || unmarkedSynthetic) {
    const r = rateRope("polypropylene", c.size);
    if (c.fibre === undefined) {
      const manila = rateRope("manila", c.size);
      findings.push({
        code: "ROPE_FIBRE_UNKNOWN",
        severity: "warn",
        message: `The rope's fibre is not given, so it is rated as polypropylene: ${formatTableWll(r)}. If it is manila (natural fibre), its table value is lower: ${formatTableWll(manila)}`,
        source: SOURCES.unmarkedCordage,
        field: "fibre",
      });
    } else {
      findings.push({
        code: "RATED_AS_UNMARKED",
        severity: "info",
        message: `The ${r.size} ${c.fibre.replace(/-/g, " ")} rope has no label naming its fibre or WLL, so it is rated as polypropylene: ${formatTableWll(r)}`,
        source: SOURCES.unmarkedCordage,
      });
    }
    return fromTable(c, r, "unmarked-rule", `${SOURCES.unmarkedCordage}; ${ROPE_TABLES.polypropylene.source}`, findings);
  }
  const r = rateRope(c.fibre, c.size);
  const source = c.fibre === "manila" ? `${SOURCES.unmarkedManila}; ${ROPE_TABLES.manila.source}` : ROPE_TABLES[c.fibre].source;
  return fromTable(c, r, "table", source, findings);
}

function rateTableMaterial(c: Extract<Component, { type: "webbing" | "wire-rope" | "steel-strapping" }>, lookup: () => DefaultRating, source: (r: DefaultRating) => string): ComponentRating {
  const findings: ComponentFinding[] = [];
  if (c.marked === false) {
    findings.push(...ignoredWll(c, "the 49 CFR 393.108 table value is used"));
  } else {
    const wllLb = markedLb(c);
    if (wllLb !== undefined) return marked(c, wllLb);
  }
  const r = lookup();
  return fromTable(c, r, "table", source(r), findings);
}

const NO_TABLE_HINT: Readonly<Record<"binder" | "hook" | "shackle" | "anchor", string>> = {
  binder: "enter the WLL stamped on the binder",
  hook: "enter the WLL stamped on the hook",
  shackle: "enter the WLL stamped on the shackle",
  anchor: "enter the WLL of the anchor point from the trailer's maker or its marking",
};

/**
 * The WLL of one component, applying the 49 CFR 393.108 marking rules: a marked WLL is used
 * as marked (with a `MARKED_ABOVE_TABLE` warning when a chain's marking exceeds the table
 * for its grade and size); unmarked chain counts as grade 30; unlabelled synthetic rope as
 * polypropylene; wire rope from the 6 × 37 fiber core table; binders, hooks, shackles and
 * anchors need a marked WLL.
 *
 * @throws {RatingError} when the component cannot be rated (`MISSING_WLL`, `SIZE_NOT_IN_TABLE`, ...).
 * @example
 * componentWll({ type: "chain", grade: 70, size: "5/16", marked: false }).wllLb; // 1900 (CVSA example)
 * componentWll({ type: "binder", wll: { value: 5400, unit: "lb" } }).wllLb;      // 5400
 * componentWll({ type: "binder" }); // throws RatingError MISSING_WLL
 */
export function componentWll(component: Component): ComponentRating {
  switch (component.type) {
    case "chain":
      return rateChainComponent(component);
    case "webbing":
      return rateTableMaterial(component, () => defaultRating({ material: "webbing", width: component.width }), (r) => r.source);
    case "wire-rope":
      return rateTableMaterial(component, () => defaultRating({ material: "wire-rope", size: component.size }), (r) => `${SOURCES.unmarkedWireRope}(2); ${r.source}`);
    case "rope":
      return rateRopeComponent(component);
    case "steel-strapping":
      return rateTableMaterial(component, () => defaultRating({ material: "steel-strapping", width: component.width, thickness: component.thickness }), (r) => r.source);
    case "binder":
    case "hook":
    case "shackle":
    case "anchor": {
      const wllLb = markedLb(component);
      if (wllLb === undefined) {
        const what = component.type === "anchor" ? "An anchor point" : `A ${component.type}`;
        throw new RatingError(
          "MISSING_WLL",
          `${what} must carry a marked WLL: the 49 CFR 393.108 tables do not cover it, and a tiedown's WLL is the lowest of its parts and anchor points (393.108(a)); ${NO_TABLE_HINT[component.type]}`,
          { field: "wll" },
        );
      }
      return marked(component, wllLb);
    }
    default:
      throw new RatingError("UNKNOWN_MATERIAL", `Component type "${String((component as { type: unknown }).type)}" is not known`, { field: "type" });
  }
}
