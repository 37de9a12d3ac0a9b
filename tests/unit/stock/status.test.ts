import { describe, expect, it } from "vitest";
import { nextStatus } from "@/lib/stock/status";
import { intervalsWithDefaults, nextDue, DEFAULT_INTERVAL_DAYS } from "@/lib/stock/intervals";

describe("status changes", () => {
  it("a failed check or a damage report tags out; only in-service items are checked", () => {
    expect(nextStatus("in_service", "check_fail")).toEqual({ status: "tagged_out" });
    expect(nextStatus("in_service", "tag_out")).toEqual({ status: "tagged_out" });
    expect(nextStatus("tagged_out", "check_pass")).toHaveProperty("error");
  });
  it("a tagged-out item comes back only by inspection or return to service", () => {
    expect(nextStatus("tagged_out", "return_to_service")).toEqual({ status: "in_service" });
    expect(nextStatus("tagged_out", "inspect_in_service")).toEqual({ status: "in_service" });
    expect(nextStatus("in_service", "return_to_service")).toHaveProperty("error");
  });
  it("retired is final; a found item stays out of use until inspected", () => {
    for (const c of ["check_pass", "return_to_service", "inspect_in_service", "found", "lost"] as const) {
      expect(nextStatus("retired", c)).toHaveProperty("error");
    }
    expect(nextStatus("lost", "found")).toEqual({ status: "tagged_out" });
  });
});

describe("inspection intervals", () => {
  it("default to a year (ASME B30.26) and half a year for webbing (common practice)", () => {
    expect(DEFAULT_INTERVAL_DAYS.shackle).toBe(365);
    expect(DEFAULT_INTERVAL_DAYS["web-strap"]).toBe(180);
  });
  it("take the organisation's setting where it is sane", () => {
    const i = intervalsWithDefaults({ chain: 90, binder: 0, hook: "30" });
    expect(i.chain).toBe(90);
    expect(i.binder).toBe(365);
    expect(i.hook).toBe(365);
  });
  it("count calendar days across month ends and leap years", () => {
    expect(nextDue("2026-01-31", 30)).toBe("2026-03-02");
    expect(nextDue("2028-02-28", 1)).toBe("2028-02-29");
    expect(nextDue("2026-12-01", 365)).toBe("2027-12-01");
  });
});
