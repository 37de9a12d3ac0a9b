/**
 * The marking rules: the WLL of one component, from its marking or, when it is not marked,
 * from the rule of 49 CFR 393.108 for its material and the table lookup (lookup.ts).
 *
 * Rules applied (49 CFR 393.108, ECFRIO-108 / SC-108 text, verified):
 * - (b) a WLL marked by the maker is used as marked; the tables apply to unmarked material.
 * - (c) synthetic cordage not labelled with its fibre or WLL counts as polypropylene rope
 *   (with the manila figure beside it: the rope may be manila, which (f) rates lower).
 * - (d) welded steel chain not marked with its grade or WLL counts as grade 30 proof coil.
 * - (e)(1) wire rope not marked with a WLL: one quarter of its nominal strength (Wire Rope
 *   Users Manual), when the nominal strength is given. Given the construction but no
 *   nominal strength, the rope is rated from the 6 × 37 fiber core table with a warning that
 *   the table stands in only because no nominal strength was given.
 * - (e)(2) wire rope whose construction is not identified counts as 6 × 37 fiber core.
 * - (f) unmarked manila rope is rated from the manila table.
 * - Binders, hooks, shackles and anchor points have no table: they need a marked WLL.
 * - Grade marks 40 and 400 are read as grade 43 (grades.ts), with a note saying so.
 *
 * @module
 */
import { RatingError } from "./errors";
import type { Finding } from "./findings";
import { SOURCES } from "./findings";
import { formatLbKg } from "./format";
import type { GradeInput } from "./grades";
import { GRADE_NAMES, gradeMarkNote, isChainGrade, parseGrade } from "./grades";
import type { DefaultRating } from "./lookup";
import { defaultRating, formatTableWll, manilaNote } from "./lookup";
import type { Component, ComponentType } from "./request";
import type { SizeInput } from "./sizes";
import { parseSize } from "./sizes";
import type { TableStatus } from "./tables";
import { CHAIN_TABLE, ROPE_TABLES, WIRE_ROPE_TABLE } from "./tables";
import { settle, toLb } from "./units";

/**
 * A finding about one component, before it is placed in a tiedown. `field` is the
 * component's field it points at ("wll", "grade", ...).
 *
 * @example
 * const f: ComponentFinding = { code: "MARKED_ABOVE_TABLE", severity: "warn", message: "...", source: "49 CFR 393.108(b)" };
 */
export type ComponentFinding = Omit<Finding, "tiedown" | "component" | "path" | "detail"> & { readonly field?: string };

/**
 * The WLL of one component and how it was obtained.
 *
 * - `basis`: `"marked"` (393.108(b)), `"table"`, or `"unmarked-rule"` (393.108(c), (d), (e)(1)).
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

function positiveLb(w: { value: number; unit: string } | undefined, what: string, field: string): number | undefined {
  if (w === undefined) return undefined;
  if (!Number.isFinite(w.value) || w.value <= 0) {
    throw new RatingError("MISSING_WLL", `${what} must be a number above 0 (got ${String(w.value)} ${w.unit})`, { field });
  }
  return settle(toLb(w as Parameters<typeof toLb>[0]).value);
}

const markedLb = (c: Component) => positiveLb(c.wll, "The marked WLL", "wll");

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
      return `${label}${sizeText(component.size)}${component.construction ? `${component.construction} ` : ""}wire rope`.trim();
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

/** 49 CFR 393.108 chain mark notes: a mark read as another grade (40 → 43) is said so. */
function gradeNote(grade: GradeInput | undefined): ComponentFinding[] {
  const note = grade === undefined ? undefined : gradeMarkNote(grade);
  return note ? [{ code: "GRADE_MARK_READ_AS", severity: "info", message: note, source: SOURCES.gradeMarks, field: "grade" }] : [];
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
    const r = defaultRating({ material: "chain", grade: 30, size: c.size });
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
  const notes = gradeNote(c.grade);
  const wllLb = markedLb(c);
  if (wllLb !== undefined) {
    const findings: ComponentFinding[] = [...notes];
    if (grade !== undefined && isChainGrade(grade) && c.size !== undefined) {
      let table: DefaultRating | undefined;
      try {
        table = defaultRating({ material: "chain", grade, size: c.size });
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
  const r = defaultRating({ material: "chain", grade: grade as number, size: c.size });
  return fromTable(c, r, "table", `${CHAIN_TABLE.source} (grade ${r.grade})`, notes);
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
    const r = defaultRating({ material: "rope", fibre: "polypropylene", size: c.size });
    if (c.fibre === undefined) {
      // 393.108(c) rates it as polypropylene; it may be manila, which 393.108(f) rates lower.
      const manila = defaultRating({ material: "rope", fibre: "manila", size: c.size });
      findings.push({
        code: "ROPE_FIBRE_UNKNOWN",
        severity: "warn",
        message: `The ${r.size} rope's fibre is not given. ${manilaNote(r, manila)}`,
        source: `${SOURCES.unmarkedCordage}; ${SOURCES.unmarkedManila}`,
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
  const r = defaultRating({ material: "rope", fibre: c.fibre, size: c.size });
  const source = c.fibre === "manila" ? `${SOURCES.unmarkedManila}; ${ROPE_TABLES.manila.source}` : ROPE_TABLES[c.fibre].source;
  return fromTable(c, r, "table", source, findings);
}

function rateWireRopeComponent(c: Extract<Component, { type: "wire-rope" }>): ComponentRating {
  const findings: ComponentFinding[] = [];
  if (c.marked === false) {
    findings.push(...ignoredWll(c, `${SOURCES.unmarkedWireRope} rates wire rope without a marked WLL`));
  } else {
    const wllLb = markedLb(c);
    if (wllLb !== undefined) return marked(c, wllLb);
  }
  const nominalLb = positiveLb(c.nominalStrength, "The nominal strength", "nominalStrength");
  const name = describe({ ...c, label: undefined });
  if (nominalLb !== undefined) {
    // 49 CFR 393.108(e)(1): one quarter of the nominal strength in the Wire Rope Users Manual.
    const wllLb = nominalLb / 4;
    findings.push({
      code: "RATED_AS_UNMARKED",
      severity: "info",
      message: `The ${name} has no marked WLL, so it is rated at one quarter of its nominal strength of ${formatLbKg(nominalLb)}: ${formatLbKg(wllLb)}`,
      source: `${SOURCES.unmarkedWireRope}(1)`,
    });
    return {
      type: c.type,
      description: describe(c),
      wllLb,
      basis: "unmarked-rule",
      source: `${SOURCES.unmarkedWireRope}(1): one quarter of the nominal strength (Wire Rope Users Manual)`,
      findings,
    };
  }
  const r = defaultRating({ material: "wire-rope", size: c.size });
  if (c.construction) {
    // 393.108(e)(1) asks for the nominal strength of a known construction; without it the
    // 6 x 37 fiber core table ((e)(2)) is the only figure the engine has. Say so.
    findings.push({
      code: "WIRE_ROPE_RATED_FROM_TABLE",
      severity: "warn",
      message: `The ${name} is rated from the ${WIRE_ROPE_TABLE.title} (${formatTableWll(r)}) only because no nominal strength was given. Wire rope of known construction without a marked WLL is rated at one quarter of its nominal strength in the Wire Rope Users Manual: enter that nominal strength`,
      source: `${SOURCES.unmarkedWireRope}(1)`,
      field: "nominalStrength",
    });
    return fromTable(c, r, "table", `${SOURCES.unmarkedWireRope}(1), in place of the nominal strength; ${r.source}`, findings);
  }
  return fromTable(c, r, "table", `${SOURCES.unmarkedWireRope}(2); ${r.source}`, findings);
}

function rateTableMaterial(c: Extract<Component, { type: "webbing" | "steel-strapping" }>, lookup: () => DefaultRating): ComponentRating {
  const findings: ComponentFinding[] = [];
  if (c.marked === false) {
    findings.push(...ignoredWll(c, "the 49 CFR 393.108 table value is used"));
  } else {
    const wllLb = markedLb(c);
    if (wllLb !== undefined) return marked(c, wllLb);
  }
  const r = lookup();
  return fromTable(c, r, "table", r.source, findings);
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
 * polypropylene; unmarked wire rope at a quarter of its nominal strength, else from the
 * 6 × 37 fiber core table; binders, hooks, shackles and anchors need a marked WLL.
 *
 * @throws {RatingError} when the component cannot be rated (`MISSING_WLL`, `SIZE_NOT_IN_TABLE`, ...).
 * @example
 * componentWll({ type: "chain", grade: 70, size: "5/16", marked: false }).wllLb; // 1900 (CVSA example)
 * componentWll({ type: "wire-rope", size: "1/2", construction: "6x19 IWRC", nominalStrength: { value: 26600, unit: "lb" } }).wllLb; // 6650
 * componentWll({ type: "binder", wll: { value: 5400, unit: "lb" } }).wllLb;      // 5400
 * componentWll({ type: "binder" }); // throws RatingError MISSING_WLL
 */
export function componentWll(component: Component): ComponentRating {
  switch (component.type) {
    case "chain":
      return rateChainComponent(component);
    case "webbing":
      return rateTableMaterial(component, () => defaultRating({ material: "webbing", width: component.width }));
    case "wire-rope":
      return rateWireRopeComponent(component);
    case "rope":
      return rateRopeComponent(component);
    case "steel-strapping":
      return rateTableMaterial(component, () => defaultRating({ material: "steel-strapping", width: component.width, thickness: component.thickness }));
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
      return marked(component, wllLb, component.type === "hook" || component.type === "shackle" ? gradeNote(component.grade) : []);
    }
    default:
      throw new RatingError("UNKNOWN_MATERIAL", `Component type "${String((component as { type: unknown }).type)}" is not known`, { field: "type" });
  }
}
