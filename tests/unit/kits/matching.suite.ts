import { describe, expect, it } from "vitest";
import { binderTakesChain, chainInches, cornerOf, cornerPlans, pickLike, sameSort, suggestItems } from "@/lib/kits/matching";
import { anchor, binder, chain, kit, tiedown, trailer } from "./fixtures";

const out = { ok: false, reasons: [{ code: "TAGGED_OUT" as const, message: "Tagged out" }] };

describe("binder and chain sizes", () => {
  it("reads chain sizes in inches, and millimetres as the chain table's row", () => {
    expect(chainInches("3/8")).toBe(0.375);
    expect(chainInches("10 mm")).toBe(0.375);
    expect(chainInches("9.5 mm")).toBeUndefined();
    expect(chainInches("large")).toBeUndefined();
  });

  it("lets a binder take the chains of its marked range, ends included", () => {
    const b = binder({ details: { chainSizeRange: ["5/16", "3/8"] } });
    expect(binderTakesChain(b, chain({ size: "5/16" }))).toBe(true);
    expect(binderTakesChain(b, chain({ size: "3/8" }))).toBe(true);
    expect(binderTakesChain(b, chain({ size: "10 mm" }))).toBe(true);
    expect(binderTakesChain(b, chain({ size: "1/2" }))).toBe(false);
    expect(binderTakesChain(b, chain({ size: "1/4" }))).toBe(false);
    expect(binderTakesChain(binder({ details: {} }), chain())).toBe(false); // no range marked: no claim
  });
});

describe("suggestItems", () => {
  it("offers binders that take the chain, strongest first, and never one out of use", () => {
    const c = chain({ size: "3/8" });
    const small = binder({ details: { chainSizeRange: ["5/16", "3/8"] }, wllLb: 5400 });
    const big = binder({ details: { chainSizeRange: ["3/8", "1/2"] }, wllLb: 9200 });
    const wrong = binder({ details: { chainSizeRange: ["1/2", "5/8"] }, wllLb: 13000 });
    const broken = binder({ details: { chainSizeRange: ["5/16", "3/8"] }, usable: out });
    const s = suggestItems([c], [small, wrong, broken, big, chain()]);
    expect(s.map((x) => x.item.id)).toEqual([big.id, small.id]);
    expect(s[0]!.reason).toBe("Takes 3/8 in chain");
  });

  it("offers chains a binder takes, and chains then straps for an empty tiedown", () => {
    const b = binder({ details: { chainSizeRange: ["5/16", "3/8"] } });
    const fits = chain({ size: "5/16", wllLb: 4700 });
    const tooBig = chain({ size: "1/2", wllLb: 12000 });
    expect(suggestItems([b], [tooBig, fits]).map((x) => x.item.id)).toEqual([fits.id]);
    const strap = chain({ kind: "web-strap", size: "4", wllLb: 5400 });
    expect(suggestItems([], [strap, fits, tooBig]).map((x) => x.item.id)).toEqual([tooBig.id, fits.id, strap.id]);
    expect(suggestItems([chain(), b], [fits])).toEqual([]);
  });
});

describe("the same item", () => {
  it("is the same kind, grade and size (a binder: the same range)", () => {
    expect(sameSort(chain({ size: "3/8" }), chain({ size: "10 mm" }))).toBe(true);
    expect(sameSort(chain({ grade: 70 }), chain({ grade: 80 }))).toBe(false);
    expect(sameSort(binder({ details: { chainSizeRange: ["5/16", "3/8"] } }), binder({ details: { chainSizeRange: ["3/8", "1/2"] } }))).toBe(false);
  });

  it("is picked by mechanism, then the WLL closest at or above the template's, then tag code", () => {
    const template = binder({ details: { chainSizeRange: ["5/16", "3/8"], mechanism: "ratchet" }, wllLb: 5400 });
    const lever = binder({ details: { chainSizeRange: ["5/16", "3/8"], mechanism: "lever" }, wllLb: 5400 });
    const weaker = binder({ details: { chainSizeRange: ["5/16", "3/8"], mechanism: "ratchet" }, wllLb: 5000 });
    const same = binder({ details: { chainSizeRange: ["5/16", "3/8"], mechanism: "ratchet" }, wllLb: 5400 });
    expect(pickLike(template, [lever, weaker, same], new Set())?.id).toBe(same.id);
    expect(pickLike(template, [lever, weaker, same], new Set([same.id]))?.id).toBe(weaker.id);
    expect(pickLike(template, [lever], new Set())?.id).toBe(lever.id);
    expect(pickLike(template, [], new Set())).toBeUndefined();
  });
});

describe("use the same for all four corners", () => {
  it("plans the three other corners on free anchor points of the same side, front ones forward and rear ones back", () => {
    const fl = tiedown("front left", "fl", [chain(), binder()]);
    const k = kit({ tiedowns: [fl] });
    const free = [chain(), chain(), chain(), binder(), binder(), binder()];
    const plans = cornerPlans(k, fl, free);
    expect(plans.map((p) => [p.corner, p.anchorPointId, p.machinePoint, p.itemIds.length, p.gaps])).toEqual([
      ["front right", "fr", "front right", 2, []],
      ["rear left", "rl", "rear left", 2, []],
      ["rear right", "rr", "rear right", 2, []],
    ]);
    expect(new Set(plans.flatMap((p) => p.itemIds)).size).toBe(6);
  });

  it("says what it could not find, and skips an anchor point out of use", () => {
    const withBent = { ...trailer, anchorPoints: trailer.anchorPoints.map((a) => (a.id === "rr" ? anchor("rr", { side: "right", positionMm: 5900, usable: out }) : a)) };
    const fl = tiedown("front left", "fl", [chain(), binder()]);
    const plans = cornerPlans(kit({ trailer: withBent, tiedowns: [fl] }), fl, [chain(), binder()]);
    const rearRight = plans.find((p) => p.corner === "rear right")!;
    expect(rearRight.anchorPointId).toBeNull();
    expect(rearRight.gaps[0]).toBe("no free anchor point in use on the right side");
    expect(plans.find((p) => p.corner === "rear left")!.gaps).toHaveLength(2); // the one chain and binder went to front right
  });

  it("fills an empty tiedown already on a corner, and leaves a corner with items alone", () => {
    const fl = tiedown("front left", "fl", [chain(), binder()]);
    const rrEmpty = tiedown("rear right", "rr", []);
    const frFull = tiedown("front right", "fr", [chain()]);
    const k = kit({ tiedowns: [fl, frFull, rrEmpty] });
    const plans = cornerPlans(k, fl, [chain(), chain(), binder(), binder()]);
    expect(plans.map((p) => [p.corner, p.tiedownId])).toEqual([
      ["rear left", null],
      ["rear right", rrEmpty.id],
    ]);
    expect(cornerOf(k, rrEmpty)?.label).toBe("rear right");
  });
});
