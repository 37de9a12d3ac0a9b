import { confirmSignUp } from "@/lib/auth/accounts";
import { signUpConfirmSchema } from "@/lib/auth/schemas";
import { startSession } from "@/lib/auth/session";
import { jsonWithCookie } from "@/lib/http/cookies";
import { publicRoute } from "@/lib/http/route";

/** The token of the sign-up e-mail: makes the company and its owner, signed in. */
export const POST = publicRoute({ body: signUpConfirmSchema }, async ({ body }) => {
  const userId = await confirmSignUp(body.token);
  return jsonWithCookie({ ok: true, userId }, await startSession(userId), 201);
});
