"use client";
import { useState } from "react";
import { buttonClass } from "@/components/ui/button";
import type { KitJson } from "@/lib/kits/answers";
import { writtenDate } from "@/lib/time";
import { formatCheckWeight, formatWeight, type UnitSystem } from "@/lib/kits/display";
import type { ProposalAnswer as ProposalAnswerJson } from "@/lib/kits/kit-service";
import { strapsAllowed } from "@/lib/kits/proposal";
import { refusal } from "./item-picker";
import { apiJson, useKit, useKitChange } from "./use-kit";

/**
 * "Propose a kit": asks the server for a kit made of the gear free and usable on the kit's
 * date (POST /api/v1/kits/{id}/proposal), shows it with its verdict, what is missing and the
 * choices made, and on confirmation saves it in place of the draft's tiedowns (`?apply=true`).
 * The server works the proposal out again when it saves, from the stock as it then stands.
 */
export function ProposalPanel({ kitId, units }: { kitId: string; units: UnitSystem }) {
  const { data: kit } = useKit(kitId);
  const [proposal, setProposal] = useState<ProposalAnswerJson | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [asking, setAsking] = useState(false);
  const [applied, setApplied] = useState(false);
  const apply = useKitChange(kitId, () => apiJson<ProposalAnswerJson & { kit: KitJson }>(`/api/v1/kits/${kitId}/proposal?apply=true`, { method: "POST" }));
  if (!kit || kit.state !== "draft") return null;

  async function ask() {
    setAsking(true);
    setProblem(null);
    setApplied(false);
    try {
      setProposal(await apiJson<ProposalAnswerJson>(`/api/v1/kits/${kitId}/proposal`, { method: "POST" }));
    } catch (error) {
      setProblem(refusal(error));
    } finally {
      setAsking(false);
    }
  }

  async function use() {
    if (!kit) return;
    if (kit.tiedowns.length > 0 && !window.confirm(`Replace the ${kit.tiedowns.length} tiedown${kit.tiedowns.length === 1 ? "" : "s"} of this draft with the proposal? Their items are free again for ${kit.date}.`)) return;
    setProblem(null);
    try {
      const answer = await apply.mutateAsync(undefined);
      setProposal(answer);
      setApplied(true);
    } catch (error) {
      setProblem(refusal(error));
    }
  }

  const anchorLabel = (id: string) => kit.trailer.anchorPoints.find((a) => a.id === id)?.label ?? "?";
  const item = (id: string) => proposal?.items.find((i) => i.id === id);
  const c = proposal?.check;
  return (
    <section aria-labelledby="proposal-heading" className="flex flex-col gap-3 rounded-xl border-2 border-deck p-3 print:hidden" data-testid="proposal">
      <h2 id="proposal-heading" className="text-2xl font-bold">
        Propose a kit
      </h2>
      <p className="text-lg">
        Linkyard picks anchor points and the fewest, lightest {strapsAllowed(kit.machine.class) ? "chains, binders and web straps" : "chains and binders"} free and usable on {writtenDate(kit.date)} that pass the check. Nothing is saved until you use it.
      </p>
      <button type="button" onClick={() => void ask()} disabled={asking || apply.isPending} className={buttonClass(proposal ? "secondary" : "primary", "w-full")}>
        {asking ? "Working it out…" : proposal ? "Propose again" : "Propose a kit"}
      </button>

      <div role="status" aria-live="polite" className="flex flex-col gap-3">
        {proposal && c && (
          <>
            <p className={`flex items-center gap-2 text-xl font-bold ${proposal.pass ? "text-ok" : "text-stop"}`} data-testid="proposal-verdict" data-pass={proposal.pass}>
              <span aria-hidden="true">{proposal.pass ? "✓" : "✕"}</span>
              {applied ? "Saved: the kit now holds this proposal." : proposal.pass ? "This proposal passes the check" : "No proposal passes with the gear free that day"}
            </p>
            <p className="text-lg">
              Aggregate WLL {formatCheckWeight(c.aggregateWllLb, c.aggregateWllKg, units)} of {formatCheckWeight(c.requiredAggregateWllLb, c.requiredAggregateWllKg, units)} needed; {c.tiedownsCounted} tiedown
              {c.tiedownsCounted === 1 ? "" : "s"} on the machine, {c.minimumTiedowns} needed ({c.ruleSource}).
            </p>
            {proposal.tiedowns.length > 0 && (
              <ol className="flex flex-col gap-2" aria-label="Proposed tiedowns">
                {proposal.tiedowns.map((t, i) => (
                  <li key={`${t.label}-${i}`} className="rounded-lg border-2 border-ink-soft p-2 text-lg">
                    <p className="font-bold">
                      {i + 1}. {t.label}: anchor point {anchorLabel(t.anchorPointId)}
                      {t.secures !== "machine" ? `, holds the ${t.secures}` : ""}
                    </p>
                    <ul className="text-base">
                      {t.itemIds.map((id) => {
                        const it = item(id);
                        return (
                          <li key={id}>
                            <span className="font-mono font-bold">{it?.tagCode ?? id}</span> {it?.description}
                            {it?.wllLb != null && ` · WLL ${formatWeight(it.wllLb, units)}`}
                          </li>
                        );
                      })}
                    </ul>
                  </li>
                ))}
              </ol>
            )}
            {proposal.missing.length > 0 && (
              <div className="flex flex-col gap-1 rounded-lg border-2 border-stop bg-stop-bg p-2" data-testid="proposal-missing">
                <p className="text-lg font-bold text-stop">What is missing</p>
                <ul className="flex flex-col gap-1 text-lg">
                  {proposal.missing.map((m) => (
                    <li key={m} className="flex gap-2">
                      <span aria-hidden="true" className="font-bold text-stop">✕</span>
                      <span>{m}</span>
                    </li>
                  ))}
                </ul>
              </div>
            )}
            {proposal.notes.length > 0 && (
              <ul className="flex flex-col gap-1 text-base" aria-label="Notes on the proposal">
                {proposal.notes.map((n) => (
                  <li key={n} className="flex gap-2">
                    <span aria-hidden="true" className="font-bold">•</span>
                    <span>{n}</span>
                  </li>
                ))}
              </ul>
            )}
            {proposal.pass && !applied && (
              <button type="button" onClick={() => void use()} disabled={apply.isPending} className={buttonClass("primary", "w-full")}>
                {apply.isPending ? "Saving…" : kit.tiedowns.length ? `Use this proposal: replace the ${kit.tiedowns.length} tiedowns` : "Use this proposal"}
              </button>
            )}
          </>
        )}
        {problem && (
          <p role="alert" className="rounded-lg border-2 border-stop bg-stop-bg p-2 text-lg font-bold text-stop">
            {problem}
          </p>
        )}
      </div>
    </section>
  );
}
