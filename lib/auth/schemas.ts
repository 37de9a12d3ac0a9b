import { z } from "zod";
import { canonicalTimeZone } from "@/lib/time";
import { nameProblem } from "./names";
import { COMMON_PASSWORD, isCommonPassword, PASSWORD_IS_EMAIL, passwordProblem } from "./password-policy";
import { ROLES } from "./roles";

// Shared by forms (server actions) and the JSON API, so both refuse the same input.
export const emailField = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  .min(1, "Enter an e-mail address.")
  .pipe(z.email("Enter a valid e-mail address, like name@example.com."));

export const passwordField = z
  .string({ error: "Enter a password." })
  .min(10, "Use at least 10 characters for the password.")
  .max(200, "Use at most 200 characters for the password.")
  .refine((p) => !isCommonPassword(p), COMMON_PASSWORD);

/** A person's or an organisation's name (lib/auth/names.ts says what it may hold). */
export const nameField = z
  .string({ error: "Enter a name." })
  .trim()
  .min(1, "Enter a name.")
  .max(100, "Keep the name under 100 characters.")
  .superRefine((name, ctx) => {
    const problem = nameProblem(name);
    if (problem) ctx.addIssue({ code: "custom", message: problem });
  });

/** A password that is the e-mail address of the same form is refused on the password field. */
function passwordNotEmail(v: { email: string; password: string }, ctx: z.RefinementCtx) {
  if (passwordProblem(v.password, v.email) === PASSWORD_IS_EMAIL) ctx.addIssue({ code: "custom", path: ["password"], message: PASSWORD_IS_EMAIL });
}

export const roleField = z.enum(ROLES, { error: "Choose a role: owner, planner or yard hand." });

/** Checkboxes arrive as "on" from forms and as booleans from JSON. */
export const flagField = z
  .union([z.boolean(), z.literal("on"), z.literal("true"), z.literal("false"), z.literal("")])
  .optional()
  .transform((v) => v === true || v === "on" || v === "true");

export const signInSchema = z.object({
  email: emailField,
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password."),
  next: z.string().optional(), // where the form came from (a scanned tag); checked before use
});

/** An IANA time zone name that Intl knows, taken under Intl's own spelling. */
export const timeZoneField = z.string({ error: "Choose a time zone." }).transform((v, ctx) => {
  const zone = canonicalTimeZone(v.trim());
  if (!zone) {
    ctx.addIssue({ code: "custom", message: "Choose a time zone from the list, e.g. America/Chicago." });
    return z.NEVER;
  }
  return zone;
});

const signUpFields = z.object({
  organisationName: nameField,
  name: nameField,
  email: emailField,
  password: passwordField,
  /** The organisation's time zone; UTC when missing. */
  timeZone: timeZoneField.optional(),
});

export const signUpSchema = signUpFields.superRefine(passwordNotEmail);

/**
 * The sign-up form: its hidden time zone is the browser's own, which a person cannot correct
 * on that form, so one Intl does not know here falls back to UTC instead of refusing.
 */
export const signUpFormSchema = signUpFields
  .extend({ timeZone: z.string().optional().transform((v) => (v ? (canonicalTimeZone(v) ?? undefined) : undefined)) })
  .superRefine(passwordNotEmail);

export const signUpConfirmSchema = z.object({ token: z.string().min(1, "This sign-up link is incomplete.") });

export const inviteSchema = z.object({ email: emailField, role: roleField, designated: flagField });

export const acceptInviteSchema = z.object({
  token: z.string().min(1, "This invite link is incomplete."),
  name: nameField,
  password: passwordField,
});

export const resetRequestSchema = z.object({ email: emailField });

export const resetPasswordSchema = z.object({
  token: z.string().min(1, "This reset link is incomplete."),
  password: passwordField,
});

export const memberUpdateSchema = z.object({
  role: roleField.optional(),
  designated: z.boolean().optional(),
  disabled: z.boolean().optional(),
});
