import type { InputHTMLAttributes, SelectHTMLAttributes } from "react";

interface FieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  name: string;
  error?: string;
  hint?: string;
}

/** A labelled input with its own error line; the error is announced to screen readers. */
export function Field({ label, name, id = name, error, hint, className = "", ...input }: FieldProps) {
  const errorId = `${id}-error`;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-base font-bold">
        {label}
      </label>
      {hint && <p className="text-sm text-ink-soft">{hint}</p>}
      <input
        id={id}
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={errorId}
        className={`min-h-tap rounded-lg border-2 px-3 text-lg ${error ? "border-stop" : "border-ink-soft"} bg-white`}
        {...input}
      />
      <p id={errorId} aria-live="polite" className="min-h-5 text-sm font-bold text-stop">
        {error}
      </p>
    </div>
  );
}

interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  name: string;
  error?: string;
  options: ReadonlyArray<{ value: string; label: string }>;
}

export function SelectField({ label, name, id = name, error, options, className = "", ...select }: SelectFieldProps) {
  const errorId = `${id}-error`;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-base font-bold">
        {label}
      </label>
      <select
        id={id}
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={errorId}
        className={`min-h-tap rounded-lg border-2 px-3 text-lg ${error ? "border-stop" : "border-ink-soft"} bg-white`}
        {...select}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <p id={errorId} aria-live="polite" className="min-h-5 text-sm font-bold text-stop">
        {error}
      </p>
    </div>
  );
}
