import { describe, expect, it } from "vitest";
import type { Kit, KitItem, KitTiedown } from "@/lib/kits/model";
import { kitVerdict } from "@/lib/kits/plan";
import { proposalStock, proposeKit, strapsAllowed, type Proposal, type UnavailableItem } from "@/lib/kits/proposal";
import { anchor, binder, chain } from "./fixtures";
import { passingScene, splitTilt } from "./scenes";

// Invented stock: grade 70 chain in three sizes with the binders that take them, and straps.
const g70 = (size: "5/16" | "3/8" | "1/2", wllLb: number, over: Partial<KitItem> = {}) =>
  chain({ description: `Chain, grade 70, ${size} in`, size, wllLb, ...over });
const smallBinder = (over: Partial<KitItem> = {}) => binder({ description: "Ratchet binder, 5/16–3/8 in", markedWllLb: 5400, wllLb: 5400, ...over });
const bigBinder = (over: Partial<KitItem> = {}) =>
  binder({ description: "Ratchet binder, 3/8–1/2 in", size: "1/2", markedWllLb: 9200, wllLb: 9200, details: { mechanism: "ratchet", chainSizeRange: ["3/8", "1/2"] }, ...over });
const strap = (over: Partial<KitItem> = {}) =>
  chain({ kind: "web-strap", description: "Web strap, 4 in", grade: null, size: "4", markedWllLb: 5400, wllLb: 5400, details: {}, ...over });
const times = <T,>(n: number, make: () => T): T[] => Array.from({ length: n }, make);
const taggedOut = { ok: false, reasons: [{ code: "TAGGED_OUT" as const, message: "Tagged out." }] };

/** The kit with the proposal's tiedowns, built from the items themselves: what the API would save. */
function applied(kit: Kit, p: Proposal, stock: readonly KitItem[]): Kit {
  const byId = new Map(stock.map((i) => [i.id, i]));
  const tiedowns: KitTiedown[] = p.tiedowns.map((t, i) => ({ id: `saved-${i}`, ...t, items: t.itemIds.map((id) => byId.get(id)!) }));
  return { ...kit, tiedowns };
}
/**
 * The kit with a 12,500 lb machine, on the same trailer rated 20,000 lb: Split tilt 20's
 * 14,000 lb GVWR would fail the placement (3,900 + 12,500 lb), which these gear tests are not about.
 */
const heavier = (k: Kit, over: Partial<Kit["machine"]> = {}): Kit => ({
  ...k,
  machine: { ...k.machine, weightLb: 12500, name: "Unit 15 excavator", ...over },
  trailer: { ...k.trailer, gvwrLb: 20000 },
});
const sizesOf = (p: Proposal, stock: readonly KitItem[]) => p.tiedowns.map((t) => t.itemIds.map((id) => stock.find((i) => i.id === id)!).filter((i) => i.kind === "chain").map((i) => i.size));

describe("proposeKit: a proposal that passes", () => {
  const kit = { ...passingScene(), tiedowns: [] };
  const stock = [...times(6, () => g70("3/8", 6600)), ...times(6, () => g70("5/16", 4700)), ...times(4, () => g70("1/2", 11300)), ...times(6, smallBinder), ...times(4, bigBinder)];

  it("passes the engine on its own: the kit with the proposed items gets the same passing check", () => {
    const p = proposeKit(kit, stock);
    expect(p.pass).toBe(true);
    expect(p.missing).toEqual([]);
    const verdict = kitVerdict(applied(kit, p, stock));
    expect(verdict.pass).toBe(true);
    expect(verdict.blockers).toEqual([]);
    expect(verdict.check).toEqual(p.check);
    // A tiedown at each corner plus one for the blade (common practice), each a chain and a binder that takes it.
    expect(p.tiedowns.map((t) => [t.label, t.secures, t.machinePoint, t.attachment])).toEqual([
      ["front left", "machine", "front left", "direct"],
      ["front right", "machine", "front right", "direct"],
      ["rear left", "machine", "rear left", "direct"],
      ["rear right", "machine", "rear right", "direct"],
      ["blade", "blade", "blade", "direct"],
    ]);
    expect(verdict.check.findings.map((f) => f.code)).not.toContain("BINDER_CHAIN_SIZE_OUT_OF_RANGE");
  });

  it("uses each item once, and only free items", () => {
    const p = proposeKit(kit, stock);
    const ids = p.tiedowns.flatMap((t) => t.itemIds);
    expect(new Set(ids).size).toBe(ids.length);
    for (const id of ids) expect(stock.some((i) => i.id === id)).toBe(true);
  });

  it("runs front corners to anchor points ahead of them and rear corners to anchor points behind them, on the same side", () => {
    const p = proposeKit(kit, stock);
    const front = 600; // the machine's front from the deck front
    const anchorOf = (label: string) => splitTilt.anchorPoints.find((a) => a.id === p.tiedowns.find((t) => t.label === label)!.anchorPointId)!;
    // Front points 250 mm back on the machine: 850 mm from the deck front; rear points 4,650: 5,250 mm.
    expect(anchorOf("front left")).toMatchObject({ label: "L1", side: "left" });
    expect(anchorOf("front left").positionMm).toBeLessThan(front + 250);
    expect(anchorOf("front right")).toMatchObject({ label: "R1", side: "right" });
    expect(anchorOf("rear left")).toMatchObject({ label: "L3", side: "left" });
    expect(anchorOf("rear left").positionMm).toBeGreaterThan(front + 4650);
    expect(anchorOf("rear right")).toMatchObject({ label: "R3", side: "right" });
    // The blade takes the centre anchor point nearest its tie-down point.
    expect(anchorOf("blade").label).toBe("C1");
  });

  it("uses the fewest items: one strap per tiedown where the machine's class allows straps", () => {
    const roller = { ...kit, machine: { ...kit.machine, machineClass: "roller", name: "Pebble 2 roller", accessories: [], weightLb: 5200 } };
    const withStraps = [...stock, ...times(4, strap)];
    const p = proposeKit(roller, withStraps);
    expect(p.pass).toBe(true);
    expect(p.tiedowns).toHaveLength(4);
    expect(p.tiedowns.every((t) => t.itemIds.length === 1)).toBe(true);
    expect(kitVerdict(applied(roller, p, withStraps)).pass).toBe(true);
    // The same stock on a mini excavator: straps are not proposed (common practice), chain and binder pairs are.
    const excavator = proposeKit(kit, withStraps);
    expect(excavator.tiedowns.every((t) => t.itemIds.length === 2)).toBe(true);
    expect(excavator.tiedowns.flatMap((t) => t.itemIds).some((id) => withStraps.find((i) => i.id === id)!.kind === "web-strap")).toBe(false);
  });

  it("chooses lighter gear over heavier when both pass, keeping the 1/2 in chain free", () => {
    // 8,100 lb needs 4,050 lb of aggregate WLL; five 5/16 in grade 70 chains (4,700 lb) count
    // 5 × 2,350 = 11,750 lb (C1 caps the blade's at 5,000 → 2,350 still), so nothing heavier is needed.
    const p = proposeKit(kit, stock);
    expect(sizesOf(p, stock)).toEqual(times(5, () => ["5/16"]));
    // With the 5/16 in chain all taken, the next size up, never the 1/2 in.
    const without = stock.filter((i) => i.size !== "5/16");
    const q = proposeKit(kit, without);
    expect(q.pass).toBe(true);
    expect(sizesOf(q, without)).toEqual(times(5, () => ["3/8"]));
  });

  it("keeps to the Handbook's 5,000 lb a tiedown on a machine of 10,000 lb or more when free gear allows, and says when it cannot", () => {
    const heavy = heavier(kit);
    const p = proposeKit(heavy, stock);
    expect(p.pass).toBe(true);
    // 5/16 in grade 70 is 4,700 lb, below 5,000: 3/8 in with a 5,400 lb binder is the lightest that reaches it.
    expect(sizesOf(p, stock).slice(0, 4)).toEqual(times(4, () => ["3/8"]));
    expect(p.check.findings.map((f) => f.code)).not.toContain("HANDBOOK_TIEDOWN_WLL_BELOW_5000");
    expect(p.notes.join(" ")).not.toContain("Handbook");
    // Only 5/16 in chain free: it still meets 49 CFR (4 × 2,350 + 2,350 = 11,750 ≥ 6,250), and the note says what it lacks.
    const light = stock.filter((i) => !(i.kind === "chain" && i.size !== "5/16"));
    const q = proposeKit(heavy, light);
    expect(q.pass).toBe(true);
    expect(q.notes.join(" ")).toContain("FMCSA Driver's Handbook on Cargo Securement (ch. 10)");
  });

  it("never proposes a chain with no grade mark, though its grade 30 rating would pass, and says it left it out", () => {
    // An old 3/8 in chain with no grade mark: 2,650 lb as grade 30 (49 CFR 393.108(d)), lighter-rated than any marked chain here.
    const old = chain({ tagCode: "OLDCHAIN", description: "Chain, 3/8 in, no grade mark", grade: null, gradeMarked: false, size: "3/8", wllLb: 2650 });
    const p = proposeKit(kit, [old, ...stock]);
    expect(p.pass).toBe(true);
    expect(p.tiedowns.flatMap((t) => t.itemIds)).not.toContain(old.id);
    expect(p.notes).toContain(
      "Left out: one free chain with no grade mark (OLDCHAIN), rated as grade 30 (49 CFR 393.108(d)); a proposal picks gear by the rating marked on it (common practice). Add it by hand if you mean to.",
    );
  });

  it("ignores the kit's current tiedowns and proposes a whole kit", () => {
    const current = passingScene();
    const p = proposeKit(current, stock);
    expect(p.tiedowns).toHaveLength(5);
    expect(p.tiedowns.flatMap((t) => t.itemIds).some((id) => current.tiedowns.some((t) => t.items.some((i) => i.id === id)))).toBe(false);
  });
});

describe("proposeKit: saying what is missing", () => {
  const kit = { ...passingScene(), tiedowns: [] };

  it("names the binder that is missing for the free chain, and why the others are not free", () => {
    const chains = times(6, () => g70("1/2", 11300));
    const tagged = times(2, () => bigBinder({ usable: taggedOut }));
    const elsewhere = bigBinder();
    const unavailable: UnavailableItem[] = [
      ...tagged.map((item) => ({ item, reason: { code: "NOT_USABLE" as const } })),
      { item: elsewhere, reason: { code: "IN_OTHER_KIT", kitId: "k-9", job: "Alder Street trench" } },
    ];
    const p = proposeKit(kit, [...chains, ...times(2, smallBinder)], unavailable);
    expect(p.pass).toBe(false);
    expect(p.missing).toContain("No free binder for 1/2 in chain on 2026-12-03; two are tagged out, one is in the kit for Alder Street trench.");
    expect(p.missing[0]).toBe("Gear for five tiedowns is needed; free gear on 2026-12-03 makes up none.");
    expect(p.tiedowns).toEqual([]);
  });

  it("says how many chains are short and where the others are", () => {
    const stock = [...times(3, () => g70("3/8", 6600)), ...times(6, smallBinder)];
    const inKit = times(2, () => g70("3/8", 6600));
    const elsewhere: UnavailableItem[] = inKit.map((item) => ({ item, reason: { code: "IN_OTHER_KIT", kitId: "k-2", job: "Hollins driveway" } }));
    const heavy = heavier(kit);
    const p = proposeKit(heavy, stock, elsewhere);
    // Three tiedowns on a machine of 10,000 lb or more: 49 CFR 393.130(c)(1) asks for four.
    expect(p.pass).toBe(false);
    expect(p.missing).toContain("Only three free chains on 2026-12-03 for five tiedowns; two are in the kit for Hollins driveway.");
    // It still proposes what it can, so that the check shows where the kit stands.
    expect(p.tiedowns).toHaveLength(3);
    // The 8,100 lb machine passes on three (49 CFR 393.110 asks for three at 16 ft), and the shortfall is a note.
    const light = proposeKit(kit, stock, elsewhere);
    expect(light.pass).toBe(true);
    expect(light.missing).toEqual([]);
    expect(light.notes).toContain("Only three free chains on 2026-12-03 for five tiedowns; two are in the kit for Hollins driveway.");
  });

  it("says when binders run short before chains do", () => {
    const heavy = heavier(kit);
    const stock = [...times(6, () => g70("3/8", 6600)), ...times(2, smallBinder)];
    const tagged = smallBinder({ usable: taggedOut });
    const p = proposeKit(heavy, stock, [{ item: tagged, reason: { code: "NOT_USABLE" } }]);
    expect(p.pass).toBe(false);
    expect(p.missing).toEqual([
      "Gear for five tiedowns is needed; free gear on 2026-12-03 makes up two.",
      "Only two free binders on 2026-12-03 that take the free chains; of the others that would, one is tagged out.",
    ]);
  });

  it("says how far short the strongest free gear falls, and which stronger gear is not free", () => {
    const heavy = heavier(kit, { accessories: [] });
    // 1/4 in grade 43 chain: 2,600 lb. Four count 4 × 1,300 = 5,200 lb against 6,250 lb.
    const weak = times(4, () => chain({ description: "Chain, grade 43, 1/4 in", grade: 43, size: "1/4", wllLb: 2600 }));
    const binders = times(4, () => smallBinder({ details: { mechanism: "ratchet", chainSizeRange: ["1/4", "5/16"] } }));
    const away = times(2, () => g70("3/8", 6600));
    const p = proposeKit(heavy, [...weak, ...binders], away.map((item) => ({ item, reason: { code: "IN_OTHER_KIT", kitId: "k-3", job: "Mill Road culvert" } })));
    expect(p.pass).toBe(false);
    expect(p.missing).toEqual([
      "The strongest tiedowns that free gear makes up on 2026-12-03 reach an aggregate WLL of 5,200 lb (2,358.7 kg); Unit 15 excavator needs 6,250 lb (2,835 kg), half its 12,500 lb (49 CFR 393.106(d)): 1,050 lb short.",
      "Stronger gear that is not free on 2026-12-03: 3/8 in chain, grade 70: two are in the kit for Mill Road culvert.",
    ]);
  });

  it("names the anchor point out of use when a corner has none that suits it", () => {
    const bent = { ...splitTilt, anchorPoints: splitTilt.anchorPoints.map((a) => (a.id === "l1" ? anchor("l1", { label: "L1", side: "left", positionMm: 150, status: "tagged_out", usable: { ok: false, reasons: [{ code: "TAGGED_OUT", message: "Tagged out: bent D-ring." }] } }) : a)) };
    const stock = [...times(6, () => g70("3/8", 6600)), ...times(6, smallBinder)];
    const p = proposeKit({ ...kit, trailer: bent }, stock);
    expect(p.tiedowns.map((t) => t.anchorPointId)).not.toContain("l1");
    expect(p.tiedowns.map((t) => t.label)).not.toContain("front left");
    const gap = [...p.missing, ...p.notes].find((m) => m.startsWith("No anchor point on the left side ahead of"));
    expect(gap).toBe(
      "No anchor point on the left side ahead of the machine's front left tie-down point (0.85 m (2 ft 9 in) from the deck front) for the front left tiedown: L1 is out of use (Tagged out: bent D-ring.).",
    );
  });
});

describe("proposeKit: where the machine sits", () => {
  it("says that the loaded trailer is over its GVWR, which no gear mends, and does not pass", () => {
    const stock = [...times(6, () => g70("3/8", 6600)), ...times(6, smallBinder)];
    // 3,900 lb empty + 12,500 lb machine = 16,400 lb on a 14,000 lb GVWR.
    const over = { ...passingScene(), tiedowns: [], machine: { ...passingScene().machine, weightLb: 12500 } };
    const p = proposeKit(over, stock);
    expect(p.check.pass).toBe(true);
    expect(p.pass).toBe(false);
    expect(p.missing).toEqual([
      "The loaded trailer weighs 16,400 lb (7,438.9 kg) (empty 3,900 lb plus the machine's 12,500 lb), 2,400 lb over its GVWR of 14,000 lb (6,350.3 kg). Use a trailer rated for the load; moving the machine does not change this. Source: The trailer maker's GVWR (on its certification label; 49 CFR 567.4, from memory).",
    ]);
  });
});

describe("proposalStock", () => {
  it("counts the kit's own items as free, names the kit holding another, and keeps out what may not be used", () => {
    const mine = g70("3/8", 6600);
    const loose = smallBinder();
    const held = g70("3/8", 6600);
    const out = smallBinder({ usable: taggedOut });
    const { free, unavailable } = proposalStock("k-pass", [
      { item: mine, holder: { kitId: "k-pass", job: "Hollins driveway" } },
      { item: loose, holder: null },
      { item: held, holder: { kitId: "k-2", job: "Mill Road culvert" } },
      { item: out, holder: null },
    ]);
    expect(free.map((i) => i.id)).toEqual([mine.id, loose.id]);
    expect(unavailable).toEqual([
      { item: held, reason: { code: "IN_OTHER_KIT", kitId: "k-2", job: "Mill Road culvert" } },
      { item: out, reason: { code: "NOT_USABLE" } },
    ]);
  });
});

describe("strapsAllowed (common practice)", () => {
  it("allows straps on small rollers and other light equipment, never on tracked machines or an organisation's own classes", () => {
    expect(["mini-excavator", "skid-steer", "compact-track-loader", "wheel-loader"].map(strapsAllowed)).toEqual([false, false, false, false]);
    expect(strapsAllowed("roller")).toBe(true);
    expect(strapsAllowed("other")).toBe(true);
    expect(strapsAllowed("trencher")).toBe(false);
  });
});
