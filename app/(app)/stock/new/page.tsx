import type { Metadata } from "next";
import { ItemForm } from "@/components/items/item-details-form";
import { createItemAction } from "../actions";
import { listYards } from "@/db/items";
import { requirePage } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Add an item" };

export default async function NewItemPage() {
  const principal = await requirePage("stock.edit");
  return (
    <div className="flex max-w-4xl flex-col gap-4">
      <h1 className="text-3xl font-bold">Add an item</h1>
      <p className="text-lg">It gets its own tag code at once. Its WLL comes from its marking, or from the 49 CFR 393.108 tables when it is unmarked.</p>
      <ItemForm yards={await listYards(principal.organisationId)} action={createItemAction} />
    </div>
  );
}
