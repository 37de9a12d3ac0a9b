import { describe, expect, it } from "vitest";
import { safeNextPath } from "@/lib/http/next-path";

describe("safeNextPath", () => {
  it("keeps paths on this site", () => {
    expect(safeNextPath("/t/K7XM-3HQA")).toBe("/t/K7XM-3HQA");
    expect(safeNextPath("/stock?status=tagged_out")).toBe("/stock?status=tagged_out");
  });
  it("refuses anything that could leave the site", () => {
    for (const bad of ["//evil.example", "/\\evil.example", "https://evil.example", "evil", "/\nx", undefined, 42]) {
      expect(safeNextPath(bad)).toBeNull();
    }
  });
});
