// Chain grades and their marks: 49 CFR 393.108, chain mark examples (JJK-108 copy, verified):
// G30 = 3 / 30 / 300; G43 = 4 / 43 / 430; G70 = 7 / 70 / 700; G80 = 8 / 80 / 800; G100 = 10 / 100 / 1000.
import { describe, expect, it } from "vitest";
import { CHAIN_GRADES, isChainGrade, parseGrade } from "@/lib/securement/grades";

describe("parseGrade", () => {
  it.each([
    [30, [3, 30, 300]],
    [43, [4, 43, 430]],
    [70, [7, 70, 700]],
    [80, [8, 80, 800]],
    [100, [10, 100, 1000]],
  ] as const)("reads every mark of grade %i", (grade, marks) => {
    for (const m of marks) {
      expect(parseGrade(m)).toBe(grade);
      expect(parseGrade(String(m))).toBe(grade);
      expect(parseGrade(`G${m}`)).toBe(grade);
    }
  });

  it("reads written forms", () => {
    expect(parseGrade("grade 70")).toBe(70);
    expect(parseGrade(" g 80 ")).toBe(80);
    expect(parseGrade("Gr. 43")).toBe(43);
  });

  it("returns grades outside the table as numbers, and nonsense as undefined", () => {
    expect(parseGrade(120)).toBe(120);
    expect(isChainGrade(parseGrade(120))).toBe(false);
    expect(parseGrade("alloy")).toBeUndefined();
    expect(parseGrade("")).toBeUndefined();
    expect(parseGrade("0")).toBeUndefined();
    expect(parseGrade("7.5")).toBeUndefined();
  });

  it("knows the five table columns", () => {
    expect([...CHAIN_GRADES]).toEqual([30, 43, 70, 80, 100]);
  });
});
