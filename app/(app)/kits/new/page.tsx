import type { Metadata } from "next";
import Link from "next/link";
import { NewKitForm } from "@/components/kits/new-kit-form";
import { getUnits } from "@/db/fleet";
import { requirePage } from "@/lib/auth/session";
import { formatWeight } from "@/lib/kits/display";
import { listMachines, listTrailers } from "@/lib/kits/fleet-service";
import { principalClock } from "@/lib/organisations/service";
import { addDays, isIsoDate } from "@/lib/time";

export const metadata: Metadata = { title: "Plan a kit" };

/** A new kit for a date (tomorrow unless asked), a job, a machine and a trailer. */
export default async function NewKitPage({ searchParams }: { searchParams: Promise<{ date?: string }> }) {
  const principal = await requirePage("fleet.manage");
  const [units, { today }] = await Promise.all([getUnits(principal.organisationId), principalClock(principal)]);
  const asked = (await searchParams).date;
  const [machines, trailers] = await Promise.all([listMachines(principal.organisationId), listTrailers(principal.organisationId, today)]);
  return (
    <div className="flex max-w-xl flex-col gap-4">
      <h1 className="text-3xl font-bold">Plan a kit</h1>
      {machines.length === 0 || trailers.length === 0 ? (
        <p className="text-lg">
          A kit needs a machine and a trailer.{" "}
          {machines.length === 0 && <Link href="/machines/new" className="font-bold underline">Add a machine</Link>}
          {machines.length === 0 && trailers.length === 0 && " and "}
          {trailers.length === 0 && <Link href="/trailers/new" className="font-bold underline">add a trailer</Link>} first.
        </p>
      ) : (
        <NewKitForm
          date={asked && isIsoDate(asked) ? asked : addDays(today, 1)}
          machines={machines.map((m) => ({ id: m.id, label: `${m.name} (${formatWeight(m.weightLb, units).replace(/ \(.*\)$/, "")})`, articulated: m.articulated }))}
          trailers={trailers.map((t) => ({ id: t.id, label: `${t.name} (${t.anchorPoints.filter((a) => a.usable.ok).length} anchor points in use)` }))}
        />
      )}
    </div>
  );
}
