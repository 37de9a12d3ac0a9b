import { describe, expect, it } from "vitest";
import { itemChanges, type TrackedFields } from "@/lib/stock/changes";

const chain: TrackedFields = {
  grade: 70, gradeMarked: true, size: "3/8", lengthMm: 6096, markedWllLb: null, wllLb: 6600, serial: "CH-1",
  inServiceOn: "2026-01-15", costCents: 11900, details: { ends: "grab hook both ends", mechanism: undefined }, yardId: "y1", yardName: "Main yard",
};

describe("itemChanges", () => {
  it("is empty when nothing tracked changed, whatever the key order of the details", () => {
    expect(itemChanges(chain, { ...chain, details: { mechanism: undefined, ends: "grab hook both ends" } })).toEqual({});
  });

  it("names each changed value with its before and after", () => {
    expect(itemChanges(chain, { ...chain, grade: 80, wllLb: 7100, costCents: 13000 })).toEqual({ grade: [70, 80], wllLb: [6600, 7100], costCents: [11900, 13000] });
  });

  it("shows a move by yard name, even between two yards of the same name", () => {
    expect(itemChanges(chain, { ...chain, yardId: "y2", yardName: "North yard" })).toEqual({ yardName: ["Main yard", "North yard"] });
    expect(itemChanges(chain, { ...chain, yardId: "y3" })).toEqual({ yardName: ["Main yard", "Main yard"] });
  });

  it("reads a missing value as none", () => {
    expect(itemChanges({ ...chain, serial: undefined }, chain)).toEqual({ serial: [null, "CH-1"] });
    expect(itemChanges({ ...chain, details: undefined }, { ...chain, details: {} })).toEqual({});
  });
});
