// Plain-text first: yard phones and shop PCs read these. Pure functions, tested in
// tests/unit/mail/templates.test.ts.
import { ROLE_LABELS, type Role } from "@/lib/auth/roles";
import { formatDateTime } from "@/lib/time";

/** When a link stops working, on the organisation's clock, with the zone named. */
const until = (at: Date, timeZone: string) => `${formatDateTime(at, timeZone)} (${timeZone.replaceAll("_", " ")} time)`;

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  /** Extra headers, e.g. List-Unsubscribe on reminders. */
  headers?: Record<string, string>;
}

/**
 * @example inviteMail({ to: "a@b.example", organisationName: "Acme", inviterName: "Ann", role: "planner", link, expiresAt, timeZone: "America/Chicago" })
 */
export function inviteMail(p: {
  to: string;
  organisationName: string;
  inviterName: string;
  role: Role;
  link: string;
  expiresAt: Date;
  timeZone: string;
}): MailMessage {
  return {
    to: p.to,
    subject: `${p.inviterName} invited you to ${p.organisationName} on Linkyard`,
    text: [
      `${p.inviterName} invited you to join ${p.organisationName} on Linkyard as ${ROLE_LABELS[p.role].toLowerCase()}.`,
      "",
      `Accept the invite and choose your password here:`,
      p.link,
      "",
      `The link works once and expires on ${until(p.expiresAt, p.timeZone)}.`,
      "If you did not expect this e-mail, ignore it.",
    ].join("\n"),
  };
}

export function passwordResetMail(p: { to: string; link: string; expiresAt: Date; timeZone: string }): MailMessage {
  return {
    to: p.to,
    subject: "Reset your Linkyard password",
    text: [
      "Someone asked to reset the password of this Linkyard account.",
      "",
      "Choose a new password here:",
      p.link,
      "",
      `The link works once and expires on ${until(p.expiresAt, p.timeZone)}.`,
      "If it was not you, ignore this e-mail: your password stays as it is.",
    ].join("\n"),
  };
}

/** How an item came to be tagged out: a pre-use check that found defects, or damage reported directly. */
export type TagOutCause = "check" | "report";

/**
 * The owners' e-mail when an item is tagged out, saying what happened: a failed pre-use check
 * (with its defects) or a damage report (with the reporter's note). `cause` defaults to
 * "check" when defects are listed, else "report".
 * @example damageReportMail({ to, reporterName: "Ann", itemDescription: "Chain, grade 70, 3/8 in", tagCode: "K7XM-3HQA", defects: [], note: "Link gouged", link, cause: "report" }).text
 * // "Ann reported damage on Chain, grade 70, 3/8 in, tag K7XM-3HQA, and tagged it out.\n…"
 */
export function damageReportMail(p: {
  to: string;
  reporterName: string;
  itemDescription: string;
  tagCode: string;
  defects: string[];
  note: string | null;
  link: string;
  cause?: TagOutCause;
}): MailMessage {
  const cause = p.cause ?? (p.defects.length ? "check" : "report");
  const what =
    cause === "check"
      ? `${p.reporterName}'s pre-use check of ${p.itemDescription}, tag ${p.tagCode}, found defects, and the item was tagged out.`
      : `${p.reporterName} reported damage on ${p.itemDescription}, tag ${p.tagCode}, and tagged it out.`;
  return {
    to: p.to,
    subject: `Tagged out: ${p.itemDescription} (${p.tagCode})`,
    text: [
      what,
      "",
      ...(p.defects.length ? ["Defects found:", ...p.defects.map((d) => `- ${d}`), ""] : []),
      ...(p.note ? [`${cause === "check" ? "Note" : "What is wrong"}: ${p.note}`, ""] : []),
      "It stays out of use until an owner or designated person inspects it and returns it to service or retires it:",
      p.link,
    ].join("\n"),
  };
}

/**
 * The link that finishes a sign-up: nothing is made until it is used.
 * @example signUpConfirmMail({ to: "a@b.example", organisationName: "Acme", link, expiresAt, timeZone: "UTC" }).subject // "Confirm your e-mail to set up Acme on Linkyard"
 */
export function signUpConfirmMail(p: { to: string; organisationName: string; link: string; expiresAt: Date; timeZone: string }): MailMessage {
  return {
    to: p.to,
    subject: `Confirm your e-mail to set up ${p.organisationName} on Linkyard`,
    text: [
      `To finish setting up ${p.organisationName} on Linkyard, open this link and confirm:`,
      p.link,
      "",
      `The link works once and expires on ${until(p.expiresAt, p.timeZone)}.`,
      "If you did not sign up, ignore this e-mail: nothing is set up until the link is used.",
    ].join("\n"),
  };
}

/**
 * Sent instead of a sign-up link when the address already has an account, so that the
 * sign-up form's answer says nothing about which addresses have accounts.
 * @example accountExistsSignUpMail({ to: "a@b.example", attemptedName: "New Co", organisationName: "Acme", appUrl: "https://x" }).subject // "Your Linkyard account already exists"
 */
export function accountExistsSignUpMail(p: { to: string; attemptedName: string; organisationName: string; appUrl: string }): MailMessage {
  return {
    to: p.to,
    subject: "Your Linkyard account already exists",
    text: [
      `Someone, perhaps you, tried to set up a new company, ${p.attemptedName}, on Linkyard with this e-mail address.`,
      `This address already has a Linkyard account, with ${p.organisationName}, so no new company was made.`,
      "",
      "Sign in here:",
      `${p.appUrl}/sign-in`,
      "",
      "Forgotten your password? Ask for a new one here:",
      `${p.appUrl}/forgot-password`,
      "",
      "If it was not you, ignore this e-mail: nothing has changed.",
    ].join("\n"),
  };
}

/**
 * Sent instead of an invite link when the invited address already has an account: an
 * account belongs to one company, so the invite cannot be taken with this address.
 * @example accountExistsInviteMail({ to: "a@b.example", organisationName: "Acme", inviterName: "Ann", role: "planner", ownOrganisationName: "Bolt", appUrl: "https://x" }).subject // "Ann invited you to Acme on Linkyard"
 */
export function accountExistsInviteMail(p: {
  to: string;
  organisationName: string;
  inviterName: string;
  role: Role;
  ownOrganisationName: string;
  appUrl: string;
}): MailMessage {
  const same = p.organisationName === p.ownOrganisationName;
  return {
    to: p.to,
    subject: `${p.inviterName} invited you to ${p.organisationName} on Linkyard`,
    text: [
      `${p.inviterName} invited you to join ${p.organisationName} on Linkyard as ${ROLE_LABELS[p.role].toLowerCase()}.`,
      "",
      same
        ? `This e-mail address already has an account with ${p.ownOrganisationName}: you need no invite. Sign in as usual:`
        : `This e-mail address already has a Linkyard account, with ${p.ownOrganisationName}. An account belongs to one company, so this invite cannot be accepted with this address. To join ${p.organisationName}, ask ${p.inviterName} to invite another of your e-mail addresses. Your own account is here:`,
      `${p.appUrl}/sign-in`,
      "",
      "If you did not expect this e-mail, ignore it: nothing has changed.",
    ].join("\n"),
  };
}

/** When a kit is for, in words: "today (2026-12-09)". */
const kitDay = (date: string, today: string) => `${date === today ? "today" : "tomorrow"} (${date})`;

/**
 * A kit for today or tomorrow lost an item to a tag-out.
 * @example kitLostItemMail({ to, job: "Main St", kitDate: "2026-12-10", today: "2026-12-09", itemDescription: "Chain, grade 70, 3/8 in", tagCode: "AB12-CD34", reporterName: "Yara", note: "bent link", link }).subject // "Kit for Main St tomorrow lost an item: AB12-CD34 tagged out"
 */
export function kitLostItemMail(p: {
  to: string;
  job: string;
  kitDate: string;
  today: string;
  itemDescription: string;
  tagCode: string;
  reporterName: string;
  note: string | null;
  link: string;
}): MailMessage {
  return {
    to: p.to,
    subject: `Kit for ${p.job} ${p.kitDate === p.today ? "today" : "tomorrow"} lost an item: ${p.tagCode} tagged out`,
    text: [
      `${p.reporterName} tagged out ${p.itemDescription}, tag ${p.tagCode}. It is in the kit for ${p.job} ${kitDay(p.kitDate, p.today)} and may not be used.`,
      ...(p.note ? ["", `Note: ${p.note}`] : []),
      "",
      "Replace it in the kit, then check the kit again:",
      p.link,
    ].join("\n"),
  };
}

/**
 * A kit for tomorrow does not pass its securement check (the morning check).
 * @example kitCheckMail({ to, job: "Main St", kitDate: "2026-12-10", machine: "Unit 12 mini excavator", trailer: "Tilt 1", reasons: ["Aggregate WLL too low."], link }).subject // "Kit for Main St tomorrow does not pass its check"
 */
export function kitCheckMail(p: { to: string; job: string; kitDate: string; machine: string; trailer: string; reasons: string[]; link: string }): MailMessage {
  return {
    to: p.to,
    subject: `Kit for ${p.job} tomorrow does not pass its check`,
    text: [
      `The kit for ${p.job} tomorrow (${p.kitDate}), ${p.machine} on ${p.trailer}, does not pass its securement check as it stands:`,
      ...p.reasons.map((r) => `- ${r}`),
      "",
      "Open the kit to fix it:",
      p.link,
      "",
      "A check here is no substitute for the driver's own inspection; local rules and licensed practice govern.",
    ].join("\n"),
  };
}

/**
 * A reminder with its way out: the footer says why the person gets it and links to a
 * one-click unsubscribe page for this kind alone; the List-Unsubscribe headers (RFC 2369,
 * RFC 8058) let a mail program unsubscribe with one click, by a POST with no sign-in.
 * @example withUnsubscribe(msg, { what: "tag-out e-mails", why: "you are an owner at Acme", pageLink, oneClickLink, preferencesLink }).headers!["List-Unsubscribe-Post"] // "List-Unsubscribe=One-Click"
 */
export function withUnsubscribe(
  message: MailMessage,
  p: { what: string; why: string; pageLink: string; oneClickLink: string; preferencesLink: string },
): MailMessage {
  return {
    ...message,
    text: [
      message.text,
      "",
      "--",
      `You get ${p.what} because ${p.why}.`,
      `Stop ${p.what}: ${p.pageLink}`,
      `Choose what Linkyard e-mails you: ${p.preferencesLink}`,
    ].join("\n"),
    headers: {
      ...message.headers,
      "List-Unsubscribe": `<${p.oneClickLink}>`,
      "List-Unsubscribe-Post": "List-Unsubscribe=One-Click",
    },
  };
}
