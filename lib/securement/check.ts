/**
 * The securement check: given a cargo and its planned tiedowns, does the plan meet the
 * published minimums?
 *
 * Rules applied, each reported with its source:
 * - Tiedown WLL = lowest of its parts and anchor points: 49 CFR 393.108(a) (assembly.ts).
 * - Aggregate WLL ≥ ½ cargo weight, direct and same-side tiedowns counting ½ of their WLL,
 *   across tiedowns their full WLL: 49 CFR 393.106(d) (aggregate.ts).
 * - Minimum number: 49 CFR 393.130(c)(1) (4, machines of 10,000 lb or more) or 49 CFR 393.110
 *   (by length), read with both its imperial and its metric figures, the higher count
 *   required (minimum.ts).
 * - Accessories lowered and secured (393.130(b)(1)); articulation restrained (393.130(b)(2)):
 *   fail at 10,000 lb or more, where 393.130 applies; warn below it, as common practice
 *   (393.130 is optional for lighter machines).
 * - FMCSA Driver's Handbook on Cargo Securement, ch. 10: four tiedowns of at least 5,000 lb
 *   WLL each on machines of 10,000 lb or more: a warning, because the Handbook is guidance,
 *   not the regulation. (The Handbook says "more than" 10,000 lb where the CFR says "or
 *   more"; the warning follows the CFR's population so the two read together.)
 * - Common practice (warn, never fail): one tiedown per corner of a machine; binder sized
 *   to the chain; fittings of the chain's grade; edge protection for webbing (info).
 *
 * Which tiedowns count where (decision):
 * - Toward the aggregate WLL: every tiedown, including those on accessories. A bucket chain
 *   runs from a vehicle anchor to part of the article and restrains the article.
 * - Toward the minimum number (393.130 and 393.110): only tiedowns on the machine itself
 *   (`secures` "machine" or absent). 393.130(c) asks for four tiedowns restraining the
 *   machine, affixed near its front and rear; a chain holding a bucket down does that job
 *   for the bucket (393.130(b)(1)) and does not stand in for a corner chain.
 *
 * Units: verdicts are computed in pounds and feet, inputs in kg, daN, m, mm or in being
 * converted exactly. Table-rated parts use the tables' pound column; the kg column is shown
 * beside it (`tableWllKg`) but is not used for the verdict, so the same plan entered in kg
 * or in pounds gets the same verdict. Every kg figure in the result is the exact conversion
 * of the pound figure, rounded like it (format.ts): one decimal, half up.
 *
 * @module
 */
import { zodIssues } from "@/lib/field-issues";
import { countedWll, COUNT_FACTORS, meetsAggregate, requiredAggregateWll } from "./aggregate";
import type { AssembledComponent } from "./assembly";
import { assembleTiedown } from "./assembly";
import { SECUREMENT_CAUTION } from "./caution";
import { RequestValidationError } from "./errors";
import type { Finding } from "./findings";
import { SOURCES, sortFindings } from "./findings";
import { formatFeet, formatLbKg, formatNumber, roundHalfUp } from "./format";
import { HEAVY_MACHINE_MIN_TIEDOWNS, isHeavyMachine, minimumTiedowns } from "./minimum";
import type { Attachment, CargoKind, ComponentType, SecurementCheckRequest } from "./request";
import { securementCheckRequestSchema, type SecurementCheckRequestInput } from "./schema";
import { KG_PER_LB, M_PER_FT, settle, toFeet, toKg, toLb, toMillimetres } from "./units";

/**
 * The Handbook's per-tiedown WLL for machines of 10,000 lb or more: 2,268 kg (5,000 lb).
 *
 * @example
 * HANDBOOK_MIN_TIEDOWN_WLL_LB; // 5000
 */
export const HANDBOOK_MIN_TIEDOWN_WLL_LB = 5000;

/**
 * A component in a result: its assembly data plus a kg twin of its WLL.
 *
 * @example
 * const c: ComponentResult = { index: 0, type: "chain", description: "3/8 in grade 70 chain", wllLb: 6600, wllKg: 2993.7, tableWllKg: 2990, basis: "table", source: "49 CFR 393.108, chain table (grade 70)" };
 */
export interface ComponentResult extends AssembledComponent {
  readonly wllKg: number;
}

/**
 * One tiedown in a result. `countedWllLb` is what it adds to the aggregate; `countFactor`
 * is ½ or 1 by attachment; `countsTowardMinimum` is true for tiedowns on the machine itself.
 *
 * @example
 * const t: TiedownResult = {
 *   index: 0, label: "front left", attachment: "direct", secures: "machine",
 *   wllLb: 5400, wllKg: 2449.4, countedWllLb: 2700, countedWllKg: 1224.7, countFactor: 0.5,
 *   limitedBy: "binder", limitedByIndex: 1, limitedByLabel: null, rated: true, countsTowardMinimum: true, components: [],
 * };
 */
export interface TiedownResult {
  readonly index: number;
  readonly label: string;
  readonly attachment: Attachment;
  readonly secures: string;
  readonly wllLb: number;
  readonly wllKg: number;
  readonly countedWllLb: number;
  readonly countedWllKg: number;
  readonly countFactor: 0.5 | 1;
  readonly limitedBy: ComponentType | null;
  readonly limitedByIndex: number | null;
  readonly limitedByLabel: string | null;
  readonly rated: boolean;
  readonly countsTowardMinimum: boolean;
  readonly components: readonly ComponentResult[];
}

/**
 * The result of a securement check. `pass` is true iff no finding is a `fail`. Figures are
 * in pounds with kg twins, rounded half up to one decimal (exact for whole-pound inputs).
 *
 * @example
 * const r: SecurementCheckResult = checkSecurement(request);
 * r.pass; r.requiredAggregateWllLb; r.aggregateWllLb; r.minimumTiedowns; r.rule; r.findings; r.caution;
 */
export interface SecurementCheckResult {
  readonly pass: boolean;
  readonly cargo: {
    readonly kind: CargoKind;
    readonly weightLb: number;
    readonly weightKg: number;
    readonly lengthFt: number;
    readonly lengthM: number;
    readonly heavyMachine: boolean;
  };
  readonly requiredAggregateWllLb: number;
  readonly requiredAggregateWllKg: number;
  readonly aggregateWllLb: number;
  readonly aggregateWllKg: number;
  readonly minimumTiedowns: number;
  /**
   * When 49 CFR 393.110's imperial and metric figures give different minimums: both counts
   * and which one set `minimumTiedowns` (the higher). Absent when they agree.
   */
  readonly minimumReadings?: { readonly imperial: number; readonly metric: number; readonly setBy: "imperial" | "metric" };
  readonly tiedownsCounted: number;
  readonly rule: string;
  readonly ruleSource: string;
  readonly tiedowns: readonly TiedownResult[];
  readonly findings: readonly Finding[];
  readonly caution: string;
}

const lb = (x: number): number => roundHalfUp(x, 1);
const kg = (xLb: number): number => roundHalfUp(xLb * KG_PER_LB, 1);

function securesMachine(secures: string | undefined): boolean {
  return secures === undefined || secures.toLowerCase() === "machine";
}

/**
 * A component of the answer: its WLL rounded, with its kg twin last. Keys are copied one by
 * one in the order of the assembly's answer (a spread of objects of many shapes is slow).
 */
function componentResult(c: AssembledComponent): ComponentResult {
  const out = { index: c.index, type: c.type } as Writable<ComponentResult>;
  if (c.label !== undefined) out.label = c.label;
  if (c.gearId !== undefined) out.gearId = c.gearId;
  out.description = c.description;
  out.wllLb = lb(c.wllLb);
  if (c.tableWllKg !== undefined) out.tableWllKg = c.tableWllKg;
  out.basis = c.basis;
  out.source = c.source;
  if (c.status !== undefined) out.status = c.status;
  if (c.error !== undefined) out.error = c.error;
  out.wllKg = kg(c.wllLb);
  return out;
}

type Writable<T> = { -readonly [K in keyof T]: T[K] };

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? "" : "s"}`;
}

/**
 * Checks a planned set of tiedowns against the published minimums.
 *
 * The request is validated with {@link securementCheckRequestSchema} first (the input is not
 * mutated); a request that does not match throws {@link RequestValidationError} with dotted
 * paths. Problems rating a component (size not in a table, binder without a WLL) do not
 * throw: they are `fail` findings naming the tiedown and component, and that tiedown counts
 * 0 WLL, so the rest of the check still comes back.
 *
 * @throws {RequestValidationError} when the request does not match the schema.
 * @example
 * const result = checkSecurement({
 *   cargo: { weight: { value: 12000, unit: "lb" }, length: { value: 19, unit: "ft" }, kind: "machine" },
 *   tiedowns: ["front left", "front right", "rear left", "rear right"].map((label) => ({
 *     label, attachment: "direct", components: [
 *       { type: "chain", grade: 70, size: "3/8 in" },
 *       { type: "binder", wll: { value: 6600, unit: "lb" } },
 *       { type: "anchor", wll: { value: 6600, unit: "lb" } },
 *     ],
 *   })),
 * });
 * result.pass;                   // true
 * result.aggregateWllLb;         // 13200 (4 × ½ × 6,600)
 * result.requiredAggregateWllLb; // 6000
 * result.minimumTiedowns;        // 4 (49 CFR 393.130(c)(1))
 */
export function checkSecurement(request: SecurementCheckRequest): SecurementCheckResult {
  const parsed = securementCheckRequestSchema.safeParse(request);
  if (!parsed.success) throw new RequestValidationError(zodIssues(parsed.error));
  return checkParsedRequest(parsed.data);
}

/**
 * The same check of a request that `securementCheckRequestSchema` has already parsed (the
 * API's route parses its body with it): the answer of {@link checkSecurement}, without
 * parsing the request a second time.
 *
 * @example
 * const parsed = securementCheckRequestSchema.parse(body);
 * checkParsedRequest(parsed).pass; // as checkSecurement(body).pass
 */
export function checkParsedRequest(request: SecurementCheckRequestInput): SecurementCheckResult {
  const { cargo, tiedowns } = request;

  const weightLb = settle(toLb(cargo.weight).value);
  const lengthFt = settle(toFeet(cargo.length).value);
  const heavy = isHeavyMachine(cargo.kind, weightLb);
  const findings: Finding[] = [];

  // Tiedowns: assembly (393.108(a)) and what each counts (393.106(d)).
  const exactWll: number[] = [];
  const results: TiedownResult[] = [];
  let aggregate = 0;
  for (let i = 0; i < tiedowns.length; i++) {
    const t = tiedowns[i]!;
    const a = assembleTiedown(t, i);
    for (const f of a.findings) findings.push(f);
    const counted = countedWll(a.wllLb, t.attachment);
    exactWll.push(a.wllLb);
    aggregate += counted;
    const components: ComponentResult[] = [];
    for (const c of a.components) components.push(componentResult(c));
    results.push({
      index: i,
      label: t.label ?? `tiedown ${i + 1}`,
      attachment: t.attachment,
      secures: t.secures ?? "machine",
      wllLb: lb(a.wllLb),
      wllKg: kg(a.wllLb),
      countedWllLb: lb(counted),
      countedWllKg: kg(counted),
      countFactor: COUNT_FACTORS[t.attachment],
      limitedBy: a.limitedBy,
      limitedByIndex: a.limitedByIndex,
      limitedByLabel: a.limitedByLabel,
      rated: a.rated,
      countsTowardMinimum: securesMachine(t.secures),
      components,
    });
  }

  // Aggregate WLL, 49 CFR 393.106(d).
  const required = requiredAggregateWll(weightLb);
  if (!meetsAggregate(aggregate, required)) {
    findings.push({
      code: "AGGREGATE_WLL_BELOW_REQUIRED",
      severity: "fail",
      message: `The aggregate WLL of the tiedowns is ${formatLbKg(aggregate)}; it does not meet the required ${formatLbKg(required)}, half the cargo weight of ${formatLbKg(weightLb)}, and is ${formatNumber(required - aggregate)} lb short. Direct and same-side tiedowns count half their WLL, tiedowns across the load their full WLL`,
      source: SOURCES.aggregate,
      path: "tiedowns",
    });
  }

  // Minimum number of tiedowns, 49 CFR 393.130(c)(1) or 393.110.
  const minimum = minimumTiedowns({
    kind: cargo.kind,
    weightLb,
    lengthFt,
    blockedAtFront: cargo.blockedAtFront ?? false,
    lengthM: settle(toMillimetres(cargo.length).value / 1000),
    weightKg: settle(toKg(cargo.weight).value),
  });
  const setBy = minimum.setBy && minimum.readings ? `, set by the ${minimum.setBy} reading of ${minimum.source} (the ${minimum.setBy === "metric" ? "imperial" : "metric"} figures give ${minimum.readings[minimum.setBy === "metric" ? "imperial" : "metric"]}; where they differ the higher count is required)` : "";
  const onMachine = results.filter((t) => t.countsTowardMinimum);
  const onAccessories = results.length - onMachine.length;
  if (onMachine.length < minimum.count) {
    const what = cargo.kind === "machine" ? "the machine" : "the article";
    const why = heavy
      ? "for a machine of 10,000 lb (4,536 kg) or more"
      : `for ${cargo.kind === "machine" ? "a machine" : "an article"} of ${formatFeet(lengthFt)} and ${formatLbKg(weightLb)}${cargo.blockedAtFront ? ", blocked at the front" : ", not blocked at the front"}`;
    findings.push({
      code: "TOO_FEW_TIEDOWNS",
      severity: "fail",
      message: `${plural(onMachine.length, "tiedown")} ${onMachine.length === 1 ? "holds" : "hold"} ${what}; ${minimum.source} requires at least ${minimum.count} ${why}${setBy}${onAccessories > 0 ? ` (the ${plural(onAccessories, "tiedown")} on accessories ${onAccessories === 1 ? "is" : "are"} not counted here)` : ""}`,
      source: minimum.source,
      path: "tiedowns",
    });
  }

  // FMCSA Driver's Handbook, ch. 10: four tiedowns of at least 5,000 lb each (guidance).
  if (heavy) {
    const strong = onMachine.filter((t) => exactWll[t.index]! + 1e-6 >= HANDBOOK_MIN_TIEDOWN_WLL_LB);
    if (strong.length < HEAVY_MACHINE_MIN_TIEDOWNS) {
      const weak = onMachine.filter((t) => !strong.includes(t));
      findings.push({
        code: "HANDBOOK_TIEDOWN_WLL_BELOW_5000",
        severity: "warn",
        message: `The FMCSA Driver's Handbook on Cargo Securement asks for at least four tiedowns on the machine, each with a WLL of at least 5,000 lb (2,268 kg); ${plural(strong.length, "tiedown")} ${strong.length === 1 ? "reaches" : "reach"} it${weak.length ? ` (below it: ${weak.map((t) => `"${t.label}" ${formatNumber(t.wllLb)} lb`).join(", ")})` : ""}`,
        source: SOURCES.handbook,
        path: "tiedowns",
      });
    }
  }

  // Accessories, 49 CFR 393.130(b)(1).
  const accessories = cargo.accessories ?? [];
  for (const [i, accessory] of accessories.entries()) {
    const held = results.some((t) => t.secures.toLowerCase() === accessory.toLowerCase());
    if (!held) {
      findings.push({
        code: "ACCESSORY_NOT_SECURED",
        severity: heavy ? "fail" : "warn",
        message: heavy
          ? `No tiedown secures the ${accessory}; accessory equipment must be completely lowered and secured to the vehicle`
          : `No tiedown secures the ${accessory}; lowering it and chaining it down is common practice (49 CFR 393.130(b)(1) requires it from 10,000 lb)`,
        source: heavy ? SOURCES.accessories : `${SOURCES.commonPractice} (49 CFR 393.130(b)(1) applies from 10,000 lb)`,
        path: `cargo.accessories.${i}`,
      });
    }
  }
  if (heavy && accessories.length > 0) {
    findings.push({
      code: "ACCESSORIES_LOWERED_REMINDER",
      severity: "info",
      message: `Lower the ${accessories.join(", ")} completely before securing ${accessories.length === 1 ? "it" : "them"}`,
      source: SOURCES.accessories,
    });
  }

  // Articulation, 49 CFR 393.130(b)(2).
  if (cargo.articulated && !cargo.articulationRestrained) {
    findings.push({
      code: "ARTICULATION_NOT_RESTRAINED",
      severity: heavy ? "fail" : "warn",
      message: heavy
        ? "The machine is articulated and its joint is not declared restrained; an articulated machine must be restrained so it cannot articulate in transit (fit the lock bar or pin, or chain the joint, then set articulationRestrained)"
        : "The machine is articulated and its joint is not declared restrained; fitting the lock bar or pin is common practice (49 CFR 393.130(b)(2) requires it from 10,000 lb)",
      source: heavy ? SOURCES.articulation : `${SOURCES.commonPractice} (49 CFR 393.130(b)(2) applies from 10,000 lb)`,
      path: "cargo.articulationRestrained",
    });
  }

  // Common practice: one tiedown per corner of a machine (393.130 makes it a rule from 10,000 lb).
  if (cargo.kind === "machine" && !heavy && onMachine.length < HEAVY_MACHINE_MIN_TIEDOWNS) {
    findings.push({
      code: "FEWER_THAN_FOUR_CORNERS",
      severity: "warn",
      message: `${plural(onMachine.length, "tiedown")} ${onMachine.length === 1 ? "holds" : "hold"} the machine; one at each corner (4), plus one for each accessory, is common practice`,
      source: SOURCES.commonPractice,
      path: "tiedowns",
    });
  }

  // Webbing: edge protection reminder (common practice).
  if (tiedowns.some((t) => t.components.some((c) => c.type === "webbing"))) {
    findings.push({
      code: "EDGE_PROTECTION_REMINDER",
      severity: "info",
      message: "Webbing is cut by sharp edges: keep straps off edges of the machine and the deck, or use edge protection (corner protectors, sleeves)",
      source: SOURCES.edgeProtection,
    });
  }

  const sorted = sortFindings(findings);
  return {
    pass: !sorted.some((f) => f.severity === "fail"),
    cargo: { kind: cargo.kind, weightLb: lb(weightLb), weightKg: kg(weightLb), lengthFt: roundHalfUp(lengthFt, 2), lengthM: roundHalfUp(lengthFt * M_PER_FT, 2), heavyMachine: heavy },
    requiredAggregateWllLb: lb(required),
    requiredAggregateWllKg: kg(required),
    aggregateWllLb: lb(aggregate),
    aggregateWllKg: kg(aggregate),
    minimumTiedowns: minimum.count,
    ...(minimum.setBy && minimum.readings ? { minimumReadings: { ...minimum.readings, setBy: minimum.setBy } } : {}),
    tiedownsCounted: onMachine.length,
    rule: minimum.rule,
    ruleSource: minimum.source,
    tiedowns: results,
    findings: sorted,
    caution: SECUREMENT_CAUTION,
  };
}
