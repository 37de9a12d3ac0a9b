import { route } from "@/lib/http/route";
import { addMachineClass, machineClassChoices } from "@/lib/kits/fleet-service";
import { machineClassSchema } from "@/lib/kits/schemas";

/** The built-in machine classes and the organisation's own. */
export const GET = route("fleet.view", {}, async ({ principal }) => ({ data: await machineClassChoices(principal.organisationId) }));

/** An owner adds a class of the organisation's own (adding one that exists is answered 200). */
export const POST = route("settings.manage", { body: machineClassSchema }, async ({ principal, body }) => {
  const added = await addMachineClass(principal, body.name);
  return Response.json(added, { status: added.created ? 201 : 200 });
});
