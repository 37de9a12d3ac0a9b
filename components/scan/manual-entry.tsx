"use client";
import { useState } from "react";
import { buttonClass } from "@/components/ui/button";
import { ALPHABET_HINT, EXAMPLE_TAG_CODE, readTypedTagCode } from "@/lib/tags/entry";

/** Typing the code printed under the QR: for a scuffed tag, a blocked camera or no camera. */
export function ManualEntry({
  onCode,
  busy,
  children,
  submitLabel = "Open item",
  busyLabel = "Looking up…",
  clearAfter = false,
  onTyping,
}: {
  onCode: (code: string) => void;
  /** Called as the code is typed: the screen drops the answer about the previous code. */
  onTyping?: () => void;
  busy: boolean;
  children?: React.ReactNode;
  submitLabel?: string;
  busyLabel?: string;
  /** Empty the box after each code, for entering one code after another. */
  clearAfter?: boolean;
}) {
  const [value, setValue] = useState("");
  const [error, setError] = useState<string | null>(null);

  function submit(event: React.FormEvent) {
    event.preventDefault();
    const read = readTypedTagCode(value);
    if (!read.ok) return setError(read.message);
    setError(null);
    setValue(clearAfter ? "" : read.code);
    onCode(read.code);
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2" aria-labelledby="manual-heading">
      <h2 id="manual-heading" className="text-2xl font-bold">Type the code</h2>
      <label htmlFor="tag-code" className="text-lg font-bold">Tag code</label>
      <p id="tag-code-hint" className="text-base text-ink-soft">
        The 8 characters under the QR code, like <span className="whitespace-nowrap font-mono font-bold text-ink">{EXAMPLE_TAG_CODE}</span>.
        Codes only use <span className="font-mono font-bold text-ink">{ALPHABET_HINT}</span> (never 0, O, 1, I, L, 2, Z, 5, S, 8, B, U or V).
      </p>
      <input
        id="tag-code"
        name="code"
        value={value}
        onChange={(e) => {
          setValue(e.target.value);
          if (error) setError(null);
          onTyping?.();
        }}
        autoCapitalize="characters"
        autoComplete="off"
        autoCorrect="off"
        spellCheck={false}
        inputMode="text"
        enterKeyHint="go"
        maxLength={200}
        placeholder="____-____"
        aria-invalid={error ? true : undefined}
        aria-describedby="tag-code-hint tag-code-error"
        className={`min-h-16 rounded-lg border-4 bg-white px-3 font-mono text-3xl font-bold uppercase tracking-widest placeholder:text-ink-faint ${
          error ? "border-stop" : "border-ink"
        }`}
      />
      <p id="tag-code-error" aria-live="polite" className="min-h-6 text-lg font-bold text-stop">
        {error}
      </p>
      {children}
      <button type="submit" disabled={busy} className={buttonClass("primary", "w-full", "large")}>
        {busy ? busyLabel : submitLabel}
      </button>
    </form>
  );
}
