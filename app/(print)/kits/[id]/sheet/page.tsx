import type { Metadata } from "next";
import { LoadSheet } from "@/components/kits/sheet/load-sheet";
import { SheetToolbar } from "@/components/kits/sheet/sheet-toolbar";
import { config } from "@/lib/config";
import { requireKitPage } from "@/lib/kits/page-kit";
import { PAPER, paperFor, type PaperSize } from "@/lib/kits/sheet";
import { qrSymbol } from "@/lib/tags/qr";
import { formatDateTime } from "@/lib/time";

export const metadata: Metadata = { title: "Load sheet" };

type Search = Record<string, string | string[] | undefined>;

/**
 * The load sheet for the cab, `?paper=letter|a4` (default: the organisation's units decide).
 * Every role prints it (the yard hand hands it to the driver); another organisation's kit,
 * or an unknown id, is not found.
 */
export default async function LoadSheetPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Search> }) {
  const { kit, units, timeZone } = await requireKitPage("fleet.view", params);
  const asked = (await searchParams).paper;
  const paper = paperFor(Array.isArray(asked) ? asked[0] : asked, units);
  const kitUrl = `${config.APP_URL.replace(/\/+$/, "")}/kits/${kit.id}`;
  // Level M: the sheet lives in a cab, not on a muddy chain, and a shorter symbol reads from further off.
  const qr = qrSymbol(kitUrl, { level: "M" });
  const printedAt = `${formatDateTime(new Date(), timeZone)} (${timeZone})`;
  return (
    <main className="load-sheet-page bg-white" data-paper={paper}>
      <style>{sheetCss(paper)}</style>
      <SheetToolbar kitId={kit.id} paper={paper} />
      <div className="load-sheet__paper mx-auto px-4 py-6">
        <LoadSheet kit={kit} units={units} kitUrl={kitUrl} qr={qr} printedAt={printedAt} />
      </div>
    </main>
  );
}

function sheetCss(paper: PaperSize): string {
  const p = PAPER[paper];
  return `
@page { size: ${p.css}; margin: ${p.margin}; }
.load-sheet__paper { max-width: ${paper === "letter" ? "8.5in" : "210mm"}; }
@media print {
  html { font-size: 11px; }
  html, body { background: #fff; }
  .load-sheet__toolbar { display: none !important; }
  .load-sheet__paper { padding: 0; max-width: none; }
  .load-sheet .kit-deck svg { max-height: 6.6in; margin: 0; }
  .load-sheet .sheet-block, .load-sheet tr, .load-sheet .sheet-finding { break-inside: avoid; }
  .load-sheet thead { display: table-header-group; }
  .load-sheet header figure { width: 1.25in; }
  .load-sheet [data-testid="kit-qr"] { width: 1.2in; height: 1.2in; }
}`;
}
