import type { Metadata } from "next";
import Link from "next/link";
import { UndoImportButton } from "@/components/import/undo-import";
import { buttonClass } from "@/components/ui/button-class";
import { listBatches } from "@/db/imports";
import { requirePage } from "@/lib/auth/session";
import { principalClock } from "@/lib/organisations/service";
import { formatDateTime } from "@/lib/time";
import { undoState } from "@/lib/import/undo";

export const metadata: Metadata = { title: "Import history" };

const n = (v: number) => v.toLocaleString("en-US");

export default async function ImportHistoryPage() {
  const principal = await requirePage("stock.import");
  const [batches, { timeZone }] = await Promise.all([listBatches(principal.organisationId), principalClock(principal)]);
  const when = (d: Date) => formatDateTime(d, timeZone);
  const undo = await Promise.all(batches.map((b) => undoState(principal.organisationId, b)));
  return (
    <div className="flex max-w-5xl flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h1 className="text-3xl font-bold">Import history</h1>
        <Link href="/stock/import" className={buttonClass("primary")}>Import a file</Link>
      </div>
      {batches.length === 0 ? (
        <p className="text-lg">No imports yet.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {batches.map((b, i) => (
            <li key={b.id} className="flex flex-col gap-2 rounded-xl border-2 border-ink-soft p-4">
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <Link href={`/stock/import/${b.id}`} className="text-xl font-bold underline">{b.fileName}</Link>
                <span className={`rounded-md border-2 px-2 text-base font-bold ${b.status === "undone" ? "border-idle bg-idle-bg" : b.status === "running" ? "border-caution bg-caution-bg text-caution" : "border-ok bg-ok-bg text-ok"}`}>
                  {b.status === "undone" ? "Undone" : b.status === "running" ? "Running" : "Imported"}
                </span>
              </div>
              <p className="text-lg">
                {when(b.createdAt)} by {b.createdByName ?? "someone no longer here"}
                {b.undoneAt && <> · undone {when(b.undoneAt)} by {b.undoneByName}</>}
              </p>
              <p className="text-lg">
                <strong>{n(b.created)}</strong> new · <strong>{n(b.updated)}</strong> updated · {n(b.unchanged)} unchanged · <strong className={b.rejected ? "text-stop" : ""}>{n(b.rejected)}</strong> rejected
              </p>
              <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
                {b.fileKey && <a href={`/api/v1/imports/${b.id}/file`} className="flex min-h-tap items-center text-lg font-bold underline">Download the file as uploaded</a>}
                {b.rejectedKey && <a href={`/api/v1/imports/${b.id}/rejected.csv`} className="flex min-h-tap items-center text-lg font-bold underline">Rejected rows (CSV)</a>}
              </div>
              {undo[i].canUndo ? (
                <div><UndoImportButton batchId={b.id} created={b.created} updated={b.updated} /></div>
              ) : (
                b.status === "committed" && undo[i].reason && <p className="text-base text-ink-soft">Undo: {undo[i].reason}</p>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
