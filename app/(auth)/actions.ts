"use server";
import { cookies, headers } from "next/headers";
import { redirect } from "next/navigation";
import { z } from "zod";
import { publicFormAction } from "@/lib/auth/action";
import * as accounts from "@/lib/auth/accounts";
import { REMINDER_LABELS } from "@/lib/mail/kinds";
import { unsubscribe } from "@/lib/mail/service";
import {
  acceptInviteSchema,
  resetPasswordSchema,
  resetRequestSchema,
  signInSchema,
  signUpConfirmSchema,
  signUpFormSchema,
} from "@/lib/auth/schemas";
import { currentSessionId, endSession, startSession } from "@/lib/auth/session";
import { clientIp } from "@/lib/http/client-ip";
import { safeNextPath } from "@/lib/http/next-path";

async function setSessionCookie(userId: string) {
  const cookie = await startSession(userId);
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}

export const signInAction = publicFormAction(signInSchema, async (input) => {
  const userId = await accounts.signIn({ email: input.email, password: input.password, ip: clientIp(await headers()) });
  await setSessionCookie(userId);
  redirect(safeNextPath(input.next) ?? "/");
});

/** The same answer whether or not the address has an account: the e-mail says which (issue 11.3). */
export const signUpAction = publicFormAction(signUpFormSchema, async (input) => {
  await accounts.requestSignUp(input, clientIp(await headers()));
  return { ok: true, message: accounts.signUpSentMessage(input.email) };
});

export const confirmSignUpAction = publicFormAction(signUpConfirmSchema, async ({ token }) => {
  const userId = await accounts.confirmSignUp(token);
  await setSessionCookie(userId);
  redirect("/");
});

export const acceptInviteAction = publicFormAction(acceptInviteSchema, async (input) => {
  const userId = await accounts.acceptInvite(input);
  await setSessionCookie(userId);
  redirect("/");
});

export const requestResetAction = publicFormAction(resetRequestSchema, async ({ email }) => {
  await accounts.requestPasswordReset(email, clientIp(await headers()));
  return { ok: true, message: "If that e-mail has an account, a reset link is on its way. It works for 2 hours." };
});

export const resetPasswordAction = publicFormAction(resetPasswordSchema, async (input) => {
  const userId = await accounts.resetPassword(input);
  await setSessionCookie(userId);
  redirect("/");
});

export const signOutAction = publicFormAction(z.object({}), async () => {
  const sessionId = await currentSessionId();
  if (sessionId) {
    const blank = await endSession(sessionId);
    (await cookies()).set(blank.name, blank.value, blank.attributes);
  }
  redirect("/sign-in");
});

/** The button of an unsubscribe link's page: no sign-in, the signed link is the authority. */
export const unsubscribeAction = publicFormAction(z.object({ token: z.string().min(1, "This unsubscribe link is incomplete.") }), async ({ token }) => {
  const { kind, email } = await unsubscribe(token);
  return { ok: true, message: `Done: Linkyard stops sending ${REMINDER_LABELS[kind].short} to ${email}. Your other e-mails stay as they were.` };
});
