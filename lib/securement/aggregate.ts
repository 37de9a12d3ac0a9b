/**
 * The aggregate working load limit rule, 49 CFR 393.106(d) (PAC-106 quotation, verified):
 * the aggregate WLL of the tiedowns securing an article must be at least one-half times its
 * weight, where each tiedown counts
 * - ½ of its WLL when it runs from a vehicle anchor to an anchor point on the article (direct);
 * - ½ of its WLL when it passes through, over or around the article and returns to the same
 *   side of the vehicle;
 * - its full WLL when it passes through, over or around the article to the other side.
 *
 * @module
 */
import type { Attachment } from "./request";

/**
 * The share of a tiedown's WLL that counts toward the aggregate, by attachment.
 *
 * @example
 * COUNT_FACTORS.direct;            // 0.5
 * COUNT_FACTORS["indirect-across"]; // 1
 */
export const COUNT_FACTORS: Readonly<Record<Attachment, 0.5 | 1>> = Object.freeze({
  direct: 0.5,
  "indirect-same-side": 0.5,
  "indirect-across": 1,
});

/**
 * The attachments, in a fixed order (for schemas and menus).
 *
 * @example
 * ATTACHMENTS[0]; // "direct"
 */
export const ATTACHMENTS = ["direct", "indirect-same-side", "indirect-across"] as const satisfies readonly Attachment[];

/**
 * What one tiedown adds to the aggregate WLL (49 CFR 393.106(d)).
 *
 * @example
 * countedWll(6600, "direct");          // 3300
 * countedWll(5000, "indirect-across"); // 5000
 */
export function countedWll(wllLb: number, attachment: Attachment): number {
  return wllLb * COUNT_FACTORS[attachment];
}

/**
 * The aggregate WLL a cargo weight requires: one-half of the weight (49 CFR 393.106(d)).
 *
 * @example
 * requiredAggregateWll(30000); // 15000 (FMCSA brochure example)
 */
export function requiredAggregateWll(weightLb: number): number {
  return weightLb / 2;
}

/**
 * The aggregate WLL of a set of tiedowns.
 *
 * @example
 * aggregateWll([{ wllLb: 6600, attachment: "direct" }, { wllLb: 5000, attachment: "indirect-across" }]); // 8300
 */
export function aggregateWll(tiedowns: ReadonlyArray<{ readonly wllLb: number; readonly attachment: Attachment }>): number {
  return tiedowns.reduce((sum, t) => sum + countedWll(t.wllLb, t.attachment), 0);
}

/**
 * Whether an aggregate meets a requirement. A millionth of a pound of slack absorbs the
 * floating-point noise of unit conversion, nothing more.
 *
 * @example
 * meetsAggregate(15000, 15000); // true
 * meetsAggregate(20000, 20100); // false
 */
export function meetsAggregate(aggregateLb: number, requiredLb: number): boolean {
  return aggregateLb + 1e-6 >= requiredLb;
}
