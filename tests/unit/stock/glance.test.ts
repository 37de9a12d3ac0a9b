import { describe, expect, it } from "vitest";
import { stockGlance, type GlanceBucket } from "@/lib/stock/glance";

const bucket = (b: Partial<GlanceBucket>): GlanceBucket => ({ status: "in_service", rated: true, due: "later", firstDue: "2027-06-01", count: 1, ...b });

describe("stockGlance", () => {
  it("counts what may be used and, apart, what is due soon but not overdue", () => {
    const g = stockGlance([bucket({ count: 10 }), bucket({ due: "soon", firstDue: "2026-12-01", count: 4 }), bucket({ due: "none", firstDue: null, count: 2 })], "2026-12-01");
    expect(g).toMatchObject({ mayBeUsed: 16, dueSoon: 4, doNotUse: 0, overdue: 0 });
  });

  it("puts overdue gear under 'do not use', never under 'due soon'", () => {
    const g = stockGlance([bucket({ due: "overdue", firstDue: "2026-11-30", count: 3 })], "2026-12-01");
    expect(g).toMatchObject({ mayBeUsed: 0, doNotUse: 3, overdue: 3, dueSoon: 0 });
  });

  it("counts each item that may not be used once, under its first reason", () => {
    const g = stockGlance(
      [
        bucket({ status: "tagged_out", due: "overdue", firstDue: "2026-01-01", count: 2 }),
        bucket({ status: "tagged_out", count: 1 }),
        bucket({ rated: false, count: 5 }),
        bucket({ rated: false, due: "overdue", firstDue: "2026-01-01", count: 1 }),
      ],
      "2026-12-01",
    );
    expect(g).toEqual({ mayBeUsed: 0, doNotUse: 9, overdue: 1, taggedOut: 3, notRated: 5, dueSoon: 0, retiredOrLost: 0 });
  });

  it("keeps retired and lost gear apart: out of the yard, not waiting for a decision", () => {
    const g = stockGlance([bucket({ status: "retired", count: 4 }), bucket({ status: "lost", due: "overdue", firstDue: "2026-01-01", count: 1 })], "2026-12-01");
    expect(g).toMatchObject({ retiredOrLost: 5, doNotUse: 0, overdue: 0 });
  });
});
