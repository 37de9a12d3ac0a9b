import type { Metadata } from "next";
import Link from "next/link";
import { EventList } from "@/components/items/event-list";
import { CertificateForm, ReasonForm, TagOutForm } from "@/components/items/item-event-forms";
import { UsabilityBanner } from "@/components/items/usability-banner";
import { StatusBadge } from "@/components/ui/status-badge";
import { buttonClass } from "@/components/ui/button-class";
import { listEvents } from "@/db/items";
import { can } from "@/lib/auth/roles";
import { toFeet, toKg } from "@/lib/securement/units";
import { requireItemPage } from "@/lib/stock/page-item";
import type { ItemKind, ItemStatus } from "@/lib/stock/labels";
import { itemRating } from "@/lib/stock/rating";
import { describeItem, sizeLabel } from "@/lib/stock/describe";
import { unmarkedChainWords } from "@/lib/stock/wll-words";
import { formatDay } from "@/lib/time";
import { certificateAction, itemEventAction } from "./actions";

export const metadata: Metadata = { title: "Item" };

const lb = (n: number) => `${n.toLocaleString("en-US")} lb`;
const kg = (n: number) => `${Math.round(toKg({ value: n, unit: "lb" }).value).toLocaleString("en-US")} kg`;

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="flex flex-col">
      <dt className="text-base text-ink-soft">{label}</dt>
      <dd className="text-lg font-bold">{children}</dd>
    </div>
  );
}

export default async function ItemPage({ params }: { params: Promise<{ id: string }> }) {
  const { principal, id, item, clock } = await requireItemPage("stock.view", params);
  const events = await listEvents(principal.organisationId, id);
  const status = item.status as ItemStatus;
  const rating = itemRating({ kind: item.kind as ItemKind, grade: item.grade, gradeMarked: item.gradeMarked, size: item.size, markedWllLb: item.markedWllLb, details: item.details });
  const lastCheck = events.find((e) => e.type === "check");
  const details = item.details as { mechanism?: string; chainSizeRange?: [string, string]; ends?: string };
  const overdue = item.nextInspectionDue !== null && item.nextInspectionDue < clock.today;

  return (
    <div className="flex max-w-3xl flex-col gap-5">
      <header className="flex flex-col gap-1">
        <p className="font-mono text-2xl font-bold tracking-widest">{item.tagCode}</p>
        <h1 className="text-3xl font-bold">{describeItem(item)}</h1>
        <div><StatusBadge status={status} /></div>
      </header>

      <UsabilityBanner status={status} nextInspectionDue={item.nextInspectionDue} today={clock.today} />

      <section aria-labelledby="wll-heading" className="rounded-xl border-2 border-ink p-4">
        <h2 id="wll-heading" className="text-base font-bold text-ink-soft">Working load limit</h2>
        {item.wllLb ? (
          <>
            <p className="text-5xl font-bold">
              {lb(item.wllLb)} <span className="text-2xl">({kg(item.wllLb)})</span>
            </p>
            {unmarkedChainWords(item) && <p className="text-xl font-bold">{unmarkedChainWords(item)}</p>}
          </>
        ) : (
          <p className="text-2xl font-bold text-stop">Cannot be rated: do not use it in a tiedown</p>
        )}
        <p className="text-base">Source: {item.wllSource ?? "none"}</p>
        {rating.warnings.map((w) => (
          <p key={w} className="mt-2 rounded-lg border-2 border-caution bg-caution-bg p-2 text-base font-bold text-caution">⚠ {w}</p>
        ))}
      </section>

      <section aria-labelledby="actions-heading" className="flex flex-col gap-3">
        <h2 id="actions-heading" className="sr-only">What you can do</h2>
        {status === "in_service" && can(principal, "items.check") && (
          <Link href={`/items/${id}/check`} className={buttonClass("primary", "", "large")}>
            Pre-use check
          </Link>
        )}
        {can(principal, "items.inspect") && (status === "in_service" || status === "tagged_out") && (
          <Link href={`/items/${id}/inspect`} className={buttonClass("secondary")}>
            Periodic inspection
          </Link>
        )}
        <div className="flex flex-wrap gap-3">
          {can(principal, "stock.edit") && status !== "retired" && (
            <Link href={`/items/${id}/edit`} className={buttonClass("secondary")}>Edit details</Link>
          )}
          <Link href={`/tags/sheet?ids=${id}`} className={buttonClass("secondary")}>Print its tag</Link>
        </div>
      </section>

      <section aria-labelledby="facts-heading" className="flex flex-col gap-2">
        <h2 id="facts-heading" className="text-xl font-bold">Details</h2>
        <dl className="grid grid-cols-2 gap-3 md:grid-cols-3">
          <Fact label="Kind">{describeItem(item)}</Fact>
          {item.grade && <Fact label="Grade">{item.gradeMarked ? `${item.grade}` : "no legible mark (counts as 30)"}</Fact>}
          {item.size && item.kind !== "binder" && <Fact label={item.kind === "web-strap" ? "Width" : "Size"}>{sizeLabel(item.size)}</Fact>}
          {details.chainSizeRange && <Fact label="Takes chain">{details.chainSizeRange[0]} to {sizeLabel(details.chainSizeRange[1])}</Fact>}
          {details.mechanism && <Fact label="Binder">{details.mechanism}</Fact>}
          {item.lengthMm && <Fact label="Length">{toFeet({ value: item.lengthMm, unit: "mm" }).value.toFixed(1)} ft ({(item.lengthMm / 1000).toFixed(2)} m)</Fact>}
          <Fact label="Marking">{item.markedWllLb ? `WLL ${lb(item.markedWllLb)}` : item.gradeMarked && item.grade ? "grade only" : "none"}</Fact>
          {details.ends && <Fact label="End fittings">{details.ends}</Fact>}
          <Fact label="Serial or lot">{item.serial ?? "none"}</Fact>
          <Fact label="Lives at">{item.yardName ?? "no yard set"}</Fact>
          <Fact label="Last pre-use check">
            {lastCheck ? `${formatDay(lastCheck.at, clock.timeZone)}, ${lastCheck.outcome === "pass" ? "no defects" : "defects found"}` : "none recorded"}
          </Fact>
          <Fact label="Last periodic inspection">{item.lastInspectedOn ?? "none recorded"}</Fact>
          <Fact label="Next inspection due">
            <span className={overdue ? "text-stop" : undefined}>{item.nextInspectionDue ?? "not scheduled"}{overdue && " (overdue)"}</span>
          </Fact>
        </dl>
      </section>

      {status === "in_service" && can(principal, "items.check") && (
        <details className="rounded-xl border-2 border-stop p-4">
          <summary className="min-h-tap cursor-pointer text-lg font-bold text-stop">Report damage and tag out</summary>
          <TagOutForm itemId={id} action={itemEventAction} />
        </details>
      )}
      {status === "tagged_out" && can(principal, "items.inspect") && (
        <details className="rounded-xl border-2 border-ink p-4">
          <summary className="min-h-tap cursor-pointer text-lg font-bold">Return to service</summary>
          <ReasonForm itemId={id} action={itemEventAction} type="return_to_service" label="Why may it be used again? (repair done, inspected by…)" button="Return to service" />
        </details>
      )}
      {can(principal, "stock.edit") && (status === "in_service" || status === "tagged_out") && (
        <details className="rounded-xl border-2 border-idle p-4">
          <summary className="min-h-tap cursor-pointer text-lg font-bold">Mark lost</summary>
          <ReasonForm itemId={id} action={itemEventAction} type="lost" label="Where was it last seen?" button="Mark lost" />
        </details>
      )}
      {can(principal, "stock.edit") && status === "lost" && (
        <details className="rounded-xl border-2 border-idle p-4">
          <summary className="min-h-tap cursor-pointer text-lg font-bold">Mark found</summary>
          <ReasonForm itemId={id} action={itemEventAction} type="found" label="Where was it found?" button="Mark found" />
        </details>
      )}
      {can(principal, "stock.retire") && status !== "retired" && (
        <details className="rounded-xl border-2 border-idle p-4">
          <summary className="min-h-tap cursor-pointer text-lg font-bold">Retire</summary>
          <ReasonForm itemId={id} action={itemEventAction} type="retired" label="Why is it retired?" button="Retire for good" variant="danger" />
        </details>
      )}
      {can(principal, "stock.edit") && (
        <details className="rounded-xl border-2 border-idle p-4">
          <summary className="min-h-tap cursor-pointer text-lg font-bold">Add a certificate or document</summary>
          <CertificateForm itemId={id} action={certificateAction} />
        </details>
      )}

      <section aria-labelledby="history-heading" className="flex flex-col gap-2">
        <h2 id="history-heading" className="text-xl font-bold">Service history</h2>
        <p className="text-base text-ink-soft">Entries are never changed or deleted. A mistake is answered by a correction. Times are in {clock.timeZone.replaceAll("_", " ")}.</p>
        <EventList itemId={id} events={events} correct={can(principal, "items.check") ? itemEventAction : null} timeZone={clock.timeZone} />
      </section>
    </div>
  );
}
