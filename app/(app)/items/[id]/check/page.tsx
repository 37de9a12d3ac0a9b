import type { Metadata } from "next";
import Link from "next/link";
import { PreUseCheckForm } from "@/components/items/item-event-forms";
import { UsabilityBanner } from "@/components/items/usability-banner";
import { requireItemPage } from "@/lib/stock/page-item";
import { PRE_USE_CHECKLISTS } from "@/lib/stock/checklists";
import type { ItemKind } from "@/lib/stock/labels";
import { describeItem } from "@/lib/stock/describe";
import { itemEventAction } from "../actions";

export const metadata: Metadata = { title: "Pre-use check" };

export default async function PreUseCheckPage({ params }: { params: Promise<{ id: string }> }) {
  const { id, item, clock } = await requireItemPage("items.check", params);
  return (
    <div className="flex max-w-xl flex-col gap-4">
      <Link href={`/items/${id}`} className="text-lg underline">← {item.tagCode}</Link>
      <h1 className="text-3xl font-bold">Pre-use check</h1>
      <p className="text-xl">{describeItem(item)} · <span className="font-mono font-bold">{item.tagCode}</span></p>
      <PreUseCheckForm
        action={itemEventAction}
        itemId={id}
        points={PRE_USE_CHECKLISTS[item.kind as ItemKind]}
        notUsable={item.status === "in_service" ? undefined : <UsabilityBanner status={item.status} nextInspectionDue={item.nextInspectionDue} today={clock.today} />}
      />
    </div>
  );
}
