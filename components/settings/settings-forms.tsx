"use client";
import { SubmitButton } from "@/components/ui/button";
import { Field, SelectField } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { ROLE_LABELS, ROLES } from "@/lib/auth/roles";
import type { FormAction } from "@/lib/forms/state";
import { useFormAction } from "@/components/ui/use-form-action";
import { ITEM_KINDS, KIND_LABELS, type ItemKind } from "@/lib/stock/labels";

export function OrganisationForm({ name, publicTagView, timeZone, timeZones, action: save }: { name: string; publicTagView: boolean; timeZone: string; timeZones: string[]; action: FormAction }) {
  const { state, formProps } = useFormAction(save);
  return (
    <form {...formProps} className="flex flex-col gap-2 rounded-xl border-2 border-ink-soft p-4">
      <h2 className="text-xl font-bold">Company</h2>
      <FormAlert state={state} />
      <Field label="Company name" name="name" defaultValue={state.values?.name ?? name} error={state.fieldErrors?.name} />
      <SelectField
        label="Time zone"
        name="timeZone"
        defaultValue={state.values?.timeZone ?? timeZone}
        options={timeZones.map((z) => ({ value: z, label: z.replaceAll("_", " ") }))}
        error={state.fieldErrors?.timeZone}
      />
      <p className="-mt-4 mb-2 text-sm text-ink-soft">Today, overdue inspections and every date and time in Linkyard follow it.</p>
      <label className="flex min-h-tap items-start gap-3 text-lg">
        <input type="checkbox" name="publicTagView" defaultChecked={publicTagView} className="mt-1 h-6 w-6 shrink-0" />
        <span>
          Public tag view: someone without an account who scans a tag (a roadside inspector) sees only the
          kind, grade, size, WLL, status and the date of the last inspection.
        </span>
      </label>
      <SubmitButton pendingLabel="Saving…">Save settings</SubmitButton>
    </form>
  );
}

export function CreateTokenForm({ action: create }: { action: FormAction }) {
  const { state, formProps } = useFormAction(create);
  return (
    <form {...formProps} className="flex flex-col gap-2">
      <FormAlert state={state} />
      {state.ok && state.values?.secret && (
        <p className="break-all rounded-lg border-2 border-ink bg-signal/30 p-3 font-mono text-base" data-testid="new-token">
          {state.values.secret}
        </p>
      )}
      <Field label="Token name" name="name" hint="Who or what uses it, e.g. dispatch spreadsheet." error={state.fieldErrors?.name} />
      <SelectField
        label="Acts as"
        name="role"
        options={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))}
        defaultValue="planner"
        error={state.fieldErrors?.role}
      />
      <SubmitButton pendingLabel="Creating…">Create API token</SubmitButton>
    </form>
  );
}

export function RevokeTokenButton({ tokenId, name, action: revoke }: { tokenId: string; name: string; action: FormAction }) {
  const { state, formProps } = useFormAction(revoke);
  return (
    <form {...formProps}>
      <input type="hidden" name="tokenId" value={tokenId} />
      <SubmitButton variant="danger" pendingLabel="Revoking…" aria-label={`Revoke token ${name}`}>
        Revoke
      </SubmitButton>
      <FormAlert state={state} />
    </form>
  );
}

export function IntervalsForm({ intervals, action: save }: { intervals: Record<ItemKind, number>; action: FormAction }) {
  const { state, formProps } = useFormAction(save);
  return (
    <form {...formProps} className="flex flex-col gap-2 rounded-xl border-2 border-ink-soft p-4">
      <h2 className="text-xl font-bold">Periodic inspection, days between</h2>
      <p className="text-base">
        Defaults: a year for chain and hardware (ASME B30.26 asks at most a year in normal service),
        half a year for web straps (common practice). Severe service calls for shorter intervals.
      </p>
      <FormAlert state={state} />
      <div className="grid grid-cols-2 gap-x-3 md:grid-cols-4">
        {ITEM_KINDS.map((k) => (
          <Field key={k} label={KIND_LABELS[k]} name={k} inputMode="numeric" defaultValue={state.values?.[k] ?? String(intervals[k])} error={state.fieldErrors?.[k]} />
        ))}
      </div>
      <SubmitButton pendingLabel="Saving…">Save intervals</SubmitButton>
    </form>
  );
}
