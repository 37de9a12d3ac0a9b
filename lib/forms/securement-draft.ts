/**
 * The scratch securement check as a form holds it (text fields, toggles), and the
 * conversion to the API request (`POST /api/v1/securement-checks`). Pure: no React, no
 * fetch, so it is unit-tested and shared by the screen's components.
 *
 * The form never validates on its own: it sends what was typed and shows the API's
 * `{ path, message }` issues beside the fields (see {@link issueAt}, {@link describePath}).
 *
 * @module
 */
import type { FieldIssue } from "@/lib/field-issues";
export { issueAt } from "@/lib/field-issues";
import type { Attachment, CargoKind, Finding, RopeFibre, SecurementCheckRequest } from "@/lib/securement";
import {
  CHAIN_TABLE,
  isChainGrade,
  KG_PER_LB,
  parseGrade,
  ROPE_FIBRES,
  ROPE_TABLES,
  STEEL_STRAPPING_TABLE,
  toLb,
  tryParseSize,
  WEBBING_TABLE,
  WIRE_ROPE_TABLE,
} from "@/lib/securement";

export type DraftWeightUnit = "lb" | "kg";
export type DraftLengthUnit = "ft" | "m";

/** Accessories a machine commonly carries, offered as toggles (49 CFR 393.130(b)(1)). */
export const ACCESSORY_CHOICES = ["bucket", "blade", "boom", "arm"] as const;

export interface CargoDraft {
  weight: string;
  weightUnit: DraftWeightUnit;
  length: string;
  lengthUnit: DraftLengthUnit;
  kind: CargoKind;
  blockedAtFront: boolean;
  articulated: boolean;
  articulationRestrained: boolean;
  accessories: string[];
}

/**
 * One part of a tiedown. Chain `grade` is "30"…"100", or "" when the chain carries no
 * legible grade mark (sent as `marked: false`: rated as grade 30, 49 CFR 393.108(d)).
 * Rope `fibre` is "" when the fibre is not known (rated as polypropylene, 393.108(c)).
 * Every `wll` is the marked WLL as typed, in the draft's `wllUnit`; "" means none; so is a
 * wire rope's `nominalStrength` (a quarter of it is its WLL, 393.108(e)(1)).
 */
export type ComponentDraft =
  | { key: string; type: "chain"; grade: string; size: string; wll: string }
  | { key: string; type: "webbing"; width: string; wll: string }
  | { key: string; type: "wire-rope"; size: string; construction: string; nominalStrength: string; wll: string }
  | { key: string; type: "rope"; fibre: "" | RopeFibre; size: string; wll: string }
  | { key: string; type: "steel-strapping"; width: string; thickness: string; wll: string }
  | { key: string; type: "binder"; wll: string; rangeFrom: string; rangeTo: string }
  | { key: string; type: "hook" | "shackle"; grade: string; wll: string }
  | { key: string; type: "anchor"; label: string; wll: string };

export type DraftComponentType = ComponentDraft["type"];

export interface TiedownDraft {
  key: string;
  label: string;
  attachment: Attachment;
  secures: string;
  components: ComponentDraft[];
}

export interface CheckDraft {
  cargo: CargoDraft;
  wllUnit: DraftWeightUnit;
  tiedowns: TiedownDraft[];
}


let counter = 0;
/** A key for React lists; unique within a page. */
export function newKey(prefix = "k"): string {
  counter += 1;
  return `${prefix}${counter}`;
}

/** Words for the parts, as the screen names them. */
export const COMPONENT_LABELS: Record<DraftComponentType, string> = {
  chain: "Chain",
  binder: "Binder",
  hook: "Hook",
  shackle: "Shackle",
  anchor: "Anchor point",
  webbing: "Web strap",
  "wire-rope": "Wire rope",
  rope: "Fibre rope",
  "steel-strapping": "Steel strapping",
};

/** The parts a tiedown can be made of, in the order the screen offers them. */
export const ADDABLE_PARTS: readonly DraftComponentType[] = ["chain", "binder", "hook", "shackle", "anchor", "webbing", "wire-rope", "rope", "steel-strapping"];

/** Words for the rope fibres that have a 49 CFR 393.108 table; "" is a fibre not known. */
export const FIBRE_LABELS: Record<"" | RopeFibre, string> = {
  "": "Not known (counts as polypropylene)",
  manila: "Manila",
  polypropylene: "Polypropylene",
  polyester: "Polyester",
  nylon: "Nylon",
  "double-braided-nylon": "Double braided nylon",
};

/** Words for the attachments (49 CFR 393.106(d)) and what each counts toward the aggregate. */
export const ATTACHMENT_LABELS: Record<Attachment, { label: string; counts: string }> = {
  direct: { label: "Direct, to a point on the machine", counts: "counts half its WLL" },
  "indirect-same-side": { label: "Over or through, back to the same side", counts: "counts half its WLL" },
  "indirect-across": { label: "Over or through, to the other side", counts: "counts its full WLL" },
};

const inchChoice = (r: { label: string }) => ({ value: `${r.label} in`, label: `${r.label} in` });
/** Chain sizes of the 49 CFR 393.108 table, as the API accepts them ("3/8 in"). */
export const CHAIN_SIZES = CHAIN_TABLE.rows.map(inchChoice);
/** Webbing widths of the 49 CFR 393.108 table. */
export const WEBBING_WIDTHS = WEBBING_TABLE.rows.map(inchChoice);
/** Wire rope diameters of the 49 CFR 393.108 table. */
export const WIRE_ROPE_SIZES = WIRE_ROPE_TABLE.rows.map(inchChoice);
/** Fibre rope diameters of the 49 CFR 393.108 rope tables (one size column for every fibre). */
export const ROPE_SIZES = ROPE_TABLES.polypropylene.rows.map(inchChoice);
/** Steel strapping widths of the 49 CFR 393.108 table. */
export const STRAPPING_WIDTHS = [...new Set(STEEL_STRAPPING_TABLE.rows.map((r) => r.width.label))].map((label) => inchChoice({ label }));

/**
 * Steel strapping thicknesses the table has for a width ("1 1/4 in" → 0.029 … 0.057 in).
 *
 * @example
 * strappingThicknesses("2 in").map((t) => t.value); // ["0.044 in", "0.05 in"]
 */
export function strappingThicknesses(width: string): { value: string; label: string }[] {
  return STEEL_STRAPPING_TABLE.rows.filter((r) => `${r.width.label} in` === width).map((r) => inchChoice(r.thickness));
}

/**
 * A new part with sensible starting values: grade 70, 3/8 in chain; 4 in strap; empty WLLs.
 *
 * @example
 * newComponent("binder"); // { key: "k1", type: "binder", wll: "", rangeFrom: "", rangeTo: "" }
 * newComponent("wire-rope"); // 1/2 in, construction and nominal strength empty
 */
export function newComponent(type: DraftComponentType): ComponentDraft {
  const key = newKey("c");
  switch (type) {
    case "chain":
      return { key, type, grade: "70", size: "3/8 in", wll: "" };
    case "webbing":
      return { key, type, width: "4 in", wll: "" };
    case "wire-rope":
      return { key, type, size: "1/2 in", construction: "", nominalStrength: "", wll: "" };
    case "rope":
      return { key, type, fibre: "", size: "1/2 in", wll: "" };
    case "steel-strapping":
      return { key, type, width: "1 1/4 in", thickness: "0.029 in", wll: "" };
    case "binder":
      return { key, type, wll: "", rangeFrom: "", rangeTo: "" };
    case "hook":
    case "shackle":
      return { key, type, grade: "", wll: "" };
    case "anchor":
      return { key, type, label: "", wll: "" };
  }
}

/**
 * A new tiedown. It copies the parts of `like` (the tiedown above it) so a row of corner
 * chains is quick to enter; without one it starts as chain, binder and anchor point.
 *
 * @example
 * newTiedown(3).label; // "tiedown 4"
 */
export function newTiedown(index: number, like?: TiedownDraft): TiedownDraft {
  const components = like
    ? like.components.map((c) => ({ ...c, key: newKey("c") }))
    : [newComponent("chain"), newComponent("binder"), newComponent("anchor")];
  return { key: newKey("t"), label: `tiedown ${index + 1}`, attachment: like?.attachment ?? "direct", secures: "machine", components };
}

/**
 * `count` copies of a tiedown (its attachment, what it holds and every part as entered),
 * named after their place in the list: the "add 3 more like this one" of the screen.
 *
 * @example
 * copiesOf(exampleDraft().tiedowns[0], 3, 6).map((t) => t.label); // ["tiedown 7", "tiedown 8", "tiedown 9"]
 */
export function copiesOf(tiedown: TiedownDraft, count: number, existing: number): TiedownDraft[] {
  return Array.from({ length: count }, (_, i) => ({
    ...tiedown,
    key: newKey("t"),
    label: `tiedown ${existing + i + 1}`,
    components: tiedown.components.map((c) => ({ ...c, key: newKey("c") })),
  }));
}

function corner(label: string, secures: string, size: string): TiedownDraft {
  return {
    key: newKey("t"),
    label,
    attachment: "direct",
    secures,
    components: [
      { key: newKey("c"), type: "chain", grade: "70", size, wll: "" },
      { key: newKey("c"), type: "binder", wll: "5400", rangeFrom: "5/16 in", rangeTo: "3/8 in" },
      { key: newKey("c"), type: "anchor", label: "D-ring", wll: "6000" },
    ],
  };
}

/**
 * The example the screen opens with: a 9,800 lb, 16 ft mini excavator on four direct
 * 3/8 in grade 70 corner chains, with a 5/16 in chain each on the bucket and the blade;
 * 5,400 lb binders (made for 5/16–3/8 in chain) and 6,000 lb D-rings.
 *
 * @example
 * exampleDraft().tiedowns.length; // 6
 */
export function exampleDraft(): CheckDraft {
  return {
    cargo: {
      weight: "9800",
      weightUnit: "lb",
      length: "16",
      lengthUnit: "ft",
      kind: "machine",
      blockedAtFront: false,
      articulated: false,
      articulationRestrained: false,
      accessories: ["bucket", "blade"],
    },
    wllUnit: "lb",
    tiedowns: [
      corner("front left", "machine", "3/8 in"),
      corner("front right", "machine", "3/8 in"),
      corner("rear left", "machine", "3/8 in"),
      corner("rear right", "machine", "3/8 in"),
      corner("bucket", "bucket", "5/16 in"),
      corner("blade", "blade", "5/16 in"),
    ],
  };
}

/**
 * An empty form: no weight or length, one tiedown of chain, binder and anchor point.
 *
 * @example
 * blankDraft().cargo.weight; // ""
 */
export function blankDraft(): CheckDraft {
  return {
    cargo: { weight: "", weightUnit: "lb", length: "", lengthUnit: "ft", kind: "machine", blockedAtFront: false, articulated: false, articulationRestrained: false, accessories: [] },
    wllUnit: "lb",
    tiedowns: [newTiedown(0)],
  };
}

/**
 * Reads a typed number: thousands separators and spaces are dropped ("9,800" → 9800).
 * Empty text is `undefined`; text that is not a number is `null`, so the API names the
 * field ("The value must be a number").
 *
 * @example
 * readNumber("9,800"); // 9800
 * readNumber("");      // undefined
 * readNumber("lots");  // null
 */
export function readNumber(text: string): number | null | undefined {
  const cleaned = text.replace(/[,\s_]/g, "");
  if (cleaned === "") return undefined;
  const n = Number(cleaned);
  return Number.isFinite(n) ? n : null;
}

/** A JSON-ready request value: what the API receives, whether or not it is valid. */
export type RequestBody = { cargo: Record<string, unknown>; tiedowns: Array<Record<string, unknown>> };

function wllOf(text: string, unit: DraftWeightUnit): { wll?: { value: number | null; unit: DraftWeightUnit } } {
  const value = readNumber(text);
  return value === undefined ? {} : { wll: { value, unit } };
}

function componentRequest(c: ComponentDraft, unit: DraftWeightUnit): Record<string, unknown> {
  switch (c.type) {
    case "chain":
      return c.grade === ""
        ? { type: "chain", size: c.size, marked: false, ...wllOf(c.wll, unit) }
        : { type: "chain", grade: Number(c.grade), size: c.size, ...wllOf(c.wll, unit) };
    case "webbing":
      return { type: "webbing", width: c.width, ...wllOf(c.wll, unit) };
    case "wire-rope": {
      const nominal = readNumber(c.nominalStrength);
      return {
        type: "wire-rope",
        size: c.size,
        ...(c.construction.trim() ? { construction: c.construction.trim() } : {}),
        ...(nominal === undefined ? {} : { nominalStrength: { value: nominal, unit } }),
        ...wllOf(c.wll, unit),
      };
    }
    case "rope":
      return { type: "rope", ...(c.fibre ? { fibre: c.fibre } : {}), size: c.size, ...wllOf(c.wll, unit) };
    case "steel-strapping":
      return { type: "steel-strapping", width: c.width, thickness: c.thickness, ...wllOf(c.wll, unit) };
    case "binder":
      return { type: "binder", ...wllOf(c.wll, unit), ...(c.rangeFrom && c.rangeTo ? { chainSizeRange: [c.rangeFrom, c.rangeTo] } : {}) };
    case "hook":
    case "shackle":
      return { type: c.type, ...(c.grade ? { grade: Number(c.grade) } : {}), ...wllOf(c.wll, unit) };
    case "anchor":
      return { type: "anchor", ...(c.label.trim() ? { label: c.label.trim() } : {}), ...wllOf(c.wll, unit) };
  }
}

/**
 * The API request for a draft. Empty optional fields are left out; a missing or unreadable
 * weight or length is sent as it is so the API's answer names the field.
 *
 * @example
 * toRequest(exampleDraft()).tiedowns[0];
 * // { label: "front left", attachment: "direct", secures: "machine", components: [
 * //   { type: "chain", grade: 70, size: "3/8 in" },
 * //   { type: "binder", wll: { value: 5400, unit: "lb" }, chainSizeRange: ["5/16 in", "3/8 in"] },
 * //   { type: "anchor", label: "D-ring", wll: { value: 6000, unit: "lb" } } ] }
 */
export function toRequest(draft: CheckDraft): RequestBody {
  const { cargo } = draft;
  return {
    cargo: {
      weight: { value: readNumber(cargo.weight), unit: cargo.weightUnit },
      length: { value: readNumber(cargo.length), unit: cargo.lengthUnit },
      kind: cargo.kind,
      blockedAtFront: cargo.blockedAtFront,
      articulated: cargo.articulated,
      ...(cargo.articulated ? { articulationRestrained: cargo.articulationRestrained } : {}),
      ...(cargo.accessories.length ? { accessories: [...cargo.accessories] } : {}),
    },
    tiedowns: draft.tiedowns.map((t) => ({
      ...(t.label.trim() ? { label: t.label.trim() } : {}),
      attachment: t.attachment,
      secures: t.secures,
      components: t.components.map((c) => componentRequest(c, draft.wllUnit)),
    })),
  };
}

const FIELD_WORDS: Record<string, string> = {
  wll: "WLL",
  value: "",
  unit: "unit",
  size: "size",
  grade: "grade mark",
  width: "width",
  thickness: "thickness",
  fibre: "fibre",
  construction: "construction",
  nominalStrength: "nominal strength",
  chainSizeRange: "chain sizes",
  label: "name",
  secures: "what it holds",
  attachment: "attachment",
  components: "parts",
  weight: "weight",
  length: "length",
  kind: "kind",
  accessories: "accessories",
  articulationRestrained: "joint restrained",
};

/**
 * Names a request path for a person: "cargo.weight.value" → "Weight";
 * "tiedowns.0.components.1.wll.value" → "Tiedown 1 (front left), part 2 (binder): WLL".
 *
 * @example
 * describePath("tiedowns.0.attachment", exampleDraft()); // "Tiedown 1 (front left): attachment"
 */
export function describePath(path: string, draft: CheckDraft): string {
  const parts = path.split(".").filter((p) => p !== "");
  if (parts.length === 0) return "The check";
  const words = (rest: string[]) =>
    rest
      .filter((p) => !/^\d+$/.test(p))
      .map((p) => FIELD_WORDS[p] ?? p)
      .filter((w) => w !== "")
      .join(" ");
  if (parts[0] === "cargo") {
    const w = words(parts.slice(1));
    return w ? w.charAt(0).toUpperCase() + w.slice(1) : "The machine";
  }
  if (parts[0] === "tiedowns" && parts[1] !== undefined && /^\d+$/.test(parts[1])) {
    const ti = Number(parts[1]);
    const t = draft.tiedowns[ti];
    let where = `Tiedown ${ti + 1}${t?.label.trim() ? ` (${t.label.trim()})` : ""}`;
    let rest = parts.slice(2);
    if (rest[0] === "components" && rest[1] !== undefined && /^\d+$/.test(rest[1])) {
      const ci = Number(rest[1]);
      const c = t?.components[ci];
      where += `, part ${ci + 1}${c ? ` (${COMPONENT_LABELS[c.type].toLowerCase()})` : ""}`;
      rest = rest.slice(2);
    }
    const w = words(rest);
    return w ? `${where}: ${w}` : where;
  }
  return words(parts) || "The check";
}

/** What the form marks beside a field that a finding says was left empty or not given. */
const FIELD_MARKS: Partial<Record<Finding["code"], string>> = {
  MISSING_WLL: "Empty: enter the WLL stamped on it. Until then this tiedown counts 0",
  MISSING_SIZE: "Empty: the size is needed to rate it from the table",
  BINDER_RANGE_NOT_GIVEN: "Not given: whether this binder takes the chain was not checked",
  BINDER_CHAIN_SIZE_OUT_OF_RANGE: "This binder is not made for the chain in this tiedown: the tiedown counts 0",
  WIRE_ROPE_RATED_FROM_TABLE: "Not given: rated from the 6 × 37 table instead of a quarter of this",
  ROPE_FIBRE_UNKNOWN: "Not known: rated as polypropylene (manila would be lower)",
};

/**
 * The marks a check's findings put on the form's own fields ("Empty: enter the WLL stamped
 * on it"), at the request path of the field, so the fields to fill stand out in the form
 * and not only in the list of findings.
 *
 * @example
 * fieldMarks(result.findings);
 * // [{ path: "tiedowns.1.components.1.wll", message: "Empty: enter the WLL stamped on it. Until then this tiedown counts 0" }]
 */
export function fieldMarks(findings: readonly Finding[]): FieldIssue[] {
  return findings.flatMap((f) => {
    const message = FIELD_MARKS[f.code];
    return message && f.path && f.component !== undefined ? [{ path: f.path, message }] : [];
  });
}

type Rows = readonly { label: string; inches: number; mm: number }[];

/** A size as the form's menus write it ("3/8 in"), matched to a table row; other text as it is. */
function sizeChoice(value: unknown, rows: Rows): string {
  if (value === undefined || value === null) return "";
  const parsed = tryParseSize(value as string | number);
  if (!parsed) return String(value);
  const row = rows.find((r) => (parsed.system === "metric" ? Math.abs(r.mm - parsed.mm) < 1e-6 : Math.abs(r.inches - parsed.inches) < 1e-9));
  return row ? `${row.label} in` : parsed.display;
}

const STRAPPING_WIDTH_ROWS: Rows = [...new Map(STEEL_STRAPPING_TABLE.rows.map((r) => [r.width.label, r.width])).values()];
const STRAPPING_THICKNESS_ROWS: Rows = [...new Map(STEEL_STRAPPING_TABLE.rows.map((r) => [r.thickness.label, r.thickness])).values()];

function gradeChoice(value: unknown): string {
  const g = value === undefined ? undefined : parseGrade(value as string | number);
  return isChainGrade(g) ? String(g) : "";
}

/**
 * A saved request back in the form (the reverse of {@link toRequest}), with a note for each
 * thing the form cannot hold exactly: weights in daN and lengths in in or mm are converted,
 * WLLs in another unit than the first one are converted into it, part labels other than an
 * anchor's and stock ids are dropped, a chain marked with a WLL but no grade is shown as
 * having no legible mark.
 *
 * @example
 * fromRequest(toRequest(exampleDraft())).draft.tiedowns.length; // 6
 * fromRequest(toRequest(exampleDraft())).notes; // []
 */
export function fromRequest(request: SecurementCheckRequest): { draft: CheckDraft; notes: string[] } {
  const notes = new Set<string>();
  const { cargo } = request;
  const weights = request.tiedowns.flatMap((t) => t.components.flatMap((c) => [c.wll, c.type === "wire-rope" ? c.nominalStrength : undefined]));
  const firstUnit = weights.find((w) => w !== undefined)?.unit;
  const wllUnit: DraftWeightUnit = firstUnit === "kg" ? "kg" : "lb";
  const inUnit = (w: { value: number; unit: "lb" | "kg" | "daN" } | undefined): string => {
    if (w === undefined) return "";
    if (w.unit === wllUnit) return String(w.value);
    notes.add(`WLLs are shown in ${wllUnit}; some were saved in ${w.unit} and are converted`);
    const lb = toLb(w).value;
    return String(Number((wllUnit === "lb" ? lb : lb * KG_PER_LB).toFixed(1)));
  };
  const weight =
    cargo.weight.unit === "daN"
      ? (notes.add("The weight was saved in daN and is shown in lb"), { value: String(Number(toLb(cargo.weight).value.toFixed(1))), unit: "lb" as const })
      : { value: String(cargo.weight.value), unit: cargo.weight.unit };
  const length =
    cargo.length.unit === "ft" || cargo.length.unit === "m"
      ? { value: String(cargo.length.value), unit: cargo.length.unit }
      : cargo.length.unit === "in"
        ? (notes.add("The length was saved in inches and is shown in feet"), { value: String(Number((cargo.length.value / 12).toFixed(3))), unit: "ft" as const })
        : (notes.add("The length was saved in mm and is shown in metres"), { value: String(cargo.length.value / 1000), unit: "m" as const });

  const part = (c: SecurementCheckRequest["tiedowns"][number]["components"][number]): ComponentDraft => {
    const key = newKey("c");
    if ((c.label && c.type !== "anchor") || c.gearId) notes.add("Part names and stock ids are not shown in the form");
    switch (c.type) {
      case "chain": {
        const grade = c.marked === false ? "" : gradeChoice(c.grade);
        if (grade === "" && c.marked !== false && c.wll !== undefined) notes.add("A chain marked with a WLL but no grade is shown as having no legible mark");
        return { key, type: "chain", grade, size: sizeChoice(c.size, CHAIN_TABLE.rows), wll: c.marked === false ? "" : inUnit(c.wll) };
      }
      case "webbing":
        return { key, type: "webbing", width: sizeChoice(c.width, WEBBING_TABLE.rows), wll: inUnit(c.wll) };
      case "wire-rope":
        return { key, type: "wire-rope", size: sizeChoice(c.size, WIRE_ROPE_TABLE.rows), construction: c.construction ?? "", nominalStrength: inUnit(c.nominalStrength), wll: c.marked === false ? "" : inUnit(c.wll) };
      case "rope": {
        if (c.marked === false && c.fibre && c.fibre !== "manila") notes.add("Unlabelled rope is shown with its fibre not known (both count as polypropylene)");
        const fibre = c.marked === false && c.fibre !== "manila" ? "" : (c.fibre ?? "");
        return { key, type: "rope", fibre: (ROPE_FIBRES as readonly string[]).includes(fibre) ? fibre : "", size: sizeChoice(c.size, ROPE_TABLES.polypropylene.rows), wll: c.marked === false ? "" : inUnit(c.wll) };
      }
      case "steel-strapping":
        return { key, type: "steel-strapping", width: sizeChoice(c.width, STRAPPING_WIDTH_ROWS), thickness: sizeChoice(c.thickness, STRAPPING_THICKNESS_ROWS), wll: inUnit(c.wll) };
      case "binder":
        return { key, type: "binder", wll: inUnit(c.wll), rangeFrom: sizeChoice(c.chainSizeRange?.[0], CHAIN_TABLE.rows), rangeTo: sizeChoice(c.chainSizeRange?.[1], CHAIN_TABLE.rows) };
      case "hook":
      case "shackle":
        return { key, type: c.type, grade: gradeChoice(c.grade), wll: inUnit(c.wll) };
      case "anchor":
        return { key, type: "anchor", label: c.label ?? "", wll: inUnit(c.wll) };
    }
  };

  const draft: CheckDraft = {
    cargo: {
      weight: weight.value,
      weightUnit: weight.unit,
      length: length.value,
      lengthUnit: length.unit,
      kind: cargo.kind,
      blockedAtFront: cargo.blockedAtFront ?? false,
      articulated: cargo.articulated ?? false,
      articulationRestrained: cargo.articulationRestrained ?? false,
      accessories: [...(cargo.accessories ?? [])],
    },
    wllUnit,
    tiedowns: request.tiedowns.map((t, i) => ({
      key: newKey("t"),
      label: t.label ?? `tiedown ${i + 1}`,
      attachment: t.attachment,
      secures: t.secures ?? "machine",
      components: t.components.map(part),
    })),
  };
  return { draft, notes: [...notes] };
}
