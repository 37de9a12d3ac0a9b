import { withdrawInvite } from "@/lib/auth/accounts";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/route";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export const DELETE = route("people.manage", {}, async ({ principal, params }) => {
  if (!UUID.test(params.id)) throw notFound("No open invite with that id.");
  await withdrawInvite(principal, params.id);
  return new Response(null, { status: 204 });
});
