// Property tests of checkSecurement (fast-check).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkSecurement } from "@/lib/securement/check";
import type { Attachment, Component, SecurementCheckRequest, Tiedown } from "@/lib/securement/request";
import { KG_PER_LB, M_PER_FT } from "@/lib/securement/units";

const lbWll = fc.integer({ min: 500, max: 30000 }).map((value) => ({ value, unit: "lb" as const }));

const componentArb: fc.Arbitrary<Component> = fc.oneof(
  fc.record({ type: fc.constant("chain" as const), grade: fc.constantFrom(30, 43, 70, 80, 100), size: fc.constantFrom("1/4", "5/16", "3/8", "7/16", "1/2", "5/8", "10 mm", "9/16") }),
  fc.record({ type: fc.constant("chain" as const), grade: fc.constant(70), size: fc.constantFrom("3/8", "1/2"), marked: fc.constant(false) }),
  fc.record({ type: fc.constant("chain" as const), grade: fc.constant(70), size: fc.constant("3/8"), wll: lbWll }),
  fc.record({ type: fc.constant("webbing" as const), width: fc.constantFrom("2", "3", "4", "100 mm") }),
  fc.record({ type: fc.constant("webbing" as const), width: fc.constant("4"), wll: lbWll }),
  fc.record({ type: fc.constant("binder" as const), wll: lbWll, chainSizeRange: fc.constantFrom(["5/16", "3/8"] as const, ["3/8", "1/2"] as const) }),
  fc.record({ type: fc.constant("hook" as const), grade: fc.constantFrom(43, 70), wll: lbWll }),
  fc.record({ type: fc.constant("anchor" as const), wll: lbWll }),
  fc.constant({ type: "binder" as const }),
);

const accessoriesArb = fc.subarray(["bucket", "blade", "boom"]);

const requestArb: fc.Arbitrary<SecurementCheckRequest> = accessoriesArb.chain((accessories) =>
  fc.record({
    cargo: fc.record({
      weight: fc.integer({ min: 200, max: 60000 }).map((value) => ({ value, unit: "lb" as const })),
      length: fc.integer({ min: 1, max: 60 }).map((value) => ({ value, unit: "ft" as const })),
      kind: fc.constantFrom("machine" as const, "general" as const),
      blockedAtFront: fc.boolean(),
      articulated: fc.boolean(),
      articulationRestrained: fc.boolean(),
      accessories: fc.constant(accessories),
    }),
    tiedowns: fc.array(
      fc.record({
        label: fc.constantFrom("front left", "front right", "rear", "middle"),
        attachment: fc.constantFrom<Attachment>("direct", "indirect-same-side", "indirect-across"),
        secures: fc.constantFrom("machine", ...accessories),
        components: fc.array(componentArb, { minLength: 1, maxLength: 4 }),
      }),
      { maxLength: 7 },
    ),
  }),
);

/** The same request with every weight and WLL in kg and every length in m. */
function toMetric(req: SecurementCheckRequest): SecurementCheckRequest {
  const kg = (w: { value: number; unit: string }) => ({ value: w.value * KG_PER_LB, unit: "kg" as const });
  return {
    cargo: { ...req.cargo, weight: kg(req.cargo.weight), length: { value: req.cargo.length.value * M_PER_FT, unit: "m" } },
    tiedowns: req.tiedowns.map((t) => ({ ...t, components: t.components.map((c) => (c.wll ? { ...c, wll: kg(c.wll) } : c)) as Component[] })),
  };
}

const sortedCodes = (r: ReturnType<typeof checkSecurement>) => r.findings.map((f) => `${f.code}/${f.severity}`).sort();

describe("checkSecurement properties", () => {
  it("pass is true iff there is no fail finding", () => {
    fc.assert(
      fc.property(requestArb, (req) => {
        const r = checkSecurement(req);
        expect(r.pass).toBe(!r.findings.some((f) => f.severity === "fail"));
      }),
      { numRuns: 150 },
    );
  });

  it("adding a tiedown never lowers the aggregate WLL", () => {
    const extra: fc.Arbitrary<Tiedown> = fc.record({
      attachment: fc.constantFrom<Attachment>("direct", "indirect-same-side", "indirect-across"),
      components: fc.array(componentArb, { minLength: 1, maxLength: 4 }),
    });
    fc.assert(
      fc.property(requestArb, extra, fc.nat(), (req, t, at) => {
        const before = checkSecurement(req).aggregateWllLb;
        const tiedowns = [...req.tiedowns];
        tiedowns.splice(at % (tiedowns.length + 1), 0, t);
        const after = checkSecurement({ ...req, tiedowns }).aggregateWllLb;
        expect(after).toBeGreaterThanOrEqual(before);
      }),
      { numRuns: 150 },
    );
  });

  it("kilograms and metres give the same verdict and findings as pounds and feet", () => {
    fc.assert(
      fc.property(requestArb, (req) => {
        const imperial = checkSecurement(req);
        const metric = checkSecurement(toMetric(req));
        expect(metric.pass).toBe(imperial.pass);
        expect(sortedCodes(metric)).toEqual(sortedCodes(imperial));
        expect(metric.minimumTiedowns).toBe(imperial.minimumTiedowns);
        expect(metric.aggregateWllLb).toBe(imperial.aggregateWllLb);
        expect(metric.requiredAggregateWllLb).toBe(imperial.requiredAggregateWllLb);
      }),
      { numRuns: 150 },
    );
  });

  it("holds at the exact boundaries too: weight at twice the aggregate, 10,000 lb machines, 10 ft multiples", () => {
    const boundary: fc.Arbitrary<SecurementCheckRequest> = fc
      .record({ n: fc.integer({ min: 1, max: 6 }), wll: fc.integer({ min: 1000, max: 12000 }), len: fc.constantFrom(5, 10, 20, 30), kind: fc.constantFrom("machine" as const, "general" as const) })
      .map(({ n, wll, len, kind }) => ({
        // aggregate = n × wll / 2 = required exactly
        cargo: { weight: { value: n * wll, unit: "lb" as const }, length: { value: len, unit: "ft" as const }, kind },
        tiedowns: Array.from({ length: n }, () => ({ attachment: "direct" as const, components: [{ type: "anchor" as const, wll: { value: wll, unit: "lb" as const } }] })),
      }));
    fc.assert(
      fc.property(boundary, (req) => {
        const imperial = checkSecurement(req);
        const metric = checkSecurement(toMetric(req));
        expect(imperial.findings.some((f) => f.code === "AGGREGATE_WLL_BELOW_REQUIRED")).toBe(false);
        expect(metric.pass).toBe(imperial.pass);
        expect(sortedCodes(metric)).toEqual(sortedCodes(imperial));
      }),
    );
  });
});
