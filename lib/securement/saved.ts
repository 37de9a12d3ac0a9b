/**
 * Saved load checks: what a save sends, who may change one, and the answer for one saved
 * check, worked out afresh against the current rules (a table corrected since the check
 * was saved shows in its answer; `passAtSave` keeps the verdict it had then).
 *
 * Who may do what (decision): every role may run checks, so every role may save, list,
 * open and print the organisation's saved checks. Changing or deleting one is for the
 * person who saved it, or for those who manage kits (owner, planner: a saved check is a
 * plan for a load, as a kit is).
 *
 * @module
 */
import { z } from "zod";
import type { FieldIssue } from "@/lib/field-issues";
import type { SecurementCheckResult } from "./check";
import { checkSecurement } from "./check";
import { RequestValidationError } from "./errors";
import type { SecurementCheckRequest } from "./request";
import { securementCheckRequestSchema } from "./schema";

/**
 * The body of a save (`POST /api/v1/securement-checks/saved`) or a change (`PUT …/saved/{id}`):
 * a name and the request exactly as `POST /api/v1/securement-checks` takes it.
 *
 * @example
 * savedCheckInputSchema.parse({ name: "Unit 12 on the 20 ft tilt", request });
 */
export const savedCheckInputSchema = z.strictObject({
  name: z.string({ error: "Give the check a name" }).trim().min(1, { error: "Give the check a name" }).max(80, { error: "Keep the name under 80 characters" }),
  request: securementCheckRequestSchema,
});

/**
 * A save as the schema parses it.
 *
 * @example
 * const input: SavedCheckInput = savedCheckInputSchema.parse(body);
 */
export type SavedCheckInput = z.infer<typeof savedCheckInputSchema>;

/**
 * Whether a person may change or delete a saved check: their own, or any if they manage kits.
 *
 * @example
 * maySaveOver({ userId: "u1", mayChangeAny: false }, "u1"); // true
 * maySaveOver({ userId: "u2", mayChangeAny: false }, "u1"); // false
 */
export function maySaveOver(actor: { readonly userId: string; readonly mayChangeAny: boolean }, savedById: string): boolean {
  return actor.mayChangeAny || actor.userId === savedById;
}

/**
 * A saved check as stored (db/saved-checks.ts), the part this module reads.
 *
 * @example
 * const row: StoredCheck = { id, name: "Unit 12", passAtSave: true, savedById: "u1", savedBy: "Yara", savedAt, updatedBy: "Yara", updatedAt, request };
 */
export interface StoredCheck {
  readonly id: string;
  readonly name: string;
  readonly passAtSave: boolean;
  readonly savedById: string;
  readonly savedBy: string;
  readonly savedAt: Date;
  readonly updatedBy: string;
  readonly updatedAt: Date;
  readonly request: unknown;
}

/**
 * One saved check for its reader: the stored request, the answer of the check worked out
 * now (`result`, the shape `POST /api/v1/securement-checks` answers), and whether this
 * reader may change it. A stored request that today's schema refuses has `result: null`
 * and its `issues`.
 *
 * @example
 * const a: SavedCheckAnswer = savedCheckAnswer(row, true);
 * a.result?.pass;
 */
export interface SavedCheckAnswer {
  readonly id: string;
  readonly name: string;
  readonly passAtSave: boolean;
  readonly savedBy: string;
  readonly savedAt: string;
  readonly updatedBy: string;
  readonly updatedAt: string;
  readonly mayChange: boolean;
  readonly request: SecurementCheckRequest;
  readonly result: SecurementCheckResult | null;
  readonly issues?: readonly FieldIssue[];
}

/**
 * The answer for one saved check (see {@link SavedCheckAnswer}).
 *
 * @example
 * savedCheckAnswer(await getSavedCheck(org, id), maySaveOver(actor, row.savedById));
 */
export function savedCheckAnswer(row: StoredCheck, mayChange: boolean): SavedCheckAnswer {
  const base = {
    id: row.id,
    name: row.name,
    passAtSave: row.passAtSave,
    savedBy: row.savedBy,
    savedAt: new Date(row.savedAt).toISOString(),
    updatedBy: row.updatedBy,
    updatedAt: new Date(row.updatedAt).toISOString(),
    mayChange,
    request: row.request as SecurementCheckRequest,
  };
  try {
    return { ...base, result: checkSecurement(base.request) };
  } catch (error) {
    if (!(error instanceof RequestValidationError)) throw error;
    return { ...base, result: null, issues: error.issues };
  }
}
