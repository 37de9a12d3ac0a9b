import { describe, expect, it } from "vitest";
import { checkSecurement } from "@/lib/securement";
import { kitFromJson, kitJson, kitListEntry, machineJson, trailerJson } from "@/lib/kits/answers";
import type { TiedownRecord } from "@/db/kits";
import { toKit } from "@/lib/kits/assemble";
import { kitCheckRequest } from "@/lib/kits/plan";
import { excavator, kit, tiedown, chain, binder, trailer } from "./fixtures";

describe("kitJson", () => {
  it("answers the engine's check unchanged, each tiedown's line of it, and pass = check and no blocker", () => {
    const k = kit();
    const json = kitJson(k);
    expect(json.check).toEqual(checkSecurement(kitCheckRequest(k)));
    expect(json.tiedowns.map((t) => t.result?.label)).toEqual(["front left", "front right", "rear left", "rear right"]);
    expect(json.pass).toBe(true);
    const blocked = kit({ tiedowns: [...k.tiedowns.slice(0, 3), tiedown("rear right", "rr", [chain({ usable: { ok: false, reasons: [{ code: "LOST", message: "Lost" }] } }), binder()])] });
    const b = kitJson(blocked);
    expect(b.check.pass).toBe(true);
    expect(b.pass).toBe(false);
    expect(kitListEntry(blocked)).toMatchObject({ pass: false, blockerCount: 1, failCount: 0, tiedownCount: 4, itemCount: 8 });
  });

  it("gives a tiedown left out of the check no result line, and keeps the others in step", () => {
    const k = kit({ tiedowns: [tiedown("bucket", "c1", [chain()], { secures: "bucket" }), ...kit().tiedowns] });
    const json = kitJson(k);
    expect(json.tiedowns[0]!.result).toBeNull();
    expect(json.tiedowns[1]!.result?.label).toBe("front left");
  });
});

describe("kitFromJson", () => {
  it("gives back the model the answer was made from, through JSON as the browser gets it", () => {
    const inspected = { ...trailer, anchorPoints: trailer.anchorPoints.map((a) => ({ ...a, lastInspectedOn: "2026-06-01" })) };
    const k = kit({ machineFrontFromDeckFrontMm: 450, machine: { ...excavator, accessories: ["bucket"], cgFromFrontMm: 2100 }, trailer: inspected });
    const back = kitFromJson(JSON.parse(JSON.stringify(kitJson(k))));
    expect(back).toEqual(JSON.parse(JSON.stringify(k)));
    expect(kitJson(back)).toEqual(kitJson(k));
  });
});

describe("machine and trailer answers", () => {
  it("give stored figures in lb and mm, which a PUT takes back unchanged", () => {
    const m = machineJson(excavator);
    expect(m).toMatchObject({ weight: { value: 12000, unit: "lb" }, length: { value: 5791, unit: "mm" }, cgFromFront: null, cgAssumed: true, classLabel: "Mini excavator" });
    expect(m.tiedownPoints[0]).toEqual({ label: "front left", side: "left", position: { value: 300, unit: "mm" } });
    const t = trailerJson(trailer);
    expect(t.anchorPoints[0]).toMatchObject({ id: "fl", wll: { value: 6600, unit: "lb" }, statusLabel: "In use", usable: { ok: true, reasons: [] } });
  });
});

describe("toKit", () => {
  it("judges every item and anchor point for the kit's date, and keeps a retired point only when the kit uses it", () => {
    const stored = {
      id: "k",
      date: "2026-12-03",
      job: "Job",
      site: null,
      state: "draft" as const,
      machineId: "m",
      trailerId: "t",
      articulationRestrained: false,
      machineFrontFromDeckFrontMm: null,
    };
    const anchors = [
      { id: "a1", trailerId: "t", label: "A1", side: "left" as const, positionMm: 100, wllLb: 5000, status: "in_service" as const, nextInspectionDue: "2026-12-02", lastInspectedOn: null },
      { id: "a2", trailerId: "t", label: "A2", side: "right" as const, positionMm: 100, wllLb: 5000, status: "retired" as const, nextInspectionDue: null, lastInspectedOn: null },
      { id: "a3", trailerId: "t", label: "A3", side: "right" as const, positionMm: 900, wllLb: 5000, status: "retired" as const, nextInspectionDue: null, lastInspectedOn: null },
    ];
    const item = { id: "i", tagCode: "AAAA-CCCC", kind: "chain", grade: 70, gradeMarked: true, size: "3/8", markedWllLb: null, wllLb: 6600, status: "in_service" as const, nextInspectionDue: "2026-12-03", details: {} };
    const tiedowns: TiedownRecord[] = [{ id: "td", kitId: "k", label: "x", anchorPointId: "a2", attachment: "direct", secures: "machine", machinePoint: null, items: [item] }];
    const { id: _m, ...machine } = { ...excavator, accessories: [...excavator.accessories], tiedownPoints: [...excavator.tiedownPoints] };
    const { id: _t, anchorPoints: _a, ...t } = trailer;
    const k = toKit(stored, { id: "m", ...machine }, { id: "t", ...t }, anchors, tiedowns);
    expect(k.trailer.anchorPoints.map((a) => [a.id, a.usable.ok])).toEqual([
      ["a1", false], // inspection due the day before the kit
      ["a2", false], // retired, but this kit uses it
    ]);
    expect(k.tiedowns[0]!.items[0]!.usable.ok).toBe(true); // due on the kit's date: still usable that day
    expect(k.tiedowns[0]!.items[0]!.description).toBe("Chain, grade 70, 3/8 in");
  });
});
