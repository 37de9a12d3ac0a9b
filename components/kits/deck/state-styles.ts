import type { AnchorState, TiedownState } from "@/lib/kits/deck";

/**
 * How each tiedown state is drawn: a colour, and a line style that says the same without
 * colour (solid, dashed, dotted, dash-dot), so that a grey printout or a colour-blind reader
 * still tells them apart. The words (TIEDOWN_STATE_WORDS) always sit beside them.
 * `dash` is in multiples of the picture's text size.
 */
export const TIEDOWN_STYLES: Record<TiedownState, { colour: string; dash: readonly number[]; caps: "butt" | "round"; sample: string }> = {
  counts: { colour: "#166534", dash: [], caps: "butt", sample: "solid line" },
  limited: { colour: "#92400e", dash: [1.1, 0.55], caps: "butt", sample: "dashed line" },
  "not-rated": { colour: "#b91c1c", dash: [0.05, 0.45], caps: "round", sample: "dotted line" },
  blocked: { colour: "#b91c1c", dash: [1.2, 0.4, 0.25, 0.4], caps: "butt", sample: "dash-dot line" },
};

/** Anchor points: filled when in use, white when free, grey and crossed out when out of use. */
export const ANCHOR_STYLES: Record<AnchorState, { fill: string; stroke: string }> = {
  "in-use": { fill: "#111827", stroke: "#111827" },
  free: { fill: "#ffffff", stroke: "#111827" },
  "out-of-use": { fill: "#d1d5db", stroke: "#6b7280" },
};

export const INK = "#111827";
export const STOP = "#b91c1c";
