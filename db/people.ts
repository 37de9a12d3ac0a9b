import type { Knex } from "knex";
import { db } from "./index";
import type { Role } from "@/lib/auth/roles";

// Queries about people, invites, resets and sign-in attempts.
// Each returns a shape made for its caller, never a row with a password hash in it
// (except findCredentials, which only the sign-in code calls).

export interface Person {
  id: string;
  name: string;
  email: string;
  role: Role;
  designated: boolean;
  disabled: boolean;
  createdAt: Date;
}

const personColumns = [
  "id", "name", "email", "role", "designated",
  db.raw("disabled_at is not null as disabled"), "created_at as createdAt",
];

export async function insertUser(
  user: { id: string; organisationId: string; email: string; name: string; role: Role; designated?: boolean; passwordHash: string },
  trx: Knex = db,
): Promise<void> {
  await trx("users").insert({
    id: user.id,
    organisation_id: user.organisationId,
    email: user.email,
    name: user.name,
    role: user.role,
    designated: user.designated ?? false,
    password_hash: user.passwordHash,
  });
}

export async function emailTaken(email: string, trx: Knex = db): Promise<boolean> {
  return Boolean(await trx("users").where({ email }).first("id"));
}

export async function findCredentials(email: string) {
  return db("users")
    .where({ email })
    .first("id", "password_hash as passwordHash", "disabled_at as disabledAt", "organisation_id as organisationId");
}

/** An active person by e-mail, with their organisation and its time zone (for the dates in their e-mail). */
export async function findActiveUserByEmail(email: string, trx: Knex = db): Promise<{ id: string; organisationId: string; timeZone: string } | undefined> {
  return trx("users as u")
    .join("organisations as o", "o.id", "u.organisation_id")
    .where("u.email", email)
    .whereNull("u.disabled_at")
    .first("u.id", "u.organisation_id as organisationId", "o.time_zone as timeZone");
}

/** The account an e-mail address has, active or not, with its organisation's name. */
export async function findAccountByEmail(email: string, trx: Knex = db): Promise<{ id: string; organisationId: string; organisationName: string } | undefined> {
  return trx("users as u")
    .join("organisations as o", "o.id", "u.organisation_id")
    .where("u.email", email)
    .first("u.id", "u.organisation_id as organisationId", "o.name as organisationName");
}

export async function listPeople(organisationId: string): Promise<Person[]> {
  return db("users").where({ organisation_id: organisationId }).orderBy("name").select(personColumns);
}

export async function getPerson(organisationId: string, id: string, trx: Knex = db): Promise<Person | undefined> {
  return trx("users").where({ organisation_id: organisationId, id }).first(personColumns);
}

export async function countActiveOwners(organisationId: string, trx: Knex = db): Promise<number> {
  const row = await trx("users")
    .where({ organisation_id: organisationId, role: "owner" })
    .whereNull("disabled_at")
    .count<{ count: string }>("id as count")
    .first();
  return Number(row?.count ?? 0);
}

export async function updatePerson(
  organisationId: string,
  id: string,
  patch: { role?: Role; designated?: boolean; disabled?: boolean },
  trx: Knex = db,
) {
  await trx("users")
    .where({ organisation_id: organisationId, id })
    .update({
      ...(patch.role !== undefined && { role: patch.role }),
      ...(patch.designated !== undefined && { designated: patch.designated }),
      ...(patch.disabled !== undefined && { disabled_at: patch.disabled ? trx.fn.now() : null }),
    });
}

/** The organisation of a person (a reset link names the person only). */
export async function organisationOf(userId: string, trx: Knex = db): Promise<string> {
  const row = await trx("users").where({ id: userId }).first("organisation_id");
  return row.organisation_id;
}

export async function setPassword(userId: string, passwordHash: string, trx: Knex = db) {
  await trx("users").where({ id: userId }).update({ password_hash: passwordHash });
}

export async function deleteSessionsOf(userId: string, trx: Knex = db) {
  await trx("user_sessions").where({ user_id: userId }).delete();
}

// Invites

export async function insertInvite(
  invite: { organisationId: string; email: string; role: Role; designated: boolean; tokenHash: string; invitedBy: string; expiresAt: Date },
  trx: Knex = db,
): Promise<string> {
  const [row] = await trx("invites")
    .insert({
      organisation_id: invite.organisationId,
      email: invite.email,
      role: invite.role,
      designated: invite.designated,
      token_hash: invite.tokenHash,
      invited_by: invite.invitedBy,
      expires_at: invite.expiresAt,
    })
    .returning("id");
  return row.id;
}

export async function findInviteByTokenHash(tokenHash: string, trx: Knex = db) {
  return trx("invites as i")
    .join("organisations as o", "o.id", "i.organisation_id")
    .where("i.token_hash", tokenHash)
    .first(
      "i.id", "i.organisation_id as organisationId", "i.email", "i.role", "i.designated",
      "i.expires_at as expiresAt", "i.accepted_at as acceptedAt", "i.revoked_at as revokedAt",
      "o.name as organisationName",
    );
}

/** The invite a link names, locked until its acceptance commits (a link is used once). */
export async function lockInviteByTokenHash(tokenHash: string, trx: Knex) {
  return trx("invites")
    .where({ token_hash: tokenHash })
    .forUpdate()
    .first<{ id: string; organisationId: string; email: string; role: Role; designated: boolean; expiresAt: Date; acceptedAt: Date | null; revokedAt: Date | null } | undefined>(
      "id", "organisation_id as organisationId", "email", "role", "designated",
      "expires_at as expiresAt", "accepted_at as acceptedAt", "revoked_at as revokedAt",
    );
}

export async function markInviteAccepted(id: string, trx: Knex = db) {
  await trx("invites").where({ id }).update({ accepted_at: trx.fn.now() });
}

export async function revokeInvite(organisationId: string, id: string, trx: Knex = db): Promise<number> {
  return trx("invites")
    .where({ organisation_id: organisationId, id })
    .whereNull("accepted_at")
    .whereNull("revoked_at")
    .update({ revoked_at: trx.fn.now() });
}

export async function listOpenInvites(organisationId: string) {
  return db("invites")
    .where({ organisation_id: organisationId })
    .whereNull("accepted_at")
    .whereNull("revoked_at")
    .where("expires_at", ">", db.fn.now())
    .orderBy("created_at", "desc")
    .select("id", "email", "role", "designated", "expires_at as expiresAt");
}

// Password resets

export async function insertPasswordReset(userId: string, tokenHash: string, expiresAt: Date, trx: Knex = db) {
  await trx("password_resets").insert({ user_id: userId, token_hash: tokenHash, expires_at: expiresAt });
}

/** The reset a link names, with its person's e-mail, locked until the reset commits (a link is used once). */
export async function findPasswordReset(tokenHash: string, trx: Knex) {
  return trx("password_resets as r")
    .join("users as u", "u.id", "r.user_id")
    .where("r.token_hash", tokenHash)
    .forUpdate("r")
    .first("r.id", "r.user_id as userId", "u.email", "r.expires_at as expiresAt", "r.used_at as usedAt");
}

/** Ends every reset link of a person that is still open (one was used, or the password changed). */
export async function endPasswordResetsOf(userId: string, trx: Knex = db) {
  await trx("password_resets").where({ user_id: userId }).whereNull("used_at").update({ used_at: trx.fn.now() });
}

// Sign-in attempts

export async function recordSignInAttempt(email: string, ip: string, succeeded: boolean) {
  await db("sign_in_attempts").insert({ email, ip, succeeded });
  // The throttle looks back minutes, not days: keep the table small.
  await db("sign_in_attempts").where({ email }).where("at", "<", db.raw("now() - interval '1 day'")).delete();
}

/** Failures for this e-mail since its last success, and for this address, within the window. */
export async function recentFailures(email: string, ip: string, since: Date) {
  const [byEmail, byIp] = await Promise.all([
    db.raw<{ rows: { count: string }[] }>(
      `select count(*) from sign_in_attempts
        where email = ? and not succeeded
          and at > greatest(?::timestamptz,
            coalesce((select max(at) from sign_in_attempts where email = ? and succeeded), '-infinity'))`,
      [email, since, email],
    ),
    db("sign_in_attempts").where({ ip, succeeded: false }).where("at", ">", since).count<{ count: string }>("id as count").first(),
  ]);
  return { byEmail: Number(byEmail.rows[0]?.count ?? 0), byIp: Number(byIp?.count ?? 0) };
}
