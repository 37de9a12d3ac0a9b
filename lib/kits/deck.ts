/**
 * The kit on the deck, top down and to scale, as plain data that an SVG component draws
 * (components/kits/deck) and the load sheet reuses.
 *
 * Coordinates are millimetres in the picture's own frame: the hitch at the top, the deck
 * below it, its front up and its rear down (a phone held upright shows a long deck best);
 * x runs across the deck from the driver's left. Every mark, label and line lies inside
 * `viewBox`.
 *
 * What is drawn, and what is assumed (each assumption is also written into `notes`):
 * - The deck: its fixed front part and its tilting rear part (`tiltLengthMm`), at the
 *   trailer's deck width, or at a common 82 in (2,083 mm) between the fenders when the width
 *   is not recorded (common practice for equipment trailers; an assumption, said so).
 * - The tongue, the hitch point and the axle centre, when the hitch-to-deck-front distance is
 *   known (the axle centre sits `hitchToAxleMm` from the hitch).
 * - Anchor points at their side and position along the deck, with label and WLL; an anchor
 *   point out of use (its usability verdict says no) is flagged `crossed`.
 * - The machine's footprint where it sits (its length and width; its width assumed at 80 %
 *   of the deck's when not recorded), its front marked, and its tie-down points. A machine
 *   not placed yet is drawn against the deck front and flagged `placed: false`.
 * - Each tiedown as a line from its anchor point to its machine point, or to the nearest
 *   point of the footprint when it names none, with its counted WLL and its state from the
 *   kit's verdict: `counts`, `limited` (a part other than the chain or strap, such as a
 *   binder or the anchor point, sets its WLL), `not-rated` (a part cannot be rated: counts
 *   0, 49 CFR 393.108), `blocked` (gear the kit may not use on its date, 49 CFR 393.104(b), (c)).
 *
 * @module
 */
import { formatLbKg, formatNumber, type SecurementCheckResult, type TiedownResult } from "@/lib/securement";
import type { AnchorPoint, Coupling, Kit, MachinePoint, Side } from "./model";
import { formatMetres } from "./placement";
import { checkedTiedowns, type KitBlocker } from "./plan";

/**
 * A tiedown's state in the picture.
 *
 * @example
 * const s: TiedownState = "limited";
 */
export type TiedownState = "counts" | "limited" | "not-rated" | "blocked";

/**
 * The words for each tiedown state, shown beside the colour and the line style.
 *
 * @example
 * TIEDOWN_STATE_WORDS["not-rated"]; // "not rated"
 */
export const TIEDOWN_STATE_WORDS: Readonly<Record<TiedownState, string>> = {
  counts: "counts",
  limited: "limited",
  "not-rated": "not rated",
  blocked: "blocked",
};

/**
 * An anchor point's state in the picture.
 *
 * @example
 * const s: AnchorState = "out-of-use";
 */
export type AnchorState = "in-use" | "free" | "out-of-use";

/**
 * @example
 * ANCHOR_STATE_WORDS["out-of-use"]; // "out of use"
 */
export const ANCHOR_STATE_WORDS: Readonly<Record<AnchorState, string>> = { "in-use": "in use", free: "free", "out-of-use": "out of use" };

/** @example const p: Point = { x: 0, y: 0 }; */
export interface Point {
  readonly x: number;
  readonly y: number;
}

/** @example const r: Rect = { x: 0, y: 0, width: 2083, height: 6100 }; */
export interface Rect {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/**
 * A block of text: `x` is where `anchor` aligns it, `y` the baseline of the first line;
 * `box` is the space it takes (estimated from the character count), for layout and tests.
 *
 * @example
 * const l: DeckLabel = { x: 10, y: 120, anchor: "end", lines: ["L1", "6,600 lb"], box: { x: -600, y: 0, width: 610, height: 340 } };
 */
export interface DeckLabel {
  readonly x: number;
  readonly y: number;
  readonly anchor: "start" | "middle" | "end";
  readonly lines: readonly string[];
  readonly box: Rect;
  /** From the mark to the label, when the label had to move away from it. */
  readonly leader: readonly [Point, Point] | null;
}

/**
 * An anchor point as drawn.
 *
 * @example
 * const a: AnchorMark = { id: "fl", label: "FL", side: "left", positionMm: 200, wllLb: 6600, state: "in-use", crossed: false,
 *   at: { x: 960, y: 1900 }, sizeMm: 90, reasons: [], text: "Anchor point FL, …", tag: { … } };
 */
export interface AnchorMark {
  readonly id: string;
  readonly label: string;
  readonly side: Side;
  readonly positionMm: number;
  readonly wllLb: number;
  readonly state: AnchorState;
  readonly crossed: boolean;
  readonly at: Point;
  readonly sizeMm: number;
  readonly reasons: readonly string[];
  /** "Anchor point L1"; `detail` says the rest; `text` is both, for a screen reader or a list. */
  readonly name: string;
  readonly detail: string;
  readonly text: string;
  readonly tag: DeckLabel;
}

/**
 * One tiedown as drawn. `from`/`to` are null when its anchor point is not on the trailer
 * (then nothing is drawn, and `notes` says so). `toMachinePoint` is the machine point's label,
 * or null when the line ends at the nearest point of the footprint.
 *
 * @example
 * const t: TiedownLine = { id: "td-1", number: 1, label: "front left", … state: "limited", stateWords: "limited", countedWllLb: 2700, … };
 */
export interface TiedownLine {
  readonly id: string;
  readonly number: number;
  readonly label: string;
  readonly anchorPointId: string;
  readonly secures: string;
  readonly from: Point | null;
  readonly to: Point | null;
  readonly toMachinePoint: string | null;
  readonly badge: Point | null;
  readonly wllLb: number;
  readonly countedWllLb: number;
  readonly state: TiedownState;
  readonly stateWords: string;
  /** "the binder BINDR002", "anchor point L1": the part that sets the WLL, when it is not the chain or strap. */
  readonly limitedBy: string | null;
  readonly reasons: readonly string[];
  /** "1. front left"; `detail` says the rest; `text` is both, for a screen reader or a list. */
  readonly name: string;
  readonly detail: string;
  readonly text: string;
  readonly tag: DeckLabel | null;
}

/**
 * The machine as drawn.
 *
 * @example
 * const m: MachineMark = { name: "Unit 8", rect: { … }, placed: true, widthAssumed: false, frontFromDeckFrontMm: 300, nameTag: { … }, frontTag: { … }, points: [] };
 */
export interface MachineMark {
  readonly name: string;
  readonly rect: Rect;
  readonly placed: boolean;
  readonly widthAssumed: boolean;
  readonly frontFromDeckFrontMm: number;
  readonly nameTag: DeckLabel;
  readonly frontTag: DeckLabel;
  readonly points: readonly { readonly label: string; readonly at: Point }[];
}

/**
 * Everything the picture shows. `textMm` is the size of the labels in picture units,
 * chosen so that they read at about 13 px when the picture is 360 px wide.
 *
 * @example
 * const pic: DeckPicture = deckPicture(kit, kitVerdict(kit));
 * pic.viewBox; pic.deck; pic.anchors; pic.machine; pic.tiedowns; pic.notes;
 */
export interface DeckPicture {
  readonly viewBox: Rect;
  readonly textMm: number;
  readonly lineMm: number;
  readonly title: string;
  readonly description: string;
  readonly pass: boolean;
  readonly deck: {
    readonly rect: Rect;
    readonly widthAssumed: boolean;
    readonly fixed: Rect | null;
    readonly tilt: Rect | null;
    readonly fixedLengthMm: number;
    readonly tiltLengthMm: number;
  };
  readonly hitch: { readonly at: Point; readonly tongue: readonly (readonly Point[])[]; readonly tag: DeckLabel } | null;
  readonly axle: { readonly y: number; readonly x1: number; readonly x2: number; readonly tag: DeckLabel } | null;
  readonly anchors: readonly AnchorMark[];
  readonly machine: MachineMark;
  readonly tiedowns: readonly TiedownLine[];
  readonly notes: readonly string[];
}

/**
 * What the picture needs from the kit's verdict (`kitVerdict(kit)` gives it).
 *
 * @example
 * const v: DeckVerdict = kitVerdict(kit);
 */
export interface DeckVerdict {
  readonly pass: boolean;
  readonly check: SecurementCheckResult;
  readonly blockers: readonly KitBlocker[];
}

/**
 * Deck width assumed when a trailer's is not recorded: 82 in between the fenders, a common
 * width of equipment and tilt-deck trailers (common practice; an assumption, said so).
 *
 * @example
 * ASSUMED_DECK_WIDTH_MM; // 2083
 */
export const ASSUMED_DECK_WIDTH_MM = 2083;

const MATERIALS = new Set(["chain", "webbing", "wire-rope", "rope", "steel-strapping"]);
const PART_WORDS: Record<string, string> = { binder: "binder", hook: "hook", shackle: "shackle", anchor: "anchor point", chain: "chain", webbing: "web strap" };
const HITCH_WORDS: Record<Coupling, string> = { ball: "ball hitch", pintle: "pintle hitch", gooseneck: "gooseneck ball", "fifth-wheel": "kingpin" };
const SIDE_WORDS: Record<Side, string> = { left: "left side", right: "right side", centre: "centre line" };

/** Width of a line of text in picture units: condensed type runs under half an em a character (digits about 0.48 em). */
function textWidth(text: string, size: number): number {
  return text.length * size * 0.5;
}

function wrap(words: string, maxChars: number): string[] {
  const lines: string[] = [];
  for (const w of words.split(/\s+/)) {
    const last = lines[lines.length - 1];
    if (last !== undefined && (last + " " + w).length <= maxChars) lines[lines.length - 1] = `${last} ${w}`;
    else lines.push(w);
  }
  return lines;
}

interface StackEntry {
  readonly key: string;
  readonly desiredY: number;
  readonly mark: Point;
  readonly lines: readonly string[];
  /** Draw a leader even when the label sits level with its mark (a mark away from the deck edge). */
  readonly forceLeader?: boolean;
}

/** Lays a side's labels top to bottom near the height of their marks, never overlapping. */
function stack(entries: readonly StackEntry[], side: "left" | "right", edgeX: number, f: number, lh: number, topY: number): Map<string, DeckLabel> {
  const out = new Map<string, DeckLabel>();
  const sorted = [...entries].sort((a, b) => a.desiredY - b.desiredY);
  let bottom = topY;
  for (const e of sorted) {
    const height = e.lines.length * lh;
    const top = Math.max(e.desiredY - lh / 2, bottom);
    const width = Math.max(...e.lines.map((l) => textWidth(l, f)));
    const x = edgeX;
    const box = { x: side === "left" ? x - width : x, y: top, width, height };
    const firstMid = top + lh / 2;
    const moved = e.forceLeader === true || Math.abs(firstMid - e.desiredY) > f * 0.6;
    out.set(e.key, {
      x,
      y: top + f * 0.95,
      anchor: side === "left" ? "end" : "start",
      lines: e.lines,
      box,
      leader: moved ? [e.mark, { x: side === "left" ? x + f * 0.15 : x - f * 0.15, y: firstMid }] : null,
    });
    bottom = top + height + f * 0.35;
  }
  return out;
}

function nearestOnRect(p: Point, r: Rect): Point {
  const cx = Math.min(Math.max(p.x, r.x), r.x + r.width);
  const cy = Math.min(Math.max(p.y, r.y), r.y + r.height);
  if (cx !== p.x || cy !== p.y) return { x: cx, y: cy };
  // Inside the footprint (a centre anchor under the machine): the nearest edge.
  const d = [p.x - r.x, r.x + r.width - p.x, p.y - r.y, r.y + r.height - p.y];
  const i = d.indexOf(Math.min(...d));
  return [{ x: r.x, y: p.y }, { x: r.x + r.width, y: p.y }, { x: p.x, y: r.y }, { x: p.x, y: r.y + r.height }][i]!;
}

function tiedownStateOf(result: TiedownResult | undefined, blocked: boolean): { state: TiedownState; limitedBy: string | null } {
  if (blocked) return { state: "blocked", limitedBy: null };
  if (!result || !result.rated) return { state: "not-rated", limitedBy: null };
  if (result.limitedBy !== null && !MATERIALS.has(result.limitedBy)) {
    const word = PART_WORDS[result.limitedBy] ?? result.limitedBy;
    const name = result.limitedByLabel ?? "";
    return { state: "limited", limitedBy: result.limitedBy === "anchor" ? name || word : `the ${word}${name ? ` ${name}` : ""}` };
  }
  return { state: "counts", limitedBy: null };
}

/**
 * The kit on its trailer, top down and to scale, with every mark's state from the kit's
 * verdict (see the module comment).
 *
 * @example
 * const pic = deckPicture(kit, kitVerdict(kit));
 * pic.tiedowns[0]; // { number: 1, label: "front left", from: { x: …, y: … }, to: { … }, countedWllLb: 2700, state: "limited", limitedBy: "the binder BINDR002", … }
 * pic.anchors.filter((a) => a.crossed); // anchor points out of use
 */
export function deckPicture(kit: Kit, verdict: DeckVerdict): DeckPicture {
  const { trailer, machine } = kit;
  const notes: string[] = [];
  const D = trailer.deckWidthMm ?? ASSUMED_DECK_WIDTH_MM;
  if (trailer.deckWidthMm === null) notes.push(`${trailer.name}'s deck width is not recorded: drawn at 82 in (2,083 mm), a common width between the fenders (an assumption).`);
  const f = Math.max(100, Math.round(D * 0.076));
  const lh = Math.round(f * 1.2);
  const gap = Math.round(f * 0.6);
  const L = trailer.deckLengthMm;

  // Vertical layout: a band at the top for the hitch word, then the tongue, then the deck.
  const h = trailer.hitchToDeckFrontMm;
  const topPad = f * 2;
  const hitchY = topPad;
  const deckTop = h === null ? topPad : hitchY + h;
  if (h === null) notes.push(`The distance from ${trailer.name}'s hitch to its deck front is not measured: the tongue, hitch and axle centre are not drawn.`);

  // Side margins wide enough for the longest label; worked out after the labels are known,
  // so lay out with x relative to the deck's left edge and shift at the end.
  const deckLeft = 0;
  const deckRight = D;
  const xc = D / 2;

  const fixedLength = Math.max(0, L - trailer.tiltLengthMm);
  const tiltLength = Math.min(L, trailer.tiltLengthMm);
  const deckRect: Rect = { x: deckLeft, y: deckTop, width: D, height: L };
  const fixed = fixedLength > 0 ? { x: deckLeft, y: deckTop, width: D, height: fixedLength } : null;
  const tilt = tiltLength > 0 ? { x: deckLeft, y: deckTop + fixedLength, width: D, height: tiltLength } : null;

  // The machine.
  const placed = kit.machineFrontFromDeckFrontMm !== null;
  const p = kit.machineFrontFromDeckFrontMm ?? 0;
  if (!placed) notes.push(`${machine.name} has not been placed yet: drawn against the front of the deck.`);
  const widthAssumed = machine.widthMm === null;
  const mw = machine.widthMm ?? Math.round(D * 0.8);
  if (widthAssumed) notes.push(`${machine.name}'s width is not recorded: drawn at 80 % of the deck width.`);
  const mRect: Rect = { x: xc - mw / 2, y: deckTop + p, width: mw, height: machine.lengthMm };
  const inset = Math.min(f * 0.35, mw / 4);
  const pointX = (side: Side) => (side === "left" ? mRect.x + inset : side === "right" ? mRect.x + mw - inset : xc);
  const points = machine.tiedownPoints.map((mp: MachinePoint) => ({ label: mp.label, at: { x: pointX(mp.side), y: mRect.y + Math.min(Math.max(mp.positionMm, 0), machine.lengthMm) } }));
  const nameLines = wrap(machine.name, Math.max(6, Math.floor((mw - f) / (f * 0.5))));
  const nameTop = mRect.y + mRect.height / 2 - (nameLines.length * lh) / 2;
  const nameTag: DeckLabel = {
    x: xc,
    y: nameTop + f * 0.95,
    anchor: "middle",
    lines: nameLines,
    box: { x: xc - Math.max(...nameLines.map((l) => textWidth(l, f))) / 2, y: nameTop, width: Math.max(...nameLines.map((l) => textWidth(l, f))), height: nameLines.length * lh },
    leader: null,
  };
  const frontWords = placed ? "▲ front" : "▲ front (not placed)";
  const frontTag: DeckLabel = {
    x: xc,
    y: mRect.y + lh * 1.1,
    anchor: "middle",
    lines: [frontWords],
    box: { x: xc - textWidth(frontWords, f) / 2, y: mRect.y + lh * 0.2, width: textWidth(frontWords, f), height: lh },
    leader: null,
  };

  // Tiedowns and their verdicts: the engine's i-th tiedown is the i-th of checkedTiedowns.
  const checked = checkedTiedowns(kit);
  const anchorsById = new Map(trailer.anchorPoints.map((a) => [a.id, a]));
  const marker = Math.round(f * 0.7);
  const anchorAt = (a: AnchorPoint): Point => ({
    x: a.side === "left" ? deckLeft + marker * 0.6 : a.side === "right" ? deckRight - marker * 0.6 : xc,
    y: deckTop + Math.min(Math.max(a.positionMm, 0), L),
  });

  const lines = kit.tiedowns.map((t, i) => {
    const result = verdict.check.tiedowns[checked.indexOf(t)];
    const blockers = verdict.blockers.filter((b) => b.tiedownId === t.id);
    const { state, limitedBy } = tiedownStateOf(checked.includes(t) ? result : undefined, blockers.length > 0);
    const anchor = anchorsById.get(t.anchorPointId);
    const from = anchor ? anchorAt(anchor) : null;
    const mp = t.machinePoint ? points.find((q) => q.label.toLowerCase() === t.machinePoint!.toLowerCase()) : undefined;
    const to = from ? (mp ? mp.at : nearestOnRect(from, mRect)) : null;
    if (!anchor) notes.push(`Tiedown ${i + 1} (${t.label}): its anchor point is not on ${trailer.name}, so it is not drawn.`);
    else if (t.machinePoint && !mp) notes.push(`Tiedown ${i + 1} (${t.label}): ${machine.name} lists no tie-down point "${t.machinePoint}"; drawn to the nearest point of the machine.`);
    const wllLb = result && checked.includes(t) ? result.wllLb : 0;
    const countedWllLb = result && checked.includes(t) ? result.countedWllLb : 0;
    const failures = result ? verdict.check.findings.filter((x) => x.tiedown === result.index && x.severity === "fail").map((x) => x.message) : [];
    const reasons = state === "blocked" ? blockers.map((b) => b.message) : state === "not-rated" ? failures : [];
    const holds = t.secures.toLowerCase() === "machine" ? "the machine" : `the ${t.secures}`;
    const route = anchor
      ? `from anchor point ${anchor.label} (${SIDE_WORDS[anchor.side]}, ${formatMetres(anchor.positionMm)} from the deck front) to ${mp ? `the machine's ${mp.label} tie-down point` : "the nearest point of the machine"}`
      : "its anchor point is not on this trailer";
    const figures = `WLL ${formatLbKg(wllLb)}, counts ${formatLbKg(countedWllLb)}${result ? ` (${result.countFactor === 1 ? "across the load: its full WLL" : "half its WLL"})` : ""}`;
    const stateText =
      state === "counts" ? "Counts." : state === "limited" ? `Limited: ${limitedBy} sets its WLL.` : state === "not-rated" ? `Not rated: counts 0. ${reasons.join(" ")}` : `Blocked: ${reasons.join(" ")}`;
    return {
      id: t.id,
      number: i + 1,
      label: t.label,
      anchorPointId: t.anchorPointId,
      secures: t.secures,
      from,
      to,
      toMachinePoint: mp ? mp.label : null,
      badge: from && to ? { x: (from.x + to.x) / 2, y: (from.y + to.y) / 2 } : null,
      wllLb,
      countedWllLb,
      state,
      stateWords: TIEDOWN_STATE_WORDS[state],
      limitedBy,
      reasons,
      name: `${i + 1}. ${t.label}`,
      detail: `Holds ${holds}: ${route}. ${figures}. ${stateText}`.trim(),
      text: `${i + 1}. ${t.label}, holds ${holds}: ${route}. ${figures}. ${stateText}`.trim(),
      side: anchor?.side ?? null,
    };
  });

  const anchorData = trailer.anchorPoints.map((a) => {
    const users = lines.filter((l) => l.anchorPointId === a.id);
    const state: AnchorState = !a.usable.ok ? "out-of-use" : users.length ? "in-use" : "free";
    const reasons = a.usable.reasons.map((r) => r.message);
    const use = users.length ? `; used by ${users.map((u) => `tiedown ${u.number} (${u.label})`).join(", ")}` : "";
    return {
      id: a.id,
      label: a.label,
      side: a.side,
      positionMm: a.positionMm,
      wllLb: a.wllLb,
      state,
      crossed: state === "out-of-use",
      at: anchorAt(a),
      sizeMm: marker,
      reasons,
      name: `Anchor point ${a.label}`,
      detail: `On the ${SIDE_WORDS[a.side]}, ${formatMetres(a.positionMm)} from the deck front, WLL ${formatLbKg(a.wllLb)}: ${ANCHOR_STATE_WORDS[state]}${state === "out-of-use" ? ` (${reasons.join(" ")})` : ""}${use}.`,
      text: `Anchor point ${a.label}, ${SIDE_WORDS[a.side]}, ${formatMetres(a.positionMm)} from the deck front, WLL ${formatLbKg(a.wllLb)}: ${ANCHOR_STATE_WORDS[state]}${state === "out-of-use" ? ` (${reasons.join(" ")})` : ""}${use}.`,
      tagLines: [a.label, `${formatNumber(a.wllLb)} lb`, ...(state === "out-of-use" ? ["out of use"] : [])],
    };
  });

  // Labels: left and right anchor points and their tiedowns in stacks beside the deck;
  // centre ones beside their marks.
  const hitchWord = HITCH_WORDS[trailer.coupling];
  const axleY = h === null ? null : hitchY + trailer.hitchToAxleMm;
  // Centre anchor points and their tiedowns go to the side with fewer labels, with a leader.
  const entries: Record<"left" | "right", StackEntry[]> = { left: [], right: [] };
  const near = (side: "left" | "right", y: number) => entries[side].filter((e) => Math.abs(e.desiredY - y) < lh * 4).length;
  const sideOf = (side: Side, y: number) => (side !== "centre" ? side : near("left", y) < near("right", y) ? "left" : "right");
  if (axleY !== null) entries.right.push({ key: "axle", desiredY: axleY, mark: { x: deckRight, y: axleY }, lines: ["axle", "centre"] });
  for (const a of [...anchorData].sort((l, r) => (l.side === "centre" ? 1 : 0) - (r.side === "centre" ? 1 : 0))) {
    const side = sideOf(a.side, a.at.y);
    entries[side].push({ key: `a:${a.id}`, desiredY: a.at.y, mark: a.at, lines: a.tagLines, forceLeader: a.side === "centre" });
    for (const l of lines) {
      if (l.badge && l.anchorPointId === a.id) {
        entries[side].push({ key: `t:${l.id}`, desiredY: l.badge.y + 0.01, mark: l.badge, lines: [`${l.number} · ${formatNumber(l.countedWllLb)} lb`, l.stateWords], forceLeader: a.side === "centre" });
      }
    }
  }
  const stackTop = deckTop - lh * 0.5;
  const tags = new Map([...stack(entries.left, "left", deckLeft - gap, f, lh, stackTop), ...stack(entries.right, "right", deckRight + gap, f, lh, stackTop)]);
  const anchors: AnchorMark[] = anchorData.map(({ tagLines: _lines, ...a }) => ({
    ...a,
    tag: tags.get(`a:${a.id}`)!,
  }));
  const tiedowns: TiedownLine[] = lines.map(({ side: _side, ...l }) => ({
    ...l,
    tag: tags.get(`t:${l.id}`) ?? null,
  }));

  const hitchPoint = { x: xc, y: hitchY };
  const hitchTag: DeckLabel = {
    x: xc + f * 0.6,
    y: hitchY + f * 0.35,
    anchor: "start",
    lines: [hitchWord],
    box: { x: xc + f * 0.6, y: hitchY - f * 0.6, width: textWidth(hitchWord, f), height: lh },
    leader: null,
  };
  const neck = trailer.coupling === "gooseneck" || trailer.coupling === "fifth-wheel";
  const tongue: Point[][] =
    h === null
      ? []
      : neck
        ? [[{ x: xc - D * 0.15, y: deckTop }, { x: xc - D * 0.08, y: hitchY }, { x: xc + D * 0.08, y: hitchY }, { x: xc + D * 0.15, y: deckTop }]]
        : [[{ x: deckLeft + D * 0.2, y: deckTop }, hitchPoint, { x: deckRight - D * 0.2, y: deckTop }]];

  // Bounds of everything, then shift x so the picture starts at 0 with equal side margins.
  const boxes: Rect[] = [deckRect, mRect, ...anchors.map((a) => a.tag.box), ...tiedowns.flatMap((t) => (t.tag ? [t.tag.box] : [])), nameTag.box, frontTag.box];
  const pts: Point[] = [...anchors.map((a) => a.at), ...tiedowns.flatMap((t) => [t.from, t.to].filter((x): x is Point => x !== null)), ...points.map((q) => q.at)];
  if (h !== null) {
    boxes.push(hitchTag.box);
    pts.push(hitchPoint, ...tongue.flat());
  }
  const axleTag = tags.get("axle");
  if (axleTag) boxes.push(axleTag.box);
  const pad = f * 0.5;
  const minX = Math.min(...boxes.map((b) => b.x), ...pts.map((q) => q.x - marker)) - pad;
  const maxX = Math.max(...boxes.map((b) => b.x + b.width), ...pts.map((q) => q.x + marker)) + pad;
  const margin = Math.max(deckLeft - minX, maxX - deckRight);
  const maxY = Math.max(...boxes.map((b) => b.y + b.height), ...pts.map((q) => q.y + marker), axleY ?? 0) + pad;
  const minY = Math.min(0, ...boxes.map((b) => b.y - pad), ...pts.map((q) => q.y - marker - pad));
  const dx = margin;
  const dy = -minY;
  const mv = (q: Point): Point => ({ x: q.x + dx, y: q.y + dy });
  const mr = (r: Rect): Rect => ({ ...r, x: r.x + dx, y: r.y + dy });
  const ml = (t: DeckLabel): DeckLabel => ({ ...t, x: t.x + dx, y: t.y + dy, box: mr(t.box), leader: t.leader ? [mv(t.leader[0]), mv(t.leader[1])] : null });

  const nTiedowns = tiedowns.length;
  const title = `${machine.name} on ${trailer.name}, ${kit.date}`;
  const description =
    `Top-down drawing to scale of ${trailer.name}'s deck with ${trailer.anchorPoints.length} anchor point${trailer.anchorPoints.length === 1 ? "" : "s"}` +
    `${anchors.some((a) => a.crossed) ? ` (${anchors.filter((a) => a.crossed).length} out of use, crossed out)` : ""}, ` +
    `${machine.name} ${placed ? `with its front ${formatMetres(p)} back from the deck front` : "not placed yet, drawn against the deck front"}, ` +
    `and ${nTiedowns} tiedown${nTiedowns === 1 ? "" : "s"}. The check ${verdict.pass ? "passes" : "does not pass"}.`;

  return {
    viewBox: { x: 0, y: 0, width: D + 2 * margin, height: maxY - minY },
    textMm: f,
    lineMm: lh,
    title,
    description,
    pass: verdict.pass,
    deck: { rect: mr(deckRect), widthAssumed: trailer.deckWidthMm === null, fixed: fixed && mr(fixed), tilt: tilt && mr(tilt), fixedLengthMm: fixedLength, tiltLengthMm: tiltLength },
    hitch: h === null ? null : { at: mv(hitchPoint), tongue: tongue.map((line) => line.map(mv)), tag: ml(hitchTag) },
    axle: axleY === null || !axleTag ? null : { y: axleY + dy, x1: deckLeft + dx, x2: deckRight + dx, tag: ml(axleTag) },
    anchors: anchors.map((a) => ({ ...a, at: mv(a.at), tag: ml(a.tag) })),
    machine: {
      name: machine.name,
      rect: mr(mRect),
      placed,
      widthAssumed,
      frontFromDeckFrontMm: p,
      nameTag: ml(nameTag),
      frontTag: ml(frontTag),
      points: points.map((q) => ({ label: q.label, at: mv(q.at) })),
    },
    tiedowns: tiedowns.map((t) => ({ ...t, from: t.from && mv(t.from), to: t.to && mv(t.to), badge: t.badge && mv(t.badge), tag: t.tag && ml(t.tag) })),
    notes,
  };
}
