import { getOrganisation } from "@/db/organisations";
import { route } from "@/lib/http/route";

export const GET = route("stock.view", {}, async ({ principal }) => {
  const organisation = await getOrganisation(principal.organisationId);
  return {
    id: principal.userId,
    name: principal.name,
    email: principal.email,
    role: principal.role,
    designated: principal.designated,
    organisation: { id: organisation!.id, name: organisation!.name },
  };
});
