"use client";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { buttonClass } from "@/components/ui/button-class";
import type { ImportBody } from "@/lib/import/answers";
import { FIELD_LABELS, IMPORT_FIELDS, type ColumnMapping, type ImportField } from "@/lib/import/fields";
import { ApiError, apiJson } from "@/lib/http/client";
import type { SavedMapping } from "./use-import";
import { count } from "./words";

/** Step 2: what each column of the file holds, with saved mappings to reuse. */
export function MappingStep(props: {
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
