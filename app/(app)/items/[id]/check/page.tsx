import type { Metadata } from "next";
import Link from "next/link";
import { PreUseCheckForm } from "@/components/items/item-event-forms";
import { VerdictBlock } from "@/components/items/verdict";
import { buttonClass } from "@/components/ui/button-class";
import { requireItemPage } from "@/lib/stock/page-item";
import { PRE_USE_CHECKLISTS } from "@/lib/stock/checklists";
import type { ItemKind } from "@/lib/stock/labels";
import { describeItem } from "@/lib/stock/describe";
import { itemVerdict } from "@/lib/stock/verdict";
import { itemEventAction } from "../actions";

export const metadata: Metadata = { title: "Pre-use check" };

/** The pre-use check of one item; gear that may not be used gets its verdict instead of the form. */
export default async function PreUseCheckPage({ params }: { params: Promise<{ id: string }> }) {
  const { id, item, clock } = await requireItemPage("items.check", params);
  const usable = itemVerdict(item, clock);
  return (
    <div className="flex max-w-4xl flex-col gap-4">
      <Link href={`/items/${id}`} className="inline-flex min-h-tap items-center text-lg font-bold underline">
        ← Back to <span className="ml-1 whitespace-nowrap font-mono">{item.tagCode}</span>
      </Link>
      <h1 className="text-3xl font-bold">Pre-use check</h1>
      <p className="text-xl">{describeItem(item)} · <span className="whitespace-nowrap font-mono font-bold">{item.tagCode}</span></p>
      <PreUseCheckForm
        action={itemEventAction}
        itemId={id}
        points={PRE_USE_CHECKLISTS[item.kind as ItemKind]}
        notUsable={
          usable.ok ? undefined : (
            <div className="flex flex-col gap-3">
              <VerdictBlock usable={usable} />
              <Link href={`/items/${id}`} className={buttonClass("secondary")}>Back to the item</Link>
            </div>
          )
        }
      />
    </div>
  );
}
