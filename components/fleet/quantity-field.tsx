"use client";
import { LENGTH_INPUT_UNITS, WEIGHT_INPUT_UNITS } from "@/lib/kits/quantities";

/** A number and its unit as a form holds them (the number as typed). */
export interface QuantityDraft {
  value: string;
  unit: string;
}

/**
 * A figure with its unit: a number box and a unit menu side by side, one label, one error
 * line. Weights in lb or kg, lengths in ft, in, m or mm; the server converts exactly.
 */
export function QuantityField({
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
  const units = kind === "weight" ? WEIGHT_INPUT_UNITS : LENGTH_INPUT_UNITS;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={name} className="text-base font-bold">
        {label}
      </label>
      {hint && <p className="text-sm text-ink-soft">{hint}</p>}
      <div className="flex gap-2">
        <input
          id={name}
          name={name}
          inputMode="decimal"
          value={value.value}
          onChange={(e) => onChange({ ...value, value: e.target.value })}
          aria-invalid={error ? true : undefined}
          aria-describedby={`${name}-error`}
          className={`min-h-tap min-w-0 flex-1 rounded-lg border-2 bg-white px-3 text-lg ${error ? "border-stop" : "border-ink-soft"}`}
        />
        <select
          aria-label={`${label}: unit`}
          value={value.unit}
          onChange={(e) => onChange({ ...value, unit: e.target.value })}
          className="min-h-tap w-20 shrink-0 rounded-lg border-2 border-ink-soft bg-white px-2 text-lg"
        >
          {units.map((u) => (
            <option key={u} value={u}>
              {u}
            </option>
          ))}
        </select>
      </div>
      <p id={`${name}-error`} aria-live="polite" className="min-h-5 text-sm font-bold text-stop">
        {error}
      </p>
    </div>
  );
}

/** The body's `{ value, unit }`, or null when the box is empty (an optional figure left out). */
export function quantityBody(q: QuantityDraft): { value: number | string; unit: string } | null {
  const text = q.value.trim(); // "8,100" is refused by the server, never read as 8.1
  if (!text) return null;
  const n = Number(text);
  return { value: Number.isFinite(n) ? n : text, unit: q.unit };
}

/** The first message of the API's issues at or under a path ("weight" takes "weight.value"). */
export function issueAt(issues: readonly { path: string; message: string }[], path: string): string | undefined {
  return issues.find((i) => i.path === path || i.path.startsWith(`${path}.`))?.message;
}
