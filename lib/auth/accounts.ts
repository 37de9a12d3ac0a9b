import "server-only";
import { randomUUID } from "node:crypto";
import { audited } from "@/db/audit";
import { QUEUES, sendJob } from "@/db/jobs";
import { createOrganisation, getOrganisation, lockOrganisation } from "@/db/organisations";
import * as people from "@/db/people";
import * as signups from "@/db/signups";
import { config } from "@/lib/config";
import { conflict, fieldError, forbidden, gone, notFound, tooManyRequests, unauthorized } from "@/lib/http/errors";
import { queueMail } from "@/lib/mail/queue";
import { accountExistsInviteMail, accountExistsSignUpMail, inviteMail, passwordResetMail, signUpConfirmMail } from "@/lib/mail/templates";
import { DEFAULT_TIME_ZONE } from "@/lib/time";
import { capTokensOf, revokeTokensOf } from "./api-tokens";
import { countMailAttempt } from "./mail-limits";
import { passwordProblem } from "./password-policy";
import { newUserId } from "./lucia";
import type { Role } from "./roles";
import { can } from "./roles";
import { hashPassword, hashSecret, newSecret, verifyPassword } from "./secrets";
import type { Principal } from "./session";

// The account flows, shared by the forms (server actions) and the JSON API.
// Each validates its own business rules and throws AppError with the field at fault.

export const INVITE_DAYS = 7;
export const RESET_HOURS = 2;
export const SIGNUP_HOURS = 24;

// A fixed hash to verify against when the e-mail is unknown, so both cases take as long.
let decoyHash: Promise<string> | undefined;

/**
 * Sign-up, first half: the answer, and the work behind it, are the same whether or not the
 * address has an account (issue 11.3). A new address is e-mailed a link that finishes the
 * sign-up; an address with an account is told so by e-mail instead.
 */
export async function requestSignUp(input: { organisationName: string; name: string; email: string; password: string; timeZone?: string }, ip?: string): Promise<void> {
  await countMailAttempt([["signUpPerAddress", ip], ["signUpPerEmail", input.email]]);
  const passwordHash = await hashPassword(input.password);
  const secret = newSecret();
  const expiresAt = new Date(Date.now() + SIGNUP_HOURS * 3_600_000);
  const timeZone = input.timeZone ?? DEFAULT_TIME_ZONE;
  // No audit row: nothing of an organisation changes until the link is used.
  await audited(null, async (tx) => {
    const requestId = await signups.insertSignUpRequest({ email: input.email, organisationName: input.organisationName, name: input.name, timeZone, passwordHash, tokenHash: hashSecret(secret), expiresAt }, tx);
    const existing = await people.findAccountByEmail(input.email, tx);
    await queueMail(tx, {
      kind: existing ? "account_exists" : "signup",
      idempotencyKey: `signup:${requestId}`,
      organisationId: existing?.organisationId ?? null,
      userId: existing?.id ?? null,
      message: existing
        ? accountExistsSignUpMail({ to: input.email, attemptedName: input.organisationName, organisationName: existing.organisationName, appUrl: config.APP_URL })
        : signUpConfirmMail({ to: input.email, organisationName: input.organisationName, link: `${config.APP_URL}/sign-up/confirm/${secret}`, expiresAt, timeZone }),
    });
  });
}

/** What the sign-up form and API answer, the same for an address with or without an account. */
export function signUpSentMessage(email: string): string {
  return `Check your e-mail: we sent a message to ${email}. Open the link in it to finish setting up your company; it works for ${SIGNUP_HOURS} hours. Nothing there after a few minutes? Look in the spam folder, or sign up again.`;
}

function signUpProblem(request: { usedAt: Date | null; expiresAt: Date }): string | null {
  if (request.usedAt) return "This sign-up link has already been used. Sign in instead.";
  if (request.expiresAt.getTime() < Date.now()) return "This sign-up link has expired. Sign up again.";
  return null;
}

/** What the sign-up confirmation page shows before the person confirms. */
export async function describeSignUp(token: string) {
  const request = await signups.findSignUpRequest(hashSecret(token));
  return request ? { organisationName: request.organisationName, email: request.email, problem: signUpProblem(request) } : null;
}

/** Sign-up, second half: the link from the e-mail makes the organisation and its first owner. */
export async function confirmSignUp(token: string): Promise<string> {
  const userId = newUserId();
  const organisationId = randomUUID();
  return audited({ organisationId, userId }, async (tx, audit) => {
    const request = await signups.lockSignUpRequest(hashSecret(token), tx);
    if (!request) throw notFound("This sign-up link is not valid. Sign up again.");
    const problem = signUpProblem(request);
    if (problem) throw gone(problem);
    if (await people.emailTaken(request.email, tx)) throw conflict("This e-mail already has an account. Sign in instead.");
    await createOrganisation({ id: organisationId, name: request.organisationName, timeZone: request.timeZone }, tx);
    await people.insertUser({ id: userId, organisationId, email: request.email, name: request.name, role: "owner", passwordHash: request.passwordHash }, tx);
    await signups.markSignUpRequestUsed(request.id, tx);
    await audit({ action: "organisation.created", entity: "organisation", entityId: organisationId, after: { name: request.organisationName, timeZone: request.timeZone } });
    return userId;
  });
}

/**
 * Checks e-mail and password. Refuses after SIGN_IN_MAX_FAILURES failures for the account
 * (since its last success) or 4x that many from one address within the window.
 */
export async function signIn(input: { email: string; password: string; ip: string }): Promise<string> {
  const since = new Date(Date.now() - config.SIGN_IN_WINDOW_MINUTES * 60_000);
  const failures = await people.recentFailures(input.email, input.ip, since);
  if (failures.byEmail >= config.SIGN_IN_MAX_FAILURES || failures.byIp >= config.SIGN_IN_MAX_FAILURES * 4) {
    throw tooManyRequests(
      `Too many failed sign-ins. Wait ${config.SIGN_IN_WINDOW_MINUTES} minutes, or reset your password.`,
    );
  }
  const user = await people.findCredentials(input.email);
  decoyHash ??= hashPassword("linkyard-decoy-password");
  const ok = await verifyPassword(user?.passwordHash ?? (await decoyHash), input.password);
  if (!user || !ok || user.disabledAt) {
    await people.recordSignInAttempt(input.email, input.ip, false);
    throw unauthorized("That e-mail and password do not match an account.");
  }
  await people.recordSignInAttempt(input.email, input.ip, true);
  return user.id;
}

/**
 * An invite answers the same whether or not the address has an account (issue 11.3): the
 * invite is recorded either way, and a person who has an account is told by e-mail why
 * this invite is not for that address.
 */
export async function invitePerson(actor: Principal, input: { email: string; role: Role; designated: boolean }) {
  if (!can(actor, "people.manage")) throw forbidden();
  await countMailAttempt([["invitePerAccount", actor.userId], ["invitePerEmail", input.email]]);
  const secret = newSecret();
  const expiresAt = new Date(Date.now() + INVITE_DAYS * 86_400_000);
  const organisation = (await getOrganisation(actor.organisationId))!;
  const id = await audited(actor, async (tx, audit) => {
    const inviteId = await people.insertInvite(
      { organisationId: actor.organisationId, email: input.email, role: input.role, designated: input.designated, tokenHash: hashSecret(secret), invitedBy: actor.userId, expiresAt },
      tx,
    );
    await audit({ action: "person.invited", entity: "invite", entityId: inviteId, after: input });
    const existing = await people.findAccountByEmail(input.email, tx);
    const invite = { to: input.email, organisationName: organisation.name, inviterName: actor.name, role: input.role };
    await queueMail(tx, {
      kind: existing ? "account_exists" : "invite",
      idempotencyKey: `invite:${inviteId}`,
      // The inviting organisation's either way: its owners see the same in a list of failed mail.
      organisationId: actor.organisationId,
      message: existing
        ? accountExistsInviteMail({ ...invite, ownOrganisationName: existing.organisationName, appUrl: config.APP_URL })
        : inviteMail({ ...invite, link: `${config.APP_URL}/invite/${secret}`, expiresAt, timeZone: organisation.timeZone }),
    });
    return inviteId;
  });
  return { id, expiresAt };
}

/** What the invite page shows before the person accepts. */
export async function describeInvite(token: string) {
  const invite = await people.findInviteByTokenHash(hashSecret(token));
  return invite ? { ...invite, usable: inviteProblem(invite) === null } : null;
}

function inviteProblem(invite: { acceptedAt: Date | null; revokedAt: Date | null; expiresAt: Date }): string | null {
  if (invite.acceptedAt) return "This invite has already been used. Sign in instead.";
  if (invite.revokedAt) return "This invite was withdrawn. Ask your owner for a new one.";
  if (invite.expiresAt.getTime() < Date.now()) return "This invite has expired. Ask your owner for a new one.";
  return null;
}

export async function acceptInvite(input: { token: string; name: string; password: string }): Promise<string> {
  const passwordHash = await hashPassword(input.password);
  const userId = newUserId();
  // The organisation is the invite's, known once the invite is read inside the transaction.
  return audited(null, async (tx, audit) => {
    const invite = await people.lockInviteByTokenHash(hashSecret(input.token), tx);
    if (!invite) throw notFound("This invite link is not valid. Ask your owner for a new one.");
    const problem = inviteProblem(invite);
    if (problem) throw gone(problem);
    if (await people.emailTaken(invite.email, tx)) throw conflict("This e-mail already has an account. Sign in instead.");
    const weak = passwordProblem(input.password, invite.email);
    if (weak) throw fieldError("password", weak);
    await people.insertUser(
      { id: userId, organisationId: invite.organisationId, email: invite.email, name: input.name, role: invite.role, designated: invite.designated, passwordHash },
      tx,
    );
    await people.markInviteAccepted(invite.id, tx);
    await audit({ organisationId: invite.organisationId, actorId: userId, action: "person.joined", entity: "user", entityId: userId, after: { email: invite.email, role: invite.role } });
    return userId;
  });
}

export async function withdrawInvite(actor: Principal, inviteId: string) {
  if (!can(actor, "people.manage")) throw forbidden();
  await audited(actor, async (tx, audit) => {
    const changed = await people.revokeInvite(actor.organisationId, inviteId, tx);
    if (!changed) throw notFound("No open invite with that id.");
    await audit({ action: "invite.withdrawn", entity: "invite", entityId: inviteId });
  });
}

/**
 * Always the same answer and the same work, so neither the form nor its timing tells which
 * e-mails have accounts (issue 11.3): one job, whatever the address. The worker looks the
 * address up and sends the link (sendPasswordReset).
 */
export async function requestPasswordReset(email: string, ip?: string): Promise<void> {
  await countMailAttempt([["resetPerAddress", ip], ["resetPerEmail", email]]);
  await audited(null, (tx) => sendJob(tx, QUEUES.resetRequest, { email }));
}

/**
 * The worker's half of a reset request: for an active account, a new one-time link, e-mailed.
 * `requestId` (the job's id) makes a retried job send nothing twice.
 */
export async function sendPasswordReset(requestId: string, email: string): Promise<void> {
  await audited(null, async (tx) => {
    const user = await people.findActiveUserByEmail(email, tx);
    if (!user) return;
    const secret = newSecret();
    const expiresAt = new Date(Date.now() + RESET_HOURS * 3_600_000);
    const queued = await queueMail(tx, {
      kind: "password_reset",
      idempotencyKey: `password_reset:${requestId}`,
      organisationId: user.organisationId,
      userId: user.id,
      message: passwordResetMail({ to: email, link: `${config.APP_URL}/reset-password/${secret}`, expiresAt, timeZone: user.timeZone }),
    });
    if (queued) await people.insertPasswordReset(user.id, hashSecret(secret), expiresAt, tx);
  });
}

export async function resetPassword(input: { token: string; password: string }): Promise<string> {
  const passwordHash = await hashPassword(input.password);
  // The person is known once the link is read inside the transaction.
  return audited(null, async (tx, audit) => {
    const reset = await people.findPasswordReset(hashSecret(input.token), tx);
    if (!reset) throw notFound("This reset link is not valid. Ask for a new one.");
    if (reset.usedAt) throw gone("This reset link has already been used. Ask for a new one.");
    if (reset.expiresAt.getTime() < Date.now()) throw gone("This reset link has expired. Ask for a new one.");
    const weak = passwordProblem(input.password, reset.email);
    if (weak) throw fieldError("password", weak);
    await people.setPassword(reset.userId, passwordHash, tx);
    await people.endPasswordResetsOf(reset.userId, tx); // this link, and every older one still out
    await people.deleteSessionsOf(reset.userId, tx); // sign out everywhere else
    const by = { organisationId: await people.organisationOf(reset.userId, tx), actorId: reset.userId };
    await revokeTokensOf(by.organisationId, reset.userId, "password reset", (fact) => audit({ ...by, ...fact }), tx); // a token must not outlive the password it was made under
    await audit({ ...by, action: "person.password_reset", entity: "user", entityId: reset.userId });
    return reset.userId as string;
  });
}

export async function updatePerson(
  actor: Principal,
  userId: string,
  patch: { role?: Role; designated?: boolean; disabled?: boolean },
) {
  if (!can(actor, "people.manage")) throw forbidden();
  await audited(actor, async (tx, audit) => {
    // One change to an organisation's people at a time: two owners demoting each other at
    // once would each count two owners and leave none. The second waits, then counts again.
    await lockOrganisation(actor.organisationId, tx);
    const before = await people.getPerson(actor.organisationId, userId, tx);
    if (!before) throw notFound("No such person in your organisation.");
    const losesOwner = before.role === "owner" && !before.disabled && ((patch.role && patch.role !== "owner") || patch.disabled);
    if (losesOwner && (await people.countActiveOwners(actor.organisationId, tx)) <= 1) {
      throw fieldError("role", "The organisation needs at least one active owner.");
    }
    await people.updatePerson(actor.organisationId, userId, patch, tx);
    // A person's API tokens never act above the person: disabled, they stop; demoted, they are capped.
    if (patch.disabled) {
      await people.deleteSessionsOf(userId, tx);
      await revokeTokensOf(actor.organisationId, userId, "person disabled", audit, tx);
    } else if (patch.role) await capTokensOf(actor.organisationId, userId, patch.role, audit, tx);
    const after = await people.getPerson(actor.organisationId, userId, tx);
    await audit({ action: "person.updated", entity: "user", entityId: userId, before, after });
  });
}
