import { route } from "@/lib/http/route";
import { checkParsedRequest, securementCheckRequestSchema } from "@/lib/securement";

// A scratch securement check: the planned tiedowns of one machine against 49 CFR 393.
// A request that does not match the schema is a 400 with dotted paths (route()); a part
// that cannot be rated is a `fail` finding in a 200 answer (the engine never throws for it).
// route() has parsed the body with the engine's own schema, so the engine does not parse it again.
export const POST = route("securement.check", { body: securementCheckRequestSchema }, async ({ body }) => checkParsedRequest(body));
