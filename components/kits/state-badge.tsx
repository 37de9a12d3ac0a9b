import { KIT_STATE_LABELS, type KitState } from "@/lib/kits/model";

// A kit's state and verdict in words, with a mark; the colour only repeats the words.

const STATE_TONE: Record<KitState, string> = {
  draft: "border-idle bg-idle-bg text-idle",
  ready: "border-ok bg-ok-bg text-ok",
  loaded: "border-deck bg-deck text-white",
  returned: "border-idle bg-white text-ink-soft",
};

const STATE_MARK: Record<KitState, string> = { draft: "✎", ready: "✓", loaded: "⇧", returned: "↩" };

export function KitStateBadge({ state }: { state: KitState }) {
  return (
    <span className={`inline-flex items-center gap-1 rounded-md border-2 px-2 py-0.5 text-base font-bold ${STATE_TONE[state]}`}>
      <span aria-hidden="true">{STATE_MARK[state]}</span>
      {KIT_STATE_LABELS[state]}
    </span>
  );
}

/** Pass or not, in words: the engine's check and the gear the kit may use that day. */
export function KitPassBadge({ pass, large = false }: { pass: boolean; large?: boolean }) {
  return (
    <span
      className={`inline-flex items-center gap-1 rounded-md border-2 px-2 py-0.5 font-bold ${large ? "text-xl" : "text-base"} ${
        pass ? "border-ok bg-ok-bg text-ok" : "border-stop bg-stop-bg text-stop"
      }`}
    >
      <span aria-hidden="true">{pass ? "✓" : "✕"}</span>
      {pass ? "Passes the check" : "Does not pass"}
    </span>
  );
}

/** Whether a part may be used on the kit's date. */
export function UsableBadge({ ok, label }: { ok: boolean; label?: string }) {
  return (
    <span className={`inline-flex items-center gap-1 rounded-md border-2 px-1.5 text-sm font-bold ${ok ? "border-ok bg-ok-bg text-ok" : "border-stop bg-stop-bg text-stop"}`}>
      <span aria-hidden="true">{ok ? "✓" : "✕"}</span>
      {label ?? (ok ? "Usable" : "Do not use")}
    </span>
  );
}
