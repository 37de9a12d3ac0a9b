"use client";
import { useMutation, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useId, useRef, useState } from "react";
import { buttonClass } from "@/components/ui/button-class";
import { FIELD_LABELS, IMPORT_FIELDS, type ColumnMapping, type ImportField } from "@/lib/import/fields";
import { MAX_IMPORT_BYTES } from "@/lib/import/file-check";
import type { BatchJson, ImportBody } from "@/lib/import/answers";
import { ApiError, apiJson } from "@/lib/http/client";
import { ErrorTable, PreviewTable } from "./import-tables";

type Step = "upload" | "mapping" | "preview";
interface SavedMapping {
  id: string;
  name: string;
  mapping: Record<string, string | null>;
}

/** A random v4 UUID, also where the page is not served over https (crypto.randomUUID needs that). */
function uuid(): string {
  if (typeof crypto.randomUUID === "function") return crypto.randomUUID();
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = (b[6] & 0x0f) | 0x40;
  b[8] = (b[8] & 0x3f) | 0x80;
  const h = [...b].map((x) => x.toString(16).padStart(2, "0")).join("");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

async function postImport(file: File, options: { mapping?: ColumnMapping; dryRun: boolean; validOnly?: boolean; batchId?: string }): Promise<ImportBody> {
  const form = new FormData();
  if (options.mapping) form.append("mapping", JSON.stringify(options.mapping));
  form.append("dryRun", String(options.dryRun));
  if (options.validOnly) form.append("validOnly", "true");
  if (options.batchId) form.append("batchId", options.batchId);
  form.append("file", file); // last, so the small fields are read before the file streams in
  return apiJson<ImportBody>("/api/v1/imports", { method: "POST", body: form });
}

const count = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString("en-US")} ${n === 1 ? one : many}`;
const bytes = (n: number) => (n < 1024 * 1024 ? `${Math.max(1, Math.round(n / 1024))} KB` : `${(n / 1024 / 1024).toFixed(1)} MB`);

/** Upload, columns, check, import: the owner's way of bringing a supplier's list into stock. */
export function ImportWizard({ savedMappings }: { savedMappings: SavedMapping[] }) {
  const router = useRouter();
  const [step, setStep] = useState<Step>("upload");
  const [file, setFile] = useState<File | null>(null);
  const [check, setCheck] = useState<ImportBody | null>(null);
  const [mapping, setMapping] = useState<ColumnMapping>({});
  const [problem, setProblem] = useState<string | null>(null);
  const [mappings, setMappings] = useState(savedMappings);
  const [batchId, setBatchId] = useState<string | null>(null);

  const dryRun = useMutation({
    mutationFn: (args: { file: File; mapping?: ColumnMapping; next: Step }) => postImport(args.file, { mapping: args.mapping, dryRun: true }),
    onMutate: () => setProblem(null),
    onSuccess: (body, args) => {
      setCheck(body);
      setMapping(body.mapping);
      setStep(args.next);
    },
    onError: (e) => setProblem(e.message),
  });

  const commit = useMutation({
    mutationFn: (args: { validOnly: boolean; batchId: string }) => postImport(file!, { mapping, dryRun: false, validOnly: args.validOnly, batchId: args.batchId }),
    onMutate: (args) => {
      setProblem(null);
      setBatchId(args.batchId);
    },
    onSuccess: (body) => router.push(`/stock/import/${body.batchId}`),
    onError: (e) => {
      setBatchId(null);
      setProblem(e.message);
      // a 422 carries the report of the rows that stopped the import
      if (e instanceof ApiError && e.status === 422 && e.body) setCheck(e.body as ImportBody);
    },
  });

  const progress = useQuery({
    queryKey: ["import-progress", batchId],
    enabled: Boolean(batchId) && commit.isPending,
    refetchInterval: 1000,
    retry: false,
    queryFn: (): Promise<BatchJson | null> => apiJson<BatchJson>(`/api/v1/imports/${batchId}`).catch(() => null),
  });

  function choose(f: File | undefined) {
    if (!f) return;
    setCheck(null);
    if (f.size > MAX_IMPORT_BYTES) {
      setFile(null);
      setProblem(`The file is ${bytes(f.size)}; the limit is ${bytes(MAX_IMPORT_BYTES)}. Split it into smaller files.`);
      return;
    }
    setFile(f);
    dryRun.mutate({ file: f, next: "mapping" });
  }

  const busy = dryRun.isPending || commit.isPending;
  return (
    <div className="flex flex-col gap-5">
      <ol aria-label="Steps" className="flex flex-wrap gap-2 text-base">
        {(["upload", "mapping", "preview"] as Step[]).map((s, i) => (
          <li key={s} aria-current={step === s ? "step" : undefined} className={`rounded-full border-2 px-3 py-1 font-bold ${step === s ? "border-ink bg-signal" : "border-idle text-ink-soft"}`}>
            {i + 1}. {s === "upload" ? "File" : s === "mapping" ? "Columns" : "Check and import"}
          </li>
        ))}
      </ol>

      <div aria-live="polite" role="status">
        {problem && <p className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg font-bold text-stop">{problem}</p>}
      </div>

      {step === "upload" && <UploadStep onFile={choose} busy={dryRun.isPending} />}

      {step === "mapping" && check && file && (
        <MappingStep
          check={check}
          file={file}
          mapping={mapping}
          setMapping={setMapping}
          mappings={mappings}
          onSaved={(m) => setMappings((all) => [...all.filter((x) => x.name !== m.name), m].sort((a, b) => a.name.localeCompare(b.name)))}
          busy={busy}
          onCheck={() => dryRun.mutate({ file, mapping, next: "preview" })}
          onRestart={() => {
            setStep("upload");
            setFile(null);
            setCheck(null);
          }}
        />
      )}

      {step === "preview" && check && file && (
        <PreviewStep
          check={check}
          busy={busy}
          committing={commit.isPending}
          progress={progress.data ?? null}
          onBack={() => setStep("mapping")}
          onCommit={(validOnly) => commit.mutate({ validOnly, batchId: uuid() })}
        />
      )}
    </div>
  );
}

function UploadStep({ onFile, busy }: { onFile: (f: File | undefined) => void; busy: boolean }) {
  const [over, setOver] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  const id = useId();
  return (
    <section aria-labelledby={`${id}-h`} className="flex flex-col gap-3">
      <h2 id={`${id}-h`} className="text-xl font-bold">1. Choose the file</h2>
      <label
        htmlFor={`${id}-file`}
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={(e) => {
          e.preventDefault();
          setOver(false);
          onFile(e.dataTransfer.files[0]);
        }}
        className={`flex min-h-48 cursor-pointer flex-col items-center justify-center gap-2 rounded-xl border-4 border-dashed p-6 text-center ${over ? "border-ink bg-signal/30" : "border-ink-soft bg-white"}`}
      >
        {busy ? (
          <span className="text-2xl font-bold">Reading the file…</span>
        ) : (
          <>
            <span className="hidden text-2xl font-bold md:block">Drop the CSV file here</span>
            <span className="hidden text-lg md:block">or</span>
            <span className={buttonClass("primary")}>Choose a CSV file</span>
          </>
        )}
        <span className="text-base text-ink-soft">Comma, semicolon or tab separated; up to 50 MB.</span>
      </label>
      <input
        ref={input}
        id={`${id}-file`}
        type="file"
        aria-label="CSV file"
        accept=".csv,.txt,.tsv,text/csv,text/plain,text/tab-separated-values"
        className="sr-only"
        disabled={busy}
        onChange={(e) => {
          onFile(e.target.files?.[0]);
          e.target.value = "";
        }}
      />
      <p className="text-lg">
        Not sure which columns?{" "}
        <a href="/api/v1/imports/template.csv" className="font-bold underline">Download the template</a> (the columns the import reads, with example rows).
      </p>
    </section>
  );
}

function MappingStep(props: {
  check: ImportBody;
  file: File;
  mapping: ColumnMapping;
  setMapping: (m: ColumnMapping) => void;
  mappings: SavedMapping[];
  onSaved: (m: SavedMapping) => void;
  busy: boolean;
  onCheck: () => void;
  onRestart: () => void;
}) {
  const { check, mapping, setMapping } = props;
  const [name, setName] = useState("");
  const [chosen, setChosen] = useState(props.mappings[0]?.id ?? "");
  const [note, setNote] = useState<{ ok: boolean; text: string } | null>(null);
  const headerErrors = check.fatal ? check.errors.slice(0, 5) : [];
  const save = useMutation({
    mutationFn: () =>
      apiJson<SavedMapping>("/api/v1/imports/mappings", { method: "POST", body: JSON.stringify({ name, mapping }) }).catch((e: unknown) => {
        // the field's own words (e.g. "Enter a name") say more than "Some fields need fixing"
        throw e instanceof ApiError && e.issues[0] ? new Error(e.issues[0].message) : e;
      }),
    onSuccess: (m) => {
      props.onSaved(m);
      setNote({ ok: true, text: `Saved as "${m.name}".` });
    },
    onError: (e) => setNote({ ok: false, text: e.message }),
  });

  function load() {
    const saved = props.mappings.find((m) => m.id === chosen);
    if (!saved) return;
    const next = { ...mapping };
    let used = 0;
    for (const h of check.headers) {
      if (Object.hasOwn(saved.mapping, h)) {
        next[h] = saved.mapping[h] as ImportField | null;
        used++;
      }
    }
    setMapping(next);
    setNote({ ok: true, text: `"${saved.name}" applied to ${count(used, "column")} of this file.` });
  }

  return (
    <section aria-labelledby="mapping-h" className="flex flex-col gap-4">
      <h2 id="mapping-h" className="text-xl font-bold">2. Say what each column holds</h2>
      <p className="text-lg">
        <strong>{props.file.name}</strong> · {count(check.rows, "row")} · columns separated by {check.delimiter === "tab" ? "tabs" : check.delimiter === "semicolon" ? "semicolons" : "commas"} · {check.encoding}
      </p>
      {headerErrors.length > 0 && (
        <ul role="alert" className="flex flex-col gap-1 rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg font-bold text-stop">
          {headerErrors.map((e, i) => <li key={i}>{e.column ? `${e.column}: ` : ""}{e.message}</li>)}
        </ul>
      )}

      <p className="text-lg">Linkyard chose a field for each column it recognised. Change any that is wrong; a column set to “Not imported” is left out.</p>
      <div role="table" aria-label="Columns of the file and what they are read as" className="flex flex-col">
        <div role="row" className="hidden border-b-2 border-ink pb-2 text-base font-bold md:grid md:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_minmax(0,1.3fr)] md:gap-3">
          <span role="columnheader">Column in your file</span>
          <span role="columnheader">First values</span>
          <span role="columnheader">Read as</span>
        </div>
        {check.headers.map((h, i) => {
          const auto = check.autoMapping[h];
          const samples = check.sample.map((r) => r[i]).filter((v) => v !== undefined && v !== "");
          const note = check.setByLinkyard.includes(h)
            ? "Linkyard sets this itself; not imported."
            : check.unknownColumns.includes(h) && !mapping[h]
              ? "No field matches this header."
              : (mapping[h] ?? null) !== (auto ?? null)
                ? "Changed by you."
                : "";
          return (
            <div role="row" key={h} className="grid grid-cols-1 gap-1 border-b border-idle py-3 md:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_minmax(0,1.3fr)] md:gap-3">
              <span role="rowheader" className="text-lg font-bold break-words">{h}</span>
              <span role="cell" className="text-base text-ink-soft break-words">
                <span className="md:hidden">First values: </span>
                {samples.slice(0, 2).join(" · ") || "(empty in the first rows)"}
              </span>
              <span role="cell" className="flex flex-col gap-1">
                <select
                  aria-label={`Read "${h}" as`}
                  value={mapping[h] ?? ""}
                  onChange={(e) => setMapping({ ...mapping, [h]: (e.target.value || null) as ImportField | null })}
                  className={`min-h-tap w-full rounded-lg border-2 bg-white px-2 text-lg ${mapping[h] ? "border-ink" : "border-ink-soft text-ink-soft"}`}
                >
                  <option value="">Not imported</option>
                  {IMPORT_FIELDS.map((f) => <option key={f} value={f}>{FIELD_LABELS[f]}</option>)}
                </select>
                {note && <span className="text-sm text-ink-soft">{note}</span>}
              </span>
            </div>
          );
        })}
      </div>
      {check.unknownColumns.length > 0 && (
        <p className="text-lg">
          <strong>Not imported:</strong> {check.unknownColumns.join(", ")}. Choose a field for a column above if it holds one.
        </p>
      )}

      <div className="grid gap-3 md:grid-cols-2">
        <div className="flex flex-col gap-2 rounded-xl border-2 border-ink-soft p-3">
          <label htmlFor="saved-mapping" className="text-base font-bold">Use a saved mapping</label>
          {props.mappings.length ? (
            <div className="flex flex-wrap gap-2">
              <select id="saved-mapping" value={chosen} onChange={(e) => setChosen(e.target.value)} className="min-h-tap flex-1 rounded-lg border-2 border-ink-soft bg-white px-2 text-lg">
                {props.mappings.map((m) => <option key={m.id} value={m.id}>{m.name}</option>)}
              </select>
              <button type="button" onClick={load} className={buttonClass("secondary")}>Apply</button>
            </div>
          ) : (
            <p className="text-base text-ink-soft">None saved yet. Save this one for the next file from the same supplier.</p>
          )}
        </div>
        <form
          className="flex flex-col gap-2 rounded-xl border-2 border-ink-soft p-3"
          onSubmit={(e) => {
            e.preventDefault();
            save.mutate();
          }}
        >
          <label htmlFor="mapping-name" className="text-base font-bold">Save these columns as</label>
          <div className="flex flex-wrap gap-2">
            <input id="mapping-name" value={name} onChange={(e) => setName(e.target.value)} placeholder="e.g. the supplier's name" className="min-h-tap flex-1 rounded-lg border-2 border-ink-soft px-3 text-lg" />
            <button type="submit" disabled={save.isPending} className={buttonClass("secondary")}>Save</button>
          </div>
        </form>
      </div>
      <p aria-live="polite" className={`min-h-6 text-base font-bold ${note?.ok ? "text-ok" : "text-stop"}`}>{note?.text}</p>

      <div className="flex flex-wrap gap-3">
        <button type="button" onClick={props.onCheck} disabled={props.busy} className={buttonClass("primary")}>
          {props.busy ? "Checking the rows…" : "Check the rows"}
        </button>
        <button type="button" onClick={props.onRestart} disabled={props.busy} className={buttonClass("secondary")}>Choose another file</button>
      </div>
    </section>
  );
}

function PreviewStep(props: {
  check: ImportBody;
  busy: boolean;
  committing: boolean;
  progress: BatchJson | null;
  onBack: () => void;
  onCommit: (validOnly: boolean) => void;
}) {
  const { check } = props;
  const valid = check.created + check.updated + check.unchanged;
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
