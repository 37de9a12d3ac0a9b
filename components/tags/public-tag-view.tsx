import Link from "next/link";
import { VerdictBlock } from "@/components/items/verdict";
import type { Usability } from "@/lib/stock/usability";
import { unmarkedChainWords } from "@/lib/stock/wll-words";
import { dayText, tagLabelText, type TagLabelItem } from "@/lib/tags/label";

export interface PublicTagItem extends TagLabelItem {
  lastInspectedOn: string | null;
}

/**
 * The public summary of a tagged item, for a driver or inspector without an account.
 * Only what the item is and whether it may be used today (the same verdict as the item's
 * page): never the serial, the location or anything about the organisation.
 */
export function PublicTagView({ item, usable }: { item: PublicTagItem; usable: Usability }) {
  const text = tagLabelText(item);
  const facts: [string, string][] = [];
  if (text.grade) facts.push(["Grade", text.grade.replace(/^Grade /, "")]);
  if (text.size) facts.push(["Size", text.size]);
  facts.push(["Last periodic inspection", item.lastInspectedOn ? dayText(item.lastInspectedOn) : "None on record"]);

  return (
    <article aria-labelledby="item-title" className="flex flex-col gap-5">
      <header className="flex flex-col gap-2">
        <p className="text-base font-bold uppercase tracking-wide text-ink-soft">Tagged item</p>
        <h1 id="item-title" className="text-4xl font-bold leading-tight">{text.title}</h1>
      </header>

      <VerdictBlock usable={usable} />

      <p className={`rounded-xl border-4 px-4 py-3 font-bold ${!text.hasWll ? "border-stop text-3xl text-stop" : usable.ok ? "border-ink text-3xl" : "border-idle text-2xl text-ink-soft"}`}>
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
        Work with this gear?{" "}
        <Link href="/sign-in" className="inline-flex min-h-tap items-center font-bold underline">Sign in</Link> to see its record.
      </p>
    </article>
  );
}
