"use client";
import Link from "next/link";
import { useState } from "react";
import { buttonClass } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { addDays } from "@/lib/time";
import type { KitJson } from "@/lib/kits/answers";
import { refusal } from "./item-picker";
import { apiJson, useKit, useKitChange } from "./use-kit";

/**
 * What can happen to the kit next, by state and role: mark it ready (only when it passes),
 * back to draft, load or return it by scanning, copy it to another date.
 */
export function KitActions({ kitId, canEdit, canLoad }: { kitId: string; canEdit: boolean; canLoad: boolean }) {
  const { data: kit } = useKit(kitId);
  const move = useKitChange(kitId, (to: "ready" | "draft") => apiJson<KitJson>(`/api/v1/kits/${kitId}/transitions`, { method: "POST", body: JSON.stringify({ to }) }));
  if (!kit) return null;
  return (
    <section aria-labelledby="next-heading" className="flex flex-col gap-3 print:hidden">
      <h2 id="next-heading" className="text-2xl font-bold">Next</h2>
      {kit.state === "draft" && canEdit && (
        <>
          <button type="button" onClick={() => move.mutate("ready")} disabled={!kit.pass || move.isPending} className={buttonClass("primary", "min-h-16 w-full text-xl")}>
            Mark ready to load
          </button>
          {!kit.pass && <p className="text-lg">A kit is marked ready once it passes the check and every part may be used on {kit.date}.</p>}
        </>
      )}
      {kit.state === "ready" && canLoad && (
        <Link href={`/kits/${kitId}/load`} className={buttonClass("primary", "min-h-16 w-full text-xl")}>
          Load: scan each item onto the trailer
        </Link>
      )}
      {kit.state === "ready" && canEdit && (
        <button type="button" onClick={() => move.mutate("draft")} disabled={move.isPending} className={buttonClass("secondary", "w-full")}>
          Back to draft to change it
        </button>
      )}
      {kit.state === "loaded" && canLoad && (
        <Link href={`/kits/${kitId}/load`} className={buttonClass("primary", "min-h-16 w-full text-xl")}>
          Return: scan what came back
        </Link>
      )}
      {kit.state === "returned" && <p className="text-lg">This kit is back in the yard. Copy it to plan the next trip.</p>}
      {move.isError && (
        <p role="alert" className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg font-bold text-stop">
          {refusal(move.error)}
        </p>
      )}
      {canEdit && <CopyKitForm kit={kit} />}
    </section>
  );
}

interface CopyAnswer {
  kit: KitJson;
  leftOut: { itemId: string; tagCode: string; description: string; tiedownLabel: string; code: string; message: string }[];
}

/** A copy for another date: a draft, with the items that cannot come along listed and why. */
export function CopyKitForm({ kit, defaultDate }: { kit: Pick<KitJson, "id" | "date" | "job">; defaultDate?: string }) {
  const [date, setDate] = useState(defaultDate ?? addDays(kit.date, 1));
  const [answer, setAnswer] = useState<CopyAnswer | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    setBusy(true);
    setProblem(null);
    try {
      setAnswer(await apiJson<CopyAnswer>(`/api/v1/kits/${kit.id}/copies`, { method: "POST", body: JSON.stringify({ date }) }));
    } catch (error) {
      setProblem(refusal(error));
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2 rounded-xl border-2 border-ink-soft p-3" aria-label={`Copy the kit for ${kit.job} to another date`}>
      <Field label="Copy this kit to" name={`copy-date-${kit.id}`} type="date" value={date} onChange={(e) => setDate(e.target.value)} error={problem ?? undefined} />
      <button type="submit" disabled={busy || !date} className={buttonClass("secondary", "w-full")}>
        {busy ? "Copying…" : "Copy as a draft"}
      </button>
      <div role="status" aria-live="polite">
        {answer && (
          <div className="flex flex-col gap-1 rounded-lg border-2 border-ok bg-ok-bg p-2 text-lg">
            <p className="font-bold">Copied to {answer.kit.date}.</p>
            {answer.leftOut.length === 0 ? (
              <p>Every item came along.</p>
            ) : (
              <>
                <p>Left out, to replace:</p>
                <ul className="list-disc pl-6">
                  {answer.leftOut.map((l) => (
                    <li key={l.itemId}>
                      <span className="font-mono font-bold">{l.tagCode}</span> ({l.tiedownLabel}): {l.message}
                    </li>
                  ))}
                </ul>
              </>
            )}
            <Link href={`/kits/${answer.kit.id}`} className="flex min-h-tap items-center font-bold underline">
              Open the copy
            </Link>
          </div>
        )}
      </div>
    </form>
  );
}
