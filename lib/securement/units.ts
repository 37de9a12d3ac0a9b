/**
 * Units of weight, force and length used by the securement engine, and exact conversions.
 *
 * Conversion factors (source: shared reference §6):
 * - 1 lb = 0.45359237 kg exactly (1959 international yard and pound agreement; verified).
 * - 1 lbf = 4.4482216152605 N exactly (= 0.45359237 kg × 9.80665 m/s²; verified).
 * - 1 daN = 10 N (SI prefix deca; definitional).
 * - 1 in = 25.4 mm exactly; 1 ft = 0.3048 m exactly (definitional).
 *
 * A weight given in daN is a force. Converting it to pounds goes through pounds-force,
 * so 1 daN = 10 / 4.4482216152605 lb ≈ 2.248 lb (and 1 kg ≈ 0.98 daN, not 1 daN).
 *
 * @module
 */

/**
 * Units accepted for a weight or a working load limit.
 *
 * @example
 * const unit: WeightUnit = "kg";
 */
export type WeightUnit = "lb" | "kg" | "daN";

/**
 * Units accepted for a length (cargo length, or a size such as a chain diameter).
 *
 * @example
 * const unit: LengthUnit = "ft";
 */
export type LengthUnit = "in" | "ft" | "mm" | "m";

/**
 * A number with its unit. Every conversion in this module returns one, so a figure never
 * travels without its unit.
 *
 * @example
 * const w: Quantity<"lb"> = { value: 9800, unit: "lb" };
 */
export interface Quantity<U extends string> {
  readonly value: number;
  readonly unit: U;
}

/**
 * A weight, or a working load limit, in any accepted unit.
 *
 * @example
 * const wll: Weight = { value: 2990, unit: "kg" };
 */
export type Weight = Quantity<WeightUnit>;

/**
 * A length in any accepted unit.
 *
 * @example
 * const len: Length = { value: 16, unit: "ft" };
 */
export type Length = Quantity<LengthUnit>;

/**
 * Kilograms in one pound, exact by definition.
 *
 * @example
 * 1000 * KG_PER_LB; // 453.59237
 */
export const KG_PER_LB = 0.45359237;

/**
 * Newtons in one pound-force, exact by definition (0.45359237 × 9.80665).
 *
 * @example
 * N_PER_LBF / 10; // 0.44482216152605 daN per lbf
 */
export const N_PER_LBF = 4.4482216152605;

/**
 * Newtons in one decanewton.
 *
 * @example
 * 500 * N_PER_DAN; // 5000 N
 */
export const N_PER_DAN = 10;

/**
 * Millimetres in one inch, exact by definition.
 *
 * @example
 * 0.375 * MM_PER_IN; // 9.525
 */
export const MM_PER_IN = 25.4;

/**
 * Metres in one foot, exact by definition.
 *
 * @example
 * 10 * M_PER_FT; // 3.048
 */
export const M_PER_FT = 0.3048;

/**
 * The weight units, in a fixed order (for schemas and menus).
 *
 * @example
 * WEIGHT_UNITS.includes("daN"); // true
 */
export const WEIGHT_UNITS = ["lb", "kg", "daN"] as const satisfies readonly WeightUnit[];

/**
 * The length units, in a fixed order (for schemas and menus).
 *
 * @example
 * LENGTH_UNITS.includes("m"); // true
 */
export const LENGTH_UNITS = ["in", "ft", "mm", "m"] as const satisfies readonly LengthUnit[];

/** Pounds in one unit of each weight unit. */
const LB_PER: Readonly<Record<WeightUnit, number>> = {
  lb: 1,
  kg: 1 / KG_PER_LB,
  daN: N_PER_DAN / N_PER_LBF,
};

/** Inches in one unit of each length unit. */
const IN_PER: Readonly<Record<LengthUnit, number>> = {
  in: 1,
  ft: 12,
  mm: 1 / MM_PER_IN,
  m: 1000 / MM_PER_IN,
};

/**
 * Converts a weight or WLL to pounds.
 *
 * @example
 * toLb({ value: 4535.9237, unit: "kg" }); // { value: 10000, unit: "lb" } (to float precision; see settle())
 * toLb({ value: 1, unit: "daN" }).value; // 2.2480894309971...
 */
export function toLb(weight: Weight): Quantity<"lb"> {
  return { value: weight.value * LB_PER[weight.unit], unit: "lb" };
}

/**
 * Converts pounds to another weight unit.
 *
 * @example
 * fromLb(2000, "kg"); // { value: 907.18474, unit: "kg" }
 */
export function fromLb<U extends WeightUnit>(lb: number, unit: U): Quantity<U> {
  return { value: lb / LB_PER[unit], unit };
}

/**
 * Converts a weight or WLL to kilograms (through pounds for daN, i.e. through pounds-force).
 *
 * @example
 * toKg({ value: 1000, unit: "lb" }); // { value: 453.59237, unit: "kg" }
 */
export function toKg(weight: Weight): Quantity<"kg"> {
  return fromLb(toLb(weight).value, "kg");
}

/**
 * Converts a length to inches.
 *
 * @example
 * toInches({ value: 10, unit: "mm" }); // { value: 0.3937007874..., unit: "in" }
 */
export function toInches(length: Length): Quantity<"in"> {
  return { value: length.value * IN_PER[length.unit], unit: "in" };
}

/**
 * Converts inches to another length unit.
 *
 * @example
 * fromInches(12, "ft"); // { value: 1, unit: "ft" }
 */
export function fromInches<U extends LengthUnit>(inches: number, unit: U): Quantity<U> {
  return { value: inches / IN_PER[unit], unit };
}

/**
 * Converts a length to feet.
 *
 * @example
 * toFeet({ value: 6.096, unit: "m" }).value; // ≈ 20
 */
export function toFeet(length: Length): Quantity<"ft"> {
  return fromInches(toInches(length).value, "ft");
}

/**
 * Converts a length to millimetres.
 *
 * @example
 * toMillimetres({ value: 3 / 8, unit: "in" }); // { value: 9.525, unit: "mm" }
 */
export function toMillimetres(length: Length): Quantity<"mm"> {
  return fromInches(toInches(length).value, "mm");
}

/**
 * Rounds away binary floating-point noise left by unit conversions, to a millionth of the
 * unit. The engine applies it to every converted input, so 4,535.9237 kg compares as
 * exactly 10,000 lb and 6.096 m as exactly 20 ft.
 *
 * @example
 * settle(10000.000000000002); // 10000
 */
export function settle(value: number): number {
  return Math.round(value * 1e6) / 1e6;
}
