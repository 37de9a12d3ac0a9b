// The fields a CSV column can fill, and how a header is matched to one. Headers are matched
// on their words, with a unit in the header ("WLL (lb)", "Length m") deciding the unit of
// the column's bare numbers.

export const IMPORT_FIELDS = [
  "tagCode", "kind", "marking", "grade", "size", "sizeMm", "wll", "wllLb", "wllKg", "mechanism", "chainRange",
  "length", "lengthFt", "lengthM", "ends", "serial", "yard", "inServiceOn", "cost", "quantity",
] as const;
export type ImportField = (typeof IMPORT_FIELDS)[number];

/** A column's field, or null when the column is not imported. */
export type ColumnMapping = Record<string, ImportField | null>;

/** What each field is called on the mapping screen and in messages about a missing column. */
export const FIELD_LABELS: Record<ImportField, string> = {
  tagCode: "Tag code (finds the item to update)",
  kind: "Kind",
  marking: "Marking (wll, grade or none)",
  grade: "Grade",
  size: "Size or width (inches)",
  sizeMm: "Size or width (mm)",
  wll: "Marked WLL (unit in each cell)",
  wllLb: "Marked WLL (lb)",
  wllKg: "Marked WLL (kg)",
  mechanism: "Binder (ratchet or lever)",
  chainRange: "Takes chain (e.g. 5/16-3/8)",
  length: "Length (unit in each cell)",
  lengthFt: "Length (ft)",
  lengthM: "Length (m)",
  ends: "End fittings",
  serial: "Serial or lot",
  yard: "Yard",
  inServiceOn: "In service since (date)",
  cost: "Cost ($)",
  quantity: "Quantity (that many new items from the row)",
};

/** The column name the template uses for a field, named in errors when the file lacks it. */
export const FIELD_COLUMN: Record<ImportField, string> = {
  tagCode: "Tag code",
  kind: "Kind",
  marking: "Marking",
  grade: "Grade",
  size: "Size",
  sizeMm: "Size (mm)",
  wll: "WLL",
  wllLb: "WLL (lb)",
  wllKg: "WLL (kg)",
  mechanism: "Binder",
  chainRange: "Takes chain",
  length: "Length",
  lengthFt: "Length (ft)",
  lengthM: "Length (m)",
  ends: "End fittings",
  serial: "Serial/Lot",
  yard: "Yard",
  inServiceOn: "In service",
  cost: "Cost",
  quantity: "Quantity",
};

/** Fields that fill the same value: a file may have one column for each group. */
export const FIELD_GROUP: Record<ImportField, string> = {
  tagCode: "tagCode", kind: "kind", marking: "marking", grade: "grade", size: "size", sizeMm: "size",
  wll: "wll", wllLb: "wll", wllKg: "wll", mechanism: "mechanism", chainRange: "chainRange",
  length: "length", lengthFt: "length", lengthM: "length", ends: "ends", serial: "serial", yard: "yard",
  inServiceOn: "inServiceOn", cost: "cost", quantity: "quantity",
};

type Base = "tagCode" | "kind" | "marking" | "grade" | "size" | "wll" | "mechanism" | "chainRange" | "length" | "ends" | "serial" | "yard" | "inServiceOn" | "cost" | "quantity";

/** Header words (lower case, punctuation as spaces, units taken out) for each field. */
const ALIASES: Record<Base, string[]> = {
  tagCode: ["tag", "tag code", "tag no", "linkyard tag", "tag id"],
  kind: ["kind", "type", "item", "item type", "item kind", "gear", "gear type", "product type", "category"],
  marking: ["marking", "marked", "markings", "what is marked", "marking type"],
  grade: ["grade", "chain grade", "gr"],
  size: ["size", "chain size", "diameter", "dia", "width", "webbing width", "strap width", "nominal size", "link size", "size width"],
  wll: ["wll", "marked wll", "working load limit", "working load", "wll marked", "rated wll marked"],
  mechanism: ["binder", "binder type", "mechanism", "binder mechanism"],
  chainRange: ["takes chain", "chain range", "chain size range", "fits chain", "for chain", "chain sizes"],
  length: ["length", "len", "overall length"],
  ends: ["end fittings", "ends", "end fitting", "fittings", "end hardware"],
  serial: ["serial", "serial no", "serial number", "sn", "s n", "lot", "lot no", "lot number", "serial lot", "serial or lot", "serial lot no", "batch"],
  yard: ["yard", "location", "lives at", "stored at", "site", "yard name"],
  inServiceOn: ["in service", "in service on", "in service since", "in service date", "date", "date in service", "purchase date", "purchased", "date purchased", "bought"],
  cost: ["cost", "price", "unit price", "unit cost", "cost each", "price each"],
  quantity: ["qty", "quantity", "qty ordered", "quantity ordered", "pcs", "pieces", "how many", "count", "no of items", "number of items"],
};

/** Columns that Linkyard writes in its export and sets itself: known, but not imported. */
const EXPORT_ONLY = ["status", "wll used", "rated wll", "effective wll", "inspection due", "next inspection due", "next inspection", "description", "wll source", "last inspected", "usable today", "usable"];

const WEIGHT_UNITS: Record<string, "lb" | "kg"> = { lb: "lb", lbs: "lb", pound: "lb", pounds: "lb", "#": "lb", kg: "kg", kgs: "kg", kilo: "kg", kilos: "kg", kilogram: "kg", kilograms: "kg" };
const LENGTH_UNITS: Record<string, "ft" | "m" | "in" | "mm"> = { ft: "ft", feet: "ft", foot: "ft", m: "m", metre: "m", metres: "m", meter: "m", meters: "m", in: "in", inch: "in", inches: "in", mm: "mm" };
const CURRENCY = new Set(["$", "usd", "dollars", "us"]);

/** A header's words: lower case, punctuation as spaces, its unit words taken out. */
export function headerWords(header: string): { words: string; weightUnit?: "lb" | "kg"; lengthUnit?: "ft" | "m" | "in" | "mm" } {
  const tokens = header
    .toLowerCase()
    .replace(/#/g, " # ")
    .replace(/\$/g, " $ ")
    .replace(/[()[\]{}_\-./\\:,;*?!]+/g, " ")
    .split(/\s+/)
    .filter(Boolean);
  let weightUnit: "lb" | "kg" | undefined;
  let lengthUnit: "ft" | "m" | "in" | "mm" | undefined;
  const words: string[] = [];
  tokens.forEach((t, i) => {
    if (i > 0 && t in WEIGHT_UNITS) weightUnit = WEIGHT_UNITS[t];
    else if (i > 0 && t in LENGTH_UNITS && !(t === "in" && tokens[i + 1] === "service")) lengthUnit = LENGTH_UNITS[t];
    else if (i > 0 && CURRENCY.has(t)) return;
    else if (t === "#" && i > 0) weightUnit = "lb";
    else words.push(t);
  });
  return { words: words.join(" "), weightUnit, lengthUnit };
}

export interface AutoMapping {
  mapping: ColumnMapping;
  /** Headers no field matches: listed, and not imported. */
  unknown: string[];
  /** Headers of Linkyard's own export that it sets itself (status, rated WLL…): not imported. */
  setByLinkyard: string[];
}

/** The field a single header means, or null. */
export function fieldForHeader(header: string): ImportField | null | "set-by-linkyard" {
  const { words, weightUnit, lengthUnit } = headerWords(header);
  if (!words) return null;
  if (EXPORT_ONLY.includes(words)) return "set-by-linkyard";
  const base = (Object.keys(ALIASES) as Base[]).find((b) => ALIASES[b].includes(words));
  switch (base) {
    case undefined:
      return null;
    case "wll":
      return weightUnit === "kg" ? "wllKg" : weightUnit === "lb" ? "wllLb" : "wll";
    case "length":
      return lengthUnit === "ft" ? "lengthFt" : lengthUnit === "m" ? "lengthM" : "length";
    case "size":
      return lengthUnit === "mm" ? "sizeMm" : "size";
    default:
      return base;
  }
}

/**
 * The automatic mapping of a file's headers: a field is given to the first column that
 * means it; a later column meaning the same thing is left out.
 * @example autoMap(["Type", "WLL (kg)", "Colour"]).mapping // { Type: "kind", "WLL (kg)": "wllKg", Colour: null }
 */
export function autoMap(headers: readonly string[]): AutoMapping {
  const mapping: ColumnMapping = {};
  const unknown: string[] = [];
  const setByLinkyard: string[] = [];
  const taken = new Set<string>();
  for (const header of headers) {
    const field = fieldForHeader(header);
    if (field === "set-by-linkyard") {
      mapping[header] = null;
      setByLinkyard.push(header);
    } else if (field && !taken.has(FIELD_GROUP[field])) {
      mapping[header] = field;
      taken.add(FIELD_GROUP[field]);
    } else {
      mapping[header] = null;
      if (!field && header.trim()) unknown.push(header);
    }
  }
  return { mapping, unknown, setByLinkyard };
}

/**
 * Headers made unique and usable as keys: blanks become "Column 3", a repeated header
 * gets " (2)".
 * @example uniqueHeaders(["Size", "", "Size"]) // ["Size", "Column 2", "Size (2)"]
 */
export function uniqueHeaders(raw: readonly string[]): string[] {
  const seen = new Map<string, number>();
  return raw.map((h, i) => {
    const name = h.trim() || `Column ${i + 1}`;
    const n = (seen.get(name) ?? 0) + 1;
    seen.set(name, n);
    return n === 1 ? name : `${name} (${n})`;
  });
}

/**
 * The mapping to use: the owner's choices where given (a saved mapping or the mapping
 * screen), the automatic mapping for every other header. Returns the problems in words.
 */
export function resolveMapping(headers: readonly string[], chosen: Record<string, string | null> | undefined): { mapping: ColumnMapping; problems: { column: string; message: string }[] } {
  const auto = autoMap(headers).mapping;
  const mapping: ColumnMapping = {};
  const problems: { column: string; message: string }[] = [];
  const byGroup = new Map<string, string>();
  for (const header of headers) {
    const wanted = chosen && Object.hasOwn(chosen, header) ? chosen[header] : auto[header];
    if (wanted !== null && wanted !== undefined && !(IMPORT_FIELDS as readonly string[]).includes(wanted)) {
      problems.push({ column: header, message: `"${wanted}" is not a field Linkyard imports.` });
      mapping[header] = null;
      continue;
    }
    const field = (wanted ?? null) as ImportField | null;
    if (field) {
      const group = FIELD_GROUP[field];
      const other = byGroup.get(group);
      if (other) {
        problems.push({ column: header, message: `Both "${other}" and "${header}" are read as ${FIELD_LABELS[field].replace(/ \(.*\)$/, "")}; choose one of them and set the other to "Not imported".` });
      } else byGroup.set(group, header);
    }
    mapping[header] = field;
  }
  return { mapping, problems };
}
