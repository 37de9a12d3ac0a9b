import { z } from "zod";
import { IMPORT_FIELDS } from "./fields";

// The parameters of POST /api/v1/imports (query string or multipart fields) and of saved
// mappings, shared by the route handlers and the import screens.

const flag = z
  .enum(["true", "false", "1", "0", "on", ""], { error: "Use true or false." })
  .optional()
  .transform((v) => v === "true" || v === "1" || v === "on");

const fieldOrNull = z.union([z.enum(IMPORT_FIELDS), z.null()], { error: `A column maps to one of ${IMPORT_FIELDS.join(", ")}, or to null (not imported).` });

export const columnMappingSchema = z.record(z.string().max(200), fieldOrNull, { error: 'The mapping is an object: { "CSV header": "field" or null }.' });

export const importParamsSchema = z.object({
  dryRun: flag,
  validOnly: flag,
  batchId: z.preprocess((v) => (v === "" ? undefined : v), z.uuid("batchId is a UUID chosen by the caller, or left out.").optional()),
  mapping: z.preprocess((v, ctx) => {
    if (v === undefined || v === "") return undefined;
    try {
      return JSON.parse(String(v));
    } catch {
      ctx.addIssue({ code: "custom", message: 'The mapping is not JSON: send { "CSV header": "field" or null }.' });
      return z.NEVER;
    }
  }, columnMappingSchema.optional()),
});

export const savedMappingSchema = z.object({
  name: z.string({ error: "Give the mapping a name." }).trim().min(1, "Give the mapping a name, e.g. the supplier's.").max(80, "Keep the name under 80 characters."),
  mapping: columnMappingSchema,
});
