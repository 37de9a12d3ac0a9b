// Grouping the findings that repeat for several tiedowns (four binders without a WLL) into
// one that names the tiedowns. Built on real check results, so it follows the engine's words.
import { describe, expect, it } from "vitest";
import { checkSecurement } from "@/lib/securement/check";
import type { Finding } from "@/lib/securement/findings";
import { groupFindings } from "@/lib/securement/grouping";
import type { Tiedown } from "@/lib/securement/request";
import { CORNERS, deepFreeze, lb, machine } from "./helpers";

const corner = (label: string, binder: Tiedown["components"][number]): Tiedown => ({
  label,
  attachment: "direct",
  components: [{ type: "chain", grade: 70, size: "3/8 in" }, binder, { type: "anchor", wll: lb(6600) }],
});

describe("groupFindings", () => {
  it("four binders without a WLL become one finding naming the four tiedowns", () => {
    const r = checkSecurement(machine(12000, CORNERS.map((c) => corner(c, { type: "binder", chainSizeRange: ["5/16 in", "3/8 in"] }))));
    expect(r.findings.filter((f) => f.code === "MISSING_WLL")).toHaveLength(4);
    const groups = groupFindings(r.findings, r.tiedowns.map((t) => t.label));
    const missing = groups.filter((g) => g.code === "MISSING_WLL");
    expect(missing).toHaveLength(1);
    expect(missing[0]).toMatchObject({
      severity: "fail",
      source: "49 CFR 393.108(a)",
      tiedowns: [0, 1, 2, 3],
      paths: ["tiedowns.0.components.1.wll", "tiedowns.1.components.1.wll", "tiedowns.2.components.1.wll", "tiedowns.3.components.1.wll"],
    });
    expect(missing[0]!.message).toMatch(/^Tiedowns 1 \(front left\), 2 \(front right\), 3 \(rear left\) and 4 \(rear right\), component 2: A binder must carry a marked WLL: /);
    expect(missing[0]!.findings).toHaveLength(4);
    // the findings that are about the check as a whole stay as they are
    const aggregate = groups.find((g) => g.code === "AGGREGATE_WLL_BELOW_REQUIRED")!;
    expect(aggregate.message).toBe(r.findings.find((f) => f.code === "AGGREGATE_WLL_BELOW_REQUIRED")!.message);
    expect(aggregate.tiedowns).toEqual([]);
  });

  it("keeps apart what differs: other figures, other severity, other codes", () => {
    const tiedowns = [
      corner("a", { type: "binder", wll: lb(5400) }), // range not given: warn
      corner("b", { type: "binder", wll: lb(5400) }),
      { ...corner("c", { type: "binder", wll: lb(5400) }), components: [{ type: "chain", size: "1/2 in", marked: false }, { type: "binder", wll: lb(5400) }] } as Tiedown,
    ];
    const r = checkSecurement(machine(9000, tiedowns, { length: { value: 8, unit: "ft" } }));
    const groups = groupFindings(r.findings, r.tiedowns.map((t) => t.label));
    const ranges = groups.filter((g) => g.code === "BINDER_RANGE_NOT_GIVEN");
    // a and b share "the 3/8 in chain"; c has a 1/2 in chain: a different sentence
    expect(ranges.map((g) => g.tiedowns)).toEqual([[0, 1], [2]]);
    expect(ranges[0]!.message).toMatch(/^Tiedowns 1 \(a\) and 2 \(b\), component 2: The binder's chain-size range is not given/);
    expect(ranges[1]!.message).toBe(r.findings.find((f) => f.code === "BINDER_RANGE_NOT_GIVEN" && f.tiedown === 2)!.message);
  });

  it("keeps the order of the first member, so fail → warn → info stays sorted", () => {
    const r = checkSecurement(machine(12000, CORNERS.map((c) => ({ ...corner(c, { type: "binder" }), components: [{ type: "chain", size: "3/8", marked: false }, { type: "binder" }] }) as Tiedown)));
    const order = groupFindings(r.findings).map((g) => ({ fail: 0, warn: 1, info: 2 })[g.severity]);
    expect(order).toEqual([...order].sort((a, b) => a - b));
    expect(groupFindings(r.findings).reduce((n, g) => n + g.findings.length, 0)).toBe(r.findings.length);
  });

  it("names tiedowns by number when no label is given, and does not repeat a default label", () => {
    const f = (tiedown: number): Finding => ({ code: "MISSING_WLL", severity: "fail", source: "49 CFR 393.108(a)", message: `Tiedown ${tiedown + 1}, component 2 (binder): x`, detail: "x", tiedown, component: 1, path: `tiedowns.${tiedown}.components.1.wll` });
    expect(groupFindings([f(0), f(2)])[0]!.message).toBe("Tiedowns 1 and 3, component 2: x");
    expect(groupFindings([f(0), f(2)], ["tiedown 1", "tiedown 2", "front"])[0]!.message).toBe("Tiedowns 1 and 3 (front), component 2: x");
    expect(groupFindings([f(0), { ...f(1), component: 2 }])[0]!.message).toBe("Tiedowns 1 and 2: x");
  });

  it("does not change its input, and leaves findings without a detail alone", () => {
    const input = deepFreeze([
      { code: "MISSING_WLL", severity: "fail", source: "s", message: "one", tiedown: 0 },
      { code: "MISSING_WLL", severity: "fail", source: "s", message: "one", tiedown: 1 },
    ] as Finding[]);
    const groups = groupFindings(input);
    expect(groups.map((g) => g.message)).toEqual(["one", "one"]);
    expect(groupFindings([])).toEqual([]);
  });
});
