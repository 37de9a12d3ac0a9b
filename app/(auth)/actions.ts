"use server";
import { cookies, headers } from "next/headers";
import { redirect } from "next/navigation";
import { z } from "zod";
import { publicFormAction } from "@/lib/auth/action";
import * as accounts from "@/lib/auth/accounts";
import {
  acceptInviteSchema,
  resetPasswordSchema,
  resetRequestSchema,
  signInSchema,
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

export const signUpAction = publicFormAction(signUpFormSchema, async (input) => {
  const userId = await accounts.signUp(input);
  await setSessionCookie(userId);
  redirect("/");
});

export const acceptInviteAction = publicFormAction(acceptInviteSchema, async (input) => {
  const userId = await accounts.acceptInvite(input);
  await setSessionCookie(userId);
  redirect("/");
});

export const requestResetAction = publicFormAction(resetRequestSchema, async ({ email }) => {
  await accounts.requestPasswordReset(email);
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
