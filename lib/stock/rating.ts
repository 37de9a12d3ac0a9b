import { boundedMemo } from "@/lib/memo";
import { componentWll, RatingError, type Component } from "@/lib/securement";
import type { ItemKind } from "./labels";

/** What an item needs for a rating: its kind, marking and size as stored. */
export interface RatableItem {
  kind: ItemKind;
  grade: number | null;
  gradeMarked: boolean;
  size: string | null;
  markedWllLb: number | null;
  details?: { chainSizeRange?: [string, string] | null } | null;
}

export interface ItemRating {
  /** The WLL to use, in pounds, or null when the item cannot be rated. */
  wllLb: number | null;
  /** Where the figure comes from: the marking, or the 49 CFR 393.108 table and rule. */
  source: string;
  basis: "marked" | "table" | "unmarked-rule" | "none";
  /** Warnings to show on the item, e.g. a marking above the published value. */
  warnings: string[];
}

/** Maps a stored item to a component of the rated-limit engine. */
export function itemComponent(item: RatableItem): Component {
  const wll = item.markedWllLb != null ? { value: item.markedWllLb, unit: "lb" as const } : undefined;
  switch (item.kind) {
    case "chain":
      return { type: "chain", grade: item.gradeMarked ? (item.grade ?? undefined) : undefined, size: item.size ?? undefined, wll, marked: item.gradeMarked && item.grade != null };
    case "web-strap":
      return { type: "webbing", width: item.size ?? undefined, wll };
    case "wire-rope":
      return { type: "wire-rope", size: item.size ?? undefined, wll };
    case "binder":
      return { type: "binder", wll, chainSizeRange: item.details?.chainSizeRange ?? undefined };
    case "hook":
      return { type: "hook", grade: item.grade ?? undefined, wll };
    case "shackle":
      return { type: "shackle", wll };
    case "rated-item":
      return { type: "anchor", wll };
  }
}

// A rating depends on a few values only, and a stock list repeats the same few kinds, grades
// and sizes thousands of times (an import rates each row twice: in the item schema and for
// the stored fields), so answers are kept by those values. Bounded: past the limit the
// memory starts over. Answers are frozen, as they are shared.
const keptRating = boundedMemo(
  (item: RatableItem) => {
    const rating = Object.freeze(rateItem(item));
    Object.freeze(rating.warnings);
    return rating;
  },
  {
    limit: 2000,
    key: (item: RatableItem) => {
      const range = item.details?.chainSizeRange;
      return `${item.kind}|${item.grade}|${item.gradeMarked}|${item.size}|${item.markedWllLb}|${range ? `${range[0]}|${range[1]}` : ""}`;
    },
  },
);

/**
 * The effective WLL of an item: its marking, or the published default for unmarked
 * material (49 CFR 393.108(b)–(e)), with the engine's warnings.
 * @example itemRating({ kind: "chain", grade: 70, gradeMarked: true, size: "3/8", markedWllLb: null }).wllLb // 6600
 */
export function itemRating(item: RatableItem): ItemRating {
  return keptRating(item);
}

function rateItem(item: RatableItem): ItemRating {
  let rating: ReturnType<typeof componentWll>;
  try {
    rating = componentWll(itemComponent(item));
  } catch (error) {
    if (error instanceof RatingError) return { wllLb: null, source: "49 CFR 393.108", basis: "none", warnings: [error.message] };
    throw error;
  }
  const problems = rating.findings.filter((f) => f.severity === "fail");
  if (problems.length || !(rating.wllLb > 0)) {
    return { wllLb: null, source: problems[0]?.source ?? "49 CFR 393.108", basis: "none", warnings: problems.map((f) => f.message) };
  }
  return {
    wllLb: rating.wllLb,
    source: rating.source,
    basis: rating.basis,
    warnings: rating.findings.filter((f) => f.severity !== "info").map((f) => f.message),
  };
}
