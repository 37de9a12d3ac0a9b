import { fieldError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { addDays, daysBetween } from "@/lib/time";
import { createKit, kitAnswer, listKitEntries } from "@/lib/kits/kit-service";
import { kitCreateSchema, kitListQuerySchema } from "@/lib/kits/schemas";
import { principalClock } from "@/lib/organisations/service";

/** Kits from `from` (default today) to `to` (default 13 days after `from`), each with its verdict. */
export const GET = route("fleet.view", { query: kitListQuerySchema }, async ({ principal, query }) => {
  const from = query.from ?? ((await principalClock(principal)).today);
  const to = query.to ?? addDays(from, 13);
  if (to < from) throw fieldError("to", "to must not be before from (today, when from is not given).");
  if (daysBetween(from, to) > 92) throw fieldError("to", "Ask for at most 92 days at once.");
  return { from, to, data: await listKitEntries(principal.organisationId, from, to) };
});

export const POST = route("fleet.manage", { body: kitCreateSchema }, async ({ principal, body }) => {
  const id = await createKit(principal, body);
  return Response.json(await kitAnswer(principal.organisationId, id), { status: 201 });
});
