import type { Metadata } from "next";
import Link from "next/link";
import { Suspense } from "react";
import { StockTable } from "@/components/stock/stock-table";
import { buttonClass } from "@/components/ui/button-class";
import { listYards } from "@/db/items";
import { can } from "@/lib/auth/roles";
import { requirePage } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Stock" };

export default async function StockPage() {
  const principal = await requirePage("stock.view");
  const yards = await listYards(principal.organisationId);
  return (
    <div className="flex max-w-6xl flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h1 className="text-3xl font-bold">Stock</h1>
        <div className="flex flex-wrap gap-2">
          {can(principal, "stock.import") && (
            <Link href="/stock/import" className={buttonClass("secondary")}>Import CSV</Link>
          )}
          {can(principal, "stock.edit") && (
            <Link href="/stock/new" className={buttonClass("primary")}>Add an item</Link>
          )}
        </div>
      </div>
      <Suspense>
        <StockTable yards={yards} canEdit={can(principal, "stock.edit")} canExport={can(principal, "stock.edit")} />
      </Suspense>
    </div>
  );
}
