import { acceptInvite } from "@/lib/auth/accounts";
import { acceptInviteSchema } from "@/lib/auth/schemas";
import { startSession } from "@/lib/auth/session";
import { jsonWithCookie } from "@/lib/http/cookies";
import { publicRoute } from "@/lib/http/route";

export const POST = publicRoute({ body: acceptInviteSchema }, async ({ body }) => {
  const userId = await acceptInvite(body);
  return jsonWithCookie({ ok: true, userId }, await startSession(userId), 201);
});
