import type { Metadata } from "next";
import { StatusBadge } from "@/components/ui/status-badge";
import { listItems } from "@/db/items";
import { requirePage } from "@/lib/auth/session";
import { KIND_LABELS, type ItemKind, type ItemStatus } from "@/lib/stock/labels";

export const metadata: Metadata = { title: "Stock" };

function describe(i: { kind: string; grade: number | null; size: string | null }) {
  const parts = [KIND_LABELS[i.kind as ItemKind]];
  if (i.grade) parts.push(`grade ${i.grade}`);
  if (i.size) parts.push(`${i.size} in`);
  return parts.join(", ");
}

export default async function StockPage() {
  const principal = await requirePage("stock.view");
  const { data: items } = await listItems(principal.organisationId, { page: 1, perPage: 200, sort: "kind", order: "asc" });
  return (
    <div className="flex max-w-5xl flex-col gap-4">
      <h1 className="text-3xl font-bold">Stock</h1>
      <p className="text-lg">{items.length} items.</p>
      <ul className="flex flex-col gap-2">
        {items.map((i) => (
          <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 rounded-xl border-2 border-ink-soft p-3">
            <span className="flex flex-col">
              <span className="font-mono text-xl font-bold tracking-wider">{i.tagCode}</span>
              <span className="text-lg">{describe(i)}</span>
              <span className="text-base text-ink-soft">
                {i.wllLb ? `WLL ${i.wllLb.toLocaleString("en-US")} lb` : "Cannot be rated"}
                {i.yardName ? ` · ${i.yardName}` : ""}
              </span>
            </span>
            <StatusBadge status={i.status as ItemStatus} />
          </li>
        ))}
      </ul>
    </div>
  );
}
