"use client";
import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { VerdictBadge } from "@/components/items/verdict";
import type { ItemJson } from "@/lib/stock/item-json";

// The columns of the stock table (the phone cards reuse the first and the due date). The
// "usable" column is the item's verdict as the API answers it: no cell works out "overdue".

export const lb = (n: number | null) => (n == null ? "not rated" : `${n.toLocaleString("en-US")} lb`);

/** A row's checkbox, inside a label the size of a fingertip (the box alone is too small for a glove). */
export function SelectBox({ label, checked, onChange }: { label: string; checked: boolean; onChange: (event: unknown) => void }) {
  return (
    <label className="-m-1 flex min-h-tap min-w-tap cursor-pointer items-center justify-center">
      <input type="checkbox" aria-label={label} className="h-7 w-7 shrink-0 accent-deck" checked={checked} onChange={onChange} />
    </label>
  );
}

export const columns: ColumnDef<ItemJson>[] = [
  {
    id: "select",
    enableSorting: false,
    header: ({ table }) => <SelectBox label="Select all on this page" checked={table.getIsAllPageRowsSelected()} onChange={table.getToggleAllPageRowsSelectedHandler()} />,
    cell: ({ row }) => <SelectBox label={`Select ${row.original.tagCode}`} checked={row.getIsSelected()} onChange={row.getToggleSelectedHandler()} />,
  },
  {
    id: "tagCode",
    header: "Tag",
    cell: ({ row }) => (
      <Link href={row.original.url} className="inline-flex min-h-tap items-center whitespace-nowrap font-mono text-lg font-bold tracking-wider underline">
        {row.original.tagCode}
      </Link>
    ),
  },
  { id: "kind", header: "Item", cell: ({ row }) => row.original.description },
  { id: "wllLb", header: "WLL", cell: ({ row }) => <span className="whitespace-nowrap font-bold">{lb(row.original.wllLb)}</span> },
  { id: "status", header: "Usable today?", cell: ({ row }) => <VerdictBadge usable={row.original.usable} /> },
  { id: "yardName", header: "Lives at", cell: ({ row }) => <span className="whitespace-nowrap">{row.original.yard?.name ?? ""}</span> },
  { id: "nextInspectionDue", header: "Inspection due", cell: ({ row }) => <DueDate item={row.original} /> },
  { id: "serial", header: "Serial", cell: ({ row }) => <span className="whitespace-nowrap">{row.original.serial ?? ""}</span> },
];

/** The inspection date; "overdue" only when the verdict says so. */
export function DueDate({ item }: { item: ItemJson }) {
  if (!item.nextInspectionDue) return <span>not set</span>;
  const overdue = item.usable.reasons.some((r) => r.code === "INSPECTION_OVERDUE");
  return overdue ? <strong className="whitespace-nowrap text-stop">{item.nextInspectionDue} overdue</strong> : <span className="whitespace-nowrap">{item.nextInspectionDue}</span>;
}
