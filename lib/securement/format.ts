/**
 * Rounding and number formatting for figures in results and messages.
 *
 * Decision: figures are rounded half up to one decimal place. With whole-pound inputs every
 * figure the engine produces is a whole or a half pound (a tiedown counts ½ of its WLL, the
 * requirement is ½ of the weight), so one decimal keeps them exact: 9,801 lb of cargo
 * needs 4,900.5 lb, not "4,901" or "4,900". Rounding is monotonic, so a displayed aggregate
 * is never below a displayed requirement when the check passes. Verdicts are always computed
 * on the unrounded values.
 *
 * @module
 */
import { KG_PER_LB } from "./units";

/**
 * Rounds half up (away from zero for the positive figures used here) to `decimals` places.
 *
 * @example
 * roundHalfUp(4900.45, 1); // 4900.5
 * roundHalfUp(2.5, 0);     // 3
 */
export function roundHalfUp(value: number, decimals = 1): number {
  const f = 10 ** decimals;
  // The tiny nudge keeps 4900.45 (stored as 4900.4499999...) rounding up, as written.
  return Math.round(value * f + Math.sign(value) * 1e-7) / f;
}

// One formatter made once: toLocaleString with options builds a new Intl.NumberFormat on
// every call (about 50 µs each, measured), and a check formats dozens of figures.
const ONE_DECIMAL = new Intl.NumberFormat("en-US", { maximumFractionDigits: 1 });

/**
 * Formats a number with thousands separators and at most one decimal.
 *
 * @example
 * formatNumber(15000);   // "15,000"
 * formatNumber(4900.5);  // "4,900.5"
 */
export function formatNumber(value: number): string {
  return ONE_DECIMAL.format(roundHalfUp(value, 1));
}

/**
 * Formats pounds with a kilogram twin: "15,000 lb (6,803.9 kg)".
 *
 * @example
 * formatLbKg(5000); // "5,000 lb (2,268 kg)"
 */
export function formatLbKg(lb: number): string {
  return `${formatNumber(lb)} lb (${formatNumber(lb * KG_PER_LB)} kg)`;
}

/**
 * Formats feet: "18 ft".
 *
 * @example
 * formatFeet(18); // "18 ft"
 */
export function formatFeet(ft: number): string {
  return `${formatNumber(ft)} ft`;
}
