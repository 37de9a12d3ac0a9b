// A tiedown's WLL is the lowest of its parts and anchor points: 49 CFR 393.108(a)
// (ECFRIO-108 text, verified). Compatibility findings are common practice (warn).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { assembleTiedown } from "@/lib/securement/assembly";
import { componentWll } from "@/lib/securement/marking";
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
      ["BINDER_RANGE_NOT_GIVEN", "warn", "tiedowns.3.components.1.chainSizeRange"],
    ]);
    // the words that say where are kept apart from what, for grouping the same finding on several tiedowns
    expect(t.findings[1]!.detail).toMatch(/^A binder must carry a marked WLL: /);
    expect(t.findings[1]!.message).toBe(`Tiedown "rear right", component 2 (binder): ${t.findings[1]!.detail}`);
    expect(t.findings[0]!.message).toMatch(/^Tiedown "rear right", component 1 \(chain\): Size 9\/16 in is not in the 49 CFR 393\.108 chain table; nearest: 1\/2 in, 5\/8 in/);
    expect(t.components[0]!.error).toMatchObject({ code: "SIZE_NOT_IN_TABLE", nearest: ["1/2 in", "5/8 in"] });
  });
});

describe("binder chain-size range: outside it the tiedown is not rated (common practice ranges; 393.108(b) marking; shared reference §8)", () => {
  const anchor: Component = { type: "anchor", wll: lb(10000) };

  it("fails a binder made for 5/16-3/8 in on 1/2 in chain: counts 0, and names both sizes", () => {
    const out = assembleTiedown({ label: "front left", attachment: "direct", components: [{ type: "chain", grade: 70, size: "1/2" }, { type: "binder", wll: lb(5400), chainSizeRange: ["5/16", "3/8"] }, anchor] });
    expect(out).toMatchObject({ wllLb: 0, rated: false, limitedBy: "binder", limitedByIndex: 1 });
    expect(out.findings).toEqual([expect.objectContaining({ code: "BINDER_CHAIN_SIZE_OUT_OF_RANGE", severity: "fail", tiedown: 0, component: 1, path: "tiedowns.0.components.1.chainSizeRange" })]);
    expect(out.findings[0]!.message).toBe(
      'Tiedown "front left", component 2 (binder): The binder is made for 5/16 in to 3/8 in chain, but the chain (component 1) is 1/2 in. The chain does not seat in the binder\'s hooks, and its marked WLL of 5,400 lb (2,449.4 kg) holds only for the chain the binder is made for, so the tiedown is not rated and counts 0 toward the aggregate; use a binder made for 1/2 in chain',
    );
    expect(out.findings[0]!.source).toMatch(/^49 CFR 393\.108\(b\).*common practice$/);
    expect(out.components[1]).toMatchObject({ basis: "not-rated", wllLb: 0, error: { code: "BINDER_CHAIN_SIZE_OUT_OF_RANGE" } });
  });

  it("reads a range written either way round, and a chain smaller than the range fails too", () => {
    const small = assembleTiedown({ attachment: "direct", components: [{ type: "chain", grade: 70, size: "1/4" }, { type: "binder", wll: lb(5400), chainSizeRange: ["3/8", "5/16"] }, anchor] });
    expect(small.rated).toBe(false);
    expect(small.findings[0]!.message).toContain("made for 5/16 in to 3/8 in chain, but the chain (component 1) is 1/4 in");
  });

  it("compares metric sizes by the table's mm column: 10 mm chain is inside a 5/16-3/8 in binder's range", () => {
    const ok = assembleTiedown({ attachment: "direct", components: [{ type: "chain", grade: 70, size: "10 mm" }, { type: "binder", wll: lb(5400), chainSizeRange: ["5/16 in", "3/8 in"] }, anchor] });
    expect(ok).toMatchObject({ wllLb: 5400, rated: true });
    expect(ok.findings).toEqual([]);
    const edge = assembleTiedown({ attachment: "direct", components: [{ type: "chain", grade: 70, size: "5/16" }, { type: "binder", wll: lb(5400), chainSizeRange: ["8 mm", "10 mm"] }, anchor] });
    expect(edge.rated).toBe(true);
  });

  it("without a range: rated as before (the binder's WLL counts), with a warning that the pairing was not checked", () => {
    const out = assembleTiedown({ attachment: "direct", components: [{ type: "chain", grade: 70, size: "3/8" }, { type: "binder", wll: lb(5400) }, anchor] });
    expect(out).toMatchObject({ wllLb: 5400, rated: true, limitedBy: "binder" });
    expect(out.findings).toEqual([expect.objectContaining({ code: "BINDER_RANGE_NOT_GIVEN", severity: "warn", component: 1, path: "tiedowns.0.components.1.chainSizeRange" })]);
    expect(out.findings[0]!.message).toContain("whether it takes the 3/8 in chain (component 1) was not checked; the tiedown is rated as if it does");
  });

  it("says nothing about a binder in a tiedown without chain", () => {
    expect(assembleTiedown({ attachment: "direct", components: [{ type: "webbing", width: "4" }, { type: "binder", wll: lb(5400) }, anchor] }).findings).toEqual([]);
  });
});

describe("compatibility (common practice, warn)", () => {
  const anchor: Component = { type: "anchor", wll: lb(10000) };

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
