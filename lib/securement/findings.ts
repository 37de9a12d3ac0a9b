/**
 * Findings: what a check says about a request, each with a stable code, a severity, a
 * plain-language message with the numbers, and the source it rests on.
 *
 * Severity policy:
 * - `fail`: a published rule (49 CFR) is not met, or a component cannot be rated.
 * - `warn`: guidance that is not a regulation (FMCSA Driver's Handbook, common practice), or
 *   something the driver should double-check (a tag rated above the table).
 * - `info`: reminders and how a figure was obtained.
 *
 * @module
 */

/**
 * How serious a finding is. A check passes iff it has no `fail` finding.
 *
 * @example
 * const s: Severity = "warn";
 */
export type Severity = "fail" | "warn" | "info";

/**
 * Every finding code the engine emits (UPPER_SNAKE, stable: screens and tests key on them).
 *
 * @example
 * FINDING_CODES.includes("AGGREGATE_WLL_BELOW_REQUIRED"); // true
 */
export const FINDING_CODES = [
  // 49 CFR rules
  "AGGREGATE_WLL_BELOW_REQUIRED",
  "TOO_FEW_TIEDOWNS",
  "ACCESSORY_NOT_SECURED",
  "ARTICULATION_NOT_RESTRAINED",
  "ACCESSORIES_LOWERED_REMINDER",
  // rating a component (49 CFR 393.108)
  "SIZE_NOT_IN_TABLE",
  "INVALID_SIZE",
  "UNKNOWN_GRADE",
  "MISSING_SIZE",
  "MISSING_WLL",
  "UNKNOWN_FIBRE",
  "UNKNOWN_MATERIAL",
  "RATED_AS_UNMARKED",
  "UNMARKED_WLL_IGNORED",
  "ROPE_FIBRE_UNKNOWN",
  "WIRE_ROPE_RATED_FROM_TABLE",
  "GRADE_MARK_READ_AS",
  "MARKED_ABOVE_TABLE",
  "ANCHOR_NOT_LISTED",
  "NO_TIEDOWN_MATERIAL",
  // guidance and common practice
  "HANDBOOK_TIEDOWN_WLL_BELOW_5000",
  "FEWER_THAN_FOUR_CORNERS",
  "BINDER_CHAIN_SIZE_OUT_OF_RANGE",
  "BINDER_RANGE_NOT_GIVEN",
  "FITTING_GRADE_BELOW_CHAIN",
  "MIXED_CHAIN_IN_TIEDOWN",
  "EDGE_PROTECTION_REMINDER",
] as const;

/**
 * A finding code.
 *
 * @example
 * const code: FindingCode = "MARKED_ABOVE_TABLE";
 */
export type FindingCode = (typeof FINDING_CODES)[number];

/**
 * One finding. `tiedown` and `component` are 0-based indexes into the request, and `path`
 * is the dotted request path they point at (e.g. "tiedowns.0.components.1"), when the
 * finding is about one tiedown or component. `detail` is then the message without the
 * words that say where ("Tiedown \"front left\", component 2 (binder): "), so that the same
 * finding on several tiedowns can be told apart from different ones (grouping.ts).
 *
 * @example
 * const f: Finding = {
 *   code: "MISSING_WLL",
 *   severity: "fail",
 *   message: "Tiedown \"front left\", component 2 (binder): a binder must carry a marked WLL ...",
 *   source: "49 CFR 393.108(a)",
 *   tiedown: 0,
 *   component: 1,
 *   path: "tiedowns.0.components.1.wll",
 * };
 */
export interface Finding {
  readonly code: FindingCode;
  readonly severity: Severity;
  readonly message: string;
  readonly source: string;
  readonly tiedown?: number;
  readonly component?: number;
  readonly path?: string;
  readonly detail?: string;
}

/**
 * Sources cited by findings, in one place so the wording stays the same everywhere.
 *
 * @example
 * SOURCES.aggregate; // "49 CFR 393.106(d)"
 */
export const SOURCES = {
  aggregate: "49 CFR 393.106(d)",
  assemblyWll: "49 CFR 393.108(a)",
  marked: "49 CFR 393.108(b)",
  unmarkedCordage: "49 CFR 393.108(c)",
  unmarkedChain: "49 CFR 393.108(d)",
  unmarkedWireRope: "49 CFR 393.108(e)",
  unmarkedManila: "49 CFR 393.108(f)",
  gradeMarks: "49 CFR 393.108, chain mark examples (grade 43 also stamped 40 or 400: New York State cargo manual's copy; trade practice)",
  binderRange: "49 CFR 393.108(b) (a marked WLL is the rating for the chain the binder is made for); chain-size ranges of binders: common practice",
  minimumCount: "49 CFR 393.110",
  heavyMachineCount: "49 CFR 393.130(c)(1)",
  accessories: "49 CFR 393.130(b)(1)",
  articulation: "49 CFR 393.130(b)(2)",
  handbook: "FMCSA Driver's Handbook on Cargo Securement, ch. 10",
  commonPractice: "Common practice",
  edgeProtection: "Common practice (FMCSA cargo securement rules brochure, 2002: edge protection where a tiedown could be cut or abraded)",
} as const;

const SEVERITIES: readonly Severity[] = ["fail", "warn", "info"];

/**
 * Sorts findings fail → warn → info, keeping the order of emission within a severity.
 * Returns a new array.
 *
 * @example
 * sortFindings([{ severity: "info", ... }, { severity: "fail", ... }]); // fail first
 */
export function sortFindings(findings: readonly Finding[]): Finding[] {
  // Three passes in emission order: a stable sort by severity without sorting.
  const out: Finding[] = [];
  for (const severity of SEVERITIES) for (const f of findings) if (f.severity === severity) out.push(f);
  return out;
}
