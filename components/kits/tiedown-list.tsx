"use client";
import { useState } from "react";
import type { UnitSystem } from "@/lib/kits/display";
import { AddTiedownForm } from "./add-tiedown-form";
import { TiedownCard } from "./tiedown-card";
import { useKit } from "./use-kit";

/**
 * The kit's tiedowns as cards, and (in a draft, for planners) the form for another. One item
 * picker is open at a time: it holds the camera.
 */
export function TiedownList({ kitId, units, canEdit }: { kitId: string; units: UnitSystem; canEdit: boolean }) {
  const { data: kit } = useKit(kitId);
  const [picking, setPicking] = useState<string | null>(null);
  if (!kit) return null;
  const editable = canEdit && kit.state === "draft";
  return (
    <section aria-labelledby="tiedowns-heading" className="flex flex-col gap-3">
      <h2 id="tiedowns-heading" className="text-2xl font-bold">
        Tiedowns ({kit.tiedowns.length})
      </h2>
      {kit.tiedowns.length === 0 && <p className="text-lg">None yet. {editable ? "Start with a front corner: choose its anchor point below." : ""}</p>}
      <ol className="flex flex-col gap-3">
        {kit.tiedowns.map((t, i) => (
          <TiedownCard key={t.id} kit={kit} tiedown={t} index={i} units={units} editable={editable} picking={picking === t.id} onPick={(open) => setPicking(open ? t.id : null)} />
        ))}
      </ol>
      {editable && <AddTiedownForm kit={kit} units={units} onAdded={(id) => setPicking(id)} />}
      {canEdit && kit.state === "ready" && <p className="text-lg">The kit is ready to load. To change its tiedowns, put it back to draft below.</p>}
    </section>
  );
}
