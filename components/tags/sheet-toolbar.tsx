"use client";
import { buttonClass } from "@/components/ui/button";

interface Props {
  ids: string[];
  layouts: { id: string; name: string }[];
  layoutId: string;
  skip: number;
  perSheet: number;
  summary: string;
}

/** On screen only: pick the label size, skip used labels, print. */
export function SheetToolbar({ ids, layouts, layoutId, skip, perSheet, summary }: Props) {
  return (
    <div className="tag-toolbar flex flex-col gap-3 border-b-2 border-ink bg-white px-4 py-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold">Tag sheet</h1>
        <p className="text-lg" role="status">{summary}</p>
      </div>
      <form method="get" className="flex flex-wrap items-end gap-3">
        <input type="hidden" name="ids" value={ids.join(",")} />
        <label className="flex flex-col gap-1 text-base font-bold">
          Label size
          <select
            name="layout"
            defaultValue={layoutId}
            onChange={(e) => e.currentTarget.form?.requestSubmit()}
            className="min-h-tap rounded-lg border-2 border-ink-soft bg-white px-3 text-lg font-normal"
          >
            {layouts.map((l) => (
              <option key={l.id} value={l.id}>{l.name}</option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-base font-bold">
          Start at label
          <input
            type="number"
            name="start"
            min={1}
            max={perSheet}
            defaultValue={skip + 1}
            inputMode="numeric"
            className="min-h-tap w-24 rounded-lg border-2 border-ink-soft bg-white px-3 text-lg font-normal"
          />
        </label>
        <button type="submit" className={buttonClass("secondary")}>Show</button>
        <button type="button" onClick={() => window.print()} className={buttonClass("primary")}>Print</button>
        <a href="/stock" className="min-h-tap content-center text-lg font-bold underline">Back to stock</a>
      </form>
      <p className="text-base text-ink-soft">
        Print at actual size (100 %, no &quot;fit to page&quot;) on US Letter label sheets. &quot;Start at label&quot; skips
        labels already used on a part sheet, counting across then down.
      </p>
    </div>
  );
}
