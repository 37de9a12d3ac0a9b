import type { Knex } from "knex";
import { db } from "./index";

// Sign-ups waiting for their e-mail link. A request is stored whether or not the address
// has an account (the form's answer and its work are the same); only a new address is sent
// a link, and the link is what creates the organisation and its owner.

export interface SignUpRequest {
  id: string;
  email: string;
  organisationName: string;
  name: string;
  timeZone: string;
  passwordHash: string;
  expiresAt: Date;
  usedAt: Date | null;
}

export async function insertSignUpRequest(
  r: { email: string; organisationName: string; name: string; timeZone: string; passwordHash: string; tokenHash: string; expiresAt: Date },
  trx: Knex,
): Promise<string> {
  const [row] = await trx("signup_requests")
    .insert({
      email: r.email,
      organisation_name: r.organisationName,
      name: r.name,
      time_zone: r.timeZone,
      password_hash: r.passwordHash,
      token_hash: r.tokenHash,
      expires_at: r.expiresAt,
    })
    .returning("id");
  return row.id;
}

const COLUMNS = [
  "id", "email", "organisation_name as organisationName", "name", "time_zone as timeZone",
  "password_hash as passwordHash", "expires_at as expiresAt", "used_at as usedAt",
];

/** What the confirmation page shows (no password hash). */
export async function findSignUpRequest(tokenHash: string): Promise<Omit<SignUpRequest, "passwordHash"> | undefined> {
  const row = await db("signup_requests").where({ token_hash: tokenHash }).first(COLUMNS);
  if (!row) return undefined;
  const { passwordHash: _hash, ...rest } = row;
  return rest;
}

/** The request a link names, locked until its confirmation commits (a link is used once). */
export async function lockSignUpRequest(tokenHash: string, trx: Knex): Promise<SignUpRequest | undefined> {
  return trx("signup_requests").where({ token_hash: tokenHash }).forUpdate().first(COLUMNS);
}

export async function markSignUpRequestUsed(id: string, trx: Knex): Promise<void> {
  await trx("signup_requests").where({ id }).update({ used_at: trx.fn.now() });
}

/** Sign-ups never finished, expired before `before`: their password hashes go. */
export async function deleteExpiredSignUpRequests(before: Date): Promise<number> {
  return db("signup_requests").whereNull("used_at").where("expires_at", "<", before).delete();
}
