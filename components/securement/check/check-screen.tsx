"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useEffect, useMemo, useRef, useState } from "react";
import { ChoiceGroup } from "@/components/ui/choice-group";
import type { FieldIssue } from "@/lib/field-issues";
import type { SavedCheckAnswer, SecurementCheckResult } from "@/lib/securement";
import {
  blankDraft,
  copiesOf,
  exampleDraft,
  fieldMarks,
  fromRequest,
  newTiedown,
  toRequest,
  type CargoDraft,
  type CheckDraft,
  type DraftWeightUnit,
  type TiedownDraft,
} from "@/lib/forms/securement-draft";
import { ApiError, fetchSavedCheck, postCheck, saveCheck } from "../api";
import { CautionNote } from "../caution-note";
import { CargoFields } from "./cargo-fields";
import { CheckProblem } from "./check-problem";
import { CheckResult } from "./check-result";
import { SaveCheck, type OpenCheck } from "./save-check";
import { SAVED_CHECKS_KEY, SavedChecks } from "./saved-checks";
import { TiedownCard } from "./tiedown-card";

const WLL_UNITS = [
  { value: "lb" as const, label: "lb" },
  { value: "kg" as const, label: "kg" },
];

/** The answer on screen and the request it answers (to tell when the entries changed since). */
interface Shown {
  requestJson: string;
  result: SecurementCheckResult;
}

/** A refusal of the API about the request, with paths into the request (a save's paths start with "request."). */
function requestIssues(error: unknown): FieldIssue[] | undefined {
  if (!(error instanceof ApiError)) return undefined;
  return error.issues.map((i) => (i.path.startsWith("request.") ? { ...i, path: i.path.slice("request.".length) } : i));
}

/**
 * The load check: the machine, its tiedowns, the answer of POST /api/v1/securement-checks,
 * and the checks saved by name. `openId` opens a saved check when the screen loads.
 */
export function CheckScreen({ openId, timeZone }: { openId?: string; timeZone: string }) {
  const queryClient = useQueryClient();
  const [draft, setDraft] = useState<CheckDraft>(exampleDraft);
  const [open, setOpen] = useState<ReadonlySet<string>>(new Set());
  const [shown, setShown] = useState<Shown | null>(null);
  const [saved, setSaved] = useState<OpenCheck | null>(null);
  const [notes, setNotes] = useState<string[]>([]);
  const [saveStatus, setSaveStatus] = useState<string>();
  const resultRef = useRef<HTMLDivElement>(null);
  const verdictRef = useRef<HTMLHeadingElement>(null);
  const request = useMemo(() => toRequest(draft), [draft]);
  const requestJson = JSON.stringify(request);

  const showResult = () =>
    requestAnimationFrame(() => {
      resultRef.current?.scrollIntoView({ block: "start" });
      verdictRef.current?.focus({ preventScroll: true });
    });

  /** Opens the tiedowns an answer names, so their fields show what to fix. */
  const openNamed = (paths: readonly string[]) => {
    const named = new Set(paths.map((p) => /^tiedowns\.(\d+)/.exec(p)?.[1]).filter((x) => x !== undefined).map(Number));
    setOpen((o) => new Set([...o, ...draft.tiedowns.filter((_, i) => named.has(i)).map((t) => t.key)]));
  };

  const check = useMutation({
    mutationFn: postCheck,
    onSuccess: (result, variables) => {
      setShown({ requestJson: JSON.stringify(variables), result });
      showResult();
    },
    onError: (error) => {
      if (error instanceof ApiError) openNamed(error.issues.map((i) => i.path));
      requestAnimationFrame(() => resultRef.current?.scrollIntoView({ block: "start" }));
    },
  });

  const load = (answer: SavedCheckAnswer) => {
    const back = fromRequest(answer.request);
    setDraft(back.draft);
    setNotes(back.notes);
    setOpen(new Set());
    setSaved({ id: answer.id, name: answer.name, mayChange: answer.mayChange });
    setShown(answer.result ? { requestJson: JSON.stringify(toRequest(back.draft)), result: answer.result } : null);
    check.reset();
    window.history.replaceState(null, "", `/check?saved=${answer.id}`);
  };

  const opening = useMutation({ mutationFn: fetchSavedCheck, onSuccess: (answer) => { load(answer); showResult(); } });
  const saving = useMutation({
    mutationFn: saveCheck,
    onSuccess: (answer, input) => {
      setSaved({ id: answer.id, name: answer.name, mayChange: answer.mayChange });
      if (answer.result) setShown({ requestJson: JSON.stringify(input.request), result: answer.result });
      setSaveStatus(`Saved as “${answer.name}”.`);
      window.history.replaceState(null, "", `/check?saved=${answer.id}`);
      void queryClient.invalidateQueries({ queryKey: SAVED_CHECKS_KEY });
    },
    onError: (error) => {
      setSaveStatus(undefined);
      if (error instanceof ApiError) openNamed(requestIssues(error)!.map((i) => i.path));
    },
  });

  const openOnLoad = useRef(openId);
  useEffect(() => {
    if (openOnLoad.current) opening.mutate(openOnLoad.current);
    openOnLoad.current = undefined; // once, when the screen loads
  }, [opening]);

  const problem = check.error ?? (saving.error instanceof ApiError && saving.error.issues.some((i) => i.path !== "name") ? saving.error : null);
  const issues = requestIssues(problem);
  const stale = shown !== null && shown.requestJson !== requestJson;
  // The fields the last check found empty, marked in the form while the answer is current.
  const marks = shown && !stale ? fieldMarks(shown.result.findings) : undefined;
  const nameError = saving.error instanceof ApiError ? (saving.error.issues.find((i) => i.path === "name")?.message ?? (saving.error.issues.length ? undefined : saving.error.message)) : undefined;

  const setCargo = (patch: Partial<CargoDraft>) => setDraft((d) => ({ ...d, cargo: { ...d.cargo, ...patch } }));
  const setTiedown = (i: number, next: TiedownDraft) => setDraft((d) => ({ ...d, tiedowns: d.tiedowns.map((t, j) => (j === i ? next : t)) }));
  const removeTiedown = (i: number) => setDraft((d) => ({ ...d, tiedowns: d.tiedowns.filter((_, j) => j !== i) }));
  const addTiedown = () => {
    const next = newTiedown(draft.tiedowns.length, draft.tiedowns.at(-1));
    setDraft((d) => ({ ...d, tiedowns: [...d.tiedowns, next] }));
    setOpen((o) => new Set([...o, next.key]));
  };
  const addCopies = (i: number, count: number) => {
    const copies = copiesOf(draft.tiedowns[i]!, count, draft.tiedowns.length);
    setDraft((d) => ({ ...d, tiedowns: [...d.tiedowns, ...copies] }));
  };
  const toggle = (key: string, isOpen: boolean) =>
    setOpen((o) => {
      if (o.has(key) === isOpen) return o;
      const n = new Set(o);
      if (isOpen) n.add(key);
      else n.delete(key);
      return n;
    });
  const start = (next: CheckDraft) => {
    setDraft(next);
    setOpen(new Set(next.tiedowns.length === 1 ? [next.tiedowns[0]!.key] : []));
    setShown(null);
    setSaved(null);
    setNotes([]);
    setSaveStatus(undefined);
    check.reset();
    saving.reset();
    window.history.replaceState(null, "", "/check");
  };

  return (
    <div className="flex flex-col gap-5">
      <div className="grid grid-cols-2 gap-2">
        <button type="button" onClick={() => start(exampleDraft())} className="min-h-tap rounded-lg border-2 border-ink bg-white px-3 text-lg font-bold">
          Load the example
        </button>
        <button type="button" onClick={() => start(blankDraft())} className="min-h-tap rounded-lg border-2 border-ink bg-white px-3 text-lg font-bold">
          Start empty
        </button>
      </div>

      <SavedChecks openId={saved?.id ?? null} onOpen={(id) => opening.mutate(id)} timeZone={timeZone} />
      {opening.error && (
        <p role="alert" className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg font-bold text-stop">
          ✕ {opening.error.message}
        </p>
      )}
      {notes.length > 0 && (
        <div className="rounded-lg border-2 border-caution bg-caution-bg p-3 text-base text-ink">
          <p className="font-bold">The form shows this saved check with these changes:</p>
          <ul className="list-disc pl-5">
            {notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </div>
      )}

      <form
        noValidate
        className="flex flex-col gap-5"
        onSubmit={(e) => {
          e.preventDefault();
          check.mutate(request);
        }}
      >
        <CargoFields cargo={draft.cargo} onChange={setCargo} issues={issues} />

        <section aria-labelledby="tiedowns-heading" className="flex flex-col gap-3">
          <h2 id="tiedowns-heading" className="text-xl font-bold">
            Tiedowns ({draft.tiedowns.length})
          </h2>
          <ChoiceGroup<DraftWeightUnit>
            legend="WLLs typed in"
            name="wll-unit"
            value={draft.wllUnit}
            options={WLL_UNITS}
            onChange={(wllUnit) => setDraft((d) => ({ ...d, wllUnit }))}
            columns={2}
            compact
          />
          {draft.tiedowns.length === 0 && <p className="text-lg">No tiedowns yet.</p>}
          <ul className="flex flex-col gap-2">
            {draft.tiedowns.map((t, i) => (
              <TiedownCard
                key={t.key}
                tiedown={t}
                index={i}
                unit={draft.wllUnit}
                accessories={draft.cargo.accessories}
                issues={issues}
                marks={marks}
                open={open.has(t.key)}
                onToggle={(isOpen) => toggle(t.key, isOpen)}
                onChange={(next) => setTiedown(i, next)}
                onRemove={() => removeTiedown(i)}
                onCopy={(count) => addCopies(i, count)}
              />
            ))}
          </ul>
          <button type="button" onClick={addTiedown} className="min-h-tap rounded-lg border-2 border-ink bg-white px-4 text-lg font-bold">
            + Add a tiedown
          </button>
        </section>

        <button
          type="submit"
          disabled={check.isPending}
          className="inline-flex min-h-16 items-center justify-center rounded-xl border-2 border-ink bg-signal px-5 text-2xl font-bold text-ink disabled:opacity-60"
        >
          {check.isPending ? "Checking…" : "Check these tiedowns"}
        </button>
      </form>

      <div ref={resultRef} aria-live="polite" className="flex scroll-mt-20 flex-col gap-4">
        {problem instanceof ApiError && <CheckProblem error={problem} draft={draft} issues={issues} />}
        {shown && <CheckResult result={shown.result} stale={stale} headingRef={verdictRef} />}
      </div>
      {!shown && <CautionNote />}

      <SaveCheck
        open={saved}
        pending={saving.isPending}
        error={nameError}
        status={saveStatus}
        onSave={(input) => {
          setSaveStatus(undefined);
          saving.mutate({ ...input, request });
        }}
      />
    </div>
  );
}
