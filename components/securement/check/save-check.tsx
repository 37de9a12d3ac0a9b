"use client";
import Link from "next/link";
import { useState } from "react";
import { Field } from "@/components/ui/field";

/** The check as saved, when one is open in the form. */
export interface OpenCheck {
  id: string;
  name: string;
  mayChange: boolean;
}

/**
 * Saves the check in the form under a name: over the open one (when this person may
 * change it) or as a new one. `error` is the refusal of the last save, `status` its outcome.
 */
export function SaveCheck({
  open,
  pending,
  error,
  status,
  onSave,
}: {
  open: OpenCheck | null;
  pending: boolean;
  error?: string;
  status?: string;
  onSave: (input: { id?: string; name: string }) => void;
}) {
  const [name, setName] = useState(open?.name ?? "");
  const [forOpen, setForOpen] = useState(open?.id);
  if (open?.id !== forOpen) {
    // Another saved check was opened (or the form started afresh): take its name.
    setForOpen(open?.id);
    setName(open?.name ?? "");
  }
  const trimmed = name.trim();
  const overOpen = open !== null && open.mayChange;
  return (
    <section aria-labelledby="save-heading" className="flex flex-col gap-2 rounded-xl border-2 border-ink bg-white p-3">
      <h2 id="save-heading" className="text-xl font-bold">
        Save this check
      </h2>
      {open && (
        <p className="text-base">
          Open: <strong>{open.name}</strong>
          {!open.mayChange && " (saved by someone else: save it under a new name to keep your changes)"}
        </p>
      )}
      <Field name="check-name" label="Name of this check" value={name} onChange={(e) => setName(e.target.value)} placeholder="Unit 12 on the 20 ft tilt deck" autoComplete="off" maxLength={80} error={error} />
      <div className="grid grid-cols-1 gap-2 sm:grid-cols-2">
        {overOpen && (
          <button
            type="button"
            disabled={pending || !trimmed}
            onClick={() => onSave({ id: open.id, name: trimmed })}
            className="min-h-tap rounded-lg border-2 border-ink bg-signal px-3 text-lg font-bold disabled:opacity-60"
          >
            Save changes to “{open.name}”
          </button>
        )}
        <button
          type="button"
          disabled={pending || !trimmed || (open !== null && trimmed.toLowerCase() === open.name.toLowerCase())}
          onClick={() => onSave({ name: trimmed })}
          className={`min-h-tap rounded-lg border-2 border-ink px-3 text-lg font-bold disabled:opacity-60 ${overOpen ? "bg-white" : "bg-signal"}`}
        >
          {open ? "Save as a new check" : "Save"}
        </button>
      </div>
      <p role="status" className="min-h-6 text-base font-bold">
        {status}
      </p>
      {open ? (
        <Link href={`/checks/${open.id}/print`} className="flex min-h-tap items-center justify-center rounded-lg border-2 border-ink bg-white px-3 text-lg font-bold">
          Print “{open.name}” as saved
        </Link>
      ) : (
        <p className="text-base text-ink-soft">Saved checks can be opened again from the list above, and printed.</p>
      )}
    </section>
  );
}
