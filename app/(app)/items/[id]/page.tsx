import type { Metadata } from "next";
import Link from "next/link";
import { EventList } from "@/components/items/event-list";
import { CertificateForm, ReasonForm, TagOutForm } from "@/components/items/item-event-forms";
import { OpensAtTop } from "@/components/items/opens-at-top";
import { VerdictBlock } from "@/components/items/verdict";
import { buttonClass } from "@/components/ui/button-class";
import { Fact } from "@/components/ui/fact";
import { listEvents } from "@/db/items";
import { can } from "@/lib/auth/roles";
import { toFeet, toKg } from "@/lib/securement/units";
import { requireItemPage } from "@/lib/stock/page-item";
import type { ItemKind, ItemStatus } from "@/lib/stock/labels";
import { itemRating, type ItemRating } from "@/lib/stock/rating";
import { describeItem, sizeLabel } from "@/lib/stock/describe";
import { itemVerdict } from "@/lib/stock/verdict";
import { unmarkedChainWords } from "@/lib/stock/wll-words";
import { formatDateTime, zoneWords } from "@/lib/time";
import { certificateAction, itemEventAction } from "./actions";

export const metadata: Metadata = { title: "Item" };

const lb = (n: number) => `${n.toLocaleString("en-US")} lb`;

/** Where the WLL comes from, in words, before the citation (which stays, under it). */
const BASIS_WORDS: Record<ItemRating["basis"], string> = {
  marked: "As marked on the item.",
  table: "From the published table for its grade and size.",
  "unmarked-rule": "Not marked: the published figure for unmarked gear.",
  none: "No figure can be given for it.",
};
const kg = (n: number) => `${Math.round(toKg({ value: n, unit: "lb" }).value).toLocaleString("en-US")} kg`;

/** The mark of a folded section: down when closed, up when open. */
function Chevron() {
  return (
    <svg viewBox="0 0 24 24" className="h-6 w-6 shrink-0 transition-transform group-open:rotate-180" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" strokeLinejoin="round" aria-hidden="true">
      <path d="M6 9l6 6 6-6" />
    </svg>
  );
}

/** A less frequent action, folded until asked for. */
function Folded({ summary, tone = "idle", children }: { summary: string; tone?: "idle" | "ink"; children: React.ReactNode }) {
  return (
    <details className={`group rounded-xl border-2 px-4 ${tone === "ink" ? "border-ink" : "border-idle"}`}>
      <summary className="flex min-h-tap cursor-pointer items-center justify-between gap-2 text-lg font-bold">
        {summary}
        <Chevron />
      </summary>
      <div className="pb-4">{children}</div>
    </details>
  );
}

/**
 * An item's page, in the order a yard hand needs it: the tag code (to compare with the tag in
 * hand), the verdict (may I use it?), the one thing to do now (check it, or tag it out), then
 * the rating, the details and the history.
 */
export default async function ItemPage({ params }: { params: Promise<{ id: string }> }) {
  const { principal, id, item, clock } = await requireItemPage("stock.view", params);
  const events = await listEvents(principal.organisationId, id);
  const status = item.status as ItemStatus;
  const usable = itemVerdict(item, clock);
  const rating = itemRating({ kind: item.kind as ItemKind, grade: item.grade, gradeMarked: item.gradeMarked, size: item.size, markedWllLb: item.markedWllLb, details: item.details });
  const details = item.details as { mechanism?: string; chainSizeRange?: [string, string]; ends?: string };
  const overdue = usable.reasons.some((r) => r.code === "INSPECTION_OVERDUE");
  const mayCheck = can(principal, "items.check");
  const mayInspect = can(principal, "items.inspect");
  const hasActions = (usable.ok && mayCheck) || (status === "in_service" && mayCheck) || (mayInspect && (status === "in_service" || status === "tagged_out"));

  return (
    <div className="flex max-w-3xl flex-col gap-5">
      <OpensAtTop />
      <div className="flex flex-col gap-1">
        <p className="text-base font-bold text-ink-soft">
          Tag <span className="whitespace-nowrap font-mono text-3xl tracking-wider text-ink" data-testid="item-tag-code">{item.tagCode}</span>
        </p>
        <h1 className="text-3xl font-bold leading-tight">{describeItem(item)}</h1>
      </div>

      <VerdictBlock usable={usable} />

      {hasActions && (
        <section aria-labelledby="actions-heading" className="flex flex-col gap-3">
          <h2 id="actions-heading" className="sr-only">What you can do now</h2>
          {usable.ok && mayCheck && (
            <Link href={`/items/${id}/check`} className={buttonClass("primary", "", "large")}>
              {usable.check?.done ? "Check it again" : "Pre-use check"}
            </Link>
          )}
          {status === "in_service" && mayCheck && (
            <details className="group rounded-xl border-2 border-stop px-4" data-testid="tag-out">
              <summary className="flex min-h-tap cursor-pointer items-center justify-between gap-2 text-lg font-bold text-stop">
                Report damage and tag out
                <Chevron />
              </summary>
              <div className="pb-4">
                <TagOutForm itemId={id} action={itemEventAction} />
              </div>
            </details>
          )}
          {status === "tagged_out" && mayInspect && (
            <Folded summary="Return to service" tone="ink">
              <ReasonForm itemId={id} action={itemEventAction} type="return_to_service" label="Why may it be used again? (repair done, inspected by…)" button="Return to service" />
            </Folded>
          )}
          {mayInspect && (status === "in_service" || status === "tagged_out") && (
            <Link href={`/items/${id}/inspect`} className={buttonClass("secondary")}>
              Periodic inspection
            </Link>
          )}
        </section>
      )}

      <section aria-labelledby="wll-heading" className="rounded-xl border-2 border-ink p-4">
        <h2 id="wll-heading" className="text-base font-bold text-ink-soft">Working load limit</h2>
        {item.wllLb ? (
          <>
            <p className="text-5xl font-bold">
              <span className="whitespace-nowrap">{lb(item.wllLb)}</span> <span className="whitespace-nowrap text-2xl">({kg(item.wllLb)})</span>
            </p>
            {unmarkedChainWords(item) && <p className="text-xl font-bold">{unmarkedChainWords(item)}</p>}
          </>
        ) : (
          <p className="text-2xl font-bold text-stop">Cannot be rated: do not use it in a tiedown</p>
        )}
        {rating.warnings.map((w) => (
          <p key={w} className="mt-2 rounded-lg border-2 border-caution bg-caution-bg p-2 text-base font-bold text-caution">⚠ {w}</p>
        ))}
        <p className="mt-2 text-lg">{BASIS_WORDS[rating.basis]}</p>
        <p className="text-base text-ink-soft">Source: {item.wllSource ?? "none"}</p>
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
            {item.lastCheckedAt ? `${formatDateTime(item.lastCheckedAt, clock.timeZone)}, ${item.lastCheckPassed === false ? "defects found" : "no defects"}` : "none recorded"}
          </Fact>
          <Fact label="Last periodic inspection">{item.lastInspectedOn ?? "none recorded"}</Fact>
          <Fact label="Next inspection due">
            <span className={overdue ? "text-stop" : undefined}>{item.nextInspectionDue ?? "not scheduled"}{overdue && " (overdue)"}</span>
          </Fact>
        </dl>
      </section>

      <section aria-labelledby="more-heading" className="flex flex-col gap-3">
        <h2 id="more-heading" className="text-xl font-bold">More</h2>
        <div className="flex flex-wrap gap-3">
          {can(principal, "stock.edit") && status !== "retired" && (
            <Link href={`/items/${id}/edit`} className={buttonClass("secondary")}>Edit details</Link>
          )}
          <Link href={`/tags/sheet?ids=${id}`} className={buttonClass("secondary")}>Print its tag</Link>
          {can(principal, "records.view") && (
            <Link href={`/records/print?itemId=${id}`} className={buttonClass("secondary")}>Print its inspection record</Link>
          )}
        </div>
        {can(principal, "stock.edit") && (status === "in_service" || status === "tagged_out") && (
          <Folded summary="Mark lost">
            <ReasonForm itemId={id} action={itemEventAction} type="lost" label="Where was it last seen?" button="Mark lost" />
          </Folded>
        )}
        {can(principal, "stock.edit") && status === "lost" && (
          <Folded summary="Mark found">
            <ReasonForm itemId={id} action={itemEventAction} type="found" label="Where was it found?" button="Mark found" />
          </Folded>
        )}
        {can(principal, "stock.retire") && status !== "retired" && (
          <Folded summary="Retire">
            <ReasonForm itemId={id} action={itemEventAction} type="retired" label="Why is it retired?" button="Retire for good" variant="danger" />
          </Folded>
        )}
        {can(principal, "stock.edit") && (
          <Folded summary="Add a certificate or document">
            <CertificateForm itemId={id} action={certificateAction} />
          </Folded>
        )}
      </section>

      <section aria-labelledby="history-heading" className="flex flex-col gap-2">
        <h2 id="history-heading" className="text-xl font-bold">Service history</h2>
        <p className="text-base text-ink-soft">Entries are never changed or deleted: a mistake is answered by a correction. Times are {zoneWords(clock.timeZone)}.</p>
        <EventList itemId={id} events={events} correct={mayCheck ? itemEventAction : null} timeZone={clock.timeZone} />
      </section>
    </div>
  );
}
