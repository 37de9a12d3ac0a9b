// Reading one cell of a supplier's spreadsheet as the trade writes it. Each reader returns
// the value in the shape lib/stock/schemas.ts reads, or a message a person can act on; the
// item schema then applies the same rules as the add-item form.
import type { ItemKind } from "@/lib/stock/labels";
import { normaliseTagCode } from "@/lib/tags/code";

export type Read<T> = { value: T } | { error: string };

const words = (s: string) => s.toLowerCase().replace(/[-_/.,]+/g, " ").replace(/\s+/g, " ").trim();

/**
 * A spreadsheet cell as exported with a leading quote that stops a formula (see
 * lib/import/csv-write.ts) reads back as the value itself.
 * @example unneutralise("'-A12") // "-A12"
 */
export function unneutralise(cell: string): string {
  return cell.startsWith("'") && /^'[=+\-@\t\r]/.test(cell) ? cell.slice(1) : cell;
}

const KIND_WORDS: [ItemKind, string[], ("ratchet" | "lever")?][] = [
  ["binder", ["ratchet binder", "ratchet load binder", "ratchet chain binder", "ratchet binders"], "ratchet"],
  ["binder", ["lever binder", "lever load binder", "lever chain binder", "snap binder", "lever binders"], "lever"],
  ["binder", ["binder", "binders", "chain binder", "chain binders", "load binder", "load binders"]],
  ["chain", ["chain", "chains", "transport chain", "binder chain", "tiedown chain", "tie down chain", "alloy chain", "proof coil", "proof coil chain", "high test chain"]],
  ["web-strap", ["strap", "straps", "web strap", "web straps", "webbing", "webbing strap", "ratchet strap", "ratchet straps", "winch strap", "winch straps", "tiedown strap", "tie down strap"]],
  ["wire-rope", ["wire rope", "wire ropes", "cable", "wire rope tiedown"]],
  ["hook", ["hook", "hooks", "grab hook", "clevis hook", "clevis grab hook", "slip hook", "eye hook"]],
  ["shackle", ["shackle", "shackles", "anchor shackle", "bow shackle", "d shackle", "chain shackle", "screw pin shackle"]],
  ["rated-item", ["rated item", "other rated item", "other", "rated items"]],
];

/**
 * The kind of an item in plain words; "ratchet binder" and "lever binder" also say the mechanism.
 * @example readKind("Ratchet binder") // { value: { kind: "binder", mechanism: "ratchet" } }
 */
export function readKind(cell: string): Read<{ kind: ItemKind; mechanism?: "ratchet" | "lever" }> {
  const w = words(cell);
  for (const [kind, names, mechanism] of KIND_WORDS) {
    if (names.includes(w)) return { value: mechanism ? { kind, mechanism } : { kind } };
  }
  return { error: `"${cell}" is not a kind Linkyard knows. Write chain, ratchet binder, lever binder, web strap, wire rope, hook, shackle or rated item.` };
}

/** @example readMarking("WLL marked") // { value: "wll" } */
export function readMarking(cell: string): Read<"wll" | "grade" | "none"> {
  const w = words(cell);
  if (["wll", "wll marked", "marked wll", "wll only", "wll tag", "tag"].includes(w)) return { value: "wll" };
  if (["grade", "grade only", "grade marked", "grade mark"].includes(w)) return { value: "grade" };
  if (["none", "nothing", "no", "unmarked", "not marked", "no marking", "nothing legible", "illegible"].includes(w)) return { value: "none" };
  return { error: `"${cell}" is not a marking: write wll (the WLL is marked), grade (only the grade is marked) or none.` };
}

/** @example readMechanism("Lever") // { value: "lever" } */
export function readMechanism(cell: string): Read<"ratchet" | "lever"> {
  const w = words(cell).replace(/ binder$/, "");
  if (w === "ratchet") return { value: "ratchet" };
  if (w === "lever" || w === "snap") return { value: "lever" };
  return { error: `"${cell}" is not a binder type: write ratchet or lever.` };
}

/** A grade as stamped ("G70", "grade 70", "7"): the schema reads the number. */
export function readGrade(cell: string): Read<string> {
  return { value: cell.trim().replace(/^(grade|gr\.?|g)\s*-\s*/i, "$1") };
}

/**
 * A number as spreadsheets write it: "5,400", "5 400", "2,5" (decimal comma), "$119.00";
 * undefined when the cell is not a number. (The securement form's readNumber, in
 * lib/forms/securement-draft.ts, reads typed input instead: blank is undefined, junk null.)
 * @example readCellNumber("1,234.50") // 1234.5
 */
export function readCellNumber(text: string): number | undefined {
  const t = text.trim().replace(/^\$\s*/, "").replace(/(?<=\d)[\s\u00a0\u202f](?=\d{3}\b)/g, "");
  if (/^[+-]?\d{1,3}(,\d{3})+(\.\d+)?$/.test(t)) return Number(t.replace(/,/g, ""));
  if (/^[+-]?\d+,\d+$/.test(t)) return Number(t.replace(",", "."));
  if (/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t)) return Number(t);
  return undefined;
}

/** A number followed by an optional unit word, e.g. "5400 lb", "2,450kg", "20'". */
function numberAndUnit(cell: string): { number?: number; unit: string } {
  const m = /^(.*?\d\.?)\s*([a-zA-Z"'#]*\.?)$/.exec(cell.trim());
  if (!m) return { unit: "" };
  return { number: readCellNumber(m[1]), unit: m[2].toLowerCase().replace(/\.$/, "") };
}

const WEIGHT_UNIT: Record<string, "lb" | "kg"> = { lb: "lb", lbs: "lb", "#": "lb", pound: "lb", pounds: "lb", kg: "kg", kgs: "kg", kilo: "kg", kilos: "kg", kilogram: "kg", kilograms: "kg" };
const LENGTH_UNIT: Record<string, "ft" | "m" | "in" | "mm"> = { ft: "ft", feet: "ft", foot: "ft", "'": "ft", m: "m", metre: "m", metres: "m", meter: "m", meters: "m", in: "in", inch: "in", inches: "in", '"': "in", mm: "mm" };

/**
 * A marked WLL. The column's unit (from its header) applies to a bare number; a cell that
 * names another unit than its column is refused rather than guessed.
 * @example readWeight("2,450 kg", undefined) // { value: { value: 2450, unit: "kg" } }
 */
export function readWeight(cell: string, columnUnit: "lb" | "kg" | undefined): Read<{ value: number; unit: "lb" | "kg" }> {
  const { number, unit } = numberAndUnit(cell);
  if (number === undefined) return { error: `"${cell}" is not a number. Write the WLL as a number, e.g. 5400${columnUnit ? "" : " lb"}.` };
  if (!unit) {
    if (!columnUnit) return { error: `Say the unit of the WLL: write "${cell} lb" or "${cell} kg", or name the column "WLL (lb)" or "WLL (kg)".` };
    return { value: { value: number, unit: columnUnit } };
  }
  const u = WEIGHT_UNIT[unit];
  if (!u) return { error: `"${unit}" is not a unit Linkyard reads for a WLL: use lb or kg.` };
  if (columnUnit && u !== columnUnit) return { error: `This column holds ${columnUnit} (its header says so) but this value is in ${u}. Convert it to ${columnUnit}, or put it in a column of its own named "WLL (${u})".` };
  return { value: { value: number, unit: u } };
}

/** A length: as {@link readWeight}, in ft, m, in or mm. */
export function readLength(cell: string, columnUnit: "ft" | "m" | "in" | "mm" | undefined): Read<{ value: number; unit: "ft" | "m" | "in" | "mm" }> {
  const { number, unit } = numberAndUnit(cell);
  if (number === undefined) return { error: `"${cell}" is not a length. Write a number${columnUnit ? ` of ${columnUnit}` : ' with its unit, e.g. "20 ft" or "6 m"'}.` };
  if (!unit) {
    if (!columnUnit) return { error: `Say the unit of the length: write "${cell} ft" or "${cell} m", or name the column "Length (ft)" or "Length (m)".` };
    return { value: { value: number, unit: columnUnit } };
  }
  const u = LENGTH_UNIT[unit];
  if (!u) return { error: `"${unit}" is not a unit Linkyard reads for a length: use ft or m.` };
  if (columnUnit && u !== columnUnit) return { error: `This column holds ${columnUnit} (its header says so) but this value is in ${u}. Convert it to ${columnUnit}, or put it in a column of its own named "Length (${u})".` };
  return { value: { value: number, unit: u } };
}

/**
 * A size as the trade writes it (3/8, 3/8", 3/8 in, 10 mm): passed on for the schema to read;
 * a bare number in a column whose header says mm is read as mm.
 */
export function readSize(cell: string, columnUnit: "in" | "mm" | undefined): Read<string> {
  const t = cell.trim().replace(/\s*(inch|inches)$/i, " in");
  const bare = /^[\d\s./-]+$/.test(t);
  const saysMm = /mm$/i.test(t);
  const saysIn = /(in|"|″)$/i.test(t);
  if (columnUnit === "mm" && saysIn) return { error: `This column holds mm (its header says so) but "${cell}" is in inches. Write the size in mm, or put it in a column of its own.` };
  if (columnUnit === "in" && saysMm) return { error: `This column holds inches (its header says so) but "${cell}" is in mm. Write the size in inches, or put it in a column of its own.` };
  return { value: columnUnit === "mm" && bare ? `${t} mm` : t };
}

/**
 * The chain sizes a binder takes: "5/16-3/8", "5/16 to 3/8", "8-10 mm"; one size means only that size.
 * @example readChainRange("5/16-3/8", undefined) // { value: ["5/16", "3/8"] }
 */
export function readChainRange(cell: string, columnUnit: "in" | "mm" | undefined): Read<[string, string]> {
  const t = cell.trim();
  let sizes = t.split(/\s*(?:\bto\b|–|—)\s*/i).filter(Boolean);
  if (sizes.length === 1) {
    const dash = t.split(/\s*-\s*/);
    // "1-3/4" is one size (a whole number and a fraction); "5/16-3/8" and "8-10 mm" are two
    const mixedNumber = dash.length === 2 && /^\d+$/.test(dash[0]) && /^\d+\/\d+$/.test(dash[1]);
    if (dash.length === 2 && !mixedNumber) sizes = dash;
    else if (dash.length > 2) sizes = [];
  }
  if (sizes.length === 1) sizes = [sizes[0], sizes[0]];
  if (sizes.length !== 2 || sizes.some((s) => !s)) {
    return { error: `"${cell}" is not a range of chain sizes: write the smallest and largest, e.g. 5/16-3/8.` };
  }
  // "8-10 mm": the unit after the second size is the unit of both
  if (/mm$/i.test(sizes[1]) && /^[\d./\s]+$/.test(sizes[0])) sizes[0] = `${sizes[0]} mm`;
  const out = sizes.map((s) => readSize(s, columnUnit));
  const failed = out.find((r) => "error" in r);
  if (failed) return failed as { error: string };
  return { value: [(out[0] as { value: string }).value, (out[1] as { value: string }).value] };
}

/**
 * A date: YYYY-MM-DD (a time after it is dropped), or M/D/YYYY as US spreadsheets write it.
 * @example readDate("3/14/2026") // { value: "2026-03-14" }
 */
export function readDate(cell: string): Read<string> {
  const t = cell.trim();
  let m = /^(\d{4})[-/.](\d{1,2})[-/.](\d{1,2})(?:[ T]\d{1,2}:\d{2}(?::\d{2}(?:\.\d+)?)?Z?)?$/.exec(t);
  let y: number, mo: number, d: number;
  if (m) [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  else if ((m = /^(\d{1,2})\/(\d{1,2})\/(\d{4})$/.exec(t))) [mo, d, y] = [Number(m[1]), Number(m[2]), Number(m[3])];
  else return { error: `"${cell}" is not a date Linkyard reads: write it as YYYY-MM-DD (2026-03-14) or M/D/YYYY (3/14/2026).` };
  const date = new Date(Date.UTC(y, mo - 1, d));
  if (date.getUTCFullYear() !== y || date.getUTCMonth() !== mo - 1 || date.getUTCDate() !== d) {
    return { error: `"${cell}" is not a date in the calendar${mo > 12 && d <= 12 ? " (dates like 3/14/2026 are month/day/year)" : ""}.` };
  }
  return { value: date.toISOString().slice(0, 10) };
}

/**
 * A cost in dollars to whole cents: "$119.00", "1,234.5".
 * @example readCost("$1,234.50") // { value: 123450 }
 */
export function readCost(cell: string): Read<number> {
  const n = readCellNumber(cell);
  if (n === undefined) return { error: `"${cell}" is not an amount: write the cost in dollars, e.g. 119.00.` };
  return { value: Math.round(n * 100) };
}

/** The most items one row may make (a typing slip of "2000" for "20" should not make 2,000 tags). */
export const MAX_QUANTITY = 500;

/**
 * How many items a row makes: a whole number from 1 to {@link MAX_QUANTITY} ("12", "12 pcs", "x12").
 * @example readQuantity("12 pcs") // { value: 12 }
 * @example readQuantity("2.5") // { error: '"2.5" is not a number of items: …' }
 */
export function readQuantity(cell: string): Read<number> {
  const m = /^\s*x?\s*(\d{1,6})\s*(x|pcs?|pieces?|ea|each|items?)?\.?\s*$/i.exec(cell);
  const n = m ? Number(m[1]) : NaN;
  if (!Number.isInteger(n) || n < 1 || n > MAX_QUANTITY) {
    return { error: `"${cell}" is not a number of items: write a whole number from 1 to ${MAX_QUANTITY}; the row then makes that many items, each with its own tag.` };
  }
  return { value: n };
}

/**
 * The serials of the items a row with a quantity makes: the row's serial with a suffix of
 * two digits or more ("-01" … "-12"; "-001" from 100 items), so that each item keeps a serial
 * of its own and the batch stays recognisable. No serial, no serials.
 * @example quantitySerials("BR-2026", 3) // ["BR-2026-01", "BR-2026-02", "BR-2026-03"]
 */
export function quantitySerials(serial: string | undefined, quantity: number): (string | undefined)[] {
  if (!serial) return Array.from({ length: quantity }, () => undefined);
  const width = Math.max(2, String(quantity).length);
  return Array.from({ length: quantity }, (_, i) => `${serial}-${String(i + 1).padStart(width, "0")}`);
}

/** @example readTagCode("k7xm 3hqa") // { value: "K7XM-3HQA" } */
export function readTagCode(cell: string): Read<string> {
  const code = normaliseTagCode(cell);
  return code ? { value: code } : { error: `"${cell}" is not a Linkyard tag code (they look like K7XM-3HQA). Leave the tag code empty for new items.` };
}

/**
 * A yard by its name, as the organisation spells it (case and spaces do not matter).
 * @example readYard("home  YARD", [{ id: "y1", name: "Home yard" }]) // { value: "y1" }
 */
export function readYard(cell: string, yards: readonly { id: string; name: string }[]): Read<string> {
  const key = words(cell);
  const yard = yards.find((y) => words(y.name) === key);
  if (yard) return { value: yard.id };
  const names = yards.map((y) => y.name);
  return {
    error: names.length
      ? `There is no yard called "${cell}". Your yards: ${names.slice(0, 8).join(", ")}${names.length > 8 ? ", …" : ""}.`
      : `There is no yard called "${cell}": your organisation has no yards yet. Leave the yard empty.`,
  };
}
