"use client";
import { useActionState } from "react";
import { SubmitButton } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { initialFormState, type FormAction } from "@/lib/forms/state";
import { REMINDER_LABELS, type ReminderKind } from "@/lib/mail/kinds";

/** One box per reminder the person's role is offered; ticked means sent. */
export function MailPreferencesForm({ kinds, on, action: save }: { kinds: ReminderKind[]; on: ReminderKind[]; action: FormAction }) {
  const [state, action] = useActionState(save, initialFormState);
  return (
    <form action={action} className="flex flex-col gap-3 rounded-xl border-2 border-ink-soft p-4" noValidate>
      <h2 className="text-xl font-bold">Reminders</h2>
      <FormAlert state={state} />
      <input type="hidden" name="shown" value={kinds.join(",")} />
      <fieldset className="flex flex-col gap-3">
        <legend className="sr-only">Reminders e-mailed to you</legend>
        {kinds.map((kind) => (
          <label key={kind} className="flex min-h-tap items-start gap-3 text-lg">
            <input type="checkbox" name={kind} defaultChecked={on.includes(kind)} className="mt-1 h-6 w-6 shrink-0" />
            <span>
              <strong>{REMINDER_LABELS[kind].title}</strong>
              <span className="block text-base">{REMINDER_LABELS[kind].about}</span>
            </span>
          </label>
        ))}
      </fieldset>
      <p className="text-base text-ink-soft">Each of these e-mails also carries a link that stops that kind alone, with no sign-in.</p>
      <SubmitButton pendingLabel="Saving…">Save e-mail choices</SubmitButton>
    </form>
  );
}
