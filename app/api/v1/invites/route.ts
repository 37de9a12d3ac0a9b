import { listOpenInvites } from "@/db/people";
import { invitePerson } from "@/lib/auth/accounts";
import { inviteSchema } from "@/lib/auth/schemas";
import { route } from "@/lib/http/route";

export const GET = route("people.manage", {}, async ({ principal }) => ({
  data: await listOpenInvites(principal.organisationId),
}));

export const POST = route("people.manage", { body: inviteSchema }, async ({ principal, body }) => {
  const invite = await invitePerson(principal, body);
  return Response.json({ id: invite.id, expiresAt: invite.expiresAt }, { status: 201 });
});
