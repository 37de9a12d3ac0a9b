import type { ReactNode } from "react";

/**
 * A chart with its words: a heading, the figures in a sentence, the picture (hidden from
 * screen readers, which get the table), and the table of its figures, each linking to its
 * rows, folded under the picture so that the page stays a glance.
 */
export function ChartFigure({ id, title, summary, chart, table }: { id: string; title: string; summary: ReactNode; chart: ReactNode; table: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex min-w-0 flex-col gap-2 rounded-xl border-2 border-idle p-4">
      <h2 id={id} className="text-xl font-bold">{title}</h2>
      <p className="text-lg">{summary}</p>
      <div aria-hidden="true" className="min-h-48">{chart}</div>
      <details className="group">
        <summary className="flex min-h-tap cursor-pointer items-center text-lg font-bold underline">The figures, each with its list</summary>
        {table}
      </details>
    </section>
  );
}

export const TH = "py-2 pr-3 text-left";
export const TD = "py-1 pr-3";

/** A figure that opens the rows behind it. */
export function FigureLink({ href, count, label }: { href: string; count: number; label: string }) {
  return (
    <a href={href} aria-label={`${count.toLocaleString("en-US")} ${label}`} className="inline-flex min-h-tap min-w-tap items-center font-bold underline">
      {count.toLocaleString("en-US")}
    </a>
  );
}
