import { describe, expect, it } from "vitest";
import { PRE_USE_CHECKLISTS, preUseOutcome } from "@/lib/stock/checklists";
import { ITEM_KINDS } from "@/lib/stock/labels";

const all = (kind: keyof typeof PRE_USE_CHECKLISTS, defect = false) => PRE_USE_CHECKLISTS[kind].map((p) => ({ id: p.id, defect }));

describe("pre-use checklists", () => {
  it("exist for every kind, each point with a source", () => {
    for (const kind of ITEM_KINDS) {
      expect(PRE_USE_CHECKLISTS[kind].length).toBeGreaterThan(0);
      for (const p of PRE_USE_CHECKLISTS[kind]) expect(p.source.length).toBeGreaterThan(3);
    }
  });

  it("name the removal criteria the standards give", () => {
    // ASME B30.9 §9-1.9.5 (chain) and B30.10 (hooks); CVSA lists knots as a webbing defect.
    const chain = PRE_USE_CHECKLISTS.chain.map((p) => p.label).join(" ");
    expect(chain).toMatch(/Cracked/);
    expect(chain).toMatch(/stretched/);
    expect(chain).toMatch(/opened/);
    expect(PRE_USE_CHECKLISTS["web-strap"].map((p) => p.id)).toEqual(expect.arrayContaining(["cuts", "burns", "stitching", "knots", "label"]));
    expect(PRE_USE_CHECKLISTS.binder.map((p) => p.id)).toEqual(expect.arrayContaining(["handle", "hooks", "hold"]));
  });

  it("pass only when every point is answered with no defect", () => {
    expect(preUseOutcome("chain", all("chain"))).toMatchObject({ outcome: "pass", defects: [] });
    const one = all("binder").map((a) => (a.id === "hold" ? { ...a, defect: true } : a));
    const failed = preUseOutcome("binder", one);
    expect(failed).toMatchObject({ outcome: "fail", defects: ["Ratchet pawl slips or the lever will not stay over centre"] });
  });

  it("refuse a half-answered or foreign checklist", () => {
    expect(preUseOutcome("chain", all("chain").slice(1))).toEqual({ error: 'Answer every point: "Cracked, cut or gouged links" has no answer.', point: "cracked" });
    expect(preUseOutcome("hook", [...all("hook"), { id: "stitching", defect: false }])).toEqual({ error: '"stitching" is not a point of the hook checklist.', point: "stitching" });
  });
});
