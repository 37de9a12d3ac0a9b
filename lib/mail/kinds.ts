import type { Role } from "@/lib/auth/roles";

// The kinds of e-mail Linkyard sends. Account e-mails (invites, resets, sign-up links and
// the notice that an address already has an account) always go; the reminders are the ones
// a person chooses to receive, each with its own unsubscribe link.

export const MAIL_KINDS = ["invite", "password_reset", "signup", "account_exists", "tag_out", "kit", "digest"] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

export const REMINDER_KINDS = ["tag_out", "kit", "digest"] as const;
export type ReminderKind = (typeof REMINDER_KINDS)[number];

/** What each reminder is, in the words of the preferences page and the unsubscribe page. */
export const REMINDER_LABELS: Record<ReminderKind, { title: string; short: string; about: string; who: string }> = {
  tag_out: {
    title: "Tag-outs",
    short: "tag-out e-mails",
    about: "An e-mail as soon as someone tags out an item, with what they found.",
    who: "Owners and designated people",
  },
  kit: {
    title: "Kits for today and tomorrow",
    short: "kit e-mails",
    about: "An e-mail when a kit for today or tomorrow loses an item to a tag-out, and each morning for a kit of tomorrow that does not pass its check.",
    who: "Owners and planners",
  },
  digest: {
    title: "Daily digest",
    short: "the daily digest",
    about: "Each morning: inspections overdue, inspections due in the next 7 days, and items tagged out waiting for a decision.",
    who: "Owners and designated people",
  },
};

/**
 * Whether a person's role makes a reminder theirs to receive (before their own choice).
 * Tag-outs and the digest go to those who decide about gear (owners, designated people);
 * kit notices to those who build kits (owners, planners).
 * @example receivesByRole({ role: "yard_hand", designated: true }, "tag_out") // true
 * @example receivesByRole({ role: "yard_hand", designated: false }, "kit") // false
 */
export function receivesByRole(person: { role: Role; designated: boolean }, kind: ReminderKind): boolean {
  if (kind === "kit") return person.role === "owner" || person.role === "planner";
  return person.role === "owner" || person.designated;
}

/**
 * The reminders a person may choose among.
 * @example reminderKindsFor({ role: "planner", designated: false }) // ["kit"]
 */
export function reminderKindsFor(person: { role: Role; designated: boolean }): ReminderKind[] {
  return REMINDER_KINDS.filter((k) => receivesByRole(person, k));
}

/**
 * @example isReminderKind("digest") // true
 * @example isReminderKind("invite") // false
 */
export function isReminderKind(value: unknown): value is ReminderKind {
  return typeof value === "string" && (REMINDER_KINDS as readonly string[]).includes(value);
}
