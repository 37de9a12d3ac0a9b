import { describe, expect, it } from "vitest";
import { itemFormSchema, itemInputSchema, latestInServiceDate, toWholeLb } from "@/lib/stock/schemas";
import { itemRating } from "@/lib/stock/rating";

const issues = (input: unknown) => {
  const r = itemInputSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
};

describe("item input", () => {
  it("reads sizes and grades as the trade writes them", () => {
    const r = itemInputSchema.parse({ kind: "chain", marking: "grade", grade: "7", size: '3/8"' });
    expect(r).toMatchObject({ grade: 70, size: "3/8" });
    expect(itemInputSchema.parse({ kind: "chain", marking: "grade", grade: 80, size: "10 mm" }).size).toBe("10 mm");
    // grade 43 is also stamped 40 or 400 (New York State cargo manual's copy of the 393.108 table)
    expect(itemInputSchema.parse({ kind: "chain", marking: "grade", grade: "G40", size: "3/8" }).grade).toBe(43);
  });

  it("names the field at fault, with the nearest table sizes", () => {
    expect(issues({ kind: "chain", marking: "grade", grade: 70, size: "9/16" })).toEqual([
      "size: Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in",
    ]);
    expect(issues({ kind: "chain", marking: "grade", grade: 75, size: "3/8" })[0]).toMatch(/^grade: Grade is one of 30, 43, 70, 80 or 100/);
    expect(issues({ kind: "web-strap", marking: "wll", markedWll: { value: -5, unit: "lb" }, size: "2" })).toEqual(["markedWll.value: The WLL must be more than 0."]);
    expect(issues({ kind: "binder", marking: "wll", markedWll: { value: 5400, unit: "lb" }, mechanism: "ratchet" })).toEqual([
      "chainSizeRange: Enter the chain sizes the binder takes, e.g. 5/16 to 3/8.",
    ]);
  });

  it("requires a marking on parts the tables do not cover (49 CFR 393.108)", () => {
    const r = issues({ kind: "shackle", marking: "none", size: "5/8" });
    expect(r[0]).toMatch(/^marking: .*marked WLL/);
  });

  it("converts a kilogram marking with the exact factor", () => {
    expect(toWholeLb({ value: 2000, unit: "kg" })).toBe(4409); // 2000 / 0.45359237 = 4409.25
  });

  it("reads the add-item form's flat fields", () => {
    const r = itemFormSchema.parse({ kind: "binder", marking: "wll", markedWllValue: "5400", markedWllUnit: "lb", rangeMin: "5/16", rangeMax: "3/8", mechanism: "lever", cost: "69.90", serial: " BL-1 " });
    expect(r).toMatchObject({ chainSizeRange: ["5/16", "3/8"], markedWll: { value: 5400, unit: "lb" }, costCents: 6990, serial: "BL-1" });
  });
});

describe("issue 11.8: JSON input is taken as typed (item input)", () => {
  const chain = { kind: "chain", marking: "wll", size: "3/8" };

  it("refuses a WLL, a length or a cost that is not a JSON number", () => {
    for (const value of [true, [5], "5", null, {}]) {
      expect(issues({ ...chain, markedWll: { value, unit: "lb" } }), JSON.stringify(value)).toEqual(["markedWll.value: Enter the WLL as a number."]);
    }
    expect(issues({ ...chain, markedWll: { value: 5000, unit: "lb" }, length: { value: "20", unit: "ft" } })).toEqual(["length.value: Enter the length as a number."]);
    expect(issues({ ...chain, markedWll: { value: 5000, unit: "lb" }, costCents: "100" })).toEqual(["costCents: Enter the cost in whole cents, as a number."]);
  });

  it("still reads the form's text as numbers, and names text that is none", () => {
    const form = { kind: "chain", marking: "wll", size: "3/8", markedWllUnit: "lb", lengthValue: " 20 ", lengthUnit: "ft" };
    expect(itemFormSchema.parse({ ...form, markedWllValue: "5000" })).toMatchObject({ markedWll: { value: 5000 }, length: { value: 20 } });
    const bad = itemFormSchema.safeParse({ ...form, markedWllValue: "five" });
    expect(bad.success ? [] : bad.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`)).toEqual(["markedWll.value: Enter the WLL as a number."]);
  });

  it("bounds the in-service date", () => {
    const wll = { ...chain, markedWll: { value: 5000, unit: "lb" } };
    expect(issues({ ...wll, inServiceOn: "9999-12-31" })).toEqual([`inServiceOn: The in-service date cannot be after ${latestInServiceDate()}, a year from today.`]);
    expect(issues({ ...wll, inServiceOn: "1899-01-01" })).toEqual(["inServiceOn: The in-service date cannot be before 1950."]);
    expect(issues({ ...wll, inServiceOn: "2026-01-20" })).toEqual([]);
    expect(latestInServiceDate(new Date("2026-12-01T12:00:00Z"))).toBe("2027-12-02");
    expect(latestInServiceDate(new Date("2026-12-01T23:59:59Z"))).toBe("2027-12-02");
    expect(latestInServiceDate(new Date("2026-12-02T00:00:00Z"))).toBe("2027-12-03");
  });

  it("takes the latest in-service date itself and refuses the day after it", () => {
    const wll = { ...chain, markedWll: { value: 5000, unit: "lb" } };
    const latest = latestInServiceDate();
    const dayAfter = new Date(Date.parse(latest) + 86_400_000).toISOString().slice(0, 10);
    expect(issues({ ...wll, inServiceOn: latest })).toEqual([]);
    expect(issues({ ...wll, inServiceOn: dayAfter })).toEqual([`inServiceOn: The in-service date cannot be after ${latest}, a year from today.`]);
    expect(issues({ ...wll, inServiceOn: "1950-01-01" })).toEqual([]);
  });

  it("says only how to write a date when the text is no date", () => {
    const wll = { ...chain, markedWll: { value: 5000, unit: "lb" } };
    for (const text of ["abc", "31/12/2026", "2026-13-45"]) {
      expect(issues({ ...wll, inServiceOn: text })).toEqual(["inServiceOn: Enter the date as YYYY-MM-DD."]);
    }
  });
});

describe("item rating", () => {
  // 49 CFR 393.108 chain table (verified): grade 70, 3/8 in = 6,600 lb; grade 30, 5/16 in = 1,900 lb.
  it("uses the table for an unmarked grade and grade 30 for chain with no grade mark", () => {
    expect(itemRating({ kind: "chain", grade: 70, gradeMarked: true, size: "3/8", markedWllLb: null }).wllLb).toBe(6600);
    expect(itemRating({ kind: "chain", grade: 70, gradeMarked: false, size: "5/16", markedWllLb: null }).wllLb).toBe(1900);
  });
  it("uses a marking as marked, and flags one above the table", () => {
    const r = itemRating({ kind: "chain", grade: 70, gradeMarked: true, size: "3/8", markedWllLb: 7500 });
    expect(r).toMatchObject({ wllLb: 7500, basis: "marked" });
    expect(r.warnings[0]).toMatch(/above the 49 CFR 393.108, chain table value/);
  });
  it("cannot rate an unmarked binder", () => {
    expect(itemRating({ kind: "binder", grade: null, gradeMarked: true, size: null, markedWllLb: null }).wllLb).toBeNull();
  });
});
