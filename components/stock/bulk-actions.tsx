"use client";
import { useMutation } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { buttonClass } from "@/components/ui/button-class";
import { apiJson } from "@/lib/http/client";

/** What can be done to the selected rows: print their tags, move them, tag them out. */
export function BulkActions({ selected, yards, canEdit, onDone }: { selected: string[]; yards: { id: string; name: string }[]; canEdit: boolean; onDone: () => void }) {
  const [bulk, setBulk] = useState<"move" | "tag_out" | null>(null);
  const done = () => {
    setBulk(null);
    onDone();
  };
  return (
    <div className="flex flex-col gap-2 rounded-xl border-2 border-ink bg-signal/20 p-3">
      <p className="text-lg font-bold">{selected.length} selected</p>
      <div className="flex flex-wrap gap-2">
        <Link href={`/tags/sheet?ids=${selected.join(",")}`} className={buttonClass("secondary")}>Print tags</Link>
        {canEdit && <button type="button" onClick={() => setBulk("move")} className={buttonClass("secondary")}>Move</button>}
        <button type="button" onClick={() => setBulk("tag_out")} className={buttonClass("danger-outline")}>Tag out</button>
      </div>
      {bulk === "move" && <BulkMove ids={selected} yards={yards} onDone={done} />}
      {bulk === "tag_out" && <BulkTagOut ids={selected} onDone={done} />}
    </div>
  );
}

function BulkMove({ ids, yards, onDone }: { ids: string[]; yards: { id: string; name: string }[]; onDone: () => void }) {
  const [yardId, setYardId] = useState(yards[0]?.id ?? "");
  const move = useMutation({ mutationFn: () => apiJson<{ moved: number }>("/api/v1/items/move", { method: "POST", body: JSON.stringify({ itemIds: ids, yardId }) }), onSuccess: onDone });
  return (
    <div className="flex flex-wrap items-end gap-2">
      <label className="flex flex-col gap-1 text-base font-bold">
        Move to
        <select value={yardId} onChange={(e) => setYardId(e.target.value)} className="min-h-tap rounded-lg border-2 border-ink-soft bg-white px-2 text-lg">
          {yards.map((y) => <option key={y.id} value={y.id}>{y.name}</option>)}
        </select>
      </label>
      <button type="button" disabled={move.isPending} onClick={() => move.mutate()} className={buttonClass("primary")}>Move {ids.length}</button>
      {move.error && <p role="alert" className="font-bold text-stop">{move.error.message}</p>}
    </div>
  );
}

function BulkTagOut({ ids, onDone }: { ids: string[]; onDone: () => void }) {
  const [note, setNote] = useState("");
  const [problems, setProblems] = useState<string[]>([]);
  const tagOut = useMutation({
    mutationFn: async () => {
      const failed: string[] = [];
      for (const id of ids) {
        try {
          await apiJson(`/api/v1/items/${id}/events`, { method: "POST", body: JSON.stringify({ type: "tag_out", note }) });
        } catch (e) {
          failed.push((e as Error).message);
        }
      }
      return failed;
    },
    onSuccess: (failed) => (failed.length ? setProblems(failed) : onDone()),
  });
  return (
    <div className="flex flex-col gap-2">
      <label htmlFor="bulk-note" className="text-base font-bold">What is wrong with them?</label>
      <textarea id="bulk-note" value={note} onChange={(e) => setNote(e.target.value)} rows={2} className="rounded-lg border-2 border-ink-soft p-2 text-lg" />
      <button type="button" disabled={tagOut.isPending || note.trim().length < 3} onClick={() => tagOut.mutate()} className={buttonClass("danger")}>
        Tag out {ids.length}
      </button>
      {problems.length > 0 && <ul role="alert" className="list-disc pl-6 font-bold text-stop">{problems.map((p, i) => <li key={i}>{p}</li>)}</ul>}
    </div>
  );
}
