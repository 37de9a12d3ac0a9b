import type { FieldIssue } from "@/lib/field-issues";
import { isUuid } from "./ids";

// One error type for every refusal the app makes on purpose. Route handlers turn it into
// a JSON body with its status; server actions turn it into a message on the form.

// The one zod-issue mapper and its issue type live in lib/field-issues.ts (shared with the
// securement engine and the browser); re-exported here for the route and action wrappers.
export { zodIssues, type FieldIssue } from "@/lib/field-issues";

export class AppError extends Error {
  /**
   * `extra` holds a few more top-level fields for the JSON body (e.g. `nearest` sizes);
   * they never replace `error` or `issues`.
   */
  constructor(
    readonly status: 400 | 401 | 403 | 404 | 409 | 410 | 413 | 415 | 422 | 429 | 503,
    message: string,
    readonly issues: FieldIssue[] = [],
    readonly extra: Readonly<Record<string, unknown>> = {},
  ) {
    super(message);
    this.name = "AppError";
  }
}

export const badRequest = (message: string, issues: FieldIssue[] = []) => new AppError(400, message, issues);
export const fieldError = (path: string, message: string) => new AppError(400, message, [{ path, message }]);
export const unauthorized = (message = "Sign in first.") => new AppError(401, message);
export const forbidden = (message = "Your role does not allow this.") => new AppError(403, message);
export const notFound = (message = "Not found.") => new AppError(404, message);
export const conflict = (message: string, issues: FieldIssue[] = []) => new AppError(409, message, issues);
export const gone = (message: string) => new AppError(410, message);
export const tooManyRequests = (message: string) => new AppError(429, message);

/** A route's id parameter; anything that is not a UUID is simply not found. */
export function uuidParam(value: string | undefined, what = "item"): string {
  if (!isUuid(value)) throw notFound(`No such ${what}.`);
  return value;
}
