import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { RecordReport } from "@/components/records/record-report";
import { PrintToolbar } from "@/components/records/print-toolbar";
import { requirePage } from "@/lib/auth/session";
import { AppError } from "@/lib/http/errors";
import { zodIssues } from "@/lib/field-issues";
import { recordQuerySchema, recordSearch, selectionWords } from "@/lib/records/query";
import { recordReport } from "@/lib/records/service";
import { formatDateTime } from "@/lib/time";

export const metadata: Metadata = { title: "Inspection and service record (print)" };

type Search = Record<string, string | string[] | undefined>;

/**
 * The inspection and service record made for paper (print to PDF), with the same address as
 * the records API (`from`, `to`, `kind`, `status`, `q`, `itemId`). Owners and designated
 * persons; another organisation's item is not found; a selection past the report's bound
 * says so and points to the CSV.
 */
export default async function PrintRecordsPage({ searchParams }: { searchParams: Promise<Search> }) {
  const principal = await requirePage("records.view");
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const parsed = recordQuerySchema.safeParse(raw);
  const back = typeof raw.itemId === "string" && !parsed.error?.issues.some((i) => i.path[0] === "itemId") ? `/items/${raw.itemId}` : `/records?${parsed.success ? recordSearch(parsed.data) : ""}`;
  if (!parsed.success) return <Refused back={back} message={zodIssues(parsed.error).map((i) => i.message).join(" ")} />;
  let report: Awaited<ReturnType<typeof recordReport>>;
  try {
    report = await recordReport(principal, parsed.data);
  } catch (error) {
    if (error instanceof AppError && error.status === 404) notFound();
    if (error instanceof AppError && error.status === 400) return <Refused back={back} message={error.message} />;
    throw error;
  }
  return (
    <main className="mx-auto max-w-4xl bg-white">
      <style>{PRINT_CSS}</style>
      <PrintToolbar back={back} csv={`/api/v1/records?${recordSearch(parsed.data, { format: "csv" })}`} />
      <RecordReport
        organisationName={report.organisationName}
        period={report.period}
        selection={selectionWords(parsed.data, report.item?.tagCode)}
        timeZone={report.timeZone}
        printedAt={formatDateTime(new Date(), report.timeZone)}
        printedBy={principal.name}
        total={report.total}
        events={report.events}
        people={report.people}
      />
    </main>
  );
}

function Refused({ back, message }: { back: string; message: string }) {
  return (
    <main className="mx-auto flex max-w-3xl flex-col gap-3 bg-white p-6">
      <h1 className="text-3xl font-bold">Inspection and service record</h1>
      <p role="alert" className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg text-stop">{message}</p>
      <a href={back} className="min-h-tap content-center text-lg font-bold underline">Back</a>
    </main>
  );
}

const PRINT_CSS = `
@page { size: letter; margin: 0.5in; }
@media print {
  html { font-size: 11px; }
  html, body { background: #fff; }
  .record-print__toolbar { display: none !important; }
  .record-report { padding: 0; }
  .record-report tr, .record-report .record-block { break-inside: avoid; }
  .record-report thead { display: table-header-group; }
  .record-report .record-item h2 { break-after: avoid; }
}`;
