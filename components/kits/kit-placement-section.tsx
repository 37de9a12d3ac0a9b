"use client";
import { useState } from "react";
import { PlacementControl } from "@/components/kits/placement/placement-control";
import { kitFromJson, type KitJson } from "@/lib/kits/answers";
import type { UnitSystem } from "@/lib/kits/display";
import { formatMetres } from "@/lib/kits/placement";
import { refusal } from "./item-picker";
import { apiJson, useKit, useKitChange } from "./use-kit";

/**
 * Where the machine sits, on the builder: the placement control over the live kit, saving
 * each settled position with PUT /api/v1/kits/{id}/placement. The answer (the whole kit,
 * its placement findings in its verdict) goes into the page's cache, so the verdict, the
 * "Mark ready" button and the deck picture follow. Only planners move the machine, and only
 * in a draft; everyone else sees the figures.
 */
export function KitPlacementSection({ kitId, units, canEdit }: { kitId: string; units: UnitSystem; canEdit: boolean }) {
  const { data } = useKit(kitId);
  const [saved, setSaved] = useState<number | null>(null);
  const save = useKitChange(kitId, (mm: number) =>
    apiJson<KitJson>(`/api/v1/kits/${kitId}/placement`, { method: "PUT", body: JSON.stringify({ machineFrontFromDeckFront: { value: mm, unit: "mm" } }) }),
  );
  if (!data) return null;
  const kit = kitFromJson(data);
  const editable = canEdit && data.state === "draft";
  const why = !canEdit
    ? "Planners and owners move the machine on the deck."
    : `The kit is ${data.stateLabel.toLowerCase()}: put it back to draft to move the machine.`;
  return (
    <section id="placement" aria-label="Placement on the deck" className="flex scroll-mt-20 flex-col gap-2 rounded-xl border-2 border-ink-soft p-3" data-testid="placement">
      <PlacementControl
        machine={kit.machine}
        trailer={kit.trailer}
        initialMm={kit.machineFrontFromDeckFrontMm}
        system={units === "metric" ? "metric" : "imperial"}
        disabled={!editable}
        disabledWhy={why}
        onChange={
          editable
            ? (mm) => {
                setSaved(null);
                save.mutate(mm, { onSuccess: () => setSaved(mm) });
              }
            : undefined
        }
      />
      <p role="status" aria-live="polite" className="text-lg" data-testid="placement-status">
        {save.isPending && "Saving the position…"}
        {!save.isPending && save.isError && <span className="font-bold text-stop">✕ Not saved: {refusal(save.error)}</span>}
        {!save.isPending && !save.isError && saved !== null && (
          <span className="font-bold text-ok">✓ Saved: the front {formatMetres(saved)} back from the deck front.</span>
        )}
      </p>
    </section>
  );
}
