import { describe, expect, it } from "vitest";
import { zodIssues } from "@/lib/http/errors";
import { kitListQuerySchema, machineInputSchema, tiedownInputSchema, trailerInputSchema, transitionSchema } from "@/lib/kits/schemas";

const machine = {
  name: "Unit 12",
  class: "mini-excavator",
  weight: { value: 3674, unit: "kg" },
  length: { value: 4.9, unit: "m" },
  accessories: ["bucket", "blade"],
  tiedownPoints: [{ label: "front left", side: "left", position: { value: 12, unit: "in" } }],
};

const trailer = {
  name: "Deck 20",
  type: "tilt-deck",
  deckLength: { value: 20, unit: "ft" },
  gvwr: { value: 14000, unit: "lb" },
  emptyWeight: { value: 3600, unit: "lb" },
  emptyTongueWeight: { value: 450, unit: "lb" },
  hitchToAxle: { value: 21, unit: "ft" },
  anchorPoints: [{ label: "L1", side: "left", position: { value: 0.2, unit: "m" }, wll: { value: 6600, unit: "lb" } }],
};

const paths = (r: { success: boolean; error?: { issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }> } }) => zodIssues(r.error!).map((i) => i.path);

describe("machineInputSchema", () => {
  it("stores whole pounds and millimetres", () => {
    expect(machineInputSchema.parse(machine)).toEqual({
      name: "Unit 12",
      machineClass: "mini-excavator",
      weightLb: 8100,
      lengthMm: 4900,
      widthMm: null,
      heightMm: null,
      articulated: false,
      accessories: ["bucket", "blade"],
      tiedownPoints: [{ label: "front left", side: "left", positionMm: 305 }],
      cgFromFrontMm: null,
    });
  });

  it("refuses what the securement engine would: more than 10 accessories, \"machine\", a name twice, a long name", () => {
    expect(paths(machineInputSchema.safeParse({ ...machine, accessories: Array.from({ length: 11 }, (_, i) => `part ${i}`) }))).toEqual(["accessories"]);
    expect(paths(machineInputSchema.safeParse({ ...machine, accessories: ["Machine", "bucket", "Bucket"] }))).toEqual(["accessories.0", "accessories.2"]);
    expect(paths(machineInputSchema.safeParse({ ...machine, accessories: ["x".repeat(41)] }))).toEqual(["accessories.0"]);
  });

  it("keeps points and the centre of gravity within the machine", () => {
    const r = machineInputSchema.safeParse({ ...machine, tiedownPoints: [{ label: "tail", side: "centre", position: { value: 5, unit: "m" } }], cgFromFront: { value: 6, unit: "m" } });
    expect(paths(r)).toEqual(["tiedownPoints.0.position", "cgFromFront"]);
  });

  it("refuses unknown fields by name", () => {
    expect(paths(machineInputSchema.safeParse({ ...machine, wieght: 1 }))).toEqual(["wieght"]);
  });
});

describe("trailerInputSchema", () => {
  it("defaults the coupling from the type and a tilt deck's tilting part to the whole deck", () => {
    const t = trailerInputSchema.parse(trailer);
    expect(t).toMatchObject({ trailerType: "tilt-deck", coupling: "pintle", deckLengthMm: 6096, tiltLengthMm: 6096, hitchToDeckFrontMm: null });
    expect(t.anchorPoints).toEqual([{ id: null, label: "L1", side: "left", positionMm: 200, wllLb: 6600, nextInspectionDue: null }]);
    expect(trailerInputSchema.parse({ ...trailer, type: "gooseneck" })).toMatchObject({ coupling: "gooseneck", tiltLengthMm: 0 });
  });

  it("asks a split tilt deck for its tilting part, and checks the weights against each other", () => {
    expect(paths(trailerInputSchema.safeParse({ ...trailer, type: "split-tilt-deck" }))).toEqual(["tiltLength"]);
    expect(paths(trailerInputSchema.safeParse({ ...trailer, emptyWeight: { value: 15000, unit: "lb" } }))).toEqual(["emptyWeight"]);
    expect(paths(trailerInputSchema.safeParse({ ...trailer, emptyTongueWeight: { value: 4000, unit: "lb" } }))).toEqual(["emptyTongueWeight"]);
  });

  it("names the anchor point at fault", () => {
    const a = trailer.anchorPoints[0]!;
    const r = trailerInputSchema.safeParse({ ...trailer, anchorPoints: [a, { ...a, label: "l1" }, { ...a, label: "R9", position: { value: 30, unit: "ft" } }] });
    expect(paths(r)).toEqual(["anchorPoints.1.label", "anchorPoints.2.position"]);
    expect(paths(trailerInputSchema.safeParse({ ...trailer, anchorPoints: [a, { ...a, label: "R1", wll: { value: 6600, unit: "N" } }] }))).toEqual(["anchorPoints.1.wll.unit"]);
  });
});

describe("tiedownInputSchema", () => {
  it("holds the machine unless told otherwise, and refuses an item twice", () => {
    const id = "6f1c2a8e-1b2c-4d3e-8f9a-0b1c2d3e4f5a";
    expect(tiedownInputSchema.parse({ anchorPointId: id, attachment: "direct" })).toMatchObject({ secures: "machine", itemIds: [] });
    expect(paths(tiedownInputSchema.safeParse({ anchorPointId: id, attachment: "direct", itemIds: [id, id] }))).toEqual(["itemIds"]);
  });
});

describe("transitionSchema", () => {
  const id = "6f1c2a8e-1b2c-4d3e-8f9a-0b1c2d3e4f5a";
  it("asks for the scan when loading or returning", () => {
    expect(paths(transitionSchema.safeParse({ to: "loaded" }))).toEqual(["scannedItemIds"]);
    expect(transitionSchema.parse({ to: "ready" })).toEqual({ to: "ready", damaged: [], lost: [] });
  });
  it("takes damage and losses only on return, an item as one or the other", () => {
    expect(paths(transitionSchema.safeParse({ to: "loaded", scannedItemIds: [], damaged: [{ itemId: id, note: "bent hook" }] }))).toEqual(["damaged"]);
    expect(paths(transitionSchema.safeParse({ to: "returned", scannedItemIds: [], damaged: [{ itemId: id, note: "bent" }], lost: [{ itemId: id, note: "gone" }] }))).toEqual(["lost.0.itemId"]);
    expect(paths(transitionSchema.safeParse({ to: "returned", scannedItemIds: [], damaged: [{ itemId: id, note: "" }] }))).toEqual(["damaged.0.note"]);
  });
});

describe("kitListQuerySchema", () => {
  it("refuses a window that ends before it starts", () => {
    expect(paths(kitListQuerySchema.safeParse({ from: "2026-12-10", to: "2026-12-01" }))).toEqual(["to"]);
    expect(paths(kitListQuerySchema.safeParse({ from: "2026-12-01", to: "2027-06-01" }))).toEqual(["to"]);
    expect(paths(kitListQuerySchema.safeParse({ from: "tomorrow" }))).toEqual(["from"]);
  });
});
