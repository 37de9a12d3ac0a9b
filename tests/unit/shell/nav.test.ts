import { describe, expect, it } from "vitest";
import { navFor } from "@/lib/shell/nav";

describe("navFor", () => {
  it("shows a yard hand only what a yard hand may open", () => {
    expect(navFor({ role: "yard_hand", designated: false }).map((e) => e.href)).toEqual(["/", "/stock"]);
  });
  it("shows an owner the people, audit and settings pages", () => {
    expect(navFor({ role: "owner", designated: false }).map((e) => e.href)).toEqual(["/", "/stock", "/people", "/audit", "/settings"]);
  });
  it("keeps people and settings from a planner", () => {
    const hrefs = navFor({ role: "planner", designated: true }).map((e) => e.href);
    expect(hrefs).not.toContain("/people");
    expect(hrefs).not.toContain("/settings");
  });
});
