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
import type { Attachment, CargoKind } from "@/lib/securement";
import { CHAIN_TABLE, WEBBING_TABLE } from "@/lib/securement";

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
 * Every `wll` is the marked WLL as typed, in the draft's `wllUnit`; "" means none.
 */
export type ComponentDraft =
  | { key: string; type: "chain"; grade: string; size: string; wll: string }
  | { key: string; type: "webbing"; width: string; wll: string }
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
};

/** Words for the attachments (49 CFR 393.106(d)) and what each counts toward the aggregate. */
export const ATTACHMENT_LABELS: Record<Attachment, { label: string; counts: string }> = {
  direct: { label: "Direct, to a point on the machine", counts: "counts half its WLL" },
  "indirect-same-side": { label: "Over or through, back to the same side", counts: "counts half its WLL" },
  "indirect-across": { label: "Over or through, to the other side", counts: "counts its full WLL" },
};

/** Chain sizes of the 49 CFR 393.108 table, as the API accepts them ("3/8 in"). */
export const CHAIN_SIZES = CHAIN_TABLE.rows.map((r) => ({ value: `${r.label} in`, label: `${r.label} in` }));
/** Webbing widths of the 49 CFR 393.108 table. */
export const WEBBING_WIDTHS = WEBBING_TABLE.rows.map((r) => ({ value: `${r.label} in`, label: `${r.label} in` }));

/**
 * A new part with sensible starting values: grade 70, 3/8 in chain; 4 in strap; empty WLLs.
 *
 * @example
 * newComponent("binder"); // { key: "k1", type: "binder", wll: "", rangeFrom: "", rangeTo: "" }
 */
export function newComponent(type: DraftComponentType): ComponentDraft {
  const key = newKey("c");
  switch (type) {
    case "chain":
      return { key, type, grade: "70", size: "3/8 in", wll: "" };
    case "webbing":
      return { key, type, width: "4 in", wll: "" };
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

/**
 * The first issue at a path or below it ("tiedowns.0.components.1.wll" also finds
 * "tiedowns.0.components.1.wll.value").
 *
 * @example
 * issueAt([{ path: "cargo.weight.value", message: "The value must be a number" }], "cargo.weight");
 * // "The value must be a number"
 */
export function issueAt(issues: readonly FieldIssue[] | undefined, path: string): string | undefined {
  return issues?.find((i) => i.path === path || i.path.startsWith(`${path}.`))?.message;
}

const FIELD_WORDS: Record<string, string> = {
  wll: "WLL",
  value: "",
  unit: "unit",
  size: "size",
  grade: "grade mark",
  width: "width",
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
