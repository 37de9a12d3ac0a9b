"use client";
import { buttonClass } from "@/components/ui/button-class";
import { ITEM_KINDS, ITEM_STATUSES, KIND_LABELS, type ItemStatus } from "@/lib/stock/labels";

/** A status as a filter names it, short enough for a phone's select (whether it may be used is the verdict's to say). */
const STATUS_WORDS: Record<ItemStatus, string> = { in_service: "In service", tagged_out: "Tagged out", retired: "Retired", lost: "Lost" };

/** The list's filters as they travel in the page's address (and on to the CSV export). */
export const FILTER_KEYS = ["kind", "status", "yardId", "due", "rated", "dueFrom", "dueBy", "q"] as const;

/**
 * The search box and the filters above the stock table; each change goes to the address. A
 * week of the dashboard's chart comes as dates (dueFrom, dueBy), shown in words with a way out.
 */
export function StockFilters({
  params,
  yards,
  setParams,
}: {
  params: URLSearchParams;
  yards: { id: string; name: string }[];
  setParams: (patch: Record<string, string | null>) => void;
}) {
  return (
    <>
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
      <div className="grid grid-cols-2 gap-2 md:grid-cols-5">
        <Filter label="Kind" value={params.get("kind")} onChange={(v) => setParams({ kind: v })} options={ITEM_KINDS.map((k) => [k, KIND_LABELS[k]])} />
        <Filter label="Status" value={params.get("status")} onChange={(v) => setParams({ status: v })} options={[...ITEM_STATUSES.map((s) => [s, STATUS_WORDS[s]]), ["retired,lost", "Retired or lost"]]} />
        <Filter label="Lives at" value={params.get("yardId")} onChange={(v) => setParams({ yardId: v })} options={yards.map((y) => [y.id, y.name])} />
        <Filter label="Inspection" value={params.get("due")} onChange={(v) => setParams({ due: v })} options={[["overdue", "Overdue"], ["current", "Not overdue"], ["7d", "Due in the next 7 days (not overdue)"], ["30d", "Due in the next 30 days (not overdue)"]]} />
        <Filter label="WLL" value={params.get("rated")} onChange={(v) => setParams({ rated: v })} options={[["yes", "With a WLL"], ["no", "Without a WLL"]]} />
      </div>
      {(params.get("dueFrom") || params.get("dueBy")) && (
        <p className="flex flex-wrap items-center gap-2 text-lg">
          <span>
            Inspection due {params.get("dueFrom") ? `from ${params.get("dueFrom")} ` : ""}
            {params.get("dueBy") ? `to ${params.get("dueBy")}` : "on"}
          </span>
          <button type="button" className={buttonClass("secondary")} onClick={() => setParams({ dueFrom: null, dueBy: null })}>Clear these dates</button>
        </p>
      )}
    </>
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
