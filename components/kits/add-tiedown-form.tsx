"use client";
import { useState } from "react";
import { buttonClass } from "@/components/ui/button";
import { ChoiceGroup } from "@/components/ui/choice-group";
import { Field, SelectField } from "@/components/ui/field";
import { ATTACHMENT_LABELS } from "@/lib/forms/securement-draft";
import { formatLength, formatWeight, type UnitSystem } from "@/lib/kits/display";
import type { KitJson } from "@/lib/kits/answers";
import { SIDE_LABELS } from "@/lib/kits/model";
import { ATTACHMENTS, type Attachment } from "@/lib/securement";
import { refusal } from "./item-picker";
import { apiJson, ApiError, useKitChange } from "./use-kit";

/**
 * A new tiedown: which anchor point of the kit's trailer (only points in use may be chosen;
 * those out of use are listed with the reason), how it attaches, what it holds, and the
 * machine's tie-down point. Its items are added next, by scanning or from the list.
 */
export function AddTiedownForm({ kit, units, onAdded }: { kit: KitJson; units: UnitSystem; onAdded: (tiedownId: string) => void }) {
  const usedBy = new Map(kit.tiedowns.map((t) => [t.anchorPointId, t.label]));
  const usable = kit.trailer.anchorPoints.filter((a) => a.usable.ok);
  const outOfUse = kit.trailer.anchorPoints.filter((a) => !a.usable.ok);
  const points = kit.machine.tiedownPoints.filter((p) => !kit.tiedowns.some((t) => t.machinePoint === p.label));
  const firstFree = usable.find((a) => !usedBy.has(a.id)) ?? usable[0];
  const [anchorPointId, setAnchor] = useState(firstFree?.id ?? "");
  const [attachment, setAttachment] = useState<Attachment>("direct");
  const [secures, setSecures] = useState("machine");
  const [machinePoint, setMachinePoint] = useState(points[0]?.label ?? "");
  const [label, setLabel] = useState("");
  const [problem, setProblem] = useState<{ message: string; fields: Record<string, string> } | null>(null);
  const add = useKitChange(kit.id, (body: Record<string, unknown>) => apiJson<KitJson>(`/api/v1/kits/${kit.id}/tiedowns`, { method: "POST", body: JSON.stringify(body) }));

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    setProblem(null);
    try {
      const answer = await add.mutateAsync({ anchorPointId, attachment, secures, machinePoint: machinePoint || null, label: label || null, itemIds: [] });
      const before = new Set(kit.tiedowns.map((t) => t.id));
      const created = answer.tiedowns.find((t) => !before.has(t.id));
      setLabel("");
      if (created) onAdded(created.id);
    } catch (error) {
      const fields = Object.fromEntries((error instanceof ApiError ? error.issues : []).map((i) => [i.path, i.message]));
      setProblem({ message: refusal(error), fields });
    }
  }

  if (usable.length === 0) {
    return (
      <p className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg font-bold text-stop">
        No anchor point of {kit.trailer.name} is in use: inspect the trailer or choose another for this kit.
      </p>
    );
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3 rounded-xl border-2 border-ink-soft p-3 print:hidden" aria-labelledby="add-tiedown-heading">
      <h3 id="add-tiedown-heading" className="text-2xl font-bold">Add a tiedown</h3>
      <SelectField
        label="Anchor point on the trailer"
        name="anchorPointId"
        value={anchorPointId}
        onChange={(e) => setAnchor(e.target.value)}
        error={problem?.fields.anchorPointId}
        options={usable.map((a) => ({
          value: a.id,
          label: `${a.label} · ${SIDE_LABELS[a.side].toLowerCase()} · ${formatLength(a.position.value, units)} · WLL ${formatWeight(a.wll.value, units)}${usedBy.has(a.id) ? ` · used by ${usedBy.get(a.id)}` : ""}`,
        }))}
      />
      {outOfUse.length > 0 && (
        <p className="-mt-3 text-base">
          <span className="font-bold text-stop">✕ Out of use, not offered:</span> {outOfUse.map((a) => a.label).join(", ")}.
        </p>
      )}
      <ChoiceGroup
        legend="How it attaches"
        name="attachment"
        value={attachment}
        onChange={setAttachment}
        columns={1}
        compact
        options={ATTACHMENTS.map((a) => ({ value: a, label: ATTACHMENT_LABELS[a].label, sub: ATTACHMENT_LABELS[a].counts }))}
      />
      <SelectField
        label="What it holds"
        name="secures"
        value={secures}
        onChange={(e) => setSecures(e.target.value)}
        error={problem?.fields.secures}
        options={[{ value: "machine", label: "The machine" }, ...kit.machine.accessories.map((a) => ({ value: a, label: `The ${a}` }))]}
      />
      {kit.machine.tiedownPoints.length > 0 && (
        <SelectField
          label="Tie-down point on the machine"
          name="machinePoint"
          value={machinePoint}
          onChange={(e) => setMachinePoint(e.target.value)}
          options={[{ value: "", label: "None or not listed" }, ...kit.machine.tiedownPoints.map((p) => ({ value: p.label, label: `${p.label} (${formatLength(p.position.value, units)} from the front)` }))]}
        />
      )}
      <Field label="Name (optional)" name="label" value={label} onChange={(e) => setLabel(e.target.value)} hint="The machine point's name is used when left empty." maxLength={60} error={problem?.fields.label} />
      {problem && (
        <p role="alert" className="rounded-lg border-2 border-stop bg-stop-bg p-2 text-lg font-bold text-stop">
          {problem.message}
        </p>
      )}
      <button type="submit" disabled={add.isPending} className={buttonClass("primary", "w-full")}>
        {add.isPending ? "Adding…" : "Add the tiedown, then its items"}
      </button>
    </form>
  );
}
