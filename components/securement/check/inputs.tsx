"use client";
import { useId } from "react";

const inputClass = (error?: string) =>
  `min-h-tap w-full min-w-0 rounded-lg border-2 bg-white px-3 text-lg ${error ? "border-stop" : "border-ink-soft"}`;

function ErrorLine({ id, error }: { id: string; error?: string }) {
  return error ? (
    <p id={id} className="text-sm font-bold text-stop">
      ✕ {error}
    </p>
  ) : null;
}

/** A labelled text or number box; its error (from the API) sits right under it. */
export function TextBox({
  label,
  value,
  onChange,
  error,
  numeric = false,
  placeholder,
  suffix,
  className = "",
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  error?: string;
  numeric?: boolean;
  placeholder?: string;
  suffix?: string;
  className?: string;
}) {
  const id = useId();
  return (
    <div className={`flex min-w-0 flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-base font-bold">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={id}
          value={value}
          onChange={(e) => onChange(e.target.value)}
          inputMode={numeric ? "decimal" : undefined}
          autoComplete="off"
          placeholder={placeholder}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className={inputClass(error)}
        />
        {suffix && <span className="shrink-0 text-lg font-bold">{suffix}</span>}
      </div>
      <ErrorLine id={`${id}-error`} error={error} />
    </div>
  );
}

/** A labelled native select (the phone's own picker: big, works with gloves). */
export function SelectBox({
  label,
  value,
  onChange,
  options,
  error,
  className = "",
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  options: ReadonlyArray<{ value: string; label: string }>;
  error?: string;
  className?: string;
}) {
  const id = useId();
  return (
    <div className={`flex min-w-0 flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-base font-bold">
        {label}
      </label>
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={inputClass(error)}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <ErrorLine id={`${id}-error`} error={error} />
    </div>
  );
}

/** A number with a choice of two units beside it (lb | kg, ft | m). */
export function QuantityBox<U extends string>({
  label,
  value,
  unit,
  units,
  onChange,
  onUnit,
  error,
}: {
  label: string;
  value: string;
  unit: U;
  units: readonly U[];
  onChange: (value: string) => void;
  onUnit: (unit: U) => void;
  error?: string;
}) {
  const id = useId();
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="text-base font-bold">
        {label}
      </label>
      <div className="flex items-stretch gap-2">
        <input
          id={id}
          value={value}
          onChange={(e) => onChange(e.target.value)}
          inputMode="decimal"
          autoComplete="off"
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className={`${inputClass(error)} text-xl font-bold`}
        />
        <div role="radiogroup" aria-label={`${label} unit`} className="flex shrink-0 overflow-hidden rounded-lg border-2 border-ink">
          {units.map((u) => (
            <button
              key={u}
              type="button"
              role="radio"
              aria-checked={u === unit}
              onClick={() => onUnit(u)}
              className={`min-h-tap min-w-tap px-3 text-lg font-bold ${u === unit ? "bg-ink text-white" : "bg-white text-ink"}`}
            >
              {u}
            </button>
          ))}
        </div>
      </div>
      <ErrorLine id={`${id}-error`} error={error} />
    </div>
  );
}
