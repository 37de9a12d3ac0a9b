/**
 * The minimum number of tiedowns.
 *
 * - 49 CFR 393.130(c)(1) (TR-130 quotation, verified, secondary): heavy vehicles, equipment
 *   and machinery on wheels or tracks that individually weigh 4,536 kg (10,000 lb) or more
 *   are restrained with a minimum of four tiedowns. Exactly 10,000 lb is included ("or more").
 *   For such machines this commodity rule takes the place of the length table. (The pound
 *   figure is applied: 10,000 lb is 4,535.9 kg, so it takes in every machine the kilogram
 *   figure does, and a few more.)
 * - 49 CFR 393.110 (FMCSA summary, verified, secondary), for everything else:
 *   not blocked against forward movement: 5 ft or shorter and 1,100 lb or lighter → 1;
 *   5 ft or shorter and heavier than 1,100 lb → 2; longer than 5 ft up to 10 ft → 2;
 *   longer than 10 ft → 2, plus 1 for each further 10 ft or fraction. Blocked at the front
 *   (headerboard, bulkhead, other secured cargo) → 1 per 10 ft of length or fraction.
 *
 * Metric edges. The rule prints each threshold in both units: 1.52 m (5 ft), 500 kg
 * (1,100 lb), 3.04 m (10 ft). The metric figures are FROM MEMORY (one copy of 393.110 read
 * secondhand prints both units side by side; not verified against the primary text). The two
 * readings disagree at the edges, and neither is the stricter everywhere: on length the
 * metric figures are (1.52 m is under 5 ft = 1.524 m, and 3.04 m under 10 ft = 3.048 m, so
 * an article of 1.523 m needs 2 tiedowns, not 1, and one of 3.045 m needs 3, not 2); on
 * weight the imperial figure is (1,100 lb is 499 kg, under 500 kg). Both readings are
 * computed from the exact inputs; where they give different counts the higher is required,
 * and the rule's sentence says which reading set it.
 *
 * @module
 */
import { formatFeet, formatNumber } from "./format";
import { KG_PER_LB, M_PER_FT, settle } from "./units";
import type { CargoKind } from "./request";

/**
 * The weight (lb) from which 49 CFR 393.130 applies to a machine: 4,536 kg (10,000 lb) or more.
 *
 * @example
 * HEAVY_MACHINE_LB; // 10000
 */
export const HEAVY_MACHINE_LB = 10_000;

/**
 * The minimum number of tiedowns required by 393.130 for a heavy machine.
 *
 * @example
 * HEAVY_MACHINE_MIN_TIEDOWNS; // 4
 */
export const HEAVY_MACHINE_MIN_TIEDOWNS = 4;

/**
 * Whether 49 CFR 393.130 applies: a machine on wheels or tracks of 10,000 lb or more.
 *
 * @example
 * isHeavyMachine("machine", 10000); // true
 * isHeavyMachine("machine", 9999);  // false
 * isHeavyMachine("general", 40200); // false
 */
export function isHeavyMachine(kind: CargoKind, weightLb: number): boolean {
  return kind === "machine" && weightLb >= HEAVY_MACHINE_LB;
}

/**
 * The inputs of the minimum-count rules, in feet and pounds, and optionally the same
 * article in metres and kilograms as entered (when absent they are converted exactly; pass
 * them when the input was metric, so 1.52 m is read as 1.52 m, not as a rounded conversion).
 *
 * @example
 * const input: MinimumTiedownsInput = { kind: "general", weightLb: 40200, lengthFt: 18, blockedAtFront: false };
 */
export interface MinimumTiedownsInput {
  readonly kind: CargoKind;
  readonly weightLb: number;
  readonly lengthFt: number;
  readonly blockedAtFront: boolean;
  readonly lengthM?: number;
  readonly weightKg?: number;
}

/**
 * The minimum number of tiedowns, the rule that set it (a sentence citing the section),
 * and the section alone (`source`). For 393.110, `readings` gives the count by the imperial
 * and by the metric thresholds and `setBy` which reading set the count when they differ.
 *
 * @example
 * const m: MinimumTiedowns = { count: 3, rule: "49 CFR 393.110: ...", source: "49 CFR 393.110", readings: { imperial: 2, metric: 3 }, setBy: "metric" };
 */
export interface MinimumTiedowns {
  readonly count: number;
  readonly rule: string;
  readonly source: string;
  readonly readings?: { readonly imperial: number; readonly metric: number };
  readonly setBy?: "imperial" | "metric";
}

/** One reading of 393.110's thresholds: 5 ft / 1,100 lb / 10 ft, or 1.52 m / 500 kg / 3.04 m (FROM MEMORY). */
interface Reading {
  readonly name: "imperial" | "metric";
  readonly length: number;
  readonly weight: number;
  readonly short: number;
  readonly step: number;
  readonly light: number;
  readonly len: (v: number) => string;
  readonly wt: (v: number) => string;
}

// A billionth of slack absorbs float noise in the exact conversions, nothing more.
const EPS = 1e-9;

function countBy(r: Reading, blockedAtFront: boolean): { count: number; band: string } {
  if (blockedAtFront) {
    const count = Math.max(1, Math.ceil(r.length / r.step - EPS));
    return { count, band: `blocked against forward movement: 1 tiedown per ${r.len(r.step)} of length or fraction (${r.len(r.length)} → ${count})` };
  }
  if (r.length <= r.short + EPS) {
    return r.weight <= r.light + EPS
      ? { count: 1, band: `not blocked at the front, ${r.len(r.short)} or shorter and ${r.wt(r.light)} or lighter: 1 tiedown` }
      : { count: 2, band: `not blocked at the front, ${r.len(r.short)} or shorter and heavier than ${r.wt(r.light)}: 2 tiedowns` };
  }
  if (r.length <= r.step + EPS) {
    return { count: 2, band: `not blocked at the front, longer than ${r.len(r.short)} and up to ${r.len(r.step)}: 2 tiedowns` };
  }
  const count = 2 + Math.ceil((r.length - r.step) / r.step - EPS);
  return {
    count,
    band: `not blocked at the front, longer than ${r.len(r.step)}: 2 tiedowns for the first ${r.len(r.step)} and 1 for each further ${r.len(r.step)} or fraction (${r.len(r.length)} → ${count})`,
  };
}

/**
 * The minimum number of tiedowns for an article.
 *
 * @example
 * minimumTiedowns({ kind: "general", weightLb: 40200, lengthFt: 18, blockedAtFront: false }).count; // 3
 * minimumTiedowns({ kind: "general", weightLb: 5000, lengthFt: 20, blockedAtFront: true }).count;   // 2
 * minimumTiedowns({ kind: "machine", weightLb: 10000, lengthFt: 8, blockedAtFront: false }).count;  // 4
 * // metric edges: the higher count of the two readings, and which reading set it
 * minimumTiedowns({ kind: "general", weightLb: 800, lengthFt: 1.523 / 0.3048, lengthM: 1.523, blockedAtFront: false });
 * // { count: 2, setBy: "metric", readings: { imperial: 1, metric: 2 }, ... }
 * minimumTiedowns({ kind: "general", weightLb: 1101, lengthFt: 4, blockedAtFront: false }).setBy; // "imperial" (499.4 kg is not over 500 kg)
 */
export function minimumTiedowns(input: MinimumTiedownsInput): MinimumTiedowns {
  const { weightLb, lengthFt, blockedAtFront } = input;
  if (isHeavyMachine(input.kind, weightLb)) {
    return {
      count: HEAVY_MACHINE_MIN_TIEDOWNS,
      rule: "49 CFR 393.130(c)(1): a machine on wheels or tracks weighing 10,000 lb (4,536 kg) or more needs at least 4 tiedowns",
      source: "49 CFR 393.130(c)(1)",
    };
  }
  const source = "49 CFR 393.110";
  const imperial = countBy(
    { name: "imperial", length: lengthFt, weight: weightLb, short: 5, step: 10, light: 1100, len: formatFeet, wt: (v) => `${formatNumber(v)} lb` },
    blockedAtFront,
  );
  // 49 CFR 393.110, metric figures 1.52 m, 500 kg, 3.04 m: FROM MEMORY, not verified against the primary text.
  const metric = countBy(
    {
      name: "metric",
      length: input.lengthM ?? settle(lengthFt * M_PER_FT),
      weight: input.weightKg ?? settle(weightLb * KG_PER_LB),
      short: 1.52,
      step: 3.04,
      light: 500,
      len: (v) => `${Number(v.toFixed(3))} m`,
      wt: (v) => `${formatNumber(v)} kg`,
    },
    blockedAtFront,
  );
  const readings = { imperial: imperial.count, metric: metric.count };
  if (imperial.count === metric.count) return { count: imperial.count, rule: `${source}: ${imperial.band}`, source, readings };
  const setBy = metric.count > imperial.count ? "metric" : "imperial";
  const [higher, lower] = setBy === "metric" ? [metric, imperial] : [imperial, metric];
  return {
    count: higher.count,
    rule: `${source}, read with its ${setBy} figures: ${higher.band}. Read with its ${setBy === "metric" ? "imperial" : "metric"} figures the count would be ${lower.count} (${lower.band}); where the two readings differ the higher count is required`,
    source,
    readings,
    setBy,
  };
}
