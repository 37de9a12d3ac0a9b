// What a person's or an organisation's name may hold. Names go into e-mails (an invite
// names both) and onto every screen, so a line break could forge lines of a message, and a
// name of only invisible or direction-changing characters would show as nothing, or turn
// the text around it backwards. Screens also show names inside <bdi> (people, app bar, audit log, item history, invite page).

/** C0 and C1 control characters (line breaks, tabs, escape…) and the Unicode line and paragraph separators. */
const CONTROL = /[\p{Cc}\u2028\u2029]/u;
/** At least one letter or digit that a reader can see. */
const VISIBLE = /[\p{L}\p{N}]/u;

export const NAME_HAS_CONTROL = "Use letters, numbers and punctuation only: no line breaks or control characters.";
export const NAME_NOT_VISIBLE = "Enter a name with letters or numbers in it.";

/**
 * What is wrong with a name, or null.
 * @example nameProblem("Yard Co\nBcc: x@example.com") // "Use letters, numbers and punctuation only: no line breaks or control characters."
 * @example nameProblem("\u200b\u202e") // "Enter a name with letters or numbers in it."
 */
export function nameProblem(name: string): string | null {
  if (CONTROL.test(name)) return NAME_HAS_CONTROL;
  if (!VISIBLE.test(name)) return NAME_NOT_VISIBLE;
  return null;
}
