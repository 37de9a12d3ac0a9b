"use client";
import Link from "next/link";
import { buttonClass } from "@/components/ui/button-class";
import type { BatchJson, ImportBody } from "@/lib/import/answers";
import { ErrorTable, PreviewTable } from "./import-tables";
import { count } from "./words";

/** Step 3: the counts, the problems by line and column, the first rows as stored, and the import itself. */
export function PreviewStep(props: {
  check: ImportBody;
  busy: boolean;
  committing: boolean;
  progress: BatchJson | null;
  onBack: () => void;
  onCommit: (validOnly: boolean) => void;
}) {
  const { check } = props;
  // Rows, not items: a row with a quantity makes several items.
  const valid = check.rows - check.rejected;
  const fatal = check.fatal;
  return (
    <section aria-labelledby="preview-h" className="flex flex-col gap-4">
      <h2 id="preview-h" className="text-xl font-bold">3. Check and import</h2>
      <dl className="grid grid-cols-2 gap-2 md:grid-cols-4">
        <Tile label="New items" value={check.created} />
        <Tile label="Items updated" value={check.updated} />
        <Tile label="Rows with no change" value={check.unchanged} />
        <Tile label="Rows with errors" value={check.rejected} tone={check.rejected ? "stop" : undefined} />
      </dl>

      {check.errorCount > 0 && (
        <div className="flex flex-col gap-2">
          <h3 className="text-lg font-bold text-stop">{count(check.errorCount, "problem")} to fix</h3>
          <ErrorTable errors={check.errors} total={check.errorCount} />
        </div>
      )}

      {check.preview.length > 0 && (
        <div className="flex flex-col gap-2">
          <h3 className="text-lg font-bold">The first rows as they will be stored</h3>
          <PreviewTable rows={check.preview} />
        </div>
      )}

      {props.committing ? (
        <div role="status" className="flex flex-col gap-2 rounded-xl border-2 border-ink p-4">
          <p className="text-lg font-bold">Importing… {props.progress ? `${count(props.progress.rowsProcessed, "row")} read` : ""}</p>
          <progress className="h-4 w-full" max={1} value={props.progress?.progress ?? undefined} aria-label="Import progress" />
          <p className="text-base text-ink-soft">Every row goes in together at the end; leaving this page does not stop the import.</p>
        </div>
      ) : (
        <div className="flex flex-col gap-3">
          {!fatal && check.rejected === 0 && valid > 0 && (
            <button type="button" onClick={() => props.onCommit(false)} disabled={props.busy} className={buttonClass("primary", "self-start")}>
              Import {count(valid, "row")}
            </button>
          )}
          {!fatal && check.rejected > 0 && (
            <>
              <p className="text-lg">
                Fix the rows with errors and upload the file again, or import the {count(valid, "valid row")} now: the {count(check.rejected, "rejected row")} can then be downloaded with their errors, fixed and uploaded on their own.
              </p>
              {valid > 0 && (
                <button type="button" onClick={() => props.onCommit(true)} disabled={props.busy} className={buttonClass("primary", "self-start")}>
                  Import only the {count(valid, "valid row")}
                </button>
              )}
            </>
          )}
          <div className="flex flex-wrap gap-3">
            <button type="button" onClick={props.onBack} disabled={props.busy} className={buttonClass("secondary")}>Back to the columns</button>
            <Link href="/stock" className={buttonClass("secondary")}>Cancel</Link>
          </div>
        </div>
      )}
    </section>
  );
}

function Tile({ label, value, tone }: { label: string; value: number; tone?: "stop" }) {
  return (
    <div className={`flex flex-col rounded-xl border-2 p-3 ${tone === "stop" ? "border-stop bg-stop-bg text-stop" : "border-ink-soft"}`}>
      <dt className="text-base font-bold">{label}</dt>
      <dd className="text-3xl font-bold">{value.toLocaleString("en-US")}</dd>
    </div>
  );
}
