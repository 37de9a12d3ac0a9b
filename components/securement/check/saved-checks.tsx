"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { formatDateTime } from "@/lib/time";
import { ApiError, deleteSavedCheck, fetchSavedChecks, type SavedCheckLine } from "../api";

export const SAVED_CHECKS_KEY = ["saved-checks"] as const;

/** The organisation's saved checks: open one into the form, print it, or delete it (when allowed). Times on the organisation's clock. */
export function SavedChecks({ openId, onOpen, timeZone }: { openId: string | null; onOpen: (id: string) => void; timeZone: string }) {
  const when = (iso: string) => formatDateTime(iso, timeZone);
  const queryClient = useQueryClient();
  const list = useQuery({ queryKey: SAVED_CHECKS_KEY, queryFn: fetchSavedChecks });
  const [confirming, setConfirming] = useState<string | null>(null);
  const remove = useMutation({
    mutationFn: deleteSavedCheck,
    onSuccess: () => {
      setConfirming(null);
      void queryClient.invalidateQueries({ queryKey: SAVED_CHECKS_KEY });
    },
  });
  const lines: SavedCheckLine[] = list.data ?? [];

  return (
    <details className="group rounded-xl border-2 border-ink bg-white">
      <summary className="flex min-h-tap cursor-pointer items-center gap-3 p-3 text-lg font-bold">
        <span aria-hidden="true" className="group-open:rotate-90">▸</span>
        Saved checks{list.data ? ` (${lines.length})` : ""}
      </summary>
      <div className="flex flex-col gap-2 border-t-2 border-ink-soft p-3" aria-live="polite">
        {list.isPending && <p className="text-lg">Loading…</p>}
        {list.error && <p className="text-lg font-bold text-stop">✕ {list.error.message}</p>}
        {list.data && lines.length === 0 && <p className="text-lg">None yet. Check a load, then save it with a name to open or print it later.</p>}
        {remove.error instanceof ApiError && <p className="text-lg font-bold text-stop">✕ {remove.error.message}</p>}
        <ul className="flex flex-col gap-2">
          {lines.map((c) => (
            <li key={c.id} className={`flex flex-col gap-2 rounded-lg border-2 p-3 ${c.id === openId ? "border-ink" : "border-ink-soft"}`}>
              <div className="flex flex-col">
                <p className="text-lg font-bold">
                  {c.name}
                  {c.id === openId && <span className="font-normal"> · open in the form</span>}
                </p>
                <p className="text-base">
                  {c.passAtSave ? "✓ Met the published minimums when saved" : "✕ Did not meet the published minimums when saved"}
                </p>
                <p className="text-sm text-ink-soft">
                  Saved by {c.savedBy}, {when(c.savedAt)}
                  {c.updatedAt !== c.savedAt ? `; changed by ${c.updatedBy}, ${when(c.updatedAt)}` : ""}
                </p>
              </div>
              <div className="grid grid-cols-3 gap-2">
                <button type="button" onClick={() => onOpen(c.id)} className="min-h-tap rounded-lg border-2 border-ink bg-white px-2 text-base font-bold" aria-label={`Open ${c.name}`}>
                  Open
                </button>
                <Link href={`/checks/${c.id}/print`} className="flex min-h-tap items-center justify-center rounded-lg border-2 border-ink bg-white px-2 text-base font-bold" aria-label={`Print ${c.name}`}>
                  Print
                </Link>
                {c.mayChange &&
                  (confirming === c.id ? (
                    <button
                      type="button"
                      onClick={() => remove.mutate(c.id)}
                      disabled={remove.isPending}
                      className="min-h-tap rounded-lg border-2 border-stop bg-stop px-2 text-base font-bold text-white"
                      aria-label={`Yes, delete ${c.name}`}
                    >
                      Yes, delete
                    </button>
                  ) : (
                    <button type="button" onClick={() => setConfirming(c.id)} className="min-h-tap rounded-lg border-2 border-stop bg-white px-2 text-base font-bold text-stop" aria-label={`Delete ${c.name}`}>
                      Delete
                    </button>
                  ))}
              </div>
            </li>
          ))}
        </ul>
      </div>
    </details>
  );
}
