import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { editableLength, editableWeight } from "@/lib/kits/display";
import { lengthField, toWholeLb, toWholeMm, weightField } from "@/lib/kits/quantities";

// Conversions at the API's edge: exact factors (1 lb = 0.45359237 kg, 1 in = 25.4 mm,
// definitional), rounded once to whole pounds and millimetres.

describe("toWholeLb and toWholeMm", () => {
  it("convert with the exact factors and round once", () => {
    expect(toWholeLb({ value: 8100, unit: "lb" })).toBe(8100);
    expect(toWholeLb({ value: 3674, unit: "kg" })).toBe(8100); // 3,674 kg = 8,099.7 lb
    expect(toWholeLb({ value: 4535.9237, unit: "kg" })).toBe(10000);
    expect(toWholeMm({ value: 20, unit: "ft" })).toBe(6096);
    expect(toWholeMm({ value: 4.9, unit: "m" })).toBe(4900);
    expect(toWholeMm({ value: 18, unit: "in" })).toBe(457); // 457.2 mm
    expect(toWholeMm({ value: 0.3, unit: "m" })).toBe(300);
  });
});

describe("weightField and lengthField", () => {
  it("answer whole pounds and millimetres", () => {
    expect(weightField("weight", 200_000).parse({ value: 3674, unit: "kg" })).toBe(8100);
    expect(lengthField("length", 1, 30_000).parse({ value: 16, unit: "ft" })).toBe(4877);
  });

  it("refuse a unit they do not know, a missing value, a value out of range, with the field named", () => {
    const w = weightField("shipping weight", 200_000);
    expect(w.safeParse({ value: 8100, unit: "daN" }).error?.issues[0]).toMatchObject({ path: ["unit"], message: "The shipping weight is in lb or kg." });
    expect(w.safeParse({ value: "heavy", unit: "lb" }).error?.issues[0]?.message).toBe("Enter the shipping weight as a number.");
    // JSON numbers only: text, true or [5] is refused, not coerced (issue 11.8).
    for (const value of ["3674", true, [5], null]) {
      expect(w.safeParse({ value, unit: "lb" }).error?.issues[0]).toMatchObject({ path: ["value"], message: "Enter the shipping weight as a number." });
    }
    expect(w.safeParse({ value: 0, unit: "lb" }).error?.issues[0]?.message).toBe("The shipping weight must be more than 0.");
    expect(w.safeParse({ value: 250_000, unit: "lb" }).error?.issues[0]).toMatchObject({ path: ["value"] });
    expect(w.safeParse(8100).error?.issues[0]?.message).toBe("Give the shipping weight as { value, unit }.");
    const l = lengthField("position", 0, 30_000);
    expect(l.parse({ value: 0, unit: "mm" })).toBe(0);
    expect(l.safeParse({ value: -1, unit: "mm" }).error?.issues[0]?.message).toBe("The position cannot be negative.");
    expect(lengthField("deck length", 1, 30_000).safeParse({ value: 0.2, unit: "mm" }).success).toBe(false); // rounds to 0 mm
  });
});

describe("what a form starts from", () => {
  it("stores the same figure again when saved unchanged, in either system", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 200_000 }), fc.constantFrom("us" as const, "metric" as const), (lb, system) => {
        expect(toWholeLb(editableWeight(lb, system))).toBe(lb);
      }),
    );
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 30_000 }), fc.constantFrom("us" as const, "metric" as const), (mm, system) => {
        expect(toWholeMm(editableLength(mm, system))).toBe(mm);
      }),
    );
  });

  it("reads as a person would write it", () => {
    expect(editableLength(6096, "us")).toEqual({ value: 20, unit: "ft" });
    expect(editableLength(457, "us")).toEqual({ value: 18, unit: "in" });
    expect(editableLength(4900, "us")).toEqual({ value: 192.91, unit: "in" });
    expect(editableLength(4900, "metric")).toEqual({ value: 4.9, unit: "m" });
    expect(editableWeight(8100, "us")).toEqual({ value: 8100, unit: "lb" });
    expect(editableWeight(8100, "metric")).toEqual({ value: 3674.1, unit: "kg" });
  });
});
