"use client";
import { keepPreviousData, useQuery, useQueryClient } from "@tanstack/react-query";
import { flexRender, getCoreRowModel, useReactTable, type RowSelectionState, type SortingState } from "@tanstack/react-table";
import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useMemo, useState } from "react";
import { buttonClass } from "@/components/ui/button-class";
import { VerdictBadge } from "@/components/items/verdict";
import { apiJson } from "@/lib/http/client";
import type { ItemJson } from "@/lib/stock/item-json";
import { BulkActions } from "./bulk-actions";
import { columns, DueDate, lb } from "./stock-columns";
import { FILTER_KEYS, StockFilters } from "./stock-filters";

interface Page {
  data: ItemJson[];
  pageCount: number;
  total: number;
}

/** The stock list: paged, sorted and filtered on the server, with bulk actions; each item with its verdict for today. */
export function StockTable({ yards, canEdit, canExport = false }: { yards: { id: string; name: string }[]; canEdit: boolean; canExport?: boolean }) {
  const params = useSearchParams();
  const router = useRouter();
  const pathname = usePathname();
  const queryClient = useQueryClient();
  const page = Number(params.get("page") ?? 1);
  const perPage = 25;
  const sortId = params.get("sort") ?? "tagCode";
  const desc = params.get("order") === "desc";
  const sorting: SortingState = useMemo(() => [{ id: sortId, desc }], [sortId, desc]);
  const [rowSelection, setRowSelection] = useState<RowSelectionState>({});

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
    for (const [k, v] of Object.entries(patch)) {
      if (v) next.set(k, v);
      else next.delete(k);
    }
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
  });

  const selected = Object.keys(rowSelection);
  // The export carries the filters and the sort of the table, and every matching row.
  const exportQuery = new URLSearchParams();
  for (const k of [...FILTER_KEYS, "sort", "order"] as const) if (params.get(k)) exportQuery.set(k, params.get(k)!);
  const refresh = () => queryClient.invalidateQueries({ queryKey: ["items"] });

  return (
    <div className="flex flex-col gap-3">
      <StockFilters params={params} yards={yards} setParams={setParams} />

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
        <BulkActions
          selected={selected}
          yards={yards}
          canEdit={canEdit}
          onDone={() => {
            setRowSelection({});
            refresh();
          }}
        />
      )}

      {/* Phones: one card per item. */}
      <ul className="flex flex-col gap-2 md:hidden">
        {table.getRowModel().rows.map((row) => (
          <li key={row.id} className="flex items-start gap-2 rounded-xl border-2 border-ink-soft p-2">
            <div>{flexRender(row.getVisibleCells()[0].column.columnDef.cell, row.getVisibleCells()[0].getContext())}</div>
            <div className="flex min-w-0 flex-1 flex-col gap-1">
              <Link href={row.original.url} className="inline-flex min-h-tap items-center self-start whitespace-nowrap font-mono text-xl font-bold tracking-wider underline">{row.original.tagCode}</Link>
              <span className="text-lg">{row.original.description}</span>
              <span className="text-lg font-bold">WLL {lb(row.original.wllLb)}</span>
              <span><VerdictBadge usable={row.original.usable} /></span>
              <span className="text-base text-ink-soft">
                {row.original.yard?.name ?? "no yard"} · inspection due <DueDate item={row.original} />
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
                    <button type="button" onClick={h.column.getToggleSortingHandler()} className="min-h-tap whitespace-nowrap font-bold underline decoration-dotted">
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
                <td key={cell.id} className="py-1 pr-3">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
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

