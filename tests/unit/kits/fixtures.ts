import type { AnchorPoint, Kit, KitItem, KitTiedown, Machine, Trailer } from "@/lib/kits/model";

// Invented machines, trailers and gear for the kit tests: figures in the range of real
// compact equipment, names made up.

const usable = { ok: true, reasons: [] };

export const excavator: Machine = {
  id: "m-ex",
  name: "Unit 8 excavator",
  machineClass: "mini-excavator",
  weightLb: 12000,
  lengthMm: 5791, // 19 ft
  widthMm: 2000,
  heightMm: 2600,
  articulated: false,
  accessories: [],
  tiedownPoints: [
    { label: "front left", side: "left", positionMm: 300 },
    { label: "front right", side: "right", positionMm: 300 },
    { label: "rear left", side: "left", positionMm: 5400 },
    { label: "rear right", side: "right", positionMm: 5400 },
  ],
  cgFromFrontMm: null,
};

export function anchor(id: string, over: Partial<AnchorPoint> = {}): AnchorPoint {
  return { id, label: id.toUpperCase(), side: "left", positionMm: 1000, wllLb: 6600, status: "in_service", nextInspectionDue: null, usable, ...over };
}

export const trailer: Trailer = {
  id: "t-1",
  name: "Deck 20",
  trailerType: "tilt-deck",
  coupling: "pintle",
  deckLengthMm: 6100,
  tiltLengthMm: 6100,
  deckWidthMm: 2080,
  gvwrLb: 22000,
  emptyWeightLb: 5000,
  emptyTongueWeightLb: 600,
  hitchToAxleMm: 6700,
  hitchToDeckFrontMm: 1500,
  anchorPoints: [
    anchor("fl", { side: "left", positionMm: 200 }),
    anchor("fr", { side: "right", positionMm: 200 }),
    anchor("rl", { side: "left", positionMm: 5900 }),
    anchor("rr", { side: "right", positionMm: 5900 }),
    anchor("c1", { side: "centre", positionMm: 3000, wllLb: 4000 }),
  ],
};

let next = 0;
export function chain(over: Partial<KitItem> = {}): KitItem {
  next++;
  return {
    id: `chain-${next}`,
    tagCode: `CHAIN${String(next).padStart(3, "0")}`,
    kind: "chain",
    description: "Chain, grade 70, 3/8 in",
    grade: 70,
    gradeMarked: true,
    size: "3/8",
    markedWllLb: null,
    wllLb: 6600,
    details: {},
    usable,
    ...over,
  };
}

export function binder(over: Partial<KitItem> = {}): KitItem {
  next++;
  return {
    id: `binder-${next}`,
    tagCode: `BINDR${String(next).padStart(3, "0")}`,
    kind: "binder",
    description: "Ratchet binder, for 5/16–3/8 in chain",
    grade: null,
    gradeMarked: true,
    size: "3/8",
    markedWllLb: 5400,
    wllLb: 5400,
    details: { mechanism: "ratchet", chainSizeRange: ["5/16", "3/8"] },
    usable,
    ...over,
  };
}

export function tiedown(label: string, anchorPointId: string, items: KitItem[], over: Partial<KitTiedown> = {}): KitTiedown {
  return { id: `td-${label}`, label, anchorPointId, attachment: "direct", secures: "machine", machinePoint: label, items, ...over };
}

export function kit(over: Partial<Kit> = {}): Kit {
  return {
    id: "k-1",
    date: "2026-12-03",
    job: "Hollins driveway",
    site: "Quarry Lane",
    state: "draft",
    machine: excavator,
    trailer,
    articulationRestrained: false,
    machineFrontFromDeckFrontMm: null,
    tiedowns: [
      tiedown("front left", "fl", [chain(), binder()]),
      tiedown("front right", "fr", [chain(), binder()]),
      tiedown("rear left", "rl", [chain(), binder()]),
      tiedown("rear right", "rr", [chain(), binder()]),
    ],
    ...over,
  };
}
