import { dictionary } from "@zxcvbn-ts/language-common";

// Passwords people guess first. The list is zxcvbn-ts's common-password dictionary
// (@zxcvbn-ts/language-common, built from leaked-password corpora and kept up to date
// there), not one typed here. Compared in lower case, as guessers try every case.
const COMMON = new Set((dictionary["passwords-common"] as string[]).map((p) => p.toLowerCase()));

export const COMMON_PASSWORD = "This password is on a list of common passwords. Choose one that is harder to guess.";
export const PASSWORD_IS_EMAIL = "The password must not be your e-mail address.";

/**
 * Whether a password is on the common-password list (any case).
 * @example isCommonPassword("QwertyUiop") // true
 */
export function isCommonPassword(password: string): boolean {
  return COMMON.has(password.trim().toLowerCase());
}

/**
 * What is wrong with a password for the person of this e-mail address, or null: on the
 * common list, or the e-mail address itself (in any case).
 * @example passwordProblem("Olive@Corvid.example", "olive@corvid.example") // "The password must not be your e-mail address."
 */
export function passwordProblem(password: string, email?: string): string | null {
  if (email && password.trim().toLowerCase() === email.trim().toLowerCase()) return PASSWORD_IS_EMAIL;
  if (isCommonPassword(password)) return COMMON_PASSWORD;
  return null;
}
