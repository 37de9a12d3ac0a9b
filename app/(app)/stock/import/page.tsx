import type { Metadata } from "next";
import Link from "next/link";
import { ImportWizard } from "@/components/import/import-wizard";
import { listMappings } from "@/db/imports";
import { requirePage } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Import stock" };

export default async function ImportPage() {
  const principal = await requirePage("stock.import");
  const mappings = await listMappings(principal.organisationId);
  return (
    <div className="flex max-w-5xl flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h1 className="text-3xl font-bold">Import stock from a CSV file</h1>
        <Link href="/stock/import/history" className="flex min-h-tap items-center text-lg font-bold underline">Import history</Link>
      </div>
      <p className="text-lg">
        Rows whose serial or tag code is already in your stock update that item; other rows add new items, each with its own tag code.
        Nothing goes in until every row passes the same checks as the add-item form, unless you choose to import only the valid rows.
      </p>
      <ImportWizard savedMappings={mappings.map((m) => ({ id: m.id, name: m.name, mapping: m.mapping }))} />
    </div>
  );
}
