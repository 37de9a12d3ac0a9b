"use client";
import type { FieldIssue } from "@/lib/field-issues";
import { ChoiceGroup, Toggle } from "@/components/ui/choice-group";
import { ACCESSORY_CHOICES, issueAt, type CargoDraft } from "@/lib/forms/securement-draft";
import { QuantityField } from "@/components/ui/field";

const KIND_OPTIONS = [
  { value: "machine" as const, label: "Machine", sub: "on wheels or tracks" },
  { value: "general" as const, label: "Other cargo", sub: "any other article" },
];

/** The machine: weight, length, kind, blocking, articulation and accessories. */
export function CargoFields({
  cargo,
  onChange,
  issues,
}: {
  cargo: CargoDraft;
  onChange: (patch: Partial<CargoDraft>) => void;
  issues?: readonly FieldIssue[];
}) {
  const toggleAccessory = (name: string, on: boolean) =>
    onChange({ accessories: on ? ACCESSORY_CHOICES.filter((a) => a === name || cargo.accessories.includes(a)) : cargo.accessories.filter((a) => a !== name) });
  return (
    <fieldset className="flex flex-col gap-4 rounded-xl border-2 border-ink p-3">
      <legend className="px-1 text-xl font-bold">The machine</legend>
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        <QuantityField
          name="cargo.weight"
          label="Weight"
          value={cargo.weight}
          unit={cargo.weightUnit}
          units={["lb", "kg"] as const}
          onChange={(weight) => onChange({ weight })}
          onUnit={(weightUnit) => onChange({ weightUnit })}
          error={issueAt(issues, "cargo.weight")}
        />
        <QuantityField
          name="cargo.length"
          label="Length"
          value={cargo.length}
          unit={cargo.lengthUnit}
          units={["ft", "m"] as const}
          onChange={(length) => onChange({ length })}
          onUnit={(lengthUnit) => onChange({ lengthUnit })}
          error={issueAt(issues, "cargo.length")}
        />
      </div>
      <ChoiceGroup legend="Kind" name="cargo-kind" value={cargo.kind} options={KIND_OPTIONS} onChange={(kind) => onChange({ kind })} compact />
      <div className="flex flex-col gap-2">
        <Toggle
          label="Blocked at the front"
          hint="by a headerboard, bulkhead or other secured cargo"
          checked={cargo.blockedAtFront}
          onChange={(blockedAtFront) => onChange({ blockedAtFront })}
        />
        <Toggle label="Articulated" hint="bends in the middle, like a wheel loader" checked={cargo.articulated} onChange={(articulated) => onChange({ articulated })} />
        {cargo.articulated && (
          <Toggle
            label="Joint restrained"
            hint="lock bar or pin fitted, or the joint chained"
            checked={cargo.articulationRestrained}
            onChange={(articulationRestrained) => onChange({ articulationRestrained })}
          />
        )}
      </div>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-base font-bold">Accessories (each needs its own tiedown)</legend>
        <div className="grid grid-cols-2 gap-2">
          {ACCESSORY_CHOICES.map((a) => (
            <Toggle key={a} label={a.charAt(0).toUpperCase() + a.slice(1)} checked={cargo.accessories.includes(a)} onChange={(on) => toggleAccessory(a, on)} />
          ))}
        </div>
        {issueAt(issues, "cargo.accessories") && <p className="text-sm font-bold text-stop">✕ {issueAt(issues, "cargo.accessories")}</p>}
      </fieldset>
    </fieldset>
  );
}
