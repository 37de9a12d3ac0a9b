import type { RefObject } from "react";
import type { SecurementCheckResult } from "@/lib/securement";
import { formatNumber, groupFindings } from "@/lib/securement";
import { CautionNote } from "../caution-note";
import { SeverityIcon } from "../severity";
import { FindingList } from "./finding-list";
import { TiedownResults } from "./tiedown-results";

function plural(n: number, one: string, many: string) {
  return `${n} ${n === 1 ? one : many}`;
}

function Verdict({ result, headingRef }: { result: SecurementCheckResult; headingRef?: RefObject<HTMLHeadingElement | null> }) {
  // Counted as listed: the same finding on several tiedowns is one line.
  const groups = groupFindings(result.findings);
  const count = (s: string) => groups.filter((f) => f.severity === s).length;
  const fails = count("fail");
  const warns = count("warn");
  const notes = count("info");
  return (
    <div className={`flex flex-col gap-2 rounded-xl border-4 p-4 ${result.pass ? "border-ok bg-ok-bg" : "border-stop bg-stop-bg"}`}>
      <h2 id="verdict-heading" ref={headingRef} tabIndex={-1} className="flex items-center gap-3 text-3xl font-bold leading-tight text-ink">
        <span className={result.pass ? "text-ok" : "text-stop"}>
          {result.pass ? (
            <svg viewBox="0 0 24 24" className="h-10 w-10" fill="none" stroke="currentColor" strokeWidth="2.5" strokeLinecap="round" strokeLinejoin="round" aria-hidden="true">
              <circle cx="12" cy="12" r="10" />
              <path d="M7 12.5l3.5 3.5L17 9" />
            </svg>
          ) : (
            <SeverityIcon severity="fail" className="h-10 w-10" />
          )}
        </span>
        {result.pass ? "Meets the published minimums" : "Does not meet the published minimums"}
      </h2>
      <p className="text-lg text-ink">
        {[
          fails > 0 ? plural(fails, "finding does not meet the rule", "findings do not meet the rule") : "No finding fails the rule",
          warns > 0 ? plural(warns, "warning", "warnings") : "",
          notes > 0 ? plural(notes, "note", "notes") : "",
        ]
          .filter(Boolean)
          .map((part, i) => (
            <span key={part}>
              {i > 0 && " · "}
              <span className="whitespace-nowrap">{part}</span>
            </span>
          ))}
      </p>
    </div>
  );
}

function Figure({ label, value, sub }: { label: string; value: string; sub: string }) {
  return (
    <div className="flex flex-col rounded-lg border-2 border-ink-soft p-3">
      <dt className="text-base font-bold">{label}</dt>
      <dd className="text-3xl font-bold leading-tight">{value}</dd>
      <dd className="text-base text-ink-soft">{sub}</dd>
    </div>
  );
}

function Figures({ result: r }: { result: SecurementCheckResult }) {
  const aggregateMet = r.aggregateWllLb >= r.requiredAggregateWllLb;
  const countMet = r.tiedownsCounted >= r.minimumTiedowns;
  const diff = Math.abs(r.aggregateWllLb - r.requiredAggregateWllLb);
  return (
    <section aria-labelledby="figures-heading" className="flex flex-col gap-2">
      <h3 id="figures-heading" className="text-xl font-bold">
        The figures
      </h3>
      <dl className="grid grid-cols-2 gap-2">
        <Figure label="Aggregate WLL" value={`${formatNumber(r.aggregateWllLb)} lb`} sub={`${formatNumber(r.aggregateWllKg)} kg`} />
        <Figure label="Required" value={`${formatNumber(r.requiredAggregateWllLb)} lb`} sub={`${formatNumber(r.requiredAggregateWllKg)} kg: half of ${formatNumber(r.cargo.weightLb)} lb`} />
      </dl>
      <p className={`text-lg font-bold ${aggregateMet ? "text-ok" : "text-stop"}`}>
        {aggregateMet ? `✓ Aggregate met, ${formatNumber(diff)} lb to spare` : `✕ Aggregate short by ${formatNumber(diff)} lb`}
        <span className="font-normal text-ink"> (49 CFR 393.106(d))</span>
      </p>
      <dl className="grid grid-cols-2 gap-2">
        <Figure label="Tiedowns on the machine" value={String(r.tiedownsCounted)} sub={`of ${r.tiedowns.length} in all`} />
        <Figure
          label="Minimum number"
          value={String(r.minimumTiedowns)}
          sub={r.minimumReadings ? `${r.ruleSource}, set by its ${r.minimumReadings.setBy} figures (the ${r.minimumReadings.setBy === "metric" ? "imperial" : "metric"} give ${r.minimumReadings.setBy === "metric" ? r.minimumReadings.imperial : r.minimumReadings.metric})` : r.ruleSource}
        />
      </dl>
      <p className={`text-lg font-bold ${countMet ? "text-ok" : "text-stop"}`}>
        {countMet ? "✓ Enough tiedowns on the machine" : `✕ ${r.minimumTiedowns - r.tiedownsCounted} more needed on the machine`}
      </p>
      <p className="text-base">Rule applied: {r.rule}.</p>
    </section>
  );
}

/** The answer of a check: verdict, the caution, figures, findings, and each tiedown (`printed`: every part shown). */
export function CheckResult({
  result,
  stale = false,
  headingRef,
  printed = false,
}: {
  result: SecurementCheckResult;
  stale?: boolean;
  headingRef?: RefObject<HTMLHeadingElement | null>;
  printed?: boolean;
}) {
  return (
    <section aria-labelledby="verdict-heading" className="flex flex-col gap-4">
      {stale && (
        <p className="rounded-lg border-2 border-caution bg-caution-bg p-3 text-lg font-bold text-ink">
          The entries changed after this check. Check again to bring it up to date.
        </p>
      )}
      <Verdict result={result} headingRef={headingRef} />
      <CautionNote text={result.caution} />
      <Figures result={result} />
      <FindingList findings={result.findings} tiedownLabels={result.tiedowns.map((t) => t.label)} />
      <TiedownResults tiedowns={result.tiedowns} printed={printed} />
    </section>
  );
}
