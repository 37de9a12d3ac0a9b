import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addMember, Client, newOrganisation } from "../support/http";
import { testDb } from "../support/db";
import { anchorId, day, makeBinder, makeChain, makeKit, makeMachine, makeTrailer } from "../support/fleet";

// Where the machine sits, against the real app and database: the trailer's hitch-to-deck-front
// distance, PUT /api/v1/kits/{id}/placement, the kit's placement and verdict, what a
// placement fail does to "ready", the audit row, bad input, roles and another organisation.

let owner: Client;
let planner: Client;
let hand: Client;
let outsider: Client;
let machine: any;
let trailer: any;

const put = (client: Client, kitId: string, body: unknown) => client.request("PUT", `/api/v1/kits/${kitId}/placement`, body);
const at = (value: number, unit = "mm") => ({ machineFrontFromDeckFront: { value, unit } });

beforeAll(async () => {
  const org = await newOrganisation("Placement Co");
  owner = org.owner;
  planner = (await addMember(owner, "planner")).client;
  hand = (await addMember(owner, "yard_hand")).client;
  outsider = (await newOrganisation("Elsewhere Co")).owner;
  // The support machine: 12,000 lb, 19 ft (5,791 mm), centre of gravity not recorded (the middle).
  machine = await makeMachine(planner);
  // The support trailer: 5,000 lb empty, 600 lb empty tongue weight, GVWR 22,000 lb, 22 ft (6,706 mm) hitch to axle; the deck starts 1.5 m behind the hitch.
  trailer = await makeTrailer(planner, { hitchToDeckFront: { value: 1.5, unit: "m" } });
}, 60_000);

afterAll(() => testDb.destroy());

async function passingKit(date: string, over: { trailerId?: string } = {}) {
  const kit = await makeKit(planner, { date, machineId: machine.id, trailerId: over.trailerId ?? trailer.id });
  const t = over.trailerId ? (await planner.get(`/api/v1/trailers/${over.trailerId}`)).json : trailer;
  for (const [label, anchor] of [["front left", "FL"], ["front right", "FR"], ["rear left", "RL"], ["rear right", "RR"]]) {
    const res = await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { label, anchorPointId: anchorId(t, anchor!), attachment: "direct", machinePoint: label, itemIds: [(await makeChain(planner)).id, (await makeBinder(planner)).id] });
    expect(res.status, res.text).toBe(201);
  }
  return kit;
}

describe("the trailer's hitch-to-deck-front distance", () => {
  it("is taken in any length unit, answered in mm, and sent back unchanged by a PUT", async () => {
    expect(trailer.hitchToDeckFront).toEqual({ value: 1500, unit: "mm" });
    const { id, typeLabel: _t, tiltLength: _l, anchorPoints, ...rest } = trailer;
    const body = { ...rest, hitchToDeckFront: { value: 60, unit: "in" }, anchorPoints: anchorPoints.map((a: any) => ({ id: a.id, label: a.label, side: a.side, position: a.position, wll: a.wll })) };
    const res = await planner.request("PUT", `/api/v1/trailers/${id}`, body);
    expect(res.status, res.text).toBe(200);
    expect(res.json.hitchToDeckFront).toEqual({ value: 1524, unit: "mm" });
    const back = await planner.request("PUT", `/api/v1/trailers/${id}`, { ...body, hitchToDeckFront: { value: 1500, unit: "mm" } });
    expect(back.json.hitchToDeckFront).toEqual({ value: 1500, unit: "mm" });
    const bad = await planner.request("PUT", `/api/v1/trailers/${id}`, { ...body, hitchToDeckFront: { value: -2, unit: "ft" } });
    expect(bad.status).toBe(400);
    expect(bad.json.issues.map((i: any) => i.path)).toContain("hitchToDeckFront.value");
  });
});

describe("PUT /api/v1/kits/{id}/placement", () => {
  it("saves where the machine sits, and the kit answers the tongue weight worked out by hand", async () => {
    const kit = await makeKit(planner, { date: day(30), machineId: machine.id, trailerId: trailer.id });
    expect(kit.placement).toBeNull();
    expect(kit.placementMissing).toEqual(["The machine has not been placed on the deck yet."]);

    const res = await put(planner, kit.id, at(1, "ft"));
    expect(res.status, res.text).toBe(200);
    expect(res.json.machineFrontFromDeckFront).toEqual({ value: 305, unit: "mm" });
    // By hand: a = 6,706 mm; x = 1,500 + 305 + 5,791 / 2 = 4,700.5 mm from the hitch.
    // T = 600 + 12,000 × (6,706 − 4,700.5) / 6,706 = 600 + 3,588.7 = 4,189 lb (rounded);
    // G = 5,000 + 12,000 = 17,000 lb; share 4,188.7 / 17,000 = 24.64 %;
    // axle group = (5,000 − 600) + 12,000 × 4,700.5 / 6,706 = 4,400 + 8,411.3 = 12,811 lb.
    const p = res.json.placement;
    expect(p.tongueWeightLb).toBe(4189);
    expect(p.tongueWeightShare).toBeCloseTo(0.2464, 4);
    expect(p.trailerGrossLb).toBe(17000);
    expect(p.axleLoadLb).toBe(12811);
    expect(p.tongueWeightLb + p.axleLoadLb).toBe(p.trailerGrossLb);
    expect(p.gvwrLb).toBe(22000);
    // A pintle hitch (a tilt deck's usual coupling): the bumper-pull band, 10–15 %, as common practice.
    expect(p.band).toMatchObject({ min: 0.1, max: 0.15, commonPractice: true });
    expect(p.band.source).toContain("Common practice");
    expect(p.findings.map((f: any) => [f.code, f.severity])).toEqual([
      ["TONGUE_SHARE_ABOVE_BAND", "warn"],
      ["CG_ASSUMED_MIDDLE", "info"],
      ["SIXTY_FORTY", "info"],
    ]);
    // A band warning does not stop the kit: an empty kit fails on its tiedowns alone.
    expect(res.json.check.findings.map((f: any) => f.code)).toContain("TOO_FEW_TIEDOWNS");

    const audit = await testDb("audit_log").where({ entity: "kit", entity_id: kit.id, action: "kit.placed" }).first("before", "after");
    expect(audit.before).toEqual({ machineFrontFromDeckFrontMm: null });
    expect(audit.after).toEqual({ machineFrontFromDeckFrontMm: 305 });
    expect((await planner.get(`/api/v1/kits/${kit.id}`)).json.placement.tongueWeightLb).toBe(4189);

    // null takes the placement away again.
    const cleared = await put(planner, kit.id, { machineFrontFromDeckFront: null });
    expect(cleared.status).toBe(200);
    expect(cleared.json.placement).toBeNull();
  });

  it("answers bad input with 400 and the field at fault, and keeps what was saved", async () => {
    const kit = await makeKit(planner, { date: day(31), machineId: machine.id, trailerId: trailer.id });
    expect((await put(planner, kit.id, at(600))).status).toBe(200);
    const cases: [unknown, string][] = [
      [{}, "machineFrontFromDeckFront"],
      [at(-1, "m"), "machineFrontFromDeckFront.value"],
      [at(2, "yd"), "machineFrontFromDeckFront.unit"],
      [{ machineFrontFromDeckFront: { value: "far", unit: "m" } }, "machineFrontFromDeckFront.value"],
      [{ ...at(1), extra: true }, ""],
      // Behind the rear of the 20 ft deck.
      [at(21, "ft"), "machineFrontFromDeckFront"],
    ];
    for (const [body, path] of cases) {
      const res = await put(planner, kit.id, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.json.issues.length, JSON.stringify(body)).toBeGreaterThan(0);
      if (path) expect(res.json.issues.map((i: any) => i.path), JSON.stringify(body)).toContain(path);
    }
    expect((await planner.get(`/api/v1/kits/${kit.id}`)).json.machineFrontFromDeckFront).toEqual({ value: 600, unit: "mm" });
  });

  it("places only a draft: a ready kit goes back to draft to be moved", async () => {
    const kit = await passingKit(day(32));
    expect((await put(planner, kit.id, at(300))).status).toBe(200);
    const ready = await planner.post(`/api/v1/kits/${kit.id}/transitions`, { to: "ready" });
    expect(ready.status, ready.text).toBe(200);
    const moved = await put(planner, kit.id, at(100));
    expect(moved.status).toBe(409);
    expect(moved.json.code).toBe("KIT_NOT_DRAFT");
    expect((await planner.get(`/api/v1/kits/${kit.id}`)).json.machineFrontFromDeckFront.value).toBe(300);
  });

  it("lets planners and owners place, not yard hands; another organisation's kit is not found", async () => {
    const kit = await makeKit(planner, { date: day(33), machineId: machine.id, trailerId: trailer.id });
    expect((await put(owner, kit.id, at(100))).status).toBe(200);
    const refused = await put(hand, kit.id, at(200));
    expect(refused.status).toBe(403);
    expect((await put(outsider, kit.id, at(200))).status).toBe(404);
    expect((await outsider.get(`/api/v1/kits/${kit.id}`)).status).toBe(404);
    expect((await put(planner, "not-a-kit", at(200))).status).toBe(404);
    expect((await planner.get(`/api/v1/kits/${kit.id}`)).json.machineFrontFromDeckFront.value).toBe(100);
  });

  it("keeps the placement when the kit is copied", async () => {
    const kit = await makeKit(planner, { date: day(34), machineId: machine.id, trailerId: trailer.id });
    await put(planner, kit.id, at(450));
    const copy = await planner.post(`/api/v1/kits/${kit.id}/copies`, { date: day(35) });
    expect(copy.status, copy.text).toBe(201);
    expect(copy.json.kit.machineFrontFromDeckFront).toEqual({ value: 450, unit: "mm" });
    expect(copy.json.kit.placement.tongueWeightLb).toBe((await planner.get(`/api/v1/kits/${kit.id}`)).json.placement.tongueWeightLb);
  });
});

describe("a placement that fails", () => {
  it("over the GVWR: the kit does not pass and cannot be marked ready", async () => {
    // The same deck rated 16,000 lb: 5,000 + 12,000 = 17,000 lb loaded, 1,000 lb over.
    const light = await makeTrailer(planner, { gvwr: { value: 16000, unit: "lb" }, hitchToDeckFront: { value: 1500, unit: "mm" } });
    const kit = await passingKit(day(36), { trailerId: light.id });
    expect((await planner.get(`/api/v1/kits/${kit.id}`)).json.pass).toBe(true); // not placed: nothing to fail yet
    const placed = await put(planner, kit.id, at(300));
    expect(placed.json.check.pass).toBe(true);
    expect(placed.json.pass).toBe(false);
    expect(placed.json.placement.findings[0]).toMatchObject({ code: "OVER_GVWR", severity: "fail" });
    expect(placed.json.placement.findings[0].message).toContain("1,000 lb over its GVWR of 16,000 lb");
    const ready = await planner.post(`/api/v1/kits/${kit.id}/transitions`, { to: "ready" });
    expect(ready.status).toBe(409);
    expect(ready.json.code).toBe("KIT_DOES_NOT_PASS");
    expect(ready.json.placementFindings.map((f: any) => f.code)).toEqual(["OVER_GVWR"]);
    expect((await testDb("kits").where({ id: kit.id }).first("state")).state).toBe("draft");
    const list = await planner.get(`/api/v1/kits?from=${day(36)}&to=${day(36)}`);
    expect(list.json.data.find((k: any) => k.id === kit.id)).toMatchObject({ pass: false, placementFailCount: 1, failCount: 0, blockerCount: 0 });
  });

  it("a machine behind the axle: a negative tongue weight fails the kit (the trailer will lift the hitch)", async () => {
    // Axle 2 m behind the hitch, deck from the hitch point: the machine's middle (2,895.5 mm) is behind it.
    // T = 600 + 12,000 × (2,000 − 2,895.5) / 2,000 = 600 − 5,373 = −4,773 lb.
    const short = await makeTrailer(planner, { hitchToAxle: { value: 2, unit: "m" }, hitchToDeckFront: { value: 0, unit: "mm" } });
    const kit = await passingKit(day(37), { trailerId: short.id });
    const placed = await put(planner, kit.id, at(0));
    expect(placed.json.placement.tongueWeightLb).toBe(-4773);
    expect(placed.json.placement.findings[0].code).toBe("TONGUE_WEIGHT_NEGATIVE");
    expect(placed.json.placement.findings[0].message).toContain("the trailer will lift the hitch");
    expect(placed.json.pass).toBe(false);
    expect((await planner.post(`/api/v1/kits/${kit.id}/transitions`, { to: "ready" })).json.code).toBe("KIT_DOES_NOT_PASS");
  });

  it("is null, with the reason, when the trailer's hitch-to-deck-front distance is not measured", async () => {
    const unmeasured = await makeTrailer(planner);
    const kit = await makeKit(planner, { date: day(38), machineId: machine.id, trailerId: unmeasured.id });
    const placed = await put(planner, kit.id, at(300));
    expect(placed.status).toBe(200);
    expect(placed.json.machineFrontFromDeckFront.value).toBe(300);
    expect(placed.json.placement).toBeNull();
    expect(placed.json.placementMissing).toEqual([`The distance from ${unmeasured.name}'s hitch point to the front of its deck has not been measured.`]);
  });
});
