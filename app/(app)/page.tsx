import Link from "next/link";
import { countInspectionsDue, countItemsByStatus } from "@/db/items";
import { listKitEntries } from "@/lib/kits/kit-service";
import { listOpenInvites } from "@/db/people";
import { can } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";
import { organisationClock } from "@/lib/organisations/service";
import { DUE_SOON_DAYS } from "@/lib/stock/api-schemas";
import { addDays } from "@/lib/time";

export default async function TodayPage() {
  const principal = await requirePage();
  const { today } = await organisationClock(principal.organisationId);
  const [byStatus, due] = await Promise.all([
    countItemsByStatus(principal.organisationId),
    countInspectionsDue(principal.organisationId, addDays(today, DUE_SOON_DAYS)),
  ]);
  const invites = can(principal, "people.manage") ? await listOpenInvites(principal.organisationId) : [];
  const tomorrow = addDays(today, 1);
  const kits = can(principal, "fleet.view") ? await listKitEntries(principal.organisationId, tomorrow, tomorrow) : [];
  const notPassing = kits.filter((k) => !k.pass).length;
  const tiles = [
    { label: "In service", value: byStatus.in_service ?? 0, tone: "border-ok bg-ok-bg text-ok", href: "/stock?status=in_service" },
    { label: "Tagged out", value: byStatus.tagged_out ?? 0, tone: "border-stop bg-stop-bg text-stop", href: "/stock?status=tagged_out" },
    { label: "Inspection due in 30 days", value: due, tone: "border-caution bg-caution-bg text-caution", href: "/stock?due=30d&status=in_service" },
    { label: "Retired or lost", value: (byStatus.retired ?? 0) + (byStatus.lost ?? 0), tone: "border-idle bg-idle-bg text-idle", href: "/stock?status=lost" },
  ];
  return (
    <div className="flex max-w-4xl flex-col gap-6">
      <h1 className="text-3xl font-bold">Good to see you, {principal.name.split(" ")[0]}</h1>
      <section aria-labelledby="gear-heading" className="flex flex-col gap-3">
        <h2 id="gear-heading" className="text-xl font-bold">Gear at a glance</h2>
        <ul className="grid grid-cols-2 gap-3 md:grid-cols-4">
          {tiles.map((t) => (
            <li key={t.label}>
              <Link href={t.href} className={`block h-full rounded-xl border-2 p-4 ${t.tone}`}>
                <span className="block text-4xl font-bold">{t.value}</span>
                <span className="block text-base font-bold">{t.label}</span>
              </Link>
            </li>
          ))}
        </ul>
        <Link href="/stock" className="text-lg font-bold underline">Open the stock list</Link>
      </section>
      {can(principal, "fleet.view") && (
        <section aria-labelledby="kits-heading" className="flex flex-col gap-2">
          <h2 id="kits-heading" className="text-xl font-bold">Kits for tomorrow</h2>
          <p className="text-lg">
            {kits.length === 0 ? "None planned yet." : `${kits.length} planned${notPassing ? `; ${notPassing} ${notPassing === 1 ? "does" : "do"} not pass yet` : ", every one passes"}.`}{" "}
            <Link href="/kits" className="font-bold underline">Open the kits</Link>
          </p>
        </section>
      )}
      {can(principal, "people.manage") && (
        <section aria-labelledby="team-heading" className="flex flex-col gap-2">
          <h2 id="team-heading" className="text-xl font-bold">Team</h2>
          <p className="text-lg">
            {invites.length === 0 ? "No invites waiting." : `${invites.length} invite${invites.length === 1 ? "" : "s"} waiting for an answer.`}{" "}
            <Link href="/people" className="font-bold underline">Manage people</Link>
          </p>
        </section>
      )}
      <p className="rounded-lg border-2 border-caution bg-caution-bg p-3 text-base text-caution">
        Before every trip the driver inspects the load and every tiedown. Linkyard&apos;s records and checks
        support that inspection; they do not replace it. Local rules and licensed practice govern.
      </p>
    </div>
  );
}
