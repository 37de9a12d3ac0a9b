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
  for (const r of CHAIN_TABLE.rows) if (sizeMatchesRow(size, r)) return r.inches;
  return size.inches;
}

function tiedownName(tiedown: Tiedown, index: number): string {
  return tiedown.label ? `Tiedown "${tiedown.label}"` : `Tiedown ${index + 1}`;
}

function componentName(c: Component, i: number): string {
  return `component ${i + 1} (${c.label ? `"${c.label}", ` : ""}${c.type})`;
}

/** Where a finding about component `i` applies, in words (built only when there is a finding). */
function componentWhere(tiedown: Tiedown, index: number, c: Component, i: number): string {
  return `${tiedownName(tiedown, index)}, ${componentName(c, i)}`;
}

function parseOptionalSize(value: SizeInput | undefined): ParsedSize | undefined {
  return value === undefined ? undefined : tryParseSize(value);
}

type Writable<T> = { -readonly [K in keyof T]: T[K] };

/** A rated component. Keys are set one by one, in the order the answer has always had. */
function ratedComponent(c: Component, i: number, r: ComponentRating): AssembledComponent {
  const out = { index: i, type: c.type } as Writable<AssembledComponent>;
  if (c.label) out.label = c.label;
  if (c.gearId) out.gearId = c.gearId;
  out.description = r.description;
  out.wllLb = r.wllLb;
  if (r.tableWllKg !== undefined) out.tableWllKg = r.tableWllKg;
  out.basis = r.basis;
  out.source = r.source;
  if (r.status !== undefined) out.status = r.status;
  return out;
}

/** A component that could not be rated: it counts 0, with the error that says why. */
function unratedComponent(c: Component, i: number, e: RatingError): AssembledComponent {
  const out = { index: i, type: c.type } as Writable<AssembledComponent>;
  if (c.label) out.label = c.label;
  if (c.gearId) out.gearId = c.gearId;
  out.description = c.label ? `"${c.label}" ${c.type}` : c.type;
  out.wllLb = 0;
  out.basis = "not-rated";
  out.source = e.code === "MISSING_WLL" ? SOURCES.assemblyWll : "49 CFR 393.108";
  out.error = { code: e.code, message: e.message, nearest: [...e.nearest] };
  return out;
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
  const base = `tiedowns.${index}`;
  const findings: Finding[] = [];
  const components: AssembledComponent[] = [];
  const parts = tiedown.components;

  for (let i = 0; i < parts.length; i++) {
    const c = parts[i]!;
    let r: ComponentRating;
    try {
      r = componentWll(c);
    } catch (e) {
      if (!(e instanceof RatingError)) throw e;
      components.push(unratedComponent(c, i, e));
      findings.push({
        code: e.code,
        severity: "fail",
        ...said(componentWhere(tiedown, index, c, i), `${e.message}. The tiedown counts 0 toward the aggregate until it is corrected`),
        source: e.code === "MISSING_WLL" ? SOURCES.assemblyWll : "49 CFR 393.108",
        tiedown: index,
        component: i,
        path: `${base}.components.${i}${e.field ? `.${e.field}` : ""}`,
      });
      continue;
    }
    components.push(ratedComponent(c, i, r));
    if (r.findings.length === 0) continue;
    const where = componentWhere(tiedown, index, c, i);
    for (const f of r.findings) {
      findings.push({
        code: f.code,
        severity: f.severity,
        message: `${where}: ${f.message}`,
        source: f.source,
        detail: f.message,
        tiedown: index,
        component: i,
        path: `${base}.components.${i}${f.field ? `.${f.field}` : ""}`,
      });
    }
  }

  // A binder outside its chain-size range cannot seat the chain and its marking is not a
  // rating for that chain: the binder is not rated, so the tiedown counts 0.
  const chains = chainFacts(parts);
  for (const p of binderPairings(parts, chains)) {
    const binderWhere = componentWhere(tiedown, index, parts[p.binder]!, p.binder);
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

  // The lowest WLL limits the tiedown (the first of equals); an unrated part makes it 0.
  let rated = true;
  let limiting: AssembledComponent | undefined;
  for (const c of components) {
    if (c.basis === "not-rated") {
      if (rated) limiting = c;
      rated = false;
    } else if (rated && (!limiting || c.wllLb < limiting.wllLb)) {
      limiting = c;
    }
  }
  const wllLb = rated && limiting ? limiting.wllLb : 0;

  compatibility(tiedown, index, chains, findings);

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
  const out: ChainFact[] = [];
  for (let i = 0; i < parts.length; i++) {
    const c = parts[i]!;
    if (c.type !== "chain") continue;
    const size = parseOptionalSize(c.size);
    out.push({ i, size, inches: size ? chainTradeInches(size) : undefined, grade: c.marked === false || c.grade === undefined ? undefined : parseGrade(c.grade) });
  }
  return out;
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
  if (chains.length === 0) return out;
  for (let i = 0; i < parts.length; i++) {
    const c = parts[i]!;
    if (c.type !== "binder") continue;
    const lo = c.chainSizeRange ? tryParseSize(c.chainSizeRange[0]) : undefined;
    const hi = c.chainSizeRange ? tryParseSize(c.chainSizeRange[1]) : undefined;
    let range: [ParsedSize, ParsedSize] | undefined;
    let from = 0;
    let to = 0;
    if (lo && hi) {
      // Smallest first; two equal sizes keep the order written.
      const a = chainTradeInches(lo);
      const b = chainTradeInches(hi);
      range = b < a ? [hi, lo] : [lo, hi];
      from = Math.min(a, b);
      to = Math.max(a, b);
    }
    if (c.chainSizeRange && !range) continue; // unreadable: the schema refuses it before this
    for (const chain of chains) {
      if (!chain.size || chain.inches === undefined) continue;
      const fits = range === undefined || (chain.inches >= from - 1e-9 && chain.inches <= to + 1e-9);
      out.push({ binder: i, chainIndex: chain.i, chain: chain.size, range, fits });
    }
  }
  return out;
}

/** How many different values a list holds (the lists here have a handful of entries). */
function distinct(values: readonly number[]): number {
  let n = 0;
  for (let i = 0; i < values.length; i++) if (values.indexOf(values[i]!) === i) n++;
  return n;
}

function compatibility(tiedown: Tiedown, index: number, chains: readonly ChainFact[], out: Finding[]): void {
  const base = `tiedowns.${index}`;
  const parts = tiedown.components;
  let material = false;
  let anchor = false;
  for (const c of parts) {
    if ((TIEDOWN_MATERIALS as readonly string[]).includes(c.type)) material = true;
    if (c.type === "anchor") anchor = true;
  }

  if (!material) {
    out.push({
      code: "NO_TIEDOWN_MATERIAL",
      severity: "warn",
      ...said(tiedownName(tiedown, index), "No chain, webbing, wire rope, rope or steel strapping is listed; the tiedown's WLL is taken from the parts listed only"),
      source: SOURCES.assemblyWll,
      tiedown: index,
      path: `${base}.components`,
    });
  }
  if (!anchor) {
    out.push({
      code: "ANCHOR_NOT_LISTED",
      severity: "warn",
      ...said(tiedownName(tiedown, index), "No anchor point is listed. A tiedown's WLL is the lower of its parts and the anchor points it is attached to; add the anchor point's WLL so it is taken into account"),
      source: SOURCES.assemblyWll,
      tiedown: index,
      path: `${base}.components`,
    });
  }

  const chainSizes: number[] = [];
  const chainGrades: number[] = [];
  for (const x of chains) {
    if (x.inches !== undefined) chainSizes.push(x.inches);
    if (x.grade !== undefined) chainGrades.push(x.grade);
  }
  const sizes = distinct(chainSizes);
  const grades = distinct(chainGrades);
  if (sizes > 1 || grades > 1) {
    out.push({
      code: "MIXED_CHAIN_IN_TIEDOWN",
      severity: "warn",
      ...said(tiedownName(tiedown, index), `Chains of different ${sizes > 1 ? "sizes" : "grades"}${sizes > 1 && grades > 1 ? " and grades" : ""} are joined; the weakest one sets the tiedown's WLL, and parts are usually matched to one chain size and grade`),
      source: SOURCES.commonPractice,
      tiedown: index,
      path: `${base}.components`,
    });
  }

  if (chainGrades.length === 0) return;
  const top = Math.max(...chainGrades);
  for (let i = 0; i < parts.length; i++) {
    const c = parts[i]!;
    if ((c.type === "hook" || c.type === "shackle") && c.grade !== undefined) {
      const fittingGrade = parseGrade(c.grade);
      if (fittingGrade !== undefined && fittingGrade < top) {
        out.push({
          code: "FITTING_GRADE_BELOW_CHAIN",
          severity: "warn",
          ...said(componentWhere(tiedown, index, c, i), `The grade ${fittingGrade} ${c.type} is a lower grade than the grade ${top} chain; it limits the tiedown to its own WLL, and fittings are usually matched to the chain's grade`),
          source: SOURCES.commonPractice,
          tiedown: index,
          component: i,
          path: `${base}.components.${i}.grade`,
        });
      }
    }
  }
}
