import Link from "next/link";
import { ChartFigure, FigureLink, TD, TH } from "@/components/dashboard/chart-figure";
import { DueByWeekChart, GearByStatusChart, TagOutsChart } from "@/components/dashboard/dashboard-charts";
import { KitPassBadge, KitStateBadge } from "@/components/kits/state-badge";
import { StatusMark } from "@/components/ui/status-mark";
import { inspectionsDueByDay, stockByKindAndStatus, tagOutsByDay, taggedOutItems } from "@/db/dashboard";
import { listBatches } from "@/db/imports";
import { stockBuckets } from "@/db/items";
import { listOpenInvites } from "@/db/people";
import { can } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import { duePeriod, dueByWeek, gearCounts, STATUS_WORDS, TAG_OUT_REASONS, tagOutPeriod, tagOutsByMonth } from "@/lib/dashboard/charts";
import { listKitEntries } from "@/lib/kits/kit-service";
import { principalClock } from "@/lib/organisations/service";
import { DUE_SOON_DAYS } from "@/lib/stock/api-schemas";
import { describeItem } from "@/lib/stock/describe";
import { stockGlance } from "@/lib/stock/glance";
import { addDays, dayLabel, daysBetween, formatDateTime, formatDay, startOfDayIn, writtenDate } from "@/lib/time";

const n = (v: number) => v.toLocaleString("en-US");
const items = (v: number) => `${n(v)} ${v === 1 ? "item" : "items"}`;

/**
 * How long an item has waited, in words.
 * @example waitedWords(0) // "today"
 */
function waitedWords(days: number): string {
  return days <= 0 ? "today" : days === 1 ? "yesterday" : `${days} days ago`;
}

const TONES = {
  stop: "bg-stop text-white",
  caution: "border-2 border-caution bg-caution-bg text-caution",
  idle: "border-2 border-idle bg-idle-bg text-idle",
} as const;

/** A list only for who may see it: nothing is read for the others. */
const when = <T,>(allowed: boolean, load: () => Promise<T[]>): Promise<T[]> => (allowed ? load() : Promise.resolve([]));

/**
 * Today, and the owner's dashboard: what matters on the organisation's today. Gear that may
 * not be used (overdue for inspection, tagged out and waiting for a decision, without a WLL),
 * what falls due soon, and the kits going out today and tomorrow, for everyone; for owners
 * and planners ("reports.view") the inspections due week by week and the gear by kind and
 * status; for owners and designated persons ("records.view") the tagged-out items waiting for
 * a decision and the tag-outs by reason; for owners the recent imports. The counts come from
 * the usability verdict (lib/stock/glance.ts), so this page and the item pages never
 * disagree, and every figure links to the stock list (or the records) of exactly its rows.
 */
export default async function TodayPage() {
  const principal = await requirePage();
  const org = principal.organisationId;
  const { today, timeZone } = principalClock(principal);
  const tomorrow = addDays(today, 1);
  const reports = can(principal, "reports.view");
  const records = can(principal, "records.view");
  const due = duePeriod(today);
  const tagOuts = tagOutPeriod(today);
  const [buckets, invites, kits, dueDays, gearRows, tagOutDays, waiting, imports] = await Promise.all([
    when(can(principal, "stock.view"), () => stockBuckets(org, today, addDays(today, DUE_SOON_DAYS))),
    when(can(principal, "people.manage"), () => listOpenInvites(org)),
    when(can(principal, "fleet.view"), () => listKitEntries(org, today, tomorrow)),
    when(reports, () => inspectionsDueByDay(org, due.from, due.to)),
    when(reports, () => stockByKindAndStatus(org)),
    when(records, () => tagOutsByDay(org, startOfDayIn(tagOuts.from, timeZone), startOfDayIn(addDays(tagOuts.to, 1), timeZone), timeZone)),
    when(records, () => taggedOutItems(org)),
    when(can(principal, "stock.import"), () => listBatches(org, 5)),
  ]);
  const weeks = dueByWeek(dueDays, today);
  const gear = gearCounts(gearRows);
  const months = tagOutsByMonth(tagOutDays, today);
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
    <div className="flex max-w-6xl flex-col gap-6">
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

      {records && (
        <section aria-labelledby="waiting-heading" className="flex flex-col gap-2">
          <h2 id="waiting-heading" className="text-xl font-bold">Tagged out: waiting for a decision</h2>
          {waiting.length === 0 ? (
            <p className="text-lg">Nothing is tagged out.</p>
          ) : (
            <>
              <p className="text-lg">Inspect each one, then hold it for repair, retire it, or return it to service. The longest waiting first.</p>
              <ul className="flex flex-col gap-2">
                {waiting.map((w) => (
                  <li key={w.id}>
                    <Link href={`/items/${w.id}`} className="flex min-h-tap flex-col rounded-xl border-2 border-stop p-3">
                      <span className="flex flex-wrap items-baseline gap-x-3">
                        <span className="font-mono text-xl font-bold tracking-wider underline">{w.tagCode}</span>
                        <span className="text-lg">{describeItem(w)}</span>
                      </span>
                      <span className="text-base">
                        <span aria-hidden="true" className="font-bold text-stop">✕ </span>
                        {w.since ? `Tagged out ${formatDateTime(w.since, timeZone)} (${waitedWords(daysBetween(formatDay(w.since, timeZone), today))})` : "Tagged out"}
                        {w.note ? <>: <bdi>{w.note}</bdi></> : null}
                      </span>
                    </Link>
                  </li>
                ))}
              </ul>
            </>
          )}
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

      {reports && (
        <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
          <ChartFigure
            id="due-weeks-heading"
            title={`Inspections due, week by week`}
            summary={`${weeks.reduce((a, w) => a + w.count, 0).toLocaleString("en-US")} items in service fall due for their periodic inspection in the next ${weeks.length} weeks (the overdue ones are counted above).`}
            chart={<DueByWeekChart weeks={weeks} />}
            table={
              <table className="w-full border-collapse text-base">
                <thead><tr className="border-b-2 border-ink"><th scope="col" className={TH}>Week</th><th scope="col" className={TH}>Dates</th><th scope="col" className={TH}>Due</th></tr></thead>
                <tbody>
                  {weeks.map((w) => (
                    <tr key={w.from} className="border-b border-idle">
                      <th scope="row" className={`${TD} text-left font-normal`}>{w.label}</th>
                      <td className={TD}>{w.dates}</td>
                      <td className={TD}><FigureLink href={w.href} count={w.count} label={`items due ${w.dates}`} /></td>
                    </tr>
                  ))}
                </tbody>
              </table>
            }
          />
          <ChartFigure
            id="gear-status-heading"
            title="Gear by status"
            summary={`${gear.total.toLocaleString("en-US")} items: ${gear.byStatus.map((s) => `${s.count.toLocaleString("en-US")} ${s.label.toLowerCase()}`).join(", ")}.`}
            chart={<GearByStatusChart byStatus={gear.byStatus} />}
            table={
              <div className="overflow-x-auto">
                <table className="w-full border-collapse text-base">
                  <thead>
                    <tr className="border-b-2 border-ink">
                      <th scope="col" className={TH}>Kind</th>
                      {gear.byStatus.map((s) => <th key={s.status} scope="col" className={TH}>{STATUS_WORDS[s.status]}</th>)}
                      <th scope="col" className={TH}>All</th>
                    </tr>
                  </thead>
                  <tbody>
                    {gear.byKind.map((k) => (
                      <tr key={k.kind} className="border-b border-idle">
                        <th scope="row" className={`${TD} text-left font-normal`}>{k.label}</th>
                        {k.cells.map((c) => <td key={c.status} className={TD}><FigureLink href={c.href} count={c.count} label={`${k.label}, ${STATUS_WORDS[c.status].toLowerCase()}`} /></td>)}
                        <td className={TD}><FigureLink href={k.href} count={k.total} label={`${k.label}, every status`} /></td>
                      </tr>
                    ))}
                    <tr className="border-t-2 border-ink">
                      <th scope="row" className={`${TD} text-left`}>Every kind</th>
                      {gear.byStatus.map((s) => <td key={s.status} className={TD}><FigureLink href={s.href} count={s.count} label={`items ${STATUS_WORDS[s.status].toLowerCase()}`} /></td>)}
                      <td className={TD}><FigureLink href="/stock" count={gear.total} label="items in all" /></td>
                    </tr>
                  </tbody>
                </table>
              </div>
            }
          />
        </div>
      )}

      {records && (
        <ChartFigure
          id="tag-outs-heading"
          title={`Tag-outs by reason, last ${months.length} months`}
          summary={`${months.reduce((a, m) => a + m.total, 0).toLocaleString("en-US")} tag-outs since ${writtenDate(tagOuts.from)}: ${TAG_OUT_REASONS.map(({ reason, label }) => `${months.reduce((a, m) => a + m.counts[reason], 0)} ${label.toLowerCase()}`).join(", ")}.`}
          chart={<TagOutsChart months={months} />}
          table={
            <div className="overflow-x-auto">
              <table className="w-full border-collapse text-base">
                <thead>
                  <tr className="border-b-2 border-ink">
                    <th scope="col" className={TH}>Month</th>
                    {TAG_OUT_REASONS.map((r) => <th key={r.reason} scope="col" className={TH}>{r.label}</th>)}
                    <th scope="col" className={TH}>All, with the month&apos;s records</th>
                  </tr>
                </thead>
                <tbody>
                  {months.map((m) => (
                    <tr key={m.month} className="border-b border-idle">
                      <th scope="row" className={`${TD} text-left font-normal`}>{m.label}</th>
                      {TAG_OUT_REASONS.map((r) => <td key={r.reason} className={TD}>{m.counts[r.reason]}</td>)}
                      <td className={TD}><FigureLink href={m.href} count={m.total} label={`tag-outs in ${m.label}: open the month's records`} /></td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          }
        />
      )}

      {can(principal, "stock.import") && (
        <section aria-labelledby="imports-heading" className="flex flex-col gap-2">
          <h2 id="imports-heading" className="text-xl font-bold">Recent imports</h2>
          {imports.length === 0 ? (
            <p className="text-lg">No CSV imports yet.</p>
          ) : (
            <ul className="flex flex-col gap-2">
              {imports.map((b) => (
                <li key={b.id}>
                  <Link href={`/stock/import/${b.id}`} className="flex min-h-tap flex-col rounded-xl border-2 border-idle p-3">
                    <span className="text-lg font-bold underline"><bdi>{b.fileName}</bdi></span>
                    <span className="text-base">
                      {formatDateTime(b.createdAt, timeZone)} by <bdi>{b.createdByName ?? "someone no longer here"}</bdi> ·{" "}
                      {b.status === "running" ? "still running" : b.status === "undone" ? "undone" : `${b.created} added, ${b.updated} updated, ${b.rejected} refused`}
                    </span>
                  </Link>
                </li>
              ))}
            </ul>
          )}
          <Link href="/stock/import/history" className="inline-flex min-h-tap items-center self-start text-lg font-bold underline">Every import</Link>
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
