import { route } from "@/lib/http/route";
import { trailerJson } from "@/lib/kits/answers";
import { createTrailer, getTrailer, listTrailers } from "@/lib/kits/fleet-service";
import { onDateQuerySchema, trailerInputSchema } from "@/lib/kits/schemas";
import { principalClock } from "@/lib/organisations/service";

/** The organisation's trailers, each anchor point with its verdict for `on` (default today). */
export const GET = route("fleet.view", { query: onDateQuerySchema }, async ({ principal, query }) => {
  const on = query.on ?? ((await principalClock(principal)).today);
  return { on, data: (await listTrailers(principal.organisationId, on)).map(trailerJson) };
});

export const POST = route("fleet.manage", { body: trailerInputSchema }, async ({ principal, body }) => {
  const id = await createTrailer(principal, body);
  const on = (await principalClock(principal)).today;
  return Response.json(trailerJson(await getTrailer(principal.organisationId, id, on)), { status: 201 });
});
