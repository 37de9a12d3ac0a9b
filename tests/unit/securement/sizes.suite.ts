// Size parser: the forms the trade writes, and matching to 49 CFR 393.108 table rows.
// Row sizes used here are transcribed from the chain table (JJK-108 copy, verified):
// 7 (1/4), 8 (5/16), 10 (3/8), 11 (7/16), 13 (1/2), 16 (5/8).
import { describe, expect, it } from "vitest";
import { RatingError } from "@/lib/securement/errors";
import { findRow, inchLabel, nearestRows, parseSize, sizeMatchesRow, tryParseSize } from "@/lib/securement/sizes";

const CHAIN_ROWS = [
  { label: "1/4", inches: 0.25, mm: 7 },
  { label: "5/16", inches: 0.3125, mm: 8 },
  { label: "3/8", inches: 0.375, mm: 10 },
  { label: "7/16", inches: 0.4375, mm: 11 },
  { label: "1/2", inches: 0.5, mm: 13 },
  { label: "5/8", inches: 0.625, mm: 16 },
];
const TITLE = "49 CFR 393.108 chain table";

describe("parseSize", () => {
  it.each([
    ["3/8", "3/8", 0.375],
    ["3/8 in", "3/8", 0.375],
    ['3/8"', "3/8", 0.375],
    ["3/8in", "3/8", 0.375],
    ["3/8 inch", "3/8", 0.375],
    ["  3/8  IN ", "3/8", 0.375],
    ["0.375", "3/8", 0.375],
    [".375 in", "3/8", 0.375],
    ["6/16", "3/8", 0.375],
    ["1 3/4", "1 3/4", 1.75],
    ["1-3/4 in", "1 3/4", 1.75],
    ["1¾", "1 3/4", 1.75],
    ["⅜\"", "3/8", 0.375],
    ["1.75", "1 3/4", 1.75],
    ["2 in", "2", 2],
    ["2", "2", 2],
    ["4\u2033", "4", 4],
    ["1 1/4", "1 1/4", 1.25],
    ["0.029", "0.029", 0.029],
    ["0.050 in", "0.05", 0.05],
  ])("reads %j as %s in", (input, label, inches) => {
    const s = parseSize(input);
    expect(s.system).toBe("inch");
    expect(s.label).toBe(label);
    expect(s.inches).toBeCloseTo(inches, 12);
    expect(s.display).toBe(`${label} in`);
  });

  it.each([
    ["10 mm", 10],
    ["10mm", 10],
    ["10 MM", 10],
    ["31.7 mm", 31.7],
    ["0.74 mm", 0.74],
    ["13 millimetres", 13],
  ])("reads %j as metric", (input, mm) => {
    const s = parseSize(input);
    expect(s.system).toBe("metric");
    expect(s.mm).toBe(mm);
    expect(s.inches).toBeCloseTo(mm / 25.4, 12);
    expect(s.display).toBe(`${mm} mm`);
  });

  it("reads a number as inches", () => {
    expect(parseSize(50)).toMatchObject({ system: "inch", inches: 50, label: "50", display: "50 in" });
    expect(parseSize(0.375).label).toBe("3/8");
  });

  it.each(["", "  ", "abc", "3/0", "0", "-1", "3/8 ft", "1 5/4", "3//8", "10 cm", "0/4", "1e3"])("rejects %j with INVALID_SIZE", (input) => {
    expect(() => parseSize(input)).toThrowError(RatingError);
    try {
      parseSize(input);
    } catch (e) {
      expect((e as RatingError).code).toBe("INVALID_SIZE");
    }
    expect(tryParseSize(input)).toBeUndefined();
  });

  it.each([0, -2, Number.NaN, Number.POSITIVE_INFINITY])("rejects the number %s", (n) => {
    expect(tryParseSize(n)).toBeUndefined();
  });
});

describe("inchLabel", () => {
  it("gives fractions in 64ths and decimals otherwise", () => {
    expect(inchLabel(0.3125)).toBe("5/16");
    expect(inchLabel(1.25)).toBe("1 1/4");
    expect(inchLabel(2)).toBe("2");
    expect(inchLabel(0.015625)).toBe("1/64");
    expect(inchLabel(0.057)).toBe("0.057");
  });
});

describe("matching a size to a table row", () => {
  it("matches inch sizes by value and metric sizes by the published mm column", () => {
    const row38 = CHAIN_ROWS[2]!;
    expect(sizeMatchesRow(parseSize("3/8"), row38)).toBe(true);
    expect(sizeMatchesRow(parseSize("0.375 in"), row38)).toBe(true);
    // The table prints "10 (3/8)": 10 mm is the 3/8 in row although 3/8 in is 9.525 mm.
    expect(sizeMatchesRow(parseSize("10 mm"), row38)).toBe(true);
    expect(sizeMatchesRow(parseSize("9.525 mm"), row38)).toBe(false);
    expect(sizeMatchesRow(parseSize("0.38"), row38)).toBe(false);
    expect(findRow(parseSize("13 mm"), CHAIN_ROWS, TITLE).label).toBe("1/2");
  });

  it("names the nearest sizes, never guesses", () => {
    expect(() => findRow(parseSize("9/16 in"), CHAIN_ROWS, TITLE)).toThrowError(
      "Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in",
    );
    expect(nearestRows(parseSize("0.38"), CHAIN_ROWS)).toEqual(["3/8 in", "7/16 in"]);
    expect(nearestRows(parseSize("3/16"), CHAIN_ROWS)).toEqual(["1/4 in"]);
    expect(nearestRows(parseSize("3/4"), CHAIN_ROWS)).toEqual(["5/8 in"]);
    expect(nearestRows(parseSize("9 mm"), CHAIN_ROWS)).toEqual(["8 mm (5/16 in)", "10 mm (3/8 in)"]);
    try {
      findRow(parseSize("12 mm"), CHAIN_ROWS, TITLE);
      expect.unreachable();
    } catch (e) {
      const err = e as RatingError;
      expect(err).toBeInstanceOf(RatingError);
      expect(err.code).toBe("SIZE_NOT_IN_TABLE");
      expect(err.nearest).toEqual(["11 mm (7/16 in)", "13 mm (1/2 in)"]);
      expect(err.message).toBe("Size 12 mm is not in the 49 CFR 393.108 chain table; nearest: 11 mm (7/16 in), 13 mm (1/2 in)");
      expect(err.toJSON()).toEqual({ code: "SIZE_NOT_IN_TABLE", message: err.message, nearest: err.nearest, field: "size" });
    }
  });

  it("hints at mm when a bare number would be a metric row", () => {
    expect(() => findRow(parseSize(13), CHAIN_ROWS, TITLE)).toThrowError(/for 13 mm write "13 mm"/);
    expect(() => findRow(parseSize("13 in"), CHAIN_ROWS, TITLE)).not.toThrowError(/write/);
  });
});

describe("parseSize keeps its readings", () => {
  it("gives each text its own reading, the same text the same one", () => {
    const plain = parseSize("3/8");
    const withUnit = parseSize("3/8 in");
    const metric = parseSize("10 mm");
    const number = parseSize(0.375);
    expect(plain.input).toBe("3/8");
    expect(withUnit.input).toBe("3/8 in");
    expect(metric).toMatchObject({ system: "metric", mm: 10, display: "10 mm" });
    expect(number).toMatchObject({ input: "0.375", system: "inch", label: "3/8" });
    // "10" as text and 10 as a number are both inches, but not the same reading as "10 mm"
    expect(parseSize("10").system).toBe("inch");
    expect(parseSize(10).system).toBe("inch");
    expect(parseSize("3/8")).toBe(plain);
  });

  it("answers a frozen reading that a caller cannot change for the next", () => {
    const first = parseSize("1-3/4 in");
    expect(Object.isFrozen(first)).toBe(true);
    expect(() => {
      (first as { inches: number }).inches = 99;
    }).toThrow(TypeError);
    expect(parseSize("1-3/4 in")).toMatchObject({ inches: 1.75, label: "1 3/4", display: "1 3/4 in" });
  });

  it("refuses an unreadable text every time, naming it", () => {
    for (let i = 0; i < 2; i++) {
      expect(() => parseSize(" 3/8 foo ")).toThrow(RatingError);
      expect(() => parseSize(" 3/8 foo ")).toThrow('Cannot read the size "3/8 foo"');
      expect(tryParseSize(" 3/8 foo ")).toBeUndefined();
    }
    expect(() => parseSize(-1)).toThrow('Cannot read the size "-1"');
  });

  it("still reads right after more texts than it keeps, and texts too long to keep", () => {
    for (let n = 1; n <= 5000; n++) expect(parseSize(`${n}/64 in`).inches).toBe(n / 64);
    expect(parseSize("1/64 in").inches).toBe(1 / 64);
    const long = `${" ".repeat(100)}5/16${" ".repeat(100)}`;
    expect(parseSize(long)).toMatchObject({ input: "5/16", inches: 0.3125 });
    expect(parseSize(long)).toMatchObject({ input: "5/16", inches: 0.3125 });
  });

  it("tryParseSize answers undefined for what is not a string or a number", () => {
    expect(tryParseSize(null as unknown as string)).toBeUndefined();
    expect(tryParseSize({} as unknown as string)).toBeUndefined();
  });
});
