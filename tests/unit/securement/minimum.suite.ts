// Minimum number of tiedowns: 49 CFR 393.110 (FMCSA summary, verified, secondary) and
// 49 CFR 393.130(c)(1) (TR-130 quotation, verified, secondary).
// 393.110 prints each threshold in both units, 5 ft (1.52 m), 1,100 lb (500 kg), 10 ft
// (3.04 m); the metric figures are FROM MEMORY (shared reference §1.5: one copy read
// secondhand prints both side by side; not verified against the primary text). Where the
// two readings give different counts the higher is required and the rule says which reading
// set it: on length the metric figures are the stricter (1.52 m < 5 ft = 1.524 m; 3.04 m <
// 10 ft = 3.048 m), on weight the imperial one (1,100 lb = 499 kg < 500 kg).
import { describe, expect, it } from "vitest";
import { isHeavyMachine, minimumTiedowns } from "@/lib/securement/minimum";

const general = (lengthFt: number, weightLb: number, blockedAtFront = false) => minimumTiedowns({ kind: "general", lengthFt, weightLb, blockedAtFront });
/** An article entered in metres and kilograms, as the check passes it (both readings from the input). */
const metric = (lengthM: number, weightKg: number, blockedAtFront = false) =>
  minimumTiedowns({ kind: "general", lengthFt: lengthM / 0.3048, weightLb: weightKg / 0.45359237, lengthM, weightKg, blockedAtFront });

describe("49 CFR 393.110, not blocked at the front, where both readings agree", () => {
  it.each([
    // [length ft, weight lb, expected, note]
    [4, 1100, 1, "≤ 5 ft and ≤ 1,100 lb (1.22 m, 499 kg)"],
    [4, 1500, 2, "≤ 5 ft and > 1,100 lb (DERIVED quiz case; 680 kg > 500 kg too)"],
    [5.5, 100, 2, "5-10 ft"],
    [9.9, 30000, 2, "under 10 ft (3.018 m)"],
    [10.5, 3000, 3, "just over 10 ft"],
    [12, 3000, 3, "12 ft → 3 (DERIVED; also knowledge-builders.org, verified secondary)"],
    [18, 40200, 3, "Water Well Journal example (verified): 18 ft = 5.486 m → 3 either way"],
    [22, 3000, 4, "22 ft → 4 (DERIVED; also knowledge-builders.org)"],
    [53, 3000, 7, "53 ft (16.154 m → 7 either way)"],
  ] as const)("%f ft, %f lb → %i (%s)", (len, weight, count, _note) => {
    const m = general(len, weight);
    expect(m.count).toBe(count);
    expect(m.readings).toEqual({ imperial: count, metric: count });
    expect(m.setBy).toBeUndefined();
    expect(m.source).toBe("49 CFR 393.110");
    expect(m.rule).toMatch(/^49 CFR 393\.110: not blocked/);
  });
});

describe("49 CFR 393.110 metric edges: the higher count, and which reading set it", () => {
  it("1.523 m, 800 lb → 2 (1.523 m is over 1.52 m; 4.997 ft is not over 5 ft)", () => {
    const m = metric(1.523, 800 * 0.45359237);
    expect(m).toMatchObject({ count: 2, readings: { imperial: 1, metric: 2 }, setBy: "metric" });
    expect(m.rule).toMatch(/^49 CFR 393\.110, read with its metric figures: not blocked at the front, longer than 1\.52 m and up to 3\.04 m: 2 tiedowns\./);
    expect(m.rule).toContain("Read with its imperial figures the count would be 1");
  });

  it("3.045 m → 3 (3.045 m is over 3.04 m; 9.990 ft is not over 10 ft)", () => {
    const m = metric(3.045, 400);
    expect(m).toMatchObject({ count: 3, readings: { imperial: 2, metric: 3 }, setBy: "metric" });
    expect(m.rule).toContain("longer than 3.04 m: 2 tiedowns for the first 3.04 m and 1 for each further 3.04 m or fraction (3.045 m → 3)");
  });

  it("weight edge: 1,101 lb (499.4 kg) at 4 ft → 2, set by the imperial 1,100 lb", () => {
    const m = general(4, 1101);
    expect(m).toMatchObject({ count: 2, readings: { imperial: 2, metric: 1 }, setBy: "imperial" });
    expect(m.rule).toMatch(/^49 CFR 393\.110, read with its imperial figures: not blocked at the front, 5 ft or shorter and heavier than 1,100 lb: 2 tiedowns/);
    // exactly 500 kg is 1,102.3 lb: heavier than 1,100 lb, so 2 by the imperial reading
    expect(metric(1.2, 500)).toMatchObject({ count: 2, setBy: "imperial" });
    // exactly 1,100 lb (498.95 kg) is 1 by both
    expect(general(4, 1100)).toMatchObject({ count: 1, readings: { imperial: 1, metric: 1 } });
  });

  it.each([
    // whole feet that sit on a 10 ft step are over the 3.04 m step (n x 3.048 m > n x 3.04 m)
    [5, 1100, 2, 1, "exactly 5 ft = 1.524 m, over 1.52 m"],
    [10, 30000, 3, 2, "exactly 10 ft = 3.048 m, over 3.04 m"],
    [20, 3000, 4, 3, "exactly 20 ft = 6.096 m, over 6.08 m (the DERIVED imperial answer is 3)"],
    [30, 3000, 5, 4, "exactly 30 ft = 9.144 m, over 9.12 m"],
  ] as const)("%f ft, %f lb → %i, set by the metric reading (imperial %i: %s)", (len, weight, count, imperial, _note) => {
    expect(general(len, weight)).toMatchObject({ count, readings: { imperial, metric: count }, setBy: "metric" });
  });

  it("the same article entered in metres: 1.52 m and 3.04 m themselves are not over the thresholds", () => {
    expect(metric(1.52, 400)).toMatchObject({ count: 1, readings: { imperial: 1, metric: 1 } });
    expect(metric(3.04, 400)).toMatchObject({ count: 2, readings: { imperial: 2, metric: 2 } });
    expect(metric(6.08, 400)).toMatchObject({ count: 3, readings: { imperial: 3, metric: 3 } });
  });
});

describe("49 CFR 393.110, blocked at the front", () => {
  it.each([
    [0.5, 1, 1],
    [9.9, 1, 1],
    [10.01, 2, 2],
    [21, 3, 3],
  ] as const)("%f ft → %i (both readings)", (len, count, _m) => {
    const m = general(len, 50000, true);
    expect(m.count).toBe(count);
    expect(m.rule).toMatch(/^49 CFR 393\.110: blocked/);
  });

  it("20 ft blocked → 3, set by the metric reading (the DERIVED imperial answer is 2; 6.096 m is over 2 x 3.04 m)", () => {
    const m = general(20, 50000, true);
    expect(m).toMatchObject({ count: 3, readings: { imperial: 2, metric: 3 }, setBy: "metric" });
    expect(m.rule).toMatch(/^49 CFR 393\.110, read with its metric figures: blocked against forward movement: 1 tiedown per 3\.04 m/);
  });
});

describe("49 CFR 393.130(c)(1), machines of 10,000 lb or more", () => {
  it("applies from exactly 10,000 lb (CFR: \"4,536 kg (10,000 lb) or more\")", () => {
    expect(isHeavyMachine("machine", 10000)).toBe(true);
    expect(isHeavyMachine("machine", 9999.99)).toBe(false);
    expect(isHeavyMachine("general", 10000)).toBe(false);
    const m = minimumTiedowns({ kind: "machine", weightLb: 10000, lengthFt: 8, blockedAtFront: false });
    expect(m).toMatchObject({ count: 4, source: "49 CFR 393.130(c)(1)" });
    expect(m.rule).toContain("10,000 lb (4,536 kg) or more");
    expect(m.setBy).toBeUndefined();
  });

  it("uses 393.110 below 10,000 lb", () => {
    expect(minimumTiedowns({ kind: "machine", weightLb: 9000, lengthFt: 9, blockedAtFront: false })).toMatchObject({ count: 2, source: "49 CFR 393.110" });
  });
});
