// A tiedown's WLL is the lowest of its parts and anchor points: 49 CFR 393.108(a)
// (ECFRIO-108 text, verified). Compatibility findings are common practice (warn).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { assembleTiedown } from "@/lib/securement/assembly";
import { componentWll } from "@/lib/securement/ratings";
import type { Component, Tiedown } from "@/lib/securement/request";

const lb = (value: number) => ({ value, unit: "lb" as const });

describe("49 CFR 393.108(a): lowest component", () => {
  it("DERIVED example: 3/8 G70 chain 6,600 + binder 5,400 + D-ring 5,000 → 5,000, limited by the anchor", () => {
    const t = assembleTiedown({
      attachment: "direct",
      components: [
        { type: "chain", grade: 70, size: "3/8 in" },
        { type: "binder", wll: lb(5400), chainSizeRange: ["5/16 in", "3/8 in"] },
        { type: "anchor", label: "D-ring", wll: lb(5000) },
      ],
    });
    expect(t).toMatchObject({ wllLb: 5000, limitedBy: "anchor", limitedByIndex: 2, limitedByLabel: "D-ring", rated: true });
    expect(t.components.map((c) => c.wllLb)).toEqual([6600, 5400, 5000]);
    expect(t.findings).toEqual([]);
  });

  it("names the binder when it limits (contract example)", () => {
    const t = assembleTiedown({
      label: "front left",
      attachment: "direct",
      components: [
        { type: "chain", grade: 70, size: "3/8 in" },
        { type: "binder", wll: lb(5400), chainSizeRange: ["5/16 in", "3/8 in"] },
        { type: "anchor", wll: lb(6000) },
      ],
    });
    expect(t).toMatchObject({ wllLb: 5400, limitedBy: "binder", limitedByIndex: 1 });
  });

  it("counts a tiedown 0 when a part cannot be rated, with a fail finding naming tiedown and component", () => {
    const t = assembleTiedown(
      {
        label: "rear right",
        attachment: "direct",
        components: [
          { type: "chain", grade: 70, size: "9/16 in" },
          { type: "binder" },
          { type: "anchor", wll: lb(6000) },
        ],
      },
      3,
    );
    expect(t).toMatchObject({ wllLb: 0, rated: false, limitedBy: "chain", limitedByIndex: 0 });
    expect(t.findings.map((f) => [f.code, f.severity, f.path])).toEqual([
      ["SIZE_NOT_IN_TABLE", "fail", "tiedowns.3.components.0.size"],
      ["MISSING_WLL", "fail", "tiedowns.3.components.1.wll"],
    ]);
    expect(t.findings[0]!.message).toMatch(/^Tiedown "rear right", component 1 \(chain\): Size 9\/16 in is not in the 49 CFR 393\.108 chain table; nearest: 1\/2 in, 5\/8 in/);
    expect(t.components[0]!.error).toMatchObject({ code: "SIZE_NOT_IN_TABLE", nearest: ["1/2 in", "5/8 in"] });
  });
});

describe("compatibility (common practice, warn)", () => {
  const anchor: Component = { type: "anchor", wll: lb(10000) };

  it("flags a binder used outside its chain-size range, comparing metric by the table's mm column", () => {
    const out = assembleTiedown({ attachment: "direct", components: [{ type: "chain", grade: 70, size: "1/2" }, { type: "binder", wll: lb(5400), chainSizeRange: ["5/16", "3/8"] }, anchor] });
    expect(out.findings).toEqual([expect.objectContaining({ code: "BINDER_CHAIN_SIZE_OUT_OF_RANGE", severity: "warn", source: "Common practice", path: "tiedowns.0.components.1.chainSizeRange" })]);
    // 10 mm chain is the 3/8 in row: inside a 5/16-3/8 binder's range although 10 mm > 9.525 mm
    const ok = assembleTiedown({ attachment: "direct", components: [{ type: "chain", grade: 70, size: "10 mm" }, { type: "binder", wll: lb(5400), chainSizeRange: ["5/16 in", "3/8 in"] }, anchor] });
    expect(ok.findings).toEqual([]);
  });

  it("flags a hook or shackle of a lower grade than the chain", () => {
    const out = assembleTiedown({ attachment: "direct", components: [{ type: "chain", grade: 70, size: "3/8" }, { type: "hook", grade: 43, wll: lb(5400) }, anchor] });
    expect(out.findings.map((f) => f.code)).toEqual(["FITTING_GRADE_BELOW_CHAIN"]);
    expect(out.limitedBy).toBe("hook");
    const same = assembleTiedown({ attachment: "direct", components: [{ type: "chain", grade: 70, size: "3/8" }, { type: "shackle", grade: "G70", wll: lb(6600) }, anchor] });
    expect(same.findings).toEqual([]);
  });

  it("flags mixed chain sizes or grades in one tiedown", () => {
    const out = assembleTiedown({ attachment: "direct", components: [{ type: "chain", grade: 70, size: "3/8" }, { type: "chain", grade: 43, size: "3/8" }, anchor] });
    expect(out.findings.map((f) => f.code)).toEqual(["MIXED_CHAIN_IN_TIEDOWN"]);
    expect(out.wllLb).toBe(5400);
    const sizes = assembleTiedown({ attachment: "direct", components: [{ type: "chain", grade: 70, size: "3/8" }, { type: "chain", grade: 70, size: "10 mm" }, anchor] });
    expect(sizes.findings).toEqual([]); // 10 mm is the 3/8 in row
  });

  it("reminds when no anchor point or no tiedown material is listed", () => {
    expect(assembleTiedown({ attachment: "direct", components: [{ type: "webbing", width: "4" }] }).findings.map((f) => f.code)).toEqual(["ANCHOR_NOT_LISTED"]);
    expect(assembleTiedown({ attachment: "direct", components: [anchor] }).findings.map((f) => f.code)).toEqual(["NO_TIEDOWN_MATERIAL"]);
  });
});

// Property: the assembly's WLL never exceeds the WLL of any of its components.
const componentArb: fc.Arbitrary<Component> = fc.oneof(
  fc.record({ type: fc.constant("chain" as const), grade: fc.constantFrom(30, 43, 70, 100), size: fc.constantFrom("1/4", "5/16", "3/8", "1/2", "5/8", "10 mm") }),
  fc.record({ type: fc.constant("chain" as const), size: fc.constantFrom("3/8", "1/2"), marked: fc.constant(false) }),
  fc.record({ type: fc.constant("webbing" as const), width: fc.constantFrom("1 3/4", "2", "3", "4") }),
  fc.record({ type: fc.constantFrom("binder" as const, "hook" as const, "shackle" as const, "anchor" as const), wll: fc.record({ value: fc.integer({ min: 1, max: 50000 }), unit: fc.constantFrom("lb" as const, "kg" as const, "daN" as const) }) }),
);

describe("property", () => {
  it("the assembly WLL never exceeds any component's WLL, and equals the lowest", () => {
    fc.assert(
      fc.property(fc.array(componentArb, { minLength: 1, maxLength: 6 }), (components) => {
        const t: Tiedown = { attachment: "direct", components };
        const out = assembleTiedown(t);
        const each = components.map((c) => componentWll(c).wllLb);
        for (const w of each) expect(out.wllLb).toBeLessThanOrEqual(w);
        expect(out.wllLb).toBe(Math.min(...each));
        expect(each[out.limitedByIndex!]).toBe(out.wllLb);
      }),
    );
  });
});
