/**
 * Typed errors of the securement engine, shaped so an API route can answer 4xx with them.
 *
 * @module
 */
import type { FieldIssue } from "@/lib/field-issues";

/**
 * Stable codes of {@link RatingError}.
 *
 * - `INVALID_SIZE`: a size string that cannot be read ("3/8 foo", "", "-1").
 * - `SIZE_NOT_IN_TABLE`: a size that is not a row of the 49 CFR 393.108 table (names the nearest rows).
 * - `UNKNOWN_GRADE`: a chain grade that is not a column of the chain table (30, 43, 70, 80, 100).
 * - `MISSING_SIZE`: a table lookup without the size, width or thickness it needs.
 * - `MISSING_WLL`: a binder, hook, shackle or anchor without a marked WLL (no 393.108 table covers them).
 * - `UNKNOWN_FIBRE`: a rope fibre that has no table.
 * - `UNKNOWN_MATERIAL`: a material with no table.
 *
 * @example
 * const code: RatingErrorCode = "SIZE_NOT_IN_TABLE";
 */
export type RatingErrorCode =
  | "INVALID_SIZE"
  | "SIZE_NOT_IN_TABLE"
  | "UNKNOWN_GRADE"
  | "MISSING_SIZE"
  | "MISSING_WLL"
  | "UNKNOWN_FIBRE"
  | "UNKNOWN_MATERIAL";

/**
 * A rating could not be determined. Thrown by {@link defaultRating}, {@link componentWll} and
 * {@link parseSize}; `checkSecurement` turns it into a `fail` finding instead of throwing.
 *
 * `nearest` lists the nearest table sizes (labels such as "1/2 in") when the code is
 * `SIZE_NOT_IN_TABLE`; `field` names the request field at fault ("size", "width", "wll", ...).
 *
 * @example
 * try {
 *   defaultRating({ material: "chain", grade: 70, size: "9/16 in" });
 * } catch (e) {
 *   if (e instanceof RatingError) {
 *     e.code;    // "SIZE_NOT_IN_TABLE"
 *     e.nearest; // ["1/2 in", "5/8 in"]
 *   }
 * }
 */
export class RatingError extends Error {
  readonly code: RatingErrorCode;
  readonly nearest: readonly string[];
  readonly field: string | undefined;

  constructor(
    code: RatingErrorCode,
    message: string,
    options: { nearest?: readonly string[]; field?: string } = {},
  ) {
    super(message);
    this.name = "RatingError";
    this.code = code;
    this.nearest = options.nearest ?? [];
    this.field = options.field;
  }

  /**
   * A plain object for a JSON error body.
   *
   * @example
   * new RatingError("MISSING_WLL", "A binder must carry a marked WLL", { field: "wll" }).toJSON();
   * // { code: "MISSING_WLL", message: "A binder must carry a marked WLL", nearest: [], field: "wll" }
   */
  toJSON(): { code: RatingErrorCode; message: string; nearest: string[]; field?: string } {
    return {
      code: this.code,
      message: this.message,
      nearest: [...this.nearest],
      ...(this.field === undefined ? {} : { field: this.field }),
    };
  }
}

/**
 * A request that does not match the request schema. `checkSecurement` throws it when it is
 * called with a body that was not validated first; `issues` carries dotted paths for a 400.
 *
 * @example
 * try {
 *   checkSecurement(body as SecurementCheckRequest);
 * } catch (e) {
 *   if (e instanceof RequestValidationError) return Response.json({ issues: e.issues }, { status: 400 });
 *   throw e;
 * }
 */
export class RequestValidationError extends Error {
  readonly issues: readonly FieldIssue[];

  constructor(issues: readonly FieldIssue[]) {
    super(
      `The securement check request is not valid: ${issues
        .map((i) => `${i.path || "(request)"}: ${i.message}`)
        .join("; ")}`,
    );
    this.name = "RequestValidationError";
    this.issues = issues;
  }
}
