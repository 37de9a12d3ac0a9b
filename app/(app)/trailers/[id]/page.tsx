import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { FleetRecordHead } from "@/components/fleet/page-heads";
import { AnchorActions } from "@/components/fleet/anchor-actions";
import { TrailerForm } from "@/components/fleet/trailer-form";
import { UsableBadge } from "@/components/kits/state-badge";
import { Fact } from "@/components/ui/fact";
import { getUnits, latestAnchorEvents } from "@/db/fleet";
import { kitsUsingAnchor } from "@/db/kits";
import { can } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import { isUuid } from "@/lib/http/ids";
import { trailerJson } from "@/lib/kits/answers";
import { formatLength, formatWeight } from "@/lib/kits/display";
import { getTrailer } from "@/lib/kits/fleet-service";
import { ANCHOR_STATUS_LABELS, COUPLING_LABELS, SIDE_LABELS } from "@/lib/kits/model";
import { principalClock } from "@/lib/organisations/service";
import { formatDay } from "@/lib/time";

export const metadata: Metadata = { title: "Trailer" };

const EVENT_WORDS: Record<string, string> = {
  created: "Added",
  edited: "Details changed",
  inspection: "Inspected",
  tag_out: "Taken out of use",
  return_to_service: "Returned to use",
  retired: "Retired",
};

/** A trailer, its anchor points with their standing and what can be done to each, and (for planners) its form. */
export default async function TrailerPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ saved?: string }> }) {
  const principal = await requirePage("fleet.view");
  const { id } = await params;
  if (!isUuid(id)) notFound();
  const [units, { timeZone, today }] = await Promise.all([getUnits(principal.organisationId), principalClock(principal)]);
  const trailer = await getTrailer(principal.organisationId, id, today).catch(() => null);
  if (!trailer) notFound();
  const t = trailerJson(trailer);
  const latest = await latestAnchorEvents(principal.organisationId, id);
  const affected = new Map(await Promise.all(t.anchorPoints.filter((a) => !a.usable.ok).map(async (a) => [a.id, await kitsUsingAnchor(principal.organisationId, a.id, today)] as const)));
  const may = { tagOut: can(principal, "items.check"), inspect: can(principal, "items.inspect"), retire: can(principal, "fleet.manage") };
  const saved = (await searchParams).saved === "1";
  return (
    <div className="flex max-w-3xl flex-col gap-5">
      <FleetRecordHead backHref="/trailers" backLabel="All trailers" name={t.name} saved={saved} />
      <dl className="grid grid-cols-2 gap-3">
        <Fact label="Type">{t.typeLabel}</Fact>
        <Fact label="Coupling">{COUPLING_LABELS[t.coupling]}</Fact>
        <Fact label="Deck">{formatLength(t.deckLength.value, units)}{t.tiltLength.value > 0 ? `, ${formatLength(t.tiltLength.value, units)} tilts` : ", fixed"}</Fact>
        <Fact label="Deck width">{t.deckWidth ? formatLength(t.deckWidth.value, units) : "not given"}</Fact>
        <Fact label="GVWR">{formatWeight(t.gvwr.value, units)}</Fact>
        <Fact label="Empty weight">{formatWeight(t.emptyWeight.value, units)}</Fact>
        <Fact label="Empty tongue weight">{formatWeight(t.emptyTongueWeight.value, units)}</Fact>
        <Fact label="Hitch to axles' centre">{formatLength(t.hitchToAxle.value, units)}</Fact>
        <Fact label="Hitch to deck front">{t.hitchToDeckFront ? formatLength(t.hitchToDeckFront.value, units) : "not measured"}</Fact>
      </dl>

      <section aria-labelledby="anchors-heading" className="flex flex-col gap-3">
        <h2 id="anchors-heading" className="text-2xl font-bold">Anchor points ({t.anchorPoints.length})</h2>
        <p className="text-lg">Rated gear like any item: a kit cannot use a point that is out of use or overdue for inspection on its date.</p>
        <ul className="flex flex-col gap-3">
          {t.anchorPoints.map((a) => {
            const last = latest.get(a.id);
            const kits = affected.get(a.id) ?? [];
            return (
              <li key={a.id} className={`flex flex-col gap-2 rounded-xl border-2 p-3 ${a.usable.ok ? "border-ink-soft" : "border-stop"}`} data-testid="anchor-point" data-label={a.label}>
                <p className="flex flex-wrap items-center gap-2 text-xl font-bold">
                  {a.label}
                  <UsableBadge ok={a.usable.ok} label={a.usable.ok ? ANCHOR_STATUS_LABELS[a.status] : a.status === "in_service" ? "Inspection overdue" : ANCHOR_STATUS_LABELS[a.status]} />
                </p>
                <p className="text-lg">
                  {SIDE_LABELS[a.side]}, {formatLength(a.position.value, units)} from the deck&apos;s front · WLL {formatWeight(a.wll.value, units)}
                </p>
                <p className="text-base">
                  Next inspection: {a.nextInspectionDue ?? "not scheduled"}
                  {a.lastInspectedOn && ` · last inspected ${a.lastInspectedOn}`}
                </p>
                {!a.usable.ok && <p className="text-base font-bold text-stop">{a.usable.reasons.map((r) => r.message).join(" ")}</p>}
                {last && last.type !== "created" && (
                  <p className="text-base">
                    {EVENT_WORDS[last.type] ?? last.type} {formatDay(last.at, timeZone)}
                    {last.actorName && ` by ${last.actorName}`}
                    {last.note && `: “${last.note}”`}
                  </p>
                )}
                {kits.length > 0 && (
                  <p className="text-base font-bold text-stop">
                    Kits to change:{" "}
                    {kits.map((k, i) => (
                      <span key={k.id}>
                        {i > 0 && ", "}
                        <Link href={`/kits/${k.id}`} className="underline">
                          {k.job} ({k.date})
                        </Link>
                      </span>
                    ))}
                  </p>
                )}
                <AnchorActions anchorId={a.id} label={a.label} status={a.status} may={may} />
              </li>
            );
          })}
        </ul>
      </section>

      {can(principal, "fleet.manage") && (
        <section aria-labelledby="edit-heading" className="flex flex-col gap-3 border-t-2 border-ink-soft pt-4">
          <h2 id="edit-heading" className="text-2xl font-bold">Change the details and the list of anchor points</h2>
          <TrailerForm trailer={t} units={units} />
        </section>
      )}
    </div>
  );
}
