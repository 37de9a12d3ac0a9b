/**
 * Why an item's WLL is the number it is, in words, where the WLL is shown (item page, tag,
 * public tag view), when the number comes from a rule rather than from the item's marking.
 *
 * @module
 */

/** What the words are made from: the item as stored. */
export interface WllWordsItem {
  kind: string;
  gradeMarked?: boolean | null;
  wllLb: number | null;
}

/**
 * Words for the WLL of welded steel chain with no legible grade mark, which is rated as
 * grade 30 proof coil whatever it was bought as (49 CFR 393.108(d)); `null` for every other
 * item, whose WLL speaks for itself.
 *
 * @example
 * unmarkedChainWords({ kind: "chain", gradeMarked: false, wllLb: 2650 }); // "No grade mark: rated as proof coil, 2,650 lb"
 * unmarkedChainWords({ kind: "chain", gradeMarked: true, wllLb: 6600 });  // null
 */
export function unmarkedChainWords(item: WllWordsItem): string | null {
  if (item.kind !== "chain" || item.gradeMarked !== false || item.wllLb == null) return null;
  return `No grade mark: rated as proof coil, ${item.wllLb.toLocaleString("en-US")} lb`;
}
