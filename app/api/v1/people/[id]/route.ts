import { getPerson } from "@/db/people";
import { updatePerson } from "@/lib/auth/accounts";
import { memberUpdateSchema } from "@/lib/auth/schemas";
import { route } from "@/lib/http/route";

export const PATCH = route("people.manage", { body: memberUpdateSchema }, async ({ principal, body, params }) => {
  await updatePerson(principal, params.id, body);
  return getPerson(principal.organisationId, params.id);
});
