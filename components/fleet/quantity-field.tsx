"use client";
import { QuantityField } from "@/components/ui/field";
import { editableLength, editableWeight, type UnitSystem } from "@/lib/kits/display";

// Figures of machines and trailers in the shared QuantityField, holding what was typed with
// its unit, and what goes into the API body.

/** A number and its unit as a form holds them (the number as typed). */
export interface QuantityDraft {
  value: string;
  unit: string;
}

const UNITS = { weight: ["lb", "kg"], length: ["ft", "in", "m"] } as const;

/** A weight (lb | kg) or a length (ft | in | m) with its unit, in the shared field. */
export function FleetQuantity({
  label,
  name,
  kind,
  value,
  onChange,
  error,
  hint,
}: {
  label: string;
  name: string;
  kind: "weight" | "length";
  value: QuantityDraft;
  onChange: (value: QuantityDraft) => void;
  error?: string;
  hint?: string;
}) {
  const units: readonly string[] = UNITS[kind];
  return (
    <QuantityField
      label={label}
      name={name}
      value={value.value}
      unit={units.includes(value.unit) ? value.unit : units[0]!}
      units={units}
      onChange={(v) => onChange({ ...value, value: v })}
      onUnit={(unit) => onChange({ ...value, unit })}
      error={error}
      hint={hint}
    />
  );
}

/**
 * What a field starts from: a stored figure in the organisation's units (saving it unchanged
 * stores the same figure: lib/kits/display.ts), or an empty box in those units.
 */
export function draftOf(q: { value: number } | null, kind: "weight" | "length", units: UnitSystem): QuantityDraft {
  if (!q) return { value: "", unit: kind === "weight" ? (units === "us" ? "lb" : "kg") : units === "us" ? "ft" : "m" };
  const e = kind === "weight" ? editableWeight(q.value, units) : editableLength(q.value, units);
  return { value: String(e.value), unit: e.unit };
}

/** The body's `{ value, unit }`, or null when the box is empty (an optional figure left out). */
export function quantityBody(q: QuantityDraft): { value: number | string; unit: string } | null {
  const text = q.value.trim(); // "8,100" is refused by the server, never read as 8.1
  if (!text) return null;
  const n = Number(text);
  return { value: Number.isFinite(n) ? n : text, unit: q.unit };
}
