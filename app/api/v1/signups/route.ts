import { signUp } from "@/lib/auth/accounts";
import { signUpSchema } from "@/lib/auth/schemas";
import { startSession } from "@/lib/auth/session";
import { jsonWithCookie } from "@/lib/http/cookies";
import { publicRoute } from "@/lib/http/route";

/** A new company with its first owner, signed in. */
export const POST = publicRoute({ body: signUpSchema }, async ({ body }) => {
  const userId = await signUp(body);
  return jsonWithCookie({ ok: true, userId }, await startSession(userId), 201);
});
