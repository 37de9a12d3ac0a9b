import "server-only";
import type { Tx } from "@/db";
import { QUEUES, sendJob } from "@/db/jobs";
import * as mail from "@/db/mail";
import { config } from "@/lib/config";
import type { MailKind, ReminderKind } from "./kinds";
import { REMINDER_LABELS } from "./kinds";
import { withUnsubscribe, type MailMessage } from "./templates";
import { unsubscribeToken } from "./unsubscribe";

// Every e-mail leaves through here: a message row and a job, written in the transaction of
// the change that causes the e-mail, so both commit with it or neither does. The request
// answers without waiting for the mail server; the worker sends (lib/jobs/mail-job.ts).

export interface QueuedMail {
  kind: MailKind;
  /** Unique per e-mail: the same key a second time queues nothing. */
  idempotencyKey: string;
  organisationId: string | null;
  userId?: string | null;
  message: MailMessage;
}

/**
 * Queues one e-mail in a transaction. False when its idempotency key was queued before.
 * @example await queueMail(trx, { kind: "invite", idempotencyKey: `invite:${inviteId}`, organisationId, message: inviteMail(...) })
 */
export async function queueMail(trx: Tx, mailToSend: QueuedMail): Promise<boolean> {
  const id = await mail.insertMessage(
    {
      organisationId: mailToSend.organisationId,
      userId: mailToSend.userId ?? null,
      kind: mailToSend.kind,
      idempotencyKey: mailToSend.idempotencyKey,
      to: mailToSend.message.to,
      subject: mailToSend.message.subject,
      text: mailToSend.message.text,
      headers: mailToSend.message.headers,
    },
    trx,
  );
  if (!id) return false;
  await sendJob(trx, QUEUES.mail, { messageId: id });
  return true;
}

// The signing key never changes once the migration made it: read once per process.
let signingKey: Promise<string> | undefined;
const unsubscribeKey = () => (signingKey ??= mail.getSigningKey("unsubscribe").catch((e) => ((signingKey = undefined), Promise.reject(e))));

const WHY: Record<ReminderKind, (p: { role: string; designated: boolean }, org: string) => string> = {
  tag_out: (p, org) => `you are ${p.role === "owner" ? "an owner" : "a designated person"} at ${org}`,
  digest: (p, org) => `you are ${p.role === "owner" ? "an owner" : "a designated person"} at ${org}`,
  kit: (p, org) => `you ${p.role === "owner" ? "are an owner" : "plan kits"} at ${org}`,
};

/**
 * A reminder to one person: their own one-click unsubscribe link for this kind, in the
 * footer and in the List-Unsubscribe headers.
 */
export async function reminderMessage(
  kind: ReminderKind,
  person: { id: string; role: string; designated: boolean },
  organisationName: string,
  message: MailMessage,
): Promise<MailMessage> {
  const token = unsubscribeToken(await unsubscribeKey(), person.id, kind);
  return withUnsubscribe(message, {
    what: REMINDER_LABELS[kind].short,
    why: WHY[kind](person, organisationName),
    pageLink: `${config.APP_URL}/unsubscribe/${token}`,
    oneClickLink: `${config.APP_URL}/api/v1/unsubscribe/${token}`,
    preferencesLink: `${config.APP_URL}/preferences`,
  });
}

export { unsubscribeKey };
