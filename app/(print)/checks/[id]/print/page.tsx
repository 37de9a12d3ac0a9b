import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PrintedCheck } from "@/components/securement/print/printed-check";
import { PrintToolbar } from "@/components/securement/print/print-toolbar";
import { requirePage } from "@/lib/auth/session";
import { isUuid } from "@/lib/http/ids";
import { principalClock } from "@/lib/organisations/service";
import { readSavedCheck } from "@/lib/securement-checks/service";

export const metadata: Metadata = { title: "Load check (print)" };

/**
 * A saved load check made for paper: every role may print its organisation's saved checks
 * (as every role may run checks); another organisation's id, or an unknown one, is not found.
 */
export default async function PrintCheckPage({ params }: { params: Promise<{ id: string }> }) {
  const principal = await requirePage("securement.check");
  const { id } = await params;
  const check = isUuid(id) ? await readSavedCheck(principal, id) : undefined;
  if (!check) notFound();
  const { timeZone } = await principalClock(principal);
  return (
    <main className="mx-auto max-w-3xl bg-white">
      <style>{PRINT_CSS}</style>
      <PrintToolbar backHref={`/check?saved=${check.id}`} />
      <PrintedCheck check={check} printedAt={new Date()} timeZone={timeZone} />
    </main>
  );
}

const PRINT_CSS = `
@page { margin: 0.5in; }
@media print {
  html { font-size: 12px; }
  html, body { background: #fff; }
  .check-print section[aria-labelledby="each-heading"] > ul { display: grid; grid-template-columns: 1fr 1fr; gap: 6px; }
  .check-print__toolbar { display: none !important; }
  .check-print { padding: 0; font-size: 11pt; }
  .check-print li, .check-print dl, .check-print section > div { break-inside: avoid; }
  .check-print details > summary { list-style: none; }
  .check-print [data-code] { border-left-width: 6px; }
}`;
