import Link from "next/link";
import { StatusBadge } from "@/components/ui/status-badge";
import { STATUS_LABELS, type ItemStatus } from "@/lib/stock/labels";
import { unmarkedChainWords } from "@/lib/stock/wll-words";
import { dayText, tagLabelText, type TagLabelItem } from "@/lib/tags/label";

export interface PublicTagItem extends TagLabelItem {
  status: string;
  lastInspectedOn: string | null;
}

/** What each status asks of the person holding the item, beyond the badge. */
const STATUS_WORDS: Record<ItemStatus, string | null> = {
  in_service: null,
  tagged_out: "This item is tagged out. Do not use it until it is returned to service.",
  retired: "This item is retired. Do not use it.",
  lost: "This item was reported lost. Do not use it until its owner has inspected it.",
};

/**
 * The public summary of a tagged item, for a driver or inspector without an account.
 * Only what the item is and whether it may be used: never the serial, the location or
 * anything about the organisation.
 */
export function PublicTagView({ item }: { item: PublicTagItem }) {
  const text = tagLabelText(item);
  const status = (item.status in STATUS_LABELS ? item.status : "lost") as ItemStatus;
  const inService = status === "in_service";
  const facts: [string, string][] = [];
  if (text.grade) facts.push(["Grade", text.grade.replace(/^Grade /, "")]);
  if (text.size) facts.push(["Size", text.size]);
  facts.push(["Last periodic inspection", item.lastInspectedOn ? dayText(item.lastInspectedOn) : "None on record"]);

  return (
    <article aria-labelledby="item-title" className="flex flex-col gap-5">
      <header className="flex flex-col gap-2">
        <p className="text-base font-bold uppercase tracking-wide text-ink-soft">Tagged item</p>
        <h1 id="item-title" className="text-4xl font-bold leading-tight">{text.title}</h1>
        <p className="flex flex-wrap items-center gap-2 text-lg">
          <span className="font-bold">Status:</span>
          <StatusBadge status={status} />
        </p>
      </header>

      {STATUS_WORDS[status] && (
        <p className="rounded-xl border-4 border-stop bg-stop-bg px-4 py-3 text-2xl font-bold text-stop">{STATUS_WORDS[status]}</p>
      )}

      <p
        className={`rounded-xl border-4 px-4 py-3 font-bold ${
          !text.hasWll ? "border-stop bg-stop-bg text-3xl text-stop" : inService ? "border-ink text-3xl" : "border-idle text-2xl text-ink-soft"
        }`}
      >
        {text.wll}
        {unmarkedChainWords(item) && <span className="mt-1 block text-xl">{unmarkedChainWords(item)}</span>}
      </p>

      <dl className="flex flex-col">
        {facts.map(([term, value]) => (
          <div key={term} className="border-b-2 border-idle-bg py-2">
            <dt className="text-base font-bold text-ink-soft">{term}</dt>
            <dd className="text-2xl">{value}</dd>
          </div>
        ))}
      </dl>

      <p className="rounded-lg border-2 border-caution bg-caution-bg p-3 text-lg text-caution">
        This summary is not a substitute for the driver&apos;s inspection. Look over the tiedown before every use and
        do not use it if it is damaged, worn or its marking cannot be read. Local rules and licensed practice govern.
      </p>

      <p className="text-lg">
        Work with this gear? <Link href="/sign-in" className="font-bold underline">Sign in</Link> to see its record.
      </p>
    </article>
  );
}
