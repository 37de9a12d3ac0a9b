/**
 * One problem with one field of a request or a form, and the one function that turns zod
 * issues into them. Pure and framework-free, so the route wrapper (lib/http), the
 * securement engine (lib/securement) and the browser (lib/http/client.ts, the forms) share it.
 *
 * @module
 */

/**
 * One problem with a request, at a dotted path such as `tiedowns.0.components.1.wll`
 * ("" for the request as a whole). Every 400 answers `issues: FieldIssue[]`.
 *
 * @example
 * const issue: FieldIssue = { path: "cargo.weight.value", message: "The value must be greater than 0" };
 */
export interface FieldIssue {
  readonly path: string;
  readonly message: string;
}

/** The part of a zod issue this module reads (zod itself is not imported: any version's issues fit). */
interface ZodLikeIssue {
  readonly path: ReadonlyArray<PropertyKey>;
  readonly message: string;
  readonly code?: string;
  readonly keys?: ReadonlyArray<string>;
}

/**
 * zod issues as `{ path, message }` with dotted paths. An unknown key in a strict object is
 * reported at its own path ("tiedowns.0.components.1.wl"), one issue per key.
 *
 * @example
 * const r = securementCheckRequestSchema.safeParse(body);
 * if (!r.success) zodIssues(r.error);
 * // [{ path: "tiedowns.0.components.1.wll.value", message: "The value must be greater than 0" }]
 */
export function zodIssues(error: { readonly issues: ReadonlyArray<ZodLikeIssue> }): FieldIssue[] {
  return error.issues.flatMap((issue) => {
    const path = issue.path.map(String).join(".");
    if (issue.code === "unrecognized_keys" && issue.keys?.length) {
      return issue.keys.map((key) => ({ path: path ? `${path}.${key}` : key, message: `Unknown field "${key}"` }));
    }
    return [{ path, message: issue.message }];
  });
}

/**
 * The first issue at a path or below it ("tiedowns.0.components.1.wll" also finds
 * "tiedowns.0.components.1.wll.value").
 *
 * @example
 * issueAt([{ path: "cargo.weight.value", message: "The value must be a number" }], "cargo.weight");
 * // "The value must be a number"
 */
export function issueAt(issues: readonly FieldIssue[] | undefined, path: string): string | undefined {
  return issues?.find((i) => i.path === path || i.path.startsWith(`${path}.`))?.message;
}
