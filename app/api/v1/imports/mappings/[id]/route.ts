import { deleteMapping } from "@/db/imports";
import { notFound, uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";

export const DELETE = route("stock.import", {}, async ({ principal, params }) => {
  if (!(await deleteMapping(principal.organisationId, uuidParam(params.id, "mapping"), principal.userId))) throw notFound("No such mapping.");
  return { ok: true };
});
