"use client";
import Link from "next/link";
import { buttonClass } from "@/components/ui/button";
import { PAPER, PAPER_SIZES, type PaperSize } from "@/lib/kits/sheet";

/** On screen only (hidden on paper): the paper size, print, and back to the kit. */
export function SheetToolbar({ kitId, paper }: { kitId: string; paper: PaperSize }) {
  return (
    <div className="load-sheet__toolbar flex flex-wrap items-center gap-3 border-b-2 border-ink bg-white px-4 py-3">
      <button type="button" onClick={() => window.print()} className={buttonClass("primary")}>
        Print
      </button>
      <nav aria-label="Paper size" className="flex overflow-hidden rounded-lg border-2 border-ink">
        {PAPER_SIZES.map((size) => (
          <Link
            key={size}
            href={`/kits/${kitId}/sheet?paper=${size}`}
            aria-current={size === paper ? "page" : undefined}
            className={`flex min-h-tap min-w-tap items-center px-4 text-lg font-bold ${size === paper ? "bg-ink text-white" : "bg-white text-ink underline"}`}
          >
            {PAPER[size].label}
          </Link>
        ))}
      </nav>
      <Link href={`/kits/${kitId}`} className="min-h-tap content-center text-lg font-bold underline">
        Back to the kit
      </Link>
    </div>
  );
}
