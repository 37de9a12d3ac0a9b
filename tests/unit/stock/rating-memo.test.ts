import { describe, expect, it } from "vitest";
import { itemRating } from "@/lib/stock/rating";

// itemRating keeps its answers by the values they depend on: the same item rated again gets
// the same answer, an item that differs in any of them gets its own.

const chain = { kind: "chain" as const, grade: 70, gradeMarked: true, size: "3/8", markedWllLb: null };

describe("itemRating, answered again", () => {
  it("gives each grade, marking, size, WLL and chain range its own answer", () => {
    expect(itemRating(chain).wllLb).toBe(6600); // 49 CFR 393.108(b), grade 70, 3/8 in
    expect(itemRating({ ...chain, grade: 80 }).wllLb).toBe(7100); // grade 80, 3/8 in
    expect(itemRating({ ...chain, gradeMarked: false }).wllLb).not.toBe(6600);
    expect(itemRating({ ...chain, size: "1/2" }).wllLb).not.toBe(6600);
    expect(itemRating({ ...chain, markedWllLb: 5000 }).wllLb).toBe(5000);
    expect(itemRating(chain).wllLb).toBe(6600);
    const binder = { kind: "binder" as const, grade: null, gradeMarked: false, size: null, markedWllLb: 5400 };
    const small = itemRating({ ...binder, details: { chainSizeRange: ["5/16", "3/8"] } });
    const none = itemRating(binder);
    expect(itemRating({ ...binder, details: { chainSizeRange: ["5/16", "3/8"] } })).toBe(small);
    expect(itemRating(binder)).toBe(none);
  });

  it("shares answers that cannot be changed", () => {
    const rating = itemRating({ ...chain, size: "5/8" });
    expect(Object.isFrozen(rating)).toBe(true);
    expect(Object.isFrozen(rating.warnings)).toBe(true);
  });
});
