import type { RecordEvent } from "@/db/records";
import { periodWords, type Period } from "@/lib/records/query";
import { entryInWords } from "@/lib/records/rows";
import { describeItem } from "@/lib/stock/describe";
import { STATUS_LABELS, type ItemStatus } from "@/lib/stock/labels";
import { writtenDate, zoneWords } from "@/lib/time";

const lb = (n: number | null) => (n === null ? "no WLL" : `WLL ${n.toLocaleString("en-US")} lb`);

/** The report's figures, as lib/records/service.ts recordReport answers them. */
export interface ReportProps {
  organisationName: string;
  period: Period;
  /** The selection in words: "All stock", "Chains, in service", "Item 3X4K-9P2M". */
  selection: string;
  timeZone: string;
  printedAt: string;
  printedBy: string;
  total: number;
  events: RecordEvent[];
  people: { name: string | null; inspections: number; checks: number }[];
}

/**
 * The inspection and service record on paper, item by item: every entry with when, who,
 * the verdict, the defects found and each measured value beside its limit, in words (past or
 * within the limit), never by colour alone.
 */
export function RecordReport(r: ReportProps) {
  const items = new Map<string, RecordEvent[]>();
  for (const e of r.events) items.set(e.itemId, [...(items.get(e.itemId) ?? []), e]);
  const inspections = r.events.filter((e) => e.type === "inspection").length;
  return (
    <article className="record-report flex flex-col gap-5 px-4 py-6 text-ink">
      <header className="flex flex-col gap-1 border-b-4 border-ink pb-3">
        <p className="text-lg font-bold" data-testid="org-name"><bdi>{r.organisationName}</bdi></p>
        <h1 className="text-3xl font-bold">Inspection and service record</h1>
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-base">
          <dt className="font-bold">Period</dt>
          <dd data-testid="period">{periodWords(r.period, writtenDate)}</dd>
          <dt className="font-bold">Items</dt>
          <dd>{r.selection}</dd>
          <dt className="font-bold">Printed</dt>
          <dd data-testid="printed-at">{r.printedAt} ({zoneWords(r.timeZone)}) by <bdi>{r.printedBy}</bdi></dd>
          <dt className="font-bold">Entries</dt>
          <dd>{r.total.toLocaleString("en-US")} on {items.size.toLocaleString("en-US")} {items.size === 1 ? "item" : "items"}, of which {inspections.toLocaleString("en-US")} periodic {inspections === 1 ? "inspection" : "inspections"}</dd>
        </dl>
      </header>

      <section aria-labelledby="people-heading" className="record-block flex flex-col gap-1">
        <h2 id="people-heading" className="text-xl font-bold">Who made the entries</h2>
        {r.people.length === 0 ? (
          <p>No entries in this period.</p>
        ) : (
          <table className="w-full border-collapse text-left text-base">
            <thead>
              <tr className="border-b-2 border-ink">
                <th scope="col" className="py-1 pr-3">Person</th>
                <th scope="col" className="py-1 pr-3">Periodic inspections</th>
                <th scope="col" className="py-1 pr-3">Pre-use checks</th>
              </tr>
            </thead>
            <tbody>
              {r.people.map((p) => (
                <tr key={p.name ?? "linkyard"} className="border-b border-idle">
                  <td className="py-1 pr-3"><bdi>{p.name ?? "Linkyard (import or system)"}</bdi></td>
                  <td className="py-1 pr-3">{p.inspections}</td>
                  <td className="py-1 pr-3">{p.checks}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>

      {[...items.values()].map((entries) => {
        const item = entries[0];
        return (
          <section key={item.itemId} aria-labelledby={`item-${item.itemId}`} className="record-item flex flex-col gap-1">
            <h2 id={`item-${item.itemId}`} className="flex flex-wrap items-baseline gap-x-3 border-b-2 border-ink text-xl font-bold">
              <span className="font-mono tracking-wider">{item.tagCode}</span>
              <span className="text-lg">{describeItem(item)}</span>
            </h2>
            <p className="text-base">
              {item.serial ? <>Serial or lot <bdi>{item.serial}</bdi> · </> : null}
              {lb(item.wllLb)} · Status now: {STATUS_LABELS[item.status as ItemStatus]?.label ?? item.status}
            </p>
            <table className="w-full table-fixed border-collapse text-left text-base">
              <thead>
                <tr className="border-b border-ink">
                  <th scope="col" className="w-32 py-1 pr-2">When</th>
                  <th scope="col" className="w-48 py-1 pr-2">Entry and verdict</th>
                  <th scope="col" className="py-1 pr-2">Found and measured</th>
                  <th scope="col" className="w-36 py-1 pr-2">By</th>
                </tr>
              </thead>
              <tbody>
                {entries.map((e) => {
                  const w = entryInWords(e, r.timeZone);
                  return (
                    <tr key={e.id} className="border-b border-idle align-top">
                      {/* Day over time, so that neither runs into the next column on paper. */}
                      <td className="py-1 pr-2">{w.when.split(" ").map((part) => <span key={part} className="block whitespace-nowrap">{part}</span>)}</td>
                      <td className="py-1 pr-2">
                        <span className="font-bold">{w.headline}</span>
                        {e.correctsEventId && <span> (corrects entry {e.correctsEventId})</span>}
                        <span className="block text-sm text-ink-soft">Entry {e.id}</span>
                      </td>
                      <td className="py-1 pr-2">
                        {w.defects.length > 0 && <p>Defects: {w.defects.join("; ")}</p>}
                        {w.measured.map((m) => (
                          <p key={m.label}>
                            {m.label}: {m.value}, limit {m.limit}: {m.exceeded ? <strong>✗ {m.verdict}</strong> : <span>✓ {m.verdict}</span>}
                          </p>
                        ))}
                        {w.note && <p>{w.note}</p>}
                        {w.changes.length > 0 && <p>{w.changes.join("; ")}</p>}
                        {e.files.length > 0 && <p>Filed: {e.files.join("; ")}</p>}
                      </td>
                      <td className="py-1 pr-2"><bdi>{w.by}</bdi></td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </section>
        );
      })}

      <footer className="record-block border-t-2 border-ink pt-2 text-sm">
        <p>
          Entries are never changed or deleted in Linkyard: a mistake is answered by a correction that names the entry it corrects.
          Limits are the removal criteria Linkyard applied at the time, each with its published source on the item&apos;s page.
          This record supports, and does not replace, the inspections it lists; local rules and licensed practice govern.
        </p>
      </footer>
    </article>
  );
}
