"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { buttonClass } from "@/components/ui/button";
import { ChoiceGroup } from "@/components/ui/choice-group";
import { Field } from "@/components/ui/field";
import { ApiError, apiJson } from "@/lib/http/client";
import type { AnchorStatus } from "@/lib/kits/model";

type Action = "tag_out" | "inspection" | "return_to_service" | "retired";

const WORDS: Record<Action, { button: string; field: string; submit: string }> = {
  tag_out: { button: "Take out of use", field: "What is wrong (bent, overloaded, cracked weld…)", submit: "Take it out of use" },
  inspection: { button: "Record an inspection", field: "Note (optional)", submit: "Save the inspection" },
  return_to_service: { button: "Return to use", field: "Why it may be used again", submit: "Return it to use" },
  retired: { button: "Retire", field: "Why it is retired", submit: "Retire it" },
};

/**
 * What can be done to one anchor point, by its standing and the person's role: anyone takes
 * a bent or overloaded point out of use at once; an owner or designated person inspects it or
 * returns it to use; an owner or planner retires it.
 */
export function AnchorActions({ anchorId, label, status, may }: { anchorId: string; label: string; status: AnchorStatus; may: { tagOut: boolean; inspect: boolean; retire: boolean } }) {
  const router = useRouter();
  const [open, setOpen] = useState<Action | null>(null);
  const [text, setText] = useState("");
  const [outcome, setOutcome] = useState<"in_service" | "tag_out" | "retire">("in_service");
  const [nextDue, setNextDue] = useState("");
  const [problem, setProblem] = useState<{ message: string; field?: string } | null>(null);
  const [busy, setBusy] = useState(false);

  const actions: Action[] = [];
  if (status === "in_service" && may.tagOut) actions.push("tag_out");
  if (status !== "retired" && may.inspect) actions.push("inspection");
  if (status === "tagged_out" && may.inspect) actions.push("return_to_service");
  if (status !== "retired" && may.retire) actions.push("retired");
  if (!actions.length) return null;

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    if (!open) return;
    setBusy(true);
    setProblem(null);
    const body =
      open === "inspection"
        ? { type: open, outcome, note: text || null, nextInspectionDue: nextDue || null }
        : open === "tag_out"
          ? { type: open, note: text }
          : { type: open, reason: text };
    try {
      await apiJson(`/api/v1/anchor-points/${anchorId}/events`, { method: "POST", body: JSON.stringify(body) });
      setOpen(null);
      setText("");
      router.refresh();
    } catch (error) {
      setProblem({ message: error instanceof Error ? error.message : "Not saved.", field: error instanceof ApiError ? error.issues[0]?.message : undefined });
    } finally {
      setBusy(false);
    }
  }

  if (!open) {
    return (
      <div className="flex flex-wrap gap-2">
        {actions.map((a) => (
          <button key={a} type="button" className={buttonClass("secondary", "px-3 text-base")} onClick={() => setOpen(a)}>
            {WORDS[a].button}
          </button>
        ))}
      </div>
    );
  }
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2 rounded-lg border-2 border-ink p-2" aria-label={`${WORDS[open].button}: anchor point ${label}`}>
      {open === "inspection" && (
        <>
          <ChoiceGroup
            legend="Outcome"
            name={`outcome-${anchorId}`}
            value={outcome}
            onChange={setOutcome}
            columns={1}
            compact
            options={[
              { value: "in_service", label: "Fit for use" },
              { value: "tag_out", label: "Out of use until repaired" },
              { value: "retire", label: "Retire it" },
            ]}
          />
          {outcome !== "retire" && <Field label="Next inspection due (optional)" name={`due-${anchorId}`} type="date" value={nextDue} onChange={(e) => setNextDue(e.target.value)} hint="Empty: the organisation's interval for rated items" />}
        </>
      )}
      <Field label={WORDS[open].field} name={`text-${anchorId}`} value={text} onChange={(e) => setText(e.target.value)} maxLength={2000} error={problem?.field} />
      {problem && <p role="alert" className="text-lg font-bold text-stop">{problem.message}</p>}
      <div className="flex flex-wrap gap-2">
        <button type="submit" disabled={busy} className={buttonClass(open === "tag_out" || open === "retired" ? "danger" : "primary", "px-3 text-base")}>
          {busy ? "Saving…" : WORDS[open].submit}
        </button>
        <button type="button" className={buttonClass("secondary", "px-3 text-base")} onClick={() => setOpen(null)}>
          Cancel
        </button>
      </div>
    </form>
  );
}
