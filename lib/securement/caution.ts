/**
 * The caution every securement result carries, and that screens show beside a result.
 *
 * @module
 */

/**
 * What a securement check is and is not.
 *
 * @example
 * <p className="caution">{SECUREMENT_CAUTION}</p>
 */
export const SECUREMENT_CAUTION =
  "This check applies the published minimums of 49 CFR Part 393 (aggregate working load limit, " +
  "minimum number of tiedowns, default working load limits of unmarked gear) to the tiedowns as entered. " +
  "Local rules, such as a state's or a province's, or the Canadian NSC Standard 10, may ask for more. " +
  "It does not replace the driver's own inspection of the machine, the tiedowns, the anchor points " +
  "and the load before the trip and along the way.";
