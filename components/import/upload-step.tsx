"use client";
import { useId, useRef, useState } from "react";
import { buttonClass } from "@/components/ui/button-class";

/** Step 1: a CSV file, dropped or chosen, and the template to start from. */
export function UploadStep({ onFile, busy }: { onFile: (f: File | undefined) => void; busy: boolean }) {
  const [over, setOver] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  const id = useId();
  return (
    <section aria-labelledby={`${id}-h`} className="flex flex-col gap-3">
      <h2 id={`${id}-h`} className="text-xl font-bold">1. Choose the file</h2>
      <label
        htmlFor={`${id}-file`}
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={(e) => {
          e.preventDefault();
          setOver(false);
          onFile(e.dataTransfer.files[0]);
        }}
        className={`flex min-h-48 cursor-pointer flex-col items-center justify-center gap-2 rounded-xl border-4 border-dashed p-6 text-center ${over ? "border-ink bg-signal/30" : "border-ink-soft bg-white"}`}
      >
        {busy ? (
          <span className="text-2xl font-bold">Reading the file…</span>
        ) : (
          <>
            <span className="hidden text-2xl font-bold md:block">Drop the CSV file here</span>
            <span className="hidden text-lg md:block">or</span>
            <span className={buttonClass("primary")}>Choose a CSV file</span>
          </>
        )}
        <span className="text-base text-ink-soft">Comma, semicolon or tab separated; up to 50 MB.</span>
      </label>
      <input
        ref={input}
        id={`${id}-file`}
        type="file"
        aria-label="CSV file"
        accept=".csv,.txt,.tsv,text/csv,text/plain,text/tab-separated-values"
        className="sr-only"
        disabled={busy}
        onChange={(e) => {
          onFile(e.target.files?.[0]);
          e.target.value = "";
        }}
      />
      <p className="text-lg">
        Not sure which columns?{" "}
        <a href="/api/v1/imports/template.csv" className="font-bold underline">Download the template</a> (the columns the import reads, with example rows).
      </p>
    </section>
  );
}
