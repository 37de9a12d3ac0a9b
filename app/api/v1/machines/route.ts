import { route } from "@/lib/http/route";
import { machineJson } from "@/lib/kits/answers";
import { createMachine, getMachine, listMachines } from "@/lib/kits/fleet-service";
import { machineInputSchema } from "@/lib/kits/schemas";

/** The organisation's machines, by name. */
export const GET = route("fleet.view", {}, async ({ principal }) => ({ data: (await listMachines(principal.organisationId)).map(machineJson) }));

export const POST = route("fleet.manage", { body: machineInputSchema }, async ({ principal, body }) => {
  const id = await createMachine(principal, body);
  return Response.json(machineJson(await getMachine(principal.organisationId, id)), { status: 201 });
});
