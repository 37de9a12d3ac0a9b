"use client";
import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type RowSelectionState,
  type SortingState,
} from "@tanstack/react-table";
import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useMemo, useState } from "react";
import { buttonClass } from "@/components/ui/button-class";
import { StatusBadge } from "@/components/ui/status-badge";
import { apiJson } from "@/lib/http/client";
import { ITEM_KINDS, ITEM_STATUSES, KIND_LABELS, STATUS_LABELS, type ItemStatus } from "@/lib/stock/labels";
import type { ItemJson } from "@/lib/stock/item-json";

interface Page {
  data: ItemJson[];
  pageCount: number;
  total: number;
}

const FILTER_KEYS = ["kind", "status", "yardId", "due", "q"] as const;


const lb = (n: number | null) => (n == null ? "not rated" : `${n.toLocaleString("en-US")} lb`);

/** What the cells read besides their row: the organisation's today (YYYY-MM-DD). */
interface TableMeta {
  today: string;
}

const columns: ColumnDef<ItemJson>[] = [
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

function DueDate({ date, today }: { date: string | null; today: string }) {
  if (!date) return <span>not set</span>;
  const overdue = date < today;
  return overdue ? <strong className="text-stop">{date} overdue</strong> : <span>{date}</span>;
}

/** The stock list: paged, sorted and filtered on the server, with bulk actions. `today` is the organisation's date. */
export function StockTable({ yards, canEdit, canExport = false, today }: { yards: { id: string; name: string }[]; canEdit: boolean; canExport?: boolean; today: string }) {
  const params = useSearchParams();
  const router = useRouter();
  const pathname = usePathname();
  const queryClient = useQueryClient();
  const page = Number(params.get("page") ?? 1);
  const perPage = 25;
  const sorting: SortingState = [{ id: params.get("sort") ?? "tagCode", desc: params.get("order") === "desc" }];
  const [rowSelection, setRowSelection] = useState<RowSelectionState>({});
  const [bulk, setBulk] = useState<"move" | "tag_out" | null>(null);

  const query = useMemo(() => {
    const q = new URLSearchParams({ page: String(page), perPage: String(perPage), sort: sorting[0].id, order: sorting[0].desc ? "desc" : "asc" });
    for (const k of FILTER_KEYS) if (params.get(k)) q.set(k, params.get(k)!);
    return q.toString();
  }, [params, page, sorting]);

  const { data, isFetching, error } = useQuery({
    queryKey: ["items", query],
    queryFn: () => apiJson<Page>(`/api/v1/items?${query}`),
    placeholderData: keepPreviousData,
  });

  function setParams(patch: Record<string, string | null>) {
    const next = new URLSearchParams(params);
    for (const [k, v] of Object.entries(patch)) (v ? next.set(k, v) : next.delete(k));
    if (!("page" in patch)) next.delete("page");
    setRowSelection({});
    router.replace(`${pathname}?${next.toString()}`, { scroll: false });
  }

  const table = useReactTable({
    data: data?.data ?? [],
    columns,
    getRowId: (r) => r.id,
    manualPagination: true,
    manualSorting: true,
    pageCount: data?.pageCount ?? 1,
    state: { sorting, rowSelection, pagination: { pageIndex: page - 1, pageSize: perPage } },
    onRowSelectionChange: setRowSelection,
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      setParams({ sort: next[0]?.id ?? null, order: next[0]?.desc ? "desc" : null });
    },
    getCoreRowModel: getCoreRowModel(),
    meta: { today } satisfies TableMeta,
  });

  const selected = Object.keys(rowSelection);
  // The export carries the filters and the sort of the table, and every matching row.
  const exportQuery = new URLSearchParams();
  for (const k of [...FILTER_KEYS, "sort", "order"] as const) if (params.get(k)) exportQuery.set(k, params.get(k)!);
  const refresh = () => queryClient.invalidateQueries({ queryKey: ["items"] });

  return (
    <div className="flex flex-col gap-3">
      <form
        role="search"
        className="flex flex-wrap items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          setParams({ q: new FormData(e.currentTarget).get("q") as string });
        }}
      >
        <label className="flex flex-1 flex-col gap-1 text-base font-bold">
          Tag code or serial
          <input name="q" defaultValue={params.get("q") ?? ""} className="min-h-tap rounded-lg border-2 border-ink-soft px-3 text-lg" autoCapitalize="characters" />
        </label>
        <button type="submit" className={buttonClass("primary")}>Search</button>
      </form>
      <div className="grid grid-cols-2 gap-2 md:grid-cols-4">
        <Filter label="Kind" value={params.get("kind")} onChange={(v) => setParams({ kind: v })} options={ITEM_KINDS.map((k) => [k, KIND_LABELS[k]])} />
        <Filter label="Status" value={params.get("status")} onChange={(v) => setParams({ status: v })} options={ITEM_STATUSES.map((s) => [s, STATUS_LABELS[s].label])} />
        <Filter label="Lives at" value={params.get("yardId")} onChange={(v) => setParams({ yardId: v })} options={yards.map((y) => [y.id, y.name])} />
        <Filter label="Inspection" value={params.get("due")} onChange={(v) => setParams({ due: v })} options={[["overdue", "Overdue"], ["30d", "Due in 30 days"]]} />
      </div>

      <div className="flex flex-wrap items-center justify-between gap-2">
        <p aria-live="polite" className="text-lg">
          {error ? <strong className="text-stop">{(error as Error).message}</strong> : data ? `${data.total.toLocaleString("en-US")} items${isFetching ? " (updating…)" : ""}` : "Loading…"}
        </p>
        {canExport && (
          <a href={`/api/v1/items/export.csv${exportQuery.size ? `?${exportQuery.toString()}` : ""}`} download className="flex min-h-tap items-center text-lg font-bold underline">
            Export CSV{exportQuery.size ? " (these filters)" : ""}
          </a>
        )}
      </div>

      {selected.length > 0 && (
        <div className="flex flex-col gap-2 rounded-xl border-2 border-ink bg-signal/20 p-3">
          <p className="text-lg font-bold">{selected.length} selected</p>
          <div className="flex flex-wrap gap-2">
            <Link href={`/tags/sheet?ids=${selected.join(",")}`} className={buttonClass("secondary")}>Print tags</Link>
            {canEdit && <button type="button" onClick={() => setBulk("move")} className={buttonClass("secondary")}>Move</button>}
            <button type="button" onClick={() => setBulk("tag_out")} className={buttonClass("danger-outline")}>Tag out</button>
          </div>
          {bulk === "move" && <BulkMove ids={selected} yards={yards} onDone={() => { setBulk(null); setRowSelection({}); refresh(); }} />}
          {bulk === "tag_out" && <BulkTagOut ids={selected} onDone={() => { setBulk(null); setRowSelection({}); refresh(); }} />}
        </div>
      )}

      {/* Phones: one card per item. */}
      <ul className="flex flex-col gap-2 md:hidden">
        {table.getRowModel().rows.map((row) => (
          <li key={row.id} className="flex items-start gap-3 rounded-xl border-2 border-ink-soft p-3">
            <div className="pt-1">{flexRender(row.getVisibleCells()[0].column.columnDef.cell, row.getVisibleCells()[0].getContext())}</div>
            <div className="flex flex-1 flex-col gap-1">
              <Link href={row.original.url} className="font-mono text-xl font-bold tracking-wider underline">{row.original.tagCode}</Link>
              <span className="text-lg">{row.original.description}</span>
              <span className="text-lg font-bold">WLL {lb(row.original.wllLb)}</span>
              <StatusBadge status={row.original.status as ItemStatus} />
              <span className="text-base text-ink-soft">
                {row.original.yard?.name ?? "no yard"} · inspection due <DueDate date={row.original.nextInspectionDue} today={today} />
              </span>
            </div>
          </li>
        ))}
      </ul>

      {/* Wider screens: the table, sortable by its headers. */}
      <table className="hidden w-full border-collapse text-left text-base md:table">
        <thead>
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id} className="border-b-2 border-ink">
              {hg.headers.map((h) => (
                <th key={h.id} scope="col" className="py-2 pr-3" aria-sort={h.column.getIsSorted() ? (h.column.getIsSorted() === "desc" ? "descending" : "ascending") : undefined}>
                  {h.column.getCanSort() ? (
                    <button type="button" onClick={h.column.getToggleSortingHandler()} className="min-h-10 font-bold underline decoration-dotted">
                      {flexRender(h.column.columnDef.header, h.getContext())}
                      {h.column.getIsSorted() === "asc" ? " ▲" : h.column.getIsSorted() === "desc" ? " ▼" : ""}
                    </button>
                  ) : (
                    flexRender(h.column.columnDef.header, h.getContext())
                  )}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-idle">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="py-2 pr-3">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>

      <nav aria-label="Pages" className="flex items-center justify-between gap-2">
        <button type="button" disabled={page <= 1} onClick={() => setParams({ page: String(page - 1) })} className={buttonClass("secondary")}>← Previous</button>
        <span className="text-lg">Page {page} of {data?.pageCount ?? 1}</span>
        <button type="button" disabled={page >= (data?.pageCount ?? 1)} onClick={() => setParams({ page: String(page + 1) })} className={buttonClass("secondary")}>Next →</button>
      </nav>
    </div>
  );
}

function Filter({ label, value, onChange, options }: { label: string; value: string | null; onChange: (v: string | null) => void; options: string[][] }) {
  return (
    <label className="flex flex-col gap-1 text-base font-bold">
      {label}
      <select value={value ?? ""} onChange={(e) => onChange(e.target.value || null)} className="min-h-tap rounded-lg border-2 border-ink-soft bg-white px-2 text-lg">
        <option value="">All</option>
        {options.map(([v, l]) => <option key={v} value={v}>{l}</option>)}
      </select>
    </label>
  );
}

function BulkMove({ ids, yards, onDone }: { ids: string[]; yards: { id: string; name: string }[]; onDone: () => void }) {
  const [yardId, setYardId] = useState(yards[0]?.id ?? "");
  const move = useMutation({ mutationFn: () => apiJson<{ moved: number }>("/api/v1/items/move", { method: "POST", body: JSON.stringify({ itemIds: ids, yardId }) }), onSuccess: onDone });
  return (
    <div className="flex flex-wrap items-end gap-2">
      <label className="flex flex-col gap-1 text-base font-bold">
        Move to
        <select value={yardId} onChange={(e) => setYardId(e.target.value)} className="min-h-tap rounded-lg border-2 border-ink-soft bg-white px-2 text-lg">
          {yards.map((y) => <option key={y.id} value={y.id}>{y.name}</option>)}
        </select>
      </label>
      <button type="button" disabled={move.isPending} onClick={() => move.mutate()} className={buttonClass("primary")}>Move {ids.length}</button>
      {move.error && <p role="alert" className="font-bold text-stop">{move.error.message}</p>}
    </div>
  );
}

function BulkTagOut({ ids, onDone }: { ids: string[]; onDone: () => void }) {
  const [note, setNote] = useState("");
  const [problems, setProblems] = useState<string[]>([]);
  const tagOut = useMutation({
    mutationFn: async () => {
      const failed: string[] = [];
      for (const id of ids) {
        try {
          await apiJson(`/api/v1/items/${id}/events`, { method: "POST", body: JSON.stringify({ type: "tag_out", note }) });
        } catch (e) {
          failed.push((e as Error).message);
        }
      }
      return failed;
    },
    onSuccess: (failed) => (failed.length ? setProblems(failed) : onDone()),
  });
  return (
    <div className="flex flex-col gap-2">
      <label htmlFor="bulk-note" className="text-base font-bold">What is wrong with them?</label>
      <textarea id="bulk-note" value={note} onChange={(e) => setNote(e.target.value)} rows={2} className="rounded-lg border-2 border-ink-soft p-2 text-lg" />
      <button type="button" disabled={tagOut.isPending || note.trim().length < 3} onClick={() => tagOut.mutate()} className={buttonClass("danger")}>
        Tag out {ids.length}
      </button>
      {problems.length > 0 && <ul role="alert" className="list-disc pl-6 font-bold text-stop">{problems.map((p, i) => <li key={i}>{p}</li>)}</ul>}
    </div>
  );
}
