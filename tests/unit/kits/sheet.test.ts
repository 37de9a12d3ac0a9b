import { describe, expect, it } from "vitest";
import { PAPER, paperFor, PRE_TRIP_REMINDERS } from "@/lib/kits/sheet";

describe("the load sheet's paper", () => {
  it("takes the paper asked for, else the organisation's usual one", () => {
    expect(paperFor("a4", "us")).toBe("a4");
    expect(paperFor("letter", "metric")).toBe("letter");
    expect(paperFor(undefined, "us")).toBe("letter");
    expect(paperFor(undefined, "metric")).toBe("a4");
    expect(paperFor("legal", "us")).toBe("letter");
  });

  it("knows each paper's size in PDF points: 8.5 × 11 in, and 210 × 297 mm", () => {
    expect(PAPER.letter.points).toEqual({ width: 8.5 * 72, height: 11 * 72 });
    expect(PAPER.a4.points.width).toBeCloseTo((210 / 25.4) * 72, 2);
    expect(PAPER.a4.points.height).toBeCloseTo((297 / 25.4) * 72, 2);
  });

  it("reminds the driver of the re-check on the way, the binders, the latches, each with its source", () => {
    expect(PRE_TRIP_REMINDERS.map((r) => r.code)).toEqual(["RECHECK_TENSION", "BINDERS_IN_SIGHT", "LATCHED", "WALK_AROUND"]);
    for (const r of PRE_TRIP_REMINDERS) expect(r.source.length).toBeGreaterThan(5);
  });
});
