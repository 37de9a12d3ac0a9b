// checkSecurement: the published examples and the DERIVED machine examples of the shared
// reference, the contract example, and the shape every result and finding must have.
import { describe, expect, it } from "vitest";
import { SECUREMENT_CAUTION } from "@/lib/securement/caution";
import type { SecurementCheckResult } from "@/lib/securement/check";
import { checkSecurement } from "@/lib/securement/check";
import { RequestValidationError } from "@/lib/securement/errors";
import { FINDING_CODES } from "@/lib/securement/findings";
import type { SecurementCheckRequest, Tiedown } from "@/lib/securement/request";
import { CORNERS, chainTiedown, deepFreeze, ft, lb, machine } from "./helpers";

const seen: SecurementCheckResult[] = [];
function check(req: SecurementCheckRequest): SecurementCheckResult {
  const r = checkSecurement(req);
  seen.push(r);
  return r;
}
const codes = (r: SecurementCheckResult) => r.findings.map((f) => f.code);
const g70 = (size: string) => ({ grade: 70, size });

describe("contract example", () => {
  const request: SecurementCheckRequest = {
    cargo: { weight: lb(9800), length: ft(16), kind: "machine", blockedAtFront: false, articulated: false, accessories: ["bucket", "blade"] },
    tiedowns: [
      {
        label: "front left",
        attachment: "direct",
        secures: "machine",
        components: [
          { type: "chain", grade: 70, size: "3/8 in" },
          { type: "binder", wll: lb(5400), chainSizeRange: ["5/16 in", "3/8 in"] },
          { type: "anchor", wll: lb(6000) },
        ],
      },
    ],
  };

  it("returns the contract's fields", () => {
    const r = check(request);
    expect(r).toMatchObject({ pass: false, requiredAggregateWllLb: 4900, aggregateWllLb: 2700, minimumTiedowns: 3 });
    expect(r.rule).toMatch(/^49 CFR 393\.110: .*16 ft → 3/);
    expect(r.tiedowns[0]).toMatchObject({ label: "front left", wllLb: 5400, countedWllLb: 2700, limitedBy: "binder" });
    expect(r.caution).toBe(SECUREMENT_CAUTION);
    expect(r.requiredAggregateWllKg).toBe(2222.6); // 4,900 lb × 0.45359237
    expect(codes(r)).toEqual(["AGGREGATE_WLL_BELOW_REQUIRED", "TOO_FEW_TIEDOWNS", "ACCESSORY_NOT_SECURED", "ACCESSORY_NOT_SECURED", "FEWER_THAN_FOUR_CORNERS"]);
    // under 10,000 lb, accessories are common practice: warn, not fail
    expect(r.findings.filter((f) => f.code === "ACCESSORY_NOT_SECURED").map((f) => f.severity)).toEqual(["warn", "warn"]);
  });

  it("does not mutate its input", () => {
    const frozen = deepFreeze(structuredClone(request));
    const before = JSON.stringify(frozen);
    expect(() => check(frozen)).not.toThrow();
    expect(JSON.stringify(frozen)).toBe(before);
  });
});

describe("49 CFR 393.106(d) examples", () => {
  it("FMCSA brochure: 30,000 lb cargo → 15,000 lb aggregate required (verified, secondary)", () => {
    const r = check({ cargo: { weight: lb(30000), length: ft(20), kind: "general" }, tiedowns: [] });
    expect(r.requiredAggregateWllLb).toBe(15000);
    expect(r.aggregateWllLb).toBe(0);
  });

  // Water Well Journal, June 2015, p.30 (verified to the 20,100 lb figure): 18 ft, 40,200 lb,
  // not against a bulkhead, 4 in straps rated 5,000 lb, indirect. 3 / 4 / 5 straps: DERIVED.
  const strap = (i: number): Tiedown => ({ label: `strap ${i + 1}`, attachment: "indirect-across", components: [{ type: "webbing", width: "4 in", wll: lb(5000) }] });
  const wwj = (n: number): SecurementCheckRequest => ({ cargo: { weight: lb(40200), length: ft(18), kind: "general", blockedAtFront: false }, tiedowns: Array.from({ length: n }, (_, i) => strap(i)) });

  it("Water Well Journal: 3 tiedowns minimum and 20,100 lb aggregate", () => {
    const r = check(wwj(3));
    expect(r.minimumTiedowns).toBe(3);
    expect(r.requiredAggregateWllLb).toBe(20100);
  });

  it.each([
    [3, 15000, false],
    [4, 20000, false],
    [5, 25000, true],
  ])("Water Well Journal with %i straps: aggregate %i lb, pass %s (DERIVED)", (n, aggregate, pass) => {
    const r = check(wwj(n));
    expect(r.aggregateWllLb).toBe(aggregate);
    expect(r.pass).toBe(pass);
    expect(codes(r).includes("AGGREGATE_WLL_BELOW_REQUIRED")).toBe(!pass);
    expect(codes(r)).not.toContain("TOO_FEW_TIEDOWNS");
    expect(codes(r)).toContain("EDGE_PROTECTION_REMINDER");
  });
});

describe("DERIVED machine examples (393.106(d) + 393.108 chain table + 393.130)", () => {
  it("12,000 lb excavator, four direct 3/8 in grade 70 chains → pass, aggregate 13,200 lb", () => {
    const r = check(machine(12000, CORNERS.map((c) => chainTiedown(c, g70("3/8 in")))));
    expect(r).toMatchObject({ pass: true, aggregateWllLb: 13200, requiredAggregateWllLb: 6000, minimumTiedowns: 4, tiedownsCounted: 4 });
    expect(r.rule).toMatch(/^49 CFR 393\.130\(c\)\(1\)/);
    expect(r.findings).toEqual([]);
  });

  it("same machine on four unmarked 3/8 in chains (grade 30, 2,650 lb) → fail, aggregate 5,300 lb; Handbook warning", () => {
    const r = check(machine(12000, CORNERS.map((c) => chainTiedown(c, { ...g70("3/8 in"), marked: false }))));
    expect(r).toMatchObject({ pass: false, aggregateWllLb: 5300 });
    const agg = r.findings.find((f) => f.code === "AGGREGATE_WLL_BELOW_REQUIRED")!;
    expect(agg).toMatchObject({ severity: "fail", source: "49 CFR 393.106(d)" });
    expect(agg.message).toContain("5,300 lb");
    expect(agg.message).toContain("6,000 lb");
    expect(agg.message).toContain("700 lb short");
    expect(r.findings.find((f) => f.code === "HANDBOOK_TIEDOWN_WLL_BELOW_5000")).toMatchObject({ severity: "warn", source: "FMCSA Driver's Handbook on Cargo Securement, ch. 10" });
    expect(codes(r).filter((c) => c === "RATED_AS_UNMARKED")).toHaveLength(4);
  });

  it("9,000 lb skid steer, four direct 5/16 in grade 70 chains → pass, aggregate 9,400 lb", () => {
    const r = check(machine(9000, CORNERS.map((c) => chainTiedown(c, g70("5/16 in"))), { length: ft(10) }));
    // 10 ft is 3.048 m, over 393.110's 3.04 m: the metric reading asks for 3, the imperial for 2 (FROM MEMORY metric figures)
    expect(r).toMatchObject({ pass: true, aggregateWllLb: 9400, requiredAggregateWllLb: 4500, minimumTiedowns: 3, minimumReadings: { imperial: 2, metric: 3, setBy: "metric" } });
    expect(r.findings).toEqual([]);
    expect(check(machine(9000, CORNERS.map((c) => chainTiedown(c, g70("5/16 in"))), { length: ft(9) })).minimumTiedowns).toBe(2);
  });

  it("CVSA example inside a check: an unmarked 5/16 in grade 70 chain counts 1,900 lb", () => {
    const r = check(machine(3000, [chainTiedown("only", { ...g70("5/16"), marked: false }, { attachment: "indirect-across" })], { length: ft(5) }));
    expect(r.tiedowns[0]).toMatchObject({ wllLb: 1900, countedWllLb: 1900 });
  });

  it("chain 6,600 + binder 5,400 + D-ring 5,000 → tiedown WLL 5,000, limited by the anchor", () => {
    const t: Tiedown = { label: "front left", attachment: "direct", components: [{ type: "chain", grade: 70, size: "3/8" }, { type: "binder", wll: lb(5400) }, { type: "anchor", label: "D-ring", wll: lb(5000) }] };
    const r = check(machine(8000, [t], { length: ft(8) }));
    expect(r.tiedowns[0]).toMatchObject({ wllLb: 5000, countedWllLb: 2500, limitedBy: "anchor", limitedByIndex: 2, limitedByLabel: "D-ring" });
  });
});

describe("minimum count within a check", () => {
  it("a machine of exactly 10,000 lb needs 4 (CFR \"or more\"), also when given as 4,535.9237 kg", () => {
    const three = CORNERS.slice(0, 3).map((c) => chainTiedown(c, g70("1/2")));
    const r = check(machine(10000, three, { length: ft(8) }));
    expect(r.minimumTiedowns).toBe(4);
    expect(r.findings.find((f) => f.code === "TOO_FEW_TIEDOWNS")).toMatchObject({ severity: "fail", source: "49 CFR 393.130(c)(1)" });
    const kg = check({ ...machine(0, three, { length: ft(8) }), cargo: { weight: { value: 4535.9237, unit: "kg" }, length: ft(8), kind: "machine" } });
    expect(kg.minimumTiedowns).toBe(4);
    expect(kg.cargo.weightLb).toBe(10000);
  });

  it("counts only tiedowns on the machine toward the minimum, but all toward the aggregate", () => {
    const body = CORNERS.slice(0, 3).map((c) => chainTiedown(c, g70("1/2")));
    const bucket = chainTiedown("bucket", g70("1/2"), { secures: "bucket" });
    const r = check(machine(20000, [...body, bucket], { accessories: ["bucket"] }));
    expect(r.tiedownsCounted).toBe(3);
    expect(r.aggregateWllLb).toBe(4 * 5650);
    const f = r.findings.find((x) => x.code === "TOO_FEW_TIEDOWNS")!;
    expect(f.message).toContain("not counted");
    expect(r.tiedowns.map((t) => t.countsTowardMinimum)).toEqual([true, true, true, false]);
  });

  it("uses 393.110 for general cargo: 19 ft blocked → 2, unblocked → 3 (both readings)", () => {
    expect(check({ cargo: { weight: lb(5000), length: ft(19), kind: "general", blockedAtFront: true }, tiedowns: [] }).minimumTiedowns).toBe(2);
    const r = check({ cargo: { weight: lb(5000), length: ft(19), kind: "general" }, tiedowns: [] });
    expect(r.minimumTiedowns).toBe(3);
    expect(r.minimumReadings).toBeUndefined();
  });

  it("20 ft (6.096 m) needs one more by 393.110's metric figures: blocked 3, unblocked 4, and the finding says so", () => {
    expect(check({ cargo: { weight: lb(5000), length: ft(20), kind: "general", blockedAtFront: true }, tiedowns: [] }).minimumTiedowns).toBe(3);
    const r = check({ cargo: { weight: lb(5000), length: { value: 6.096, unit: "m" }, kind: "general" }, tiedowns: [] });
    expect(r).toMatchObject({ minimumTiedowns: 4, minimumReadings: { imperial: 3, metric: 4, setBy: "metric" } });
    expect(r.findings.find((f) => f.code === "TOO_FEW_TIEDOWNS")!.message).toContain("set by the metric reading of 49 CFR 393.110 (the imperial figures give 3; where they differ the higher count is required)");
  });
});

describe("393.110 metric edges within a check (metric figures FROM MEMORY)", () => {
  const strap = (label: string): Tiedown => ({ label, attachment: "indirect-across", components: [{ type: "webbing", width: "2", wll: lb(3000) }, { type: "anchor", wll: lb(5000) }] });
  const article = (length: { value: number; unit: "m" | "ft" }, weight: { value: number; unit: "lb" | "kg" }, n: number): SecurementCheckRequest => ({
    cargo: { weight, length, kind: "general" },
    tiedowns: Array.from({ length: n }, (_, i) => strap(`strap ${i + 1}`)),
  });

  it("1.523 m, 350 kg on one strap: 2 required, set by the metric reading", () => {
    const r = check(article({ value: 1.523, unit: "m" }, { value: 350, unit: "kg" }, 1));
    expect(r).toMatchObject({ pass: false, minimumTiedowns: 2, minimumReadings: { imperial: 1, metric: 2, setBy: "metric" } });
    const f = r.findings.find((x) => x.code === "TOO_FEW_TIEDOWNS")!;
    expect(f).toMatchObject({ severity: "fail", source: "49 CFR 393.110" });
    expect(f.message).toContain("set by the metric reading");
    expect(r.rule).toMatch(/^49 CFR 393\.110, read with its metric figures: /);
    expect(check(article({ value: 1.523, unit: "m" }, { value: 350, unit: "kg" }, 2)).pass).toBe(true);
  });

  it("3.045 m on two straps: 3 required, set by the metric reading", () => {
    const r = check(article({ value: 3.045, unit: "m" }, { value: 400, unit: "kg" }, 2));
    expect(r).toMatchObject({ pass: false, minimumTiedowns: 3, minimumReadings: { imperial: 2, metric: 3, setBy: "metric" } });
  });

  it("4 ft, 1,101 lb (499.4 kg) on one strap: 2 required, set by the imperial reading", () => {
    const r = check(article({ value: 4, unit: "ft" }, { value: 1101, unit: "lb" }, 1));
    expect(r).toMatchObject({ pass: false, minimumTiedowns: 2, minimumReadings: { imperial: 2, metric: 1, setBy: "imperial" } });
    expect(r.findings.find((x) => x.code === "TOO_FEW_TIEDOWNS")!.message).toContain("set by the imperial reading of 49 CFR 393.110 (the metric figures give 1;");
  });
});

describe("393.130(b): accessories and articulation", () => {
  const four = () => CORNERS.map((c) => chainTiedown(c, g70("1/2")));

  it("fails an unsecured accessory from 10,000 lb, passes when a tiedown secures it", () => {
    const bad = check(machine(15000, four(), { accessories: ["bucket"] }));
    expect(bad.pass).toBe(false);
    expect(bad.findings.find((f) => f.code === "ACCESSORY_NOT_SECURED")).toMatchObject({ severity: "fail", source: "49 CFR 393.130(b)(1)", path: "cargo.accessories.0" });
    const good = check(machine(15000, [...four(), chainTiedown("bucket", g70("3/8"), { secures: "bucket" })], { accessories: ["bucket"] }));
    expect(good.pass).toBe(true);
    expect(codes(good)).toEqual(["ACCESSORIES_LOWERED_REMINDER"]);
  });

  it("matches accessory names without regard to case", () => {
    const r = check(machine(15000, [...four(), chainTiedown("blade", g70("3/8"), { secures: "Blade" })], { accessories: ["blade"] }));
    expect(codes(r)).not.toContain("ACCESSORY_NOT_SECURED");
  });

  it("fails an articulated machine from 10,000 lb unless its joint is restrained; warns below", () => {
    const heavy = check(machine(15000, four(), { articulated: true }));
    expect(heavy.findings.find((f) => f.code === "ARTICULATION_NOT_RESTRAINED")).toMatchObject({ severity: "fail", source: "49 CFR 393.130(b)(2)" });
    expect(check(machine(15000, four(), { articulated: true, articulationRestrained: true })).pass).toBe(true);
    const light = check(machine(8000, four(), { articulated: true }));
    expect(light.pass).toBe(true);
    expect(light.findings.find((f) => f.code === "ARTICULATION_NOT_RESTRAINED")).toMatchObject({ severity: "warn" });
    expect(light.findings.find((f) => f.code === "ARTICULATION_NOT_RESTRAINED")!.source).toMatch(/^Common practice/);
  });
});

describe("guidance and common practice never fail", () => {
  it("Handbook 5,000 lb per tiedown on machines from 10,000 lb is a warning", () => {
    const r = check(machine(12000, CORNERS.map((c) => chainTiedown(c, g70("5/16")))));
    expect(r.pass).toBe(true);
    expect(r.aggregateWllLb).toBe(9400);
    const f = r.findings.find((x) => x.code === "HANDBOOK_TIEDOWN_WLL_BELOW_5000")!;
    expect(f.severity).toBe("warn");
    expect(f.message).toContain("\"front left\" 4,700 lb");
  });

  it("fewer than four corner tiedowns on a light machine is a warning", () => {
    const r = check(machine(3000, [chainTiedown("a", g70("3/8")), chainTiedown("b", g70("3/8"))], { length: ft(8) }));
    expect(r.pass).toBe(true);
    expect(r.findings).toEqual([expect.objectContaining({ code: "FEWER_THAN_FOUR_CORNERS", severity: "warn", source: "Common practice" })]);
  });

  it("a low-grade hook warns but does not fail", () => {
    const t: Tiedown = { attachment: "direct", components: [{ type: "chain", grade: 70, size: "1/2" }, { type: "binder", wll: lb(9200), chainSizeRange: ["3/8", "1/2"] }, { type: "hook", grade: 43, wll: lb(9200) }, { type: "anchor", wll: lb(15000) }] };
    const r = check(machine(12000, [t, t, t, t]));
    expect(r.pass).toBe(true);
    expect(new Set(codes(r))).toEqual(new Set(["FITTING_GRADE_BELOW_CHAIN"]));
  });
});

describe("binder chain-size range (common practice range; 393.108(b) marking)", () => {
  it("a binder outside its range fails: that tiedown is not rated and counts 0, the finding names both sizes", () => {
    const bad: Tiedown = { label: "front left", attachment: "direct", components: [{ type: "chain", grade: 70, size: "1/2" }, { type: "binder", wll: lb(9200), chainSizeRange: ["5/16", "3/8"] }, { type: "anchor", wll: lb(15000) }] };
    const good = (label: string): Tiedown => ({ label, attachment: "direct", components: [{ type: "chain", grade: 70, size: "1/2" }, { type: "binder", wll: lb(9200), chainSizeRange: ["1/2", "5/8"] }, { type: "anchor", wll: lb(15000) }] });
    const r = check(machine(12000, [bad, good("front right"), good("rear left"), good("rear right")]));
    expect(r.pass).toBe(false);
    expect(r.tiedowns[0]).toMatchObject({ wllLb: 0, countedWllLb: 0, rated: false, limitedBy: "binder" });
    expect(r.aggregateWllLb).toBe(3 * 4600);
    const f = r.findings.find((x) => x.code === "BINDER_CHAIN_SIZE_OUT_OF_RANGE")!;
    expect(f).toMatchObject({ severity: "fail", tiedown: 0, component: 1, path: "tiedowns.0.components.1.chainSizeRange" });
    expect(f.message).toContain("made for 5/16 in to 3/8 in chain");
    expect(f.message).toContain("the chain (component 1) is 1/2 in");
    expect(f.message).toContain("counts 0");
  });

  it("a binder whose range is not given is rated as before, with a warning that says so", () => {
    const t: Tiedown = { label: "x", attachment: "direct", components: [{ type: "chain", grade: 70, size: "3/8" }, { type: "binder", wll: lb(5400) }, { type: "anchor", wll: lb(9000) }] };
    const r = check(machine(12000, [t, t, t, t]));
    expect(r.pass).toBe(true);
    expect(r.tiedowns[0]).toMatchObject({ wllLb: 5400, rated: true });
    const f = r.findings.filter((x) => x.code === "BINDER_RANGE_NOT_GIVEN");
    expect(f).toHaveLength(4);
    expect(f[0]).toMatchObject({ severity: "warn", path: "tiedowns.0.components.1.chainSizeRange" });
    expect(f[0]!.message).toContain("whether it takes the 3/8 in chain (component 1) was not checked");
  });
});

describe("component problems come back as findings, not exceptions", () => {
  it("a size not in the table fails, names the nearest sizes, and the tiedown counts 0", () => {
    const tiedowns = CORNERS.map((c) => chainTiedown(c, g70("3/8")));
    tiedowns[1] = chainTiedown("front right", g70("9/16 in"));
    const r = check(machine(12000, tiedowns));
    expect(r.pass).toBe(false);
    expect(r.aggregateWllLb).toBe(3 * 3300);
    expect(r.tiedowns[1]).toMatchObject({ wllLb: 0, countedWllLb: 0, rated: false });
    const f = r.findings.find((x) => x.code === "SIZE_NOT_IN_TABLE")!;
    expect(f).toMatchObject({ severity: "fail", tiedown: 1, component: 0, path: "tiedowns.1.components.0.size" });
    expect(f.message).toContain("Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in");
    expect(f.message).toContain("\"front right\"");
  });

  it("a binder without a WLL fails", () => {
    const t: Tiedown = { label: "x", attachment: "direct", components: [{ type: "chain", grade: 70, size: "3/8" }, { type: "binder" }, { type: "anchor", wll: lb(9000) }] };
    const r = check(machine(2000, [t, t], { length: ft(4) }));
    expect(r.pass).toBe(false);
    expect(r.findings.filter((f) => f.code === "MISSING_WLL").map((f) => f.path)).toEqual(["tiedowns.0.components.1.wll", "tiedowns.1.components.1.wll"]);
  });

  it("an invalid request throws RequestValidationError with dotted paths", () => {
    const bad = { cargo: { weight: { value: -1, unit: "lb" }, length: ft(10), kind: "machine" }, tiedowns: [{ attachment: "direct", components: [{ type: "binder", wll: { value: 5400, unit: "stone" } }] }] };
    try {
      checkSecurement(bad as unknown as SecurementCheckRequest);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(RequestValidationError);
      expect((e as RequestValidationError).issues.map((i) => i.path)).toEqual(["cargo.weight.value", "tiedowns.0.components.0.wll.unit"]);
    }
  });
});

describe("every material in a check (49 CFR 393.108)", () => {
  it("wire rope at a quarter of its nominal strength (e)(1), rope of unknown fibre (c)/(f), steel strapping, grade mark 40", () => {
    const anchor = { type: "anchor" as const, wll: lb(20000) };
    const r = check({
      cargo: { weight: lb(9000), length: ft(9), kind: "general" },
      tiedowns: [
        { label: "wire", attachment: "indirect-across", components: [{ type: "wire-rope", size: "1/2 in", construction: "6x19 IWRC", nominalStrength: lb(26600) }, anchor] },
        { label: "cable", attachment: "indirect-across", components: [{ type: "wire-rope", size: "1/2 in", construction: "6x19 IWRC" }, anchor] },
        { label: "rope", attachment: "indirect-across", components: [{ type: "rope", size: "13 mm" }, anchor] },
        { label: "band", attachment: "indirect-across", components: [{ type: "steel-strapping", width: "2 in", thickness: "0.050 in" }, anchor] },
        { label: "g40", attachment: "direct", components: [{ type: "chain", grade: "G40", size: "3/8" }, anchor] },
      ],
    });
    expect(r.tiedowns.map((t) => t.wllLb)).toEqual([6650, 5300, 625, 2650, 5400]);
    expect(r.aggregateWllLb).toBe(6650 + 5300 + 625 + 2650 + 2700);
    expect(r.tiedowns[3]!.components[0]).toMatchObject({ status: "from-memory" }); // steel strapping row 8: FROM MEMORY
    expect(r.tiedowns[2]!.components[0]).toMatchObject({ status: "verified", tableWllKg: 280 });
    const byCode = (code: string) => r.findings.filter((f) => f.code === code);
    expect(byCode("WIRE_ROPE_RATED_FROM_TABLE").map((f) => f.tiedown)).toEqual([1]);
    expect(byCode("ROPE_FIBRE_UNKNOWN")[0]!.message).toContain("rates it lower: 315 lb (150 kg)");
    expect(byCode("GRADE_MARK_READ_AS")[0]).toMatchObject({ severity: "info", tiedown: 4, path: "tiedowns.4.components.0.grade" });
  });
});

describe("figures", () => {
  it("keeps half pounds exact and gives kg twins", () => {
    const r = check({ cargo: { weight: lb(9801), length: ft(8), kind: "general" }, tiedowns: [chainTiedown("a", { grade: 70, size: "1/4" })] });
    expect(r.requiredAggregateWllLb).toBe(4900.5);
    expect(r.tiedowns[0]!.countedWllLb).toBe(1575);
    expect(r.tiedowns[0]!.countedWllKg).toBe(714.4); // 1,575 lb × 0.45359237 = 714.41
    expect(r.tiedowns[0]!.components[0]).toMatchObject({ wllLb: 3150, tableWllKg: 1430, wllKg: 1428.8 });
    expect(r.cargo).toMatchObject({ weightLb: 9801, weightKg: 4445.7, lengthFt: 8, lengthM: 2.44 });
  });
});

describe("every result", () => {
  it("has well-formed findings, a caution, and never uses the word 'safe'", () => {
    expect(seen.length).toBeGreaterThan(20);
    for (const r of seen) {
      expect(r.caution).toBe(SECUREMENT_CAUTION);
      expect(r.pass).toBe(!r.findings.some((f) => f.severity === "fail"));
      const order = r.findings.map((f) => ({ fail: 0, warn: 1, info: 2 })[f.severity]);
      expect(order).toEqual([...order].sort((a, b) => a - b));
      for (const f of r.findings) {
        expect(f.code).toMatch(/^[A-Z]+(?:_[A-Z0-9]+)*$/);
        expect(FINDING_CODES).toContain(f.code);
        expect(["fail", "warn", "info"]).toContain(f.severity);
        expect(f.message.length).toBeGreaterThan(10);
        expect(f.source.length).toBeGreaterThan(3);
      }
      expect(JSON.stringify(r)).not.toMatch(/\bsafe(ty|ly)?\b/i);
    }
    expect(SECUREMENT_CAUTION).not.toMatch(/\bsafe/i);
    expect(SECUREMENT_CAUTION).toContain("NSC Standard 10");
  });
});
