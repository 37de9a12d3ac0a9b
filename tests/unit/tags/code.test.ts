import { describe, expect, it } from "vitest";
import { newTagCode, normaliseTagCode, TAG_ALPHABET } from "@/lib/tags/code";

describe("tag codes", () => {
  it("use no look-alike characters", () => {
    for (const ch of "0O1IL5S2Z8BUV") expect(TAG_ALPHABET).not.toContain(ch);
    expect(new Set(TAG_ALPHABET).size).toBe(TAG_ALPHABET.length);
  });

  it("are two groups of four from the alphabet", () => {
    for (let i = 0; i < 1000; i++) {
      const code = newTagCode();
      expect(code).toMatch(/^[^-]{4}-[^-]{4}$/);
      for (const ch of code.replace("-", "")) expect(TAG_ALPHABET).toContain(ch);
    }
  });

  it("rarely repeat: about as often as 23^8 random codes should", () => {
    // Birthday bound: 100,000 draws from 23^8 ≈ 7.8e10 codes give n²/2N ≈ 0.064 expected
    // repeats, so three or more (p ≈ 4e-5) would mean the draw is not uniform. The app
    // still checks every new code against stock (freshTagCode) and the column is unique.
    const seen = new Set<string>();
    for (let i = 0; i < 100_000; i++) seen.add(newTagCode());
    expect(100_000 - seen.size).toBeLessThanOrEqual(2);
  });

  it("are spread evenly over the alphabet (not sequential)", () => {
    const counts = new Map<string, number>();
    const n = 20_000;
    for (let i = 0; i < n; i++) for (const ch of newTagCode().replace("-", "")) counts.set(ch, (counts.get(ch) ?? 0) + 1);
    const expected = (n * 8) / TAG_ALPHABET.length;
    for (const ch of TAG_ALPHABET) expect(Math.abs((counts.get(ch) ?? 0) - expected) / expected).toBeLessThan(0.1);
  });

  it("normalise what a person typed", () => {
    expect(normaliseTagCode(" k7xm 3hqa ")).toBe("K7XM-3HQA");
    expect(normaliseTagCode("k7xm-3hqa")).toBe("K7XM-3HQA");
    expect(normaliseTagCode("K7XM3HQ")).toBeNull(); // too short
    expect(normaliseTagCode("K7XM-3HQ0")).toBeNull(); // 0 is not in the alphabet
  });
});
