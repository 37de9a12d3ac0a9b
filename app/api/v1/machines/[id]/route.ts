import { uuidParam } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { machineJson } from "@/lib/kits/answers";
import { editMachine, getMachine } from "@/lib/kits/fleet-service";
import { machineInputSchema } from "@/lib/kits/schemas";

export const GET = route("fleet.view", {}, async ({ principal, params }) => machineJson(await getMachine(principal.organisationId, uuidParam(params.id, "machine"))));

/** Replaces the machine's details (the whole machine, as the form sends it). */
export const PUT = route("fleet.manage", { body: machineInputSchema }, async ({ principal, params, body }) => {
  const id = uuidParam(params.id, "machine");
  await editMachine(principal, id, body);
  return machineJson(await getMachine(principal.organisationId, id));
});
