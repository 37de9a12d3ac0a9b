"use client";
import { useActionState } from "react";
import { buttonClass } from "@/components/ui/button-class";
import { initialFormState, type FormAction } from "@/lib/forms/state";

export function SignOutButton({ action: signOut }: { action: FormAction }) {
  const [, action, pending] = useActionState(signOut, initialFormState);
  return (
    <form action={action}>
      <button type="submit" disabled={pending} className={buttonClass("on-dark", "", "small")}>
        Sign out
      </button>
    </form>
  );
}
