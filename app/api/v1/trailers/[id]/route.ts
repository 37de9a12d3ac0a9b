import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { trailerJson } from "@/lib/kits/answers";
import { editTrailer, getTrailer } from "@/lib/kits/fleet-service";
import { onDateQuerySchema, trailerInputSchema } from "@/lib/kits/schemas";
import { principalClock } from "@/lib/organisations/service";

/** The trailer and its anchor points in use or out of use, each judged for `on` (default today). */
export const GET = route("fleet.view", { query: onDateQuerySchema }, async ({ principal, params, query }) => {
  const on = query.on ?? ((await principalClock(principal)).today);
  return trailerJson(await getTrailer(principal.organisationId, uuidParam(params.id, "trailer"), on));
});

/**
 * Replaces the trailer's details and its anchor points: points sent with their id are kept
 * and updated, new ones created, those left out retired (answered in `retired`).
 */
export const PUT = route("fleet.manage", { body: trailerInputSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id, "trailer");
  const { retired } = await editTrailer(principal, id, body);
  const on = (await principalClock(principal)).today;
  return { ...trailerJson(await getTrailer(principal.organisationId, id, on)), retired };
});
