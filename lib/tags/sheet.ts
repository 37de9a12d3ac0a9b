// Printable tag sheets: where each label sits on a US Letter sheet of die-cut weatherproof
// labels. Pure geometry, in inches (the sheets are sold by inch sizes) with millimetres
// alongside. The two layouts are common sheet formats, named by their dimensions; the
// margins and pitches below are the usual die-cut positions for these formats, from memory:
// print one sheet on plain paper and hold it against a label sheet before a big run.

import { MM_PER_IN } from "@/lib/securement/units";

export const LETTER = { widthIn: 8.5, heightIn: 11 } as const;

export interface SheetLayout {
  id: string;
  /** What a person picks from: the label size and how many fit on a sheet. */
  name: string;
  labelWidthIn: number;
  labelHeightIn: number;
  columns: number;
  rows: number;
  /** From the sheet's top-left corner to the first label's top-left corner. */
  marginTopIn: number;
  marginLeftIn: number;
  /** From one label's left (top) edge to the next one's: label size plus the gap. */
  pitchXIn: number;
  pitchYIn: number;
  cornerRadiusIn: number;
}

export const SHEET_LAYOUTS: readonly SheetLayout[] = [
  {
    id: "small-30",
    name: "2⅝ in × 1 in, 30 per sheet",
    labelWidthIn: 2.625,
    labelHeightIn: 1,
    columns: 3,
    rows: 10,
    marginTopIn: 0.5,
    marginLeftIn: 0.1875,
    pitchXIn: 2.75,
    pitchYIn: 1,
    cornerRadiusIn: 0.0625,
  },
  {
    id: "large-10",
    name: "4 in × 2 in, 10 per sheet",
    labelWidthIn: 4,
    labelHeightIn: 2,
    columns: 2,
    rows: 5,
    marginTopIn: 0.5,
    marginLeftIn: 0.15625,
    pitchXIn: 4.1875,
    pitchYIn: 2,
    cornerRadiusIn: 0.125,
  },
];

export const DEFAULT_LAYOUT_ID = "large-10";

/**
 * A layout by id; an unknown or missing id gives the default layout.
 * @example sheetLayout("small-30").columns // 3
 */
export function sheetLayout(id?: string | null): SheetLayout {
  return SHEET_LAYOUTS.find((l) => l.id === id) ?? SHEET_LAYOUTS.find((l) => l.id === DEFAULT_LAYOUT_ID)!;
}

/**
 * Labels on one sheet.
 * @example labelsPerSheet(sheetLayout("large-10")) // 10
 */
export function labelsPerSheet(layout: SheetLayout): number {
  return layout.columns * layout.rows;
}

export interface CellBox {
  /** 0-based position on the sheet, row by row from the top left. */
  position: number;
  row: number;
  column: number;
  xIn: number;
  yIn: number;
  widthIn: number;
  heightIn: number;
  xMm: number;
  yMm: number;
  widthMm: number;
  heightMm: number;
}

const mm = (inches: number) => Math.round(inches * MM_PER_IN * 100) / 100;

/**
 * Where the label at a position sits on its sheet.
 * @example cellBox(sheetLayout("small-30"), 4) // { row: 1, column: 1, xIn: 2.9375, yIn: 1.5, … }
 */
export function cellBox(layout: SheetLayout, position: number): CellBox {
  if (!Number.isInteger(position) || position < 0 || position >= labelsPerSheet(layout)) {
    throw new RangeError(`Position ${position} is not on a ${layout.name} sheet.`);
  }
  const row = Math.floor(position / layout.columns);
  const column = position % layout.columns;
  const xIn = layout.marginLeftIn + column * layout.pitchXIn;
  const yIn = layout.marginTopIn + row * layout.pitchYIn;
  return {
    position,
    row,
    column,
    xIn,
    yIn,
    widthIn: layout.labelWidthIn,
    heightIn: layout.labelHeightIn,
    xMm: mm(xIn),
    yMm: mm(yIn),
    widthMm: mm(layout.labelWidthIn),
    heightMm: mm(layout.labelHeightIn),
  };
}

export interface SheetCell<T> extends CellBox {
  item: T;
}

export interface SheetPage<T> {
  /** 1-based, as printed. */
  number: number;
  cells: SheetCell<T>[];
}

/**
 * Lays items out on sheets, row by row. `skip` leaves the first labels of the first sheet
 * blank, for a sheet that was partly used before.
 * @example layoutSheets(["a", "b", "c"], sheetLayout("large-10"), { skip: 8 }).map((p) => p.cells.length) // [2, 1]
 */
export function layoutSheets<T>(items: readonly T[], layout: SheetLayout, options: { skip?: number } = {}): SheetPage<T>[] {
  const per = labelsPerSheet(layout);
  const skip = clampSkip(options.skip ?? 0, layout);
  const pages: SheetPage<T>[] = [];
  items.forEach((item, i) => {
    const slot = skip + i;
    const pageIndex = Math.floor(slot / per);
    pages[pageIndex] ??= { number: pageIndex + 1, cells: [] };
    pages[pageIndex].cells.push({ ...cellBox(layout, slot % per), item });
  });
  return pages;
}

/**
 * A "start at label" value kept on the sheet: a whole number from 0 to one less than a sheet.
 * @example clampSkip(45, sheetLayout("small-30")) // 29
 */
export function clampSkip(skip: number, layout: SheetLayout): number {
  if (!Number.isFinite(skip)) return 0;
  return Math.min(Math.max(0, Math.trunc(skip)), labelsPerSheet(layout) - 1);
}

/** Most items on one tag sheet request: 10 sheets of the small labels. */
export const MAX_SHEET_ITEMS = 300;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Item ids from the sheet's query string (`?ids=a,b,c`, or `ids` repeated by a form):
 * only well-formed ids, each once, in the order given, at most MAX_SHEET_ITEMS.
 * `truncated` says that some were left off.
 * @example parseSheetIds("not-an-id,0b3c…").ids // ["0b3c…"]
 */
export function parseSheetIds(value: string | string[] | undefined | null): { ids: string[]; truncated: boolean } {
  const parts = (Array.isArray(value) ? value : value ? [value] : []).flatMap((v) => v.split(","));
  const seen = new Set<string>();
  for (const part of parts) {
    const id = part.trim().toLowerCase();
    if (UUID.test(id)) seen.add(id);
  }
  const all = [...seen];
  return { ids: all.slice(0, MAX_SHEET_ITEMS), truncated: all.length > MAX_SHEET_ITEMS };
}
