/**
 * The minimum number of tiedowns.
 *
 * - 49 CFR 393.130(c)(1) (TR-130 quotation, verified, secondary): heavy vehicles, equipment
 *   and machinery on wheels or tracks that individually weigh 4,536 kg (10,000 lb) or more
 *   are restrained with a minimum of four tiedowns. Exactly 10,000 lb is included ("or more").
 *   For such machines this commodity rule takes the place of the length table.
 * - 49 CFR 393.110 (FMCSA summary, verified, secondary), for everything else:
 *   not blocked against forward movement: 5 ft or shorter and 1,100 lb or lighter → 1;
 *   5 ft or shorter and heavier than 1,100 lb → 2; longer than 5 ft up to 10 ft → 2;
 *   longer than 10 ft → 2, plus 1 for each further 10 ft or fraction. Blocked at the front
 *   (headerboard, bulkhead, other secured cargo) → 1 per 10 ft of length or fraction.
 *
 * Thresholds are applied in feet and pounds, with metric inputs converted exactly. The CFR
 * also prints metric figures (1.52 m, 500 kg, 3.04 m: FROM MEMORY, not verified against the
 * primary text); they are rounded equivalents, and using the imperial figures is the
 * stricter reading at the edge (an article of exactly 500 kg is 1,102.3 lb, so it needs 2).
 *
 * @module
 */
import { formatFeet } from "./format";
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
 * The inputs of the minimum-count rules, in feet and pounds.
 *
 * @example
 * const input: MinimumTiedownsInput = { kind: "general", weightLb: 40200, lengthFt: 18, blockedAtFront: false };
 */
export interface MinimumTiedownsInput {
  readonly kind: CargoKind;
  readonly weightLb: number;
  readonly lengthFt: number;
  readonly blockedAtFront: boolean;
}

/**
 * The minimum number of tiedowns, the rule that set it (a sentence citing the section),
 * and the section alone (`source`).
 *
 * @example
 * const m: MinimumTiedowns = { count: 3, rule: "49 CFR 393.110: ...", source: "49 CFR 393.110" };
 */
export interface MinimumTiedowns {
  readonly count: number;
  readonly rule: string;
  readonly source: string;
}

/**
 * The minimum number of tiedowns for an article.
 *
 * @example
 * minimumTiedowns({ kind: "general", weightLb: 40200, lengthFt: 18, blockedAtFront: false }).count; // 3
 * minimumTiedowns({ kind: "general", weightLb: 5000, lengthFt: 20, blockedAtFront: true }).count;   // 2
 * minimumTiedowns({ kind: "machine", weightLb: 10000, lengthFt: 8, blockedAtFront: false }).count;  // 4
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
  const len = formatFeet(lengthFt);
  if (blockedAtFront) {
    const count = Math.max(1, Math.ceil(lengthFt / 10 - 1e-9));
    return { count, rule: `${source}: blocked against forward movement: 1 tiedown per 10 ft of length or fraction (${len} → ${count})`, source };
  }
  if (lengthFt <= 5) {
    return weightLb <= 1100
      ? { count: 1, rule: `${source}: not blocked at the front, 5 ft or shorter and 1,100 lb or lighter: 1 tiedown`, source }
      : { count: 2, rule: `${source}: not blocked at the front, 5 ft or shorter and heavier than 1,100 lb: 2 tiedowns`, source };
  }
  if (lengthFt <= 10) {
    return { count: 2, rule: `${source}: not blocked at the front, longer than 5 ft and up to 10 ft: 2 tiedowns`, source };
  }
  const count = 2 + Math.ceil((lengthFt - 10) / 10 - 1e-9);
  return {
    count,
    rule: `${source}: not blocked at the front, longer than 10 ft: 2 tiedowns for the first 10 ft and 1 for each further 10 ft or fraction (${len} → ${count})`,
    source,
  };
}
