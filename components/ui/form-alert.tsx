import type { FormState } from "@/lib/forms/state";

/** The form-wide message of a server action's answer, announced when it changes. */
export function FormAlert({ state }: { state: FormState }) {
  return (
    <div aria-live="polite" role="status">
      {state.message && (
        <p
          className={`rounded-lg border-2 p-3 text-base font-bold ${
            state.ok ? "border-ok bg-ok-bg text-ok" : "border-stop bg-stop-bg text-stop"
          }`}
        >
          {state.message}
        </p>
      )}
    </div>
  );
}
