import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { UndoImportButton } from "@/components/import/undo-import";
import { buttonClass } from "@/components/ui/button-class";
import { createdItems, getBatch } from "@/db/imports";
import { describeItem } from "@/lib/stock/describe";
import { requirePage } from "@/lib/auth/session";
import { principalClock } from "@/lib/organisations/service";
import { formatDateTime } from "@/lib/time";
import { isUuid } from "@/lib/http/ids";
import { undoState } from "@/lib/import/undo";

export const metadata: Metadata = { title: "Import" };

const SHEET = 100; // items per tag sheet link
const MAX_SHEETS = 20;
const n = (v: number) => v.toLocaleString("en-US");

export default async function ImportResultPage({ params }: { params: Promise<{ batchId: string }> }) {
  const principal = await requirePage("stock.import");
  const { batchId } = await params;
  if (!isUuid(batchId)) notFound();
  const batch = await getBatch(principal.organisationId, batchId);
  if (!batch) notFound();
  const [created, undo, { timeZone }] = await Promise.all([
    batch.status === "committed" ? createdItems(principal.organisationId, batchId, SHEET * MAX_SHEETS) : Promise.resolve([]),
    undoState(principal.organisationId, batch),
    principalClock(principal),
  ]);
  const ids = created.map((i) => i.id);
  const sheets: string[][] = [];
  for (let i = 0; i < ids.length; i += SHEET) sheets.push(ids.slice(i, i + SHEET));

  return (
    <div className="flex max-w-3xl flex-col gap-5">
      <header className="flex flex-col gap-1">
        <h1 className="text-3xl font-bold">{batch.status === "undone" ? "Import undone" : batch.status === "running" ? "Import running" : "Import done"}</h1>
        <p className="text-lg">
          <strong>{batch.fileName}</strong> · {formatDateTime(batch.createdAt, timeZone)} by {batch.createdByName}
        </p>
      </header>

      <dl className="grid grid-cols-2 gap-2 md:grid-cols-4">
        {[
          ["New items", batch.created],
          ["Items updated", batch.updated],
          ["Rows with no change", batch.unchanged],
          ["Rows rejected", batch.rejected],
        ].map(([label, value]) => (
          <div key={label} className={`flex flex-col rounded-xl border-2 p-3 ${label === "Rows rejected" && Number(value) > 0 ? "border-stop bg-stop-bg text-stop" : "border-ink-soft"}`}>
            <dt className="text-base font-bold">{label}</dt>
            <dd className="text-3xl font-bold">{n(Number(value))}</dd>
          </div>
        ))}
      </dl>

      {sheets.length > 0 && (
        <section aria-labelledby="tags-h" className="flex flex-col gap-2 rounded-xl border-2 border-ink p-4">
          <h2 id="tags-h" className="text-xl font-bold">Tags for the new items</h2>
          <p className="text-lg">Print the tags now and fix them to the gear before it goes out.</p>
          <div className="flex flex-wrap gap-2">
            {sheets.length === 1 ? (
              <Link href={`/tags/sheet?ids=${sheets[0].join(",")}`} className={buttonClass("primary")}>{`Print ${n(ids.length)} tags`}</Link>
            ) : (
              sheets.map((s, i) => (
                <Link key={i} href={`/tags/sheet?ids=${s.join(",")}`} className={buttonClass(i === 0 ? "primary" : "secondary")}>
                  {`Tags ${n(i * SHEET + 1)}–${n(i * SHEET + s.length)}`}
                </Link>
              ))
            )}
          </div>
          {batch.created > ids.length && <p className="text-base text-ink-soft">The first {n(ids.length)} of {n(batch.created)} are linked here; select the rest on the stock page to print them.</p>}
          <details className="rounded-lg border-2 border-ink-soft px-3" open={created.length <= 30}>
            <summary className="flex min-h-tap cursor-pointer items-center text-lg font-bold">The new tag codes ({n(created.length)})</summary>
            <ul className="grid grid-cols-1 gap-1 pb-3 sm:grid-cols-2" data-testid="new-tag-codes">
              {created.map((i) => (
                <li key={i.id}>
                  <Link href={`/items/${i.id}`} className="flex min-h-tap flex-wrap items-center gap-x-3 rounded-md px-1 text-base hover:bg-signal/40">
                    <span className="whitespace-nowrap font-mono text-lg font-bold underline">{i.tagCode}</span>
                    <span>{describeItem(i)}{i.serial && <span className="text-ink-soft"> · {i.serial}</span>}</span>
                  </Link>
                </li>
              ))}
            </ul>
          </details>
        </section>
      )}

      {batch.rejectedKey && (
        <section aria-labelledby="rejected-h" className="flex flex-col gap-2 rounded-xl border-2 border-stop p-4">
          <h2 id="rejected-h" className="text-xl font-bold">Rejected rows</h2>
          <p className="text-lg">The {n(batch.rejected)} rows that were left out, with your columns and an <code>error</code> column. Fix them and upload that file.</p>
          <a href={`/api/v1/imports/${batch.id}/rejected.csv`} className={buttonClass("secondary", "self-start")}>Download the rejected rows</a>
        </section>
      )}

      <div className="flex flex-wrap gap-3">
        <Link href="/stock/import/history" className={buttonClass("secondary")}>Import history</Link>
        <Link href="/stock" className={buttonClass("secondary")}>Stock</Link>
        <Link href="/stock/import" className={buttonClass("secondary")}>Import another file</Link>
      </div>

      <section aria-labelledby="undo-h" className="flex flex-col gap-2">
        <h2 id="undo-h" className="text-xl font-bold">Undo</h2>
        {undo.canUndo ? (
          <>
            <p className="text-lg">Possible until any of these items is checked, moved, tagged out or changed.</p>
            <div><UndoImportButton batchId={batch.id} created={batch.created} updated={batch.updated} /></div>
          </>
        ) : (
          <p className="text-lg">{undo.reason}</p>
        )}
      </section>
    </div>
  );
}
