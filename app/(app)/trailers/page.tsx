import type { Metadata } from "next";
import Link from "next/link";
import { FleetListHead } from "@/components/fleet/page-heads";
import { getUnits } from "@/db/fleet";
import { can } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import { formatLength, formatWeight } from "@/lib/kits/display";
import { listTrailers } from "@/lib/kits/fleet-service";
import { TRAILER_TYPE_LABELS } from "@/lib/kits/model";
import { principalClock } from "@/lib/organisations/service";

export const metadata: Metadata = { title: "Trailers" };

/** The trailers, each with how many of its anchor points may be used today. */
export default async function TrailersPage() {
  const principal = await requirePage("fleet.view");
  const [units, { today }] = await Promise.all([getUnits(principal.organisationId), principalClock(principal)]);
  const trailers = await listTrailers(principal.organisationId, today);
  return (
    <div className="flex max-w-3xl flex-col gap-5">
      <FleetListHead title="Trailers" addHref="/trailers/new" addLabel="Add a trailer" mayAdd={can(principal, "fleet.manage")} />
      {trailers.length === 0 ? (
        <p className="text-lg">No trailers yet.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {trailers.map((t) => {
            const out = t.anchorPoints.filter((a) => !a.usable.ok);
            return (
              <li key={t.id}>
                <Link href={`/trailers/${t.id}`} className={`flex flex-col gap-1 rounded-xl border-2 p-3 ${out.length ? "border-stop" : "border-ink"}`}>
                  <span className="text-2xl font-bold underline">{t.name}</span>
                  <span className="text-lg">
                    {TRAILER_TYPE_LABELS[t.trailerType]} · deck {formatLength(t.deckLengthMm, units)} · GVWR {formatWeight(t.gvwrLb, units)}
                  </span>
                  <span className={`text-base ${out.length ? "font-bold text-stop" : ""}`}>
                    {t.anchorPoints.length - out.length} of {t.anchorPoints.length} anchor points usable today
                    {out.length > 0 && `; ✕ out of use or overdue: ${out.map((a) => a.label).join(", ")}`}
                  </span>
                </Link>
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
