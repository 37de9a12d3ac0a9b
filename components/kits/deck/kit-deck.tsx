import type { AnchorMark, DeckLabel, DeckPicture, TiedownLine } from "@/lib/kits/deck";
import { TIEDOWN_STATE_WORDS } from "@/lib/kits/deck";
import { formatMetres } from "@/lib/kits/placement";
import { ANCHOR_STYLES, INK, STOP, TIEDOWN_STYLES } from "./state-styles";

// The kit on the deck, drawn from lib/kits/deck.ts. A server component: no state, no effects,
// so the builder, the load sheet and a test's renderToStaticMarkup all draw the same thing.

/** A space between lines, so that their words stay apart when read as text, placed where it cannot show. */
function spaced(line: string, i: number, tag: DeckLabel): string {
  if (tag.anchor === "end") return i === 0 ? line : ` ${line}`;
  return i === tag.lines.length - 1 ? line : `${line} `;
}

function Label({ tag, f, lh, bold = [0], colours = [] }: { tag: DeckLabel; f: number; lh: number; bold?: number[]; colours?: (string | undefined)[] }) {
  return (
    <>
      {tag.leader && <line x1={tag.leader[0].x} y1={tag.leader[0].y} x2={tag.leader[1].x} y2={tag.leader[1].y} stroke="#6b7280" strokeWidth={f * 0.06} />}
      <text x={tag.x} y={tag.y} textAnchor={tag.anchor} fontSize={f} fill={INK} stroke="#ffffff" strokeWidth={f * 0.28} strokeLinejoin="round" paintOrder="stroke">
        {tag.lines.map((line, i) => (
          <tspan key={i} x={tag.x} dy={i === 0 ? 0 : lh} fontWeight={bold.includes(i) ? 700 : 400} fill={colours[i] ?? INK}>
            {spaced(line, i, tag)}
          </tspan>
        ))}
      </text>
    </>
  );
}

function Tiedown({ t, f, lh }: { t: TiedownLine; f: number; lh: number }) {
  if (!t.from || !t.to || !t.badge) return null;
  const style = TIEDOWN_STYLES[t.state];
  const dash = style.dash.length ? style.dash.map((d) => d * f).join(" ") : undefined;
  const r = f * 0.62;
  const href = `#tiedown-${t.id}`;
  // Two links to the same card: the line and its badge for a finger (hidden from screen
  // readers, out of the tab order), and the label, whose name starts with the words it shows.
  return (
    <g data-state={t.state} data-tiedown={t.id}>
      <a href={href} aria-hidden="true" tabIndex={-1} className="deck-link">
        <line x1={t.from.x} y1={t.from.y} x2={t.to.x} y2={t.to.y} stroke="#ffffff" strokeWidth={f * 0.5} strokeLinecap="round" />
        <line x1={t.from.x} y1={t.from.y} x2={t.to.x} y2={t.to.y} stroke={style.colour} strokeWidth={f * 0.24} strokeDasharray={dash} strokeLinecap={style.caps} />
        <circle cx={t.badge.x} cy={t.badge.y} r={r} fill={t.state === "counts" ? "#ffffff" : t.state === "limited" ? "#fef3c7" : "#fee2e2"} stroke={style.colour} strokeWidth={f * 0.14} />
        <text x={t.badge.x} y={t.badge.y + f * 0.34} textAnchor="middle" fontSize={f * 0.95} fontWeight={700} fill={INK}>
          {t.number}
        </text>
      </a>
      {t.tag && (
        <a href={href} aria-label={`${t.tag.lines.join(" ")}: ${t.text}`} className="deck-link">
          <Label tag={t.tag} f={f} lh={lh} colours={[undefined, style.colour]} bold={[0, 1]} />
        </a>
      )}
    </g>
  );
}

function Anchor({ a, f, lh }: { a: AnchorMark; f: number; lh: number }) {
  const s = a.sizeMm;
  const style = ANCHOR_STYLES[a.state];
  const c = s * 0.95;
  return (
    <a href={`#anchor-${a.id}`} aria-label={`${a.tag.lines.join(" ")}: ${a.text}`} data-state={a.state} className="deck-link">
      <rect x={a.at.x - s / 2} y={a.at.y - s / 2} width={s} height={s} rx={s * 0.15} fill={style.fill} stroke={style.stroke} strokeWidth={f * 0.12} />
      {a.crossed && (
        <g stroke={STOP} strokeWidth={f * 0.16} strokeLinecap="round" data-cross="true">
          <line x1={a.at.x - c} y1={a.at.y - c} x2={a.at.x + c} y2={a.at.y + c} />
          <line x1={a.at.x - c} y1={a.at.y + c} x2={a.at.x + c} y2={a.at.y - c} />
        </g>
      )}
      <Label tag={a.tag} f={f} lh={lh} colours={[undefined, undefined, STOP]} bold={[0, 2]} />
    </a>
  );
}

function LineSample({ state }: { state: TiedownLine["state"] }) {
  const style = TIEDOWN_STYLES[state];
  return (
    <svg viewBox="0 0 48 12" className="h-4 w-12 shrink-0" aria-hidden="true">
      <line x1="2" y1="6" x2="46" y2="6" stroke={style.colour} strokeWidth="3.5" strokeDasharray={style.dash.length ? style.dash.map((d) => Math.max(d * 10, 1.5)).join(" ") : undefined} strokeLinecap={style.caps} />
    </svg>
  );
}

/**
 * The kit on its trailer, top down and to scale, with the words that say what it shows.
 * Tiedowns link to `#tiedown-<id>` and anchor points to `#anchor-<id>`: the page that shows
 * the picture gives those ids to its cards. `idPrefix` keeps ids apart when a page shows
 * two pictures. `words={false}` leaves out the tiedowns and anchor points in words (for a
 * page that lists them itself, the load sheet), and `children` go beside the picture, under
 * its caption.
 */
export function KitDeck({
  picture,
  idPrefix = "deck",
  heading = "On the deck",
  level = 2,
  words = true,
  children,
}: {
  picture: DeckPicture;
  idPrefix?: string;
  heading?: string;
  level?: 2 | 3;
  words?: boolean;
  children?: React.ReactNode;
}) {
  const H = level === 2 ? "h2" : "h3";
  const Sub = level === 2 ? "h3" : "h4";
  const { viewBox: vb, textMm: f, lineMm: lh, deck } = picture;
  const hatch = `${idPrefix}-tilt`;
  const used = new Set(picture.tiedowns.map((t) => t.state));
  const m = picture.machine;
  return (
    <figure className="kit-deck flex flex-col gap-3 break-inside-avoid [print-color-adjust:exact]" aria-labelledby={`${idPrefix}-heading`}>
      <H id={`${idPrefix}-heading`} className="text-xl font-bold">
        {heading}
      </H>
      <p className={`text-lg font-bold ${picture.pass ? "text-ok" : "text-stop"}`}>
        <span aria-hidden="true">{picture.pass ? "✓ " : "✕ "}</span>
        {picture.pass ? "The check passes" : "The check does not pass"}
      </p>
      <div className="flex flex-col gap-3 md:grid md:grid-cols-[minmax(0,26rem)_minmax(0,1fr)] md:items-start md:gap-6 print:grid print:grid-cols-[3.6in_1fr] print:gap-4">
        <svg
          viewBox={`${vb.x} ${vb.y} ${vb.width} ${vb.height}`}
          role="group"
          aria-labelledby={`${idPrefix}-title ${idPrefix}-desc`}
          className="mx-auto h-auto w-full max-w-xl"
          fontFamily="inherit"
        >
          <title id={`${idPrefix}-title`}>{picture.title}</title>
          <desc id={`${idPrefix}-desc`}>{picture.description}</desc>
          <defs>
            <pattern id={hatch} patternUnits="userSpaceOnUse" width={f * 0.9} height={f * 0.9} patternTransform="rotate(45)">
              <rect width={f * 0.9} height={f * 0.9} fill="#f3f4f6" />
              <line x1="0" y1="0" x2="0" y2={f * 0.9} stroke="#9ca3af" strokeWidth={f * 0.12} />
            </pattern>
          </defs>
          <rect x={vb.x} y={vb.y} width={vb.width} height={vb.height} fill="#ffffff" />

          {picture.hitch && (
            <g>
              {picture.hitch.tongue.map((line, i) => (
                <polyline key={i} points={line.map((q) => `${q.x},${q.y}`).join(" ")} fill="none" stroke={INK} strokeWidth={f * 0.16} strokeLinejoin="round" />
              ))}
              <circle cx={picture.hitch.at.x} cy={picture.hitch.at.y} r={f * 0.35} fill={INK} />
              <Label tag={picture.hitch.tag} f={f} lh={lh} />
            </g>
          )}

          {deck.fixed && <rect {...deck.fixed} fill="#f3f4f6" stroke="none" />}
          {deck.tilt && <rect {...deck.tilt} fill={`url(#${hatch})`} stroke="none" />}
          <rect {...deck.rect} fill="none" stroke={INK} strokeWidth={f * 0.16} strokeDasharray={deck.widthAssumed ? `${f * 0.8} ${f * 0.4}` : undefined} />
          {deck.fixed && deck.tilt && <line x1={deck.tilt.x} y1={deck.tilt.y} x2={deck.tilt.x + deck.tilt.width} y2={deck.tilt.y} stroke={INK} strokeWidth={f * 0.12} strokeDasharray={`${f * 0.5} ${f * 0.3}`} />}

          {picture.axle && (
            <g>
              <line x1={picture.axle.x1} y1={picture.axle.y} x2={picture.axle.x2} y2={picture.axle.y} stroke="#374151" strokeWidth={f * 0.1} strokeDasharray={`${f * 0.9} ${f * 0.3} ${f * 0.2} ${f * 0.3}`} />
              <Label tag={picture.axle.tag} f={f} lh={lh} bold={[]} />
            </g>
          )}

          <g>
            <rect {...m.rect} rx={f * 0.2} fill="#ffc21a" fillOpacity={0.35} stroke={INK} strokeWidth={f * 0.14} strokeDasharray={m.placed ? undefined : `${f * 0.6} ${f * 0.35}`} />
            <Label tag={m.nameTag} f={f} lh={lh} bold={m.nameTag.lines.map((_, i) => i)} />
            <Label tag={m.frontTag} f={f} lh={lh} bold={[]} />
            {m.points.map((q) => (
              <rect key={q.label} x={q.at.x - f * 0.22} y={q.at.y - f * 0.22} width={f * 0.44} height={f * 0.44} fill={INK} />
            ))}
          </g>

          {picture.tiedowns.map((t) => (
            <Tiedown key={t.id} t={t} f={f} lh={lh} />
          ))}
          {/* Anchor points over the lines, so that a cross on one out of use is never hidden. */}
          {picture.anchors.map((a) => (
            <Anchor key={a.id} a={a} f={f} lh={lh} />
          ))}
        </svg>

        <div className="flex min-w-0 flex-col gap-3">
          <figcaption className="flex flex-col gap-3 text-base">
            <p>{picture.description}</p>
            <ul className="flex flex-col gap-1" aria-label="How to read the drawing">
              {(["counts", "limited", "not-rated", "blocked"] as const)
                .filter((s) => used.has(s))
                .map((s) => (
                  <li key={s} className="flex items-center gap-2">
                    <LineSample state={s} />
                    <span>
                      <strong>{TIEDOWN_STATE_WORDS[s]}</strong> ({TIEDOWN_STYLES[s].sample}){": "}
                      {s === "counts" && "the tiedown counts toward the aggregate WLL, set by its chain or strap."}
                      {s === "limited" && "it counts, but a weaker part (a binder, a fitting or the anchor point) sets its WLL."}
                      {s === "not-rated" && "a part cannot be rated, so it counts 0."}
                      {s === "blocked" && "it uses gear or an anchor point the kit may not use on its date."}
                    </span>
                  </li>
                ))}
              <li>Squares at the deck edge are anchor points: filled when in use, white when free, grey and crossed out in red when out of use.</li>
              {deck.fixed && deck.tilt && (
                <li>
                  Plain: the fixed deck ({formatMetres(deck.fixedLengthMm)}); hatched: the tilting deck ({formatMetres(deck.tiltLengthMm)}).
                </li>
              )}
              {picture.axle && <li>The dash-dot line across the deck is the axle centre.</li>}
              <li>The yellow block is the machine, its front marked ▲; black squares on it are its tie-down points.</li>
            </ul>
            {picture.notes.length > 0 && (
              <ul className="flex flex-col gap-1" aria-label="Assumptions in the drawing">
                {picture.notes.map((n) => (
                  <li key={n} className="font-bold text-caution">
                    <span aria-hidden="true">! </span>
                    {n}
                  </li>
                ))}
              </ul>
            )}
            {words && (
              <>
                <section aria-labelledby={`${idPrefix}-words`} className="flex flex-col gap-1">
                  <Sub id={`${idPrefix}-words`} className="text-lg font-bold">
                    Tiedowns in words
                  </Sub>
                  {picture.tiedowns.length === 0 ? (
                    <p>No tiedowns yet.</p>
                  ) : (
                    <ol className="flex flex-col gap-2">
                      {picture.tiedowns.map((t) => (
                        <li key={t.id} data-state={t.state}>
                          <a href={`#tiedown-${t.id}`} className="flex min-h-tap items-center font-bold underline">
                            {t.name}
                          </a>
                          <p>{t.detail}</p>
                        </li>
                      ))}
                    </ol>
                  )}
                </section>
                <details className="print:hidden">
                  <summary className="flex min-h-tap cursor-pointer items-center text-lg font-bold underline">Anchor points in words ({picture.anchors.length})</summary>
                  <ul className="flex flex-col gap-1">
                    {picture.anchors.map((a) => (
                      <li key={a.id} data-state={a.state}>
                        <a href={`#anchor-${a.id}`} className="flex min-h-tap items-center font-bold underline">
                          {a.name}
                        </a>
                        <p>{a.detail}</p>
                      </li>
                    ))}
                  </ul>
                </details>
              </>
            )}
          </figcaption>
          {children}
        </div>
      </div>
    </figure>
  );
}
