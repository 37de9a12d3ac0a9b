import "server-only";
import { inTransaction } from "@/db";
import * as mail from "@/db/mail";
import { smtpSend } from "@/lib/mail/send";

// Sending one message, at most once as far as this side can tell:
// - the message row is locked (FOR UPDATE SKIP LOCKED) for the whole SMTP conversation, so
//   two workers, or a retry started while a slow attempt still runs, never send it together;
// - a row already marked sent is not sent again (a job retried after the send committed);
// - "sent" is written in the same transaction, committed right after the mail server's
//   250 reply. Only a crash in that gap (one UPDATE and a COMMIT, about a millisecond here)
//   leaves a message sent but still queued; its retry then sends it once more, with the
//   same Message-ID, which mail programs use to fold duplicates. No design can close that
//   gap with SMTP alone: the server's acceptance and our record are two systems.

export class MessageBusy extends Error {
  constructor(id: string) {
    super(`message ${id} is being sent by another worker; retried later`);
  }
}

export type Delivery = "sent" | "already sent" | "not queued" | "missing";

/**
 * Sends a queued message. Throws when the mail server refuses or cannot be reached (the
 * attempt is recorded first) or when another worker holds the message: pg-boss retries.
 */
export async function deliverMessage(id: string): Promise<Delivery> {
  let failure: unknown;
  const outcome = await inTransaction(async (trx): Promise<Delivery | "failed"> => {
    const message = await mail.lockMessageForSending(id, trx);
    if (!message) {
      if (await mail.messageExists(id, trx)) throw new MessageBusy(id);
      return "missing"; // its organisation was deleted
    }
    if (message.status === "sent") return "already sent";
    if (message.status !== "queued" || message.text === null) return "not queued";
    try {
      await smtpSend({ id: message.id, to: message.to, subject: message.subject, text: message.text, headers: message.headers });
    } catch (error) {
      failure = error;
      await mail.recordFailedAttempt(id, error instanceof Error ? error.message : String(error), trx);
      return "failed";
    }
    await mail.markSent(id, trx);
    return "sent";
  });
  if (outcome === "failed") throw failure;
  return outcome;
}

/** A message whose job used up its retries: failed, for its owners to see. */
export async function giveUpMessage(id: string): Promise<void> {
  await mail.markFailed(id);
}
