import { describe, expect, it } from "vitest";
import { itemUsability } from "@/lib/stock/usability";

const fit = { status: "in_service" as const, nextInspectionDue: "2026-12-31", wllLb: 5400 };

describe("itemUsability", () => {
  it("says yes to a rated item in service whose inspection is not past due", () => {
    expect(itemUsability(fit, "2026-12-01")).toEqual({ ok: true, reasons: [] });
    expect(itemUsability({ ...fit, nextInspectionDue: null }, "2026-12-01").ok).toBe(true);
  });

  it("counts the due date itself as in date and the day after as overdue", () => {
    expect(itemUsability({ ...fit, nextInspectionDue: "2026-12-01" }, "2026-12-01").ok).toBe(true);
    const late = itemUsability({ ...fit, nextInspectionDue: "2026-11-30" }, "2026-12-01");
    expect(late.ok).toBe(false);
    expect(late.reasons.map((r) => r.code)).toEqual(["INSPECTION_OVERDUE"]);
    expect(late.reasons[0]!.message).toContain("2026-11-30");
  });

  it("answers for the day asked: gear due before a kit's date is not usable on that date", () => {
    const dueTomorrow = { ...fit, nextInspectionDue: "2026-12-02" };
    expect(itemUsability(dueTomorrow, "2026-12-02").ok).toBe(true);
    expect(itemUsability(dueTomorrow, "2026-12-03").ok).toBe(false);
  });

  it("says no to tagged-out, retired and lost gear, and to gear without a WLL", () => {
    expect(itemUsability({ ...fit, status: "tagged_out" }, "2026-12-01").reasons.map((r) => r.code)).toEqual(["TAGGED_OUT"]);
    expect(itemUsability({ ...fit, status: "retired" }, "2026-12-01").reasons.map((r) => r.code)).toEqual(["RETIRED"]);
    expect(itemUsability({ ...fit, status: "lost" }, "2026-12-01").reasons.map((r) => r.code)).toEqual(["LOST"]);
    expect(itemUsability({ ...fit, wllLb: null }, "2026-12-01").reasons.map((r) => r.code)).toEqual(["NOT_RATED"]);
  });

  it("lists every reason that applies, and never calls an overdue inspection on retired gear a reason", () => {
    const both = itemUsability({ status: "tagged_out", nextInspectionDue: "2026-01-01", wllLb: null }, "2026-12-01");
    expect(both.reasons.map((r) => r.code)).toEqual(["TAGGED_OUT", "INSPECTION_OVERDUE", "NOT_RATED"]);
    expect(itemUsability({ status: "retired", nextInspectionDue: "2026-01-01", wllLb: 5400 }, "2026-12-01").reasons.map((r) => r.code)).toEqual(["RETIRED"]);
  });

  it("adds the day's pre-use check to a yes, and only when the caller gave the last check", () => {
    expect(itemUsability(fit, "2026-12-01")).not.toHaveProperty("check");
    expect(itemUsability({ ...fit, lastCheck: { on: "2026-12-01", passed: true } }, "2026-12-01").check).toEqual({
      done: true,
      message: "Pre-use check passed today: no defects found.",
    });
    const yesterday = itemUsability({ ...fit, lastCheck: { on: "2026-11-30", passed: true } }, "2026-12-01");
    expect(yesterday).toMatchObject({ ok: true, check: { done: false } });
    expect(yesterday.check!.message).toContain("2026-11-30");
    expect(itemUsability({ ...fit, lastCheck: null }, "2026-12-01").check).toEqual({ done: false, message: "No pre-use check on record: do one before you use it." });
  });

  it("never counts a failed check as done, even when the item was returned to service the same day", () => {
    const returned = itemUsability({ ...fit, lastCheck: { on: "2026-12-01", passed: false } }, "2026-12-01");
    expect(returned.ok).toBe(true);
    expect(returned.check!.done).toBe(false);
    expect(returned.check!.message).toMatch(/found defects.*returned to service/);
  });

  it("gives no check step to gear that may not be used: the reasons are the whole answer", () => {
    const out = itemUsability({ ...fit, status: "tagged_out", lastCheck: { on: "2026-12-01", passed: false } }, "2026-12-01");
    expect(out).toEqual({ ok: false, reasons: [expect.objectContaining({ code: "TAGGED_OUT" })] });
  });
});
