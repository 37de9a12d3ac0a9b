import { listPeople } from "@/db/people";
import { route } from "@/lib/http/route";

export const GET = route("people.manage", {}, async ({ principal }) => ({
  data: await listPeople(principal.organisationId),
}));
