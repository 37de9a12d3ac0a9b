import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

const controlClass = (error?: string) =>
  `min-h-tap rounded-lg border-2 px-3 text-lg ${error ? "border-stop" : "border-ink-soft"} bg-white`;

/** Label, optional hint, the control, and an error line announced to screen readers. */
function FieldShell({ id, label, hint, error, className, children }: { id: string; label: string; hint?: string; error?: string; className: string; children: ReactNode }) {
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-base font-bold">
        {label}
      </label>
      {hint && <p className="text-sm text-ink-soft">{hint}</p>}
      {children}
      <p id={`${id}-error`} aria-live="polite" className="min-h-5 text-sm font-bold text-stop">
        {error}
      </p>
    </div>
  );
}

interface FieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  name: string;
  error?: string;
  hint?: string;
}

/** A labelled input with its own error line. */
export function Field({ label, name, id = name, error, hint, className = "", ...input }: FieldProps) {
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} className={className}>
      <input id={id} name={name} aria-invalid={error ? true : undefined} aria-describedby={`${id}-error`} className={controlClass(error)} {...input} />
    </FieldShell>
  );
}

interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  name: string;
  error?: string;
  options: ReadonlyArray<{ value: string; label: string }>;
}

/** A labelled select with its own error line. */
export function SelectField({ label, name, id = name, error, options, className = "", ...select }: SelectFieldProps) {
  return (
    <FieldShell id={id} label={label} error={error} className={className}>
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
