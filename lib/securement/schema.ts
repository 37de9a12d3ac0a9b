/**
 * Zod 4 schemas for the securement check request and the ratings query. A ZodError becomes
 * `{ path, message }` pairs for a 400 answer through `zodIssues` (lib/field-issues.ts).
 *
 * Schema-level problems (wrong type, unknown unit, unreadable size or grade, a `secures`
 * that names no declared accessory, unknown keys) are zod issues. A size that reads well but
 * is not a table row is not a schema problem: the check reports it as a `SIZE_NOT_IN_TABLE`
 * finding, and the ratings lookup throws a `RatingError`.
 *
 * Objects are strict (unknown keys are rejected): a misspelt `wll` would otherwise be
 * dropped silently and the part rated as unmarked.
 *
 * @module
 */
import { z } from "zod";
import { ATTACHMENTS } from "./aggregate";
import { parseGrade } from "./grades";
import type { Component, SecurementCheckRequest } from "./request";
import { tryParseSize } from "./sizes";
import { ROPE_FIBRES } from "./tables";
import { LENGTH_UNITS, WEIGHT_UNITS } from "./units";

const positive = (what: string) =>
  z
    .number({ error: `${what} must be a number` })
    .refine(Number.isFinite, { error: `${what} must be a finite number` })
    .refine((v) => v > 0, { error: `${what} must be greater than 0` });

/**
 * A weight or WLL: `{ value, unit }` with unit lb, kg or daN.
 *
 * @example
 * weightSchema.parse({ value: 5400, unit: "lb" });
 */
export const weightSchema = z.strictObject({
  value: positive("The value"),
  unit: z.enum(WEIGHT_UNITS, { error: "The unit must be lb, kg or daN" }),
});

/**
 * A length: `{ value, unit }` with unit in, ft, mm or m.
 *
 * @example
 * lengthSchema.parse({ value: 16, unit: "ft" });
 */
export const lengthSchema = z.strictObject({
  value: positive("The value"),
  unit: z.enum(LENGTH_UNITS, { error: "The unit must be in, ft, mm or m" }),
});

/**
 * A size in the trade's notation ("3/8 in", "10 mm", "1 3/4") or a number of inches.
 *
 * @example
 * sizeSchema.parse("3/8 in");
 */
export const sizeSchema = z
  .union([z.string().trim().min(1, { error: "The size is empty" }).max(40), z.number()], { error: "The size must be text such as \"3/8 in\" or a number of inches" })
  .refine((v) => tryParseSize(v) !== undefined, { error: "Cannot read this size; write it as 3/8, 3/8 in, 1 3/4 in, 0.375 or 10 mm" });

/**
 * A chain (or hook, shackle) grade: 30, 43, 70, 80, 100, or a mark form such as "G70" or 7.
 *
 * @example
 * gradeSchema.parse("G70");
 */
export const gradeSchema = z
  .union([z.number().int().positive(), z.string().trim().min(1).max(20)], { error: "The grade must be a number such as 70, or text such as \"G70\"" })
  .refine((v) => parseGrade(v) !== undefined, { error: "Cannot read this grade; write it as 30, 43, 70, 80 or 100 (or G70)" });

/**
 * The schema with zod's generated validator (`z.compile`): one function written for this
 * shape, about three times faster than walking the schema for a valid request. A request it
 * refuses is parsed again by the schema itself, so every issue, path and message is zod's
 * usual one. On the server only: the generator uses `new Function`, which the pages'
 * Content-Security-Policy forbids in the browser (where zod runs jitless:
 * components/providers/zod-without-eval.tsx).
 */
function serverCompiled<T extends z.ZodType>(schema: T): T {
  return typeof window === "undefined" ? z.compile(schema) : schema;
}

const label = z.string().trim().max(80).optional();
const base = { wll: weightSchema.optional(), label, gearId: z.string().max(100).optional() };
const markedFlag = z.boolean().optional();

/**
 * One tiedown component, told apart by `type`.
 *
 * @example
 * componentSchema.parse({ type: "binder", wll: { value: 5400, unit: "lb" }, chainSizeRange: ["5/16 in", "3/8 in"] });
 */
export const componentSchema = z.discriminatedUnion("type", [
  z.strictObject({ type: z.literal("chain"), grade: gradeSchema.optional(), size: sizeSchema.optional(), marked: markedFlag, ...base }),
  z.strictObject({ type: z.literal("webbing"), width: sizeSchema.optional(), marked: markedFlag, ...base }),
  z.strictObject({
    type: z.literal("wire-rope"),
    size: sizeSchema.optional(),
    marked: markedFlag,
    construction: z.string().trim().min(1, { error: "The construction is empty" }).max(40).optional(),
    nominalStrength: weightSchema.optional(),
    ...base,
  }),
  z.strictObject({ type: z.literal("rope"), fibre: z.enum(ROPE_FIBRES).optional(), size: sizeSchema.optional(), marked: markedFlag, ...base }),
  z.strictObject({ type: z.literal("steel-strapping"), width: sizeSchema.optional(), thickness: sizeSchema.optional(), marked: markedFlag, ...base }),
  z.strictObject({ type: z.literal("binder"), chainSizeRange: z.tuple([sizeSchema, sizeSchema]).optional(), ...base }),
  z.strictObject({ type: z.literal("hook"), grade: gradeSchema.optional(), ...base }),
  z.strictObject({ type: z.literal("shackle"), grade: gradeSchema.optional(), ...base }),
  z.strictObject({ type: z.literal("anchor"), ...base }),
], { error: "The component type must be chain, webbing, wire-rope, rope, steel-strapping, binder, hook, shackle or anchor" });

/**
 * One tiedown.
 *
 * @example
 * tiedownSchema.parse({ attachment: "direct", components: [{ type: "chain", grade: 70, size: "3/8" }] });
 */
export const tiedownSchema = z.strictObject({
  label,
  attachment: z.enum(ATTACHMENTS, { error: "The attachment must be direct, indirect-same-side or indirect-across" }),
  secures: z.string().trim().min(1).max(40).optional(),
  components: z.array(componentSchema).min(1, { error: "A tiedown needs at least one component" }).max(20),
});

/**
 * The cargo (the article being secured).
 *
 * @example
 * cargoSchema.parse({ weight: { value: 9800, unit: "lb" }, length: { value: 16, unit: "ft" }, kind: "machine" });
 */
export const cargoSchema = z.strictObject({
  weight: weightSchema,
  length: lengthSchema,
  kind: z.enum(["machine", "general"], { error: "The kind must be machine or general" }),
  blockedAtFront: z.boolean().optional(),
  articulated: z.boolean().optional(),
  articulationRestrained: z.boolean().optional(),
  accessories: z.array(z.string().trim().min(1).max(40)).max(10).optional(),
});

/**
 * The securement check request. Beyond the field checks: accessory names must be unique,
 * "machine" is not an accessory name, and a tiedown's `secures` must be "machine" or a
 * declared accessory.
 *
 * @example
 * const parsed = securementCheckRequestSchema.safeParse(body);
 * if (!parsed.success) return Response.json({ issues: zodIssues(parsed.error) }, { status: 400 });
 * return Response.json(checkSecurement(parsed.data));
 */
export const securementCheckRequestSchema = serverCompiled(z
  .strictObject({
    cargo: cargoSchema,
    tiedowns: z.array(tiedownSchema).max(100),
  })
  .superRefine((req, ctx) => {
    const accessories = req.cargo.accessories ?? [];
    const seen = new Set<string>();
    accessories.forEach((a, i) => {
      const key = a.toLowerCase();
      if (key === "machine") ctx.addIssue({ code: "custom", path: ["cargo", "accessories", i], message: "\"machine\" is the machine itself, not an accessory" });
      if (seen.has(key)) ctx.addIssue({ code: "custom", path: ["cargo", "accessories", i], message: `Accessory "${a}" is listed twice` });
      seen.add(key);
    });
    req.tiedowns.forEach((t, i) => {
      if (t.secures === undefined || t.secures.toLowerCase() === "machine") return;
      if (!seen.has(t.secures.toLowerCase())) {
        ctx.addIssue({
          code: "custom",
          path: ["tiedowns", i, "secures"],
          message: `"${t.secures}" is not a declared accessory; use "machine" or one of: ${accessories.length ? accessories.join(", ") : "(no accessories declared)"}`,
        });
      }
    });
  }));

/**
 * The ratings lookup query (e.g. from a query string: every field may come as text). The
 * fields needed depend on the material: chain → size (grade optional: none means grade 30);
 * webbing → width; wire-rope → size; rope → size (fibre optional: none means
 * polypropylene); steel-strapping → width and thickness.
 *
 * @example
 * ratingQuerySchema.safeParse({ material: "chain", grade: "70", size: "3/8" });
 */
export const ratingQuerySchema = serverCompiled(z
  .strictObject({
    material: z.enum(["chain", "webbing", "wire-rope", "rope", "steel-strapping"], { error: "The material must be chain, webbing, wire-rope, rope or steel-strapping" }),
    grade: gradeSchema.optional(),
    size: sizeSchema.optional(),
    width: sizeSchema.optional(),
    thickness: sizeSchema.optional(),
    fibre: z.enum(ROPE_FIBRES, { error: `The fibre must be one of: ${ROPE_FIBRES.join(", ")}` }).optional(),
  })
  .superRefine((q, ctx) => {
    const need = (field: "size" | "width" | "thickness") => {
      if (q[field] === undefined) ctx.addIssue({ code: "custom", path: [field], message: `A ${field} is needed for ${q.material}` });
    };
    if (q.material === "chain" || q.material === "wire-rope" || q.material === "rope") need("size");
    if (q.material === "webbing" || q.material === "steel-strapping") need("width");
    if (q.material === "steel-strapping") need("thickness");
  }));

/**
 * The request type as the schema parses it.
 *
 * @example
 * const req: SecurementCheckRequestInput = securementCheckRequestSchema.parse(body);
 */
export type SecurementCheckRequestInput = z.infer<typeof securementCheckRequestSchema>;

/**
 * The ratings query type as the schema parses it.
 *
 * @example
 * const q: RatingQueryInput = ratingQuerySchema.parse({ material: "webbing", width: "4 in" });
 */
export type RatingQueryInput = z.infer<typeof ratingQuerySchema>;

// Compile-time guarantee that what the schema parses is what the engine reads.
type Assert<T extends true> = T;
type _SchemaMatchesRequest = Assert<SecurementCheckRequestInput extends SecurementCheckRequest ? true : false>;
type _SchemaMatchesComponent = Assert<z.infer<typeof componentSchema> extends Component ? true : false>;
