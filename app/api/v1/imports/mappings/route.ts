import { listMappings } from "@/db/imports";
import { savedMappingSchema } from "@/lib/import/api-schemas";
import { route } from "@/lib/http/route";
import { saveMapping } from "@/lib/import/mappings";

/** Column mappings saved by name, for the next file from the same supplier. */
export const GET = route("stock.import", {}, async ({ principal }) => {
  return { data: await listMappings(principal.organisationId) };
});

/** Saves a mapping by name; one of the same name is replaced. */
export const POST = route("stock.import", { body: savedMappingSchema }, async ({ principal, body }) => {
  const id = await saveMapping(principal, body.name, body.mapping);
  return Response.json({ id, name: body.name, mapping: body.mapping }, { status: 201 });
});
