import type { ItemKind } from "./labels";

/**
 * Measured values of a periodic inspection, with the removal limits that the standards give.
 * Each limit names its source. All lengths are inches (the form converts mm at the edge).
 */
export interface MeasurementSpec {
  id: string;
  label: string;
  unit: "in" | "%" | "count";
}

export interface Measured {
  id: string;
  label: string;
  value: number;
  unit: MeasurementSpec["unit"];
  limit: string;
  exceeded: boolean;
  source: string;
}

/** Minimum link thickness of alloy chain, inches, by size. A manufacturer's table that
 * refers to ASME B30.9 (verified, secondary); not the B30.9 table itself. */
export const MIN_LINK_THICKNESS_IN: Record<string, number> = { "5/16": 0.272, "3/8": 0.342, "1/2": 0.443, "5/8": 0.546 };

/** Web tie-down damage that takes a strap out of service, by width (inches): a CVSA-based
 * training deck (verified, secondary). The 2 in row is printed as 3/8 in there and
 * remembered as 1/2 in elsewhere; the lower, stricter value is used. */
export const WEB_DAMAGE_LIMIT_IN: Record<string, number> = { "1 3/4": 0.375, "2": 0.375, "3": 0.625, "4": 0.75 };

export const MEASUREMENTS: Record<ItemKind, readonly MeasurementSpec[]> = {
  chain: [
    { id: "linkThickness", label: "Thinnest link, measured thickness", unit: "in" },
    { id: "stretch", label: "Stretch over a measured length of chain", unit: "%" },
  ],
  hook: [
    { id: "throatNew", label: "Throat opening when new (or as marked)", unit: "in" },
    { id: "throatNow", label: "Throat opening now", unit: "in" },
    { id: "wear", label: "Wear at the saddle, share of the original section", unit: "%" },
  ],
  "web-strap": [{ id: "damage", label: "Largest cut, tear or burn, across the webbing", unit: "in" }],
  "wire-rope": [
    { id: "brokenWires", label: "Broken wires in one rope lay", unit: "count" },
    { id: "diameterLoss", label: "Loss of diameter against nominal", unit: "%" },
  ],
  shackle: [{ id: "wear", label: "Wear of pin or body, share of the original dimension", unit: "%" }],
  binder: [],
  "rated-item": [{ id: "wear", label: "Wear at the most worn point, share of the original dimension", unit: "%" }],
};

/**
 * Compares what the inspector measured against the removal limits.
 * @example evaluateMeasurements("hook", "3/8", { throatNew: 1.0, throatNow: 1.06 })
 * // [{ id: "throatIncrease", exceeded: true, limit: "more than 5 % or 1/4 in", … }, …]
 */
export function evaluateMeasurements(kind: ItemKind, size: string | null, values: Record<string, number | undefined>): Measured[] {
  const out: Measured[] = [];
  const spec = new Map(MEASUREMENTS[kind].map((m) => [m.id, m]));
  const add = (id: string, value: number, limit: string, exceeded: boolean, source: string, label = spec.get(id)?.label ?? id, unit = spec.get(id)?.unit ?? "in") =>
    out.push({ id, label, value, unit, limit, exceeded, source });

  switch (kind) {
    case "chain": {
      const t = values.linkThickness;
      if (t !== undefined) {
        const min = size ? MIN_LINK_THICKNESS_IN[size] : undefined;
        if (min !== undefined) {
          add("linkThickness", t, `below ${min} in for ${size} in chain`, t < min, "Manufacturer's minimum link thickness table referring to ASME B30.9 (verified, secondary)");
        } else if (size) {
          const nominal = sizeInches(size);
          const floor = round3(nominal * 0.9);
          add("linkThickness", t, `below ${floor} in (more than 10 % wear of ${size} in)`, t < floor, "10 % wear of nominal thickness: BG Bau chain practice (verified); no NACM wear table retrieved");
        }
      }
      const s = values.stretch;
      if (s !== undefined) add("stretch", s, "more than 5 %", s > 5, "More than 5 % elongation: BG Bau chain practice (verified)");
      break;
    }
    case "hook": {
      const a = values.throatNew;
      const b = values.throatNow;
      if (a !== undefined && b !== undefined && a > 0) {
        // rounded to thousandths so that 1.05 in over 1.00 in reads as exactly 5 %
        const increase = round3(b - a);
        const pct = round3(((b - a) / a) * 100);
        add("throatIncrease", pct, "more than 5 %, and never more than 1/4 in", pct > 5 || increase > 0.25, "ASME B30.10 hook removal criteria (throat opening)", "Throat opening increase", "%");
      }
      const w = values.wear;
      if (w !== undefined) add("wear", w, "more than 10 %", w > 10, "ASME B30.10 (wear over 10 % of the original section)");
      break;
    }
    case "web-strap": {
      const d = values.damage;
      if (d !== undefined && size) {
        const limit = WEB_DAMAGE_LIMIT_IN[size];
        if (limit !== undefined) add("damage", d, `larger than ${limit} in on ${size} in webbing`, d > limit, "CVSA tiedown defect table as taught in a training deck (verified, secondary)");
        else add("damage", d, "any", d > 0, "No published limit for this width: any damage counts");
      }
      break;
    }
    case "wire-rope": {
      const n = values.brokenWires;
      if (n !== undefined) add("brokenWires", n, "10 or more in one lay", n >= 10, "ASME B30.9 §9-2.9.5 (strand-laid rope)");
      const loss = values.diameterLoss;
      if (loss !== undefined) add("diameterLoss", loss, "more than 5 %", loss > 5, "ASME B30.9 §9-2.9.5");
      break;
    }
    case "shackle":
    case "rated-item": {
      const w = values.wear;
      if (w !== undefined) add("wear", w, "more than 10 %", w > 10, kind === "shackle" ? "ASME B30.26 (10 % for links and rings verified; for shackles from memory)" : "ASME B30.26 §26-4.8.4 (10 % dimension loss)");
      break;
    }
    case "binder":
      break;
  }
  return out;
}

function sizeInches(label: string): number {
  const [whole, frac] = label.includes(" ") ? label.split(" ") : label.includes("/") ? ["0", label] : [label, "0/1"];
  const [n, d] = frac.split("/").map(Number);
  return Number(whole) + n / d;
}

const round3 = (n: number) => Math.round(n * 1000) / 1000;

export type InspectionVerdict = "in_service" | "repair" | "retire";

/**
 * An inspection may return an item to service only when no defect was found and no
 * measured value is past its limit.
 */
export function verdictProblem(verdict: InspectionVerdict, defects: number, measured: readonly Measured[]): string | null {
  if (verdict !== "in_service") return null;
  if (defects > 0) return "A defect was found: choose repair or retire.";
  const over = measured.find((m) => m.exceeded);
  if (over) return `${over.label} is past its limit (${over.limit}): choose repair or retire.`;
  return null;
}
