import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { KitDeck } from "@/components/kits/deck/kit-deck";
import { ASSUMED_DECK_WIDTH_MM, deckPicture, type DeckLabel, type DeckPicture, type Point, type Rect } from "@/lib/kits/deck";
import { kitVerdict } from "@/lib/kits/plan";
import type { Kit } from "@/lib/kits/model";
import { failingScene, passingScene, splitTilt } from "./scenes";

const picture = (kit: Kit) => deckPicture(kit, kitVerdict(kit));

function inside(vb: Rect, what: string, p: Point) {
  expect(p.x, `${what} x`).toBeGreaterThanOrEqual(vb.x);
  expect(p.y, `${what} y`).toBeGreaterThanOrEqual(vb.y);
  expect(p.x, `${what} x`).toBeLessThanOrEqual(vb.x + vb.width);
  expect(p.y, `${what} y`).toBeLessThanOrEqual(vb.y + vb.height);
}
function rectInside(vb: Rect, what: string, r: Rect) {
  inside(vb, `${what} top left`, r);
  inside(vb, `${what} bottom right`, { x: r.x + r.width, y: r.y + r.height });
}
function labelInside(vb: Rect, what: string, l: DeckLabel) {
  rectInside(vb, what, l.box);
  if (l.leader) l.leader.forEach((p, i) => inside(vb, `${what} leader ${i}`, p));
}

/** Every mark, line and label of a picture. */
function everything(pic: DeckPicture, check: (vb: Rect) => void = () => {}) {
  const vb = pic.viewBox;
  check(vb);
  rectInside(vb, "deck", pic.deck.rect);
  rectInside(vb, "machine", pic.machine.rect);
  labelInside(vb, "machine name", pic.machine.nameTag);
  labelInside(vb, "machine front", pic.machine.frontTag);
  pic.machine.points.forEach((p) => inside(vb, `machine point ${p.label}`, p.at));
  for (const a of pic.anchors) {
    inside(vb, `anchor ${a.label}`, { x: a.at.x - a.sizeMm, y: a.at.y - a.sizeMm });
    inside(vb, `anchor ${a.label}`, { x: a.at.x + a.sizeMm, y: a.at.y + a.sizeMm });
    labelInside(vb, `anchor ${a.label} label`, a.tag);
  }
  for (const t of pic.tiedowns) {
    [t.from, t.to, t.badge].forEach((p, i) => p && inside(vb, `tiedown ${t.label} point ${i}`, p));
    if (t.tag) labelInside(vb, `tiedown ${t.label} label`, t.tag);
  }
  if (pic.hitch) {
    inside(vb, "hitch", pic.hitch.at);
    pic.hitch.tongue.flat().forEach((p) => inside(vb, "tongue", p));
    labelInside(vb, "hitch label", pic.hitch.tag);
  }
  if (pic.axle) labelInside(vb, "axle label", pic.axle.tag);
}

describe("deckPicture: geometry to scale", () => {
  const pic = picture(passingScene());
  const deck = pic.deck.rect;

  it("draws the deck at its own width and length, split into its fixed and tilting parts", () => {
    expect([deck.width, deck.height]).toEqual([2083, 6100]);
    expect(pic.deck.fixed).toMatchObject({ y: deck.y, height: 1200, width: 2083 });
    expect(pic.deck.tilt).toMatchObject({ y: deck.y + 1200, height: 4900 });
    expect(pic.deck.widthAssumed).toBe(false);
  });

  it("puts the hitch its distance ahead of the deck front, and the axle centre its distance behind the hitch", () => {
    expect(deck.y - pic.hitch!.at.y).toBe(1400);
    expect(pic.axle!.y - pic.hitch!.at.y).toBe(5000);
    expect(pic.hitch!.at.x).toBeCloseTo(deck.x + deck.width / 2, 6);
  });

  it("draws the machine where it sits, at its length and width, centred across the deck", () => {
    const m = pic.machine;
    expect(m.placed).toBe(true);
    expect(m.rect.y - deck.y).toBe(600);
    expect([m.rect.width, m.rect.height]).toEqual([1750, 4900]);
    expect(m.rect.x + m.rect.width / 2).toBeCloseTo(deck.x + deck.width / 2, 6);
    // Tie-down points at their distance from the machine's front: front left 250 mm, rear left 4,650 mm.
    const point = (label: string) => m.points.find((p) => p.label === label)!.at;
    expect(point("front left").y - m.rect.y).toBe(250);
    expect(point("rear left").y - m.rect.y).toBe(4650);
    expect(point("front left").x).toBeLessThan(point("front right").x);
    expect(point("blade").x).toBeCloseTo(m.rect.x + m.rect.width / 2, 6);
  });

  it("puts each anchor point at its side and its distance from the deck front", () => {
    const at = (label: string) => pic.anchors.find((a) => a.label === label)!;
    expect(at("L3").at.y - deck.y).toBe(5950);
    expect(at("L1").at.x).toBeGreaterThan(deck.x);
    expect(at("L1").at.x).toBeLessThan(deck.x + deck.width / 4);
    expect(at("R1").at.x).toBeGreaterThan(deck.x + (deck.width * 3) / 4);
    expect(at("R1").at.x).toBeLessThan(deck.x + deck.width);
    expect(at("C1").at.x).toBeCloseTo(deck.x + deck.width / 2, 6);
    expect(at("L1").tag.lines).toEqual(["L1", "6,600 lb"]);
  });

  it("runs each tiedown from its anchor point to its machine point", () => {
    for (const t of pic.tiedowns) {
      const a = pic.anchors.find((x) => x.id === t.anchorPointId)!;
      expect(t.from).toEqual(a.at);
      expect(t.to).toEqual(pic.machine.points.find((p) => p.label === t.toMachinePoint)!.at);
      expect(t.badge!.x).toBeCloseTo((t.from!.x + t.to!.x) / 2, 6);
      expect(t.badge!.y).toBeCloseTo((t.from!.y + t.to!.y) / 2, 6);
    }
    expect(pic.tiedowns.map((t) => t.toMachinePoint)).toEqual(["front left", "front right", "rear left", "rear right", "blade"]);
  });

  it("ends a tiedown that names no machine point at the nearest point of the footprint", () => {
    const k = passingScene();
    const pic2 = picture({ ...k, tiedowns: k.tiedowns.map((t) => (t.label === "rear left" ? { ...t, machinePoint: null } : t)) });
    const t = pic2.tiedowns.find((x) => x.label === "rear left")!;
    const m = pic2.machine.rect;
    expect(t.toMachinePoint).toBeNull();
    // L3 sits left of the footprint and behind its rear: the nearest point is the rear left corner.
    expect(t.to).toEqual({ x: m.x, y: m.y + m.height });
  });

  it("keeps every mark, line and label inside the viewBox, and the side labels apart", () => {
    for (const kit of [passingScene(), failingScene(), passingScene()]) everything(picture(kit));
    for (const p of [picture(passingScene()), picture(failingScene())]) {
      const boxes = [...p.anchors.map((a) => a.tag.box), ...p.tiedowns.flatMap((t) => (t.tag ? [t.tag.box] : []))];
      for (const [i, a] of boxes.entries()) {
        for (const b of boxes.slice(i + 1)) {
          const overlap = a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
          expect(overlap, `labels overlap: ${JSON.stringify(a)} ${JSON.stringify(b)}`).toBe(false);
        }
      }
    }
  });

  it("chooses a label size that reads at about 13 px when the picture is 360 px wide", () => {
    const px = (pic.textMm * 360) / pic.viewBox.width;
    expect(px).toBeGreaterThanOrEqual(12.5);
  });
});

describe("deckPicture: states from the kit's verdict", () => {
  it("says counts and limited for a passing kit, naming the limiting part", () => {
    const pic = picture(passingScene());
    expect(pic.pass).toBe(true);
    expect(pic.tiedowns.map((t) => [t.label, t.state, t.countedWllLb])).toEqual([
      ["front left", "counts", 3300],
      ["front right", "counts", 3300],
      ["rear left", "counts", 3300],
      ["rear right", "counts", 3300],
      // C1 is rated 5,000 lb, below the 6,600 lb chain: 49 CFR 393.108(a), counted half.
      ["blade", "limited", 2500],
    ]);
    expect(pic.tiedowns[4]!.limitedBy).toBe("anchor point C1");
    expect(pic.tiedowns[4]!.tag!.lines).toEqual(["5 · 2,500 lb", "limited"]);
    expect(pic.anchors.map((a) => [a.label, a.state])).toEqual([
      ["L1", "in-use"],
      ["R1", "in-use"],
      ["C1", "in-use"],
      ["L2", "free"],
      ["R2", "free"],
      ["L3", "in-use"],
      ["R3", "in-use"],
    ]);
    expect(pic.anchors.some((a) => a.crossed)).toBe(false);
  });

  it("says not rated, blocked and limited for a failing kit, and crosses out the anchor point out of use", () => {
    const pic = picture(failingScene());
    expect(pic.pass).toBe(false);
    const state = (label: string) => pic.tiedowns.find((t) => t.label === label)!;
    // The fixture binder is marked 5,400 lb, below its 6,600 lb chain.
    expect(state("front left").state).toBe("limited");
    expect(state("front left").limitedBy).toMatch(/^the binder BINDR\d{3}$/);
    expect(state("front right")).toMatchObject({ state: "not-rated", countedWllLb: 0 });
    expect(state("front right").reasons.join(" ")).toContain("9/16 in is not in the 49 CFR 393.108 chain table");
    expect(state("rear left")).toMatchObject({ state: "limited", limitedBy: "anchor point L2", countedWllLb: 1500 });
    expect(state("rear right").state).toBe("blocked");
    expect(state("rear right").text).toContain("anchor point R3 may not be used");
    const r3 = pic.anchors.find((a) => a.label === "R3")!;
    expect(r3).toMatchObject({ state: "out-of-use", crossed: true });
    expect(r3.tag.lines).toEqual(["R3", "6,600 lb", "out of use"]);
    expect(r3.text).toContain("bent stake pocket");
  });

  it("blocks a tiedown for an accessory the machine no longer lists, and keeps the others matched to the engine's answer", () => {
    const k = passingScene();
    const noBlade = { ...k, machine: { ...k.machine, accessories: [] } };
    const pic = picture(noBlade);
    expect(pic.tiedowns.map((t) => t.state)).toEqual(["counts", "counts", "counts", "counts", "blocked"]);
    expect(pic.tiedowns.slice(0, 4).map((t) => t.countedWllLb)).toEqual([3300, 3300, 3300, 3300]);
  });
});

describe("deckPicture: what it assumes, it says", () => {
  it("draws a machine not placed yet against the deck front, and an unknown width at the common width", () => {
    const k = passingScene();
    const pic = picture({
      ...k,
      machineFrontFromDeckFrontMm: null,
      machine: { ...k.machine, widthMm: null },
      trailer: { ...splitTilt, deckWidthMm: null, hitchToDeckFrontMm: null },
    });
    expect(pic.machine.placed).toBe(false);
    expect(pic.machine.rect.y).toBe(pic.deck.rect.y);
    expect(pic.deck.rect.width).toBe(ASSUMED_DECK_WIDTH_MM);
    expect(pic.deck.widthAssumed).toBe(true);
    expect(pic.machine.rect.width).toBe(Math.round(ASSUMED_DECK_WIDTH_MM * 0.8));
    expect(pic.hitch).toBeNull();
    expect(pic.axle).toBeNull();
    expect(pic.notes).toEqual([
      "Split tilt 20's deck width is not recorded: drawn at 82 in (2,083 mm), a common width between the fenders (an assumption).",
      "The distance from Split tilt 20's hitch to its deck front is not measured: the tongue, hitch and axle centre are not drawn.",
      "Unit 12 mini excavator has not been placed yet: drawn against the front of the deck.",
      "Unit 12 mini excavator's width is not recorded: drawn at 80 % of the deck width.",
    ]);
    expect(pic.description).toContain("not placed yet");
    everything(pic);
  });
});

describe("KitDeck rendered on the server", () => {
  it("gives the picture an accessible name and the tiedowns in words, each linked to its card", () => {
    const kit = passingScene();
    const html = renderToStaticMarkup(createElement(KitDeck, { picture: picture(kit) }));
    expect(html).toContain('aria-labelledby="deck-title deck-desc"');
    expect(html).toContain("<title id=\"deck-title\">Unit 12 mini excavator on Split tilt 20, 2026-12-03</title>");
    expect(html).toMatch(/<desc id="deck-desc">Top-down drawing to scale of Split tilt 20&#x27;s deck with 7 anchor points, .*The check passes\.<\/desc>/);
    expect(html).toContain("Tiedowns in words");
    for (const t of kit.tiedowns) expect(html).toContain(`href="#tiedown-${t.id}"`);
    for (const a of kit.trailer.anchorPoints) expect(html).toContain(`href="#anchor-${a.id}"`);
    expect(html).toContain("Limited: anchor point C1 sets its WLL.");
    expect(html).not.toContain('data-cross="true"');
  });

  it("crosses out the anchor point out of use, and says each state in words beside its colour and line style", () => {
    const html = renderToStaticMarkup(createElement(KitDeck, { picture: picture(failingScene()) }));
    // One cross, inside the link to R3.
    expect(html.match(/data-cross="true"/g)).toHaveLength(1);
    expect(html).toMatch(/<a href="#anchor-r3" aria-label="R3 6,600 lb out of use: Anchor point R3[^"]*"[^>]*data-state="out-of-use"[^>]*>.*?data-cross="true"/);
    for (const words of ["not rated", "blocked", "limited"]) expect(html).toMatch(new RegExp(`> ?${words}</tspan>`));
    expect(html).toContain("dotted line");
    expect(html).toContain("dash-dot line");
    expect(html).toContain("The check does not pass");
  });
});
