// Minimum number of tiedowns: 49 CFR 393.110 (FMCSA summary, verified, secondary) and
// 49 CFR 393.130(c)(1) (TR-130 quotation, verified, secondary).
import { describe, expect, it } from "vitest";
import { isHeavyMachine, minimumTiedowns } from "@/lib/securement/minimum";

const general = (lengthFt: number, weightLb: number, blockedAtFront = false) => minimumTiedowns({ kind: "general", lengthFt, weightLb, blockedAtFront });

describe("49 CFR 393.110, not blocked at the front", () => {
  it.each([
    // [length ft, weight lb, expected, note]
    [4, 1100, 1, "≤ 5 ft and ≤ 1,100 lb"],
    [5, 1100, 1, "boundary: exactly 5 ft and 1,100 lb"],
    [4, 1500, 2, "≤ 5 ft and > 1,100 lb (DERIVED quiz case)"],
    [5, 1100.5, 2, "just over 1,100 lb"],
    [5.5, 100, 2, "5-10 ft"],
    [10, 30000, 2, "exactly 10 ft"],
    [10.5, 3000, 3, "just over 10 ft"],
    [12, 3000, 3, "12 ft → 3 (DERIVED; also knowledge-builders.org, verified secondary)"],
    [18, 40200, 3, "Water Well Journal example (verified)"],
    [20, 3000, 3, "20 ft → 3 (DERIVED)"],
    [22, 3000, 4, "22 ft → 4 (DERIVED; also knowledge-builders.org)"],
    [30, 3000, 4, "30 ft"],
    [53, 3000, 7, "53 ft"],
  ] as const)("%f ft, %f lb → %i (%s)", (len, weight, count, _note) => {
    const m = general(len, weight);
    expect(m.count).toBe(count);
    expect(m.source).toBe("49 CFR 393.110");
    expect(m.rule).toMatch(/^49 CFR 393\.110: not blocked/);
  });
});

describe("49 CFR 393.110, blocked at the front", () => {
  it.each([
    [0.5, 1],
    [10, 1],
    [10.01, 2],
    [20, 2], // DERIVED: 20 ft blocked → 2
    [21, 3],
  ] as const)("%f ft → %i", (len, count) => {
    const m = general(len, 50000, true);
    expect(m.count).toBe(count);
    expect(m.rule).toMatch(/^49 CFR 393\.110: blocked/);
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
  });

  it("uses 393.110 below 10,000 lb", () => {
    expect(minimumTiedowns({ kind: "machine", weightLb: 9000, lengthFt: 10, blockedAtFront: false })).toMatchObject({ count: 2, source: "49 CFR 393.110" });
  });
});
