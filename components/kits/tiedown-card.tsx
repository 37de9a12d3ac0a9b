"use client";
import { useState } from "react";
import { buttonClass } from "@/components/ui/button";
import { ATTACHMENT_LABELS } from "@/lib/forms/securement-draft";
import { formatCheckWeight, formatLength, formatWeight, type UnitSystem } from "@/lib/kits/display";
import type { KitJson } from "@/lib/kits/answers";
import { SIDE_LABELS } from "@/lib/kits/model";
import { ItemPicker, refusal } from "./item-picker";
import { UsableBadge } from "./state-badge";
import { apiJson, useKitChange } from "./use-kit";

type Tiedown = KitJson["tiedowns"][number];

const PART_WORDS: Record<string, string> = {
  chain: "chain",
  webbing: "web strap",
  "wire-rope": "wire rope",
  binder: "binder",
  hook: "hook",
  shackle: "shackle",
  anchor: "anchor point",
};

/** What the check says of this tiedown: its WLL and the part that limits it, and what it adds. */
function ResultLine({ t, units }: { t: Tiedown; units: UnitSystem }) {
  const r = t.result;
  if (!r) return <p className="text-lg font-bold text-stop">✕ Not counted: it holds a part the machine no longer lists.</p>;
  if (!r.components.length) return null;
  const limit = r.limitedBy ? `${PART_WORDS[r.limitedBy] ?? r.limitedBy}${r.limitedByLabel ? ` ${r.limitedByLabel.replace(/^anchor point /, "")}` : ""}` : null;
  return (
    <div className="flex flex-col gap-1 rounded-lg bg-idle-bg p-2 text-lg">
      {r.rated ? (
        <p>
          <span className="font-bold">Tiedown WLL {formatCheckWeight(r.wllLb, r.wllKg, units)}</span>
          {limit && (
            <>
              , limited by <span className="font-bold" data-testid="limited-by">the {limit}</span>
            </>
          )}
        </p>
      ) : (
        <p className="font-bold text-stop">✕ A part cannot be rated{limit ? ` (the ${limit})` : ""}: this tiedown counts 0.</p>
      )}
      <p>
        Counts {formatCheckWeight(r.countedWllLb, r.countedWllKg, units)} toward the aggregate.
        {!r.countsTowardMinimum && " Not counted toward the minimum number, which counts tiedowns on the machine itself."}
      </p>
    </div>
  );
}

/**
 * One tiedown: from which anchor point, how it attaches, what it holds, its items with their
 * verdict for the kit's date, and its line of the check. In a draft, items are added by
 * scanning or from the free list, removed, and the tiedown copied to the other corners.
 */
export function TiedownCard({
  kit,
  tiedown: t,
  index,
  units,
  editable,
  picking,
  onPick,
}: {
  kit: KitJson;
  tiedown: Tiedown;
  index: number;
  units: UnitSystem;
  editable: boolean;
  picking: boolean;
  onPick: (open: boolean) => void;
}) {
  const [problem, setProblem] = useState<string | null>(null);
  const [cornersNote, setCornersNote] = useState<string | null>(null);
  const anchor = kit.trailer.anchorPoints.find((a) => a.id === t.anchorPointId);
  const removeItem = useKitChange(kit.id, (itemId: string) => apiJson<KitJson>(`/api/v1/kits/${kit.id}/tiedowns/${t.id}/items/${itemId}`, { method: "DELETE" }));
  const removeTiedown = useKitChange(kit.id, () => apiJson<KitJson>(`/api/v1/kits/${kit.id}/tiedowns/${t.id}`, { method: "DELETE" }));
  const corners = useKitChange(kit.id, () =>
    apiJson<{ kit: KitJson; corners: { corner: string; anchorPointId: string | null; gaps: string[] }[] }>(`/api/v1/kits/${kit.id}/corners`, {
      method: "POST",
      body: JSON.stringify({ fromTiedownId: t.id }),
    }),
  );

  async function run(work: () => Promise<unknown>) {
    setProblem(null);
    try {
      await work();
    } catch (error) {
      setProblem(refusal(error));
    }
  }

  async function fillCorners() {
    setCornersNote(null);
    await run(async () => {
      const answer = await corners.mutateAsync(undefined);
      const filled = answer.corners.filter((c) => c.anchorPointId);
      const gaps = answer.corners.filter((c) => c.gaps.length).map((c) => `${c.corner}: ${c.gaps.join("; ")}`);
      setCornersNote(
        answer.corners.length === 0
          ? "Every corner already has a tiedown with items."
          : `Filled ${filled.map((c) => c.corner).join(", ") || "no corner"}.${gaps.length ? ` Still to do by hand: ${gaps.join(". ")}.` : ""}`,
      );
    });
  }

  const holds = t.secures === "machine" ? "the machine" : `the ${t.secures}`;
  const attachment = ATTACHMENT_LABELS[t.attachment];
  return (
    <li id={`tiedown-${t.id}`} className={`flex scroll-mt-20 flex-col gap-3 rounded-xl border-2 p-3 target:outline target:outline-4 target:outline-offset-2 target:outline-[#1d4ed8] ${t.result?.rated === false || t.items.some((i) => !i.usable.ok) || anchor?.usable.ok === false ? "border-stop" : "border-ink"}`} data-testid="tiedown-card">
      <div className="flex flex-col">
        <h3 className="text-2xl font-bold leading-tight">
          {index + 1}. {t.label}
        </h3>
        <p className="text-lg">
          Holds {holds}
          {t.machinePoint && t.machinePoint !== t.label ? ` at its ${t.machinePoint} point` : ""}
        </p>
      </div>
      <div className="text-lg">
        <p className="flex flex-wrap items-center gap-2">
          <span className="font-bold">From anchor point {anchor?.label ?? "?"}</span>
          {anchor && <UsableBadge ok={anchor.usable.ok} label={anchor.usable.ok ? "In use" : "Out of use"} />}
        </p>
        {anchor && (
          <p>
            {SIDE_LABELS[anchor.side]} side · {formatLength(anchor.position.value, units)} from the deck&apos;s front · WLL {formatWeight(anchor.wll.value, units)}
          </p>
        )}
      </div>
      {anchor && !anchor.usable.ok && <p className="text-base font-bold text-stop">{anchor.usable.reasons.map((r) => r.message).join(" ")}</p>}
      <p className="text-lg">
        {attachment.label}: {attachment.counts}.
      </p>
      <ResultLine t={t} units={units} />

      {t.items.length === 0 ? (
        <p className="rounded-lg border-2 border-dashed border-ink-soft p-3 text-lg">No items yet: add the chain and binder (or strap) by scanning their tags.</p>
      ) : (
        <ol className="flex flex-col gap-2" aria-label={`Items of ${t.label}, from the anchor point`}>
          {t.items.map((i) => (
            <li key={i.id} className={`flex flex-wrap items-center justify-between gap-2 rounded-lg border-2 p-2 ${i.usable.ok ? "border-ink-soft" : "border-stop bg-stop-bg"}`}>
              <span className="flex min-w-0 flex-col">
                <span className="text-lg font-bold">
                  <span className="font-mono">{i.tagCode}</span> <UsableBadge ok={i.usable.ok} />
                </span>
                <span className="text-base">
                  {i.description} · WLL {i.wllLb == null ? "none" : formatWeight(i.wllLb, units)}
                </span>
                {!i.usable.ok && <span className="text-base font-bold text-stop">{i.usable.reasons.map((r) => r.message).join(" ")}</span>}
              </span>
              {editable && (
                <button type="button" onClick={() => void run(() => removeItem.mutateAsync(i.id))} disabled={removeItem.isPending} className={buttonClass("secondary", "px-3 text-base print:hidden")} aria-label={`Remove ${i.tagCode} from ${t.label}`}>
                  Remove
                </button>
              )}
            </li>
          ))}
        </ol>
      )}

      {problem && (
        <p role="alert" className="rounded-lg border-2 border-stop bg-stop-bg p-2 text-lg font-bold text-stop">
          {problem}
        </p>
      )}
      {cornersNote && (
        <p role="status" className="rounded-lg border-2 border-ink bg-white p-2 text-lg">
          {cornersNote}
        </p>
      )}

      {editable &&
        (picking ? (
          <ItemPicker kit={kit} tiedownId={t.id} units={units} onClose={() => onPick(false)} />
        ) : (
          <div className="flex flex-col gap-2 print:hidden">
            <button type="button" onClick={() => onPick(true)} className={buttonClass("primary", "w-full")}>
              Add items to {t.label}
            </button>
            {t.secures === "machine" && t.items.length > 0 && (
              <button type="button" onClick={() => void fillCorners()} disabled={corners.isPending} className={buttonClass("secondary", "w-full")}>
                {corners.isPending ? "Filling the corners…" : "Use the same for all four corners"}
              </button>
            )}
            <button
              type="button"
              onClick={() => {
                if (window.confirm(`Remove the tiedown "${t.label}"? Its items are free again for ${kit.date}.`)) void run(() => removeTiedown.mutateAsync(undefined));
              }}
              disabled={removeTiedown.isPending}
              className={buttonClass("secondary", "w-full")}
            >
              Remove this tiedown
            </button>
          </div>
        ))}
    </li>
  );
}
