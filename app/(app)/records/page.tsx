import type { Metadata } from "next";
import { buttonClass } from "@/components/ui/button-class";
import { Field, SelectField } from "@/components/ui/field";
import { requirePage } from "@/lib/auth/session";
import { zodIssues } from "@/lib/field-issues";
import { AppError } from "@/lib/http/errors";
import { MAX_REPORT_EVENTS, periodWords, recordQuerySchema, recordSearch, selectionWords } from "@/lib/records/query";
import { recordSummary } from "@/lib/records/service";
import { ITEM_KINDS, KIND_LABELS } from "@/lib/stock/labels";
import { writtenDate, zoneWords } from "@/lib/time";

export const metadata: Metadata = { title: "Records" };

type Search = Record<string, string | string[] | undefined>;

const STATUS_CHOICES = [
  { value: "", label: "Any status" },
  { value: "in_service", label: "In service" },
  { value: "tagged_out", label: "Tagged out" },
  { value: "retired,lost", label: "Retired or lost" },
];

/**
 * The inspection and service record for an auditor or insurer: a period and the items (kind,
 * status now, tag code or serial), how many entries that is and who made them, then the
 * printable report or the CSV. Owners and designated persons: those who inspect, and answer
 * for the record (lib/auth/roles.ts "records.view").
 */
export default async function RecordsPage({ searchParams }: { searchParams: Promise<Search> }) {
  const principal = await requirePage("records.view");
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const parsed = recordQuerySchema.safeParse(raw);
  const errors: Record<string, string> = {};
  let summary: Awaited<ReturnType<typeof recordSummary>> | null = null;
  if (!parsed.success) for (const i of zodIssues(parsed.error)) errors[i.path] = i.message;
  else {
    try {
      summary = await recordSummary(principal, parsed.data);
    } catch (error) {
      if (!(error instanceof AppError) || error.status === 403) throw error;
      for (const i of error.issues.length ? error.issues : [{ path: "itemId", message: error.message }]) errors[i.path] = i.message;
    }
  }
  const asked = parsed.success ? parsed.data : {};
  const search = summary ? recordSearch({ ...asked, from: summary.period.from ?? undefined, to: summary.period.to }) : "";
  return (
    <div className="flex max-w-4xl flex-col gap-4">
      <h1 className="text-3xl font-bold">Records</h1>
      <p className="text-lg">
        The inspection and service record of your gear, as an auditor or insurer asks for it: every check, inspection,
        tag-out and decision, who made it, the verdicts and the measured limits. Dates are {summary ? zoneWords(summary.timeZone) : "on your company's clock"}.
      </p>
      <form method="get" action="/records" className="grid grid-cols-1 gap-x-3 sm:grid-cols-2">
        <Field label="From" name="from" type="date" defaultValue={summary?.period.from ?? raw.from ?? ""} error={errors.from} hint="Leave empty for the year to the end date." />
        <Field label="To" name="to" type="date" defaultValue={summary?.period.to ?? raw.to ?? ""} error={errors.to} />
        <SelectField label="Kind" name="kind" defaultValue={raw.kind ?? ""} error={errors.kind} options={[{ value: "", label: "Every kind" }, ...ITEM_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k] }))]} />
        <SelectField label="Status now" name="status" defaultValue={raw.status ?? ""} error={errors.status} options={STATUS_CHOICES} />
        <Field label="Tag code or serial starts with" name="q" defaultValue={raw.q ?? ""} error={errors.q} autoCapitalize="characters" />
        {raw.itemId && <input type="hidden" name="itemId" value={raw.itemId} />}
        <div className="flex items-start pt-7">
          <button type="submit" className={buttonClass("primary")}>Show the record</button>
        </div>
      </form>
      {errors.itemId && <p role="alert" className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg text-stop">{errors.itemId}</p>}

      {summary && (
        <section aria-labelledby="summary-heading" className="flex flex-col gap-3 rounded-xl border-2 border-ink p-4">
          <h2 id="summary-heading" className="text-xl font-bold">{selectionWords(asked, summary.item?.tagCode)}</h2>
          <p className="text-lg">
            {periodWords(summary.period, writtenDate)}: <strong>{summary.total.toLocaleString("en-US")} {summary.total === 1 ? "entry" : "entries"}</strong>.
          </p>
          {summary.people.length > 0 && (
            <table className="w-full border-collapse text-left text-base">
              <caption className="text-left text-lg font-bold">Who made the entries</caption>
              <thead>
                <tr className="border-b-2 border-ink">
                  <th scope="col" className="py-2 pr-3">Person</th>
                  <th scope="col" className="py-2 pr-3">Periodic inspections</th>
                  <th scope="col" className="py-2 pr-3">Pre-use checks</th>
                </tr>
              </thead>
              <tbody>
                {summary.people.map((p) => (
                  <tr key={p.name ?? "linkyard"} className="border-b border-idle">
                    <td className="py-2 pr-3"><bdi>{p.name ?? "Linkyard (import or system)"}</bdi></td>
                    <td className="py-2 pr-3">{p.inspections}</td>
                    <td className="py-2 pr-3">{p.checks}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
          <div className="flex flex-wrap gap-3">
            {summary.total <= MAX_REPORT_EVENTS ? (
              <a href={`/records/print?${search}`} className={buttonClass("primary")}>Open the printable report</a>
            ) : (
              <p className="text-lg">
                More than {MAX_REPORT_EVENTS.toLocaleString("en-US")} entries: too many for one printed report. Choose a shorter period or fewer items to print; the CSV holds them all.
              </p>
            )}
            <a href={`/api/v1/records?${recordSearch({ ...asked, from: summary.period.from ?? undefined, to: summary.period.to }, { format: "csv" })}`} download className={buttonClass("secondary")}>Download CSV</a>
          </div>
        </section>
      )}
    </div>
  );
}
