import { KitDeck } from "@/components/kits/deck/kit-deck";
import { SEVERITY_WORDS } from "@/components/securement/severity";
import { ATTACHMENT_LABELS } from "@/lib/forms/securement-draft";
import { kitFromJson, type KitJson } from "@/lib/kits/answers";
import { writtenDate } from "@/lib/time";
import { deckPicture } from "@/lib/kits/deck";
import { formatCheckWeight, formatLength, formatWeight, type UnitSystem } from "@/lib/kits/display";
import { SIDE_LABELS } from "@/lib/kits/model";
import { bandWords, formatMetres, PLACEMENT_CAUTION } from "@/lib/kits/placement";
import { PRE_TRIP_REMINDERS } from "@/lib/kits/sheet";
import { formatNumber } from "@/lib/securement";
import { KIND_LABELS, type ItemKind } from "@/lib/stock/labels";
import type { QrSymbol } from "@/lib/tags/qr";

// The kit on paper, for the cab. A server component: the same deck picture as the builder,
// then everything a driver and a roadside inspector read, in words, black on white.

const MARK = { fail: "✕", warn: "!", info: "i" } as const;

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="flex flex-col">
      <dt className="text-sm font-bold uppercase tracking-wide">{label}</dt>
      <dd className="text-base leading-snug">{children}</dd>
    </div>
  );
}

/** Findings with their severity in words and their source, most serious first. */
function FindingLines({ findings, label }: { findings: readonly { severity: "fail" | "warn" | "info"; message: string; source: string }[]; label: string }) {
  if (!findings.length) return null;
  return (
    <ul className="flex flex-col gap-1 text-sm" aria-label={label}>
      {findings.map((f, i) => (
        <li key={i} className={`sheet-finding border-l-4 pl-2 ${f.severity === "fail" ? "border-stop" : f.severity === "warn" ? "border-caution" : "border-idle"}`} data-severity={f.severity}>
          <strong>
            <span aria-hidden="true">{MARK[f.severity]} </span>
            {SEVERITY_WORDS[f.severity]}:
          </strong>{" "}
          {f.message} <span className="text-ink-soft">({f.source})</span>
        </li>
      ))}
    </ul>
  );
}

function SignLine({ label }: { label: string }) {
  return (
    <div className="flex flex-col gap-1">
      <div className="h-9 border-b-2 border-ink" />
      <p className="text-sm font-bold">{label}</p>
    </div>
  );
}

/**
 * The load sheet: what the kit is for, a QR code that opens it, the deck picture, each
 * tiedown with its anchor point and items, the verdict with its figures and findings, where
 * the machine sits, the cautions, the pre-trip reminders and lines for the driver.
 */
export function LoadSheet({ kit, units, kitUrl, qr, printedAt }: { kit: KitJson; units: UnitSystem; kitUrl: string; qr: QrSymbol; printedAt: string }) {
  const c = kit.check;
  const m = kit.machine;
  const t = kit.trailer;
  const p = kit.placement;
  const anchor = (id: string) => t.anchorPoints.find((a) => a.id === id);
  const findings = [...c.findings].sort((a, b) => ["fail", "warn", "info"].indexOf(a.severity) - ["fail", "warn", "info"].indexOf(b.severity));
  return (
    <article className="load-sheet flex flex-col gap-4 text-ink" data-pass={kit.pass}>
      <header className="flex items-start justify-between gap-4 border-b-4 border-ink pb-3">
        <div className="flex min-w-0 flex-col gap-1">
          <p className="text-base font-bold uppercase tracking-wide">Load sheet · {writtenDate(kit.date)}</p>
          <h1 className="text-3xl font-bold leading-tight">{kit.job}</h1>
          {kit.site && <p className="text-lg">{kit.site}</p>}
          <p className={`mt-1 inline-flex items-center gap-2 self-start rounded-md border-2 px-2 text-lg font-bold ${kit.pass ? "border-ok text-ok" : "border-stop text-stop"}`}>
            <span aria-hidden="true">{kit.pass ? "✓" : "✕"}</span>
            {kit.pass ? "Passes the check" : "Does not pass the check: do not load as planned"} · {kit.stateLabel}
          </p>
        </div>
        <figure className="flex w-32 shrink-0 flex-col items-center gap-1">
          <svg viewBox={`0 0 ${qr.size} ${qr.size}`} shapeRendering="crispEdges" className="h-32 w-32" role="img" aria-label={`QR code: opens this kit at ${kitUrl}`} data-testid="kit-qr">
            <rect width={qr.size} height={qr.size} fill="#fff" />
            <path fill="#000" d={qr.path} />
          </svg>
          <figcaption className="text-center text-xs leading-tight">Scan to open the kit in Linkyard</figcaption>
        </figure>
      </header>

      <dl className="grid grid-cols-2 gap-x-6 gap-y-2 sheet-facts">
        <Fact label="Machine">
          <strong>{m.name}</strong> · {m.classLabel} · {formatWeight(m.weight.value, units)} · {formatLength(m.length.value, units)} long
          {m.accessories.length > 0 && ` · ${m.accessories.join(", ")}`}
          {m.articulated && ` · articulated, joint ${kit.articulationRestrained ? "locked" : "NOT recorded as locked"}`}
        </Fact>
        <Fact label="Trailer">
          <strong>{t.name}</strong> · {t.typeLabel} · deck {formatLength(t.deckLength.value, units)} · GVWR {formatWeight(t.gvwr.value, units)}
        </Fact>
        <Fact label="Date">{writtenDate(kit.date)}</Fact>
        <Fact label="Job and site">
          {kit.job}
          {kit.site ? ` · ${kit.site}` : ""}
        </Fact>
      </dl>

      <KitDeck picture={deckPicture(kitFromJson(kit), kit)} idPrefix="sheet-deck" heading="On the deck" words={false}>
        <section aria-labelledby="sheet-verdict" className="sheet-block flex flex-col gap-2">
          <h3 id="sheet-verdict" className="text-lg font-bold">
            The check (49 CFR 393)
          </h3>
          <ul className="flex flex-col gap-1 text-base">
            <li>
              <span aria-hidden="true">{c.aggregateWllLb >= c.requiredAggregateWllLb ? "✓ " : "✕ "}</span>
              Aggregate WLL <strong>{formatCheckWeight(c.aggregateWllLb, c.aggregateWllKg, units)}</strong> of {formatCheckWeight(c.requiredAggregateWllLb, c.requiredAggregateWllKg, units)} needed (49 CFR 393.106(d))
            </li>
            <li>
              <span aria-hidden="true">{c.tiedownsCounted >= c.minimumTiedowns ? "✓ " : "✕ "}</span>
              <strong>{c.tiedownsCounted}</strong> tiedowns on the machine, {c.minimumTiedowns} needed ({c.ruleSource})
            </li>
            <li>
              <span aria-hidden="true">{kit.blockers.length ? "✕ " : "✓ "}</span>
              {kit.blockers.length ? `${kit.blockers.length} part${kit.blockers.length === 1 ? "" : "s"} may not be used on this date (listed below)` : "Every item and anchor point may be used on this date"}
            </li>
          </ul>
        </section>
        <section aria-labelledby="sheet-placement" className="sheet-block flex flex-col gap-2">
          <h3 id="sheet-placement" className="text-lg font-bold">
            Where the machine sits, and the hitch
          </h3>
          {p ? (
            <>
              <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-base">
                <Fact label="Machine's front">{formatMetres(p.machineFrontFromDeckFrontMm)} back from the deck front</Fact>
                <Fact label="Tongue weight">
                  <strong>{formatNumber(p.tongueWeightLb)} lb</strong>, {formatNumber(p.tongueWeightShare * 100)} % of the loaded weight
                </Fact>
                <Fact label="Band for this hitch">
                  {bandWords(p.band)} ({formatNumber(p.band.minLb)}–{formatNumber(p.band.maxLb)} lb)
                </Fact>
                <Fact label="Axle-group load">{formatNumber(p.axleLoadLb)} lb</Fact>
                <Fact label="Loaded trailer">
                  <strong>{formatNumber(p.trailerGrossLb)} lb</strong> of {formatNumber(p.gvwrLb)} lb GVWR
                </Fact>
              </dl>
              <p className="text-sm">Band: {p.band.source}.</p>
              <FindingLines findings={p.findings} label="Placement findings" />
            </>
          ) : (
            <p className="text-base">Not worked out: {kit.placementMissing.join(" ")}</p>
          )}
        </section>
      </KitDeck>

      <section aria-labelledby="sheet-tiedowns" className="flex flex-col gap-2 print:break-before-page">
        <h2 id="sheet-tiedowns" className="text-xl font-bold">
          Tiedowns ({kit.tiedowns.length})
        </h2>
        {kit.tiedowns.length === 0 ? (
          <p className="text-base">No tiedowns planned.</p>
        ) : (
          <table className="sheet-table w-full border-collapse text-sm">
            <thead>
              <tr className="border-b-2 border-ink text-left">
                <th scope="col" className="py-1 pr-2">Tiedown</th>
                <th scope="col" className="py-1 pr-2">Anchor point</th>
                <th scope="col" className="py-1 pr-2">Items (tag code · what · grade · size · WLL)</th>
                <th scope="col" className="py-1">Counts</th>
              </tr>
            </thead>
            <tbody>
              {kit.tiedowns.map((td, i) => {
                const a = anchor(td.anchorPointId);
                return (
                  <tr key={td.id} className="border-b border-ink-faint align-top" data-testid="sheet-tiedown">
                    <td className="py-1 pr-2">
                      <strong>
                        {i + 1}. {td.label}
                      </strong>
                      <br />
                      {td.secures === "machine" ? "the machine" : `the ${td.secures}`} · {ATTACHMENT_LABELS[td.attachment].label.toLowerCase()}
                    </td>
                    <td className="py-1 pr-2">
                      {a ? (
                        <>
                          <strong>{a.label}</strong> · {SIDE_LABELS[a.side].toLowerCase()} · WLL {formatWeight(a.wll.value, units)}
                          {!a.usable.ok && <strong className="block text-stop">✕ Out of use</strong>}
                        </>
                      ) : (
                        "not on this trailer"
                      )}
                    </td>
                    <td className="py-1 pr-2">
                      {td.items.length === 0 ? (
                        "no items"
                      ) : (
                        <ul>
                          {td.items.map((it) => (
                            <li key={it.id}>
                              <strong className="font-mono">{it.tagCode}</strong> · {KIND_LABELS[it.kind as ItemKind] ?? it.kind} · {it.grade ? `grade ${it.grade}` : it.kind === "chain" ? "no grade mark" : "–"} · {it.size ? `${it.size} in` : "–"} ·{" "}
                              {it.wllLb == null ? "no WLL" : `WLL ${formatWeight(it.wllLb, units)}`}
                              {!it.usable.ok && <strong className="text-stop"> ✕ do not use</strong>}
                            </li>
                          ))}
                        </ul>
                      )}
                    </td>
                    <td className="py-1">
                      {td.result ? (td.result.rated ? `${formatNumber(td.result.wllLb)} lb WLL, counts ${formatNumber(td.result.countedWllLb)} lb` : "not rated: counts 0") : "not counted"}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        )}
      </section>

      {(findings.length > 0 || kit.blockers.length > 0) && (
        <section aria-labelledby="sheet-findings" className="flex flex-col gap-2">
          <h2 id="sheet-findings" className="text-xl font-bold">
            Findings of the check
          </h2>
          <ul className="flex flex-col gap-1 text-sm" aria-label="Findings">
            {kit.blockers.map((b, i) => (
              <li key={`b${i}`} className="sheet-finding border-l-4 border-stop pl-2" data-severity="fail">
                <strong>✕ May not be used:</strong> {b.message}
              </li>
            ))}
          </ul>
          <FindingLines findings={findings} label="Findings of the rule" />
        </section>
      )}
      <section aria-labelledby="sheet-trip" className="sheet-block flex flex-col gap-2">
        <h2 id="sheet-trip" className="text-xl font-bold">
          Before and during the trip
        </h2>
        <ul className="flex flex-col gap-1 text-base">
          {PRE_TRIP_REMINDERS.map((r) => (
            <li key={r.code} className="flex gap-2" data-reminder={r.code}>
              <span aria-hidden="true" className="inline-block h-4 w-4 shrink-0 translate-y-1 border-2 border-ink" />
              <span>
                {r.text} <span className="text-sm text-ink-soft">({r.source})</span>
              </span>
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="sheet-cautions" className="sheet-block flex flex-col gap-1 border-2 border-ink p-2 text-sm">
        <h2 id="sheet-cautions" className="text-base font-bold">
          Cautions
        </h2>
        <p>{c.caution}</p>
        <p>{PLACEMENT_CAUTION}</p>
      </section>

      <section aria-labelledby="sheet-driver" className="sheet-block flex flex-col gap-2">
        <h2 id="sheet-driver" className="text-xl font-bold">
          Driver
        </h2>
        <div className="grid grid-cols-3 gap-6">
          <SignLine label="Driver's name" />
          <SignLine label="Signature" />
          <SignLine label="Date and time" />
        </div>
      </section>

      <footer className="border-t-2 border-ink pt-1 text-xs">
        Printed {printedAt} from Linkyard · {kitUrl}
      </footer>
    </article>
  );
}
