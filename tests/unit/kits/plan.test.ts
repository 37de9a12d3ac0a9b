import { describe, expect, it } from "vitest";
import { checkSecurement } from "@/lib/securement";
import { kitBlockers, kitCheckRequest, kitVerdict, placementFails, practicePoints } from "@/lib/kits/plan";
import { anchor, binder, chain, excavator, kit, tiedown, trailer } from "./fixtures";

describe("kitCheckRequest", () => {
  it("gives exactly the engine's answer for the same plan written by hand", () => {
    const k = kit();
    // The same four tiedowns as a planner would type them into POST /api/v1/securement-checks.
    const byHand = {
      cargo: { kind: "machine" as const, weight: { value: 12000, unit: "lb" as const }, length: { value: 5791, unit: "mm" as const }, articulated: false, accessories: [] },
      tiedowns: k.tiedowns.map((t) => ({
        label: t.label,
        attachment: "direct" as const,
        secures: "machine",
        components: [
          { type: "chain" as const, grade: 70, size: "3/8", marked: true, label: t.items[0]!.tagCode, gearId: t.items[0]!.id },
          { type: "binder" as const, wll: { value: 5400, unit: "lb" as const }, chainSizeRange: ["5/16", "3/8"] as [string, string], label: t.items[1]!.tagCode, gearId: t.items[1]!.id },
          { type: "anchor" as const, wll: { value: 6600, unit: "lb" as const }, label: `anchor point ${t.anchorPointId.toUpperCase()}`, gearId: t.anchorPointId },
        ],
      })),
    };
    expect(checkSecurement(kitCheckRequest(k))).toEqual(checkSecurement(byHand));
  });

  it("passes a 12,000 lb machine on four direct 3/8 in grade 70 chains with 5,400 lb binders (49 CFR 393.106(d), 393.130(c)(1))", () => {
    const { check, pass } = kitVerdict(kit());
    // Each tiedown is limited by its binder: 5,400 lb, counting half: 4 × 2,700 = 10,800 ≥ 6,000.
    expect(check.tiedowns.map((t) => [t.wllLb, t.limitedBy])).toEqual(Array(4).fill([5400, "binder"]));
    expect(check.aggregateWllLb).toBe(10800);
    expect(check.requiredAggregateWllLb).toBe(6000);
    expect(check.minimumTiedowns).toBe(4);
    expect(pass).toBe(true);
  });

  it("names an anchor point rated below the chain as the limit (49 CFR 393.108(a))", () => {
    const weak = { ...trailer, anchorPoints: trailer.anchorPoints.map((a) => (a.id === "fl" ? { ...a, wllLb: 3000 } : a)) };
    const { check } = kitVerdict(kit({ trailer: weak }));
    expect(check.tiedowns[0]).toMatchObject({ wllLb: 3000, limitedBy: "anchor", limitedByLabel: "anchor point FL" });
  });

  it("fails three tiedowns on a machine of 10,000 lb or more (49 CFR 393.130(c)(1))", () => {
    const k = kit();
    const { check, pass } = kitVerdict({ ...k, tiedowns: k.tiedowns.slice(0, 3) });
    expect(pass).toBe(false);
    expect(check.findings.map((f) => f.code)).toContain("TOO_FEW_TIEDOWNS");
  });

  it("passes the accessory and articulation facts of the machine to the engine", () => {
    const loader = { ...excavator, articulated: true, accessories: ["bucket"] };
    const plain = kitVerdict(kit({ machine: loader }));
    expect(plain.check.findings.map((f) => f.code)).toEqual(expect.arrayContaining(["ACCESSORY_NOT_SECURED", "ARTICULATION_NOT_RESTRAINED"]));
    const k = kit({ machine: loader, articulationRestrained: true });
    const held = kitVerdict({ ...k, tiedowns: [...k.tiedowns, tiedown("bucket", "c1", [chain(), binder()], { secures: "bucket", attachment: "indirect-across" })] });
    expect(held.check.findings.map((f) => f.code)).not.toContain("ACCESSORY_NOT_SECURED");
    expect(held.check.findings.map((f) => f.code)).not.toContain("ARTICULATION_NOT_RESTRAINED");
    expect(held.pass).toBe(true);
  });
});

describe("kitBlockers", () => {
  it("blocks gear that may not be used on the kit's date, and an anchor point out of use", () => {
    const k = kit();
    const tagged = chain({ usable: { ok: false, reasons: [{ code: "TAGGED_OUT", message: "Tagged out." }] } });
    const bent = { ...trailer, anchorPoints: trailer.anchorPoints.map((a) => (a.id === "rr" ? anchor("rr", { status: "tagged_out", usable: { ok: false, reasons: [{ code: "TAGGED_OUT", message: "Bent." }] } }) : a)) };
    const withProblems = { ...k, trailer: bent, tiedowns: [tiedown("front left", "fl", [tagged, binder()]), ...k.tiedowns.slice(1)] };
    const blockers = kitBlockers(withProblems);
    expect(blockers.map((b) => [b.code, b.itemId ?? b.anchorPointId])).toEqual([
      ["ITEM_NOT_USABLE", tagged.id],
      ["ANCHOR_NOT_USABLE", "rr"],
    ]);
    expect(blockers[0]!.message).toContain(tagged.tagCode);
    expect(kitVerdict(withProblems).pass).toBe(false);
  });

  it("leaves out, and reports, a tiedown for an accessory the machine no longer lists", () => {
    const k = kit();
    const stale = { ...k, tiedowns: [...k.tiedowns, tiedown("old blade", "c1", [chain(), binder()], { secures: "blade" })] };
    expect(kitCheckRequest(stale).tiedowns).toHaveLength(4);
    expect(kitBlockers(stale).map((b) => b.code)).toEqual(["ACCESSORY_NOT_ON_MACHINE"]);
  });
});

describe("a tiedown without chain, strap or wire rope", () => {
  it("counts nothing in a kit and is reported, where the scratch check would count the binder's WLL", () => {
    const k = kit();
    const binderOnly = { ...k, tiedowns: [...k.tiedowns.slice(0, 3), tiedown("rear right", "rr", [binder()])] };
    expect(kitCheckRequest(binderOnly).tiedowns).toHaveLength(3);
    expect(kitBlockers(binderOnly).map((b) => [b.code, b.tiedownId])).toEqual([["NO_TIEDOWN_MATERIAL", "td-rear right"]]);
    const { check, pass } = kitVerdict(binderOnly);
    expect(check.findings.map((f) => f.code)).toContain("TOO_FEW_TIEDOWNS"); // 3 on a 12,000 lb machine
    expect(pass).toBe(false);
  });
});

describe("practicePoints", () => {
  it("asks for a tiedown at each corner plus one per accessory, and a binder on every chain", () => {
    const k = kit({ machine: { ...excavator, accessories: ["blade"] } });
    const points = practicePoints({ ...k, tiedowns: [...k.tiedowns.slice(0, 3), tiedown("rear right", "rr", [chain()])] });
    const byCode = Object.fromEntries(points.map((p) => [p.code, p]));
    expect(byCode.CORNERS_AND_ACCESSORIES!.met).toBe(false);
    expect(byCode.CORNERS_AND_ACCESSORIES!.message).toContain("nothing holds the blade");
    expect(byCode.BINDER_ON_EVERY_CHAIN!.met).toBe(false);
    expect(byCode.BINDER_ON_EVERY_CHAIN!.message).toContain('"rear right"');
    expect(byCode.LOOP_THROUGH_POINTS!.met).toBeNull();
    expect(points.every((p) => p.source.startsWith("Common practice"))).toBe(true);
  });

  it("is met by four corners and a tiedown on each accessory", () => {
    const k = kit({ machine: { ...excavator, accessories: ["blade"] } });
    const points = practicePoints({ ...k, tiedowns: [...k.tiedowns, tiedown("blade", "c1", [chain(), binder()], { secures: "blade" })] });
    expect(points.filter((p) => p.met === false)).toEqual([]);
  });
});

describe("kitVerdict: where the machine sits", () => {
  // Hand figures for the fixture: trailer 5,000 lb empty, 600 lb on the tongue, GVWR 22,000 lb,
  // hitch to axle 6,700 mm, hitch to deck front 1,500 mm; machine 12,000 lb, 5,791 mm long,
  // CG not recorded (the middle, 2,895.5 mm). At 300 mm back: x = 1,500 + 300 + 2,895.5 =
  // 4,695.5 mm; T = 600 + 12,000 × (6,700 − 4,695.5) / 6,700 = 4,190 lb (24.6 % of 17,000 lb).
  it("carries the placement, whose warnings leave the kit passing", () => {
    const v = kitVerdict(kit({ machineFrontFromDeckFrontMm: 300 }));
    expect(v.placement?.tongueWeightLb).toBe(4190);
    expect(v.placement?.findings.map((f) => [f.code, f.severity])).toContainEqual(["TONGUE_SHARE_ABOVE_BAND", "warn"]);
    expect(placementFails(v.placement)).toEqual([]);
    expect(v.pass).toBe(true);
  });

  it("fails the kit when the trailer would lift the hitch, or the loaded trailer is over its GVWR", () => {
    // Axle 3,000 mm from the hitch: the CG (4,395.5 mm) sits behind it; T = 600 + 12,000 × (3,000 − 4,395.5) / 3,000 = −4,982 lb.
    const lifting = kitVerdict(kit({ machineFrontFromDeckFrontMm: 0, trailer: { ...trailer, hitchToAxleMm: 3000 } }));
    expect(lifting.check.pass).toBe(true);
    expect(lifting.placement?.tongueWeightLb).toBe(-4982);
    expect(placementFails(lifting.placement).map((f) => f.code)).toEqual(["TONGUE_WEIGHT_NEGATIVE"]);
    expect(lifting.pass).toBe(false);
    const heavy = kitVerdict(kit({ machineFrontFromDeckFrontMm: 300, trailer: { ...trailer, gvwrLb: 16000 } }));
    expect(placementFails(heavy.placement).map((f) => f.code)).toEqual(["OVER_GVWR"]);
    expect(heavy.pass).toBe(false);
  });

  it("does not stop a kit that is not placed yet, and says what is missing", () => {
    const v = kitVerdict(kit({ machineFrontFromDeckFrontMm: null }));
    expect(v.placement).toBeNull();
    expect(v.placementMissing).toEqual(["The machine has not been placed on the deck yet."]);
    expect(v.pass).toBe(true);
    const unmeasured = kitVerdict(kit({ machineFrontFromDeckFrontMm: 300, trailer: { ...trailer, hitchToDeckFrontMm: null } }));
    expect(unmeasured.placement).toBeNull();
    expect(unmeasured.placementMissing).toEqual(["The distance from Deck 20's hitch point to the front of its deck has not been measured."]);
  });
});
