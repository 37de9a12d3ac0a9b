import type { Metadata } from "next";
import Link from "next/link";
import { KitCard } from "@/components/kits/kit-card";
import { buttonClass } from "@/components/ui/button-class";
import { can } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import type { KitListEntry } from "@/lib/kits/answers";
import { kitsStillOut, listKitEntries } from "@/lib/kits/kit-service";
import { principalClock } from "@/lib/organisations/service";
import { addDays, dayLabel, isIsoDate } from "@/lib/time";

export const metadata: Metadata = { title: "Kits" };

const DAYS = 14;

/** The coming days' kits by date, each with its state and verdict in words; gear still out first. */
export default async function KitsPage({ searchParams }: { searchParams: Promise<{ from?: string }> }) {
  const principal = await requirePage("fleet.view");
  const { today } = await principalClock(principal);
  const asked = (await searchParams).from;
  const from = asked && isIsoDate(asked) ? asked : today;
  const to = addDays(from, DAYS - 1);
  const [entries, out] = await Promise.all([listKitEntries(principal.organisationId, from, to), from === today ? kitsStillOut(principal.organisationId, today) : Promise.resolve([])]);
  const canEdit = can(principal, "fleet.manage");
  const canLoad = can(principal, "kits.load");
  const byDate = new Map<string, KitListEntry[]>();
  for (const k of entries) byDate.set(k.date, [...(byDate.get(k.date) ?? []), k]);
  const tomorrow = addDays(today, 1);
  if (from <= tomorrow && to >= tomorrow && !byDate.has(tomorrow)) byDate.set(tomorrow, []);
  const dates = [...byDate.keys()].sort();

  return (
    <div className="flex max-w-3xl flex-col gap-5">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-3xl font-bold">Kits</h1>
        {canEdit && (
          <Link href="/kits/new" className={buttonClass("primary")}>
            Plan a kit
          </Link>
        )}
      </div>
      <p className="text-lg">
        {dayLabel(from, today)} to {dayLabel(to, today)}.
      </p>

      {out.length > 0 && (
        <section aria-labelledby="out-heading" className="flex flex-col gap-2">
          <h2 id="out-heading" className="text-2xl font-bold">Still out on jobs</h2>
          <ul className="flex flex-col gap-3">
            {out.map((k) => (
              <KitCard key={k.id} kit={k} canEdit={canEdit} canLoad={canLoad} copyTo={tomorrow} />
            ))}
          </ul>
        </section>
      )}

      {dates.length === 0 && <p className="text-lg">No kits planned for these days.</p>}
      {dates.map((date) => (
        <section key={date} aria-labelledby={`day-${date}`} className="flex flex-col gap-2">
          <h2 id={`day-${date}`} className="text-2xl font-bold">{dayLabel(date, today)}</h2>
          {byDate.get(date)!.length === 0 ? (
            <p className="text-lg">
              Nothing planned yet.{" "}
              {canEdit && (
                <Link href={`/kits/new?date=${date}`} className="font-bold underline">
                  Plan a kit for this day
                </Link>
              )}
            </p>
          ) : (
            <ul className="flex flex-col gap-3">
              {byDate.get(date)!.map((k) => (
                <KitCard key={k.id} kit={k} canEdit={canEdit} canLoad={canLoad} copyTo={addDays(date, 1)} />
              ))}
            </ul>
          )}
        </section>
      ))}

      <nav aria-label="Other days" className="flex flex-wrap gap-3">
        <Link href={`/kits?from=${addDays(from, -DAYS)}`} className={buttonClass("secondary")}>
          Earlier
        </Link>
        {from !== today && (
          <Link href="/kits" className={buttonClass("secondary")}>
            From today
          </Link>
        )}
        <Link href={`/kits?from=${addDays(from, DAYS)}`} className={buttonClass("secondary")}>
          Later
        </Link>
      </nav>
    </div>
  );
}
