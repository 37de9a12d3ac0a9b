import { requestPasswordReset } from "@/lib/auth/accounts";
import { resetRequestSchema } from "@/lib/auth/schemas";
import { publicRoute } from "@/lib/http/route";

/** Always 202, whether or not the e-mail has an account. */
export const POST = publicRoute({ body: resetRequestSchema }, async ({ body, ip }) => {
  await requestPasswordReset(body.email, ip);
  return Response.json({ ok: true }, { status: 202 });
});
