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
  readonly expected?: string;
  readonly input?: unknown;
  readonly origin?: string;
  readonly minimum?: number | bigint;
  readonly maximum?: number | bigint;
  readonly inclusive?: boolean;
  readonly values?: ReadonlyArray<unknown>;
  readonly format?: string;
  readonly divisor?: number;
}

/** zod's own English ("Invalid input: expected number, received NaN"), written for developers. */
const ZOD_DEFAULT = /^(Invalid\b|Too (small|big):|Unrecognized key)/;

/**
 * Plain words for an issue that kept zod's default message, so that no developer wording
 * reaches a person: the schema's own messages are kept as they are.
 *
 * @example plainWords({ path: ["cost"], code: "invalid_type", expected: "number", input: NaN, message: "Invalid input: expected number, received NaN" })
 * // "Enter a number."
 */
export function plainWords(issue: ZodLikeIssue): string {
  if (!ZOD_DEFAULT.test(issue.message)) return issue.message;
  const min = issue.minimum === undefined ? undefined : Number(issue.minimum);
  const max = issue.maximum === undefined ? undefined : Number(issue.maximum);
  const n = (v: number) => v.toLocaleString("en-US");
  switch (issue.code) {
    case "invalid_type":
      // zod leaves the input out of its issues unless asked; its message names what came.
      if (/received (undefined|null)\b/.test(issue.message) || ("input" in issue && (issue.input === undefined || issue.input === null))) return "Fill this in.";
      if (issue.expected === "number" || issue.expected === "int" || issue.expected === "bigint") return "Enter a number, in figures.";
      if (issue.expected === "boolean") return "Answer yes or no.";
      if (issue.expected === "date") return "Enter a date as YYYY-MM-DD.";
      if (issue.expected === "string") return "Enter this as text.";
      return "This answer is not in the form expected.";
    case "too_small":
      if (issue.origin === "string") return min !== undefined && min <= 1 ? "Fill this in." : `Write at least ${n(min ?? 1)} characters.`;
      if (issue.origin === "array" || issue.origin === "set") return min !== undefined && min <= 1 ? "Choose at least one." : `Choose at least ${n(min ?? 1)}.`;
      if (min === undefined) return "That number is too small.";
      return issue.inclusive === false ? `Enter a number greater than ${n(min)}.` : `Enter a number of at least ${n(min)}.`;
    case "too_big":
      if (issue.origin === "string") return `Keep this to ${n(max ?? 0)} characters or fewer.`;
      if (issue.origin === "array" || issue.origin === "set") return `Choose at most ${n(max ?? 0)}.`;
      if (max === undefined) return "That number is too large.";
      return issue.inclusive === false ? `Enter a number less than ${n(max)}.` : `Enter a number of at most ${n(max)}.`;
    case "invalid_value":
    case "invalid_enum_value":
      return issue.values?.length ? `Choose one of: ${issue.values.map(String).join(", ")}.` : "Choose one of the answers offered.";
    case "invalid_format":
      if (issue.format === "email") return "Enter an e-mail address, like name@example.com.";
      if (issue.format === "uuid" || issue.format === "guid") return "Choose from the list.";
      if (issue.format === "date") return "Enter the date as YYYY-MM-DD.";
      if (issue.format === "datetime") return "Enter the date and time as YYYY-MM-DD HH:MM.";
      if (issue.format === "url") return "Enter a web address starting with https://.";
      return "This is not written the way it is expected; check it.";
    case "not_multiple_of":
      return issue.divisor === 1 ? "Enter a whole number." : `Enter a multiple of ${issue.divisor}.`;
    case "unrecognized_keys":
      return "This field is not known here.";
    default:
      return "Check this answer.";
  }
}

/**
 * zod issues as `{ path, message }` with dotted paths, zod's default English replaced by plain
 * words ({@link plainWords}). An unknown key in a strict object is reported at its own path
 * ("tiedowns.0.components.1.wl"), one issue per key.
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
    return [{ path, message: plainWords(issue) }];
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
