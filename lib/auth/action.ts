import "server-only";
import { unstable_rethrow } from "next/navigation";
import type { ZodType } from "zod";
import { AppError, zodIssues } from "@/lib/http/errors";
import { DATABASE_DOWN, isConnectionFailure } from "@/lib/http/unavailable";
import type { FormState } from "@/lib/forms/state";
import { can, type Permission } from "./roles";
import { getPrincipal, type Principal } from "./session";

const SECRET_FIELDS = /password|token/i;

function echo(formData: FormData): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [key, value] of formData.entries()) {
    if (typeof value === "string" && !SECRET_FIELDS.test(key) && !key.startsWith("$")) values[key] = value;
  }
  return values;
}

/** The form-wide line of a refused form: the first problem itself, never a bare "fix the fields". */
function fixThis(issues: { message: string }[]): string {
  if (!issues.length) return "Check your answers and send them again.";
  const more = issues.length - 1;
  return more ? `${issues[0].message} (${more} more ${more === 1 ? "answer needs" : "answers need"} fixing: each is marked.)` : issues[0].message;
}

function toState(error: AppError, values: Record<string, string>): FormState {
  const fieldErrors: Record<string, string> = {};
  for (const issue of error.issues) fieldErrors[issue.path] ??= issue.message;
  return { ok: false, message: error.message, fieldErrors, values };
}

/**
 * Wraps a server action: session, permission, zod parse of the form, then the body.
 * Next checks the Origin header of every server action (its CSRF defence).
 */
export function formAction<T>(
  permission: Permission,
  schema: ZodType<T>,
  body: (input: T, principal: Principal) => Promise<FormState | void>,
) {
  return run<T>(permission, schema, (input, principal) => body(input, principal!));
}

/** A form anyone may submit (sign-in, sign-up, password reset). */
export function publicFormAction<T>(
  schema: ZodType<T>,
  body: (input: T, principal: Principal | null) => Promise<FormState | void>,
) {
  return run<T>(null, schema, body);
}

function run<T>(
  permission: Permission | null,
  schema: ZodType<T>,
  body: (input: T, principal: Principal | null) => Promise<FormState | void>,
) {
  return async (_previous: FormState, formData: FormData): Promise<FormState> => {
    const values = echo(formData);
    try {
      const principal = await getPrincipal();
      if (permission) {
        if (!principal) return { ok: false, message: "Your session has ended. Sign in again.", values };
        if (!can(principal, permission)) return { ok: false, message: "Your role does not allow this.", values };
      }
      const parsed = schema.safeParse(Object.fromEntries(formData.entries()));
      if (!parsed.success) {
        const issues = zodIssues(parsed.error);
        return toState(new AppError(400, fixThis(issues), issues), values);
      }
      return (await body(parsed.data, principal)) ?? { ok: true };
    } catch (error) {
      unstable_rethrow(error); // let redirect() and notFound() through
      if (error instanceof AppError) return toState(error, values);
      if (isConnectionFailure(error)) return { ok: false, message: DATABASE_DOWN, values };
      console.error(error);
      return { ok: false, message: "Something went wrong on our side. Try again.", values };
    }
  };
}
