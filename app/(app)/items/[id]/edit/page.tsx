import type { Metadata } from "next";
import Link from "next/link";
import { ItemForm, type ItemFormValues } from "@/components/items/item-details-form";
import { editItemAction } from "@/app/(app)/stock/actions";
import { listYards } from "@/db/items";
import { toFeet } from "@/lib/securement/units";
import { requireItemPage } from "@/lib/stock/page-item";
import type { ItemKind } from "@/lib/stock/labels";

export const metadata: Metadata = { title: "Edit item" };

export default async function EditItemPage({ params }: { params: Promise<{ id: string }> }) {
  const { principal, id, item } = await requireItemPage("stock.edit", params);
  const d = item.details as { mechanism?: string; chainSizeRange?: [string, string]; ends?: string };
  const initial: ItemFormValues = {
    kind: item.kind as ItemKind,
    marking: item.markedWllLb ? "wll" : item.gradeMarked && item.grade ? "grade" : "none",
    markedWllValue: item.markedWllLb ? String(item.markedWllLb) : undefined,
    grade: item.grade ? String(item.grade) : undefined,
    size: item.size ?? undefined,
    rangeMin: d.chainSizeRange?.[0],
    rangeMax: d.chainSizeRange?.[1],
    mechanism: d.mechanism,
    lengthValue: item.lengthMm ? toFeet({ value: item.lengthMm, unit: "mm" }).value.toFixed(1) : undefined,
    ends: d.ends,
    serial: item.serial ?? undefined,
    yardId: item.yardId ?? "",
    inServiceOn: item.inServiceOn ?? undefined,
    cost: item.costCents != null ? (item.costCents / 100).toFixed(2) : undefined,
  };
  return (
    <div className="flex max-w-4xl flex-col gap-4">
      <Link href={`/items/${id}`} className="text-lg underline">← {item.tagCode}</Link>
      <h1 className="text-3xl font-bold">Edit {item.tagCode}</h1>
      <ItemForm yards={await listYards(principal.organisationId)} initial={initial} itemId={id} action={editItemAction} />
    </div>
  );
}
