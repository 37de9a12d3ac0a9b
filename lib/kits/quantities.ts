/**
 * Quantities at the edges of the fleet API: `{ value, unit }` in, whole pounds and whole
 * millimetres stored, and back. Conversions use the securement engine's exact factors
 * (lib/securement/units.ts) and round once, at the end.
 *
 * @module
 */
import { z } from "zod";
import { settle, toFeet, toLb, toMillimetres } from "@/lib/securement";

/**
 * Units a fleet weight is given in.
 *
 * @example
 * WEIGHT_INPUT_UNITS.includes("kg"); // true
 */
export const WEIGHT_INPUT_UNITS = ["lb", "kg"] as const;
export type WeightInputUnit = (typeof WEIGHT_INPUT_UNITS)[number];

/**
 * Units a fleet length is given in.
 *
 * @example
 * LENGTH_INPUT_UNITS.includes("ft"); // true
 */
export const LENGTH_INPUT_UNITS = ["ft", "in", "m", "mm"] as const;
export type LengthInputUnit = (typeof LENGTH_INPUT_UNITS)[number];

/**
 * A weight as the API takes it.
 *
 * @example
 * const w: WeightInput = { value: 3674, unit: "kg" };
 */
export interface WeightInput {
  value: number;
  unit: WeightInputUnit;
}

/**
 * A length as the API takes it.
 *
 * @example
 * const l: LengthInput = { value: 20, unit: "ft" };
 */
export interface LengthInput {
  value: number;
  unit: LengthInputUnit;
}

/**
 * Whole pounds, as stored.
 *
 * @example
 * toWholeLb({ value: 3674, unit: "kg" }); // 8100
 */
export function toWholeLb(weight: WeightInput): number {
  return Math.round(settle(toLb(weight).value));
}

/**
 * Whole millimetres, as stored.
 *
 * @example
 * toWholeMm({ value: 20, unit: "ft" }); // 6096
 */
export function toWholeMm(length: LengthInput): number {
  return Math.round(settle(toMillimetres(length).value));
}

// JSON numbers are numbers: true, [5] or "3674" is refused, never coerced (issue 11.8); the
// screens' forms turn their text into numbers first (quantityBody in components/fleet).
const number = (what: string) => z.number({ error: `Enter the ${what} as a number.` });

/**
 * A `{ value, unit }` weight, checked and converted to whole pounds. `max` is in pounds.
 *
 * @example
 * weightField("shipping weight", 200_000).parse({ value: 8100, unit: "lb" }); // 8100
 */
export function weightField(what: string, maxLb: number) {
  return z
    .object(
      {
        value: number(what).refine((v) => v > 0, { error: `The ${what} must be more than 0.` }),
        unit: z.enum(WEIGHT_INPUT_UNITS, { error: `The ${what} is in lb or kg.` }),
      },
      { error: `Give the ${what} as { value, unit }.` },
    )
    .transform((w, ctx) => {
      const lb = toWholeLb(w);
      if (lb < 1 || lb > maxLb) {
        ctx.addIssue({ code: "custom", path: ["value"], message: `The ${what} must be between 1 and ${maxLb.toLocaleString("en-US")} lb; check the figure.` });
        return z.NEVER;
      }
      return lb;
    });
}

/**
 * A `{ value, unit }` length, checked and converted to whole millimetres. `minMm` is 1
 * unless a zero length makes sense (a position at the very front).
 *
 * @example
 * lengthField("deck length", 1, 25_000).parse({ value: 20, unit: "ft" }); // 6096
 */
export function lengthField(what: string, minMm: number, maxMm: number) {
  return z
    .object(
      {
        value: number(what).refine((v) => v >= 0, { error: `The ${what} cannot be negative.` }),
        unit: z.enum(LENGTH_INPUT_UNITS, { error: `The ${what} is in ft, in, m or mm.` }),
      },
      { error: `Give the ${what} as { value, unit }.` },
    )
    .transform((l, ctx) => {
      const mm = toWholeMm(l);
      if (mm < minMm || mm > maxMm) {
        ctx.addIssue({ code: "custom", path: ["value"], message: `The ${what} must be between ${minMm} and ${maxMm.toLocaleString("en-US")} mm (${toFeet({ value: maxMm, unit: "mm" }).value.toFixed(0)} ft); check the figure.` });
        return z.NEVER;
      }
      return mm;
    });
}

/**
 * A stored weight as the API answers it: always in pounds, so it goes back unchanged.
 *
 * @example
 * lbQuantity(8100); // { value: 8100, unit: "lb" }
 */
export function lbQuantity(lb: number): { value: number; unit: "lb" } {
  return { value: lb, unit: "lb" };
}

/**
 * A stored length as the API answers it: always in millimetres.
 *
 * @example
 * mmQuantity(6096); // { value: 6096, unit: "mm" }
 */
export function mmQuantity(mm: number): { value: number; unit: "mm" } {
  return { value: mm, unit: "mm" };
}
