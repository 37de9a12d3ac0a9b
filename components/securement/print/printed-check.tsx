import type { SavedCheckAnswer, SecurementCheckRequest } from "@/lib/securement";
import { formatNumber, SECUREMENT_CAUTION } from "@/lib/securement";
import { ATTACHMENT_LABELS } from "@/lib/forms/securement-draft";
import { formatDateTime, zoneWords } from "@/lib/time";
import { CheckResult } from "../check/check-result";

function cargoLine(c: SecurementCheckRequest["cargo"]): string {
  const parts = [
    `${formatNumber(c.weight.value)} ${c.weight.unit}`,
    `${formatNumber(c.length.value)} ${c.length.unit} long`,
    c.kind === "machine" ? "machine on wheels or tracks" : "other cargo",
    c.blockedAtFront ? "blocked at the front" : "not blocked at the front",
  ];
  if (c.articulated) parts.push(c.articulationRestrained ? "articulated, joint restrained" : "articulated, joint not restrained");
  if (c.accessories?.length) parts.push(`accessories: ${c.accessories.join(", ")}`);
  return parts.join(" · ");
}

/**
 * A saved load check on paper: what was entered, the answer worked out now, and the caution.
 * Times are on the organisation's clock (`timeZone`), named once after the printing time.
 */
export function PrintedCheck({ check, printedAt, timeZone }: { check: SavedCheckAnswer; printedAt: Date; timeZone: string }) {
  const day = (at: Date | string) => formatDateTime(at, timeZone);
  return (
    <article className="check-print flex flex-col gap-4 px-4 py-6 text-ink">
      <header className="flex flex-col gap-1 border-b-2 border-ink pb-3">
        <p className="text-base font-bold uppercase tracking-wide">Load check</p>
        <h1 className="text-3xl font-bold leading-tight">{check.name}</h1>
        <p className="text-base">
          Saved by {check.savedBy}, {day(check.savedAt)}
          {check.updatedAt !== check.savedAt ? `; last changed by ${check.updatedBy}, ${day(check.updatedAt)}` : ""}. Printed {day(printedAt)} ({zoneWords(timeZone)}).
        </p>
        <p className="text-base">
          Checked again at printing against the rules as Linkyard applies them today; when it was saved it {check.passAtSave ? "met" : "did not meet"} the published minimums.
        </p>
      </header>

      <section aria-labelledby="entered-heading" className="flex flex-col gap-2">
        <h2 id="entered-heading" className="text-xl font-bold">
          What was checked
        </h2>
        <p className="text-lg">{cargoLine(check.request.cargo)}</p>
        <ol className="flex flex-col gap-1 pl-5 text-base" style={{ listStyle: "decimal" }}>
          {check.request.tiedowns.map((t, i) => (
            <li key={i}>
              <strong>{t.label ?? `tiedown ${i + 1}`}</strong>: holds {t.secures && t.secures !== "machine" ? `the ${t.secures}` : "the machine"}; {ATTACHMENT_LABELS[t.attachment].label.toLowerCase()};{" "}
              {(check.result?.tiedowns[i]?.components ?? []).map((c) => (c.basis === "not-rated" ? `${c.description} (not rated)` : `${c.description} ${formatNumber(c.wllLb)} lb`)).join(" · ") ||
                `${t.components.length} parts`}
            </li>
          ))}
        </ol>
      </section>

      {check.result ? (
        <CheckResult result={check.result} printed />
      ) : (
        <div role="alert" className="rounded-lg border-4 border-stop p-3 text-lg">
          <p className="font-bold">This saved check cannot be checked as it is:</p>
          <ul className="list-disc pl-5">
            {(check.issues ?? []).map((i) => (
              <li key={i.path}>
                {i.path}: {i.message}
              </li>
            ))}
          </ul>
        </div>
      )}

      <footer className="border-t-2 border-ink pt-3 text-base">
        <p>{SECUREMENT_CAUTION}</p>
        <p className="mt-1">Local rules and licensed practice govern. Sign: ____________________ Date: ____________</p>
      </footer>
    </article>
  );
}
