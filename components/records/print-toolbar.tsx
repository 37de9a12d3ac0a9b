"use client";
import { buttonClass } from "@/components/ui/button";

/** On screen only (hidden on paper): print (or save as PDF), the same as CSV, and back. */
export function PrintToolbar({ back, csv }: { back: string; csv: string }) {
  return (
    <div className="record-print__toolbar flex flex-wrap items-center gap-3 border-b-2 border-ink bg-white px-4 py-3">
      <button type="button" onClick={() => window.print()} className={buttonClass("primary")}>
        Print or save as PDF
      </button>
      <a href={csv} download className={buttonClass("secondary")}>Download CSV</a>
      <a href={back} className="min-h-tap content-center text-lg font-bold underline">Back</a>
    </div>
  );
}
