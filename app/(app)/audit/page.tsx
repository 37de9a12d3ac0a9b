import type { Metadata } from "next";
import { buttonClass } from "@/components/ui/button-class";
import { Field, SelectField } from "@/components/ui/field";
import { auditActors, listAudit } from "@/db/audit";
import { AUDIT_KINDS } from "@/lib/audit/actions";
import { auditFilters, auditLine, auditQuerySchema } from "@/lib/audit/query";
import { requirePage } from "@/lib/auth/session";
import { zodIssues } from "@/lib/field-issues";
import { principalClock } from "@/lib/organisations/service";

export const metadata: Metadata = { title: "Audit log" };

type Search = Record<string, string | string[] | undefined>;

const PAGE = 100;

/**
 * Who changed what and when, in words and on the company's clock, newest first: filtered by
 * person, kind of change and period, a page of 100 at a time, and the whole selection as CSV.
 */
export default async function AuditPage({ searchParams }: { searchParams: Promise<Search> }) {
  const principal = await requirePage("audit.view");
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const parsed = auditQuerySchema.safeParse(raw);
  const errors: Record<string, string> = {};
  if (!parsed.success) for (const i of zodIssues(parsed.error)) errors[i.path] = i.message;
  const { timeZone } = await principalClock(principal);
  const asked = parsed.success ? parsed.data : { format: "json" as const };
  const [rows, actors] = await Promise.all([
    parsed.success ? listAudit(principal.organisationId, auditFilters(asked, timeZone), PAGE) : Promise.resolve([]),
    auditActors(principal.organisationId),
  ]);
  const keep = new URLSearchParams();
  for (const k of ["person", "kind", "from", "to"] as const) if (parsed.success && asked[k]) keep.set(k, String(asked[k]));
  const older = rows.length === PAGE ? `/audit?${new URLSearchParams([...keep, ["before", String(rows[rows.length - 1].id)]]).toString()}` : null;
  const csv = `/api/v1/audit?${new URLSearchParams([...keep, ["format", "csv"]]).toString()}`;
  const filtered = keep.size > 0;

  return (
    <div className="flex max-w-5xl flex-col gap-4">
      <h1 className="text-3xl font-bold">Audit log</h1>
      <p className="text-lg">Every change in your company, newest first, 100 at a time. Times are in {timeZone.replaceAll("_", " ")}.</p>
      <form method="get" action="/audit" className="grid grid-cols-1 gap-x-3 sm:grid-cols-2 lg:grid-cols-4">
        <SelectField label="Person" name="person" defaultValue={raw.person ?? ""} error={errors.person} options={[{ value: "", label: "Anyone" }, ...actors.map((a) => ({ value: a.id, label: a.name }))]} />
        <SelectField label="Kind of change" name="kind" defaultValue={raw.kind ?? ""} error={errors.kind} options={[{ value: "", label: "Every kind" }, ...Object.entries(AUDIT_KINDS).map(([value, label]) => ({ value, label }))]} />
        <Field label="From" name="from" type="date" defaultValue={raw.from ?? ""} error={errors.from} />
        <Field label="To" name="to" type="date" defaultValue={raw.to ?? ""} error={errors.to} />
        <div className="flex flex-wrap gap-3 sm:col-span-2 lg:col-span-4">
          <button type="submit" className={buttonClass("primary")}>Show</button>
          {filtered && <a href="/audit" className={buttonClass("secondary")}>Clear the filters</a>}
          <a href={csv} download className={buttonClass("secondary")}>Download CSV{filtered ? " (these filters)" : ""}</a>
        </div>
      </form>
      {parsed.success && rows.length === 0 ? (
        <p className="text-lg">No changes match these filters.</p>
      ) : (
        <table className="w-full border-collapse text-left text-base">
          <caption className="sr-only">Changes, newest first</caption>
          <thead>
            <tr className="border-b-2 border-ink">
              <th scope="col" className="py-2 pr-3">When</th>
              <th scope="col" className="py-2 pr-3">Who</th>
              <th scope="col" className="py-2 pr-3">What</th>
              <th scope="col" className="py-2 pr-3">Concerning</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => {
              const [when, , who, kind, what, concerning] = auditLine(r, timeZone);
              return (
                <tr key={r.id} className="border-b border-idle align-top">
                  {/* Day over time, so that a phone's width holds the four columns. */}
                  <td className="py-2 pr-3">
                    <time dateTime={new Date(r.at).toISOString()}>{when.split(" ").map((part) => <span key={part} className="block whitespace-nowrap">{part}</span>)}</time>
                  </td>
                  <td className="py-2 pr-3"><bdi>{who}</bdi></td>
                  <td className="py-2 pr-3">
                    <span className="font-bold">{what}</span>
                    <span className="block text-sm text-ink-soft">{kind}</span>
                  </td>
                  <td className="py-2 pr-3">
                    {r.entity === "item" && r.entityId && r.label ? (
                      <a href={`/items/${r.entityId}`} className="inline-flex min-h-tap items-center underline"><bdi>{concerning}</bdi></a>
                    ) : (
                      <bdi>{concerning}</bdi>
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
      {older && <a href={older} className={buttonClass("secondary", "self-start")}>Older changes</a>}
    </div>
  );
}
