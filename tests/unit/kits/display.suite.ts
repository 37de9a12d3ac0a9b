import { describe, expect, it } from "vitest";
import { feetInches, formatCheckWeight, formatLength, formatWeight, metres } from "@/lib/kits/display";

describe("figures in the preferred system, the other beside them", () => {
  it("weights", () => {
    expect(formatWeight(8100, "us")).toBe("8,100 lb (3,674 kg)");
    expect(formatWeight(8100, "metric")).toBe("3,674 kg (8,100 lb)");
    expect(formatWeight(10000, "metric")).toBe("4,536 kg (10,000 lb)");
  });

  it("lengths in feet and inches to the inch, metres to the centimetre", () => {
    expect(formatLength(4900, "us")).toBe("16 ft 1 in (4.90 m)");
    expect(formatLength(4900, "metric")).toBe("4.90 m (16 ft 1 in)");
    expect(feetInches(6096)).toBe("20 ft");
    expect(feetInches(200)).toBe("8 in");
    expect(feetInches(300)).toBe("1 ft"); // 11.8 in
    expect(feetInches(3650)).toBe("12 ft"); // 143.7 in rounds up to 144
    expect(feetInches(0)).toBe("0 in");
    expect(metres(200)).toBe("0.20 m");
  });

  it("check figures keep the engine's one decimal", () => {
    expect(formatCheckWeight(4900.5, 2222.9, "us")).toBe("4,900.5 lb (2,222.9 kg)");
    expect(formatCheckWeight(4900.5, 2222.9, "metric")).toBe("2,222.9 kg (4,900.5 lb)");
  });
});
