"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { buttonClass } from "@/components/ui/button-class";
import { apiJson } from "@/lib/http/client";

/** Undo an import, after saying what undo does. */
export function UndoImportButton({ batchId, created, updated }: { batchId: string; created: number; updated: number }) {
  const router = useRouter();
  const [asking, setAsking] = useState(false);
  const undo = useMutation({
    mutationFn: () => apiJson<{ retired: number; restored: number }>(`/api/v1/imports/${batchId}/undo`, { method: "POST" }),
    onSuccess: () => {
      setAsking(false);
      router.refresh();
    },
  });
  if (!asking) {
    return (
      <button type="button" onClick={() => setAsking(true)} className={buttonClass("secondary")}>
        Undo this import
      </button>
    );
  }
  return (
    <div className="flex flex-col gap-2 rounded-xl border-2 border-stop p-3">
      <p className="text-lg">
        {created > 0 && <>The {created.toLocaleString("en-US")} new {created === 1 ? "item is" : "items are"} retired (history is never deleted) and {created === 1 ? "its serial is" : "their serials are"} freed. </>}
        {updated > 0 && <>The {updated.toLocaleString("en-US")} updated {updated === 1 ? "item gets its" : "items get their"} previous details back. </>}
      </p>
      <div className="flex flex-wrap gap-2">
        <button type="button" onClick={() => undo.mutate()} disabled={undo.isPending} className={buttonClass("danger")}>
          {undo.isPending ? "Undoing…" : "Yes, undo it"}
        </button>
        <button type="button" onClick={() => setAsking(false)} className={buttonClass("secondary")}>Keep it</button>
      </div>
      <p aria-live="polite" className="text-base font-bold text-stop">{undo.error?.message}</p>
    </div>
  );
}
