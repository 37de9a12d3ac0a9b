import { resetPassword } from "@/lib/auth/accounts";
import { resetPasswordSchema } from "@/lib/auth/schemas";
import { startSession } from "@/lib/auth/session";
import { jsonWithCookie } from "@/lib/http/cookies";
import { publicRoute } from "@/lib/http/route";

export const POST = publicRoute({ body: resetPasswordSchema }, async ({ body }) => {
  const userId = await resetPassword(body);
  return jsonWithCookie({ ok: true, userId }, await startSession(userId));
});
