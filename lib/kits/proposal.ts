/**
 * "Propose a kit": from the gear that is free and usable on the kit's date, choose anchor
 * points and tiedowns that pass the kit's check (`kitVerdict`), with the fewest items and no
 * heavier gear than needed; where nothing passes, say what is missing in words a planner
 * acts on.
 *
 * Decisions, and why:
 * - **The kit's current tiedowns are ignored**: a proposal is a whole kit that replaces them
 *   (`?apply=true` swaps them in one go). Keeping hand-picked tiedowns would lock in the gear
 *   they hold and make "fewest items, lightest gear" impossible to honour. The items the kit
 *   holds now are free for it: the caller passes as `free` every usable item that no *other*
 *   kit holds on the date.
 * - **Which tiedowns**: one at each corner of the machine plus one for each accessory
 *   (common practice; 49 CFR 393.130(c)(1) asks for at least four on a machine of 10,000 lb
 *   or more and 393.130(b)(1) that accessories be secured). More on the machine only when
 *   49 CFR 393.110 asks for more than four (a machine longer than 30 ft).
 * - **Which anchor points**: a corner's anchor point is on the same side of the deck; a front
 *   corner's lies ahead of its tie-down point and a rear corner's behind it, so that the
 *   front chains pull forward and the rear chains pull back and, between them, the machine
 *   is held against moving forward, back and sideways (49 CFR 393.130(c)(1); (c)(2): each
 *   tiedown as close as practicable to the front and rear). Among those, the nearest one
 *   rated at least the per-tiedown target (see below), else the strongest. An accessory takes
 *   the nearest free anchor point to its tie-down point (a centre one first when it has none).
 *   Only anchor points whose usability verdict says yes are used (49 CFR 393.104(c)).
 * - **Which gear**: a tiedown is a chain with a binder whose chain-size range takes it
 *   (common practice: a binder is used only on chain inside its range; reference §8), or one
 *   web strap (its own ratchet) where the machine's class allows straps ({@link WEB_STRAP_CLASSES}).
 *   A chain with no grade mark (rated as grade 30, 49 CFR 393.108(d)) is never proposed:
 *   it would be picked as "the lightest that passes" over marked chain of the same size
 *   (common practice: pick gear by the rating marked on it); the notes name it.
 *   Hooks, shackles and wire rope are not proposed: the chain's own hooks make the ends.
 * - **Order of preference**: fewest items first, then the lightest gear (a chain's weight
 *   goes with the square of its size; a strap weighs a fraction of any chain), then the
 *   lowest WLL that still passes, so that the stronger and heavier gear stays free for the
 *   big machine. For a machine of 10,000 lb or more, tiedowns of at least 5,000 lb WLL each
 *   on the machine (FMCSA Driver's Handbook on Cargo Securement, ch. 10: guidance) are
 *   preferred, and a proposal without them says so in `notes`.
 * - **Attachment**: every tiedown is proposed as `direct` (chain from anchor point to the
 *   machine's tie-down point), counting half its WLL (49 CFR 393.106(d)).
 *
 * @module
 */
import {
  CHAIN_TABLE,
  countedWll,
  formatLbKg,
  formatNumber,
  HANDBOOK_MIN_TIEDOWN_WLL_LB,
  isHeavyMachine,
  meetsAggregate,
  minimumTiedowns,
  requiredAggregateWll,
  settle,
  sizeMatchesRow,
  toFeet,
  tryParseSize,
  type Attachment,
  type SecurementCheckResult,
} from "@/lib/securement";
import type { UsabilityCode } from "@/lib/stock/usability";
import type { AnchorPoint, BuiltInMachineClass, Kit, KitItem, KitTiedown, Machine, MachinePoint, Side } from "./model";
import { kitVerdict, placementFails } from "./plan";
import { formatMetres } from "./placement";

/**
 * Machine classes on which web straps may be proposed (common practice). Tracked machines
 * and steel-bodied loaders get chain: tracks, grousers, buckets and steel edges cut webbing,
 * and their tie-down loops are made for chain hooks. Small rollers and light "other"
 * equipment may take straps, kept off sharp edges. A class an organisation adds itself gets
 * chain (the conservative choice) until this table names it.
 *
 * @example
 * WEB_STRAP_CLASSES["mini-excavator"]; // false
 * WEB_STRAP_CLASSES.roller;            // true
 */
export const WEB_STRAP_CLASSES: Readonly<Record<BuiltInMachineClass, boolean>> = {
  "mini-excavator": false,
  "skid-steer": false,
  "compact-track-loader": false,
  "wheel-loader": false,
  roller: true,
  other: true,
};

/**
 * Whether straps may be proposed for a machine class ({@link WEB_STRAP_CLASSES}; unknown classes: no).
 *
 * @example
 * strapsAllowed("roller");        // true
 * strapsAllowed("trencher (own)"); // false
 */
export function strapsAllowed(machineClass: string): boolean {
  return (WEB_STRAP_CLASSES as Readonly<Record<string, boolean>>)[machineClass] === true;
}

/**
 * An item that is not free on the kit's date, and why: its usability verdict says no
 * (`item.usable.reasons` tells why), or another kit holds it that day.
 *
 * @example
 * const u: UnavailableItem = { item, reason: { code: "IN_OTHER_KIT", kitId: "…", job: "Hollins driveway" } };
 * const v: UnavailableItem = { item: taggedOutChain, reason: { code: "NOT_USABLE" } };
 */
export interface UnavailableItem {
  readonly item: KitItem;
  readonly reason: { readonly code: "NOT_USABLE" } | { readonly code: "IN_OTHER_KIT"; readonly kitId: string; readonly job: string };
}

/**
 * The kinds of gear a proposal is made of (chains, binders, web straps); only these are read
 * from stock for it.
 *
 * @example
 * PROPOSAL_KINDS.includes("binder"); // true
 */
export const PROPOSAL_KINDS = ["chain", "binder", "web-strap"] as const;

/**
 * Splits the stock for a proposal on `kit`'s date into what it may choose from and what it
 * may not, with why: an item is free when its usability verdict for the date says yes and no
 * other kit holds it that day (the items this kit holds now count as free, since a proposal
 * replaces its tiedowns); otherwise it is unavailable, held by another kit (named) or not
 * usable.
 *
 * @example
 * const { free, unavailable } = proposalStock("k-1", [{ item: chain, holder: null }, { item: binder, holder: { kitId: "k-2", job: "Mill Road" } }]);
 * free.length;                 // 1
 * unavailable[0].reason.code;  // "IN_OTHER_KIT"
 */
export function proposalStock(
  kitId: string,
  stock: readonly { readonly item: KitItem; readonly holder: { readonly kitId: string; readonly job: string } | null }[],
): { free: KitItem[]; unavailable: UnavailableItem[] } {
  const free: KitItem[] = [];
  const unavailable: UnavailableItem[] = [];
  for (const { item, holder } of stock) {
    if (holder && holder.kitId !== kitId) unavailable.push({ item, reason: { code: "IN_OTHER_KIT", kitId: holder.kitId, job: holder.job } });
    else if (!item.usable.ok) unavailable.push({ item, reason: { code: "NOT_USABLE" } });
    else free.push(item);
  }
  return { free, unavailable };
}

/**
 * One proposed tiedown: the body of `POST /api/v1/kits/{id}/tiedowns`, plus the machine's
 * tie-down point it runs to (null: the nearest point of the machine).
 *
 * @example
 * const t: ProposedTiedown = { label: "front left", anchorPointId: "l1", attachment: "direct", secures: "machine", machinePoint: "front left", itemIds: ["chain-1", "binder-2"] };
 */
export interface ProposedTiedown {
  readonly label: string;
  readonly anchorPointId: string;
  readonly attachment: Attachment;
  readonly secures: string;
  readonly machinePoint: string | null;
  readonly itemIds: readonly string[];
}

/**
 * A proposal: its tiedowns, the engine's check of the kit with them (`check`), the kit's
 * verdict (`pass`: the engine passes and no gear is blocked), what is missing when it does
 * not pass, and notes on the choices made.
 *
 * @example
 * const p: Proposal = proposeKit(kit, free, unavailable);
 * p.pass; p.tiedowns; p.check.aggregateWllLb; p.missing; p.notes;
 */
export interface Proposal {
  readonly tiedowns: readonly ProposedTiedown[];
  readonly check: SecurementCheckResult;
  readonly pass: boolean;
  readonly missing: readonly string[];
  readonly notes: readonly string[];
}

// ---------------------------------------------------------------------------------------
// Slots: the tiedowns wanted, each with the anchor point chosen for it.

interface Slot {
  readonly label: string;
  readonly secures: string;
  readonly machinePoint: string | null;
  readonly onMachine: boolean;
  readonly anchor: AnchorPoint | null;
  readonly why: string | null;
}

const NUMBER_WORDS = ["no", "one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten", "eleven", "twelve"];
const count = (n: number) => NUMBER_WORDS[n] ?? formatNumber(n);
const plural = (n: number, word: string, many = `${word}s`) => `${count(n)} ${n === 1 ? word : many}`;

function cornerPoints(points: readonly MachinePoint[], side: Side, lengthMm: number): { front: MachinePoint | null; rear: MachinePoint | null } {
  const mine = points.filter((p) => p.side === side).sort((a, b) => a.positionMm - b.positionMm);
  if (mine.length === 0) return { front: null, rear: null };
  if (mine.length === 1) return mine[0]!.positionMm < lengthMm / 2 ? { front: mine[0]!, rear: null } : { front: null, rear: mine[0]! };
  return { front: mine[0]!, rear: mine[mine.length - 1]! };
}

function describeAnchorGap(kit: Kit, side: Side, where: "ahead" | "behind", pointWords: string, atMm: number): string {
  const sameSide = kit.trailer.anchorPoints.filter((a) => a.side === side && (where === "ahead" ? a.positionMm < atMm : a.positionMm > atMm));
  const out = sameSide.filter((a) => !a.usable.ok);
  const sideWords = side === "left" ? "left" : "right";
  const base = `No anchor point on the ${sideWords} side ${where === "ahead" ? "ahead of" : "behind"} ${pointWords} (${formatMetres(atMm)} from the deck front) for the ${where === "ahead" ? "front" : "rear"} ${sideWords} tiedown`;
  if (sameSide.length === 0) {
    return `${base}: ${kit.trailer.name} has none there. ${where === "ahead" ? "Move the machine back" : "Move the machine forward"} or use another trailer.`;
  }
  const outWords = out.map((a) => `${a.label} is out of use (${a.usable.reasons.map((r) => r.message).join(" ")})`);
  const taken = sameSide.length - out.length;
  return `${base}: ${[...outWords, ...(taken > 0 ? [`${plural(taken, "other is", "others are")} taken by another tiedown`] : [])].join("; ")}.`;
}

function chooseAnchor(candidates: readonly AnchorPoint[], atMm: number, targetLb: number): AnchorPoint | null {
  const sorted = [...candidates].sort(
    (a, b) => Number(b.wllLb >= targetLb) - Number(a.wllLb >= targetLb) || (a.wllLb >= targetLb ? Math.abs(a.positionMm - atMm) - Math.abs(b.positionMm - atMm) : b.wllLb - a.wllLb) || a.label.localeCompare(b.label),
  );
  return sorted[0] ?? null;
}

/** The machine's minimum number of tiedowns, its length in feet converted as the engine converts it (lib/securement/check.ts). */
function machineMinimum(machine: Machine) {
  return minimumTiedowns({ kind: "machine", weightLb: machine.weightLb, lengthFt: settle(toFeet({ value: machine.lengthMm, unit: "mm" }).value), blockedAtFront: false });
}

function slotsFor(kit: Kit, targetLb: number, notes: string[]): Slot[] {
  const { machine, trailer } = kit;
  const p = kit.machineFrontFromDeckFrontMm ?? 0;
  if (kit.machineFrontFromDeckFrontMm === null) notes.push(`${machine.name} is not placed yet: the proposal takes its front at the front of the deck. Place it and propose again if it will sit elsewhere.`);
  const taken = new Set<string>();
  const free = (a: AnchorPoint) => a.usable.ok && a.wllLb > 0 && !taken.has(a.id);
  const slots: Slot[] = [];

  for (const end of ["front", "rear"] as const) {
    for (const side of ["left", "right"] as const) {
      const point = cornerPoints(machine.tiedownPoints, side, machine.lengthMm)[end];
      const atMm = p + (point ? point.positionMm : end === "front" ? 0 : machine.lengthMm);
      const where = end === "front" ? "ahead" : "behind";
      const candidates = trailer.anchorPoints.filter((a) => a.side === side && free(a) && (where === "ahead" ? a.positionMm < atMm : a.positionMm > atMm));
      const anchor = chooseAnchor(candidates, atMm, targetLb);
      if (anchor) taken.add(anchor.id);
      const label = `${end} ${side}`;
      const pointWords = point ? `the machine's ${point.label} tie-down point` : `the machine's ${label} corner`;
      if (!point) notes.push(`${machine.name} lists no ${label} tie-down point: the ${label} tiedown runs to the nearest point of the machine.`);
      slots.push({ label, secures: "machine", machinePoint: point?.label ?? null, onMachine: true, anchor, why: anchor ? null : describeAnchorGap(kit, side, where, pointWords, atMm) });
    }
  }

  // 49 CFR 393.110 asks for more than four only on a machine longer than 30 ft: add them mid-machine.
  const minimum = machineMinimum(machine);
  for (let i = 4; i < minimum.count; i++) {
    const side: Side = i % 2 === 0 ? "left" : "right";
    const mid = p + machine.lengthMm / 2;
    const anchor = chooseAnchor(trailer.anchorPoints.filter((a) => a.side === side && free(a)), mid, targetLb);
    if (anchor) taken.add(anchor.id);
    const label = `middle ${side}${i >= 6 ? ` ${Math.floor(i / 2) - 1}` : ""}`;
    slots.push({ label, secures: "machine", machinePoint: null, onMachine: true, anchor, why: anchor ? null : `No free anchor point on the ${side} side for a further tiedown: ${minimum.rule}.` });
  }

  for (const accessory of machine.accessories) {
    const point = machine.tiedownPoints.find((q) => q.label.toLowerCase().includes(accessory.toLowerCase())) ?? null;
    const atMm = p + (point ? point.positionMm : 0);
    const candidates = trailer.anchorPoints.filter(free);
    const rated = candidates.filter((a) => a.wllLb >= targetLb);
    const pool = rated.length ? rated : candidates;
    const anchor =
      [...pool].sort((a, b) => (point ? 0 : Number(b.side === "centre") - Number(a.side === "centre")) || Math.abs(a.positionMm - atMm) - Math.abs(b.positionMm - atMm) || a.label.localeCompare(b.label))[0] ?? null;
    if (anchor) taken.add(anchor.id);
    slots.push({
      label: accessory,
      secures: accessory,
      machinePoint: point?.label ?? null,
      onMachine: false,
      anchor,
      why: anchor ? null : `No free anchor point left on ${trailer.name} for a tiedown on the ${accessory}.`,
    });
  }
  return slots;
}

// ---------------------------------------------------------------------------------------
// Gear: what free items make up, grouped by how many items and how heavy.

interface Pool {
  readonly key: string;
  readonly items: KitItem[];
}

interface Option {
  readonly items: 1 | 2;
  readonly heft: number;
  readonly wllLb: number;
  readonly pools: readonly Pool[];
  /** Larger binder ranges are kept for larger chains: the top of the binder's range, for ties. */
  readonly binderTop: number;
}

interface Group {
  readonly items: 1 | 2;
  readonly heft: number;
  readonly options: readonly Option[];
}

/** A chain size as the table's trade size in inches (10 mm counts as 3/8 in, as in the engine). */
function tradeInches(size: string | null | undefined): number | null {
  if (!size) return null;
  const parsed = tryParseSize(size);
  if (!parsed) return null;
  return CHAIN_TABLE.rows.find((r) => sizeMatchesRow(parsed, r))?.inches ?? parsed.inches;
}

function binderRange(item: KitItem): [number, number] | null {
  const range = item.details.chainSizeRange;
  if (!Array.isArray(range) || range.length !== 2) return null;
  const lo = tradeInches(String(range[0]));
  const hi = tradeInches(String(range[1]));
  return lo === null || hi === null ? null : [Math.min(lo, hi), Math.max(lo, hi)];
}

const rated = (i: KitItem) => i.usable.ok && i.wllLb !== null && i.wllLb > 0;
/**
 * A chain with no legible grade mark is rated as grade 30 (49 CFR 393.108(d)) and may still
 * be added by hand; a proposal leaves it out (common practice: gear for a machine is picked
 * by the rating marked on it), and says so in its notes.
 */
const unmarkedChain = (i: KitItem) => i.kind === "chain" && !i.gradeMarked;
const proposable = (i: KitItem) => rated(i) && !unmarkedChain(i);
const byTag = (a: KitItem, b: KitItem) => a.tagCode.localeCompare(b.tagCode) || a.id.localeCompare(b.id);
const sizeWords = (inches: number) => `${tryParseSize(inches)?.label ?? formatNumber(inches)} in`;

function gearGroups(free: readonly KitItem[], straps: boolean): Group[] {
  const pools = new Map<string, Pool>();
  const pool = (key: string, item: KitItem) => {
    const p = pools.get(key) ?? { key, items: [] };
    p.items.push(item);
    pools.set(key, p);
  };
  for (const item of free.filter(proposable)) {
    if (item.kind === "chain") {
      const inches = tradeInches(item.size);
      if (inches !== null) pool(`chain|${inches}|${item.wllLb}`, item);
    } else if (item.kind === "binder") {
      const range = binderRange(item);
      if (range) pool(`binder|${range[0]}|${range[1]}|${item.wllLb}`, item);
    } else if (item.kind === "web-strap" && straps) {
      const width = tradeInches(item.size);
      if (width !== null) pool(`strap|${width}|${item.wllLb}`, item);
    }
  }
  for (const p of pools.values()) p.items.sort(byTag);
  const all = [...pools.values()];
  const options: Option[] = [];
  for (const chain of all.filter((p) => p.key.startsWith("chain|"))) {
    const [, inches, wll] = chain.key.split("|").map(Number) as [number, number, number];
    for (const binder of all.filter((p) => p.key.startsWith("binder|"))) {
      const [, lo, hi, bWll] = binder.key.split("|").map(Number) as [number, number, number, number];
      if (inches < lo - 1e-9 || inches > hi + 1e-9) continue;
      options.push({ items: 2, heft: inches * inches, wllLb: Math.min(wll, bWll), pools: [chain, binder], binderTop: hi });
    }
  }
  for (const strap of all.filter((p) => p.key.startsWith("strap|"))) {
    const [, width, wll] = strap.key.split("|").map(Number) as [number, number, number];
    options.push({ items: 1, heft: width * width * 0.001, wllLb: wll, pools: [strap], binderTop: 0 });
  }
  const groups = new Map<string, Option[]>();
  for (const o of options) {
    const key = `${o.items}|${o.heft}`;
    groups.set(key, [...(groups.get(key) ?? []), o]);
  }
  return [...groups.values()]
    .map((os) => ({ items: os[0]!.items, heft: os[0]!.heft, options: os }))
    .sort((a, b) => a.items - b.items || a.heft - b.heft);
}

// ---------------------------------------------------------------------------------------
// Search: multisets of groups in order of cost; the first that can be made up and passes.

interface Plan {
  /** Per slot (same order as the slots given), the option used. */
  readonly options: readonly Option[];
}

function capped(option: Option, slot: Slot): number {
  return Math.min(option.wllLb, slot.anchor!.wllLb);
}

function meets(plan: readonly Option[], slots: readonly Slot[], requiredLb: number, handbook: boolean): boolean {
  const aggregate = plan.reduce((s, o, i) => s + countedWll(capped(o, slots[i]!), "direct"), 0);
  if (!meetsAggregate(aggregate, requiredLb)) return false;
  return !handbook || plan.every((o, i) => !slots[i]!.onMachine || capped(o, slots[i]!) >= HANDBOOK_MIN_TIEDOWN_WLL_LB);
}

/** Tries to make up one tiedown of each group given (one per slot) from the pools, then pairs them with the slots. */
function makeUp(groups: readonly Group[], slots: readonly Slot[], requiredLb: number, handbook: boolean): Plan | null {
  const left = new Map<Pool, number>();
  const avail = (o: Option) => o.pools.every((p) => (left.get(p) ?? p.items.length) > 0);
  const take = (o: Option, n: number) => o.pools.forEach((p) => left.set(p, (left.get(p) ?? p.items.length) - n));
  // Heaviest first: larger chains have fewer binders that take them.
  const order = groups.map((g, i) => ({ g, i })).sort((a, b) => b.g.heft - a.g.heft);
  const chosen: Option[] = new Array(groups.length);
  for (const { g, i } of order) {
    const best = g.options.filter(avail).sort((a, b) => b.wllLb - a.wllLb || a.binderTop - b.binderTop)[0];
    if (!best) return null;
    take(best, 1);
    chosen[i] = best;
  }
  // Pair the strongest tiedowns with the strongest anchor points (this maximises the sum of
  // the capped WLLs); if the Handbook's 5,000 lb is wanted, give the machine's slots the first pick.
  const pair = (machineFirst: boolean): Option[] => {
    const idx = slots.map((s, i) => i).sort((a, b) => (machineFirst ? Number(slots[b]!.onMachine) - Number(slots[a]!.onMachine) : 0) || slots[b]!.anchor!.wllLb - slots[a]!.anchor!.wllLb);
    const strong = [...chosen].sort((a, b) => b.wllLb - a.wllLb);
    const out: Option[] = new Array(slots.length);
    idx.forEach((slot, k) => (out[slot] = strong[k]!));
    return out;
  };
  const first = [pair(false), pair(true)].find((p) => meets(p, slots, requiredLb, handbook));
  if (!first) return null;
  let plan: Option[] = first;
  // Keep the stronger gear free: swap each tiedown for a weaker one of the same size when the plan still passes.
  for (let i = 0; i < plan.length; i++) {
    const current: Option = plan[i]!;
    const group: Group = groups.find((g) => g.options.includes(current))!;
    take(current, -1);
    const weaker: Option[] = group.options.filter((o) => o.wllLb < current.wllLb && avail(o)).sort((a, b) => a.wllLb - b.wllLb);
    const now: Option[] = plan;
    const swap = weaker.find((o) => meets(now.map((x, j) => (j === i ? o : x)), slots, requiredLb, handbook));
    const use: Option = swap ?? current;
    take(use, 1);
    plan = plan.map((x, j) => (j === i ? use : x));
  }
  return { options: plan };
}

function* multisets(n: number, k: number, start = 0): Generator<number[]> {
  if (k === 0) {
    yield [];
    return;
  }
  for (let i = start; i < n; i++) for (const rest of multisets(n, k - 1, i)) yield [i, ...rest];
}

function search(groups: readonly Group[], slots: readonly Slot[], requiredLb: number, handbook: boolean): Plan | null {
  if (slots.length === 0) return { options: [] };
  const candidates = [...multisets(groups.length, slots.length)]
    .map((m) => ({ m, items: m.reduce((s, g) => s + groups[g]!.items, 0), heft: m.reduce((s, g) => s + groups[g]!.heft, 0) }))
    .sort((a, b) => a.items - b.items || a.heft - b.heft);
  for (const c of candidates) {
    const plan = makeUp(
      c.m.map((g) => groups[g]!),
      slots,
      requiredLb,
      handbook,
    );
    if (plan) return plan;
  }
  return null;
}

/** When nothing passes: the strongest tiedown the pools still give, slot by slot (strongest anchor first). */
function strongest(groups: readonly Group[], slots: readonly Slot[]): (Option | null)[] {
  const left = new Map<Pool, number>();
  const options = groups.flatMap((g) => g.options).sort((a, b) => b.wllLb - a.wllLb || a.items - b.items || a.heft - b.heft);
  const out: (Option | null)[] = new Array(slots.length).fill(null);
  const order = slots.map((s, i) => i).sort((a, b) => slots[b]!.anchor!.wllLb - slots[a]!.anchor!.wllLb);
  for (const i of order) {
    const o = options.find((x) => x.pools.every((p) => (left.get(p) ?? p.items.length) > 0));
    if (!o) break;
    o.pools.forEach((p) => left.set(p, (left.get(p) ?? p.items.length) - 1));
    out[i] = o;
  }
  return out;
}

// ---------------------------------------------------------------------------------------
// What is missing, in words.

const USABILITY_WORDS: Record<UsabilityCode, [string, string]> = {
  TAGGED_OUT: ["is tagged out", "are tagged out"],
  RETIRED: ["is retired", "are retired"],
  LOST: ["is marked lost", "are marked lost"],
  INSPECTION_OVERDUE: ["is overdue for inspection", "are overdue for inspection"],
  NOT_RATED: ["has no WLL", "have no WLL"],
};

/** "two are tagged out, one is in the kit for Hollins driveway" */
function whyNotFree(items: readonly UnavailableItem[]): string {
  const counts = new Map<string, { n: number; words: [string, string] }>();
  for (const u of items) {
    const code = u.reason.code;
    const words: [string, string] =
      code === "IN_OTHER_KIT"
        ? [`is in the kit for ${(u.reason as { job: string }).job}`, `are in the kit for ${(u.reason as { job: string }).job}`]
        : (USABILITY_WORDS[u.item.usable.reasons[0]?.code ?? "TAGGED_OUT"] ?? ["may not be used", "may not be used"]);
    const key = words[0];
    const c = counts.get(key) ?? { n: 0, words };
    c.n++;
    counts.set(key, c);
  }
  return [...counts.values()].map((c) => `${count(c.n)} ${c.n === 1 ? c.words[0] : c.words[1]}`).join(", ");
}

function missingGear(kit: Kit, free: readonly KitItem[], unavailable: readonly UnavailableItem[], wanted: number, made: number, straps: boolean): string[] {
  // Said per kind of gear, so that the planner knows what to free up or fetch.
  const out: string[] = [];
  const date = kit.date;
  const chains = free.filter((i) => i.kind === "chain" && proposable(i));
  const binders = free.filter((i) => i.kind === "binder" && rated(i));
  const unavailableChains = unavailable.filter((u) => u.item.kind === "chain");
  out.push(`Gear for ${plural(wanted, "tiedown")} is needed; free gear on ${date} makes up ${made === 0 ? "none" : count(made)}.`);
  if (chains.length === 0) {
    out.push(`No free chain on ${date}${unavailableChains.length ? `; ${whyNotFree(unavailableChains)}` : ""}.`);
  }
  // Each free chain size: the binders that would take it.
  const sizes = [...new Set(chains.map((c) => tradeInches(c.size)).filter((x): x is number => x !== null))].sort((a, b) => a - b);
  for (const inches of sizes) {
    const takes = (b: KitItem) => {
      const r = binderRange(b);
      return r !== null && inches >= r[0] - 1e-9 && inches <= r[1] + 1e-9;
    };
    if (!binders.some(takes)) {
      const blocked = unavailable.filter((u) => u.item.kind === "binder" && takes(u.item));
      out.push(`No free binder for ${sizeWords(inches)} chain on ${date}${blocked.length ? `; ${whyNotFree(blocked)}` : ""}.`);
    }
  }
  if (chains.length > 0 && chains.length < wanted) {
    out.push(`Only ${plural(chains.length, "free chain")} on ${date} for ${plural(wanted, "tiedown")}${unavailableChains.length ? `; ${whyNotFree(unavailableChains)}` : ""}.`);
  }
  const takesAFreeChain = (b: KitItem) => {
    const r = binderRange(b);
    return r !== null && sizes.some((s) => s >= r[0] - 1e-9 && s <= r[1] + 1e-9);
  };
  const fitting = binders.filter(takesAFreeChain);
  if (fitting.length > 0 && fitting.length < Math.min(chains.length, wanted)) {
    const blocked = unavailable.filter((u) => u.item.kind === "binder" && takesAFreeChain(u.item));
    out.push(`Only ${plural(fitting.length, "free binder")} on ${date} that take${fitting.length === 1 ? "s" : ""} the free chains${blocked.length ? `; of the others that would, ${whyNotFree(blocked)}` : ""}.`);
  }
  if (straps) {
    const blockedStraps = unavailable.filter((u) => u.item.kind === "web-strap");
    if (blockedStraps.length) out.push(`Web straps not free on ${date}: ${whyNotFree(blockedStraps)}.`);
  }
  return out;
}

function missingStrength(kit: Kit, slots: readonly Slot[], plan: readonly (Option | null)[], unavailable: readonly UnavailableItem[], requiredLb: number): string[] {
  const aggregate = plan.reduce((s, o, i) => s + (o ? countedWll(capped(o, slots[i]!), "direct") : 0), 0);
  if (meetsAggregate(aggregate, requiredLb)) return [];
  const gearOnly = plan.reduce((s, o) => s + (o ? countedWll(o.wllLb, "direct") : 0), 0);
  const out = [
    `The strongest tiedowns that free gear makes up on ${kit.date} reach an aggregate WLL of ${formatLbKg(aggregate)}; ${kit.machine.name} needs ${formatLbKg(requiredLb)}, half its ${formatNumber(kit.machine.weightLb)} lb (49 CFR 393.106(d)): ${formatNumber(requiredLb - aggregate)} lb short.`,
  ];
  if (meetsAggregate(gearOnly, requiredLb)) {
    const weak = slots.filter((s, i) => plan[i] && s.anchor!.wllLb < plan[i]!.wllLb).map((s) => `${s.anchor!.label} (${formatNumber(s.anchor!.wllLb)} lb)`);
    out.push(`The anchor points hold it down: ${weak.join(", ")} ${weak.length === 1 ? "is" : "are"} rated below the gear (49 CFR 393.108(a)).`);
  }
  const strongestFree = Math.max(0, ...plan.map((o) => o?.wllLb ?? 0));
  const stronger = unavailable.filter((u) => (u.item.kind === "chain" || u.item.kind === "web-strap") && (u.item.wllLb ?? 0) > strongestFree);
  if (stronger.length) {
    const bySize = new Map<string, UnavailableItem[]>();
    for (const u of stronger) {
      const key = `${u.item.size ?? "?"} in ${u.item.kind === "chain" ? `chain${u.item.grade ? `, grade ${u.item.grade}` : ""}` : "web strap"}`;
      bySize.set(key, [...(bySize.get(key) ?? []), u]);
    }
    out.push(`Stronger gear that is not free on ${kit.date}: ${[...bySize.entries()].map(([k, us]) => `${k}: ${whyNotFree(us)}`).join("; ")}.`);
  }
  return out;
}

// ---------------------------------------------------------------------------------------

function asTiedowns(slots: readonly Slot[], plan: readonly (Option | null)[]): { proposed: ProposedTiedown[]; kitTiedowns: KitTiedown[] } {
  const used = new Map<Pool, number>();
  const proposed: ProposedTiedown[] = [];
  const kitTiedowns: KitTiedown[] = [];
  slots.forEach((slot, i) => {
    const option = plan[i];
    if (!slot.anchor || !option) return;
    const items = option.pools.map((p) => {
      const n = used.get(p) ?? 0;
      used.set(p, n + 1);
      return p.items[n]!;
    });
    const t = { label: slot.label, anchorPointId: slot.anchor.id, attachment: "direct" as const, secures: slot.secures, machinePoint: slot.machinePoint };
    proposed.push({ ...t, itemIds: items.map((x) => x.id) });
    kitTiedowns.push({ ...t, id: `proposed-${i + 1}`, items });
  });
  return { proposed, kitTiedowns };
}

/**
 * Proposes a kit for `kit`'s machine and trailer on its date from `free` items (usable and
 * held by no other kit that day; the items this kit holds now count as free), and says what
 * is missing using `unavailable` (the items that are not free, with why). See the module
 * comment for every choice it makes.
 *
 * @example
 * const p = proposeKit(kit, freeItems, notFree);
 * p.pass;     // true: kitVerdict({ ...kit, tiedowns: p.tiedowns as kit tiedowns }).pass
 * p.tiedowns; // [{ label: "front left", anchorPointId: "l1", attachment: "direct", secures: "machine", machinePoint: "front left", itemIds: ["…chain", "…binder"] }, …]
 * p.missing;  // [] — or ["No free binder for 1/2 in chain on 2026-12-03; two are tagged out.", …]
 */
export function proposeKit(kit: Kit, free: readonly KitItem[], unavailable: readonly UnavailableItem[] = []): Proposal {
  const { machine } = kit;
  const notes: string[] = [];
  const heavy = isHeavyMachine("machine", machine.weightLb);
  const requiredLb = requiredAggregateWll(machine.weightLb);
  const straps = strapsAllowed(machine.machineClass);
  const machineSlots = Math.max(4, machineMinimum(machine).count);
  // A direct tiedown counts half its WLL, so n on the machine need W / n each to reach W / 2 between them.
  const targetLb = Math.max(heavy ? HANDBOOK_MIN_TIEDOWN_WLL_LB : 0, Math.ceil(machine.weightLb / machineSlots));
  const slots = slotsFor(kit, targetLb, notes);
  const unmarked = free.filter((i) => rated(i) && unmarkedChain(i));
  if (unmarked.length) {
    notes.push(
      `Left out: ${plural(unmarked.length, "free chain")} with no grade mark (${unmarked.map((i) => i.tagCode).join(", ")}), rated as grade 30 (49 CFR 393.108(d)); a proposal picks gear by the rating marked on it (common practice). Add ${unmarked.length === 1 ? "it" : "them"} by hand if you mean to.`,
    );
  }
  const anchored = slots.filter((s) => s.anchor !== null);
  const groups = gearGroups(free, straps);

  let found = search(groups, anchored, requiredLb, heavy);
  if (!found && heavy) {
    found = search(groups, anchored, requiredLb, false);
    if (found) notes.push("The free gear and the anchor points cannot give every tiedown on the machine a WLL of 5,000 lb or more, as the FMCSA Driver's Handbook on Cargo Securement (ch. 10) asks; the proposal meets 49 CFR 393.106(d) and 393.130 without it.");
  }
  const plan: readonly (Option | null)[] = found ? found.options : strongest(groups, anchored);
  const { proposed, kitTiedowns } = asTiedowns(anchored, plan);
  const verdict = kitVerdict({ ...kit, tiedowns: kitTiedowns });

  // What stands between the proposal and a whole kit: in `missing` when it does not pass, in
  // `notes` when it passes without it (a corner or an accessory that common practice wants).
  const made = plan.filter((o) => o !== null).length;
  const gaps = [
    ...slots.filter((s) => s.why).map((s) => s.why!),
    ...(made < anchored.length ? missingGear(kit, free, unavailable, anchored.length, made, straps) : missingStrength(kit, anchored, plan, unavailable, requiredLb)),
  ];
  const missing: string[] = [];
  if (verdict.pass) notes.push(...gaps);
  else {
    missing.push(...gaps);
    // Anything else the check fails on that gear cannot fix (an articulation joint not locked, …).
    const explained = new Set(["AGGREGATE_WLL_BELOW_REQUIRED", "TOO_FEW_TIEDOWNS", "ACCESSORY_NOT_SECURED"]);
    for (const f of verdict.check.findings) if (f.severity === "fail" && (!explained.has(f.code) || gaps.length === 0)) missing.push(`${f.message} (${f.source}).`);
    // Where the machine sits can fail the kit whatever the gear (over the GVWR, a lifting hitch).
    for (const f of placementFails(verdict.placement)) missing.push(`${f.message} Source: ${f.source}.`);
  }
  return { tiedowns: proposed, check: verdict.check, pass: verdict.pass, missing, notes };
}
