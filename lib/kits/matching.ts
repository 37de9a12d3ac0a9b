/**
 * Quick building: which free items fit a tiedown, and "use the same for all four corners".
 *
 * Matching rules (none of them a 49 CFR rule; the engine's findings carry the rules):
 * - a binder fits a chain when the chain's size lies in the binder's chain-size range, the
 *   range the maker marks on it (common practice; the engine warns otherwise with
 *   BINDER_CHAIN_SIZE_OUT_OF_RANGE);
 * - a chain fits a binder by the same rule, read the other way;
 * - a chain size in millimetres is the chain table's inch row with the same published mm
 *   figure (10 mm is the 3/8 in row), as the engine reads it (lib/securement/sizes.ts);
 * - "the same" item is one of the same kind, grade and size (for a binder, the same
 *   chain-size range), preferring the same mechanism and the WLL closest above.
 *
 * @module
 */
import { CHAIN_TABLE, sizeMatchesRow, tryParseSize } from "@/lib/securement";
import { sizeLabel } from "@/lib/stock/describe";
import type { AnchorPoint, Kit, KitItem, KitTiedown, Side } from "./model";

/**
 * A chain size in trade inches, or undefined when it cannot be read.
 *
 * @example
 * chainInches("3/8");   // 0.375
 * chainInches("10 mm"); // 0.375 (the 3/8 in row of the chain table)
 */
export function chainInches(size: string | null | undefined): number | undefined {
  if (!size) return undefined;
  const parsed = tryParseSize(size);
  if (!parsed) return undefined;
  if (parsed.system === "inch") return parsed.inches;
  return CHAIN_TABLE.rows.find((r) => sizeMatchesRow(parsed, r))?.inches;
}

function binderRange(binder: Pick<KitItem, "details">): [number, number] | undefined {
  const range = binder.details.chainSizeRange as [string, string] | null | undefined;
  if (!range) return undefined;
  const lo = chainInches(range[0]);
  const hi = chainInches(range[1]);
  if (lo === undefined || hi === undefined) return undefined;
  return lo <= hi ? [lo, hi] : [hi, lo];
}

/**
 * Whether a binder's marked chain-size range takes a chain's size.
 *
 * @example
 * binderTakesChain({ details: { chainSizeRange: ["5/16", "3/8"] } }, { size: "3/8" }); // true
 * binderTakesChain({ details: { chainSizeRange: ["5/16", "3/8"] } }, { size: "1/2" }); // false
 */
export function binderTakesChain(binder: Pick<KitItem, "details">, chain: Pick<KitItem, "size">): boolean {
  const range = binderRange(binder);
  const inches = chainInches(chain.size);
  if (!range || inches === undefined) return false;
  return inches >= range[0] - 1e-9 && inches <= range[1] + 1e-9;
}

function sizeKey(item: Pick<KitItem, "kind" | "size" | "details">): string {
  if (item.kind === "binder") return (binderRange(item) ?? []).join("-");
  if (item.kind === "chain") return String(chainInches(item.size) ?? item.size ?? "");
  return String(tryParseSize(item.size ?? "")?.inches ?? item.size ?? "");
}

/**
 * Whether two items are "the same" for copying a tiedown: same kind, grade and size (for a
 * binder, the same chain-size range).
 *
 * @example
 * sameSort({ kind: "chain", grade: 70, size: "3/8", details: {} }, { kind: "chain", grade: 70, size: "10 mm", details: {} }); // true
 */
export function sameSort(a: Pick<KitItem, "kind" | "grade" | "size" | "details">, b: Pick<KitItem, "kind" | "grade" | "size" | "details">): boolean {
  return a.kind === b.kind && (a.grade ?? null) === (b.grade ?? null) && sizeKey(a) === sizeKey(b);
}

/**
 * The free item most like a template: the same sort (see {@link sameSort}), usable, not in
 * `taken`; the same binder mechanism first, then the WLL closest to the template's (at or
 * above it first), then by tag code so that the choice is repeatable.
 *
 * @example
 * pickLike(chain70, freeItems, new Set())?.tagCode;
 */
export function pickLike(template: KitItem, free: readonly KitItem[], taken: ReadonlySet<string>): KitItem | undefined {
  const wll = template.wllLb ?? 0;
  const mechanism = template.details.mechanism;
  return free
    .filter((i) => i.usable.ok && !taken.has(i.id) && i.id !== template.id && sameSort(i, template))
    .sort((a, b) => {
      const mech = Number(b.details.mechanism === mechanism) - Number(a.details.mechanism === mechanism);
      if (mech) return mech;
      const below = Number((a.wllLb ?? 0) < wll) - Number((b.wllLb ?? 0) < wll);
      if (below) return below;
      const gap = Math.abs((a.wllLb ?? 0) - wll) - Math.abs((b.wllLb ?? 0) - wll);
      return gap || a.tagCode.localeCompare(b.tagCode);
    })[0];
}

/**
 * A free item offered for a tiedown, with the reason it fits.
 *
 * @example
 * const s: Suggestion = { item, reason: "Takes 3/8 in chain" };
 */
export interface Suggestion {
  readonly item: KitItem;
  readonly reason: string;
}

const byWllThenTag = (a: KitItem, b: KitItem) => (b.wllLb ?? 0) - (a.wllLb ?? 0) || a.tagCode.localeCompare(b.tagCode);

/**
 * Free, usable items that fit what a tiedown holds so far:
 * - a chain without a binder: binders whose range takes the chain's size;
 * - a binder without a chain: chains of a size the binder takes;
 * - nothing yet: chains, highest WLL first, then web straps;
 * - a chain and its binder, or a web strap: nothing more is needed.
 *
 * @example
 * suggestItems([chain38], freeItems).map((s) => s.reason); // ["Takes 3/8 in chain", …]
 */
export function suggestItems(current: readonly KitItem[], free: readonly KitItem[]): Suggestion[] {
  const usable = free.filter((i) => i.usable.ok && !current.some((c) => c.id === i.id));
  const chain = current.find((i) => i.kind === "chain");
  const binder = current.find((i) => i.kind === "binder");
  if (chain && !binder) {
    return usable
      .filter((i) => i.kind === "binder" && binderTakesChain(i, chain))
      .sort(byWllThenTag)
      .map((item) => ({ item, reason: `Takes ${sizeLabel(chain.size)} chain` }));
  }
  if (binder && !chain) {
    const range = binder.details.chainSizeRange as [string, string] | undefined;
    return usable
      .filter((i) => i.kind === "chain" && binderTakesChain(binder, i))
      .sort(byWllThenTag)
      .map((item) => ({ item, reason: range ? `Fits the binder (${range[0]}–${sizeLabel(range[1])} chain)` : "Fits the binder" }));
  }
  if (current.length === 0) {
    return [
      ...usable.filter((i) => i.kind === "chain").sort(byWllThenTag).map((item) => ({ item, reason: "A chain to start the tiedown" })),
      ...usable.filter((i) => i.kind === "web-strap").sort(byWllThenTag).map((item) => ({ item, reason: "A web strap to start the tiedown" })),
    ];
  }
  return [];
}

/** The four corners of a machine, named as a yard hand says them. */
export const CORNERS = [
  { label: "front left", end: "front", side: "left" },
  { label: "front right", end: "front", side: "right" },
  { label: "rear left", end: "rear", side: "left" },
  { label: "rear right", end: "rear", side: "right" },
] as const;
export type Corner = (typeof CORNERS)[number];
type End = Corner["end"];

/** Which corner a tiedown on the machine holds, from its machine point, else its anchor, else its label. */
export function cornerOf(kit: Kit, tiedown: KitTiedown): Corner | undefined {
  if (tiedown.secures.toLowerCase() !== "machine") return undefined;
  const point = kit.machine.tiedownPoints.find((p) => p.label.toLowerCase() === tiedown.machinePoint?.toLowerCase());
  if (point && point.side !== "centre") {
    const end: End = point.positionMm < kit.machine.lengthMm / 2 ? "front" : "rear";
    return CORNERS.find((c) => c.end === end && c.side === point.side);
  }
  const words = `${tiedown.machinePoint ?? ""} ${tiedown.label}`.toLowerCase();
  const named = CORNERS.find((c) => words.includes(c.end) && words.includes(c.side));
  if (named) return named;
  const anchor = kit.trailer.anchorPoints.find((a) => a.id === tiedown.anchorPointId);
  if (!anchor || anchor.side === "centre") return undefined;
  const end: End = anchor.positionMm < kit.trailer.deckLengthMm / 2 ? "front" : "rear";
  return CORNERS.find((c) => c.end === end && c.side === anchor.side);
}

function machinePointFor(kit: Kit, corner: Corner) {
  const half = kit.machine.lengthMm / 2;
  const points = kit.machine.tiedownPoints.filter((p) => p.side === corner.side && (corner.end === "front" ? p.positionMm < half : p.positionMm >= half));
  return points.sort((a, b) => (corner.end === "front" ? a.positionMm - b.positionMm : b.positionMm - a.positionMm))[0];
}

function anchorFor(anchors: readonly AnchorPoint[], side: Side, end: End, used: ReadonlySet<string>): AnchorPoint | undefined {
  // Front corners pull forward and rear corners rearward (common practice), so the front
  // corners take the foremost free point on their side and the rear ones the rearmost.
  return anchors
    .filter((a) => a.side === side && a.usable.ok && !used.has(a.id))
    .sort((a, b) => (end === "front" ? a.positionMm - b.positionMm : b.positionMm - a.positionMm))[0];
}

/**
 * A tiedown to create (or an empty one to fill) for a corner, and what could not be found.
 *
 * @example
 * const p: CornerPlan = { corner: "rear left", tiedownId: null, label: "rear left", anchorPointId: "…",
 *   machinePoint: "rear left", attachment: "direct", itemIds: ["…", "…"], gaps: [] };
 */
export interface CornerPlan {
  readonly corner: Corner["label"];
  /** An existing empty tiedown of this corner to fill, or null to create one. */
  readonly tiedownId: string | null;
  readonly label: string;
  readonly anchorPointId: string | null;
  readonly machinePoint: string | null;
  readonly attachment: KitTiedown["attachment"];
  readonly itemIds: readonly string[];
  /** What could not be matched, in words ("no free grade 70 3/8 in chain"). */
  readonly gaps: readonly string[];
}

/**
 * "Use the same for all four corners": for each corner of the machine with no tiedown yet
 * (or an empty one), a tiedown like `from` (same attachment, the same sorts of items picked
 * from the free list) on a free, usable anchor point of the same side. Corners that already
 * have items are left alone.
 *
 * @example
 * cornerPlans(kit, frontLeftTiedown, freeItems).map((p) => p.corner); // ["front right", "rear left", "rear right"]
 */
export function cornerPlans(kit: Kit, from: KitTiedown, free: readonly KitItem[]): CornerPlan[] {
  const taken = new Set<string>(kit.tiedowns.flatMap((t) => t.items.map((i) => i.id)));
  const usedAnchors = new Set<string>(kit.tiedowns.map((t) => t.anchorPointId));
  const occupied = new Map<string, KitTiedown>();
  for (const t of kit.tiedowns) {
    const c = cornerOf(kit, t);
    if (c && (!occupied.has(c.label) || t.items.length > 0)) occupied.set(c.label, t);
  }
  const plans: CornerPlan[] = [];
  for (const corner of CORNERS) {
    const existing = occupied.get(corner.label);
    if (existing && existing.items.length > 0) continue;
    const gaps: string[] = [];
    const itemIds: string[] = [];
    for (const template of from.items) {
      const found = pickLike(template, free, taken);
      if (found) {
        taken.add(found.id);
        itemIds.push(found.id);
      } else gaps.push(`no free ${template.description.toLowerCase()} like ${template.tagCode}`);
    }
    if (existing) {
      plans.push({ corner: corner.label, tiedownId: existing.id, label: existing.label, anchorPointId: existing.anchorPointId, machinePoint: existing.machinePoint, attachment: existing.attachment, itemIds, gaps });
      continue;
    }
    const anchor = anchorFor(kit.trailer.anchorPoints, corner.side, corner.end, usedAnchors);
    if (anchor) usedAnchors.add(anchor.id);
    else gaps.unshift(`no free anchor point in use on the ${corner.side} side`);
    const point = machinePointFor(kit, corner);
    plans.push({
      corner: corner.label,
      tiedownId: null,
      label: point?.label ?? corner.label,
      anchorPointId: anchor?.id ?? null,
      machinePoint: point?.label ?? null,
      attachment: from.attachment,
      itemIds,
      gaps,
    });
  }
  return plans;
}
