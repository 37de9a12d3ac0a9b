import Link from "next/link";
import { KitPassBadge, KitStateBadge } from "@/components/kits/state-badge";
import { StatusMark } from "@/components/ui/status-mark";
import { stockBuckets } from "@/db/items";
import { listOpenInvites } from "@/db/people";
import { can } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import { listKitEntries } from "@/lib/kits/kit-service";
import { organisationClock } from "@/lib/organisations/service";
import { DUE_SOON_DAYS } from "@/lib/stock/api-schemas";
import { stockGlance } from "@/lib/stock/glance";
import { addDays, dayLabel, writtenDate } from "@/lib/time";

const n = (v: number) => v.toLocaleString("en-US");
const items = (v: number) => `${n(v)} ${v === 1 ? "item" : "items"}`;

const TONES = {
  stop: "bg-stop text-white",
  caution: "border-2 border-caution bg-caution-bg text-caution",
  idle: "border-2 border-idle bg-idle-bg text-idle",
} as const;

/**
 * Today: what matters on the organisation's today. Gear that may not be used (overdue for
 * inspection, tagged out and waiting for a decision, without a WLL), what falls due soon,
 * and the kits going out today and tomorrow. The counts come from the usability verdict
 * (lib/stock/glance.ts), so this page and the item pages never disagree.
 */
export default async function TodayPage() {
  const principal = await requirePage();
  const { today } = await organisationClock(principal.organisationId);
  const tomorrow = addDays(today, 1);
  const [buckets, invites, kits] = await Promise.all([
    can(principal, "stock.view") ? stockBuckets(principal.organisationId, today, addDays(today, DUE_SOON_DAYS)) : Promise.resolve([]),
    can(principal, "people.manage") ? listOpenInvites(principal.organisationId) : Promise.resolve([]),
    can(principal, "fleet.view") ? listKitEntries(principal.organisationId, today, tomorrow) : Promise.resolve([]),
  ]);
  const g = stockGlance(buckets, today);
  const tiles = [
    { label: "Overdue for inspection: do not use", value: g.overdue, tone: "stop", href: "/stock?due=overdue&status=in_service", show: true },
    { label: "Tagged out: waiting for a decision", value: g.taggedOut, tone: "stop", href: "/stock?status=tagged_out", show: true },
    { label: "No WLL: do not use in a tiedown", value: g.notRated, tone: "stop", href: "/stock?status=in_service&rated=no&due=current", show: g.notRated > 0 },
    { label: `Inspection due in the next ${DUE_SOON_DAYS} days`, value: g.dueSoon, tone: "caution", href: "/stock?due=30d&status=in_service&rated=yes", show: true },
    { label: "Retired or lost", value: g.retiredOrLost, tone: "idle", href: "/stock?status=retired,lost", show: true },
  ] as const;
  const goingOut = kits.filter((k) => k.state !== "returned");

  return (
    <div className="flex max-w-4xl flex-col gap-6">
      <div className="flex flex-col gap-1">
        <h1 className="text-3xl font-bold">Today</h1>
        <p className="text-lg text-ink-soft">{writtenDate(today)} · {principal.name}</p>
      </div>

      {can(principal, "stock.view") && (
        <section aria-labelledby="gear-heading" className="flex flex-col gap-3">
          <h2 id="gear-heading" className="text-xl font-bold">Gear</h2>
          <p className={`flex items-center gap-3 rounded-xl p-4 text-xl font-bold ${g.doNotUse ? "bg-stop text-white" : "bg-ok text-white"}`}>
            <StatusMark ok={g.doNotUse === 0} className="h-8 w-8 shrink-0" />
            {g.doNotUse ? `${items(g.doNotUse)} may not be used today. ${n(g.mayBeUsed)} usable.` : `Every item in service is usable today (${items(g.mayBeUsed)}).`}
          </p>
          <ul className="grid grid-cols-2 gap-3 md:grid-cols-4">
            {tiles
              .filter((t) => t.show)
              .map((t) => (
                <li key={t.label}>
                  <Link href={t.href} className={`flex h-full min-h-tap flex-col rounded-xl p-4 ${t.value === 0 && t.tone === "stop" ? TONES.idle : TONES[t.tone]}`}>
                    <span className="block text-4xl font-bold">{n(t.value)}</span>
                    <span className="block text-base font-bold">{t.label}</span>
                  </Link>
                </li>
              ))}
          </ul>
          <Link href="/stock" className="inline-flex min-h-tap items-center self-start text-lg font-bold underline">Open the stock list</Link>
        </section>
      )}

      {can(principal, "fleet.view") && (
        <section aria-labelledby="kits-heading" className="flex flex-col gap-2">
          <h2 id="kits-heading" className="text-xl font-bold">Kits going out today and tomorrow</h2>
          {goingOut.length === 0 ? (
            <p className="text-lg">None planned for today or tomorrow.</p>
          ) : (
            <ul className="flex flex-col gap-2">
              {goingOut.map((k) => (
                <li key={k.id}>
                  <Link href={`/kits/${k.id}`} className={`flex min-h-tap flex-col gap-1 rounded-xl border-2 p-3 ${k.pass ? "border-ink" : "border-stop"}`}>
                    <span className="text-base font-bold text-ink-soft">{dayLabel(k.date, today)}</span>
                    <span className="text-xl font-bold underline">{k.job}</span>
                    <span className="text-lg">{k.machine.name} on {k.trailer.name}</span>
                    <span className="flex flex-wrap gap-2">
                      <KitStateBadge state={k.state} />
                      <KitPassBadge pass={k.pass} />
                    </span>
                  </Link>
                </li>
              ))}
            </ul>
          )}
          <Link href="/kits" className="inline-flex min-h-tap items-center self-start text-lg font-bold underline">Open the kits</Link>
        </section>
      )}

      {can(principal, "people.manage") && (
        <section aria-labelledby="team-heading" className="flex flex-col gap-2">
          <h2 id="team-heading" className="text-xl font-bold">Team</h2>
          <p className="text-lg">{invites.length === 0 ? "No invites waiting." : `${invites.length} invite${invites.length === 1 ? "" : "s"} waiting for an answer.`}</p>
          <Link href="/people" className="inline-flex min-h-tap items-center self-start text-lg font-bold underline">Manage people</Link>
        </section>
      )}

      <p className="rounded-lg border-2 border-caution bg-caution-bg p-3 text-base text-caution">
        Before every trip the driver inspects the load and every tiedown. Linkyard&apos;s records and checks
        support that inspection; they do not replace it. Local rules and licensed practice govern.
      </p>
    </div>
  );
}
