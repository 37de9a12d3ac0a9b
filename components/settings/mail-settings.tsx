"use client";
import { useActionState } from "react";
import { SubmitButton } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { initialFormState, type FormAction } from "@/lib/forms/state";

export function DigestTimeForm({ digestTime, timeZone, action: save }: { digestTime: string; timeZone: string; action: FormAction }) {
  const [state, action] = useActionState(save, initialFormState);
  return (
    <form action={action} className="flex flex-col gap-2" noValidate>
      <FormAlert state={state} />
      <Field
        label="Daily digest at"
        name="digestTime"
        type="time"
        step={60}
        defaultValue={state.values?.digestTime ?? digestTime}
        hint={`On your company's clock (${timeZone.replaceAll("_", " ")}). Owners and designated people get what is overdue, due this week or tagged out; planners hear about tomorrow's kits that do not pass.`}
        error={state.fieldErrors?.digestTime}
      />
      <SubmitButton pendingLabel="Saving…">Save digest time</SubmitButton>
    </form>
  );
}

export function ResendMailButton({ messageId, to, action: resend }: { messageId: string; to: string; action: FormAction }) {
  const [state, action] = useActionState(resend, initialFormState);
  return (
    <form action={action}>
      <input type="hidden" name="messageId" value={messageId} />
      {!state.ok && (
        <SubmitButton variant="secondary" pendingLabel="Queueing…" aria-label={`Send again to ${to}`}>
          Send again
        </SubmitButton>
      )}
      <FormAlert state={state} />
    </form>
  );
}
