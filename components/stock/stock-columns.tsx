"use client";
import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { StatusBadge } from "@/components/ui/status-badge";
import type { ItemJson } from "@/lib/stock/item-json";
import type { ItemStatus } from "@/lib/stock/labels";

// The columns of the stock table (the phone cards reuse the first and the due date).

export const lb = (n: number | null) => (n == null ? "not rated" : `${n.toLocaleString("en-US")} lb`);

/** What the cells read besides their row: the organisation's today (YYYY-MM-DD). */
export interface TableMeta {
  today: string;
}

export const columns: ColumnDef<ItemJson>[] = [
  {
    id: "select",
    enableSorting: false,
    header: ({ table }) => (
      <input type="checkbox" aria-label="Select all on this page" className="h-6 w-6 shrink-0" checked={table.getIsAllPageRowsSelected()} onChange={table.getToggleAllPageRowsSelectedHandler()} />
    ),
    cell: ({ row }) => (
      <input type="checkbox" aria-label={`Select ${row.original.tagCode}`} className="h-6 w-6 shrink-0" checked={row.getIsSelected()} onChange={row.getToggleSelectedHandler()} />
    ),
  },
  {
    id: "tagCode",
    header: "Tag",
    cell: ({ row }) => (
      <Link href={row.original.url} className="font-mono text-lg font-bold tracking-wider underline">{row.original.tagCode}</Link>
    ),
  },
  { id: "kind", header: "Item", cell: ({ row }) => row.original.description },
  { id: "wllLb", header: "WLL", cell: ({ row }) => <span className="font-bold">{lb(row.original.wllLb)}</span> },
  { id: "status", header: "Status", cell: ({ row }) => <StatusBadge status={row.original.status as ItemStatus} /> },
  { id: "yardName", header: "Lives at", cell: ({ row }) => row.original.yard?.name ?? "" },
  { id: "nextInspectionDue", header: "Inspection due", cell: ({ row, table }) => <DueDate date={row.original.nextInspectionDue} today={(table.options.meta as TableMeta).today} /> },
  { id: "serial", header: "Serial", cell: ({ row }) => row.original.serial ?? "" },
];

export function DueDate({ date, today }: { date: string | null; today: string }) {
  if (!date) return <span>not set</span>;
  const overdue = date < today;
  return overdue ? <strong className="text-stop">{date} overdue</strong> : <span>{date}</span>;
}
