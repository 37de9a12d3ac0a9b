import { describe, expect, it } from "vitest";
import { dayText, tagLabelText, wllText } from "@/lib/tags/label";

describe("tag label words", () => {
  it("says the WLL in pounds, or that there is none", () => {
    expect(wllText(6600)).toBe("WLL 6,600 lb");
    expect(wllText(12000)).toBe("WLL 12,000 lb");
    expect(wllText(0)).toBe("WLL 0 lb");
    expect(wllText(null)).toBe("No WLL: do not use");
  });

  it("describes a chain", () => {
    expect(tagLabelText({ kind: "chain", grade: 70, gradeMarked: true, size: "3/8", lengthMm: 6096, wllLb: 6600 })).toEqual({
      title: "Chain", grade: "Grade 70", size: "3/8 in", length: "20 ft", wll: "WLL 6,600 lb", hasWll: true,
    });
  });

  it("says when a chain has no grade mark", () => {
    expect(tagLabelText({ kind: "chain", grade: 30, gradeMarked: false, size: "3/8", wllLb: 2650 }).grade).toBe("No grade mark");
  });

  it("names the binder's mechanism and the chain it is for", () => {
    const t = tagLabelText({ kind: "binder", grade: null, size: "3/8", wllLb: 5400, details: { mechanism: "lever", chainSizeRange: ["5/16", "3/8"] } });
    expect(t.title).toBe("Lever binder");
    expect(t.grade).toBeNull();
    expect(t.size).toBe("For 5/16–3/8 in chain");
  });

  it("gives a web strap's width", () => {
    const t = tagLabelText({ kind: "web-strap", grade: null, size: "4", lengthMm: 9144, wllLb: 5400 });
    expect(t).toMatchObject({ title: "Web strap", size: "4 in wide", length: "30 ft" });
  });

  it("keeps millimetre sizes and rounds lengths to half a foot", () => {
    const t = tagLabelText({ kind: "chain", grade: 80, size: "10 mm", lengthMm: 4000, wllLb: null });
    expect(t).toMatchObject({ size: "10 mm", length: "13 ft", wll: "No WLL: do not use", hasWll: false });
    expect(tagLabelText({ kind: "chain", grade: 80, size: null, lengthMm: 2900, wllLb: null })).toMatchObject({ size: null, length: "9.5 ft" });
  });
});

describe("days in words", () => {
  it("name the month and never shift the day", () => {
    expect(dayText("2026-11-02")).toBe("November 2, 2026");
    expect(dayText("2027-01-01")).toBe("January 1, 2027");
    expect(dayText("not a day")).toBe("not a day");
  });
});
