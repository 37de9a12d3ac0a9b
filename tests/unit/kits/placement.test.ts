import { describe, expect, it } from "vitest";
import { formatMetres, inBandRange, kitPlacement, placeMachine, positionLimits, tongueBand, tongueRangeLb } from "@/lib/kits/placement";
import type { Machine, Trailer } from "@/lib/kits/model";
import { excavator, kit, trailer as deck20 } from "./fixtures";

// An invented gooseneck and machine with round figures, so that the statics can be done by hand.
const neck: Trailer = {
  ...deck20,
  id: "t-neck",
  name: "Neck 25",
  trailerType: "gooseneck",
  coupling: "gooseneck",
  deckLengthMm: 7000,
  tiltLengthMm: 0,
  gvwrLb: 16000,
  emptyWeightLb: 4000,
  emptyTongueWeightLb: 500,
  hitchToAxleMm: 5000,
  hitchToDeckFrontMm: 1000,
};
const loader: Machine = { ...excavator, id: "m-load", name: "Stubb 10 loader", weightLb: 10000, lengthMm: 3000, cgFromFrontMm: 1500 };

describe("placeMachine: the statics", () => {
  it("matches a hand calculation of the tongue weight, the axle load and the share", () => {
    // Hand calculation, moments about the axle centre:
    //   x = hitch to deck front + machine front from deck front + CG from the machine's front
    //     = 1,000 + 1,000 + 1,500 = 3,500 mm from the hitch
    //   tongue T = T0 + W (a − x) / a = 500 + 10,000 × (5,000 − 3,500) / 5,000 = 500 + 3,000 = 3,500 lb
    //   axle   A = (E − T0) + W x / a = (4,000 − 500) + 10,000 × 3,500 / 5,000 = 3,500 + 7,000 = 10,500 lb
    //   loaded G = E + W = 14,000 lb (= T + A); share = 3,500 / 14,000 = 25 %
    const p = placeMachine(loader, neck, 1000);
    expect(p.cgFromHitchMm).toBe(3500);
    expect(p.tongueWeightLb).toBe(3500);
    expect(p.axleLoadLb).toBe(10500);
    expect(p.trailerGrossLb).toBe(14000);
    expect(p.tongueWeightLb + p.axleLoadLb).toBe(p.trailerGrossLb);
    expect(p.tongueWeightShare).toBe(0.25);
    expect(p.gvwrLb).toBe(16000);
    // 25 % is the top of the gooseneck band, inside it: no band warning, and the check passes.
    expect(p.findings.map((f) => f.code)).toEqual(["SIXTY_FORTY"]);
    expect(p.pass).toBe(true);
  });

  it("uses the middle of the machine when its centre of gravity is unknown, and says so", () => {
    // Deck 20 and the 12,000 lb excavator (5,791 mm, CG unknown → 2,895.5 mm), front 300 mm back:
    // x = 1,500 + 300 + 2,895.5 = 4,695.5; T = 600 + 12,000 × (6,700 − 4,695.5) / 6,700 = 600 + 3,590.1 = 4,190 lb.
    const p = placeMachine(excavator, deck20, 300);
    expect(p.cgAssumed).toBe(true);
    expect(p.cgFromHitchMm).toBe(4695.5);
    expect(p.tongueWeightLb).toBe(4190);
    expect(p.findings.find((f) => f.code === "CG_ASSUMED_MIDDLE")?.severity).toBe("info");
  });

  it("lightens the hitch as the machine moves back, and below the empty tongue weight once it is behind the axle", () => {
    const forward = placeMachine(loader, neck, 0);
    const back = placeMachine(loader, neck, 2000);
    expect(back.tongueWeightLb).toBeLessThan(forward.tongueWeightLb);
    expect(back.axleLoadLb).toBeGreaterThan(forward.axleLoadLb);
    // At 2,000 mm the CG is at 1,000 + 2,000 + 1,500 = 4,500 mm, still ahead of the 5,000 mm axle.
    expect(back.tongueWeightLb).toBeGreaterThan(neck.emptyTongueWeightLb);
    // At 3,500 mm it is at 6,000 mm, 1,000 mm behind: T = 500 + 10,000 × (−1,000) / 5,000 = −1,500 lb.
    const behind = placeMachine(loader, { ...neck, deckLengthMm: 9000 }, 3500);
    expect(behind.tongueWeightLb).toBe(-1500);
    expect(behind.tongueWeightLb).toBeLessThan(neck.emptyTongueWeightLb);
  });

  it("fails a negative tongue weight: the trailer will lift the hitch", () => {
    const p = placeMachine(loader, { ...neck, deckLengthMm: 9000 }, 3500);
    const f = p.findings[0]!;
    expect(f).toMatchObject({ code: "TONGUE_WEIGHT_NEGATIVE", severity: "fail" });
    expect(f.message).toContain("the trailer will lift the hitch");
    expect(p.pass).toBe(false);
    // The band warning is not added on top of the fail.
    expect(p.findings.map((x) => x.code)).not.toContain("TONGUE_SHARE_BELOW_BAND");
  });

  it("fails a loaded weight over the GVWR, wherever the machine sits", () => {
    // 4,000 + 13,000 = 17,000 lb against a 16,000 lb GVWR: 1,000 lb over.
    const heavy = { ...loader, weightLb: 13000 };
    for (const at of [0, 1000, 2000]) {
      const p = placeMachine(heavy, neck, at);
      const f = p.findings.find((x) => x.code === "OVER_GVWR");
      expect(f?.severity).toBe("fail");
      expect(f?.message).toContain("1,000 lb over its GVWR of 16,000 lb");
      expect(p.pass).toBe(false);
    }
    expect(placeMachine(loader, neck, 1000).findings.map((x) => x.code)).not.toContain("OVER_GVWR");
  });

  it("warns outside the band, with the cautions and the way back into it", () => {
    // Front at 0: x = 2,500; T = 500 + 10,000 × 2,500 / 5,000 = 5,500 lb; 5,500 / 14,000 = 39.3 %.
    const p = placeMachine(loader, neck, 0);
    const f = p.findings[0]!;
    expect(f).toMatchObject({ code: "TONGUE_SHARE_ABOVE_BAND", severity: "warn" });
    expect(f.message).toContain("39.3 %");
    expect(f.message).toMatch(/sway/);
    expect(f.message).toMatch(/steering and braking/);
    expect(f.message).toContain("Follow the trailer and tow vehicle makers' figures and local rules");
    expect(f.source).toContain("20–25 %");
    expect(p.pass).toBe(true); // a warning, not a fail
  });

  it("says when a gooseneck share is inside the vehicle maker's 15–25 % but below the trailer maker's 20–25 %", () => {
    // Share 17.5 % → T = 2,450 lb → W (a − x) / a = 1,950 → a − x = 975 → x = 4,025 → p = 4,025 − 1,000 − 1,500 = 1,525 mm.
    const p = placeMachine(loader, neck, 1525);
    expect(p.tongueWeightShare).toBe(0.175);
    const f = p.findings[0]!;
    expect(f.code).toBe("TONGUE_SHARE_BELOW_BAND");
    expect(f.message).toContain("inside the vehicle maker's 15–25 % but below the trailer maker's 20–25 %");
  });

  it("shows the 60 % habit as common practice only, never as a warning or a fail", () => {
    for (const at of [0, 1000, 2500, 4000]) {
      const f = placeMachine(loader, { ...neck, deckLengthMm: 9000 }, at).findings.find((x) => x.code === "SIXTY_FORTY")!;
      expect(f.severity).toBe("info");
      expect(f.source).toMatch(/^Common practice/);
      expect(f.message).toContain("rule of thumb, not a rule");
    }
    // Front 1,000 mm back: the machine spans 2,000–5,000 mm from the hitch; the axle is at 5,000: all of it ahead.
    expect(placeMachine(loader, neck, 1000).findings.find((x) => x.code === "SIXTY_FORTY")!.message).toContain("About 100 %");
    // Front 2,500 mm back: spans 3,500–6,500; 1,500 of 3,000 mm ahead: 50 %.
    expect(placeMachine(loader, neck, 2500).findings.find((x) => x.code === "SIXTY_FORTY")!.message).toContain("About 50 %");
  });

  it("warns when the machine reaches past the rear of the deck", () => {
    const p = placeMachine(loader, neck, 4500); // rear at 7,500 on a 7,000 mm deck
    expect(p.findings.find((f) => f.code === "MACHINE_BEYOND_DECK")?.message).toContain("0.50 m");
  });
});

describe("tongue-weight bands and their sources", () => {
  it("gives the trailer maker's worked example: a 12,000 lb loaded gooseneck carries 2,400–3,000 lb at 20–25 %", () => {
    expect(tongueRangeLb(12000, tongueBand("gooseneck"))).toEqual({ minLb: 2400, maxLb: 3000 });
    // The same through a placement: 4,000 lb empty plus an 8,000 lb machine.
    const p = placeMachine({ ...loader, weightLb: 8000 }, neck, 1000);
    expect(p.trailerGrossLb).toBe(12000);
    expect(p.band).toMatchObject({ min: 0.2, max: 0.25, minLb: 2400, maxLb: 3000 });
  });

  it("shows both published gooseneck and fifth-wheel figures, and uses the range both accept", () => {
    for (const coupling of ["gooseneck", "fifth-wheel"] as const) {
      const band = tongueBand(coupling);
      expect([band.min, band.max]).toEqual([0.2, 0.25]);
      expect(band.published.map((b) => [b.min, b.max])).toEqual([
        [0.2, 0.25],
        [0.15, 0.25],
      ]);
      expect(band.published[0]!.source).toMatch(/trailer maker/);
      expect(band.published[1]!.source).toMatch(/vehicle maker/);
    }
  });

  it("uses 10–15 % for a ball hitch (published) and for a pintle (common practice)", () => {
    expect(tongueBand("ball")).toMatchObject({ min: 0.1, max: 0.15, commonPractice: false });
    expect(tongueBand("pintle")).toMatchObject({ min: 0.1, max: 0.15, commonPractice: true });
    expect(tongueBand("pintle").source).toMatch(/^Common practice/);
    // A third-party bumper-pull example: a 5,000 lb trailer → 500–750 lb.
    expect(tongueRangeLb(5000, tongueBand("ball"))).toEqual({ minLb: 500, maxLb: 750 });
  });
});

describe("inBandRange: the slider's marks", () => {
  it("brackets exactly the positions whose share is inside the band", () => {
    // Share 25 % at p = 1,000 (above); share 20 % → T = 2,800 → W (a − x)/a = 2,300 → x = 3,850 → p = 1,350.
    expect(inBandRange(loader, neck)).toEqual({ fromMm: 1000, toMm: 1350 });
    for (let at = 0; at <= 4000; at += 50) {
      const inside = placeMachine(loader, neck, at).findings.every((f) => !f.code.startsWith("TONGUE_"));
      expect(inside, `at ${at} mm`).toBe(at >= 1000 && at <= 1350);
    }
  });

  it("stays within the deck, and is null when no position on the deck reaches the band", () => {
    expect(positionLimits(loader, neck)).toEqual({ fromMm: 0, toMm: 4000 });
    // A very short deck that ends before the band starts.
    expect(inBandRange(loader, { ...neck, deckLengthMm: 3500 })).toBeNull();
    // A machine longer than the deck can only sit at 0.
    expect(positionLimits({ lengthMm: 8000 }, neck)).toEqual({ fromMm: 0, toMm: 0 });
  });
});

describe("kitPlacement", () => {
  it("says what is missing instead of guessing", () => {
    expect(kitPlacement(kit())).toEqual({ placement: null, missing: ["The machine has not been placed on the deck yet."] });
    const unmeasured = kitPlacement(kit({ machineFrontFromDeckFrontMm: 200, trailer: { ...deck20, hitchToDeckFrontMm: null } }));
    expect(unmeasured.placement).toBeNull();
    expect(unmeasured.missing[0]).toContain("Deck 20's hitch point to the front of its deck");
    const placed = kitPlacement(kit({ machineFrontFromDeckFrontMm: 300 }));
    expect(placed.placement?.tongueWeightLb).toBe(4190);
  });
});

describe("formatMetres", () => {
  it("writes metres with feet and inches beside them", () => {
    expect(formatMetres(1200)).toBe("1.20 m (3 ft 11 in)");
    expect(formatMetres(2540)).toBe("2.54 m (8 ft 4 in)");
  });
});

describe("PlacementControl rendered on the server", () => {
  it("shows the figures, the band with its source, the in-band marks and the findings at the saved position", async () => {
    const { createElement } = await import("react");
    const { renderToStaticMarkup } = await import("react-dom/server");
    const { PlacementControl } = await import("@/components/kits/placement/placement-control");
    const { passingScene } = await import("./scenes");
    const k = passingScene();
    // x = 1,400 + 600 + 2,200 = 4,200; T = 450 + 8,100 × (5,000 − 4,200) / 5,000 = 1,746 lb; G = 12,000 lb: 14.6 %.
    const html = renderToStaticMarkup(createElement(PlacementControl, { machine: k.machine, trailer: k.trailer, initialMm: 600 }));
    expect(html).toContain("1,746 lb");
    expect(html).toContain("14.6 % of the loaded weight");
    expect(html).toContain("In the band");
    expect(html).toContain("12,000 lb");
    expect(html).toContain("2,000 lb under the GVWR");
    expect(html).toContain("Source: Common practice: no published figure for pintle hitches");
    expect(html).toMatch(/<input[^>]*type="range"[^>]*min="0"[^>]*max="1200"/);
    expect(html).toContain("Striped: in the band</span> from 0.57 m");
    expect(html).toContain('data-code="SIXTY_FORTY"');
    expect(html).toContain("does not replace the driver&#x27;s inspection");

    const far = renderToStaticMarkup(createElement(PlacementControl, { machine: k.machine, trailer: k.trailer, initialMm: 1200 }));
    expect(far).toContain("Below the band");
    expect(far).toContain('data-code="TONGUE_SHARE_BELOW_BAND"');

    const unmeasured = renderToStaticMarkup(createElement(PlacementControl, { machine: k.machine, trailer: { ...k.trailer, hitchToDeckFrontMm: null }, initialMm: 600 }));
    expect(unmeasured).toContain("Measure Split tilt 20&#x27;s distance from the hitch point to the front of its deck");
    // The machine can still be placed (the deck picture and a proposal use it); only the figures wait.
    expect(unmeasured).toContain('type="range"');
    expect(unmeasured).not.toContain("Tongue weight (on the hitch)");
  });
});
