import type { Metadata } from "next";
import Link from "next/link";
import { MachineClassForm } from "@/components/fleet/machine-class-form";
import { FleetListHead } from "@/components/fleet/page-heads";
import { getUnits, listMachineClasses } from "@/db/fleet";
import { can } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import { machineClassLabel } from "@/lib/kits/answers";
import { formatLength, formatWeight } from "@/lib/kits/display";
import { listMachines } from "@/lib/kits/fleet-service";

export const metadata: Metadata = { title: "Machines" };

/** The machines the outfit hauls, with what the kit builder needs to know of each. */
export default async function MachinesPage() {
  const principal = await requirePage("fleet.view");
  const [machines, units] = await Promise.all([listMachines(principal.organisationId), getUnits(principal.organisationId)]);
  const owner = can(principal, "settings.manage");
  const classes = owner ? await listMachineClasses(principal.organisationId) : [];
  return (
    <div className="flex max-w-3xl flex-col gap-5">
      <FleetListHead title="Machines" addHref="/machines/new" addLabel="Add a machine" mayAdd={can(principal, "fleet.manage")} />
      {machines.length === 0 ? (
        <p className="text-lg">No machines yet.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {machines.map((m) => (
            <li key={m.id}>
              <Link href={`/machines/${m.id}`} className="flex flex-col gap-1 rounded-xl border-2 border-ink p-3">
                <span className="text-2xl font-bold underline">{m.name}</span>
                <span className="text-lg">
                  {machineClassLabel(m.machineClass)} · {formatWeight(m.weightLb, units)} · {formatLength(m.lengthMm, units)} long
                </span>
                <span className="text-base text-ink-soft">
                  {m.accessories.length ? `With ${m.accessories.join(", ")}` : "No accessories"} · {m.tiedownPoints.length} tie-down points{m.articulated ? " · articulated" : ""}
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
      {owner && (
        <section aria-labelledby="classes-heading" className="flex flex-col gap-2 rounded-xl border-2 border-ink-soft p-3">
          <h2 id="classes-heading" className="text-xl font-bold">Machine classes of your own</h2>
          <p className="text-lg">{classes.length ? classes.map((c) => c.name).join(", ") : "None yet: the built-in classes are mini excavator, skid steer, compact track loader, wheel loader, roller and other."}</p>
          <MachineClassForm />
        </section>
      )}
    </div>
  );
}
