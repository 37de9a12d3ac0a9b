/**
 * Reading sizes (chain and rope diameters, webbing and strapping widths, strapping
 * thickness) as the trade writes them, and matching them to rows of a 49 CFR 393.108 table.
 *
 * Accepted forms: `3/8`, `3/8 in`, `3/8"`, `3/8in`, `0.375`, `1 3/4`, `1-3/4 in`, `1¾`,
 * `2 in`, `10 mm`, `10mm`, `31.7 mm`, and a plain number (`50`), which means inches.
 *
 * Matching never guesses: an inch size matches the row with the same inch value; a metric
 * size matches the row whose published mm column has the same number (the tables print
 * "10 (3/8)": 10 mm matches the 3/8 in row although 3/8 in is 9.525 mm). Anything else is a
 * {@link RatingError} `SIZE_NOT_IN_TABLE` naming the nearest rows.
 *
 * @module
 */
import { boundedMemo, shortKey } from "../memo";
import { RatingError } from "./errors";
import { MM_PER_IN } from "./units";

/**
 * A size as received: a string in the trade's notation, or a number of inches.
 *
 * @example
 * const a: SizeInput = "3/8 in";
 * const b: SizeInput = 0.375;
 */
export type SizeInput = string | number;

/**
 * A size that was read successfully.
 *
 * - `system`: `"inch"` when given in inches (or as a bare number), `"metric"` when in mm.
 * - `inches`, `mm`: the value in both units (one of them converted, exact factor MM_PER_IN).
 * - `label`: canonical label: a reduced fraction for inch sizes ("3/8", "1 3/4", "2"), a
 *   decimal when the value is not a whole number of 64ths ("0.029"), or "10 mm" for metric.
 * - `display`: the label with its unit ("3/8 in", "10 mm").
 *
 * @example
 * const s: ParsedSize = parseSize("1-3/4 in");
 * // { input: "1-3/4 in", system: "inch", inches: 1.75, mm: 44.45 (float), label: "1 3/4", display: "1 3/4 in" }
 */
export interface ParsedSize {
  readonly input: string;
  readonly system: "inch" | "metric";
  readonly inches: number;
  readonly mm: number;
  readonly label: string;
  readonly display: string;
}

/**
 * A table row that has a size: its inch label, inch value and published mm figure.
 *
 * @example
 * const row: SizedRow = { label: "3/8", inches: 0.375, mm: 10 };
 */
export interface SizedRow {
  readonly label: string;
  readonly inches: number;
  readonly mm: number;
}

const VULGAR: Readonly<Record<string, string>> = {
  "¼": "1/4",
  "½": "1/2",
  "¾": "3/4",
  "⅛": "1/8",
  "⅜": "3/8",
  "⅝": "5/8",
  "⅞": "7/8",
  "⅙": "1/6",
  "⅓": "1/3",
  "⅔": "2/3",
  "⅕": "1/5",
};

const NUMBER_PART = String.raw`(?:(\d+)[\s-]+(\d+)\s*\/\s*(\d+)|(\d+)\s*\/\s*(\d+)|(\d+(?:\.\d*)?|\.\d+))`;
const UNIT_PART = String.raw`(in|inch|inches|"|''|mm|millimet(?:er|re)s?)?`;
const SIZE_RE = new RegExp(String.raw`^${NUMBER_PART}\s*${UNIT_PART}$`);

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

function fractionLabel(numerator: number, denominator: number): string {
  const g = gcd(numerator, denominator);
  const n = numerator / g;
  const d = denominator / g;
  const whole = Math.floor(n / d);
  const rest = n - whole * d;
  if (rest === 0) return String(whole);
  return whole === 0 ? `${rest}/${d}` : `${whole} ${rest}/${d}`;
}

function decimalLabel(value: number): string {
  // Up to 4 decimals (strapping thickness is written to 3), trailing zeros dropped.
  return String(Number(value.toFixed(4)));
}

/**
 * The canonical label of an inch value: a reduced fraction when the value is a whole
 * number of 64ths, else a decimal.
 *
 * @example
 * inchLabel(0.375); // "3/8"
 * inchLabel(1.75);  // "1 3/4"
 * inchLabel(0.029); // "0.029"
 */
export function inchLabel(inches: number): string {
  const sixtyFourths = inches * 64;
  const rounded = Math.round(sixtyFourths);
  if (Math.abs(sixtyFourths - rounded) < 1e-9 && rounded > 0) return fractionLabel(rounded, 64);
  return decimalLabel(inches);
}

function invalid(input: string): RatingError {
  return new RatingError(
    "INVALID_SIZE",
    `Cannot read the size "${input}"; write it as 3/8, 3/8 in, 1 3/4 in, 0.375 or 10 mm`,
    { field: "size" },
  );
}

/** Reads a size, or returns `null` when it cannot be read (never throws, for a string or a number). */
function readSize(input: SizeInput): ParsedSize | null {
  if (typeof input === "number") {
    if (!Number.isFinite(input) || input <= 0) return null;
    const label = inchLabel(input);
    return { input: String(input), system: "inch", inches: input, mm: input * MM_PER_IN, label, display: `${label} in` };
  }
  const original = input.trim();
  let text = original.toLowerCase().replace(/[″“”]/g, '"').replace(/[′’]/g, "'");
  // "1¾" -> "1 3/4", "⅜" -> "3/8"
  text = text.replace(/(\d?)\s*([¼½¾⅛⅜⅝⅞⅙⅓⅔⅕])/g, (_m, whole: string, frac: string) =>
    whole ? `${whole} ${VULGAR[frac]}` : (VULGAR[frac] ?? frac),
  );
  text = text.replace(/\s+/g, " ").trim();
  const m = SIZE_RE.exec(text);
  if (!m) return null;
  const [, mixedWhole, mixedNum, mixedDen, fracNum, fracDen, decimal, unitRaw] = m;
  const metric = unitRaw !== undefined && unitRaw.startsWith("m");

  let value: number;
  let label: string | undefined;
  if (mixedWhole !== undefined) {
    const whole = Number(mixedWhole);
    const n = Number(mixedNum);
    const d = Number(mixedDen);
    if (d === 0 || n >= d) return null;
    value = whole + n / d;
    label = fractionLabel(whole * d + n, d);
  } else if (fracNum !== undefined) {
    const n = Number(fracNum);
    const d = Number(fracDen);
    if (d === 0) return null;
    value = n / d;
    label = n === 0 ? undefined : fractionLabel(n, d);
  } else {
    value = Number(decimal);
  }
  if (!Number.isFinite(value) || value <= 0) return null;

  if (metric) {
    const mmLabel = `${decimalLabel(value)} mm`;
    return { input: original, system: "metric", inches: value / MM_PER_IN, mm: value, label: mmLabel, display: mmLabel };
  }
  const inchText = label ?? inchLabel(value);
  return { input: original, system: "inch", inches: value, mm: value * MM_PER_IN, label: inchText, display: `${inchText} in` };
}

// The same few sizes ("3/8 in", "5/16 in") come back in every tiedown of every check, and
// reading one takes four regular expressions: each answer is kept, frozen so no caller can
// change it for the next. Only short texts and numbers are kept (a schema allows 40
// characters), and the whole cache is dropped when it is full, so odd input cannot grow it
// without bound. It holds nothing but what the text means: no state between requests.
const cachedSize = boundedMemo(
  (input: SizeInput): ParsedSize | null => {
    const size = readSize(input);
    return size === null ? null : Object.freeze(size);
  },
  { limit: 2000, key: (input: SizeInput) => shortKey(input, 64) },
);

/**
 * Reads a size. A number, or a string without a unit, means inches. The answer is frozen
 * (the same reading is shared by every caller that reads the same text).
 *
 * @throws {RatingError} `INVALID_SIZE` when the text cannot be read or the value is not above 0.
 * @example
 * parseSize("3/8\"").label;   // "3/8"
 * parseSize("10mm").display;  // "10 mm"
 * parseSize(50).display;      // "50 in"
 * parseSize("0.375").label;   // "3/8"
 */
export function parseSize(input: SizeInput): ParsedSize {
  const size = cachedSize(input);
  if (size === null) throw invalid(typeof input === "number" ? String(input) : input.trim());
  return size;
}

/**
 * Reads a size, or returns `undefined` when it cannot be read (or is not a string or a number).
 *
 * @example
 * tryParseSize("3/8");   // { ..., label: "3/8" }
 * tryParseSize("large"); // undefined
 */
export function tryParseSize(input: SizeInput): ParsedSize | undefined {
  if (typeof input !== "string" && typeof input !== "number") return undefined;
  return cachedSize(input) ?? undefined;
}

/**
 * How a table row is named in messages, in the system the user wrote the size in:
 * "1/2 in" for inch sizes, "13 mm (1/2 in)" for metric ones.
 *
 * @example
 * rowDisplay({ label: "1/2", inches: 0.5, mm: 13 }, "metric"); // "13 mm (1/2 in)"
 */
export function rowDisplay(row: SizedRow, system: ParsedSize["system"]): string {
  return system === "metric" ? `${decimalLabel(row.mm)} mm (${row.label} in)` : `${row.label} in`;
}

/**
 * Whether a parsed size is the size of a row: same inches for an inch size; same published
 * mm figure for a metric size.
 *
 * @example
 * sizeMatchesRow(parseSize("10 mm"), { label: "3/8", inches: 0.375, mm: 10 }); // true
 * sizeMatchesRow(parseSize("9.525 mm"), { label: "3/8", inches: 0.375, mm: 10 }); // false
 */
export function sizeMatchesRow(size: ParsedSize, row: SizedRow): boolean {
  return size.system === "metric"
    ? Math.abs(row.mm - size.mm) < 1e-6
    : Math.abs(row.inches - size.inches) < 1e-9;
}

/**
 * The rows just below and just above a size (one of them at the ends of the table), named
 * for messages.
 *
 * @example
 * nearestRows(parseSize("9/16"), rows); // ["1/2 in", "5/8 in"]
 */
export function nearestRows(size: ParsedSize, rows: readonly SizedRow[]): string[] {
  const key = (r: SizedRow): number => (size.system === "metric" ? r.mm : r.inches);
  const target = size.system === "metric" ? size.mm : size.inches;
  const sorted = [...rows].sort((a, b) => key(a) - key(b));
  const below = sorted.filter((r) => key(r) < target).at(-1);
  const above = sorted.find((r) => key(r) > target);
  return [below, above].filter((r): r is SizedRow => r !== undefined).map((r) => rowDisplay(r, size.system));
}

/**
 * Finds the row of a table for a size, or throws a {@link RatingError} naming the nearest rows.
 *
 * @param what - the word for the size in messages ("Size", "Width", "Thickness").
 * @param tableTitle - e.g. "49 CFR 393.108 chain table".
 * @throws {RatingError} `SIZE_NOT_IN_TABLE`.
 * @example
 * findRow(parseSize("9/16"), chainRows, "49 CFR 393.108 chain table");
 * // throws: Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in
 */
export function findRow<R extends SizedRow>(
  size: ParsedSize,
  rows: readonly R[],
  tableTitle: string,
  what = "Size",
  field = "size",
): R {
  const row = rows.find((r) => sizeMatchesRow(size, r));
  if (row) return row;
  const nearest = nearestRows(size, rows);
  let message = `${what} ${size.display} is not in the ${tableTitle}; nearest: ${nearest.join(", ")}`;
  // A bare number read as inches that would be a row in millimetres: say so.
  if (size.system === "inch" && !/[a-z"']/i.test(size.input)) {
    const asMm = rows.find((r) => Math.abs(r.mm - size.inches) < 1e-6);
    if (asMm) message += ` (a number without a unit means inches; for ${size.input} mm write "${size.input} mm")`;
  }
  throw new RatingError("SIZE_NOT_IN_TABLE", message, { nearest, field });
}
