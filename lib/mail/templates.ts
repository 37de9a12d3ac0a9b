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

export function damageReportMail(p: {
  to: string;
  reporterName: string;
  itemDescription: string;
  tagCode: string;
  defects: string[];
  note: string | null;
  link: string;
}): MailMessage {
  return {
    to: p.to,
    subject: `Tagged out: ${p.itemDescription} (${p.tagCode})`,
    text: [
      `${p.reporterName} tagged out ${p.itemDescription}, tag ${p.tagCode}, after a pre-use check.`,
      "",
      ...(p.defects.length ? ["Defects found:", ...p.defects.map((d) => `- ${d}`), ""] : []),
      ...(p.note ? [`Note: ${p.note}`, ""] : []),
      "It stays out of use until an owner or designated person inspects it and returns it to service or retires it:",
      p.link,
    ].join("\n"),
  };
}
