import { isUuid } from "./ids";

// One error type for every refusal the app makes on purpose. Route handlers turn it into
// a JSON body with its status; server actions turn it into a message on the form.

export interface FieldIssue {
  path: string;
  message: string;
}

export class AppError extends Error {
  /**
   * `extra` holds a few more top-level fields for the JSON body (e.g. `nearest` sizes);
   * they never replace `error` or `issues`.
   */
  constructor(
    readonly status: 400 | 401 | 403 | 404 | 409 | 410 | 413 | 415 | 422 | 429,
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

interface ZodLikeIssue {
  path: ReadonlyArray<PropertyKey>;
  message: string;
  code?: string;
  keys?: ReadonlyArray<string>;
}

/**
 * zod issues as `{ path: "tiedowns.0.wll", message }`, the shape every 400 uses. An unknown
 * key in a strict object is reported at its own path ("tiedowns.0.components.1.wl").
 */
export function zodIssues(error: { issues: ReadonlyArray<ZodLikeIssue> }): FieldIssue[] {
  return error.issues.flatMap((issue) => {
    const path = issue.path.map(String).join(".");
    if (issue.code === "unrecognized_keys" && issue.keys?.length) {
      return issue.keys.map((key) => ({ path: path ? `${path}.${key}` : key, message: `Unknown field "${key}"` }));
    }
    return [{ path, message: issue.message }];
  });
}

/** A route's id parameter; anything that is not a UUID is simply not found. */
export function uuidParam(value: string | undefined, what = "item"): string {
  if (!isUuid(value)) throw notFound(`No such ${what}.`);
  return value;
}
