"use client";
import { useEffect, useId, useRef, useState } from "react";
import type { Machine, Trailer } from "@/lib/kits/model";
import { bandWords, formatMetres, inBandRange, placeMachine, positionLimits, type Placement } from "@/lib/kits/placement";
import { formatNumber, KG_PER_LB, M_PER_FT, MM_PER_IN } from "@/lib/securement";
import { SEVERITY_BORDER, SEVERITY_TEXT, SeverityLabel } from "@/components/securement/severity";

type DistanceUnit = "m" | "ft" | "in";
const MM_PER: Record<DistanceUnit, number> = { m: 1000, ft: M_PER_FT * 1000, in: MM_PER_IN };
const DECIMALS: Record<DistanceUnit, number> = { m: 2, ft: 2, in: 1 };
/** The position is saved this long after the planner stops moving the machine. */
const SETTLE_MS = 400;

function asText(mm: number, unit: DistanceUnit): string {
  return String(Number((mm / MM_PER[unit]).toFixed(DECIMALS[unit])));
}

function kg(lb: number): string {
  return `${formatNumber(lb * KG_PER_LB)} kg`;
}

function percent(share: number): string {
  return `${formatNumber(share * 100)} %`;
}

/** The tongue share in words, with a mark that repeats them. */
function tongueWords(p: Placement): { words: string; mark: string; tone: string } {
  if (p.tongueWeightLb < 0) return { words: "Negative: the trailer will lift the hitch", mark: "✕", tone: "text-stop" };
  if (p.tongueWeightShare < p.band.min) return { words: "Below the band", mark: "!", tone: "text-caution" };
  if (p.tongueWeightShare > p.band.max) return { words: "Above the band", mark: "!", tone: "text-caution" };
  return { words: "In the band", mark: "✓", tone: "text-ok" };
}

/**
 * Where the machine sits on the deck: a slider and a typed distance for the machine's front,
 * measured back from the deck front, and at once the tongue weight, its share of the loaded
 * trailer's weight against the band (with its source and the in-band positions marked on the
 * slider), the axle-group load, and the loaded weight against the GVWR, with the findings and
 * the caution. `onChange(mm)` is called once the position the planner chose settles
 * (SETTLE_MS after the last move), with whole millimetres, never for the position it was
 * opened with; the kit page saves it with `PUT /api/v1/kits/{id}/placement`. A machine not
 * placed yet (`initialMm` null) is shown at the deck front, said so, with a button that
 * places it there. `disabled` shows the figures without letting the machine be moved.
 */
export function PlacementControl({
  machine,
  trailer,
  initialMm,
  onChange,
  system = "imperial",
  level = 2,
  disabled = false,
  disabledWhy,
}: {
  machine: Machine;
  trailer: Trailer;
  initialMm: number | null;
  onChange?: (mm: number) => void;
  system?: "imperial" | "metric";
  level?: 2 | 3;
  disabled?: boolean;
  /** Said under the heading when `disabled`: why the machine cannot be moved here. */
  disabledWhy?: string;
}) {
  const id = useId();
  const H = level === 2 ? "h2" : "h3";
  const limits = positionLimits(machine, trailer);
  const [mm, setMm] = useState(() => initialMm ?? 0);
  const [unit, setUnit] = useState<DistanceUnit>(system === "metric" ? "m" : "ft");
  const [text, setText] = useState(() => asText(initialMm ?? 0, system === "metric" ? "m" : "ft"));
  const [error, setError] = useState<string | null>(null);
  const [placed, setPlaced] = useState(initialMm !== null);
  const reported = useRef(initialMm);
  const touched = useRef(false);
  const report = useRef(onChange);
  useEffect(() => {
    report.current = onChange;
  }, [onChange]);

  useEffect(() => {
    // Only a position the planner chose is reported: opening the control saves nothing.
    if (!touched.current || mm === reported.current) return;
    const timer = setTimeout(() => {
      reported.current = mm;
      setPlaced(true);
      report.current?.(mm);
    }, SETTLE_MS);
    return () => clearTimeout(timer);
  }, [mm]);

  // Without the trailer's hitch geometry the machine can still be placed (the deck picture
  // and a proposed kit use where it sits); only the figures wait for the measurements.
  const unmeasured =
    trailer.hitchToDeckFrontMm === null
      ? `Measure ${trailer.name}'s distance from the hitch point to the front of its deck, and enter it on the trailer, to work out the tongue weight.`
      : !(trailer.hitchToAxleMm > 0)
        ? `Enter ${trailer.name}'s distance from the hitch point to its axle centre to work out the tongue weight.`
        : null;
  const p = unmeasured ? null : placeMachine(machine, trailer, mm);
  const range = unmeasured ? null : inBandRange(machine, trailer);
  const span = Math.max(1, limits.toMm - limits.fromMm);
  const at = (x: number) => `calc(1.5rem + ${Math.min(1, Math.max(0, (x - limits.fromMm) / span))} * (100% - 3rem))`;

  const move = (next: number) => {
    touched.current = true;
    setMm(next);
    setText(asText(next, unit));
    setError(null);
  };
  const typed = (value: string) => {
    setText(value);
    const n = Number(value.replace(",", "."));
    if (value.trim() === "" || !Number.isFinite(n) || n < 0) {
      setError(`Enter the distance in ${unit} as a number of 0 or more, e.g. ${unit === "in" ? "24" : "0.6"}.`);
      return;
    }
    setError(null);
    touched.current = true;
    setMm(Math.round(n * MM_PER[unit]));
  };
  const placeAtFront = () => {
    touched.current = true;
    reported.current = limits.fromMm;
    setMm(limits.fromMm);
    setText(asText(limits.fromMm, unit));
    setError(null);
    setPlaced(true);
    report.current?.(limits.fromMm);
  };

  return (
    <section aria-labelledby={`${id}-h`} className="flex flex-col gap-4">
      <H id={`${id}-h`} className="text-xl font-bold">
        Where the machine sits
      </H>
      {disabled && disabledWhy && <p className="text-lg">{disabledWhy}</p>}
      {!placed && (
        <div className="flex flex-col gap-2 rounded-lg border-2 border-caution bg-caution-bg p-3" data-testid="not-placed">
          <p className="text-lg font-bold text-caution">
            <span aria-hidden="true">! </span>Not placed yet: {p ? <>the figures below are for {machine.name}&apos;s front at the deck front.</> : <>drawn with its front at the deck front.</>}
          </p>
          {onChange && !disabled && (
            <>
              <p className="text-base">Slide or type where it will sit, or place it at the deck front.</p>
              <button type="button" onClick={placeAtFront} className="inline-flex min-h-tap items-center justify-center self-start rounded-lg border-2 border-ink bg-white px-5 text-lg font-bold text-ink hover:bg-idle-bg">
                Place it at the deck front
              </button>
            </>
          )}
        </div>
      )}

      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-slider`} className="text-base font-bold">
          {machine.name}&apos;s front, back from the deck front: {formatMetres(mm)}
        </label>
        <input
          id={`${id}-slider`}
          type="range"
          min={limits.fromMm}
          max={limits.toMm}
          step={10}
          value={Math.min(Math.max(mm, limits.fromMm), limits.toMm)}
          disabled={disabled || limits.toMm === limits.fromMm}
          onChange={(e) => move(Number(e.target.value))}
          aria-valuetext={p ? `${formatMetres(mm)}; tongue weight ${percent(p.tongueWeightShare)} of the loaded weight, ${tongueWords(p).words.toLowerCase()}` : formatMetres(mm)}
          aria-describedby={p ? `${id}-band` : undefined}
          className="h-12 w-full cursor-pointer appearance-none bg-transparent disabled:cursor-not-allowed [&::-moz-range-thumb]:h-12 [&::-moz-range-thumb]:w-12 [&::-moz-range-thumb]:rounded-full [&::-moz-range-thumb]:border-4 [&::-moz-range-thumb]:border-white [&::-moz-range-thumb]:bg-ink [&::-moz-range-track]:h-3 [&::-moz-range-track]:rounded-full [&::-moz-range-track]:bg-idle-bg [&::-webkit-slider-runnable-track]:h-3 [&::-webkit-slider-runnable-track]:rounded-full [&::-webkit-slider-runnable-track]:bg-idle-bg [&::-webkit-slider-thumb]:-mt-[18px] [&::-webkit-slider-thumb]:h-12 [&::-webkit-slider-thumb]:w-12 [&::-webkit-slider-thumb]:appearance-none [&::-webkit-slider-thumb]:rounded-full [&::-webkit-slider-thumb]:border-4 [&::-webkit-slider-thumb]:border-white [&::-webkit-slider-thumb]:bg-ink [&::-webkit-slider-thumb]:shadow"
        />
        <div className="relative h-5" aria-hidden="true">
          <div className="absolute inset-y-1 left-6 right-6 rounded bg-idle-bg" />
          {range && (
            <div
              className="absolute inset-y-0 rounded border-2 border-ok bg-[repeating-linear-gradient(135deg,#dcfce7_0_6px,#166534_6px_9px)]"
              style={{ left: at(range.fromMm), width: `max(6px, calc(${at(range.toMm)} - ${at(range.fromMm)}))` }}
            />
          )}
          <div className="absolute -top-1 h-7 w-1 -translate-x-1/2 bg-ink" style={{ left: at(mm) }} />
        </div>
        <div className="flex justify-between text-sm text-ink-soft" aria-hidden="true">
          <span>Deck front</span>
          <span>Rear at the deck end</span>
        </div>
        {p && (
        <p id={`${id}-band`} className="text-base">
          {range ? (
            <>
              <span className="font-bold text-ok">Striped: in the band</span> from {formatMetres(range.fromMm)} to {formatMetres(range.toMm)}.
            </>
          ) : (
            <span className="font-bold text-caution">No position on this deck keeps the tongue weight in the band.</span>
          )}
        </p>
        )}
      </div>

      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-typed`} className="text-base font-bold">
          Or type the distance
        </label>
        <div className="flex items-stretch gap-2">
          <input
            id={`${id}-typed`}
            value={text}
            onChange={(e) => typed(e.target.value)}
            disabled={disabled}
            inputMode="decimal"
            autoComplete="off"
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? `${id}-typed-error` : undefined}
            className={`min-h-tap w-full min-w-0 rounded-lg border-2 bg-white px-3 text-xl font-bold disabled:bg-idle-bg ${error ? "border-stop" : "border-ink-soft"}`}
          />
          <div role="radiogroup" aria-label="Distance unit" className="flex shrink-0 overflow-hidden rounded-lg border-2 border-ink">
            {(["m", "ft", "in"] as const).map((u) => (
              <button
                key={u}
                type="button"
                role="radio"
                aria-checked={u === unit}
                onClick={() => {
                  setUnit(u);
                  setText(asText(mm, u));
                  setError(null);
                }}
                className={`min-h-tap min-w-tap px-3 text-lg font-bold ${u === unit ? "bg-ink text-white" : "bg-white text-ink"}`}
              >
                {u}
              </button>
            ))}
          </div>
        </div>
        {error && (
          <p id={`${id}-typed-error`} className="text-sm font-bold text-stop">
            ✕ {error}
          </p>
        )}
      </div>

      {p ? <Figures p={p} /> : <p className="text-lg" data-testid="placement-unmeasured">{unmeasured}</p>}
    </section>
  );
}

/** The figures of a placement, its findings and the caution. */
function Figures({ p }: { p: Placement }) {
  const tongue = tongueWords(p);
  const over = p.trailerGrossLb - p.gvwrLb;
  return (
    <>
      <dl className="grid grid-cols-1 gap-3 sm:grid-cols-2" aria-live="polite">
        <div className="rounded-lg border-2 border-ink-soft p-3">
          <dt className="text-base font-bold">Tongue weight (on the hitch)</dt>
          <dd className="text-2xl font-bold" data-testid="tongue-weight">{formatNumber(p.tongueWeightLb)} lb</dd>
          <dd className="text-base">
            {kg(p.tongueWeightLb)} · {percent(p.tongueWeightShare)} of the loaded weight
          </dd>
          <dd className={`text-lg font-bold ${tongue.tone}`}>
            <span aria-hidden="true">{tongue.mark} </span>
            {tongue.words}
          </dd>
        </div>
        <div className="rounded-lg border-2 border-ink-soft p-3">
          <dt className="text-base font-bold">Loaded trailer against its GVWR</dt>
          <dd className="text-2xl font-bold">
            {formatNumber(p.trailerGrossLb)} lb <span className="text-lg font-normal">of {formatNumber(p.gvwrLb)} lb</span>
          </dd>
          <dd className="text-base">
            {kg(p.trailerGrossLb)} of {kg(p.gvwrLb)}
          </dd>
          <dd className={`text-lg font-bold ${over > 0 ? "text-stop" : "text-ok"}`}>
            <span aria-hidden="true">{over > 0 ? "✕ " : "✓ "}</span>
            {over > 0 ? `${formatNumber(over)} lb over the GVWR` : `${formatNumber(-over)} lb under the GVWR`}
          </dd>
        </div>
        <div className="rounded-lg border-2 border-ink-soft p-3">
          <dt className="text-base font-bold">Axle-group load</dt>
          <dd className="text-2xl font-bold">{formatNumber(p.axleLoadLb)} lb</dd>
          <dd className="text-base">{kg(p.axleLoadLb)}</dd>
        </div>
        <div className="rounded-lg border-2 border-ink-soft p-3">
          <dt className="text-base font-bold">Band for this hitch</dt>
          <dd className="text-2xl font-bold">
            {bandWords(p.band)}
          </dd>
          <dd className="text-base">
            {formatNumber(p.band.minLb)}–{formatNumber(p.band.maxLb)} lb at this loaded weight
          </dd>
          <dd className="text-sm text-ink-soft">Source: {p.band.source}</dd>
          {p.band.published.length > 1 && (
            <dd className="text-sm text-ink-soft">
              Published: {p.band.published.map((b) => `${bandWords(b)} (${b.source.split(":")[0]})`).join("; ")}
            </dd>
          )}
        </div>
      </dl>

      <ul className="flex flex-col gap-2" aria-label="What the position means">
        {p.findings.map((f) => (
          <li key={f.code} className={`flex flex-col gap-1 rounded-lg border-2 border-l-8 bg-white p-3 ${SEVERITY_BORDER[f.severity]}`} data-code={f.code}>
            <span className={SEVERITY_TEXT[f.severity]}>
              <SeverityLabel severity={f.severity} />
            </span>
            <p className="text-lg">{f.message}</p>
            <p className="text-sm text-ink-soft">Source: {f.source}</p>
          </li>
        ))}
      </ul>

      <aside aria-label="What these figures are" className="rounded-lg border-2 border-caution bg-caution-bg p-3 text-base">
        <p className="mb-1 font-bold text-caution">An estimate</p>
        <p>{p.caution}</p>
      </aside>
    </>
  );
}
