// Every cell of the 49 CFR 393.108 default-WLL tables, both published columns (kg and lb),
// transcribed by hand from the shared reference file (corrected: wire rope 7/8 and 1 in, rope
// 1/2 in = 13 mm), independent of the implementation's table objects. Cells still FROM
// MEMORY: the double braided nylon table and steel strapping rows 2-8. Each lookup goes through the public defaultRating() and is checked against
// the printed column for that unit (the kg and lb columns are separately rounded: never
// converted one from the other).
import { describe, expect, it } from "vitest";
import { defaultRating } from "@/lib/securement/lookup";
import { CHAIN_TABLE, ROPE_TABLES, STEEL_STRAPPING_TABLE, WEBBING_TABLE, WIRE_ROPE_TABLE } from "@/lib/securement/tables";

type Cell = readonly [kg: number, lb: number];

// 49 CFR 393.108, chain table (JJK-108 copy, verified; FORD-108 copy identical).
// [mm, in, G30, G43, G70, G80, G100]; null = no entry (7/16 in has no grade 80 or 100).
const CHAIN: ReadonlyArray<readonly [number, string, Cell, Cell, Cell, Cell | null, Cell | null]> = [
  [7, "1/4", [580, 1300], [1180, 2600], [1430, 3150], [1570, 3500], [1950, 4300]],
  [8, "5/16", [860, 1900], [1770, 3900], [2130, 4700], [2000, 4500], [2600, 5700]],
  [10, "3/8", [1200, 2650], [2450, 5400], [2990, 6600], [3200, 7100], [4000, 8800]],
  [11, "7/16", [1680, 3700], [3270, 7200], [3970, 8750], null, null],
  [13, "1/2", [2030, 4500], [4170, 9200], [5130, 11300], [5400, 12000], [6800, 15000]],
  [16, "5/8", [3130, 6900], [5910, 13000], [7170, 15800], [8200, 18100], [10300, 22600]],
];
const GRADES = [30, 43, 70, 80, 100] as const;

describe("49 CFR 393.108, chain table (verified)", () => {
  for (const [mm, inch, ...cells] of CHAIN) {
    GRADES.forEach((grade, g) => {
      const cell = cells[g];
      if (cell === null || cell === undefined) {
        it(`grade ${grade}, ${inch} in: no entry`, () => {
          expect(() => defaultRating({ material: "chain", grade, size: `${inch} in` })).toThrowError(/has no grade \d+ entry/);
          expect(() => defaultRating({ material: "chain", grade, size: `${mm} mm` })).toThrowError(/has no grade \d+ entry/);
        });
        return;
      }
      it(`grade ${grade}, ${mm} mm (${inch} in): ${cell[0]} kg (${cell[1]} lb)`, () => {
        const byInch = defaultRating({ material: "chain", grade, size: `${inch} in` });
        expect(byInch).toMatchObject({ material: "chain", wllKg: cell[0], wllLb: cell[1], source: "49 CFR 393.108, chain table", status: "verified", grade });
        const byMm = defaultRating({ material: "chain", grade, size: `${mm} mm` });
        expect([byMm.wllKg, byMm.wllLb]).toEqual([cell[0], cell[1]]);
      });
    });
  }

  it("has exactly these rows and cells", () => {
    expect(CHAIN_TABLE.rows.map((r) => [r.mm, r.label])).toEqual(CHAIN.map(([mm, inch]) => [mm, inch]));
    expect(CHAIN_TABLE.rows.reduce((n, r) => n + Object.keys(r.grades).length, 0)).toBe(28);
  });

  it("keeps the published oddities (reference pitfalls)", () => {
    // Grade 80 at 5/16 in is lower than grade 70 at 5/16 in, as published.
    expect(defaultRating({ material: "chain", grade: 80, size: "5/16" }).wllLb).toBe(4500);
    expect(defaultRating({ material: "chain", grade: 70, size: "5/16" }).wllLb).toBe(4700);
    // kg is the printed figure, not a conversion: 4,500 lb would be 2,041.2 kg; 1,300 lb 589.7 kg; 22,600 lb 10,251 kg.
    expect(defaultRating({ material: "chain", grade: 80, size: "5/16" }).wllKg).toBe(2000);
    expect(defaultRating({ material: "chain", grade: 30, size: "1/4" }).wllKg).toBe(580);
    expect(defaultRating({ material: "chain", grade: 100, size: "5/8" }).wllKg).toBe(10300);
  });
});

// 49 CFR 393.108, synthetic webbing table (JJK-108 copy, verified). [mm, in, kg, lb]
const WEBBING = [
  [45, "1 3/4", 790, 1750],
  [50, "2", 910, 2000],
  [75, "3", 1360, 3000],
  [100, "4", 1810, 4000],
] as const;

describe("49 CFR 393.108, synthetic webbing table (verified)", () => {
  it.each(WEBBING)("%i mm (%s in): %i kg (%i lb)", (mm, inch, kg, lb) => {
    expect(defaultRating({ material: "webbing", width: `${inch} in` })).toMatchObject({ wllKg: kg, wllLb: lb, source: "49 CFR 393.108, synthetic webbing table", status: "verified" });
    expect(defaultRating({ material: "webbing", width: `${mm} mm` })).toMatchObject({ wllKg: kg, wllLb: lb });
  });
  it("has exactly these rows; 1 in is not a row", () => {
    expect(WEBBING_TABLE.rows.map((r) => [r.mm, r.label, r.kg, r.lb])).toEqual(WEBBING.map((r) => [...r]));
    expect(() => defaultRating({ material: "webbing", width: "1 in" })).toThrowError("Width 1 in is not in the 49 CFR 393.108 synthetic webbing table; nearest: 1 3/4 in");
  });
});

// 49 CFR 393.108, wire rope (6 x 37, fiber core) table. [mm, in, kg, lb, status]
// 1/4 to 3/4 in: JJK-108 copy, verified. 7/8 in and 1 in: verified against the 1994 final
// rule's table (59 FR, 6 July 1994, "Tables to §393.102(b)(6)"), which the 2002 §393.108 tables
// carried over (every row it shares with JJK-108 is identical); also 1/4 of the published
// 6 x 19 fibre-core breaking strengths, 64,400 lb and 83,600 lb (shared reference §1.4).
const WIRE_ROPE = [
  [7, "1/4", 640, 1400, "verified"],
  [8, "5/16", 950, 2100, "verified"],
  [10, "3/8", 1360, 3000, "verified"],
  [11, "7/16", 1860, 4100, "verified"],
  [13, "1/2", 2400, 5300, "verified"],
  [16, "5/8", 3770, 8300, "verified"],
  [20, "3/4", 4940, 10900, "verified"],
  [22, "7/8", 7300, 16100, "verified"], // 1994 final rule's table (an earlier from-memory 7,140 kg / 15,700 lb was wrong)
  [25, "1", 9480, 20900, "verified"], // 1994 final rule's table (an earlier from-memory 9,390 kg / 20,700 lb was wrong)
] as const;

describe("49 CFR 393.108, wire rope (6 x 37, fiber core) table (verified)", () => {
  it.each(WIRE_ROPE)("%i mm (%s in): %i kg (%i lb), %s", (mm, inch, kg, lb, status) => {
    expect(defaultRating({ material: "wire-rope", size: `${inch} in` })).toMatchObject({ wllKg: kg, wllLb: lb, status, source: "49 CFR 393.108, wire rope (6 x 37, fiber core) table" });
    expect(defaultRating({ material: "wire-rope", size: `${mm} mm` })).toMatchObject({ wllKg: kg, wllLb: lb });
  });
  it("has exactly these rows, and the table as a whole is verified", () => {
    expect(WIRE_ROPE_TABLE.rows.map((r) => [r.mm, r.label, r.kg, r.lb, r.status])).toEqual(WIRE_ROPE.map((r) => [...r]));
    expect(WIRE_ROPE_TABLE.status).toBe("verified");
  });
  it("7/8 in and 1 in are one quarter of the 6 x 19 fibre-core breaking strengths (64,400 and 83,600 lb)", () => {
    expect(defaultRating({ material: "wire-rope", size: "7/8" }).wllLb).toBe(64400 / 4);
    expect(defaultRating({ material: "wire-rope", size: "1 in" }).wllLb).toBe(83600 / 4);
  });
});

// 49 CFR 393.108, rope tables. Sizes mm (in): 10 (3/8), 11 (7/16), 13 (1/2), 16 (5/8), 20 (3/4), 25 (1);
// the 1/2 in row is 13 mm (1994 final rule's table and the New York State cargo manual's copy).
// Manila, polypropylene, polyester, nylon: verified against the 1994 final rule's table (manila
// also in the New York State cargo manual's copy; the nylon lb figures for 3/8-3/4 in also agree
// with a rope maker's 3-strand nylon table). Double braided nylon: FROM MEMORY, not verified
// against the primary text (not found in any source read).
const ROPE_SIZES = [[10, "3/8"], [11, "7/16"], [13, "1/2"], [16, "5/8"], [20, "3/4"], [25, "1"]] as const;
type Fibre = "manila" | "polypropylene" | "polyester" | "nylon" | "double-braided-nylon";
const ROPES: ReadonlyArray<readonly [fibre: Fibre, source: string, status: "verified" | "from-memory", cells: readonly Cell[]]> = [
  // 49 CFR 393.108, manila rope table: verified (1994 final rule's table; NY State cargo manual copy).
  ["manila", "49 CFR 393.108, manila rope table", "verified", [[90, 205], [120, 265], [150, 315], [210, 465], [290, 640], [480, 1050]]],
  // 49 CFR 393.108, polypropylene fiber rope table: verified (1994 final rule's table).
  ["polypropylene", "49 CFR 393.108, polypropylene fiber rope table", "verified", [[180, 400], [240, 525], [280, 625], [420, 925], [580, 1275], [950, 2100]]],
  // 49 CFR 393.108, polyester fiber rope table: verified (1994 final rule's table).
  ["polyester", "49 CFR 393.108, polyester fiber rope table", "verified", [[250, 555], [340, 750], [440, 960], [680, 1500], [850, 1880], [1500, 3300]]],
  // 49 CFR 393.108, nylon rope table: verified (1994 final rule's table, "Nylon Rope").
  ["nylon", "49 CFR 393.108, nylon rope table", "verified", [[130, 278], [190, 410], [240, 525], [420, 935], [640, 1420], [1140, 2520]]],
  // 49 CFR 393.108, double braided nylon rope table: FROM MEMORY, not verified against the primary text.
  ["double-braided-nylon", "49 CFR 393.108, double braided nylon rope table", "from-memory", [[150, 336], [230, 502], [300, 655], [510, 1130], [830, 1840], [1470, 3250]]],
];

describe("49 CFR 393.108, rope tables", () => {
  for (const [fibre, source, status, cells] of ROPES) {
    ROPE_SIZES.forEach(([mm, inch], i) => {
      const [kg, lb] = cells[i]!;
      it(`${fibre}, ${mm} mm (${inch} in): ${kg} kg (${lb} lb), ${status}`, () => {
        expect(defaultRating({ material: "rope", fibre, size: `${inch} in` })).toMatchObject({ wllKg: kg, wllLb: lb, source, status, fibre, basis: "table" });
        expect(defaultRating({ material: "rope", fibre, size: `${mm} mm` })).toMatchObject({ wllKg: kg, wllLb: lb });
      });
    });
    it(`${fibre}: exactly these rows, table ${status}`, () => {
      expect(ROPE_TABLES[fibre].rows.map((r) => [r.mm, r.label, r.kg, r.lb, r.status])).toEqual(ROPE_SIZES.map(([mm, inch], i) => [mm, inch, ...cells[i]!, status]));
      expect(ROPE_TABLES[fibre].status).toBe(status);
    });
  }
  it("13 mm finds the 1/2 in rope row; 12 mm is not a row and names the nearest (1994 final rule's table)", () => {
    expect(defaultRating({ material: "rope", fibre: "nylon", size: "13 mm" })).toMatchObject({ wllLb: 525, wllKg: 240, row: "13 (1/2)", size: "1/2 in" });
    expect(() => defaultRating({ material: "rope", fibre: "nylon", size: "12 mm" })).toThrowError(
      "Size 12 mm is not in the 49 CFR 393.108 nylon rope table; nearest: 11 mm (7/16 in), 13 mm (1/2 in)",
    );
  });
});

// 49 CFR 393.108, steel strapping table. [width mm, thickness mm, width in, thickness in, kg, lb, status]
// Row 1: verified (secondary copies). Rows 2-8: FROM MEMORY, not verified against the primary text.
const STRAPPING = [
  [31.7, 0.74, "1 1/4", "0.029", 540, 1190, "verified"],
  [31.7, 0.79, "1 1/4", "0.031", 540, 1190, "from-memory"],
  [31.7, 0.89, "1 1/4", "0.035", 540, 1190, "from-memory"],
  [31.7, 1.12, "1 1/4", "0.044", 770, 1690, "from-memory"],
  [31.7, 1.27, "1 1/4", "0.050", 770, 1690, "from-memory"],
  [31.7, 1.47, "1 1/4", "0.057", 870, 1925, "from-memory"],
  [50.8, 1.12, "2", "0.044", 1200, 2650, "from-memory"],
  [50.8, 1.27, "2", "0.050", 1200, 2650, "from-memory"],
] as const;

describe("49 CFR 393.108, steel strapping table", () => {
  it.each(STRAPPING)("%f x %f mm (%s x %s in): %i kg (%i lb), %s", (wmm, tmm, win, tin, kg, lb, status) => {
    expect(defaultRating({ material: "steel-strapping", width: `${win} in`, thickness: `${tin} in` })).toMatchObject({ wllKg: kg, wllLb: lb, status, source: "49 CFR 393.108, steel strapping table" });
    expect(defaultRating({ material: "steel-strapping", width: `${wmm} mm`, thickness: `${tmm} mm` })).toMatchObject({ wllKg: kg, wllLb: lb });
  });
  it("has exactly these rows", () => {
    expect(STEEL_STRAPPING_TABLE.rows.map((r) => [r.width.mm, r.thickness.mm, r.width.label, r.thickness.label, r.kg, r.lb, r.status])).toEqual(STRAPPING.map((r) => [...r]));
  });
  it("2 in x 0.029 is not a row", () => {
    expect(() => defaultRating({ material: "steel-strapping", width: "2", thickness: "0.029" })).toThrowError(
      "Thickness 0.029 in is not in the 49 CFR 393.108 steel strapping table for 2 in width; nearest: 0.044 in",
    );
  });
});

describe("tables are read-only", () => {
  it("cannot be changed at run time", () => {
    expect(Object.isFrozen(CHAIN_TABLE.rows[0]!.grades)).toBe(true);
    expect(() => {
      (CHAIN_TABLE.rows[0]!.grades as Record<number, unknown>)[70] = { lb: 1, kg: 1 };
    }).toThrowError(TypeError);
  });
});
