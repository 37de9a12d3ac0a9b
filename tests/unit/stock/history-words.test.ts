import { describe, expect, it } from "vitest";
import { changeLines, entryWords } from "@/lib/stock/history-words";

describe("entryWords", () => {
  it("says what happened in plain words, with the outcome", () => {
    expect(entryWords({ type: "check", outcome: "pass", note: null })).toEqual({ headline: "Pre-use check: passed, no defects", note: null });
    expect(entryWords({ type: "check", outcome: "fail", note: "Hook opened" })).toEqual({ headline: "Pre-use check: failed, defects found (tagged out)", note: "Hook opened" });
    expect(entryWords({ type: "inspection", outcome: "repair", note: null }).headline).toBe("Periodic inspection: hold for repair (tagged out)");
    expect(entryWords({ type: "tag_out", outcome: null, note: "Tagged out by a failed pre-use check" })).toEqual({ headline: "Tagged out: do not use", note: "Tagged out by a failed pre-use check" });
  });

  it("reads a kit's entry as its own sentence", () => {
    expect(entryWords({ type: "kit", outcome: "loaded", note: "In kit for Hollins driveway, 2026-12-03: loaded" })).toEqual({ headline: "In kit for Hollins driveway, 2026-12-03: loaded", note: null });
  });

  it("drops a note that only repeats the headline, and never shows a raw type name", () => {
    expect(entryWords({ type: "created", outcome: null, note: "Added to stock" })).toEqual({ headline: "Added to stock", note: null });
    expect(entryWords({ type: "some_new_type", outcome: null, note: null }).headline).toBe("some new type");
  });
});

describe("changeLines", () => {
  it("names each field as the item page does, with units", () => {
    expect(changeLines({ yardName: ["North lot", "Home yard"], lengthMm: [6096, 4877], markedWllLb: [null, 5400], costCents: [11900, 12500], gradeMarked: [true, false] })).toEqual([
      "Lives at: North lot → Home yard",
      "Length: 20.0 ft → 16.0 ft",
      "Marked WLL: none → 5,400 lb",
      "Cost: $119.00 → $125.00",
      "Grade mark legible: yes → no (counts as grade 30)",
    ]);
  });

  it("compares the details key by key", () => {
    expect(changeLines({ details: [{ mechanism: "ratchet", chainSizeRange: ["5/16", "3/8"] }, { mechanism: "lever", chainSizeRange: ["5/16", "3/8"], ends: "grab hooks" }] })).toEqual([
      "Binder: ratchet → lever",
      "End fittings: none → grab hooks",
    ]);
  });
});
