"use client";
import { useActionState } from "react";
import { signOutAction } from "@/app/(auth)/actions";
import { buttonClass } from "@/components/ui/button-class";
import { initialFormState } from "@/lib/forms/state";

export function SignOutButton() {
  const [, action, pending] = useActionState(signOutAction, initialFormState);
  return (
    <form action={action}>
      <button type="submit" disabled={pending} className={buttonClass("on-dark", "", "small")}>
        Sign out
      </button>
    </form>
  );
}
