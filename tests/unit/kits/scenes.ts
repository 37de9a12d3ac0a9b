import type { AnchorPoint, Kit, KitItem, Machine, Trailer } from "@/lib/kits/model";
import { anchor, binder, chain, tiedown } from "./fixtures";

// Invented scenes for the deck picture and the placement figures: a mini excavator with a
// blade on a split tilt deck, once with a kit that passes and once with one that does not.

const taggedOut = (message: string) => ({ ok: false, reasons: [{ code: "TAGGED_OUT" as const, message }] });

export const excavatorWithBlade: Machine = {
  id: "m-kx",
  name: "Unit 12 mini excavator",
  machineClass: "mini-excavator",
  weightLb: 8100,
  lengthMm: 4900,
  widthMm: 1750,
  heightMm: 2500,
  articulated: false,
  accessories: ["blade"],
  tiedownPoints: [
    { label: "front left", side: "left", positionMm: 250 },
    { label: "front right", side: "right", positionMm: 250 },
    { label: "blade", side: "centre", positionMm: 60 },
    { label: "rear left", side: "left", positionMm: 4650 },
    { label: "rear right", side: "right", positionMm: 4650 },
  ],
  cgFromFrontMm: 2200,
};

export const splitTilt: Trailer = {
  id: "t-split",
  name: "Split tilt 20",
  trailerType: "split-tilt-deck",
  coupling: "pintle",
  deckLengthMm: 6100,
  tiltLengthMm: 4900,
  deckWidthMm: 2083,
  gvwrLb: 14000,
  emptyWeightLb: 3900,
  emptyTongueWeightLb: 450,
  hitchToAxleMm: 5000,
  hitchToDeckFrontMm: 1400,
  anchorPoints: [
    anchor("l1", { label: "L1", side: "left", positionMm: 150 }),
    anchor("r1", { label: "R1", side: "right", positionMm: 150 }),
    anchor("c1", { label: "C1", side: "centre", positionMm: 300, wllLb: 5000 }),
    anchor("l2", { label: "L2", side: "left", positionMm: 3000 }),
    anchor("r2", { label: "R2", side: "right", positionMm: 3000 }),
    anchor("l3", { label: "L3", side: "left", positionMm: 5950 }),
    anchor("r3", { label: "R3", side: "right", positionMm: 5950 }),
  ],
};

/** A ratchet binder rated like the 3/8 in grade 70 chain it takes, so that the chain sets the tiedown's WLL. */
const fullBinder = () => binder({ description: "Ratchet binder, for 3/8–1/2 in chain", markedWllLb: 6600, wllLb: 6600, details: { mechanism: "ratchet", chainSizeRange: ["3/8", "1/2"] } });

/** Unit 12 on Split tilt 20, front 600 mm back: four corners on 3/8 in grade 70 with binders, and the blade chained to C1. */
export function passingScene(): Kit {
  return {
    id: "k-pass",
    date: "2026-12-03",
    job: "Hollins driveway",
    site: "14 Quarry Lane",
    state: "draft",
    machine: excavatorWithBlade,
    trailer: splitTilt,
    articulationRestrained: false,
    machineFrontFromDeckFrontMm: 600,
    tiedowns: [
      tiedown("front left", "l1", [chain(), fullBinder()], { id: "td-fl" }),
      tiedown("front right", "r1", [chain(), fullBinder()], { id: "td-fr" }),
      tiedown("rear left", "l3", [chain(), fullBinder()], { id: "td-rl" }),
      tiedown("rear right", "r3", [chain(), fullBinder()], { id: "td-rr" }),
      tiedown("blade", "c1", [chain(), fullBinder()], { id: "td-bl", secures: "blade", machinePoint: "blade" }),
    ],
  };
}

/** R3 bent and tagged out but still used, a weak anchor L2, and a chain whose size is not in the 393.108 table. */
export function failingScene(): Kit {
  const bent: AnchorPoint = anchor("r3", { label: "R3", side: "right", positionMm: 5950, status: "tagged_out", usable: taggedOut("Tagged out: bent stake pocket, found 2026-11-28.") });
  const weak: AnchorPoint = anchor("l2", { label: "L2", side: "left", positionMm: 3000, wllLb: 3000 });
  const oddChain: KitItem = chain({ id: "chain-odd", tagCode: "CHAINODD", description: "Chain, 9/16 in, grade mark worn off", gradeMarked: false, grade: null, size: "9/16" });
  const trailer = { ...splitTilt, anchorPoints: splitTilt.anchorPoints.map((a) => (a.id === "r3" ? bent : a.id === "l2" ? weak : a)) };
  return {
    ...passingScene(),
    id: "k-fail",
    machine: { ...excavatorWithBlade, weightLb: 12500, name: "Unit 15 excavator" },
    trailer,
    machineFrontFromDeckFrontMm: 400,
    tiedowns: [
      tiedown("front left", "l1", [chain(), binder()], { id: "td-fl" }),
      tiedown("front right", "r1", [oddChain, binder()], { id: "td-fr" }),
      tiedown("rear left", "l2", [chain(), binder()], { id: "td-rl" }),
      tiedown("rear right", "r3", [chain(), binder()], { id: "td-rr" }),
    ],
  };
}
