"use client";
import Link from "next/link";
import { useActionState, useState } from "react";
import { buttonClass, SubmitButton, type ButtonVariant } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { initialFormState, type FormAction, type FormState } from "@/lib/forms/state";
import type { CheckPoint } from "@/lib/stock/checklists";
import type { MeasurementSpec } from "@/lib/stock/inspection";

function NoteField({ label, name = "note", error, required }: { label: string; name?: string; error?: string; required?: boolean }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={name} className="text-base font-bold">{label}</label>
      <textarea id={name} name={name} rows={3} required={required} aria-describedby={`${name}-error`} className="rounded-lg border-2 border-ink-soft p-3 text-lg" />
      <p id={`${name}-error`} aria-live="polite" className="min-h-5 text-sm font-bold text-stop">{error}</p>
    </div>
  );
}

const MAX_MB = { photo: 8, certificate: 15 } as const;

function PhotoField({ name = "photo", label, accept, error }: { name?: "photo" | "certificate"; label: string; accept: string; error?: string }) {
  const [tooBig, setTooBig] = useState<string | null>(null);
  const limit = MAX_MB[name];
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={name} className="text-base font-bold">{label}</label>
      <input
        id={name}
        name={name}
        type="file"
        accept={accept}
        capture={name === "photo" ? "environment" : undefined}
        aria-describedby={`${name}-error`}
        onChange={(e) => {
          // Said at once, before a long upload; the server checks again.
          const file = e.currentTarget.files?.[0];
          const big = file && file.size > limit * 1024 * 1024;
          setTooBig(big ? `The file is ${(file.size / 1024 / 1024).toFixed(1)} MB; the limit is ${limit} MB.` : null);
          if (big) e.currentTarget.value = "";
        }} className="min-h-tap rounded-lg border-2 border-dashed border-ink-soft p-2 text-lg file:mr-3 file:min-h-10 file:rounded-md file:border-2 file:border-ink file:bg-white file:px-3 file:font-bold" />
      <p id={`${name}-error`} aria-live="polite" className="min-h-5 text-sm font-bold text-stop">{tooBig ?? error}</p>
    </div>
  );
}

/** What a check or an inspection came to, with the way back to the item (and on to the next tag). */
function Recorded({ state, itemId, scanNext = false }: { state: FormState; itemId: string; scanNext?: boolean }) {
  return (
    <div className="flex flex-col gap-4">
      <FormAlert state={state} />
      <Link href={`/items/${itemId}`} className={buttonClass("primary")}>Back to the item</Link>
      {scanNext && <Link href="/scan" className={buttonClass("secondary")}>Scan the next tag</Link>}
    </div>
  );
}

/** Yes / no per defect, big enough for a gloved thumb. "No" is not preselected: every point is answered on purpose. */
function Checklist({ points, errors }: { points: readonly CheckPoint[]; errors?: Record<string, string> }) {
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-2 text-lg font-bold">Do you see any of these?</legend>
      {points.map((p) => (
        <div key={p.id} role="radiogroup" aria-labelledby={`q-${p.id}`} className="rounded-xl border-2 border-ink-soft p-3">
          <p id={`q-${p.id}`} className="text-lg font-bold">{p.label}</p>
          <div className="mt-2 grid grid-cols-2 gap-2">
            <label className="flex min-h-tap cursor-pointer items-center justify-center gap-2 rounded-lg border-2 border-ink text-lg font-bold has-[:checked]:bg-ok has-[:checked]:text-white">
              <input type="radio" name={`defect_${p.id}`} value="no" className="h-5 w-5" /> No
            </label>
            <label className="flex min-h-tap cursor-pointer items-center justify-center gap-2 rounded-lg border-2 border-ink text-lg font-bold has-[:checked]:bg-stop has-[:checked]:text-white">
              <input type="radio" name={`defect_${p.id}`} value="yes" className="h-5 w-5" /> Yes, I see it
            </label>
          </div>
        </div>
      ))}
      <p aria-live="polite" className="text-base font-bold text-stop">{errors?.answers}</p>
    </fieldset>
  );
}

/**
 * The checklist, then the result. The page re-renders with the item's new status after the
 * action; this component keeps showing the result the yard hand just got.
 */
export function PreUseCheckForm({ itemId, points, notUsable, action: record }: { itemId: string; points: readonly CheckPoint[]; notUsable?: React.ReactNode; action: FormAction }) {
  const [state, action] = useActionState(record, initialFormState);
  if (!state.ok && notUsable) return <>{notUsable}</>;
  if (state.ok) return <Recorded state={state} itemId={itemId} scanNext />;
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <input type="hidden" name="type" value="check" />
      <input type="hidden" name="itemId" value={itemId} />
      <Checklist points={points} errors={state.fieldErrors} />
      <NoteField label="Note (needed when you found a defect, or add a photo)" error={state.fieldErrors?.note} />
      <PhotoField label="Photo of the damage (optional)" accept="image/jpeg,image/png,image/webp" error={state.fieldErrors?.photo} />
      <FormAlert state={state} />
      <SubmitButton pendingLabel="Recording…">Record the check</SubmitButton>
    </form>
  );
}

export function InspectionForm({ itemId, points, measurements, action: record }: { itemId: string; points: readonly CheckPoint[]; measurements: readonly MeasurementSpec[]; action: FormAction }) {
  const [state, action] = useActionState(record, initialFormState);
  if (state.ok) return <Recorded state={state} itemId={itemId} />;
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <input type="hidden" name="type" value="inspection" />
      <input type="hidden" name="itemId" value={itemId} />
      <Checklist points={points} errors={state.fieldErrors} />
      {measurements.length > 0 && (
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-2 text-lg font-bold">Measurements</legend>
          {measurements.map((m) => (
            <div key={m.id} className="flex items-end gap-2">
              <Field className="flex-1" label={m.label} name={`m_${m.id}`} inputMode="decimal" />
              {m.unit === "in" ? (
                <select name={`unit_${m.id}`} aria-label={`Unit of ${m.label}`} className="mb-6 min-h-tap rounded-lg border-2 border-ink-soft px-2 text-lg">
                  <option value="in">in</option>
                  <option value="mm">mm</option>
                </select>
              ) : (
                <span className="mb-8 text-lg">{m.unit === "%" ? "%" : "wires"}</span>
              )}
            </div>
          ))}
        </fieldset>
      )}
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-2 text-lg font-bold">Verdict</legend>
        {[
          ["in_service", "Keep in service"],
          ["repair", "Hold for repair (tagged out)"],
          ["retire", "Retire"],
        ].map(([value, label]) => (
          <label key={value} className="flex min-h-tap items-center gap-3 rounded-lg border-2 border-ink px-3 text-lg font-bold has-[:checked]:bg-signal">
            <input type="radio" name="verdict" value={value} className="h-5 w-5" /> {label}
          </label>
        ))}
        <p aria-live="polite" className="text-base font-bold text-stop">{state.fieldErrors?.verdict}</p>
      </fieldset>
      <NoteField label="Note" error={state.fieldErrors?.note} />
      <PhotoField name="certificate" label="Inspection record or certificate (PDF or photo, optional)" accept="application/pdf,image/jpeg,image/png" error={state.fieldErrors?.certificate} />
      <FormAlert state={state} />
      <SubmitButton pendingLabel="Recording…">Record the inspection</SubmitButton>
    </form>
  );
}

export function TagOutForm({ itemId, action: record }: { itemId: string; action: FormAction }) {
  const [state, action] = useActionState(record, initialFormState);
  return (
    <form action={action} className="flex flex-col gap-2" noValidate>
      <input type="hidden" name="type" value="tag_out" />
      <input type="hidden" name="itemId" value={itemId} />
      <NoteField label="What is wrong?" error={state.fieldErrors?.note} required />
      <PhotoField label="Photo (optional)" accept="image/jpeg,image/png,image/webp" error={state.fieldErrors?.photo} />
      <FormAlert state={state} />
      <SubmitButton variant="danger" pendingLabel="Tagging out…">Tag out: do not use</SubmitButton>
    </form>
  );
}

export function ReasonForm({ itemId, type, label, button, variant = "secondary", action: record }: { itemId: string; type: string; label: string; button: string; variant?: ButtonVariant; action: FormAction }) {
  const [state, action] = useActionState(record, initialFormState);
  return (
    <form action={action} className="flex flex-col gap-2" noValidate>
      <input type="hidden" name="type" value={type} />
      <input type="hidden" name="itemId" value={itemId} />
      <NoteField name="reason" label={label} error={state.fieldErrors?.reason} />
      <FormAlert state={state} />
      <SubmitButton variant={variant} pendingLabel="Saving…">{button}</SubmitButton>
    </form>
  );
}

export function CorrectionForm({ itemId, eventId, action: record }: { itemId: string; eventId: number; action: FormAction }) {
  const [open, setOpen] = useState(false);
  const [state, action] = useActionState(record, initialFormState);
  if (!open) {
    return (
      <button type="button" onClick={() => setOpen(true)} className="mt-2 min-h-10 text-base font-bold underline">
        Correct entry #{eventId}
      </button>
    );
  }
  return (
    <form action={action} className="mt-2 flex flex-col gap-2" noValidate>
      <input type="hidden" name="type" value="correction" />
      <input type="hidden" name="itemId" value={itemId} />
      <input type="hidden" name="eventId" value={eventId} />
      <NoteField name="note" label={`What was wrong in entry #${eventId}?`} error={state.fieldErrors?.note} />
      <FormAlert state={state} />
      <SubmitButton variant="secondary" pendingLabel="Saving…">Record the correction</SubmitButton>
    </form>
  );
}

export function CertificateForm({ itemId, action: attach }: { itemId: string; action: FormAction }) {
  const [state, action] = useActionState(attach, initialFormState);
  return (
    <form action={action} className="flex flex-col gap-2" noValidate>
      <input type="hidden" name="itemId" value={itemId} />
      <PhotoField name="certificate" label="Maker's certificate or document (PDF, JPEG or PNG, up to 15 MB)" accept="application/pdf,image/jpeg,image/png" error={state.fieldErrors?.certificate} />
      <FormAlert state={state} />
      <SubmitButton variant="secondary" pendingLabel="Uploading…">Store the document</SubmitButton>
    </form>
  );
}
