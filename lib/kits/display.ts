/**
 * Figures for people: the organisation's preferred system first, the other beside it
 * ("8,100 lb (3,674 kg)", "3,674 kg (8,100 lb)", "16 ft 1 in (4.90 m)"), and the values a form
 * starts from when a stored figure is edited, chosen so that saving the form unchanged
 * stores the same whole pounds and millimetres again.
 *
 * @module
 */
import { formatNumber, KG_PER_LB, MM_PER_IN } from "@/lib/securement";
import type { LengthInputUnit, WeightInputUnit } from "./quantities";

/**
 * The systems an organisation can prefer.
 *
 * @example
 * UNIT_SYSTEMS[0]; // "us"
 */
export const UNIT_SYSTEMS = ["us", "metric"] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

/**
 * @example
 * UNIT_SYSTEM_LABELS.metric; // "Metric (kg, m)"
 */
export const UNIT_SYSTEM_LABELS: Record<UnitSystem, string> = {
  us: "US (lb, ft-in)",
  metric: "Metric (kg, m)",
};

const WHOLE = new Intl.NumberFormat("en-US", { maximumFractionDigits: 0 });
const whole = (n: number) => WHOLE.format(Math.round(n));

/**
 * Pounds in the preferred system, with the other in brackets; kilograms to the whole kg.
 *
 * @example
 * formatWeight(8100, "us");     // "8,100 lb (3,674 kg)"
 * formatWeight(8100, "metric"); // "3,674 kg (8,100 lb)"
 */
export function formatWeight(lb: number, system: UnitSystem): string {
  const us = `${whole(lb)} lb`;
  const metric = `${whole(lb * KG_PER_LB)} kg`;
  return system === "us" ? `${us} (${metric})` : `${metric} (${us})`;
}

/**
 * Feet and inches to the nearest inch: "16 ft 1 in", "11 in", "20 ft".
 *
 * @example
 * feetInches(4900); // "16 ft 1 in"
 * feetInches(300);  // "1 ft" (11.8 in, to the nearest inch)
 */
export function feetInches(mm: number): string {
  const totalIn = Math.round(mm / MM_PER_IN);
  const ft = Math.floor(totalIn / 12);
  const inches = totalIn - ft * 12;
  if (ft === 0) return `${inches} in`;
  return inches === 0 ? `${ft} ft` : `${ft} ft ${inches} in`;
}

/**
 * Metres to the centimetre: "4.90 m".
 *
 * @example
 * metres(4900); // "4.90 m"
 */
export function metres(mm: number): string {
  return `${(Math.round(mm / 10) / 100).toFixed(2)} m`;
}

/**
 * Millimetres in the preferred system, with the other in brackets.
 *
 * @example
 * formatLength(4900, "us");     // "16 ft 1 in (4.90 m)"
 * formatLength(4900, "metric"); // "4.90 m (16 ft 1 in)"
 */
export function formatLength(mm: number, system: UnitSystem): string {
  return system === "us" ? `${feetInches(mm)} (${metres(mm)})` : `${metres(mm)} (${feetInches(mm)})`;
}

/**
 * The value and unit a form field starts from for a stored weight: pounds as stored (US), or
 * kilograms to 0.1 kg (metric), which converts back to the same whole pound (0.1 kg is
 * 0.22 lb, under the half pound that rounding absorbs).
 *
 * @example
 * editableWeight(8100, "metric"); // { value: 3674.1, unit: "kg" }
 */
export function editableWeight(lb: number, system: UnitSystem): { value: number; unit: WeightInputUnit } {
  if (system === "us") return { value: lb, unit: "lb" };
  return { value: Math.round(lb * KG_PER_LB * 10) / 10, unit: "kg" };
}

/**
 * The value and unit a form field starts from for a stored length: metres with up to three
 * decimals (exact) in metric; in US, whole feet or whole inches when the stored length is
 * one, else inches to 0.01 in (0.25 mm, under the half millimetre that rounding absorbs).
 *
 * @example
 * editableLength(6096, "us");     // { value: 20, unit: "ft" }
 * editableLength(4900, "us");     // { value: 192.91, unit: "in" }
 * editableLength(4900, "metric"); // { value: 4.9, unit: "m" }
 */
export function editableLength(mm: number, system: UnitSystem): { value: number; unit: LengthInputUnit } {
  if (system === "metric") return { value: mm / 1000, unit: "m" };
  const inches = Math.round(mm / MM_PER_IN);
  if (Math.round(inches * MM_PER_IN) === mm) {
    return inches % 12 === 0 && inches > 0 ? { value: inches / 12, unit: "ft" } : { value: inches, unit: "in" };
  }
  return { value: Math.round((mm / MM_PER_IN) * 100) / 100, unit: "in" };
}

/**
 * A figure of the securement check, which comes with its own kilogram twin (both to one
 * decimal, as the engine rounds them: lib/securement/format.ts), in the preferred order.
 *
 * @example
 * formatCheckWeight(4900.5, 2222.9, "us");     // "4,900.5 lb (2,222.9 kg)"
 * formatCheckWeight(4900.5, 2222.9, "metric"); // "2,222.9 kg (4,900.5 lb)"
 */
export function formatCheckWeight(lb: number, kg: number, system: UnitSystem): string {
  const us = `${formatNumber(lb)} lb`;
  const metric = `${formatNumber(kg)} kg`;
  return system === "us" ? `${us} (${metric})` : `${metric} (${us})`;
}
