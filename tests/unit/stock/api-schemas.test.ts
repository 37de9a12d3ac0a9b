import { describe, expect, it } from "vitest";
import { itemListQuerySchema, listFilters } from "@/lib/stock/api-schemas";

describe("listFilters", () => {
  const query = { page: 1, perPage: 25, sort: "tagCode" as const, order: "asc" as const };
  it("counts overdue and due-soon from the organisation's today, the overdue ones apart", () => {
    expect(listFilters({ ...query, due: "overdue" as const }, "2026-12-01")).toEqual({ ...query, dueBefore: "2026-12-01" });
    expect(listFilters({ ...query, due: "30d" as const }, "2026-12-01")).toEqual({ ...query, dueFrom: "2026-12-01", dueBy: "2026-12-31" });
    expect(listFilters({ ...query, due: undefined }, "2026-12-01")).toEqual(query);
  });

  it("takes items without a WLL apart on request", () => {
    expect(listFilters({ ...query, rated: "no" as const }, "2026-12-01")).toEqual({ ...query, unrated: true });
  });
});

describe("itemListQuerySchema", () => {
  it("takes one status or several with commas", () => {
    expect(itemListQuerySchema.parse({ status: "tagged_out" }).status).toEqual(["tagged_out"]);
    expect(itemListQuerySchema.parse({ status: "retired,lost" }).status).toEqual(["retired", "lost"]);
    expect(itemListQuerySchema.parse({ status: "" }).status).toBeUndefined();
    expect(itemListQuerySchema.safeParse({ status: "retired,broken" }).success).toBe(false);
  });
});
