import type { FormState } from "@/lib/forms/state";
import { StatusMark } from "./status-mark";

/**
 * The form-wide message of a server action's answer, announced when it changes: green with a
 * tick for a plain success, red with a cross for a refusal or for a recorded stop (a failed
 * check). It takes the focus when a refusal names no field.
 */
export function FormAlert({ state }: { state: FormState }) {
  const stop = !state.ok || state.tone === "stop";
  return (
    <div aria-live="polite" role="status">
      {state.message && (
        <p
          data-form-alert
          tabIndex={-1}
          className={`flex items-start gap-2 rounded-lg p-3 text-lg font-bold ${stop ? "bg-stop text-white" : "bg-ok text-white"}`}
        >
          <StatusMark ok={!stop} className="mt-0.5 h-6 w-6 shrink-0" />
          <span>{state.message}</span>
        </p>
      )}
    </div>
  );
}
