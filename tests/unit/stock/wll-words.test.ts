// Unmarked chain in words where its WLL is shown: 49 CFR 393.108(d) (ECFRIO-108 text,
// verified) rates chain without a legible grade mark as grade 30 proof coil.
import { describe, expect, it } from "vitest";
import { itemRating } from "@/lib/stock/rating";
import { unmarkedChainWords } from "@/lib/stock/wll-words";

describe("unmarkedChainWords", () => {
  it("says why an unmarked 3/8 in chain is rated 2,650 lb (grade 30, 393.108(d))", () => {
    const wllLb = itemRating({ kind: "chain", grade: null, gradeMarked: false, size: "3/8", markedWllLb: null }).wllLb;
    expect(wllLb).toBe(2650);
    expect(unmarkedChainWords({ kind: "chain", gradeMarked: false, wllLb })).toBe("No grade mark: rated as proof coil, 2,650 lb");
  });

  it("is silent for marked chain, other kinds, and gear that cannot be rated", () => {
    expect(unmarkedChainWords({ kind: "chain", gradeMarked: true, wllLb: 6600 })).toBeNull();
    expect(unmarkedChainWords({ kind: "chain", wllLb: 6600 })).toBeNull();
    expect(unmarkedChainWords({ kind: "binder", gradeMarked: false, wllLb: 5400 })).toBeNull();
    expect(unmarkedChainWords({ kind: "chain", gradeMarked: false, wllLb: null })).toBeNull();
  });
});
