import { withdrawInvite } from "@/lib/auth/accounts";
import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";

export const DELETE = route("people.manage", {}, async ({ principal, params }) => {
  await withdrawInvite(principal, uuidParam(params.id, "open invite"));
  return new Response(null, { status: 204 });
});
