import type { ComponentResult, TiedownResult } from "@/lib/securement";
import { formatNumber } from "@/lib/securement";
import { ATTACHMENT_LABELS } from "@/lib/forms/securement-draft";

const TYPE_WORDS: Record<string, string> = {
  chain: "chain",
  webbing: "web strap",
  "wire-rope": "wire rope",
  rope: "rope",
  "steel-strapping": "steel strapping",
  binder: "binder",
  hook: "hook",
  shackle: "shackle",
  anchor: "anchor point",
};

const BASIS_WORDS: Record<ComponentResult["basis"], string> = {
  table: "table value",
  marked: "marked WLL",
  "unmarked-rule": "rule for unmarked gear",
  "not-rated": "cannot be rated",
};

function limitedBy(t: TiedownResult): string {
  if (t.limitedBy === null) return "";
  const part = t.components[t.limitedByIndex ?? 0];
  const word = TYPE_WORDS[t.limitedBy] ?? t.limitedBy;
  const name = t.limitedByLabel ? ` “${t.limitedByLabel}”` : "";
  if (!t.rated && part?.error?.code === "BINDER_CHAIN_SIZE_OUT_OF_RANGE") return `The ${word}${name} is not made for this chain, so this tiedown counts 0.`;
  if (!t.rated) return `The ${word}${name} cannot be rated, so this tiedown counts 0.`;
  return `Limited by the ${word}${name}${part ? ` (part ${part.index + 1})` : ""}.`;
}

/** Each tiedown's WLL, what limits it, what it adds to the aggregate, and its parts. */
export function TiedownResults({ tiedowns, printed = false }: { tiedowns: readonly TiedownResult[]; printed?: boolean }) {
  return (
    <section aria-labelledby="each-heading" className="flex flex-col gap-2">
      <h3 id="each-heading" className="text-xl font-bold">
        Each tiedown
      </h3>
      <ul className="flex flex-col gap-2">
        {tiedowns.map((t) => (
          <li key={t.index} className={`flex flex-col gap-1 rounded-lg border-2 p-3 ${t.rated ? "border-ink-soft" : "border-stop"}`} data-testid={`tiedown-result-${t.index}`}>
            <p className="text-lg font-bold">
              {t.index + 1}. {t.label}
              <span className="font-normal">
                {" "}
                · holds {t.secures === "machine" ? "the machine" : `the ${t.secures}`}
              </span>
            </p>
            <p className="text-2xl font-bold">
              {formatNumber(t.wllLb)} lb <span className="text-lg font-normal">({formatNumber(t.wllKg)} kg)</span>
            </p>
            <p className={`text-base ${t.rated ? "" : "font-bold text-stop"}`}>{t.rated ? "" : "✕ "}{limitedBy(t)}</p>
            <p className="text-base">
              Adds {formatNumber(t.countedWllLb)} lb to the aggregate: {ATTACHMENT_LABELS[t.attachment].label.toLowerCase()} {ATTACHMENT_LABELS[t.attachment].counts}.
              {!t.countsTowardMinimum && " Not counted toward the minimum number, which counts tiedowns on the machine itself."}
            </p>
            <details className="mt-1" open={printed || undefined}>
              <summary className="flex min-h-tap cursor-pointer items-center text-base font-bold underline">Parts ({t.components.length})</summary>
              <ul className="flex flex-col gap-2 pl-1">
                {t.components.map((c) => (
                  <li key={c.index} className="text-base">
                    <strong>
                      {c.index + 1}. {c.description}
                    </strong>
                    {c.basis === "not-rated" ? (
                      <span className="block font-bold text-stop">✕ {c.error?.message ?? "Cannot be rated"}</span>
                    ) : (
                      <span className="block">
                        {formatNumber(c.wllLb)} lb ({formatNumber(c.wllKg)} kg), {BASIS_WORDS[c.basis]}
                        {c.status === "from-memory" ? ", from memory (not yet checked against the published text)" : ""}
                        {t.limitedByIndex === c.index ? ", the lowest" : ""}
                      </span>
                    )}
                    <span className="block text-sm text-ink-soft">Source: {c.source}</span>
                  </li>
                ))}
              </ul>
            </details>
          </li>
        ))}
      </ul>
    </section>
  );
}
