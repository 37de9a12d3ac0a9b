/**
 * The WLL lookup screen's choices and its query to `GET /api/v1/ratings`, built from the
 * engine's 49 CFR 393.108 tables so the buttons always list the table's own sizes. Pure.
 *
 * @module
 */
import type { Material } from "@/lib/securement";
import {
  CHAIN_GRADES,
  CHAIN_TABLE,
  GRADE_NAMES,
  ROPE_FIBRES,
  ROPE_TABLES,
  STEEL_STRAPPING_TABLE,
  WEBBING_TABLE,
  WIRE_ROPE_TABLE,
  sizeMatchesRow,
  tryParseSize,
} from "@/lib/securement";

export interface Choice {
  value: string;
  label: string;
  sub?: string;
}

/** The materials that have a default table, in the words of the yard. */
export const MATERIAL_CHOICES: ReadonlyArray<Choice & { value: Material }> = [
  { value: "chain", label: "Chain" },
  { value: "webbing", label: "Web strap" },
  { value: "wire-rope", label: "Wire rope" },
  { value: "rope", label: "Fibre rope" },
  { value: "steel-strapping", label: "Steel strapping" },
];

/** The grade marks of the chain table, and "no legible mark" (value ""). */
export const GRADE_CHOICES: readonly Choice[] = [
  ...CHAIN_GRADES.map((g) => ({ value: String(g), label: `G${g}`, sub: `${GRADE_NAMES[g].replace(/^grade \d+ /, "")}${g === 43 ? ", also 40" : ""}` })),
  { value: "", label: "No mark", sub: "counts as G30" },
];

const FIBRE_WORDS: Record<(typeof ROPE_FIBRES)[number], string> = {
  manila: "Manila",
  polypropylene: "Polypropylene",
  polyester: "Polyester",
  nylon: "Nylon",
  "double-braided-nylon": "Double braided nylon",
};

/** The rope fibres that have a table, and "no label" (value ""). */
export const FIBRE_CHOICES: readonly Choice[] = [
  ...ROPE_FIBRES.map((f) => ({ value: f, label: FIBRE_WORDS[f] })),
  { value: "", label: "No label", sub: "counts as polypropylene" },
];

/** Which query field carries the size for a material ("size" or "width"). */
export function sizeField(material: Material): "size" | "width" {
  return material === "webbing" || material === "steel-strapping" ? "width" : "size";
}

const row = (r: { label: string; mm: number }): Choice => ({ value: `${r.label} in`, label: `${r.label} in`, sub: `${r.mm} mm` });

/**
 * The sizes (or widths) of a material's table, as buttons. For chain, only the sizes that
 * have a value for the grade (grades 80 and 100 have no 7/16 in row); no grade means grade 30.
 *
 * @example
 * sizeChoices("chain", "80").map((c) => c.label); // ["1/4 in", "5/16 in", "3/8 in", "1/2 in", "5/8 in"]
 */
export function sizeChoices(material: Material, grade = ""): Choice[] {
  switch (material) {
    case "chain": {
      const g = Number(grade || 30) as (typeof CHAIN_GRADES)[number];
      return CHAIN_TABLE.rows.filter((r) => r.grades[g] !== undefined).map(row);
    }
    case "webbing":
      return WEBBING_TABLE.rows.map(row);
    case "wire-rope":
      return WIRE_ROPE_TABLE.rows.map(row);
    case "rope":
      return ROPE_TABLES.polypropylene.rows.map(row);
    case "steel-strapping": {
      const seen = new Set<string>();
      return STEEL_STRAPPING_TABLE.rows.filter((r) => !seen.has(r.width.label) && seen.add(r.width.label)).map((r) => row(r.width));
    }
  }
}

/**
 * The strapping thicknesses the table lists for a width ("1 1/4 in"); none for other widths.
 *
 * @example
 * thicknessChoices("2 in").map((c) => c.label); // ["0.044 in", "0.050 in"]
 */
export function thicknessChoices(width: string): Choice[] {
  const parsed = width.trim() ? tryParseSize(width) : undefined;
  if (!parsed) return [];
  return STEEL_STRAPPING_TABLE.rows
    .filter((r) => sizeMatchesRow(parsed, r.width))
    .map((r) => ({ value: `${r.thickness.label} in`, label: `${r.thickness.label} in`, sub: `${r.thickness.mm} mm` }));
}

export interface LookupState {
  material: Material;
  grade: string;
  fibre: string;
  size: string;
  thickness: string;
}

/**
 * The query string for a lookup, or null while a needed field is empty.
 *
 * @example
 * ratingSearch({ material: "chain", grade: "70", fibre: "", size: "3/8 in", thickness: "" });
 * // "material=chain&grade=70&size=3%2F8+in"
 */
export function ratingSearch(s: LookupState): string | null {
  if (!s.size.trim()) return null;
  if (s.material === "steel-strapping" && !s.thickness.trim()) return null;
  const q = new URLSearchParams({ material: s.material });
  if (s.material === "chain" && s.grade) q.set("grade", s.grade);
  if (s.material === "rope" && s.fibre) q.set("fibre", s.fibre);
  q.set(sizeField(s.material), s.size.trim());
  if (s.material === "steel-strapping") q.set("thickness", s.thickness.trim());
  return q.toString();
}

/**
 * A size as a "nearest" list names it, turned back into something the lookup reads:
 * "13 mm (1/2 in)" → "13 mm"; "1/2 in" stays.
 *
 * @example
 * nearestValue("13 mm (1/2 in)"); // "13 mm"
 */
export function nearestValue(label: string): string {
  return label.replace(/\s*\(.*\)\s*$/, "").trim();
}
