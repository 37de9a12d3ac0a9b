import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  cellBox,
  clampSkip,
  DEFAULT_LAYOUT_ID,
  LETTER,
  labelsPerSheet,
  layoutSheets,
  MAX_SHEET_ITEMS,
  parseSheetIds,
  SHEET_LAYOUTS,
  sheetLayout,
} from "@/lib/tags/sheet";
import { MM_PER_IN } from "@/lib/securement/units";

const EPS = 1e-9;

describe("sheet layouts", () => {
  it("offer at least two label sizes, named by their dimensions", () => {
    expect(SHEET_LAYOUTS.length).toBeGreaterThanOrEqual(2);
    expect(sheetLayout("small-30").name).toBe("2⅝ in × 1 in, 30 per sheet");
    expect(sheetLayout("large-10").name).toBe("4 in × 2 in, 10 per sheet");
    expect(new Set(SHEET_LAYOUTS.map((l) => l.id)).size).toBe(SHEET_LAYOUTS.length);
  });

  it("hold the number of labels their name says", () => {
    expect(labelsPerSheet(sheetLayout("small-30"))).toBe(30);
    expect(labelsPerSheet(sheetLayout("large-10"))).toBe(10);
  });

  it("fall back to the default layout for an unknown id", () => {
    expect(sheetLayout("nope").id).toBe(DEFAULT_LAYOUT_ID);
    expect(sheetLayout(undefined).id).toBe(DEFAULT_LAYOUT_ID);
    expect(sheetLayout(null).id).toBe(DEFAULT_LAYOUT_ID);
  });

  for (const layout of SHEET_LAYOUTS) {
    describe(layout.name, () => {
      const cells = Array.from({ length: labelsPerSheet(layout) }, (_, i) => cellBox(layout, i));

      it("keeps every label on the US Letter page, with printer margins of at least 1/8 in", () => {
        for (const c of cells) {
          expect(c.xIn).toBeGreaterThanOrEqual(0.125 - EPS);
          expect(c.yIn).toBeGreaterThanOrEqual(0.125 - EPS);
          expect(c.xIn + c.widthIn).toBeLessThanOrEqual(LETTER.widthIn - 0.125 + EPS);
          expect(c.yIn + c.heightIn).toBeLessThanOrEqual(LETTER.heightIn - 0.125 + EPS);
        }
      });

      it("is centred on the sheet, left to right and top to bottom", () => {
        const right = LETTER.widthIn - Math.max(...cells.map((c) => c.xIn + c.widthIn));
        const bottom = LETTER.heightIn - Math.max(...cells.map((c) => c.yIn + c.heightIn));
        expect(right).toBeCloseTo(layout.marginLeftIn, 9);
        expect(bottom).toBeCloseTo(layout.marginTopIn, 9);
      });

      it("never overlaps two labels", () => {
        for (const a of cells)
          for (const b of cells) {
            if (a.position === b.position) continue;
            const apart =
              a.xIn + a.widthIn <= b.xIn + EPS || b.xIn + b.widthIn <= a.xIn + EPS ||
              a.yIn + a.heightIn <= b.yIn + EPS || b.yIn + b.heightIn <= a.yIn + EPS;
            expect(apart).toBe(true);
          }
      });

      it("fills row by row from the top left", () => {
        expect(cells[0]).toMatchObject({ row: 0, column: 0, xIn: layout.marginLeftIn, yIn: layout.marginTopIn });
        expect(cells[1]).toMatchObject({ row: 0, column: 1 });
        expect(cells[layout.columns]).toMatchObject({ row: 1, column: 0 });
        expect(cells.at(-1)).toMatchObject({ row: layout.rows - 1, column: layout.columns - 1 });
      });

      it("gives the same box in millimetres, to 0.01 mm", () => {
        const near = (mm: number, inches: number) => expect(Math.abs(mm - inches * MM_PER_IN)).toBeLessThanOrEqual(0.005 + EPS);
        for (const c of cells) {
          near(c.xMm, c.xIn);
          near(c.yMm, c.yIn);
          near(c.widthMm, layout.labelWidthIn);
          near(c.heightMm, layout.labelHeightIn);
        }
      });

      it("refuses a position off the sheet", () => {
        expect(() => cellBox(layout, -1)).toThrow(RangeError);
        expect(() => cellBox(layout, labelsPerSheet(layout))).toThrow(RangeError);
        expect(() => cellBox(layout, 1.5)).toThrow(RangeError);
      });
    });
  }

  it("puts a 2⅝ in × 1 in label where the sheet has it", () => {
    const layout = sheetLayout("small-30");
    expect(cellBox(layout, 4)).toEqual({
      position: 4, row: 1, column: 1,
      xIn: 2.9375, yIn: 1.5, widthIn: 2.625, heightIn: 1,
      xMm: 74.61, yMm: 38.1, widthMm: 66.68, heightMm: 25.4,
    });
  });

  it("puts a 4 in × 2 in label where the sheet has it", () => {
    const layout = sheetLayout("large-10");
    expect(cellBox(layout, 9)).toMatchObject({ row: 4, column: 1, xIn: 4.34375, yIn: 8.5, widthIn: 4, heightIn: 2 });
  });
});

describe("laying out items", () => {
  const large = sheetLayout("large-10");
  const small = sheetLayout("small-30");

  it("gives no pages for no items", () => {
    expect(layoutSheets([], large)).toEqual([]);
  });

  it("fills one sheet, then the next", () => {
    const items = Array.from({ length: 23 }, (_, i) => `item-${i}`);
    const pages = layoutSheets(items, large);
    expect(pages.map((p) => p.number)).toEqual([1, 2, 3]);
    expect(pages.map((p) => p.cells.length)).toEqual([10, 10, 3]);
    expect(pages[1].cells[0]).toMatchObject({ item: "item-10", position: 0, row: 0, column: 0 });
    expect(pages[2].cells[2]).toMatchObject({ item: "item-22", position: 2, row: 1, column: 0 });
  });

  it("exactly one full sheet is one page", () => {
    expect(layoutSheets(Array.from({ length: 30 }, (_, i) => i), small)).toHaveLength(1);
    expect(layoutSheets(Array.from({ length: 31 }, (_, i) => i), small)).toHaveLength(2);
  });

  it("skips used labels at the start of the first sheet", () => {
    const pages = layoutSheets(["a", "b", "c"], large, { skip: 8 });
    expect(pages.map((p) => p.cells.map((c) => [c.item, c.position]))).toEqual([[["a", 8], ["b", 9]], [["c", 0]]]);
  });

  it("keeps the skip on the sheet", () => {
    expect(clampSkip(-3, small)).toBe(0);
    expect(clampSkip(2.7, small)).toBe(2);
    expect(clampSkip(45, small)).toBe(29);
    expect(clampSkip(Number.NaN, small)).toBe(0);
  });

  it("places every item exactly once, in order, with no two on one spot (any count, any skip)", () => {
    fc.assert(
      fc.property(fc.nat(400), fc.integer({ min: -5, max: 40 }), fc.constantFrom(...SHEET_LAYOUTS), (n, skip, layout) => {
        const items = Array.from({ length: n }, (_, i) => i);
        const pages = layoutSheets(items, layout, { skip });
        const placed = pages.flatMap((p) => p.cells.map((c) => c.item));
        expect(placed).toEqual(items);
        const per = labelsPerSheet(layout);
        const s = clampSkip(skip, layout);
        expect(pages.length).toBe(n === 0 ? 0 : Math.ceil((n + s) / per));
        for (const p of pages) {
          expect(new Set(p.cells.map((c) => c.position)).size).toBe(p.cells.length);
          expect(p.cells.length).toBeLessThanOrEqual(per);
        }
      }),
    );
  });
});

describe("item ids in the sheet's address", () => {
  const a = "0b3c6a52-8d4e-4f7a-9c1d-2e5f6a7b8c9d";
  const b = "1c4d7b63-9e5f-4a8b-8d2e-3f6a7b8c9d0e";

  it("reads a comma separated list or a repeated parameter", () => {
    expect(parseSheetIds(`${a},${b}`)).toEqual({ ids: [a, b], truncated: false });
    expect(parseSheetIds([a, b])).toEqual({ ids: [a, b], truncated: false });
    expect(parseSheetIds([`${a}, ${b}`, a])).toEqual({ ids: [a, b], truncated: false });
  });

  it("drops what is not an id, so nothing odd reaches the database", () => {
    expect(parseSheetIds(`nope,${a},'; drop table items;--,${b.toUpperCase()}`).ids).toEqual([a, b]);
    expect(parseSheetIds(undefined).ids).toEqual([]);
    expect(parseSheetIds("").ids).toEqual([]);
  });

  it(`keeps at most ${MAX_SHEET_ITEMS}`, () => {
    const many = Array.from({ length: MAX_SHEET_ITEMS + 5 }, (_, i) => `00000000-0000-4000-8000-${String(i).padStart(12, "0")}`);
    const parsed = parseSheetIds(many.join(","));
    expect(parsed.ids).toHaveLength(MAX_SHEET_ITEMS);
    expect(parsed.ids[0]).toBe(many[0]);
    expect(parsed.truncated).toBe(true);
  });
});
