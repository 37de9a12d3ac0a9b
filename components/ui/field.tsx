import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

// The one field kit: a label, an optional hint, the control, and an error line, for the
// server-action forms (uncontrolled, by `name`) and the screens that hold their own state
// (controlled, `value` and `onChange`) alike. The error line is always there, so a message
// arriving does not move the form, and it is announced to screen readers; `#<id>-error`
// holds the message alone, the cross beside it is decoration.

const controlClass = (error?: string) =>
  `min-h-tap w-full min-w-0 rounded-lg border-2 bg-white px-3 text-lg ${error ? "border-stop" : "border-ink-soft"}`;

/** Label, optional hint, the control, and an error line announced to screen readers. */
export function FieldShell({
  id,
  label,
  hint,
  error,
  className = "",
  children,
}: {
  id: string;
  label: string;
  hint?: string;
  error?: string;
  className?: string;
  children: ReactNode;
}) {
  return (
    <div className={`flex min-w-0 flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-base font-bold">
        {label}
      </label>
      {hint && <p className="text-sm text-ink-soft">{hint}</p>}
      {children}
      <p className="flex min-h-5 gap-1 text-sm font-bold text-stop">
        {error && <span aria-hidden="true">✕</span>}
        <span id={`${id}-error`} aria-live="polite">
          {error}
        </span>
      </p>
    </div>
  );
}

interface FieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  name: string;
  error?: string;
  hint?: string;
  /** A unit shown after the box ("lb"). */
  suffix?: string;
}

/** A labelled input with its own error line. */
export function Field({ label, name, id = name, error, hint, suffix, className = "", ...input }: FieldProps) {
  const control = <input id={id} name={name} aria-invalid={error ? true : undefined} aria-describedby={`${id}-error`} className={controlClass(error)} {...input} />;
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} className={className}>
      {suffix ? (
        <div className="flex items-center gap-2">
          {control}
          <span className="shrink-0 text-lg font-bold">{suffix}</span>
        </div>
      ) : (
        control
      )}
    </FieldShell>
  );
}

interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  name: string;
  error?: string;
  hint?: string;
  options: ReadonlyArray<{ value: string; label: string }>;
}

/** A labelled select (the phone's own picker: big, works with gloves) with its own error line. */
export function SelectField({ label, name, id = name, error, hint, options, className = "", ...select }: SelectFieldProps) {
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} className={className}>
      <select id={id} name={name} aria-invalid={error ? true : undefined} aria-describedby={`${id}-error`} className={controlClass(error)} {...select}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </FieldShell>
  );
}

/** A number with a choice of units beside it (lb | kg, ft | m), for screens that hold their own state. */
export function QuantityField<U extends string>({
  label,
  name,
  id = name,
  value,
  unit,
  units,
  onChange,
  onUnit,
  error,
  hint,
}: {
  label: string;
  name: string;
  id?: string;
  value: string;
  unit: U;
  units: readonly U[];
  onChange: (value: string) => void;
  onUnit: (unit: U) => void;
  error?: string;
  hint?: string;
}) {
  return (
    <FieldShell id={id} label={label} error={error} hint={hint}>
      <div className="flex items-stretch gap-2">
        <input
          id={id}
          name={name}
          value={value}
          onChange={(e) => onChange(e.target.value)}
          inputMode="decimal"
          autoComplete="off"
          aria-invalid={error ? true : undefined}
          aria-describedby={`${id}-error`}
          className={`${controlClass(error)} text-xl font-bold`}
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
    </FieldShell>
  );
}
