"use client";
import { useActionState } from "react";
import { signOutAction } from "@/app/(auth)/actions";
import { initialFormState } from "@/lib/forms/state";

export function SignOutButton() {
  const [, action, pending] = useActionState(signOutAction, initialFormState);
  return (
    <form action={action}>
      <button type="submit" disabled={pending} className="min-h-tap rounded-lg border-2 border-white px-3 text-base font-bold text-white hover:bg-deck-light">
        Sign out
      </button>
    </form>
  );
}
