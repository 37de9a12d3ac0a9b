import { z } from "zod";
import { parseGrade, tryParseSize } from "@/lib/securement";
import { toLb, toMillimetres } from "@/lib/securement/units";
import { ITEM_KINDS, type ItemKind } from "./labels";
import { itemRating } from "./rating";

// One schema for an item, used by the add/edit forms, the JSON API and (later) the CSV
// import, so all three refuse the same input with the same words.

const blank = (v: unknown) => (v === "" || v === null ? undefined : v);

const sizeValue = (what: string) =>
  z.union([z.string(), z.number()], { error: `Enter the ${what}.` }).transform((v, ctx) => {
    const parsed = tryParseSize(v);
    if (!parsed) {
      ctx.addIssue({ code: "custom", message: `Write the ${what} as the trade does: 3/8, 3/8 in, 10 mm or 0.375.` });
      return z.NEVER;
    }
    return parsed.label;
  });

const sizeText = (what: string) => z.preprocess(blank, sizeValue(what).optional());

// JSON numbers are numbers: true, [5] or "5" is refused, never coerced (the forms send text,
// which itemFormToInput turns into numbers first).
const weight = z.object({
  value: z.number({ error: "Enter the WLL as a number." }).positive("The WLL must be more than 0.").max(200_000, "That WLL is beyond any tiedown part; check the figure."),
  unit: z.enum(["lb", "kg"], { error: "The WLL unit is lb or kg." }),
});

const length = z.object({
  value: z.number({ error: "Enter the length as a number." }).positive("The length must be more than 0.").max(200, "That length is too long for a tiedown; check the figure."),
  unit: z.enum(["ft", "m", "in", "mm"], { error: "The length unit is ft, m, in or mm." }),
});

/** How far ahead an in-service date may be: gear bought for next season, not a typing slip. */
export const IN_SERVICE_DAYS_AHEAD = 366;

const DAY_MS = 86_400_000;
const EARLIEST_IN_SERVICE = Date.parse("1950-01-01");

/** The latest in-service date accepted at `now` (ms), as the time of its UTC midnight. */
function latestInServiceTime(now: number): number {
  return Math.floor((now + IN_SERVICE_DAYS_AHEAD * DAY_MS) / DAY_MS) * DAY_MS;
}

/**
 * The latest in-service date accepted on a day (UTC; a day's slack either side of any zone).
 * @example latestInServiceDate(new Date("2026-12-01T12:00:00Z")) // "2027-12-02"
 */
export function latestInServiceDate(now = new Date()): string {
  return new Date(latestInServiceTime(now.getTime())).toISOString().slice(0, 10);
}

// The bounds compare times, not texts: no date text is made for each row of an import, and a
// text that is no date at all (NaN) gets the format's words alone, not "cannot be after" too.
const inServiceDate = z
  .iso.date("Enter the date as YYYY-MM-DD.")
  .refine((d) => !(Date.parse(d) < EARLIEST_IN_SERVICE), "The in-service date cannot be before 1950.")
  .refine((d) => !(Date.parse(d) > latestInServiceTime(Date.now())), {
    error: () => `The in-service date cannot be after ${latestInServiceDate()}, a year from today.`,
  });

// Kept once, not made again for every item checked (an import checks 100,000).
const ITEM_GRADES = new Set([30, 43, 70, 80, 100]);
const GRADE_STAMPED = new Set<ItemKind>(["chain", "hook"]);
const SIZED = new Set<ItemKind>(["chain", "web-strap", "wire-rope", "hook", "shackle"]);
/** Kinds with no size table: without a marked WLL, it is the marking that is missing. */
const RATED_BY_MARKING = new Set<ItemKind>(["binder", "shackle", "rated-item", "hook"]);

export const itemInputSchema = z
  .object({
    kind: z.enum(ITEM_KINDS, { error: "Choose what kind of item this is." }),
    marking: z.enum(["wll", "grade", "none"], { error: "Say what is marked on the item: its WLL, its grade only, or nothing." }),
    markedWll: z.preprocess(blank, weight.optional()),
    grade: z.preprocess(
      blank,
      z
        .union([z.string(), z.number()])
        .transform((v, ctx) => {
          const g = parseGrade(v);
          if (g === undefined || !ITEM_GRADES.has(g)) {
            ctx.addIssue({ code: "custom", message: "Grade is one of 30, 43, 70, 80 or 100 (as stamped: 3, 4, 7, 8, 10 are read too)." });
            return z.NEVER;
          }
          return g;
        })
        .optional(),
    ),
    size: sizeText("size"),
    chainSizeRange: z.preprocess(blank, z.tuple([sizeValue("smallest chain size"), sizeValue("largest chain size")]).optional()),
    mechanism: z.preprocess(blank, z.enum(["ratchet", "lever"], { error: "A binder is ratchet or lever." }).optional()),
    length: z.preprocess(blank, length.optional()),
    ends: z.preprocess(blank, z.string().trim().max(120, "Keep the end fittings under 120 characters.").optional()),
    serial: z.preprocess(blank, z.string().trim().max(80, "Keep the serial or lot under 80 characters.").optional()),
    yardId: z.preprocess(blank, z.uuid("Choose a yard from the list.").optional()),
    inServiceOn: z.preprocess(blank, inServiceDate.optional()),
    costCents: z.preprocess(
      blank,
      z.number({ error: "Enter the cost in whole cents, as a number." }).int("Cost is in whole cents.").min(0, "Cost cannot be negative.").max(100_000_000, "That cost is beyond any tiedown part; check the figure.").optional(),
    ),
  })
  .superRefine((v, ctx) => {
    const needs = (path: string, message: string) => ctx.addIssue({ code: "custom", path: [path], message });
    if (v.marking === "wll" && !v.markedWll) needs("markedWll", "Enter the WLL marked on the item.");
    if (v.marking !== "wll" && v.markedWll) needs("marking", "A WLL was entered: set the marking to 'WLL marked'.");
    if (GRADE_STAMPED.has(v.kind) && v.marking === "grade" && !v.grade) needs("grade", "Enter the grade stamped on the item.");
    if (SIZED.has(v.kind) && !v.size) {
      needs("size", v.kind === "web-strap" ? "Enter the webbing width, e.g. 2 or 4 (inches)." : "Enter the size, e.g. 3/8 or 10 mm.");
    }
    if (v.kind === "binder" && !v.chainSizeRange) needs("chainSizeRange", "Enter the chain sizes the binder takes, e.g. 5/16 to 3/8.");
    if (v.kind === "binder" && !v.mechanism) needs("mechanism", "Choose ratchet or lever.");
    if (ctx.issues?.length) return;
    // The rated-limit engine decides whether the item can be rated at all (49 CFR 393.108).
    const rating = itemRating(toRatable(v));
    if (rating.wllLb === null) {
      const field = v.marking === "wll" ? "markedWll" : RATED_BY_MARKING.has(v.kind) ? "marking" : "size";
      needs(field, rating.warnings[0] ?? "This item cannot be rated: enter its marked WLL.");
    }
  });

export type ItemInput = z.output<typeof itemInputSchema>;

/** The fields the rated-limit engine reads. */
export function toRatable(v: Pick<ItemInput, "kind" | "marking" | "markedWll" | "grade" | "size" | "chainSizeRange">) {
  return {
    kind: v.kind as ItemKind,
    grade: v.marking === "none" ? null : (v.grade ?? null),
    gradeMarked: v.marking !== "none",
    size: v.size ?? null,
    markedWllLb: v.markedWll ? toWholeLb(v.markedWll) : null,
    details: { chainSizeRange: v.chainSizeRange ?? null },
  };
}

/**
 * Pounds as stored (whole pounds). A kilogram marking is converted with the exact factor.
 * @example toWholeLb({ value: 2000, unit: "kg" }) // 4409
 */
export function toWholeLb(w: { value: number; unit: "lb" | "kg" }): number {
  return Math.round(toLb(w).value);
}

/**
 * A length as stored (whole millimetres).
 * @example toWholeMm({ value: 20, unit: "ft" }) // 6096
 */
export function toWholeMm(l: { value: number; unit: "ft" | "m" | "in" | "mm" }): number {
  return Math.round(toMillimetres(l).value);
}

/** Flat form fields (FormData) to the nested shape the schema reads. */
export function itemFormToInput(form: Record<string, unknown>) {
  const get = (k: string) => (typeof form[k] === "string" ? (form[k] as string) : undefined);
  // Forms post text; the schema takes numbers only. Text that is not a number stays NaN, which
  // the schema refuses with the field's own words.
  const number = (text?: string) => (text?.trim() ? Number(text.trim()) : undefined);
  const pair = <T extends string>(value?: string, unit?: T) => (value?.trim() ? { value: number(value), unit } : undefined);
  return {
    kind: get("kind"),
    marking: get("marking"),
    markedWll: pair(get("markedWllValue"), get("markedWllUnit")),
    grade: get("grade"),
    size: get("size"),
    chainSizeRange: get("rangeMin") || get("rangeMax") ? [get("rangeMin") ?? "", get("rangeMax") ?? ""] : undefined,
    mechanism: get("mechanism"),
    length: pair(get("lengthValue"), get("lengthUnit")),
    ends: get("ends"),
    serial: get("serial"),
    yardId: get("yardId"),
    inServiceOn: get("inServiceOn"),
    costCents: get("cost")?.trim() ? Math.round(Number(get("cost")!.trim()) * 100) : undefined,
  };
}

export const itemFormSchema = z.preprocess((v) => itemFormToInput(v as Record<string, unknown>), itemInputSchema);

/** Where an item lives and how its state changes. */
export const moveSchema = z.object({
  itemIds: z.array(z.uuid()).min(1, "Choose at least one item.").max(500, "Move at most 500 items at once."),
  yardId: z.uuid("Choose a yard."),
});
