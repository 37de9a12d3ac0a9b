import { signIn } from "@/lib/auth/accounts";
import { signInSchema } from "@/lib/auth/schemas";
import { endSession, sessionIdFromRequest, startSession } from "@/lib/auth/session";
import { jsonWithCookie } from "@/lib/http/cookies";
import { publicRoute } from "@/lib/http/route";

/** Sign in: answers the person and sets the session cookie. */
export const POST = publicRoute({ body: signInSchema }, async ({ body, ip }) => {
  const userId = await signIn({ ...body, ip });
  return jsonWithCookie({ ok: true, userId }, await startSession(userId));
});

/** Sign out this session. */
export const DELETE = publicRoute({}, async ({ request }) => {
  const sessionId = sessionIdFromRequest(request);
  if (!sessionId) return new Response(null, { status: 204 });
  const blank = await endSession(sessionId);
  return new Response(null, { status: 204, headers: { "Set-Cookie": blank.serialize() } });
});
