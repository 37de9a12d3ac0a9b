import "server-only";
import { audited } from "@/db/audit";
import { QUEUES, sendJob } from "@/db/jobs";
import * as mail from "@/db/mail";
import { getOrganisation, updateOrganisation } from "@/db/organisations";
import { can } from "@/lib/auth/roles";
import type { Principal } from "@/lib/auth/session";
import { forbidden, notFound } from "@/lib/http/errors";
import { REMINDER_KINDS, reminderKindsFor, type ReminderKind } from "./kinds";
import { unsubscribeKey } from "./queue";
import { readUnsubscribeToken } from "./unsubscribe";

// E-mail as people manage it: each person's choice of reminders (the preferences page and
// the unsubscribe links), and for owners the digest time and the e-mail that failed.

/** The reminders a person may receive, and which of them are on. */
export async function mailPreferences(actor: Principal): Promise<{ kinds: ReminderKind[]; on: ReminderKind[] }> {
  const off = await mail.listOptOuts(actor.userId);
  const kinds = reminderKindsFor(actor);
  return { kinds, on: kinds.filter((k) => !off.includes(k)) };
}

/**
 * Saves a person's own choices for the kinds their form showed: those in `on` are on, the
 * other shown ones off. A kind the form did not show, or the role is not offered, keeps its
 * choice (one made under an earlier role stays for when the role comes back).
 */
export async function saveMailPreferences(actor: Principal, shown: ReminderKind[], on: ReminderKind[]): Promise<void> {
  // A token acts for integrations, not for a person's inbox.
  if (actor.via !== "session") throw forbidden("Change e-mail choices signed in as yourself.");
  const before = await mail.listOptOuts(actor.userId);
  const offered = reminderKindsFor(actor);
  const changing = (k: ReminderKind) => offered.includes(k) && shown.includes(k);
  const off = REMINDER_KINDS.filter((k) => (changing(k) ? !on.includes(k) : before.includes(k)));
  await audited(actor, async (tx, audit) => {
    await mail.setOptOuts(actor.userId, off, tx);
    await audit({ action: "mail.preferences_changed", entity: "user", entityId: actor.userId, before: { off: before }, after: { off } });
  });
}

/** What an unsubscribe link names, for its page: null when the link is not valid. */
export async function describeUnsubscribe(token: string): Promise<{ kind: ReminderKind; email: string; alreadyOff: boolean } | null> {
  const named = readUnsubscribeToken(await unsubscribeKey(), token);
  if (!named) return null;
  const person = await mail.findMailPerson(named.userId);
  if (!person) return null;
  return { kind: named.kind, email: person.email, alreadyOff: (await mail.listOptOuts(person.id)).includes(named.kind) };
}

/**
 * One-click unsubscribe, with no sign-in: the signed link names the person and the kind, and
 * turns off that kind for that person alone. Using it twice changes nothing more.
 */
export async function unsubscribe(token: string): Promise<{ kind: ReminderKind; email: string }> {
  const named = readUnsubscribeToken(await unsubscribeKey(), token);
  const person = named && (await mail.findMailPerson(named.userId));
  if (!named || !person) throw notFound("This unsubscribe link is not valid. Sign in and choose your e-mails on the E-mail page.");
  await audited(null, async (tx, audit) => {
    if (await mail.addOptOut(person.id, named.kind, tx)) {
      await audit({ organisationId: person.organisationId, actorId: person.id, action: "mail.unsubscribed", entity: "user", entityId: person.id, after: { kind: named.kind } });
    }
  });
  return { kind: named.kind, email: person.email };
}

function mustManage(actor: Principal) {
  if (!can(actor, "settings.manage")) throw forbidden();
}

/** When the daily digest goes out, HH:mm on the organisation's clock. */
export async function saveDigestTime(actor: Principal, digestTime: string): Promise<void> {
  mustManage(actor);
  await audited(actor, async (tx, audit) => {
    const before = (await getOrganisation(actor.organisationId, tx))!.digestTime;
    await updateOrganisation(actor.organisationId, { digestTime }, tx);
    await audit({ action: "organisation.digest_time_updated", entity: "organisation", entityId: actor.organisationId, before: { digestTime: before }, after: { digestTime } });
  });
}

/** The organisation's e-mail that could not be sent, for its owners. */
export async function failedMail(actor: Principal) {
  mustManage(actor);
  return mail.listFailedMessages(actor.organisationId);
}

/** A failed message back to the queue, with its retries afresh. */
export async function resendFailedMail(actor: Principal, messageId: string): Promise<void> {
  mustManage(actor);
  await audited(actor, async (tx, audit) => {
    if (!(await mail.requeueFailedMessage(actor.organisationId, messageId, tx))) throw notFound("No failed e-mail with that id.");
    await sendJob(tx, QUEUES.mail, { messageId });
    await audit({ action: "mail.resent", entity: "mail_message", entityId: messageId });
  });
}
