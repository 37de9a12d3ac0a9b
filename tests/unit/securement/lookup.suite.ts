// The table lookup: defaultRating() over the 49 CFR 393.108 tables, with the two rules that
// choose a row when the query does not (393.108(c), (d): ECFRIO-108 / SC-108 text, verified).
// Every table cell is checked in tables.suite.ts.
import { describe, expect, it } from "vitest";
import { RatingError } from "@/lib/securement/errors";
import { defaultRating, formatTableWll } from "@/lib/securement/lookup";

function ratingError(fn: () => unknown): RatingError {
  try {
    fn();
  } catch (e) {
    if (e instanceof RatingError) return e;
    throw e;
  }
  throw new Error("expected a RatingError");
}

describe("defaultRating", () => {
  it("answers the brief's example (chain table, verified)", () => {
    expect(defaultRating({ material: "chain", grade: 70, size: "3/8 in" })).toMatchObject({ material: "chain", wllLb: 6600, wllKg: 2990, source: "49 CFR 393.108, chain table" });
  });

  it("accepts grade marks", () => {
    expect(defaultRating({ material: "chain", grade: "G7", size: "1/2" }).wllLb).toBe(11300);
    expect(defaultRating({ material: "chain", grade: 800, size: "1/2" }).wllLb).toBe(12000);
  });

  it("reads grade mark 40 as grade 43 and notes it (New York State cargo manual's copy of the table)", () => {
    const r = defaultRating({ material: "chain", grade: "G40", size: "3/8" });
    expect(r).toMatchObject({ grade: 43, wllLb: 5400, wllKg: 2450, basis: "table" });
    expect(r.notes).toEqual(['Grade mark "G40" is read as grade 43: grade 43 (high test) chain is also stamped 4, 40 or 400']);
    expect(defaultRating({ material: "chain", grade: 43, size: "3/8" }).notes).toBeUndefined();
  });

  it("applies 393.108(d) when no grade is given: grade 30 proof coil", () => {
    expect(defaultRating({ material: "chain", size: "3/8" })).toMatchObject({ wllLb: 2650, wllKg: 1200, grade: 30, basis: "unmarked-rule" });
  });

  it("applies 393.108(c) when no fibre is given: polypropylene, with the lower manila figure of 393.108(f) beside it (tables verified, 1994 final rule)", () => {
    const r = defaultRating({ material: "rope", size: "1/2" });
    expect(r).toMatchObject({ wllLb: 625, wllKg: 280, fibre: "polypropylene", basis: "unmarked-rule" });
    expect(r.notes).toEqual([
      "Rated as polypropylene (49 CFR 393.108(c)): 625 lb (280 kg). If it is manila (natural fibre), 49 CFR 393.108(f) rates it lower: 315 lb (150 kg)",
    ]);
    expect(defaultRating({ material: "rope", size: "13 mm" }).notes![0]).toContain("315 lb (150 kg)");
    expect(defaultRating({ material: "rope", fibre: "polypropylene", size: "1/2" }).notes).toBeUndefined();
  });

  it("formats a table value with both published columns", () => {
    expect(formatTableWll({ wllLb: 2650, wllKg: 1200 })).toBe("2,650 lb (1,200 kg)");
  });

  it("throws typed errors an API can answer with", () => {
    const e1 = ratingError(() => defaultRating({ material: "chain", grade: 70, size: "9/16 in" }));
    expect(e1).toMatchObject({ code: "SIZE_NOT_IN_TABLE", nearest: ["1/2 in", "5/8 in"], field: "size" });
    expect(e1.message).toBe("Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in");
    const e2 = ratingError(() => defaultRating({ material: "chain", grade: 80, size: "7/16" }));
    expect(e2).toMatchObject({ code: "SIZE_NOT_IN_TABLE", nearest: ["3/8 in", "1/2 in"] });
    expect(ratingError(() => defaultRating({ material: "chain", grade: 120, size: "3/8" })).code).toBe("UNKNOWN_GRADE");
    expect(ratingError(() => defaultRating({ material: "chain", grade: 70 })).code).toBe("MISSING_SIZE");
    expect(ratingError(() => defaultRating({ material: "webbing" })).code).toBe("MISSING_SIZE");
    expect(ratingError(() => defaultRating({ material: "steel-strapping", width: "2" })).code).toBe("MISSING_SIZE");
    expect(ratingError(() => defaultRating({ material: "rope", fibre: "sisal", size: "1/2" })).code).toBe("UNKNOWN_FIBRE");
    expect(ratingError(() => defaultRating({ material: "chain", grade: 70, size: "big" })).code).toBe("INVALID_SIZE");
    expect(ratingError(() => defaultRating({ material: "cable" as never, size: "1/2" })).code).toBe("UNKNOWN_MATERIAL");
  });
});


describe("defaultRating keeps its answers", () => {
  it("gives each query its own answer", () => {
    for (let i = 0; i < 2; i++) {
      expect(defaultRating({ material: "chain", grade: 70, size: "3/8" }).wllLb).toBe(6600);
      expect(defaultRating({ material: "chain", grade: 80, size: "3/8" }).wllLb).toBe(7100);
      expect(defaultRating({ material: "chain", grade: 70, size: "1/2" }).wllLb).toBe(11300);
      expect(defaultRating({ material: "chain", size: "3/8" })).toMatchObject({ wllLb: 2650, basis: "unmarked-rule", grade: 30 });
      expect(defaultRating({ material: "chain", grade: "G40", size: "3/8" })).toMatchObject({ grade: 43, notes: [expect.stringContaining("G40")] });
      expect(defaultRating({ material: "chain", grade: 43, size: "3/8" }).notes).toBeUndefined();
      expect(defaultRating({ material: "wire-rope", size: "3/8" }).wllLb).toBe(3000);
      expect(defaultRating({ material: "rope", fibre: "manila", size: "3/8" }).wllLb).toBe(205);
      expect(defaultRating({ material: "rope", size: "3/8" })).toMatchObject({ wllLb: 400, fibre: "polypropylene" });
      expect(defaultRating({ material: "webbing", width: "4" }).wllLb).toBe(4000);
      expect(defaultRating({ material: "webbing", width: "2" }).wllLb).toBe(2000);
      expect(defaultRating({ material: "steel-strapping", width: "1 1/4", thickness: "0.029" }).wllLb).toBe(1190);
      expect(defaultRating({ material: "steel-strapping", width: "2", thickness: "0.044" }).wllLb).toBe(2650);
    }
  });

  it("answers a frozen rating, notes and all, that a caller cannot change for the next", () => {
    const first = defaultRating({ material: "rope", size: "1/2" });
    expect(Object.isFrozen(first)).toBe(true);
    expect(Object.isFrozen(first.notes)).toBe(true);
    expect(() => {
      (first as { wllLb: number }).wllLb = 1;
    }).toThrow(TypeError);
    expect(() => (first.notes as string[]).push("changed")).toThrow(TypeError);
    expect(defaultRating({ material: "rope", size: "1/2" })).toMatchObject({ wllLb: 625, notes: [expect.stringContaining("315 lb (150 kg)")] });
    expect(defaultRating({ material: "rope", size: "1/2" }).notes).toHaveLength(1);
  });

  it("refuses a size not in the table every time", () => {
    for (let i = 0; i < 2; i++) expect(ratingError(() => defaultRating({ material: "chain", grade: 70, size: "9/16" })).nearest).toEqual(["1/2 in", "5/8 in"]);
  });

  it("still answers right after more queries than it keeps, and sizes too long to keep", () => {
    const sizes = [["1/4", 3150], ["5/16", 4700], ["3/8", 6600], ["7/16", 8750], ["1/2", 11300], ["5/8", 15800]] as const;
    for (let pad = 0; pad < 300; pad++) {
      for (const [size, lb] of sizes) expect(defaultRating({ material: "chain", grade: 70, size: `${size}${" ".repeat(pad)}` }).wllLb).toBe(lb);
    }
    expect(defaultRating({ material: "chain", grade: 70, size: "3/8" }).wllLb).toBe(6600);
  });
});
