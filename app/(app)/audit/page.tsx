import type { Metadata } from "next";
import { listAudit } from "@/db/audit";
import { auditWords } from "@/lib/audit/actions";
import { requirePage } from "@/lib/auth/session";
import { organisationClock } from "@/lib/organisations/service";
import { formatDateTime } from "@/lib/time";

export const metadata: Metadata = { title: "Audit log" };

export default async function AuditPage() {
  const principal = await requirePage("audit.view");
  const [rows, { timeZone }] = await Promise.all([listAudit(principal.organisationId), organisationClock(principal.organisationId)]);
  return (
    <div className="flex max-w-4xl flex-col gap-4">
      <h1 className="text-3xl font-bold">Audit log</h1>
      <p className="text-lg">The latest 100 changes in your company, newest first. Times are in {timeZone.replaceAll("_", " ")}.</p>
      <table className="w-full border-collapse text-left text-base">
        <thead>
          <tr className="border-b-2 border-ink">
            <th className="py-2 pr-3">When</th>
            <th className="py-2 pr-3">Who</th>
            <th className="py-2 pr-3">What</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id} className="border-b border-idle">
              <td className="py-2 pr-3 whitespace-nowrap"><time dateTime={new Date(r.at).toISOString()}>{formatDateTime(r.at, timeZone)}</time></td>
              <td className="py-2 pr-3"><bdi>{r.actorName ?? "system"}</bdi></td>
              <td className="py-2 pr-3">{auditWords(r.action)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
