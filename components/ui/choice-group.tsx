"use client";

export interface ChoiceOption<T extends string> {
  value: T;
  label: string;
  sub?: string;
}

const COLUMNS = { 1: "grid-cols-1", 2: "grid-cols-2", 3: "grid-cols-3", 4: "grid-cols-4" } as const;

/**
 * One choice out of a few, as big buttons (radio inputs underneath, so the keyboard and
 * screen readers treat them as a group). The chosen one is dark with a tick, not only a colour.
 */
export function ChoiceGroup<T extends string>({
  legend,
  name,
  value,
  options,
  onChange,
  columns = 2,
  hint,
  error,
  compact = false,
}: {
  legend: string;
  name: string;
  value: T | null;
  options: ReadonlyArray<ChoiceOption<T>>;
  onChange: (value: T) => void;
  columns?: keyof typeof COLUMNS;
  hint?: string;
  error?: string;
  compact?: boolean;
}) {
  return (
    <fieldset className="flex min-w-0 flex-col gap-1" aria-invalid={error ? true : undefined}>
      <legend className="mb-1 text-base font-bold">{legend}</legend>
      {hint && <p className="-mt-1 mb-1 text-sm text-ink-soft">{hint}</p>}
      <div className={`grid gap-2 ${COLUMNS[columns]}`}>
        {options.map((o) => {
          const checked = o.value === value;
          return (
            <label
              key={o.value}
              className={`flex min-h-tap cursor-pointer flex-col items-center justify-center rounded-lg border-2 px-2 text-center leading-tight has-[:focus-visible]:ring-4 has-[:focus-visible]:ring-blue-700 ${
                compact ? "py-1 text-base" : "py-2 text-lg"
              } ${checked ? "border-ink bg-ink font-bold text-white" : "border-ink-soft bg-white font-bold text-ink"}`}
            >
              <input type="radio" className="sr-only" name={name} value={o.value} checked={checked} onChange={() => onChange(o.value)} />
              <span>
                {checked && <span aria-hidden="true">✓ </span>}
                {o.label}
              </span>
              {o.sub && <span className={`text-sm font-normal ${checked ? "text-white" : "text-ink-soft"}`}>{o.sub}</span>}
            </label>
          );
        })}
      </div>
      {error && <p className="text-sm font-bold text-stop">{error}</p>}
    </fieldset>
  );
}

/** A yes/no setting as a big checkbox with its words beside it. */
export function Toggle({
  label,
  hint,
  checked,
  onChange,
}: {
  label: string;
  hint?: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
}) {
  return (
    <label className={`flex min-h-tap cursor-pointer items-center gap-3 rounded-lg border-2 px-3 py-2 text-lg ${checked ? "border-ink bg-signal/25" : "border-ink-soft bg-white"}`}>
      <input type="checkbox" className="h-7 w-7 shrink-0 accent-ink" checked={checked} onChange={(e) => onChange(e.target.checked)} />
      <span className="flex flex-col leading-tight">
        <span className="font-bold">{label}</span>
        {hint && <span className="text-sm text-ink-soft">{hint}</span>}
      </span>
    </label>
  );
}
