// The marking rules: the 49 CFR 393.108 rules for marked and unmarked material
// (393.108(a)-(f): ECFRIO-108 / SC-108 text, verified).
import { describe, expect, it } from "vitest";
import { RatingError } from "@/lib/securement/errors";
import { componentWll } from "@/lib/securement/marking";

function ratingError(fn: () => unknown): RatingError {
  try {
    fn();
  } catch (e) {
    if (e instanceof RatingError) return e;
    throw e;
  }
  throw new Error("expected a RatingError");
}

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

  it("rates unlabelled synthetic cordage as polypropylene (393.108(c); rope tables verified, 1994 final rule)", () => {
    expect(componentWll({ type: "rope", fibre: "nylon", size: "1/2", marked: false })).toMatchObject({ wllLb: 625, basis: "unmarked-rule" });
    expect(componentWll({ type: "rope", fibre: "nylon", size: "1/2" })).toMatchObject({ wllLb: 525, basis: "table" });
  });

  it("rope of unknown fibre: polypropylene (393.108(c)), and the warning gives the lower manila figure too (393.108(f))", () => {
    const unknown = componentWll({ type: "rope", size: "1/2" });
    expect(unknown).toMatchObject({ wllLb: 625, tableWllKg: 280, basis: "unmarked-rule" });
    expect(unknown.findings).toEqual([
      {
        code: "ROPE_FIBRE_UNKNOWN",
        severity: "warn",
        message: "The 1/2 in rope's fibre is not given. Rated as polypropylene (49 CFR 393.108(c)): 625 lb (280 kg). If it is manila (natural fibre), 49 CFR 393.108(f) rates it lower: 315 lb (150 kg)",
        source: "49 CFR 393.108(c); 49 CFR 393.108(f)",
        field: "fibre",
      },
    ]);
    // every size: the manila figure is the lower one
    for (const size of ["3/8", "7/16", "13 mm", "5/8", "3/4", "1"]) {
      const f = componentWll({ type: "rope", size }).findings[0]!;
      const [pp, manila] = [...f.message.matchAll(/: ([\d,]+) lb/g)].map((m) => Number(m[1]!.replace(",", "")));
      expect(manila!).toBeLessThan(pp!);
    }
  });

  it("rates unmarked manila from the manila table (393.108(f); verified, 1994 final rule)", () => {
    expect(componentWll({ type: "rope", fibre: "manila", size: "3/4", marked: false })).toMatchObject({ wllLb: 640, basis: "table" });
  });

  it("rates unmarked wire rope of unknown construction as 6 x 37 fiber core (393.108(e)(2))", () => {
    const r = componentWll({ type: "wire-rope", size: "1/2" });
    expect(r).toMatchObject({ wllLb: 5300, tableWllKg: 2400, findings: [] });
    expect(r.source).toContain("393.108(e)(2)");
    expect(componentWll({ type: "wire-rope", size: "1 in" }).wllLb).toBe(20900); // corrected row, 1994 final rule's table
  });

  it("rates unmarked wire rope at one quarter of its nominal strength when that is given (393.108(e)(1))", () => {
    const r = componentWll({ type: "wire-rope", size: "1/2", construction: "6x19 IWRC", nominalStrength: { value: 26600, unit: "lb" } });
    expect(r).toMatchObject({ wllLb: 6650, basis: "unmarked-rule", description: "1/2 in 6x19 IWRC wire rope" });
    expect(r.tableWllKg).toBeUndefined();
    expect(r.source).toBe("49 CFR 393.108(e)(1): one quarter of the nominal strength (Wire Rope Users Manual)");
    expect(r.findings).toEqual([expect.objectContaining({ code: "RATED_AS_UNMARKED", severity: "info", source: "49 CFR 393.108(e)(1)" })]);
    expect(r.findings[0]!.message).toContain("one quarter of its nominal strength of 26,600 lb (12,065.6 kg): 6,650 lb (3,016.4 kg)");
    // in kg, and without a size or construction: still a quarter
    expect(componentWll({ type: "wire-rope", nominalStrength: { value: 12000, unit: "kg" } }).wllLb).toBeCloseTo(3000 / 0.45359237, 4);
    // a marked WLL governs (393.108(b))
    expect(componentWll({ type: "wire-rope", size: "1/2", nominalStrength: { value: 26600, unit: "lb" }, wll: { value: 5000, unit: "lb" } })).toMatchObject({ wllLb: 5000, basis: "marked" });
  });

  it("known construction but no nominal strength: the 6 x 37 table, with a warning that it stands in only for the missing nominal strength", () => {
    const r = componentWll({ type: "wire-rope", size: "1/2", construction: "6x19 IWRC" });
    expect(r).toMatchObject({ wllLb: 5300, tableWllKg: 2400, basis: "table" });
    expect(r.findings).toEqual([expect.objectContaining({ code: "WIRE_ROPE_RATED_FROM_TABLE", severity: "warn", source: "49 CFR 393.108(e)(1)", field: "nominalStrength" })]);
    expect(r.findings[0]!.message).toContain("is rated from the 49 CFR 393.108 wire rope (6 x 37, fiber core) table (5,300 lb (2,400 kg)) only because no nominal strength was given");
  });

  it("refuses a nominal strength that is not above 0", () => {
    expect(ratingError(() => componentWll({ type: "wire-rope", size: "1/2", nominalStrength: { value: 0, unit: "lb" } }))).toMatchObject({ code: "MISSING_WLL", field: "nominalStrength" });
  });

  it("reads grade mark 40 as grade 43 and notes it, on chain and on fittings", () => {
    const c = componentWll({ type: "chain", grade: "G40", size: "3/8" });
    expect(c).toMatchObject({ wllLb: 5400, basis: "table", description: "3/8 in grade 43 chain" });
    expect(c.findings).toEqual([expect.objectContaining({ code: "GRADE_MARK_READ_AS", severity: "info", field: "grade" })]);
    expect(componentWll({ type: "chain", grade: 400, size: "3/8", wll: { value: 5400, unit: "lb" } }).findings.map((f) => f.code)).toEqual(["GRADE_MARK_READ_AS"]);
    expect(componentWll({ type: "hook", grade: 40, wll: { value: 5400, unit: "lb" } }).findings.map((f) => f.code)).toEqual(["GRADE_MARK_READ_AS"]);
    // unmarked chain is not read for its grade at all
    expect(componentWll({ type: "chain", grade: 40, size: "3/8", marked: false }).findings.map((f) => f.code)).toEqual(["RATED_AS_UNMARKED"]);
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
