import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { FleetRecordHead } from "@/components/fleet/page-heads";
import { MachineForm } from "@/components/fleet/machine-form";
import { Fact } from "@/components/ui/fact";
import { getMachine, getUnits } from "@/db/fleet";
import { can } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import { isUuid } from "@/lib/http/ids";
import { machineJson } from "@/lib/kits/answers";
import { toMachine } from "@/lib/kits/assemble";
import { formatLength, formatWeight } from "@/lib/kits/display";
import { machineClassChoices } from "@/lib/kits/fleet-service";
import { SIDE_LABELS } from "@/lib/kits/model";

export const metadata: Metadata = { title: "Machine" };

export default async function MachinePage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ saved?: string }> }) {
  const principal = await requirePage("fleet.view");
  const { id } = await params;
  if (!isUuid(id)) notFound();
  const row = await getMachine(principal.organisationId, id);
  if (!row) notFound();
  const m = machineJson(toMachine(row));
  const units = await getUnits(principal.organisationId);
  const saved = (await searchParams).saved === "1";
  return (
    <div className="flex max-w-3xl flex-col gap-5">
      <FleetRecordHead backHref="/machines" backLabel="All machines" name={m.name} saved={saved} />
      <dl className="grid grid-cols-2 gap-3">
        <Fact label="Class">{m.classLabel}</Fact>
        <Fact label="Shipping weight">{formatWeight(m.weight.value, units)}</Fact>
        <Fact label="Transport length">{formatLength(m.length.value, units)}</Fact>
        <Fact label="Width × height">
          {m.width ? formatLength(m.width.value, units) : "not given"} × {m.height ? formatLength(m.height.value, units) : "not given"}
        </Fact>
        <Fact label="Articulates">{m.articulated ? "Yes" : "No"}</Fact>
        <Fact label="Accessories">{m.accessories.length ? m.accessories.join(", ") : "None"}</Fact>
        <Fact label="Centre of gravity">{m.cgFromFront ? `${formatLength(m.cgFromFront.value, units)} from the front` : `Not known: the middle (${formatLength(Math.round(m.length.value / 2), units)} from the front) is assumed`}</Fact>
      </dl>
      <section aria-labelledby="points-heading" className="flex flex-col gap-2">
        <h2 id="points-heading" className="text-xl font-bold">Tie-down points ({m.tiedownPoints.length})</h2>
        {m.tiedownPoints.length === 0 ? (
          <p className="text-lg">None recorded.</p>
        ) : (
          <ul className="flex flex-col gap-1 text-lg">
            {m.tiedownPoints.map((p) => (
              <li key={p.label}>
                <span className="font-bold">{p.label}</span>: {SIDE_LABELS[p.side].toLowerCase()}, {formatLength(p.position.value, units)} from the front
              </li>
            ))}
          </ul>
        )}
      </section>
      {can(principal, "fleet.manage") && (
        <section aria-labelledby="edit-heading" className="flex flex-col gap-3 border-t-2 border-ink-soft pt-4">
          <h2 id="edit-heading" className="text-2xl font-bold">Change the details</h2>
          <MachineForm machine={m} classes={await machineClassChoices(principal.organisationId)} units={units} />
        </section>
      )}
    </div>
  );
}
