import { describe, expect, it } from "vitest";
import { duePeriod, dueByWeek, gearCounts, tagOutPeriod, tagOutsByMonth } from "@/lib/dashboard/charts";

describe("dueByWeek", () => {
  const today = "2026-12-03"; // a Thursday

  it("starts the first week today and the others on Mondays, twelve weeks in all", () => {
    const weeks = dueByWeek([], today);
    expect(weeks).toHaveLength(12);
    expect(weeks[0]).toMatchObject({ from: "2026-12-03", to: "2026-12-06", label: "This week", dates: "3 Dec to 6 Dec", count: 0 });
    expect(weeks[1]).toMatchObject({ from: "2026-12-07", to: "2026-12-13", label: "Next week" });
    expect(weeks[2]).toMatchObject({ from: "2026-12-14", label: "Week of 14 Dec" });
    expect(weeks[11].to).toBe(duePeriod(today).to);
    expect(duePeriod(today)).toEqual({ from: "2026-12-03", to: "2027-02-21" });
  });

  it("counts each day in its week, both ends included, and links to exactly those days", () => {
    const weeks = dueByWeek(
      [
        { day: "2026-12-03", count: 1 },
        { day: "2026-12-06", count: 2 },
        { day: "2026-12-07", count: 4 },
        { day: "2027-02-21", count: 8 },
      ],
      today,
    );
    expect(weeks.map((w) => w.count)).toEqual([3, 4, 0, 0, 0, 0, 0, 0, 0, 0, 0, 8]);
    expect(weeks[1].href).toBe("/stock?status=in_service&dueFrom=2026-12-07&dueBy=2026-12-13");
  });

  it("a Sunday's first week is today alone", () => {
    expect(dueByWeek([], "2026-12-06", 1)[0]).toMatchObject({ from: "2026-12-06", to: "2026-12-06", dates: "6 Dec" });
  });
});

describe("gearCounts", () => {
  const rows = [
    { kind: "chain", status: "in_service", count: 20 },
    { kind: "chain", status: "tagged_out", count: 2 },
    { kind: "binder", status: "retired", count: 1 },
  ] as const;

  it("lists every status, zeros included, with its list's address", () => {
    const g = gearCounts(rows);
    expect(g.total).toBe(23);
    expect(g.byStatus.map((s) => [s.label, s.count])).toEqual([["In service", 20], ["Tagged out", 2], ["Retired", 1], ["Lost", 0]]);
    expect(g.byStatus[1].href).toBe("/stock?status=tagged_out");
  });

  it("lists only the kinds held, in the stock's order, each cell with kind and status in its address", () => {
    const g = gearCounts(rows);
    expect(g.byKind.map((k) => [k.label, k.total])).toEqual([["Chain", 22], ["Chain binder", 1]]);
    expect(g.byKind[0].cells.find((c) => c.status === "tagged_out")).toEqual({ status: "tagged_out", count: 2, href: "/stock?kind=chain&status=tagged_out" });
  });
});

describe("tagOutsByMonth", () => {
  it("covers six calendar months to today, across a year's end", () => {
    expect(tagOutPeriod("2027-02-10")).toEqual({ from: "2026-09-01", to: "2027-02-10" });
    const months = tagOutsByMonth([], "2027-02-10");
    expect(months.map((m) => m.label)).toEqual(["Sep 2026", "Oct 2026", "Nov 2026", "Dec 2026", "Jan 2027", "Feb 2027"]);
    expect(months.every((m) => m.total === 0)).toBe(true);
  });

  it("adds each day to its month and reason, and links a month to its records (this one to today)", () => {
    const months = tagOutsByMonth(
      [
        { day: "2026-11-30", reason: "check_failed", count: 2 },
        { day: "2026-12-01", reason: "check_failed", count: 1 },
        { day: "2026-12-02", reason: "damage_reported", count: 3 },
      ],
      "2026-12-03",
      2,
    );
    expect(months[0]).toMatchObject({ month: "2026-11", total: 2, href: "/records?from=2026-11-01&to=2026-11-30" });
    expect(months[1].counts).toEqual({ check_failed: 1, damage_reported: 3, inspection_repair: 0, found: 0 });
    expect(months[1].href).toBe("/records?from=2026-12-01&to=2026-12-03");
  });
});
