"use client";
import { useActionState } from "react";
import { SubmitButton } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { initialFormState, type FormAction } from "@/lib/forms/state";

export function UnsubscribeForm({ token, label, action: stop }: { token: string; label: string; action: FormAction }) {
  const [state, action] = useActionState(stop, initialFormState);
  return (
    <form action={action} className="flex flex-col gap-2" noValidate>
      <FormAlert state={state} />
      <input type="hidden" name="token" value={token} />
      {!state.ok && <SubmitButton pendingLabel="Stopping…">{label}</SubmitButton>}
    </form>
  );
}
