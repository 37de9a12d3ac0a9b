// Unit conversions, checked against the independent convert-units package and against the
// exact definitions (shared reference §6: 1 lb = 0.45359237 kg exactly, verified; 1 lbf =
// 4.4482216152605 N exactly, verified; 1 daN = 10 N, 1 in = 25.4 mm, 1 ft = 0.3048 m, definitional).
import { createRequire } from "node:module";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  KG_PER_LB,
  MM_PER_IN,
  M_PER_FT,
  N_PER_LBF,
  fromInches,
  fromLb,
  settle,
  toFeet,
  toInches,
  toKg,
  toLb,
  toMillimetres,
} from "@/lib/securement/units";

// convert-units 2.3.4 is CommonJS without type declarations: load it through require and
// give it the small type used here, so no ambient module declaration leaks into the project.
type Convert = (value: number) => { from(unit: string): { to(unit: string): number } };
const convert = createRequire(import.meta.url)("convert-units") as Convert;

// convert-units rounds its factors (453.592 g per lb, 3.28084 ft per m), so it agrees with the
// exact factors to about 1 part in a million; that is the tolerance of the comparison.
const REL = 1e-6;
const close = (actual: number, expected: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.abs(expected) * REL + 1e-12);

describe("exact factors", () => {
  it("use the definitions", () => {
    expect(KG_PER_LB).toBe(0.45359237);
    expect(N_PER_LBF).toBe(4.4482216152605);
    expect(MM_PER_IN).toBe(25.4);
    expect(M_PER_FT).toBe(0.3048);
    // 1 lbf = 0.45359237 kg × 9.80665 m/s² (standard gravity, exact)
    expect(KG_PER_LB * 9.80665).toBeCloseTo(N_PER_LBF, 12);
  });

  it("results carry their unit", () => {
    expect(toLb({ value: 1, unit: "kg" }).unit).toBe("lb");
    expect(fromLb(1, "daN").unit).toBe("daN");
    expect(toInches({ value: 1, unit: "ft" })).toEqual({ value: 12, unit: "in" });
    expect(fromInches(12, "ft")).toEqual({ value: 1, unit: "ft" });
  });

  it("converts the reference's landmark figures", () => {
    expect(toKg({ value: 1000, unit: "lb" }).value).toBeCloseTo(453.59237, 9);
    expect(toLb({ value: 4535.9237, unit: "kg" }).value).toBeCloseTo(10000, 9);
    expect(fromLb(5000, "kg").value).toBeCloseTo(2267.96185, 6); // Handbook's 2,268 kg (5,000 lb)
    expect(toMillimetres({ value: 3 / 8, unit: "in" }).value).toBeCloseTo(9.525, 12);
    expect(toFeet({ value: 3.048, unit: "m" }).value).toBeCloseTo(10, 12);
  });

  it("takes daN through pounds-force: 1 daN = 10 N / 4.4482216152605 N per lbf", () => {
    expect(toLb({ value: 1, unit: "daN" }).value).toBeCloseTo(2.2480894309971, 12);
    expect(fromLb(1, "daN").value).toBeCloseTo(0.44482216152605, 14);
    // 1 kg (as a force, kgf) = 0.980665 daN: "1 daN ≈ 1 kg" is about 2 % off (reference §6, derived)
    expect(fromLb(toLb({ value: 1, unit: "kg" }).value, "daN").value).toBeCloseTo(0.980665, 12);
  });

  it("settle() removes conversion noise only", () => {
    expect(settle(toLb({ value: 4535.9237, unit: "kg" }).value)).toBe(10000);
    expect(settle(toFeet({ value: 6.096, unit: "m" }).value)).toBe(20);
    expect(settle(4900.5)).toBe(4900.5);
  });
});

describe("against convert-units", () => {
  it("lb ↔ kg", () => {
    for (const v of [1, 1100, 1900, 4500, 10000, 40200]) {
      close(toKg({ value: v, unit: "lb" }).value, convert(v).from("lb").to("kg"));
      close(toLb({ value: v, unit: "kg" }).value, convert(v).from("kg").to("lb"));
    }
  });

  it("daN ↔ lb matches convert-units' kg scaled by standard gravity", () => {
    for (const v of [1, 500, 2268, 10000]) {
      // v daN = v × 10 N = v × 10 / 9.80665 kg-force
      close(toLb({ value: v, unit: "daN" }).value, convert((v * 10) / 9.80665).from("kg").to("lb"));
    }
  });

  it("in, ft, mm, m", () => {
    for (const v of [0.25, 0.375, 1.75, 4, 10, 18, 53]) {
      close(toMillimetres({ value: v, unit: "in" }).value, convert(v).from("in").to("mm"));
      close(toInches({ value: v, unit: "mm" }).value, convert(v).from("mm").to("in"));
      close(toFeet({ value: v, unit: "m" }).value, convert(v).from("m").to("ft"));
      close(toInches({ value: v, unit: "ft" }).value, convert(v).from("ft").to("in"));
      close(toFeet({ value: v, unit: "in" }).value, convert(v).from("in").to("ft"));
    }
  });

  it("random weights and lengths (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 1e6, noNaN: true }), fc.constantFrom("lb", "kg"), fc.constantFrom("lb", "kg"), (v, from, to) => {
        const ours = to === "lb" ? toLb({ value: v, unit: from }).value : toKg({ value: v, unit: from }).value;
        close(ours, convert(v).from(from).to(to));
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 1e5, noNaN: true }), fc.constantFrom("in", "ft", "mm", "m"), (v, from) => {
        close(toInches({ value: v, unit: from }).value, convert(v).from(from).to("in"));
      }),
    );
  });

  it("round trips are exact after settle()", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 200_000 }), fc.constantFrom("kg", "daN") as fc.Arbitrary<"kg" | "daN">, (lb, unit) => {
        expect(settle(toLb(fromLb(lb, unit)).value)).toBe(lb);
      }),
    );
  });
});
