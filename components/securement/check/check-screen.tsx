"use client";
import { useMutation } from "@tanstack/react-query";
import { useMemo, useRef, useState } from "react";
import { ChoiceGroup } from "@/components/ui/choice-group";
import {
  blankDraft,
  exampleDraft,
  newTiedown,
  toRequest,
  type CargoDraft,
  type CheckDraft,
  type DraftWeightUnit,
  type TiedownDraft,
} from "@/lib/forms/securement-draft";
import { ApiError, postCheck } from "../api";
import { CautionNote } from "../caution-note";
import { CargoFields } from "./cargo-fields";
import { CheckProblem } from "./check-problem";
import { CheckResult } from "./check-result";
import { TiedownCard } from "./tiedown-card";

const WLL_UNITS = [
  { value: "lb" as const, label: "lb" },
  { value: "kg" as const, label: "kg" },
];

/** The scratch securement check: the machine, its tiedowns, and the answer of POST /api/v1/securement-checks. */
export function CheckScreen() {
  const [draft, setDraft] = useState<CheckDraft>(exampleDraft);
  const [open, setOpen] = useState<ReadonlySet<string>>(new Set());
  const resultRef = useRef<HTMLDivElement>(null);
  const verdictRef = useRef<HTMLHeadingElement>(null);
  const request = useMemo(() => toRequest(draft), [draft]);

  const mutation = useMutation({
    mutationFn: postCheck,
    onSuccess: () => {
      requestAnimationFrame(() => {
        resultRef.current?.scrollIntoView({ block: "start" });
        verdictRef.current?.focus({ preventScroll: true });
      });
    },
    onError: (error) => {
      if (error instanceof ApiError) {
        // Open the tiedowns the answer names, so their fields show what to fix.
        const named = new Set(error.issues.map((i) => /^tiedowns\.(\d+)/.exec(i.path)?.[1]).filter((x) => x !== undefined).map(Number));
        setOpen((o) => new Set([...o, ...draft.tiedowns.filter((_, i) => named.has(i)).map((t) => t.key)]));
      }
      requestAnimationFrame(() => resultRef.current?.scrollIntoView({ block: "start" }));
    },
  });

  const issues = mutation.error instanceof ApiError ? mutation.error.issues : undefined;
  const stale = mutation.data !== undefined && JSON.stringify(mutation.variables) !== JSON.stringify(request);

  const setCargo = (patch: Partial<CargoDraft>) => setDraft((d) => ({ ...d, cargo: { ...d.cargo, ...patch } }));
  const setTiedown = (i: number, next: TiedownDraft) => setDraft((d) => ({ ...d, tiedowns: d.tiedowns.map((t, j) => (j === i ? next : t)) }));
  const removeTiedown = (i: number) => setDraft((d) => ({ ...d, tiedowns: d.tiedowns.filter((_, j) => j !== i) }));
  const addTiedown = () => {
    const next = newTiedown(draft.tiedowns.length, draft.tiedowns.at(-1));
    setDraft((d) => ({ ...d, tiedowns: [...d.tiedowns, next] }));
    setOpen((o) => new Set([...o, next.key]));
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
    mutation.reset();
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

      <form
        noValidate
        className="flex flex-col gap-5"
        onSubmit={(e) => {
          e.preventDefault();
          mutation.mutate(request);
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
                open={open.has(t.key)}
                onToggle={(isOpen) => toggle(t.key, isOpen)}
                onChange={(next) => setTiedown(i, next)}
                onRemove={() => removeTiedown(i)}
              />
            ))}
          </ul>
          <button type="button" onClick={addTiedown} className="min-h-tap rounded-lg border-2 border-ink bg-white px-4 text-lg font-bold">
            + Add a tiedown
          </button>
        </section>

        <button
          type="submit"
          disabled={mutation.isPending}
          className="inline-flex min-h-16 items-center justify-center rounded-xl border-2 border-ink bg-signal px-5 text-2xl font-bold text-ink disabled:opacity-60"
        >
          {mutation.isPending ? "Checking…" : "Check these tiedowns"}
        </button>
      </form>

      <div ref={resultRef} aria-live="polite" className="flex scroll-mt-20 flex-col gap-4">
        {mutation.error instanceof ApiError && <CheckProblem error={mutation.error} draft={draft} />}
        {mutation.data && <CheckResult result={mutation.data} stale={stale} headingRef={verdictRef} />}
      </div>
      {!mutation.data && <CautionNote />}
    </div>
  );
}
