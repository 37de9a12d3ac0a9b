import { describe, expect, it } from "vitest";
import { evaluateMeasurements, verdictProblem } from "@/lib/stock/inspection";

const over = (ms: ReturnType<typeof evaluateMeasurements>, id: string) => ms.find((m) => m.id === id)!.exceeded;

describe("periodic inspection limits", () => {
  it("hook throat: more than 5 % or more than 1/4 in takes it out (ASME B30.10)", () => {
    expect(over(evaluateMeasurements("hook", null, { throatNew: 1, throatNow: 1.05 }), "throatIncrease")).toBe(false); // exactly 5 %
    expect(over(evaluateMeasurements("hook", null, { throatNew: 1, throatNow: 1.06 }), "throatIncrease")).toBe(true);
    // A large hook: 5 % of 6 in is 0.3 in, but the 1/4 in cap applies first.
    expect(over(evaluateMeasurements("hook", null, { throatNew: 6, throatNow: 6.26 }), "throatIncrease")).toBe(true);
    expect(over(evaluateMeasurements("hook", null, { wear: 10.5 }), "wear")).toBe(true);
  });

  it("chain link thickness against the minimum table, else 10 % wear of the nominal size", () => {
    // 3/8 in: minimum 0.342 in (manufacturer's table referring to ASME B30.9)
    expect(over(evaluateMeasurements("chain", "3/8", { linkThickness: 0.342 }), "linkThickness")).toBe(false);
    expect(over(evaluateMeasurements("chain", "3/8", { linkThickness: 0.341 }), "linkThickness")).toBe(true);
    // 1/4 in is not in that table: 90 % of 0.25 = 0.225 in
    const quarter = evaluateMeasurements("chain", "1/4", { linkThickness: 0.224 });
    expect(quarter[0]).toMatchObject({ exceeded: true, limit: "below 0.225 in (more than 10 % wear of 1/4 in)" });
    expect(over(evaluateMeasurements("chain", "3/8", { stretch: 5.1 }), "stretch")).toBe(true);
  });

  it("web strap damage by width (CVSA defect table as taught)", () => {
    expect(over(evaluateMeasurements("web-strap", "4", { damage: 0.75 }), "damage")).toBe(false);
    expect(over(evaluateMeasurements("web-strap", "4", { damage: 0.8 }), "damage")).toBe(true);
    expect(over(evaluateMeasurements("web-strap", "2", { damage: 0.4 }), "damage")).toBe(true);
  });

  it("wire rope: 10 broken wires in a lay, or 5 % diameter loss (ASME B30.9 §9-2.9.5)", () => {
    expect(over(evaluateMeasurements("wire-rope", "1/2", { brokenWires: 9 }), "brokenWires")).toBe(false);
    expect(over(evaluateMeasurements("wire-rope", "1/2", { brokenWires: 10 }), "brokenWires")).toBe(true);
    expect(over(evaluateMeasurements("wire-rope", "1/2", { diameterLoss: 6 }), "diameterLoss")).toBe(true);
  });

  it("keeps an item out of service when a defect or a limit says so", () => {
    const ms = evaluateMeasurements("shackle", "5/8", { wear: 12 });
    expect(verdictProblem("in_service", 0, ms)).toMatch(/past its limit/);
    expect(verdictProblem("in_service", 1, [])).toBe("A defect was found: choose repair or retire.");
    expect(verdictProblem("retire", 1, ms)).toBeNull();
    expect(verdictProblem("in_service", 0, evaluateMeasurements("shackle", "5/8", { wear: 4 }))).toBeNull();
  });
});
