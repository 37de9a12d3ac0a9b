"use client";
import Link from "next/link";
import { buttonClass } from "@/components/ui/button";

/** On screen only (hidden on paper): print, or go back to the check in the form. */
export function PrintToolbar({ backHref }: { backHref: string }) {
  return (
    <div className="check-print__toolbar flex flex-wrap items-center gap-3 border-b-2 border-ink bg-white px-4 py-3">
      <button type="button" onClick={() => window.print()} className={buttonClass("primary")}>
        Print
      </button>
      <Link href={backHref} className="min-h-tap content-center text-lg font-bold underline">
        Back to the load check
      </Link>
      <p className="text-base text-ink-soft">Prints on US Letter or A4, black on white.</p>
    </div>
  );
}
