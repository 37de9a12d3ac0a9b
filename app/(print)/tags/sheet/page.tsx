import type { Metadata } from "next";
import { SheetToolbar } from "@/components/tags/sheet-toolbar";
import { buttonClass } from "@/components/ui/button-class";
import { TagLabel, type SheetItem } from "@/components/tags/tag-label";
import { StatusBadge } from "@/components/ui/status-badge";
import { getItemsByIds, listItems } from "@/db/items";
import { requirePage } from "@/lib/auth/session";
import { describeItem } from "@/lib/stock/describe";
import type { ItemStatus } from "@/lib/stock/labels";
import {
  clampSkip,
  labelsPerSheet,
  layoutSheets,
  LETTER,
  MAX_SHEET_ITEMS,
  parseSheetIds,
  SHEET_LAYOUTS,
  sheetLayout,
  type SheetLayout,
} from "@/lib/tags/sheet";

export const metadata: Metadata = { title: "Tag sheet" };

type Search = Record<string, string | string[] | undefined>;
const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

/**
 * Printable sheets of QR tags: `?ids=<item ids, comma separated>&layout=<id>&start=<n>`.
 * Ids of other organisations and unknown ids are left out; without ids, a list to pick from.
 */
export default async function TagSheetPage({ searchParams }: { searchParams: Promise<Search> }) {
  const principal = await requirePage("stock.view");
  const search = await searchParams;
  const layout = sheetLayout(first(search.layout));
  const { ids, truncated } = parseSheetIds(search.ids);
  const skip = clampSkip(Number(first(search.start) ?? 1) - 1, layout);

  if (ids.length === 0) return <ItemPicker organisationId={principal.organisationId} layoutId={layout.id} />;

  const items: SheetItem[] = await getItemsByIds(principal.organisationId, ids);
  const pages = layoutSheets(items, layout, { skip });
  const size = layout.labelHeightIn >= 2 ? "large" : "small";
  const summary =
    items.length === 0
      ? "None of these items is in your stock."
      : `${items.length} tag${items.length === 1 ? "" : "s"} on ${pages.length} sheet${pages.length === 1 ? "" : "s"} of ${layout.name.split(",")[0]} labels.` +
        (truncated ? ` Only the first ${MAX_SHEET_ITEMS} items fit one request.` : "");

  return (
    <main className="tag-print">
      <style>{sheetCss(layout)}</style>
      <SheetToolbar
        ids={ids}
        layouts={SHEET_LAYOUTS.map((l) => ({ id: l.id, name: l.name }))}
        layoutId={layout.id}
        skip={skip}
        perSheet={labelsPerSheet(layout)}
        summary={summary}
      />
      <div className="tag-sheets" data-layout={layout.id}>
        {pages.map((page) => (
          <section key={page.number} className="tag-sheet" aria-label={`Sheet ${page.number} of ${pages.length}`}>
            {page.cells.map((cell) => (
              <div
                key={cell.item.id}
                className="tag-cell"
                data-tag-code={cell.item.tagCode}
                data-position={cell.position}
                style={{ left: `${cell.xIn}in`, top: `${cell.yIn}in`, width: `${cell.widthIn}in`, height: `${cell.heightIn}in` }}
              >
                <TagLabel item={cell.item} size={size} />
              </div>
            ))}
          </section>
        ))}
      </div>
    </main>
  );
}

/** Physical sizes of the sheet, the labels and what is printed on them. */
function sheetCss(layout: SheetLayout): string {
  return `
@page { size: letter; margin: 0; }
.tag-sheets { padding: 1rem 0 2rem; background: #d1d5db; overflow-x: auto; }
.tag-sheet { position: relative; width: ${LETTER.widthIn}in; height: ${LETTER.heightIn}in; margin: 0 auto 1rem; background: #fff; box-shadow: 0 2px 8px rgb(0 0 0 / 0.3); overflow: hidden; }
.tag-cell { position: absolute; box-sizing: border-box; border-radius: ${layout.cornerRadiusIn}in; outline: 1px dashed #9ca3af; outline-offset: -1px; overflow: hidden; color: #000; }
.tag { display: flex; height: 100%; box-sizing: border-box; font-family: "Roboto Condensed", "Arial Narrow", Arial, sans-serif; line-height: 1.15; }
.tag p { margin: 0; }
.tag__qr-column { display: flex; flex-direction: column; align-items: center; flex: none; }
.tag__qr { display: block; }
.tag__text { display: flex; flex-direction: column; min-width: 0; }
.tag__code { font-family: "DejaVu Sans Mono", Menlo, Consolas, "Liberation Mono", monospace; font-weight: 700; letter-spacing: 0.02em; white-space: nowrap; }
.tag__title { font-weight: 700; }
.tag__wll { font-weight: 700; white-space: nowrap; }
.tag__wll--none { border: 0.02in solid #000; padding: 0 0.04in; align-self: flex-start; }
.tag--small { padding: 0.05in 0.08in 0.05in 0.04in; gap: 0.04in; }
.tag--small .tag__qr { width: 0.9in; height: 0.9in; }
.tag--small .tag__text { justify-content: center; gap: 0.015in; }
.tag--small .tag__code { font-size: 16pt; }
.tag--small .tag__title { font-size: 10pt; }
.tag--small .tag__details { font-size: 8.5pt; }
.tag--small .tag__wll { font-size: 12pt; }
.tag--large { padding: 0.08in 0.14in 0.08in 0.06in; gap: 0.1in; }
.tag--large .tag__qr { width: 1.5in; height: 1.5in; }
.tag--large .tag__code { font-size: 16pt; margin-top: 0.01in; }
.tag--large .tag__text { justify-content: center; gap: 0.05in; padding-top: 0.02in; }
.tag--large .tag__title { font-size: 18pt; }
.tag--large .tag__details { font-size: 13pt; }
.tag--large .tag__wll { font-size: 22pt; }
.tag--large .tag__hint { font-size: 8.5pt; margin-top: 0.04in; }
.tag--small .tag__wll--none { font-size: 10.5pt; }
.tag--large .tag__wll--none { font-size: 17pt; }
@media print {
  html, body { margin: 0; padding: 0; background: #fff; }
  .tag-toolbar { display: none !important; }
  .tag-sheets { padding: 0; background: none; overflow: visible; }
  .tag-sheet { margin: 0; box-shadow: none; break-after: page; }
  .tag-sheet:last-child { break-after: auto; }
  .tag-cell { outline: none; }
}`;
}

async function ItemPicker({ organisationId, layoutId }: { organisationId: string; layoutId: string }) {
  const { data: items } = await listItems(organisationId, { page: 1, perPage: MAX_SHEET_ITEMS, sort: "tagCode", order: "asc" });
  return (
    <main className="mx-auto flex max-w-3xl flex-col gap-4 px-4 py-6">
      <h1 className="text-3xl font-bold">Tag sheet</h1>
      <p className="text-lg">Tick the items that need a new QR tag, then make the sheet.</p>
      <form method="get" className="flex flex-col gap-3">
        <div className="flex flex-wrap items-end gap-3">
          <label className="flex flex-col gap-1 text-base font-bold">
            Label size
            <select name="layout" defaultValue={layoutId} className="min-h-tap rounded-lg border-2 border-ink-soft bg-white px-3 text-lg font-normal">
              {SHEET_LAYOUTS.map((l) => (
                <option key={l.id} value={l.id}>{l.name}</option>
              ))}
            </select>
          </label>
          <button type="submit" className={buttonClass("primary")}>Make the tag sheet</button>
          <a href="/stock" className="min-h-tap content-center text-lg font-bold underline">Back to stock</a>
        </div>
        <ul className="flex flex-col gap-2">
          {items.map((i) => (
            <li key={i.id}>
              <label className="flex min-h-tap items-center gap-3 rounded-lg border-2 border-ink-soft px-3 py-2 text-lg">
                <input type="checkbox" name="ids" value={i.id} className="h-6 w-6 flex-none" />
                <span className="font-mono font-bold">{i.tagCode}</span>
                <span className="flex-1">{describeItem(i)}</span>
                <StatusBadge status={i.status as ItemStatus} />
              </label>
            </li>
          ))}
        </ul>
        <button type="submit" className={buttonClass("primary", "self-start")}>Make the tag sheet</button>
      </form>
    </main>
  );
}
