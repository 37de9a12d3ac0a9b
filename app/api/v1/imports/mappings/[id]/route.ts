import { notFound, uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { deleteMapping } from "@/lib/import/mappings";

export const DELETE = route("stock.import", {}, async ({ principal, params }) => {
  if (!(await deleteMapping(principal, uuidParam(params.id, "mapping")))) throw notFound("No such mapping.");
  return { ok: true };
});
