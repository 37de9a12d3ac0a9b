import type { Knex } from "knex";
import type { Role } from "@/lib/auth/roles";
import type { MailKind, ReminderKind } from "@/lib/mail/kinds";
import { db } from "./index";

// E-mail messages, people's choices of reminders, and the key that signs unsubscribe links.
// A message row is the durable record of one e-mail; its idempotency key is unique, so a
// change retried or a job run twice cannot make a second copy.

export interface NewMessage {
  organisationId: string | null;
  userId: string | null;
  kind: MailKind;
  idempotencyKey: string;
  to: string;
  subject: string;
  text: string;
  headers?: Record<string, string>;
}

/** Inserts a message; null when one with the same idempotency key exists already. */
export async function insertMessage(m: NewMessage, trx: Knex): Promise<string | null> {
  const [row] = await trx("mail_messages")
    .insert({
      organisation_id: m.organisationId,
      user_id: m.userId,
      kind: m.kind,
      idempotency_key: m.idempotencyKey,
      to_address: m.to,
      subject: m.subject,
      body: m.text,
      headers: JSON.stringify(m.headers ?? {}),
    })
    .onConflict("idempotency_key")
    .ignore()
    .returning("id");
  return row?.id ?? null;
}

export interface StoredMessage {
  id: string;
  status: "queued" | "sent" | "failed";
  to: string;
  subject: string;
  text: string | null;
  headers: Record<string, string>;
}

/**
 * The message, locked for sending until the transaction ends; undefined when another worker
 * holds it (SKIP LOCKED) or it does not exist. See messageExists to tell the two apart.
 */
export async function lockMessageForSending(id: string, trx: Knex): Promise<StoredMessage | undefined> {
  return trx("mail_messages")
    .where({ id })
    .forUpdate()
    .skipLocked()
    .first("id", "status", "to_address as to", "subject", "body as text", "headers");
}

export async function messageExists(id: string, trx: Knex = db): Promise<boolean> {
  return Boolean(await trx("mail_messages").where({ id }).first("id"));
}

export async function messageKeyExists(idempotencyKey: string, trx: Knex = db): Promise<boolean> {
  return Boolean(await trx("mail_messages").where({ idempotency_key: idempotencyKey }).first("id"));
}

/** Sent: the body goes (its links are secrets), the record stays. */
export async function markSent(id: string, trx: Knex): Promise<void> {
  await trx("mail_messages")
    .where({ id })
    .update({ status: "sent", sent_at: trx.fn.now(), body: null, attempts: trx.raw("attempts + 1"), last_error: null });
}

export async function recordFailedAttempt(id: string, error: string, trx: Knex = db): Promise<void> {
  await trx("mail_messages").where({ id, status: "queued" }).update({ attempts: trx.raw("attempts + 1"), last_error: error.slice(0, 500) });
}

/** Out of retries: failed, and shown to the organisation's owners. */
export async function markFailed(id: string, trx: Knex = db): Promise<void> {
  await trx("mail_messages").where({ id, status: "queued" }).update({ status: "failed", failed_at: trx.fn.now() });
}

export interface FailedMessage {
  id: string;
  kind: MailKind;
  to: string;
  subject: string;
  attempts: number;
  lastError: string | null;
  createdAt: Date;
  failedAt: Date;
}

/** The organisation's messages that could not be sent, newest first. */
export async function listFailedMessages(organisationId: string, limit = 20): Promise<FailedMessage[]> {
  return db("mail_messages")
    .where({ organisation_id: organisationId, status: "failed" })
    .orderBy("failed_at", "desc")
    .limit(limit)
    .select("id", "kind", "to_address as to", "subject", "attempts", "last_error as lastError", "created_at as createdAt", "failed_at as failedAt");
}

/** A failed message of the organisation back to the queue; false when there is none such. */
export async function requeueFailedMessage(organisationId: string, id: string, trx: Knex): Promise<boolean> {
  const changed = await trx("mail_messages")
    .where({ organisation_id: organisationId, id, status: "failed" })
    .update({ status: "queued", failed_at: null, attempts: 0 });
  return changed > 0;
}

// Reminders: who receives them

export interface MailRecipient {
  id: string;
  email: string;
  name: string;
  role: Role;
  designated: boolean;
}

/** Active people of the organisation who have not turned this reminder off (their role is judged in lib/mail/kinds.ts). */
export async function listReminderRecipients(organisationId: string, kind: ReminderKind, trx: Knex = db): Promise<MailRecipient[]> {
  return trx("users as u")
    .where("u.organisation_id", organisationId)
    .whereNull("u.disabled_at")
    .whereNotExists((q) => q.select(trx.raw("1")).from("mail_opt_outs as o").whereRaw("o.user_id = u.id").where("o.kind", kind))
    .orderBy("u.id")
    .select("u.id", "u.email", "u.name", "u.role", "u.designated");
}

export async function listOptOuts(userId: string, trx: Knex = db): Promise<ReminderKind[]> {
  const rows = await trx("mail_opt_outs").where({ user_id: userId }).select("kind");
  return rows.map((r) => r.kind);
}

/** Replaces a person's choices: the kinds given are turned off, the others on. */
export async function setOptOuts(userId: string, kinds: ReminderKind[], trx: Knex): Promise<void> {
  await trx("mail_opt_outs").where({ user_id: userId }).delete();
  if (kinds.length) await trx("mail_opt_outs").insert(kinds.map((kind) => ({ user_id: userId, kind })));
}

/** Turns one kind off; false when it was off already. */
export async function addOptOut(userId: string, kind: ReminderKind, trx: Knex): Promise<boolean> {
  const rows = await trx("mail_opt_outs").insert({ user_id: userId, kind }).onConflict(["user_id", "kind"]).ignore().returning("kind");
  return rows.length > 0;
}

/** The person an unsubscribe link names, with their organisation (for the audit row). */
export async function findMailPerson(userId: string, trx: Knex = db): Promise<{ id: string; email: string; organisationId: string } | undefined> {
  return trx("users").where({ id: userId }).first("id", "email", "organisation_id as organisationId");
}

/** A key for signing links, made by the migration; the same for every process. */
export async function getSigningKey(name: "unsubscribe"): Promise<string> {
  const row = await db("signing_keys").where({ name }).first("secret");
  if (!row) throw new Error(`signing key "${name}" is missing: run the migrations`);
  return row.secret;
}
