// 49 CFR 393.106(d), aggregate WLL (PAC-106 quotation, verified).
import { describe, expect, it } from "vitest";
import { COUNT_FACTORS, aggregateWll, countedWll, meetsAggregate, requiredAggregateWll } from "@/lib/securement/aggregate";

describe("49 CFR 393.106(d)", () => {
  it("requires half the cargo weight: FMCSA brochure example 30,000 lb → 15,000 lb (verified, secondary)", () => {
    expect(requiredAggregateWll(30000)).toBe(15000);
    expect(requiredAggregateWll(9801)).toBe(4900.5);
  });

  it("counts direct and same-side tiedowns at half, across tiedowns at full WLL", () => {
    expect(COUNT_FACTORS).toEqual({ direct: 0.5, "indirect-same-side": 0.5, "indirect-across": 1 });
    expect(countedWll(6600, "direct")).toBe(3300);
    expect(countedWll(6600, "indirect-same-side")).toBe(3300);
    expect(countedWll(6600, "indirect-across")).toBe(6600);
  });

  it("sums the counted WLLs", () => {
    // DERIVED: four direct 3/8 in grade 70 chains (6,600 lb) = 13,200 lb
    expect(aggregateWll(Array.from({ length: 4 }, () => ({ wllLb: 6600, attachment: "direct" as const })))).toBe(13200);
    expect(aggregateWll([])).toBe(0);
  });

  it("compares without float slack beyond a millionth of a pound", () => {
    expect(meetsAggregate(15000, 15000)).toBe(true);
    expect(meetsAggregate(14999.99, 15000)).toBe(false);
    expect(meetsAggregate(0.1 + 0.2, 0.3)).toBe(true);
  });
});
