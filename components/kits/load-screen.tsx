"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useCallback, useState } from "react";
import { buttonClass } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { ApiError, apiJson } from "@/lib/http/client";
import type { KitJson } from "@/lib/kits/answers";
import type { ItemJson } from "@/lib/stock/item-json";
import { TagScanner, type ScanNote } from "./tag-scanner";

type Mode = "load" | "return";

/**
 * The yard hand's screen: scan every item of the kit as it goes on the trailer (loading) or
 * comes back (returning). It shows what is expected against what was scanned; an item that
 * is not in the kit is flagged at once. On return, an item can be reported damaged (it is
 * tagged out) or not back (marked lost). The server checks the scan again and says what
 * does not match; the kit's state changes only when it does.
 */
export function LoadScreen({ kit }: { kit: KitJson }) {
  const router = useRouter();
  const mode: Mode | null = kit.state === "ready" ? "load" : kit.state === "loaded" ? "return" : null;
  const expected = kit.tiedowns.flatMap((t) => t.items.map((i) => ({ ...i, tiedown: t.label })));
  const [scanned, setScanned] = useState<Set<string>>(new Set());
  const [strangers, setStrangers] = useState<ItemJson[]>([]);
  const [damaged, setDamaged] = useState<Record<string, string>>({});
  const [lost, setLost] = useState<Record<string, string>>({});
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const onItem = useCallback(
    async (item: ItemJson): Promise<ScanNote> => {
      const mine = expected.find((i) => i.id === item.id);
      if (!mine) {
        setStrangers((s) => (s.some((x) => x.id === item.id) ? s : [...s, item]));
        return { tone: "stop", text: `✕ ${item.tagCode} is not in this kit: ${mode === "load" ? "leave it off the trailer" : "put it back where it belongs"}.` };
      }
      const count = scanned.has(item.id) ? scanned.size : scanned.size + 1;
      setScanned((s) => new Set(s).add(item.id));
      setLost((l) => {
        const { [item.id]: _gone, ...rest } = l;
        return rest;
      });
      return scanned.has(item.id)
        ? { tone: "info", text: `${item.tagCode} is already scanned.` }
        : { tone: "ok", text: `✓ ${item.tagCode} (${mine.tiedown}) ${mode === "load" ? "on" : "back"}: ${count} of ${expected.length}.` };
    },
    [expected, mode, scanned],
  );

  if (!mode) {
    return (
      <p className="text-lg">
        This kit is {kit.stateLabel.toLowerCase()}: {kit.state === "draft" ? "it is loaded once a planner marks it ready." : "it is back in the yard."}{" "}
        <Link href={`/kits/${kit.id}`} className="font-bold underline">Open the kit</Link>
      </p>
    );
  }

  async function submit() {
    setBusy(true);
    setProblem(null);
    try {
      await apiJson<KitJson>(`/api/v1/kits/${kit.id}/transitions`, {
        method: "POST",
        body: JSON.stringify({
          to: mode === "load" ? "loaded" : "returned",
          scannedItemIds: [...scanned, ...strangers.map((s) => s.id)],
          ...(mode === "return" && {
            damaged: Object.entries(damaged).map(([itemId, note]) => ({ itemId, note })),
            lost: Object.entries(lost).map(([itemId, note]) => ({ itemId, note })),
          }),
        }),
      });
      router.push(`/kits/${kit.id}`);
      router.refresh();
    } catch (error) {
      setBusy(false);
      // The server's sentence names what does not match (by tag code) and says the state stays.
      setProblem(error instanceof ApiError || error instanceof Error ? error.message : "Not saved. Try again.");
    }
  }

  const left = expected.filter((i) => !scanned.has(i.id) && !(i.id in lost));
  const noteProblem = Object.entries({ ...damaged, ...lost }).find(([, note]) => note.trim().length < 3);

  return (
    <div className="flex flex-col gap-5">
      <p className="text-2xl font-bold" data-testid="scan-count" aria-live="polite">
        {scanned.size} of {expected.length} scanned{mode === "return" && Object.keys(lost).length > 0 ? `, ${Object.keys(lost).length} not back` : ""}
      </p>
      <TagScanner onItem={onItem} submitLabel={mode === "load" ? "This one is on" : "This one is back"} />

      {strangers.length > 0 && (
        <section aria-labelledby="strangers-heading" className="flex flex-col gap-2 rounded-xl border-4 border-stop bg-stop-bg p-3">
          <h2 id="strangers-heading" className="text-xl font-bold text-stop">✕ Scanned, not in this kit ({strangers.length})</h2>
          <ul className="flex flex-col gap-2">
            {strangers.map((s) => (
              <li key={s.id} className="flex flex-wrap items-center justify-between gap-2 text-lg">
                <span>
                  <span className="font-mono font-bold">{s.tagCode}</span> {s.description}
                </span>
                <button type="button" className={buttonClass("secondary", "px-3 text-base")} onClick={() => setStrangers((list) => list.filter((x) => x.id !== s.id))}>
                  Left off: remove
                </button>
              </li>
            ))}
          </ul>
        </section>
      )}

      <section aria-labelledby="expected-heading" className="flex flex-col gap-2">
        <h2 id="expected-heading" className="text-2xl font-bold">
          {mode === "load" ? "Goes on the trailer" : "Comes back"} ({expected.length}): still to scan first
        </h2>
        <ul className="flex flex-col gap-2">
          {[...expected.filter((i) => !scanned.has(i.id)), ...expected.filter((i) => scanned.has(i.id))].map((i) => {
            const done = scanned.has(i.id);
            const isLost = i.id in lost;
            const isDamaged = i.id in damaged;
            return (
              <li key={i.id} className={`flex flex-col gap-2 rounded-lg border-2 p-2 ${done && isDamaged ? "border-stop bg-stop-bg" : done ? "border-ok bg-ok-bg" : isLost ? "border-caution bg-caution-bg" : "border-ink-soft"}`} data-testid="expected-item" data-scanned={done}>
                <p className="text-lg">
                  <span className="font-bold">{done ? "✓ Scanned" : isLost ? "? Not back" : "○ Not yet"}</span> · <span className="font-mono font-bold">{i.tagCode}</span> · {i.description}
                  <span className="block text-base text-ink-soft">{i.tiedown}</span>
                </p>
                {mode === "return" && done && (
                  <DamageField
                    id={`damage-${i.id}`}
                    label="Damaged: tag it out"
                    on={isDamaged}
                    note={damaged[i.id] ?? ""}
                    onToggle={(on) => setDamaged(({ [i.id]: _x, ...rest }) => (on ? { ...rest, [i.id]: "" } : rest))}
                    onNote={(note) => setDamaged((d) => ({ ...d, [i.id]: note }))}
                  />
                )}
                {mode === "return" && !done && (
                  <DamageField
                    id={`lost-${i.id}`}
                    label="Not back: mark it lost"
                    on={isLost}
                    note={lost[i.id] ?? ""}
                    onToggle={(on) => setLost(({ [i.id]: _x, ...rest }) => (on ? { ...rest, [i.id]: "" } : rest))}
                    onNote={(note) => setLost((l) => ({ ...l, [i.id]: note }))}
                  />
                )}
              </li>
            );
          })}
        </ul>
      </section>

      <div role="alert" aria-live="assertive" data-testid="load-problem">
        {problem && <p className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg font-bold text-stop">{problem}</p>}
      </div>
      {left.length > 0 && <p className="text-lg">Still to scan: {left.map((i) => i.tagCode).join(", ")}.</p>}
      {noteProblem && <p className="text-lg font-bold text-stop">Say in a few words what is damaged or what happened, for each item marked.</p>}
      <button type="button" onClick={() => void submit()} disabled={busy || Boolean(noteProblem)} className={buttonClass("primary", "min-h-16 w-full text-xl")}>
        {busy ? "Saving…" : mode === "load" ? "Mark the kit loaded" : "Mark the kit returned"}
      </button>
    </div>
  );
}

function DamageField({ id, label, on, note, onToggle, onNote }: { id: string; label: string; on: boolean; note: string; onToggle: (on: boolean) => void; onNote: (note: string) => void }) {
  return (
    <div className="flex flex-col gap-1">
      <label className="flex min-h-tap cursor-pointer items-center gap-3 text-lg font-bold">
        <input type="checkbox" className="h-7 w-7 accent-ink" checked={on} onChange={(e) => onToggle(e.target.checked)} />
        {label}
      </label>
      {on && <Field label="What happened" name={id} value={note} onChange={(e) => onNote(e.target.value)} maxLength={2000} />}
    </div>
  );
}
