/**
 * The load sheet for the cab: its paper sizes and the reminders printed for the driver.
 * The sheet itself (components/kits/sheet) prints the kit, its deck picture, its verdict and
 * its placement; what is here is the part that is words and sizes, not the kit's own data.
 *
 * @module
 */

/**
 * The paper sizes the sheet prints on.
 *
 * @example
 * PAPER_SIZES; // ["letter", "a4"]
 */
export const PAPER_SIZES = ["letter", "a4"] as const;
export type PaperSize = (typeof PAPER_SIZES)[number];

/**
 * Each paper's CSS page size and margin, its words, and its size in PDF points (1/72 in),
 * which a PDF's MediaBox gives. US Letter is 8.5 × 11 in; A4 is 210 × 297 mm (ISO 216).
 *
 * @example
 * PAPER.a4.points; // { width: 595.28, height: 841.89 }
 */
export const PAPER: Readonly<Record<PaperSize, { css: string; margin: string; label: string; points: { width: number; height: number } }>> = {
  letter: { css: "letter", margin: "0.45in", label: "US Letter", points: { width: 612, height: 792 } },
  a4: { css: "A4", margin: "11mm", label: "A4", points: { width: 595.28, height: 841.89 } },
};

/**
 * The paper asked for, or the organisation's usual one: US Letter where it works in US
 * units, A4 where it works in metric.
 *
 * @example
 * paperFor("a4", "us");        // "a4"
 * paperFor(undefined, "metric"); // "a4"
 * paperFor("legal", "us");      // "letter"
 */
export function paperFor(asked: string | undefined, units: "us" | "metric"): PaperSize {
  if (asked === "letter" || asked === "a4") return asked;
  return units === "metric" ? "a4" : "letter";
}

/**
 * What the driver does on the way, printed on every sheet with its source. These are
 * reminders for the driver at the trailer, not findings of the check.
 *
 * @example
 * PRE_TRIP_REMINDERS.map((r) => r.code); // ["RECHECK_TENSION", "BINDERS_IN_SIGHT", "LATCHED", "WALK_AROUND"]
 */
export const PRE_TRIP_REMINDERS: readonly { readonly code: string; readonly text: string; readonly source: string }[] = [
  {
    code: "RECHECK_TENSION",
    text: "Re-check every tiedown and binder after the first miles (within the first 50 miles), then at each stop: at least every 3 hours or 150 miles, and whenever your duty status changes. Chains settle and binders loosen.",
    source: "49 CFR 392.9(b) (from memory: within the first 50 miles, then every 3 hours or 150 miles)",
  },
  {
    code: "BINDERS_IN_SIGHT",
    text: "Set the binders where you can see and reach them from the ground, handles closed and secured (tied or pinned) so that they cannot open.",
    source: "Common practice",
  },
  {
    code: "LATCHED",
    text: "Cab doors, windows, hood and compartments closed and latched; buckets, blades and booms lowered and held; loose parts off the machine and the deck.",
    source: "Common practice; 49 CFR 393.130(b)(1): accessories secured",
  },
  {
    code: "WALK_AROUND",
    text: "Walk around the load before you leave: every tiedown tight, no chain twisted or knotted, no damaged gear (a check on paper does not replace your own inspection).",
    source: "49 CFR 393.104(b): no damaged or weakened tiedowns (section verified; wording from memory)",
  },
];
