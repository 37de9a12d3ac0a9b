"use client";
import { CautionNote } from "@/components/securement/caution-note";
import { FindingList } from "@/components/securement/check/finding-list";
import { SeverityIcon } from "@/components/securement/severity";
import { writtenDate } from "@/lib/time";
import { formatCheckWeight, type UnitSystem } from "@/lib/kits/display";
import type { KitJson } from "@/lib/kits/answers";
import { bandWords } from "@/lib/kits/placement";
import { formatNumber } from "@/lib/securement";
import { useKit } from "./use-kit";

function plural(n: number, one: string, many = `${one}s`) {
  return `${n} ${n === 1 ? one : many}`;
}

/** Why the kit does or does not pass, in one sentence a planner can act on. */
function headline(kit: KitJson): string {
  if (kit.pass) return `Meets the published minimums, and every part may be used on ${writtenDate(kit.date)}.`;
  const fails = kit.check.findings.filter((f) => f.severity === "fail").length;
  const placed = placementFailsOf(kit).length;
  const parts = [
    fails ? plural(fails, "finding does not meet the rule", "findings do not meet the rule") : "",
    kit.blockers.length ? `${plural(kit.blockers.length, "part")} may not be used on ${writtenDate(kit.date)}` : "",
    placed ? "where the machine sits fails the hitch or the GVWR" : "",
  ].filter(Boolean);
  return `${parts.join("; ")}.`.replace(/^./, (c) => c.toUpperCase());
}

function placementFailsOf(kit: KitJson) {
  return kit.placement?.findings.filter((f) => f.severity === "fail") ?? [];
}

/** What stops the kit, most serious first: the rule's findings, gear out of use that day, then where the machine sits. */
function Reasons({ kit }: { kit: KitJson }) {
  const reasons = [
    ...kit.check.findings.filter((f) => f.severity === "fail").map((f) => `${f.message} (${f.source})`),
    ...kit.blockers.map((b) => b.message),
    ...placementFailsOf(kit).map((f) => f.message),
  ];
  const shown = reasons.slice(0, 4);
  return (
    <ul className="flex flex-col gap-1 text-lg font-bold text-stop" data-testid="kit-reasons">
      {shown.map((r, i) => (
        <li key={i} className="flex gap-2">
          <span aria-hidden="true">✕</span>
          <span>{r}</span>
        </li>
      ))}
      {reasons.length > shown.length && <li>and {reasons.length - shown.length} more below.</li>}
    </ul>
  );
}

/** The live verdict at the top of the builder: pass or not in words, and the two figures that decide it. */
export function KitVerdictSummary({ kitId, units }: { kitId: string; units: UnitSystem }) {
  const { data: kit } = useKit(kitId);
  if (!kit) return null;
  const c = kit.check;
  const aggregateMet = c.aggregateWllLb >= c.requiredAggregateWllLb;
  const countMet = c.tiedownsCounted >= c.minimumTiedowns;
  return (
    <section aria-labelledby="verdict-heading" aria-live="polite" className={`flex flex-col gap-2 rounded-xl border-4 p-3 ${kit.pass ? "border-ok bg-ok-bg" : "border-stop bg-stop-bg"}`} data-testid="kit-verdict" data-pass={kit.pass}>
      <h2 id="verdict-heading" className="flex items-start gap-2 text-2xl font-bold leading-tight text-ink">
        <span className={kit.pass ? "text-ok" : "text-stop"}>
          {kit.pass ? (
            <svg viewBox="0 0 24 24" className="h-8 w-8" fill="none" stroke="currentColor" strokeWidth="2.5" strokeLinecap="round" strokeLinejoin="round" aria-hidden="true">
              <circle cx="12" cy="12" r="10" />
              <path d="M7 12.5l3.5 3.5L17 9" />
            </svg>
          ) : (
            <SeverityIcon severity="fail" className="h-8 w-8" />
          )}
        </span>
        <span>{kit.pass ? "Passes the check" : "Does not pass"}</span>
      </h2>
      <p className="text-lg text-ink">{headline(kit)}</p>
      {!kit.pass && <Reasons kit={kit} />}
      <ul className="flex flex-col gap-1 text-lg text-ink">
        <li className={aggregateMet ? "" : "font-bold text-stop"}>
          <span aria-hidden="true">{aggregateMet ? "✓ " : "✕ "}</span>
          Aggregate WLL {formatCheckWeight(c.aggregateWllLb, c.aggregateWllKg, units)} of {formatCheckWeight(c.requiredAggregateWllLb, c.requiredAggregateWllKg, units)} needed
        </li>
        <li className={countMet ? "" : "font-bold text-stop"}>
          <span aria-hidden="true">{countMet ? "✓ " : "✕ "}</span>
          {plural(c.tiedownsCounted, "tiedown")} on the machine, {c.minimumTiedowns} needed ({c.ruleSource})
        </li>
        <PlacementLine kit={kit} />
      </ul>
      <a href="#verdict-details" className="flex min-h-tap items-center text-lg font-bold underline">
        Every figure, finding and reminder
      </a>
    </section>
  );
}

/** The hitch in one line: the tongue weight and its band, or why it is not worked out. */
function PlacementLine({ kit }: { kit: KitJson }) {
  const p = kit.placement;
  if (!p) {
    return (
      <li data-testid="verdict-placement">
        <span aria-hidden="true">• </span>
        Tongue weight not worked out: {kit.placementMissing.join(" ")}{" "}
        <a href="#placement" className="font-bold underline">
          Where the machine sits
        </a>
      </li>
    );
  }
  const fails = placementFailsOf(kit);
  const share = `${formatNumber(p.tongueWeightShare * 100)} %`;
  const band = bandWords(p.band);
  const inBand = p.tongueWeightShare >= p.band.min && p.tongueWeightShare <= p.band.max;
  return (
    <li className={fails.length ? "font-bold text-stop" : inBand ? "" : "font-bold text-caution"} data-testid="verdict-placement">
      <span aria-hidden="true">{fails.length ? "✕ " : inBand ? "✓ " : "! "}</span>
      Tongue weight {formatNumber(p.tongueWeightLb)} lb, {share} of the loaded {formatNumber(p.trailerGrossLb)} lb (band {band}
      {inBand ? "" : ", outside it"}); GVWR {formatNumber(p.gvwrLb)} lb{p.trailerGrossLb > p.gvwrLb ? ", over it" : ""}.
    </li>
  );
}

function Figure({ label, value, sub }: { label: string; value: string; sub: string }) {
  return (
    <div className="flex flex-col rounded-lg border-2 border-ink-soft bg-white p-3">
      <dt className="text-base font-bold">{label}</dt>
      <dd className="text-2xl font-bold leading-tight">{value}</dd>
      <dd className="text-base text-ink-soft">{sub}</dd>
    </div>
  );
}

const PRACTICE_MARK = { met: "✓", unmet: "!", reminder: "•" };

/** Everything behind the verdict: figures with their rules, blockers, findings with sources, practice points, the caution. */
export function KitVerdictDetails({ kitId, units }: { kitId: string; units: UnitSystem }) {
  const { data: kit } = useKit(kitId);
  if (!kit) return null;
  const c = kit.check;
  return (
    <section id="verdict-details" aria-labelledby="details-heading" className="flex scroll-mt-20 flex-col gap-4">
      <h2 id="details-heading" className="text-2xl font-bold">The check in full</h2>
      <CautionNote text={c.caution} />
      <dl className="grid grid-cols-1 gap-2 sm:grid-cols-2">
        <Figure label="Aggregate WLL" value={formatCheckWeight(c.aggregateWllLb, c.aggregateWllKg, units)} sub="Each tiedown counts half its WLL, or all of it when it runs across (49 CFR 393.106(d))" />
        <Figure label="Required" value={formatCheckWeight(c.requiredAggregateWllLb, c.requiredAggregateWllKg, units)} sub={`Half of the machine's ${formatCheckWeight(c.cargo.weightLb, c.cargo.weightKg, units)}`} />
        <Figure label="Tiedowns on the machine" value={`${c.tiedownsCounted}, ${c.minimumTiedowns} needed`} sub={`${c.rule} (${c.ruleSource})`} />
      </dl>

      <section aria-labelledby="blockers-heading" className="flex flex-col gap-2">
        <h3 id="blockers-heading" className="text-xl font-bold">Gear that may not be used on {writtenDate(kit.date)} ({kit.blockers.length})</h3>
        {kit.blockers.length === 0 ? (
          <p className="text-lg">None: every item and anchor point may be used that day.</p>
        ) : (
          <ul className="flex flex-col gap-2">
            {kit.blockers.map((b, i) => (
              <li key={`${b.code}-${i}`} className="flex gap-2 rounded-lg border-2 border-l-8 border-stop bg-white p-3 text-lg" data-code={b.code}>
                <SeverityIcon severity="fail" className="h-6 w-6 text-stop" />
                <span>{b.message}</span>
              </li>
            ))}
          </ul>
        )}
      </section>

      <FindingList findings={c.findings} />

      <section aria-labelledby="practice-heading" className="flex flex-col gap-2">
        <h3 id="practice-heading" className="text-xl font-bold">Common practice, beyond the rule</h3>
        <ul className="flex flex-col gap-2">
          {kit.practice.map((p) => {
            const kind = p.met === null ? "reminder" : p.met ? "met" : "unmet";
            return (
              <li key={p.code} className={`flex gap-2 rounded-lg border-2 bg-white p-3 text-lg ${kind === "unmet" ? "border-caution" : "border-ink-soft"}`} data-practice={p.code} data-met={String(p.met)}>
                <span aria-hidden="true" className={`w-5 shrink-0 text-center font-bold ${kind === "unmet" ? "text-caution" : kind === "met" ? "text-ok" : "text-ink"}`}>{PRACTICE_MARK[kind]}</span>
                <span>
                  <span className="font-bold">{kind === "met" ? "Done: " : kind === "unmet" ? "Not yet: " : "Reminder: "}</span>
                  {p.message}
                  <span className="block text-sm text-ink-soft">Source: {p.source}</span>
                </span>
              </li>
            );
          })}
        </ul>
      </section>
    </section>
  );
}
