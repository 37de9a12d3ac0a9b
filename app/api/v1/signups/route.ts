import { requestSignUp, signUpSentMessage } from "@/lib/auth/accounts";
import { signUpSchema } from "@/lib/auth/schemas";
import { publicRoute } from "@/lib/http/route";

/**
 * A new company with its first owner, once the e-mailed link is used (POST
 * /api/v1/signups/confirm). Always 202 with the same words, whether or not the address has
 * an account: the e-mail tells which.
 */
export const POST = publicRoute({ body: signUpSchema }, async ({ body, ip }) => {
  await requestSignUp(body, ip);
  return Response.json({ ok: true, message: signUpSentMessage(body.email) }, { status: 202 });
});
