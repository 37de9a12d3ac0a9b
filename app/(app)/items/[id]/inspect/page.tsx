import type { Metadata } from "next";
import Link from "next/link";
import { InspectionForm } from "@/components/items/item-event-forms";
import { requireItemPage } from "@/lib/stock/page-item";
import { PRE_USE_CHECKLISTS } from "@/lib/stock/checklists";
import { MEASUREMENTS } from "@/lib/stock/inspection";
import type { ItemKind } from "@/lib/stock/labels";
import { describeItem } from "@/lib/stock/describe";
import { itemEventAction } from "../actions";

export const metadata: Metadata = { title: "Periodic inspection" };

export default async function InspectionPage({ params }: { params: Promise<{ id: string }> }) {
  const { id, item } = await requireItemPage("items.inspect", params);
  const kind = item.kind as ItemKind;
  return (
    <div className="flex max-w-4xl flex-col gap-4">
      <Link href={`/items/${id}`} className="text-lg underline">← {item.tagCode}</Link>
      <h1 className="text-3xl font-bold">Periodic inspection</h1>
      <p className="text-xl">{describeItem(item)} · <span className="font-mono font-bold">{item.tagCode}</span></p>
      <p className="text-base">
        The limits come from ASME B30.9, B30.10 and B30.26 and the CVSA tiedown defect table; each
        measured value is recorded with its limit. Follow the maker&apos;s instructions where they ask more.
      </p>
      <InspectionForm itemId={id} points={PRE_USE_CHECKLISTS[kind]} measurements={MEASUREMENTS[kind]} action={itemEventAction} />
    </div>
  );
}
