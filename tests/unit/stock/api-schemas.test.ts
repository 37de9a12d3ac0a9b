import { describe, expect, it } from "vitest";
import { listFilters } from "@/lib/stock/api-schemas";

describe("listFilters", () => {
  const query = { page: 1, perPage: 25, sort: "tagCode" as const, order: "asc" as const };
  it("counts overdue and due-soon from the organisation's today", () => {
    expect(listFilters({ ...query, due: "overdue" as const }, "2026-12-01")).toEqual({ ...query, dueBefore: "2026-12-01" });
    expect(listFilters({ ...query, due: "30d" as const }, "2026-12-01")).toEqual({ ...query, dueBy: "2026-12-31" });
    expect(listFilters({ ...query, due: undefined }, "2026-12-01")).toEqual(query);
  });
});
