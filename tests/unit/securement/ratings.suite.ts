// Component ratings: the 49 CFR 393.108 rules for marked and unmarked material
// (393.108(a)-(f): ECFRIO-108 / SC-108 text, verified) and the default-rating lookup.
import { describe, expect, it } from "vitest";
import { RatingError } from "@/lib/securement/errors";
import { componentWll, defaultRating } from "@/lib/securement/ratings";

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

  it("applies 393.108(d) when no grade is given: grade 30 proof coil", () => {
    expect(defaultRating({ material: "chain", size: "3/8" })).toMatchObject({ wllLb: 2650, wllKg: 1200, grade: 30, basis: "unmarked-rule" });
  });

  it("applies 393.108(c) when no fibre is given: polypropylene (FROM MEMORY table, not verified)", () => {
    expect(defaultRating({ material: "rope", size: "1/2" })).toMatchObject({ wllLb: 625, wllKg: 280, fibre: "polypropylene", basis: "unmarked-rule" });
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

describe("componentWll: marked WLL (393.108(b))", () => {
  it("uses a marked WLL as marked, in any unit", () => {
    expect(componentWll({ type: "binder", wll: { value: 5400, unit: "lb" } })).toMatchObject({ wllLb: 5400, basis: "marked" });
    expect(componentWll({ type: "anchor", wll: { value: 2268, unit: "kg" } }).wllLb).toBeCloseTo(5000.08, 2);
    expect(componentWll({ type: "webbing", width: "4 in", wll: { value: 5400, unit: "lb" } }).wllLb).toBe(5400);
    // a marking below the table is used too
    expect(componentWll({ type: "chain", grade: 70, size: "3/8", wll: { value: 5000, unit: "lb" } })).toMatchObject({ wllLb: 5000, findings: [] });
  });

  it("warns when a chain's marking is above the table for its grade and size", () => {
    const r = componentWll({ type: "chain", grade: 70, size: "3/8", wll: { value: 7100, unit: "lb" } });
    expect(r.wllLb).toBe(7100);
    expect(r.findings).toEqual([
      expect.objectContaining({ code: "MARKED_ABOVE_TABLE", severity: "warn", source: "49 CFR 393.108(b)" }),
    ]);
    expect(r.findings[0]!.message).toContain("6,600 lb (2,990 kg)");
    // an equal marking is fine
    expect(componentWll({ type: "chain", grade: 70, size: "3/8", wll: { value: 6600, unit: "lb" } }).findings).toEqual([]);
  });

  it("needs a marked WLL on binders, hooks, shackles and anchors (no table covers them)", () => {
    for (const type of ["binder", "hook", "shackle", "anchor"] as const) {
      const e = ratingError(() => componentWll({ type }));
      expect(e.code).toBe("MISSING_WLL");
      expect(e.field).toBe("wll");
    }
  });
});

describe("componentWll: unmarked material", () => {
  it("rates unmarked chain as grade 30 proof coil (393.108(d)): CVSA example 5/16 G70 → 1,900 lb", () => {
    // truckinginfo.com quoting a CVSA International Safety Team member (verified): 5/16 in grade 70,
    // markings missing or illegible, is rated as grade 30: 4,700 lb → 1,900 lb.
    const r = componentWll({ type: "chain", grade: 70, size: "5/16 in", marked: false });
    expect(r).toMatchObject({ wllLb: 1900, tableWllKg: 860, basis: "unmarked-rule" });
    expect(r.findings.map((f) => f.code)).toEqual(["RATED_AS_UNMARKED"]);
    expect(r.findings[0]!.message).toContain("entered as grade 70");
  });

  it("does not read the grade of chain declared unmarked", () => {
    expect(componentWll({ type: "chain", grade: "unreadable", size: "3/8", marked: false }).wllLb).toBe(2650);
  });

  it("rates chain with no grade and no WLL as grade 30", () => {
    expect(componentWll({ type: "chain", size: "3/8" })).toMatchObject({ wllLb: 2650, basis: "unmarked-rule" });
  });

  it("ignores a WLL entered on gear declared unmarked, with a warning", () => {
    const r = componentWll({ type: "chain", grade: 70, size: "3/8", marked: false, wll: { value: 6600, unit: "lb" } });
    expect(r.wllLb).toBe(2650);
    expect(r.findings.map((f) => f.code)).toEqual(["UNMARKED_WLL_IGNORED", "RATED_AS_UNMARKED"]);
    const w = componentWll({ type: "webbing", width: "4", marked: false, wll: { value: 5400, unit: "lb" } });
    expect(w.wllLb).toBe(4000);
    expect(w.findings.map((f) => f.code)).toEqual(["UNMARKED_WLL_IGNORED"]);
  });

  it("rates unlabelled synthetic cordage as polypropylene (393.108(c); rope tables FROM MEMORY, not verified)", () => {
    expect(componentWll({ type: "rope", fibre: "nylon", size: "1/2", marked: false })).toMatchObject({ wllLb: 625, basis: "unmarked-rule" });
    const unknown = componentWll({ type: "rope", size: "1/2" });
    expect(unknown).toMatchObject({ wllLb: 625, basis: "unmarked-rule" });
    expect(unknown.findings[0]).toMatchObject({ code: "ROPE_FIBRE_UNKNOWN", severity: "warn" });
    expect(unknown.findings[0]!.message).toContain("315 lb"); // manila 1/2 in, lower
    expect(componentWll({ type: "rope", fibre: "nylon", size: "1/2" })).toMatchObject({ wllLb: 525, basis: "table" });
  });

  it("rates unmarked manila from the manila table (393.108(f); FROM MEMORY, not verified)", () => {
    expect(componentWll({ type: "rope", fibre: "manila", size: "3/4", marked: false })).toMatchObject({ wllLb: 640, basis: "table" });
  });

  it("rates unmarked wire rope as 6 x 37 fiber core (393.108(e)(2))", () => {
    const r = componentWll({ type: "wire-rope", size: "1/2" });
    expect(r).toMatchObject({ wllLb: 5300, tableWllKg: 2400 });
    expect(r.source).toContain("393.108(e)(2)");
  });

  it("rates steel strapping by width and thickness", () => {
    expect(componentWll({ type: "steel-strapping", width: "1-1/4 in", thickness: "0.029" }).wllLb).toBe(1190);
  });

  it("passes table errors on", () => {
    expect(ratingError(() => componentWll({ type: "chain", grade: 70, size: "9/16" })).nearest).toEqual(["1/2 in", "5/8 in"]);
    expect(ratingError(() => componentWll({ type: "chain", grade: 70 })).code).toBe("MISSING_SIZE");
    expect(ratingError(() => componentWll({ type: "chain", grade: "alloy", size: "3/8" })).code).toBe("UNKNOWN_GRADE");
    expect(ratingError(() => componentWll({ type: "chain", grade: 120, size: "3/8" })).code).toBe("UNKNOWN_GRADE");
    // a grade outside the table is fine when the WLL is marked
    expect(componentWll({ type: "chain", grade: 120, size: "3/8", wll: { value: 10600, unit: "lb" } }).wllLb).toBe(10600);
  });
});
