import type { Metadata } from "next";
import { MachineForm } from "@/components/fleet/machine-form";
import { getUnits } from "@/db/fleet";
import { requirePage } from "@/lib/auth/session";
import { machineClassChoices } from "@/lib/kits/fleet-service";

export const metadata: Metadata = { title: "Add a machine" };

export default async function NewMachinePage() {
  const principal = await requirePage("fleet.manage");
  const [classes, units] = await Promise.all([machineClassChoices(principal.organisationId), getUnits(principal.organisationId)]);
  return (
    <div className="flex max-w-xl flex-col gap-4">
      <h1 className="text-3xl font-bold">Add a machine</h1>
      <MachineForm classes={classes} units={units} />
    </div>
  );
}
