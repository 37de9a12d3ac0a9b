import { describe, expect, it } from "vitest";
import { can } from "@/lib/auth/roles";
import { compareScan, kitEventNote, transitionRule } from "@/lib/kits/lifecycle";
import { KIT_STATES } from "@/lib/kits/model";

describe("transitionRule", () => {
  it("allows exactly draft → ready → loaded → returned, and ready → draft", () => {
    const allowed = KIT_STATES.flatMap((from) => KIT_STATES.filter((to) => !("error" in transitionRule(from, to))).map((to) => `${from}→${to}`));
    expect(allowed).toEqual(["draft→ready", "ready→draft", "ready→loaded", "loaded→returned"]);
  });

  it("lets planners build and yard hands load and return", () => {
    const who = (from: (typeof KIT_STATES)[number], to: (typeof KIT_STATES)[number]) => {
      const rule = transitionRule(from, to);
      if ("error" in rule) throw new Error(rule.error);
      return (["owner", "planner", "yard_hand"] as const).filter((role) => can({ role, designated: false }, rule.permission));
    };
    expect(who("draft", "ready")).toEqual(["owner", "planner"]);
    expect(who("ready", "draft")).toEqual(["owner", "planner"]);
    expect(who("ready", "loaded")).toEqual(["owner", "planner", "yard_hand"]);
    expect(who("loaded", "returned")).toEqual(["owner", "planner", "yard_hand"]);
  });

  it("says why a step is not possible", () => {
    expect(transitionRule("draft", "loaded")).toEqual({ error: "A draft kit is marked ready before it is loaded." });
    expect(transitionRule("returned", "draft")).toEqual({ error: "The kit has been returned; copy it to plan another trip." });
    expect(transitionRule("ready", "ready")).toEqual({ error: "The kit is already ready." });
  });
});

describe("compareScan", () => {
  it("names what is missing and what is not in the kit, whatever the order", () => {
    expect(compareScan(["a", "b", "c"], ["c", "a", "b"])).toEqual({ missing: [], unexpected: [] });
    expect(compareScan(["a", "b", "c"], ["a", "c", "x"])).toEqual({ missing: ["b"], unexpected: ["x"] });
    expect(compareScan([], ["x"])).toEqual({ missing: [], unexpected: ["x"] });
  });
});

describe("kitEventNote", () => {
  it("writes the line every item's history gets", () => {
    expect(kitEventNote({ job: "Hollins driveway", date: "2026-12-03" }, "loaded")).toBe("In kit for Hollins driveway, 2026-12-03: loaded");
    expect(kitEventNote({ job: "Hollins driveway", date: "2026-12-03" }, "ready")).toBe("In kit for Hollins driveway, 2026-12-03: marked ready");
  });
});
