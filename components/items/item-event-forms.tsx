"use client";
import Link from "next/link";
import { useState } from "react";
import { buttonClass, SubmitButton, type ButtonVariant } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { useFormAction } from "@/components/ui/use-form-action";
import type { FormAction, FormState } from "@/lib/forms/state";
import type { CheckPoint } from "@/lib/stock/checklists";
import type { MeasurementSpec } from "@/lib/stock/inspection";

// The forms of an item's page. Each keeps every answer when the server refuses one, marks the
// field or question at fault and moves the focus there (useFormAction).

function NoteField({ label, name = "note", error, required, id = name }: { label: string; name?: string; error?: string; required?: boolean; id?: string }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-base font-bold">{label}</label>
      <textarea
        id={id}
        name={name}
        rows={3}
        required={required}
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-error`}
        className={`rounded-lg border-2 p-3 text-lg ${error ? "border-4 border-stop" : "border-ink-soft"}`}
      />
      <p id={`${id}-error`} aria-live="polite" className="min-h-5 text-base font-bold text-stop">{error}</p>
    </div>
  );
}

const MAX_MB = { photo: 8, certificate: 15 } as const;

function PhotoField({ name = "photo", label, accept, error, id = name }: { name?: "photo" | "certificate"; label: string; accept: string; error?: string; id?: string }) {
  const [tooBig, setTooBig] = useState<string | null>(null);
  const limit = MAX_MB[name];
  const problem = tooBig ?? error;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-base font-bold">{label}</label>
      <input
        id={id}
        name={name}
        type="file"
        accept={accept}
        capture={name === "photo" ? "environment" : undefined}
        aria-invalid={problem ? true : undefined}
        aria-describedby={`${id}-error`}
        onChange={(e) => {
          // Said at once, before a long upload; the server checks again.
          const file = e.currentTarget.files?.[0];
          const big = file && file.size > limit * 1024 * 1024;
          setTooBig(big ? `The file is ${(file.size / 1024 / 1024).toFixed(1)} MB; the limit is ${limit} MB.` : null);
          if (big) e.currentTarget.value = "";
        }}
        className="min-h-tap rounded-lg border-2 border-dashed border-ink-soft p-2 text-lg file:mr-3 file:min-h-tap file:rounded-md file:border-2 file:border-ink file:bg-white file:px-3 file:font-bold"
      />
      <p id={`${id}-error`} aria-live="polite" className="min-h-5 text-base font-bold text-stop">{problem}</p>
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

/** One answer of a question: a big button with its words and, when chosen, a mark (never the browser's radio dot). */
function Answer({ name, value, tone, children }: { name: string; value: string; tone: "ok" | "stop"; children: React.ReactNode }) {
  return (
    <label
      className={`group flex min-h-tap cursor-pointer items-center justify-center gap-2 rounded-lg border-2 border-ink bg-white px-2 text-lg font-bold text-ink has-[:focus-visible]:ring-4 has-[:focus-visible]:ring-deck-light ${
        tone === "ok" ? "has-[:checked]:border-ok has-[:checked]:bg-ok" : "has-[:checked]:border-stop has-[:checked]:bg-stop"
      } has-[:checked]:text-white`}
    >
      <input type="radio" name={name} value={value} className="sr-only" />
      {/* The mark is drawn by CSS, so that the answer's name stays "No" or "Yes, I see it". */}
      <span aria-hidden="true" className={tone === "ok" ? "group-has-[:checked]:before:content-['✓']" : "group-has-[:checked]:before:content-['✕']"} />
      {children}
    </label>
  );
}

/**
 * Yes / no per defect, big enough for a gloved thumb. "No" is not preselected: every point is
 * answered on purpose. A question the server names (`answers.<id>`) is marked and takes the focus.
 */
function Checklist({ points, errors }: { points: readonly CheckPoint[]; errors?: Record<string, string> }) {
  return (
    <fieldset className="grid grid-cols-1 gap-3 lg:grid-cols-2">
      <legend className="mb-2 text-lg font-bold">Do you see any of these?</legend>
      {points.map((p) => {
        const error = errors?.[`answers.${p.id}`];
        return (
          <div
            key={p.id}
            role="radiogroup"
            aria-labelledby={`q-${p.id}`}
            aria-describedby={`q-${p.id}-error`}
            aria-invalid={error ? true : undefined}
            className={`rounded-xl p-3 ${error ? "border-4 border-stop" : "border-2 border-ink-soft"}`}
          >
            <p id={`q-${p.id}`} className="text-lg font-bold">{p.label}</p>
            <div className="mt-2 grid grid-cols-2 gap-2">
              <Answer name={`defect_${p.id}`} value="no" tone="ok">No</Answer>
              <Answer name={`defect_${p.id}`} value="yes" tone="stop">Yes, I see it</Answer>
            </div>
            <p id={`q-${p.id}-error`} aria-live="polite" className="text-base font-bold text-stop empty:hidden">{error ? "Answer this one: No or Yes." : ""}</p>
          </div>
        );
      })}
    </fieldset>
  );
}

/**
 * The checklist, then the result: a pass in green, a failed check (which tags the item out)
 * in red. Only offered for gear that may be used: `notUsable` (the verdict) stands in its
 * place otherwise. The page re-renders with the item's new status after the action; this
 * component keeps showing the result the yard hand just got.
 */
export function PreUseCheckForm({ itemId, points, notUsable, action: record }: { itemId: string; points: readonly CheckPoint[]; notUsable?: React.ReactNode; action: FormAction }) {
  const { state, formProps } = useFormAction(record);
  if (state.ok) return <Recorded state={state} itemId={itemId} scanNext />;
  if (notUsable) return <>{notUsable}</>;
  return (
    <form {...formProps} className="flex flex-col gap-4">
      <input type="hidden" name="type" value="check" />
      <input type="hidden" name="itemId" value={itemId} />
      <FormAlert state={state} />
      <Checklist points={points} errors={state.fieldErrors} />
      <NoteField label="Note (needed when you found a defect, or add a photo)" error={state.fieldErrors?.note} />
      <PhotoField label="Photo of the damage (optional)" accept="image/jpeg,image/png,image/webp" error={state.fieldErrors?.photo} />
      <SubmitButton pendingLabel="Recording…" className="md:self-start md:px-12">Record the check</SubmitButton>
    </form>
  );
}

const VERDICTS = [
  ["in_service", "Keep in service"],
  ["repair", "Hold for repair (tagged out)"],
  ["retire", "Retire"],
] as const;

export function InspectionForm({ itemId, points, measurements, action: record }: { itemId: string; points: readonly CheckPoint[]; measurements: readonly MeasurementSpec[]; action: FormAction }) {
  const { state, formProps } = useFormAction(record);
  if (state.ok) return <Recorded state={state} itemId={itemId} />;
  const e = state.fieldErrors ?? {};
  return (
    <form {...formProps} className="flex flex-col gap-4">
      <input type="hidden" name="type" value="inspection" />
      <input type="hidden" name="itemId" value={itemId} />
      <FormAlert state={state} />
      <Checklist points={points} errors={e} />
      {measurements.length > 0 && (
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-2 text-lg font-bold">Measurements</legend>
          {measurements.map((m) => (
            <div key={m.id} className="flex items-end gap-2">
              <Field className="flex-1" label={m.label} name={`m_${m.id}`} inputMode="decimal" error={e[`measurements.${m.id}`]} />
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
      <fieldset className="flex flex-col gap-2" aria-invalid={e.verdict ? true : undefined} aria-describedby="verdict-error">
        <legend className="mb-2 text-lg font-bold">Verdict</legend>
        {VERDICTS.map(([value, label]) => (
          <label
            key={value}
            className="group flex min-h-tap cursor-pointer items-center gap-3 rounded-lg border-2 border-ink px-3 text-lg font-bold has-[:checked]:bg-deck has-[:checked]:text-white has-[:focus-visible]:ring-4 has-[:focus-visible]:ring-deck-light"
          >
            <input type="radio" name="verdict" value={value} className="sr-only" />
            <span aria-hidden="true" className="w-5 group-has-[:checked]:before:content-['✓']" />
            {label}
          </label>
        ))}
        <p id="verdict-error" aria-live="polite" className="text-base font-bold text-stop">{e.verdict}</p>
      </fieldset>
      <NoteField label="Note" error={e.note} />
      <PhotoField name="certificate" label="Inspection record or certificate (PDF or photo, optional)" accept="application/pdf,image/jpeg,image/png" error={e.certificate} />
      <SubmitButton pendingLabel="Recording…" className="md:self-start md:px-12">Record the inspection</SubmitButton>
    </form>
  );
}

/** Report damage: tags the item out at once. The note says what is wrong. */
export function TagOutForm({ itemId, action: record }: { itemId: string; action: FormAction }) {
  const { state, formProps } = useFormAction(record);
  return (
    <form {...formProps} className="flex flex-col gap-2">
      <input type="hidden" name="type" value="tag_out" />
      <input type="hidden" name="itemId" value={itemId} />
      <NoteField id="tag-out-note" label="What is wrong?" error={state.fieldErrors?.note} required />
      <PhotoField id="tag-out-photo" label="Photo (optional)" accept="image/jpeg,image/png,image/webp" error={state.fieldErrors?.photo} />
      <FormAlert state={state.ok ? { ...state, tone: "stop" } : state} />
      <SubmitButton variant="danger" pendingLabel="Tagging out…">Tag out: do not use</SubmitButton>
    </form>
  );
}

export function ReasonForm({ itemId, type, label, button, variant = "secondary", action: record }: { itemId: string; type: string; label: string; button: string; variant?: ButtonVariant; action: FormAction }) {
  const { state, formProps } = useFormAction(record);
  return (
    <form {...formProps} className="flex flex-col gap-2">
      <input type="hidden" name="type" value={type} />
      <input type="hidden" name="itemId" value={itemId} />
      <NoteField id={`${type}-reason`} name="reason" label={label} error={state.fieldErrors?.reason} />
      <FormAlert state={state} />
      <SubmitButton variant={variant} pendingLabel="Saving…">{button}</SubmitButton>
    </form>
  );
}

/** A correction of one history entry: the entry stays, the correction points back to it. */
export function CorrectionForm({ itemId, eventId, action: record }: { itemId: string; eventId: number; action: FormAction }) {
  const [open, setOpen] = useState(false);
  const { state, formProps } = useFormAction(record);
  if (!open) {
    return (
      <button type="button" onClick={() => setOpen(true)} className="mt-2 inline-flex min-h-tap items-center text-base font-bold underline">
        Correct this entry
      </button>
    );
  }
  return (
    <form {...formProps} className="mt-2 flex flex-col gap-2">
      <input type="hidden" name="type" value="correction" />
      <input type="hidden" name="itemId" value={itemId} />
      <input type="hidden" name="eventId" value={eventId} />
      <NoteField id={`correction-${eventId}`} name="note" label={`What was wrong in this entry (entry ${eventId})?`} error={state.fieldErrors?.note} />
      <FormAlert state={state} />
      <SubmitButton variant="secondary" pendingLabel="Saving…">Record the correction</SubmitButton>
    </form>
  );
}

export function CertificateForm({ itemId, action: attach }: { itemId: string; action: FormAction }) {
  const { state, formProps } = useFormAction(attach);
  return (
    <form {...formProps} className="flex flex-col gap-2">
      <input type="hidden" name="itemId" value={itemId} />
      <PhotoField id="document-file" name="certificate" label="Maker's certificate or document (PDF, JPEG or PNG, up to 15 MB)" accept="application/pdf,image/jpeg,image/png" error={state.fieldErrors?.certificate} />
      <FormAlert state={state} />
      <SubmitButton variant="secondary" pendingLabel="Uploading…">Store the document</SubmitButton>
    </form>
  );
}
