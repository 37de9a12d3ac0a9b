import { listYards } from "@/db/items";
import { route } from "@/lib/http/route";

export const GET = route("stock.view", {}, async ({ principal }) => ({ data: await listYards(principal.organisationId) }));
