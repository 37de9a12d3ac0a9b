/**
 * A tiedown as an assembly of parts: its WLL is the lowest WLL of its components and of the
 * anchor point(s) it is attached to (49 CFR 393.108(a), ECFRIO-108 text, verified), and the
 * result names the limiting part. Also flags parts that do not belong together.
 *
 * A binder used outside its chain-size range is a `fail` and the tiedown is not rated (counts
 * 0): binders are sold for a chain-size range (5/16–3/8 in, 3/8–1/2 in, ...; the ranges are
 * common practice), a larger chain does not seat in the binder's hooks, and the binder's
 * marked WLL is its rating for the chain it is made for only (393.108(b) takes the marking
 * as the rating). Shared reference §8.
 * - `BINDER_CHAIN_SIZE_OUT_OF_RANGE` (fail): the finding names the range and the chain size.
 * - `BINDER_RANGE_NOT_GIVEN` (warn): the binder's range is not given, so the pairing was not
 *   checked and the tiedown is rated as if the binder takes the chain.
 *
 * Other compatibility findings and their severity (no 49 CFR text makes these a rule, so they
 * are warnings labelled "Common practice"; each one already shows up in the WLL when the weak
 * part has a lower marked WLL):
 * - `FITTING_GRADE_BELOW_CHAIN`: a hook or shackle of a lower grade than the chain.
 * - `MIXED_CHAIN_IN_TIEDOWN`: chains of different sizes or grades in one tiedown.
 * - `ANCHOR_NOT_LISTED`: no anchor point listed, so its WLL could not be taken into account.
 * - `NO_TIEDOWN_MATERIAL`: no chain, webbing, rope or strapping listed.
 *
 * A component that cannot be rated (size not in the table, binder without a WLL) is a `fail`
 * finding naming the tiedown and component, and the tiedown then counts 0 WLL.
 *
 * @module
 */
import type { RatingErrorCode } from "./errors";
import { RatingError } from "./errors";
import type { Finding } from "./findings";
import { SOURCES } from "./findings";
import { formatLbKg } from "./format";
import { parseGrade } from "./grades";
import type { ComponentRating } from "./marking";
import { componentWll } from "./marking";
import type { Component, ComponentType, Tiedown } from "./request";
import { TIEDOWN_MATERIALS } from "./request";
import type { ParsedSize, SizeInput } from "./sizes";
import { sizeMatchesRow, tryParseSize } from "./sizes";
import { CHAIN_TABLE } from "./tables";

/**
 * One component of an assembled tiedown: its rating, or the error that kept it from being
 * rated (then `wllLb` is 0).
 *
 * @example
 * const c: AssembledComponent = { index: 1, type: "binder", description: "binder", wllLb: 5400, basis: "marked", source: "49 CFR 393.108(b): marked WLL" };
 */
export interface AssembledComponent {
  readonly index: number;
  readonly type: ComponentType;
  readonly label?: string;
  readonly gearId?: string;
  readonly description: string;
  readonly wllLb: number;
  readonly tableWllKg?: number;
  readonly basis: ComponentRating["basis"] | "not-rated";
  readonly source: string;
  readonly status?: ComponentRating["status"];
  readonly error?: { readonly code: RatingErrorCode | "BINDER_CHAIN_SIZE_OUT_OF_RANGE"; readonly message: string; readonly nearest: readonly string[] };
}

/**
 * A tiedown's WLL, the part that limits it, its parts, and findings about it.
 * `limitedBy` is the type of the limiting part ("binder"), `limitedByIndex` its index in
 * `components`; both are null when the tiedown has no parts. `rated` is false when a part
 * could not be rated (the WLL is then 0).
 *
 * @example
 * assembleTiedown({ attachment: "direct", components: [
 *   { type: "chain", grade: 70, size: "3/8" },
 *   { type: "binder", wll: { value: 5400, unit: "lb" } },
 *   { type: "anchor", label: "D-ring", wll: { value: 5000, unit: "lb" } },
 * ] });
 * // { wllLb: 5000, limitedBy: "anchor", limitedByIndex: 2, limitedByLabel: "D-ring", rated: true, ... }
 */
export interface AssembledTiedown {
  readonly wllLb: number;
  readonly limitedBy: ComponentType | null;
  readonly limitedByIndex: number | null;
  readonly limitedByLabel: string | null;
  readonly rated: boolean;
  readonly components: readonly AssembledComponent[];
  readonly findings: readonly Finding[];
}

/** The inch value used to compare chain sizes: a metric size that is a chain-table row counts as that row's inch size (10 mm ↔ 3/8 in). */
function chainTradeInches(size: ParsedSize): number {
  const row = CHAIN_TABLE.rows.find((r) => sizeMatchesRow(size, r));
  return row ? row.inches : size.inches;
}

function tiedownName(tiedown: Tiedown, index: number): string {
  return tiedown.label ? `Tiedown "${tiedown.label}"` : `Tiedown ${index + 1}`;
}

function componentName(c: Component, i: number): string {
  return `component ${i + 1} (${c.label ? `"${c.label}", ` : ""}${c.type})`;
}

function parseOptionalSize(value: SizeInput | undefined): ParsedSize | undefined {
  return value === undefined ? undefined : tryParseSize(value);
}

/**
 * Assembles one tiedown. `index` is its position in the request, used in messages and paths.
 *
 * @example
 * const t = assembleTiedown({ label: "front left", attachment: "direct", components: [
 *   { type: "chain", grade: 70, size: "3/8 in" }, { type: "anchor", wll: { value: 6000, unit: "lb" } },
 * ] }, 0);
 * t.wllLb;     // 6000
 * t.limitedBy; // "anchor"
 */
export function assembleTiedown(tiedown: Tiedown, index = 0): AssembledTiedown {
  const name = tiedownName(tiedown, index);
  const base = `tiedowns.${index}`;
  const findings: Finding[] = [];
  const components: AssembledComponent[] = [];

  tiedown.components.forEach((c, i) => {
    const where = `${name}, ${componentName(c, i)}`;
    const meta = { index: i, type: c.type, ...(c.label ? { label: c.label } : {}), ...(c.gearId ? { gearId: c.gearId } : {}) };
    try {
      const r = componentWll(c);
      components.push({
        ...meta,
        description: r.description,
        wllLb: r.wllLb,
        ...(r.tableWllKg === undefined ? {} : { tableWllKg: r.tableWllKg }),
        basis: r.basis,
        source: r.source,
        ...(r.status === undefined ? {} : { status: r.status }),
      });
      for (const f of r.findings) {
        const { field, ...rest } = f;
        findings.push({ ...rest, ...said(where, f.message), tiedown: index, component: i, path: `${base}.components.${i}${field ? `.${field}` : ""}` });
      }
    } catch (e) {
      if (!(e instanceof RatingError)) throw e;
      components.push({
        ...meta,
        description: c.label ? `"${c.label}" ${c.type}` : c.type,
        wllLb: 0,
        basis: "not-rated",
        source: e.code === "MISSING_WLL" ? SOURCES.assemblyWll : "49 CFR 393.108",
        error: { code: e.code, message: e.message, nearest: [...e.nearest] },
      });
      findings.push({
        code: e.code,
        severity: "fail",
        ...said(where, `${e.message}. The tiedown counts 0 toward the aggregate until it is corrected`),
        source: e.code === "MISSING_WLL" ? SOURCES.assemblyWll : "49 CFR 393.108",
        tiedown: index,
        component: i,
        path: `${base}.components.${i}${e.field ? `.${e.field}` : ""}`,
      });
    }
  });

  // A binder outside its chain-size range cannot seat the chain and its marking is not a
  // rating for that chain: the binder is not rated, so the tiedown counts 0.
  const chains = chainFacts(tiedown.components);
  for (const p of binderPairings(tiedown.components, chains)) {
    const binderWhere = `${name}, ${componentName(tiedown.components[p.binder]!, p.binder)}`;
    if (p.range === undefined) {
      findings.push({
        code: "BINDER_RANGE_NOT_GIVEN",
        severity: "warn",
        ...said(
          binderWhere,
          `The binder's chain-size range is not given, so whether it takes the ${p.chain.display} chain (component ${p.chainIndex + 1}) was not checked; the tiedown is rated as if it does. Enter the chain sizes the binder is made for, from its stamp or its maker's data`,
        ),
        source: SOURCES.binderRange,
        tiedown: index,
        component: p.binder,
        path: `${base}.components.${p.binder}.chainSizeRange`,
      });
      continue;
    }
    if (p.fits) continue;
    const binder = components[p.binder]!;
    const marking = binder.basis === "marked" ? `its marked WLL of ${formatLbKg(binder.wllLb)} holds` : "a binder's marked WLL holds";
    const detail = `The binder is made for ${p.range[0].display} to ${p.range[1].display} chain, but the chain (component ${p.chainIndex + 1}) is ${p.chain.display}. The chain does not seat in the binder's hooks, and ${marking} only for the chain the binder is made for, so the tiedown is not rated and counts 0 toward the aggregate; use a binder made for ${p.chain.display} chain`;
    if (binder.basis !== "not-rated") {
      components[p.binder] = { ...binder, wllLb: 0, basis: "not-rated", error: { code: "BINDER_CHAIN_SIZE_OUT_OF_RANGE", message: detail, nearest: [] } };
    }
    findings.push({
      code: "BINDER_CHAIN_SIZE_OUT_OF_RANGE",
      severity: "fail",
      ...said(binderWhere, detail),
      source: SOURCES.binderRange,
      tiedown: index,
      component: p.binder,
      path: `${base}.components.${p.binder}.chainSizeRange`,
    });
  }

  const rated = components.every((c) => c.basis !== "not-rated");
  let limiting: AssembledComponent | undefined;
  if (!rated) {
    limiting = components.find((c) => c.basis === "not-rated");
  } else {
    for (const c of components) if (!limiting || c.wllLb < limiting.wllLb) limiting = c;
  }
  const wllLb = rated && limiting ? limiting.wllLb : 0;

  findings.push(...compatibility(tiedown, index, name, chains));

  return {
    wllLb,
    limitedBy: limiting ? limiting.type : null,
    limitedByIndex: limiting ? limiting.index : null,
    limitedByLabel: limiting?.label ?? null,
    rated,
    components,
    findings,
  };
}

/** A finding's words: where it applies, then what (kept apart in `detail` for grouping). */
function said(where: string, detail: string): { message: string; detail: string } {
  return { message: `${where}: ${detail}`, detail };
}

interface ChainFact {
  readonly i: number;
  readonly size: ParsedSize | undefined;
  readonly inches: number | undefined;
  readonly grade: number | undefined;
}

function chainFacts(parts: readonly Component[]): ChainFact[] {
  return parts
    .map((c, i) => ({ c, i }))
    .filter((x): x is { c: Extract<Component, { type: "chain" }>; i: number } => x.c.type === "chain")
    .map(({ c, i }) => {
      const size = parseOptionalSize(c.size);
      return { i, size, inches: size ? chainTradeInches(size) : undefined, grade: c.marked === false || c.grade === undefined ? undefined : parseGrade(c.grade) };
    });
}

interface BinderPairing {
  readonly binder: number;
  readonly chainIndex: number;
  readonly chain: ParsedSize;
  /** The binder's range as read, or undefined when it is not given. */
  readonly range: readonly [ParsedSize, ParsedSize] | undefined;
  readonly fits: boolean;
}

/** Each binder with each chain of known size in the same tiedown. */
function binderPairings(parts: readonly Component[], chains: readonly ChainFact[]): BinderPairing[] {
  const out: BinderPairing[] = [];
  parts.forEach((c, i) => {
    if (c.type !== "binder") return;
    const lo = c.chainSizeRange ? tryParseSize(c.chainSizeRange[0]) : undefined;
    const hi = c.chainSizeRange ? tryParseSize(c.chainSizeRange[1]) : undefined;
    const range = lo && hi ? ([lo, hi].sort((a, b) => chainTradeInches(a) - chainTradeInches(b)) as [ParsedSize, ParsedSize]) : undefined;
    if (c.chainSizeRange && !range) return; // unreadable: the schema refuses it before this
    for (const chain of chains) {
      if (!chain.size || chain.inches === undefined) continue;
      const fits = range === undefined || (chain.inches >= chainTradeInches(range[0]) - 1e-9 && chain.inches <= chainTradeInches(range[1]) + 1e-9);
      out.push({ binder: i, chainIndex: chain.i, chain: chain.size, range, fits });
    }
  });
  return out;
}

function compatibility(tiedown: Tiedown, index: number, name: string, chains: readonly ChainFact[]): Finding[] {
  const out: Finding[] = [];
  const base = `tiedowns.${index}`;
  const parts = tiedown.components;

  if (!parts.some((c) => (TIEDOWN_MATERIALS as readonly string[]).includes(c.type))) {
    out.push({
      code: "NO_TIEDOWN_MATERIAL",
      severity: "warn",
      ...said(name, "No chain, webbing, wire rope, rope or steel strapping is listed; the tiedown's WLL is taken from the parts listed only"),
      source: SOURCES.assemblyWll,
      tiedown: index,
      path: `${base}.components`,
    });
  }
  if (!parts.some((c) => c.type === "anchor")) {
    out.push({
      code: "ANCHOR_NOT_LISTED",
      severity: "warn",
      ...said(name, "No anchor point is listed. A tiedown's WLL is the lower of its parts and the anchor points it is attached to; add the anchor point's WLL so it is taken into account"),
      source: SOURCES.assemblyWll,
      tiedown: index,
      path: `${base}.components`,
    });
  }

  const sizes = new Set(chains.map((c) => c.inches).filter((x) => x !== undefined));
  const grades = new Set(chains.map((c) => c.grade).filter((x) => x !== undefined));
  if (sizes.size > 1 || grades.size > 1) {
    out.push({
      code: "MIXED_CHAIN_IN_TIEDOWN",
      severity: "warn",
      ...said(name, `Chains of different ${sizes.size > 1 ? "sizes" : "grades"}${sizes.size > 1 && grades.size > 1 ? " and grades" : ""} are joined; the weakest one sets the tiedown's WLL, and parts are usually matched to one chain size and grade`),
      source: SOURCES.commonPractice,
      tiedown: index,
      path: `${base}.components`,
    });
  }

  parts.forEach((c, i) => {
    if ((c.type === "hook" || c.type === "shackle") && c.grade !== undefined) {
      const fittingGrade = parseGrade(c.grade);
      const chainGrades = chains.map((x) => x.grade).filter((g): g is number => g !== undefined);
      if (fittingGrade !== undefined && chainGrades.length > 0) {
        const top = Math.max(...chainGrades);
        if (fittingGrade < top) {
          out.push({
            code: "FITTING_GRADE_BELOW_CHAIN",
            severity: "warn",
            ...said(`${name}, ${componentName(c, i)}`, `The grade ${fittingGrade} ${c.type} is a lower grade than the grade ${top} chain; it limits the tiedown to its own WLL, and fittings are usually matched to the chain's grade`),
            source: SOURCES.commonPractice,
            tiedown: index,
            component: i,
            path: `${base}.components.${i}.grade`,
          });
        }
      }
    }
  });
  return out;
}
