"use client";
import { SubmitButton } from "@/components/ui/button";
import { Field, SelectField } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/auth/roles";
import type { FormAction } from "@/lib/forms/state";
import { useFormAction } from "@/components/ui/use-form-action";

const roleOptions = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

export function InviteForm({ action: invite }: { action: FormAction }) {
  const { state, formProps } = useFormAction(invite);
  return (
    <form {...formProps} className="flex flex-col gap-2 rounded-xl border-2 border-ink-soft p-4">
      <h2 className="text-xl font-bold">Invite someone</h2>
      <FormAlert state={state} />
      <Field label="E-mail" name="email" type="email" defaultValue={state.ok ? "" : state.values?.email} error={state.fieldErrors?.email} />
      <SelectField label="Role" name="role" options={roleOptions} defaultValue={state.values?.role ?? "yard_hand"} error={state.fieldErrors?.role} />
      <label className="flex min-h-tap items-center gap-3 text-lg">
        <input type="checkbox" name="designated" className="h-6 w-6 shrink-0" />
        Designated person (may do periodic inspections and return gear to service)
      </label>
      <SubmitButton pendingLabel="Sending…">Send invite</SubmitButton>
    </form>
  );
}

export function PersonRow({
  person,
  isSelf,
  action: update,
}: {
  person: { id: string; name: string; email: string; role: Role; designated: boolean; disabled: boolean };
  isSelf: boolean;
  action: FormAction;
}) {
  const { state, formProps } = useFormAction(update);
  return (
    <li className="rounded-xl border-2 border-ink-soft p-4">
      <form {...formProps} className="flex flex-col gap-2">
        <p className="text-xl font-bold">
          <bdi>{person.name}</bdi> {isSelf && <span className="text-base font-normal">(you)</span>}
          {person.disabled && <span className="ml-2 rounded bg-idle-bg px-2 text-base text-idle">Disabled</span>}
        </p>
        <p className="text-base text-ink-soft">{person.email}</p>
        <input type="hidden" name="userId" value={person.id} />
        <SelectField label={`Role of ${person.name}`} name="role" id={`role-${person.id}`} options={roleOptions} defaultValue={person.role} error={state.fieldErrors?.role} />
        <label className="flex min-h-tap items-center gap-3 text-lg">
          <input type="checkbox" name="designated" defaultChecked={person.designated} className="h-6 w-6 shrink-0" />
          Designated person
        </label>
        {!isSelf && (
          <label className="flex min-h-tap items-center gap-3 text-lg">
            <input type="checkbox" name="disabled" defaultChecked={person.disabled} className="h-6 w-6 shrink-0" />
            Disabled (cannot sign in)
          </label>
        )}
        <FormAlert state={state} />
        <SubmitButton variant="secondary" pendingLabel="Saving…">Save <bdi>{person.name}</bdi></SubmitButton>
      </form>
    </li>
  );
}

export function WithdrawInviteButton({ inviteId, email, action: withdraw }: { inviteId: string; email: string; action: FormAction }) {
  const { state, formProps } = useFormAction(withdraw);
  return (
    <form {...formProps} className="flex flex-col gap-1">
      <input type="hidden" name="inviteId" value={inviteId} />
      <SubmitButton variant="secondary" pendingLabel="Withdrawing…" aria-label={`Withdraw the invite to ${email}`}>
        Withdraw
      </SubmitButton>
      <FormAlert state={state} />
    </form>
  );
}
