import type { Metadata } from "next";
import { TrailerForm } from "@/components/fleet/trailer-form";
import { getUnits } from "@/db/fleet";
import { requirePage } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Add a trailer" };

export default async function NewTrailerPage() {
  const principal = await requirePage("fleet.manage");
  const units = await getUnits(principal.organisationId);
  return (
    <div className="flex max-w-xl flex-col gap-4">
      <h1 className="text-3xl font-bold">Add a trailer</h1>
      <TrailerForm units={units} />
    </div>
  );
}
