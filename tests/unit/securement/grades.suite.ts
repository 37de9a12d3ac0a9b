// Chain grades and their marks: 49 CFR 393.108, chain mark examples (JJK-108 copy, verified):
// G30 = 3 / 30 / 300; G43 = 4 / 43 / 430; G70 = 7 / 70 / 700; G80 = 8 / 80 / 800; G100 = 10 / 100 / 1000.
// Grade 43 is also stamped 4 / 40 / 400: the New York State cargo manual's copy of the table,
// and the trade's common stamp for high test (shared reference §1.4).
import { describe, expect, it } from "vitest";
import { CHAIN_GRADES, gradeMarkNote, isChainGrade, parseGrade } from "@/lib/securement/grades";

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

  it("reads 40 and 400 as grade 43, and says so (New York State cargo manual's copy; trade stamp)", () => {
    for (const m of [40, "40", "G40", "grade 400", 400]) expect(parseGrade(m)).toBe(43);
    expect(gradeMarkNote("G40")).toBe('Grade mark "G40" is read as grade 43: grade 43 (high test) chain is also stamped 4, 40 or 400');
    expect(gradeMarkNote(400)).toContain("is read as grade 43");
    for (const m of [4, 43, 430, "G70", 30, "alloy"]) expect(gradeMarkNote(m)).toBeUndefined();
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

describe("grade marks are read once", () => {
  it("gives each mark its own grade, however often it is read", () => {
    for (let i = 0; i < 2; i++) {
      expect(parseGrade("4")).toBe(43);
      expect(parseGrade("40")).toBe(43);
      expect(parseGrade(7)).toBe(70);
      expect(parseGrade("G8")).toBe(80);
      expect(parseGrade(" 120 ")).toBe(120);
      expect(parseGrade("alloy")).toBeUndefined();
      expect(gradeMarkNote("G40")).toMatch(/^Grade mark "G40" is read as grade 43/);
      expect(gradeMarkNote("G43")).toBeUndefined();
    }
  });

  it("still reads right after more marks than it keeps", () => {
    for (let n = 1001; n <= 2000; n++) expect(parseGrade(`G${n}`)).toBe(n); // 1000 and below include marks (300, 700, ...)
    expect(parseGrade("G7")).toBe(70);
    expect(parseGrade(`G${"0".repeat(50)}7`)).toBe(70); // too long to keep, read all the same
  });
});
