import { describe, expect, it } from "vitest";
import { barFor, moreFor, navFor } from "@/lib/shell/nav";

describe("navFor", () => {
  it("shows a yard hand only what a yard hand may open", () => {
    expect(navFor({ role: "yard_hand", designated: false }).map((e) => e.href)).toEqual(["/", "/scan", "/stock", "/kits", "/check", "/machines", "/trailers", "/ratings", "/preferences"]);
  });
  it("shows an owner the people, audit and settings pages", () => {
    expect(navFor({ role: "owner", designated: false }).map((e) => e.href)).toEqual([
      "/", "/scan", "/stock", "/kits", "/check", "/machines", "/trailers", "/ratings", "/people", "/records", "/audit", "/settings", "/preferences",
    ]);
  });
  it("shows the records to a designated person of any role, and not to others", () => {
    expect(navFor({ role: "yard_hand", designated: true }).map((e) => e.href)).toContain("/records");
    expect(navFor({ role: "planner", designated: false }).map((e) => e.href)).not.toContain("/records");
  });
  it("keeps people and settings from a planner", () => {
    const hrefs = navFor({ role: "planner", designated: true }).map((e) => e.href);
    expect(hrefs).not.toContain("/people");
    expect(hrefs).not.toContain("/settings");
  });
});

describe("barFor", () => {
  it("puts the kits in the bottom bar of every role, and the scratch load check behind More", () => {
    for (const role of ["owner", "planner", "yard_hand"] as const) {
      expect(barFor({ role, designated: false }).map((e) => e.href)).toEqual(["/", "/scan", "/stock", "/kits", "/more"]);
    }
  });

  it("fits the phone's bottom bar: at most five entries, the rest behind More", () => {
    for (const role of ["owner", "planner", "yard_hand"] as const) {
      const bar = barFor({ role, designated: false });
      expect(bar.length).toBeLessThanOrEqual(5);
      expect(bar.at(-1)!.href).toBe("/more");
    }
  });
});

describe("moreFor", () => {
  it("lists on the More page only what the bottom bar does not show", () => {
    for (const role of ["owner", "planner", "yard_hand"] as const) {
      const actor = { role, designated: false };
      const bar = new Set(barFor(actor).map((e) => e.href));
      const more = moreFor(actor).map((e) => e.href);
      expect(more.filter((h) => bar.has(h))).toEqual([]);
      expect(new Set([...bar, ...more])).toEqual(new Set([...navFor(actor).map((e) => e.href), "/more"]));
    }
    expect(moreFor({ role: "yard_hand", designated: false }).map((e) => e.href)).toEqual(["/check", "/machines", "/trailers", "/ratings", "/preferences"]);
  });
});
