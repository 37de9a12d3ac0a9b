import type { DefaultRating } from "@/lib/securement";
import { formatNumber, GRADE_NAMES, isChainGrade } from "@/lib/securement";
import { nearestValue } from "@/lib/forms/rating-lookup";
import { SeverityIcon } from "../severity";
import type { ApiError } from "../api";

const MATERIAL_WORDS: Record<DefaultRating["material"], string> = {
  chain: "chain",
  webbing: "web strap",
  "wire-rope": "wire rope (6 × 37, fiber core)",
  rope: "rope",
  "steel-strapping": "steel strapping",
};

/** "3/8 in grade 70 transport chain", "1/2 in polypropylene rope", "4 in web strap". */
export function ratingTitle(r: DefaultRating): string {
  if (r.material === "chain") {
    if (r.basis === "unmarked-rule") return `${r.size} chain with no grade mark`;
    return `${r.size} ${r.grade && isChainGrade(r.grade) ? GRADE_NAMES[r.grade] : `grade ${r.grade}`} chain`;
  }
  if (r.material === "rope") return r.basis === "unmarked-rule" ? `${r.size} rope with no label` : `${r.size} ${r.fibre?.replace(/-/g, " ")} rope`;
  return `${r.size} ${MATERIAL_WORDS[r.material]}`;
}

/** The WLL in large type, with its source and whether the value is verified. */
export function RatingResult({ rating }: { rating: DefaultRating }) {
  return (
    <section aria-labelledby="rating-heading" className="flex flex-col gap-3 rounded-xl border-4 border-ink bg-white p-4">
      <h2 id="rating-heading" className="text-xl font-bold leading-tight">
        {ratingTitle(rating)}
      </h2>
      <p className="flex flex-col leading-none" data-testid="rating-wll">
        <span className="text-6xl font-bold tracking-tight">
          {formatNumber(rating.wllLb)} <span className="text-3xl">lb</span>
        </span>
        <span className="mt-2 text-4xl font-bold">
          {formatNumber(rating.wllKg)} <span className="text-2xl">kg</span>
        </span>
      </p>
      <p className="text-lg">
        Working load limit for this gear when it carries <strong>no WLL marking</strong>.
      </p>
      {rating.rule && (
        <p className="rounded-lg border-2 border-ink p-3 text-base">
          <strong>Rated by the rule for unmarked gear.</strong> {rating.rule}.
        </p>
      )}
      {rating.notes?.map((note) => (
        <p key={note} className="rounded-lg border-2 border-caution bg-caution-bg p-3 text-base font-bold text-ink" data-testid="rating-note">
          ⚠ {note}.
        </p>
      ))}
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-base">
        <dt className="font-bold">Source</dt>
        <dd>
          {rating.source}, row {rating.row}
        </dd>
        <dt className="font-bold">Value</dt>
        <dd>
          {rating.status === "verified" ? (
            <span>✓ Verified: read in a copy of the published table.</span>
          ) : (
            <span className="font-bold text-caution">? From memory: not yet checked against the published text. Confirm it before relying on it.</span>
          )}
        </dd>
      </dl>
    </section>
  );
}

/** A lookup the table cannot answer, in words, with the nearest sizes to try. */
export function RatingProblem({ error, onPick }: { error: ApiError; onPick: (size: string) => void }) {
  const title =
    error.code === "SIZE_NOT_IN_TABLE" ? "Not a size in the table" : error.code === "UNKNOWN_GRADE" ? "Not a grade in the table" : error.status === 400 ? "Cannot read that" : "Lookup failed";
  const lines = error.status === 400 && error.issues.length ? error.issues.map((i) => i.message) : [error.message];
  return (
    <div role="alert" className="flex flex-col gap-3 rounded-xl border-4 border-stop bg-stop-bg p-4 text-ink">
      <p className="flex items-center gap-2 text-xl font-bold text-stop">
        <SeverityIcon severity="fail" className="h-7 w-7" />
        {title}
      </p>
      {lines.map((l) => (
        <p key={l} className="text-lg">
          {l}
        </p>
      ))}
      {error.nearest.length > 0 && (
        <div className="flex flex-col gap-2">
          <p className="text-base font-bold">Nearest sizes in the table:</p>
          <div className="flex flex-wrap gap-2">
            {error.nearest.map((n) => (
              <button
                key={n}
                type="button"
                onClick={() => onPick(nearestValue(n))}
                className="inline-flex min-h-tap min-w-tap items-center justify-center rounded-lg border-2 border-ink bg-white px-4 text-lg font-bold"
              >
                Look up {n}
              </button>
            ))}
          </div>
        </div>
      )}
      {error.status === 401 && (
        <a href="/sign-in" className="text-lg font-bold underline">
          Sign in again
        </a>
      )}
    </div>
  );
}
