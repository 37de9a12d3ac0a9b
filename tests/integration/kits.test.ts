import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { checkSecurement, type SecurementCheckRequest } from "@/lib/securement";
import { addMember, Client, latestMailTo, newOrganisation } from "../support/http";
import { countRows, testDb } from "../support/db";
import { anchorId, day, machineBody, makeBinder, makeChain, makeKit, makeMachine, makeTrailer } from "../support/fleet";

// The kit builder against the real database and app: the kit's check is the engine's own
// answer, availability is enforced by the database (the race included), the life of a kit
// by role, the history it writes, and another organisation's ids.

let owner: Client;
let planner: Client;
let planner2: Client;
let hand: Client;
let organisationId: string;
let ownerEmail: string;
let machine: any;
let trailer: any;

beforeAll(async () => {
  const org = await newOrganisation("Kit Builders");
  owner = org.owner;
  organisationId = org.organisationId;
  ownerEmail = org.email;
  planner = (await addMember(owner, "planner")).client;
  planner2 = (await addMember(owner, "planner")).client;
  hand = (await addMember(owner, "yard_hand")).client;
  machine = await makeMachine(planner);
  trailer = await makeTrailer(planner);
}, 60_000);

afterAll(() => testDb.destroy());

const corners = [
  ["front left", "FL"],
  ["front right", "FR"],
  ["rear left", "RL"],
  ["rear right", "RR"],
] as const;

/** A kit with four direct corner tiedowns of a 3/8 in grade 70 chain and a 5,400 lb binder. */
async function fullKit(date: string, client = planner) {
  const kit = await makeKit(client, { date, machineId: machine.id, trailerId: trailer.id });
  const parts: { chain: any; binder: any }[] = [];
  let answer = kit;
  for (const [label, anchor] of corners) {
    const chain = await makeChain(client);
    const binder = await makeBinder(client);
    parts.push({ chain, binder });
    const res = await client.post(`/api/v1/kits/${kit.id}/tiedowns`, { label, anchorPointId: anchorId(trailer, anchor), attachment: "direct", secures: "machine", machinePoint: label, itemIds: [chain.id, binder.id] });
    expect(res.status, res.text).toBe(201);
    answer = res.json;
  }
  return { kit: answer, parts };
}

async function setItem(id: string, patch: Record<string, unknown>) {
  await testDb("items").where({ id }).update(patch);
}

describe("the kit's check", () => {
  it("is exactly the engine's answer for the same plan written by hand", async () => {
    const { kit, parts } = await fullKit(day(20));
    const handWritten: SecurementCheckRequest = {
      cargo: { kind: "machine", weight: { value: 12000, unit: "lb" }, length: { value: 5791, unit: "mm" }, articulated: false, accessories: [] },
      tiedowns: corners.map(([label, anchor], i) => ({
        label,
        attachment: "direct" as const,
        secures: "machine",
        components: [
          { type: "chain" as const, grade: 70, size: "3/8", wll: undefined, marked: true, label: parts[i]!.chain.tagCode, gearId: parts[i]!.chain.id },
          { type: "binder" as const, wll: { value: 5400, unit: "lb" as const }, chainSizeRange: ["5/16", "3/8"] as [string, string], label: parts[i]!.binder.tagCode, gearId: parts[i]!.binder.id },
          { type: "anchor" as const, wll: { value: 6600, unit: "lb" as const }, label: `anchor point ${anchor}`, gearId: anchorId(trailer, anchor) },
        ],
      })),
    };
    expect(kit.check).toEqual(JSON.parse(JSON.stringify(checkSecurement(handWritten))));
    // The figures a planner would check on paper: 4 × ½ × 5,400 lb against ½ × 12,000 lb.
    expect(kit.check.aggregateWllLb).toBe(10800);
    expect(kit.check.requiredAggregateWllLb).toBe(6000);
    expect(kit.check.minimumTiedowns).toBe(4);
    expect(kit.check.tiedowns[0].limitedBy).toBe("binder");
    expect(kit.pass).toBe(true);
    expect(kit.blockers).toEqual([]);
    expect(kit.tiedowns[0].itemIds).toEqual([parts[0]!.chain.id, parts[0]!.binder.id]);
    expect(kit.tiedowns[0].items[0].usable).toEqual({ ok: true, reasons: [] });
    expect(kit.tiedowns[0].result.wllLb).toBe(5400);
    expect(kit.trailer.anchorPoints.every((a: any) => a.usable.ok)).toBe(true);
  });

  it("names an anchor point rated below the chain as the tiedown's limit", async () => {
    const kit = await makeKit(planner, { date: day(21), machineId: machine.id, trailerId: trailer.id });
    const chain = await makeChain(planner);
    const res = await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: anchorId(trailer, "C1"), attachment: "indirect-across", itemIds: [chain.id] });
    expect(res.status).toBe(201);
    expect(res.json.check.tiedowns[0]).toMatchObject({ wllLb: 4000, limitedBy: "anchor", limitedByLabel: "anchor point C1", countedWllLb: 4000 });
    expect(res.json.pass).toBe(false);
    expect(res.json.check.findings.some((f: any) => f.severity === "fail" && f.source === "49 CFR 393.130(c)(1)")).toBe(true);
  });
});

describe("availability, enforced by the server", () => {
  async function tryAdd(itemId: string, date: string, client = planner) {
    const kit = await makeKit(client, { date, machineId: machine.id, trailerId: trailer.id });
    const res = await client.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: anchorId(trailer, "FL"), attachment: "direct", itemIds: [itemId] });
    return { kit, res };
  }

  for (const [status, code] of [
    ["tagged_out", "TAGGED_OUT"],
    ["retired", "RETIRED"],
    ["lost", "LOST"],
  ] as const) {
    it(`refuses an item that is ${status.replace("_", " ")}, with the reason, and writes nothing`, async () => {
      const chain = await makeChain(planner);
      await setItem(chain.id, { status });
      const { kit, res } = await tryAdd(chain.id, day(30));
      expect(res.status).toBe(409);
      expect(res.json).toMatchObject({ code: "ITEM_NOT_USABLE", itemId: chain.id });
      expect(res.json.reasons.map((r: any) => r.code)).toContain(code);
      expect(await countRows("kit_tiedowns", { kit_id: kit.id })).toBe(0);
      expect(await countRows("kit_items", { item_id: chain.id })).toBe(0);
    });
  }

  it("refuses an item overdue for inspection on the kit's date, though not today, and takes it for an earlier date", async () => {
    const chain = await makeChain(planner);
    await setItem(chain.id, { next_inspection_due: day(3) });
    const late = await tryAdd(chain.id, day(6));
    expect(late.res.status).toBe(409);
    expect(late.res.json.code).toBe("ITEM_NOT_USABLE");
    expect(late.res.json.reasons).toEqual([{ code: "INSPECTION_OVERDUE", message: `Periodic inspection overdue since ${day(3)}: have it inspected before use.` }]);
    const early = await tryAdd(chain.id, day(3));
    expect(early.res.status).toBe(201);
  });

  it("refuses an item with no WLL", async () => {
    const chain = await makeChain(planner);
    await setItem(chain.id, { wll_lb: null });
    const { res } = await tryAdd(chain.id, day(31));
    expect(res.status).toBe(409);
    expect(res.json.reasons.map((r: any) => r.code)).toEqual(["NOT_RATED"]);
  });

  it("refuses an anchor point taken out of use, and takes it again once returned to use", async () => {
    const t = await makeTrailer(planner);
    const pocket = anchorId(t, "RL");
    const out = await hand.post(`/api/v1/anchor-points/${pocket}/events`, { type: "tag_out", note: "Stake pocket bent after the last haul" });
    expect(out.status).toBe(201);
    expect(out.json.usable.reasons.map((r: any) => r.code)).toEqual(["TAGGED_OUT"]);
    const kit = await makeKit(planner, { date: day(32), machineId: machine.id, trailerId: t.id });
    const chain = await makeChain(planner);
    const res = await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: pocket, attachment: "direct", itemIds: [chain.id] });
    expect(res.status).toBe(409);
    expect(res.json).toMatchObject({ code: "ANCHOR_NOT_USABLE", anchorPointId: pocket });
    expect(await countRows("kit_items", { item_id: chain.id })).toBe(0);
    // A yard hand may take a point out of use, not put it back; an owner may.
    expect((await hand.post(`/api/v1/anchor-points/${pocket}/events`, { type: "return_to_service", reason: "Straightened and checked" })).status).toBe(403);
    expect((await owner.post(`/api/v1/anchor-points/${pocket}/events`, { type: "return_to_service", reason: "Straightened and checked" })).status).toBe(201);
    expect((await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: pocket, attachment: "direct", itemIds: [chain.id] })).status).toBe(201);
    const history = await planner.get(`/api/v1/anchor-points/${pocket}/events`);
    expect(history.json.data.map((e: any) => e.type)).toEqual(["return_to_service", "tag_out", "created"]);
  });

  it("refuses an item already in another kit that date, naming that kit, and takes it on another date", async () => {
    const chain = await makeChain(planner);
    const first = await tryAdd(chain.id, day(40));
    expect(first.res.status).toBe(201);
    const second = await tryAdd(chain.id, day(40), planner2);
    expect(second.res.status).toBe(409);
    expect(second.res.json).toMatchObject({ code: "ITEM_IN_OTHER_KIT", itemId: chain.id, kitId: first.kit.id });
    expect(second.res.json.error).toContain(first.kit.job);
    const other = await tryAdd(chain.id, day(41), planner2);
    expect(other.res.status).toBe(201);
  });

  it("stops a kit at the 100 tiedowns one securement check takes, and the kit still answers", async () => {
    const kit = await makeKit(planner, { date: day(43), machineId: machine.id, trailerId: trailer.id });
    await testDb("kit_tiedowns").insert(
      Array.from({ length: 100 }, (_, i) => ({ organisation_id: organisationId, kit_id: kit.id, position: i, label: `t${i}`, anchor_point_id: anchorId(trailer, "FL"), attachment: "direct", secures: "machine" })),
    );
    const res = await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: anchorId(trailer, "FR"), attachment: "direct" });
    expect(res.status).toBe(409);
    expect(res.json.code).toBe("TOO_MANY_TIEDOWNS");
    const whole = await planner.get(`/api/v1/kits/${kit.id}`);
    expect(whole.status).toBe(200);
    expect(whole.json.tiedowns).toHaveLength(100);
    // Tiedowns with no items hold nothing down: left out of the check, each reported.
    expect(whole.json.check.tiedowns).toHaveLength(0);
    expect(whole.json.blockers.filter((b: any) => b.code === "NO_TIEDOWN_MATERIAL")).toHaveLength(100);
  });

  it("answers 400 naming the field for bad input", async () => {
    const kit = await makeKit(planner, { date: day(42), machineId: machine.id, trailerId: trailer.id });
    const res = await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: "nope", attachment: "sideways", itemIds: ["x"] });
    expect(res.status).toBe(400);
    expect(res.json.issues.map((i: any) => i.path).sort()).toEqual(["anchorPointId", "attachment", "itemIds.0"]);
    const wrongPart = await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: anchorId(trailer, "FL"), attachment: "direct", secures: "boom" });
    expect(wrongPart.status).toBe(400);
    expect(wrongPart.json.issues[0].path).toBe("secures");
  });
});

describe("two planners, one chain, one date", () => {
  it("lets exactly one of two simultaneous requests have it, over 25 rounds; the other gets 409 naming the winner's kit", async () => {
    const date = day(50);
    const kitA = await makeKit(planner, { date, machineId: machine.id, trailerId: trailer.id });
    const kitB = await makeKit(planner2, { date, machineId: machine.id, trailerId: trailer.id });
    const outcomes: string[] = [];
    for (let round = 0; round < 25; round++) {
      const chain = await makeChain(planner);
      const body = { anchorPointId: anchorId(trailer, "FL"), attachment: "direct", itemIds: [chain.id] };
      const [a, b] = await Promise.all([planner.post(`/api/v1/kits/${kitA.id}/tiedowns`, body), planner2.post(`/api/v1/kits/${kitB.id}/tiedowns`, body)]);
      expect([a.status, b.status].sort()).toEqual([201, 409]);
      const [winner, loser] = a.status === 201 ? [kitA, b] : [kitB, a];
      expect(loser.json).toMatchObject({ code: "ITEM_IN_OTHER_KIT", itemId: chain.id, kitId: winner.id });
      expect(await countRows("kit_items", { item_id: chain.id })).toBe(1);
      outcomes.push(a.status === 201 ? "A" : "B");
    }
    expect(outcomes).toHaveLength(25);
  }, 120_000);

  it("is refused by the database itself, whatever code writes the second row", async () => {
    const date = day(51);
    const kitA = await makeKit(planner, { date, machineId: machine.id, trailerId: trailer.id });
    const kitB = await makeKit(planner, { date, machineId: machine.id, trailerId: trailer.id });
    const chain = await makeChain(planner);
    const a = await planner.post(`/api/v1/kits/${kitA.id}/tiedowns`, { anchorPointId: anchorId(trailer, "FL"), attachment: "direct", itemIds: [chain.id] });
    const b = await planner.post(`/api/v1/kits/${kitB.id}/tiedowns`, { anchorPointId: anchorId(trailer, "FL"), attachment: "direct", itemIds: [] });
    const tiedownB = b.json.tiedowns[0].id;
    expect(a.status).toBe(201);
    await expect(
      testDb("kit_items").insert({ organisation_id: organisationId, kit_id: kitB.id, tiedown_id: tiedownB, item_id: chain.id, kit_date: date, position: 0 }),
    ).rejects.toThrow(/kit_items_item_date/);
    // Nor can a row claim another date than its kit's.
    await expect(
      testDb("kit_items").insert({ organisation_id: organisationId, kit_id: kitB.id, tiedown_id: tiedownB, item_id: chain.id, kit_date: day(52), position: 0 }),
    ).rejects.toThrow(/foreign key/);
  });
});

describe("the life of a kit", () => {
  it("is built by planners, marked ready only when it passes, loaded and returned by a yard hand scanning every item", async () => {
    const date = day(60);
    const kit = await makeKit(planner, { date, machineId: machine.id, trailerId: trailer.id, job: "Hollins driveway" });
    // A yard hand may look, not build.
    expect((await hand.get(`/api/v1/kits/${kit.id}`)).status).toBe(200);
    const chain0 = await makeChain(planner);
    expect((await hand.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: anchorId(trailer, "FL"), attachment: "direct", itemIds: [chain0.id] })).status).toBe(403);
    // Three tiedowns on a 12,000 lb machine: not ready.
    const ids: string[] = [];
    for (const [label, anchor] of corners.slice(0, 3)) {
      const c = await makeChain(planner);
      const b = await makeBinder(planner);
      ids.push(c.id, b.id);
      expect((await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { label, anchorPointId: anchorId(trailer, anchor), attachment: "direct", itemIds: [c.id, b.id] })).status).toBe(201);
    }
    const early = await planner.post(`/api/v1/kits/${kit.id}/transitions`, { to: "ready" });
    expect(early.status).toBe(409);
    expect(early.json.code).toBe("KIT_DOES_NOT_PASS");
    expect(early.json.error).toContain("49 CFR 393.130");
    const c = await makeChain(planner);
    const b = await makeBinder(planner);
    ids.push(c.id, b.id);
    expect((await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { label: "rear right", anchorPointId: anchorId(trailer, "RR"), attachment: "direct", itemIds: [c.id, b.id] })).status).toBe(201);
    expect((await hand.post(`/api/v1/kits/${kit.id}/transitions`, { to: "ready" })).status).toBe(403);
    const ready = await planner.post(`/api/v1/kits/${kit.id}/transitions`, { to: "ready" });
    expect(ready.status).toBe(200);
    expect(ready.json.state).toBe("ready");
    // Ready kits are not edited: back to draft first.
    const locked = await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: anchorId(trailer, "C1"), attachment: "direct", itemIds: [] });
    expect(locked.status).toBe(409);
    expect(locked.json.code).toBe("KIT_NOT_DRAFT");

    // Loading: the scan must be exactly the kit's items.
    const stranger = await makeChain(planner);
    const short = await hand.post(`/api/v1/kits/${kit.id}/transitions`, { to: "loaded", scannedItemIds: ids.slice(1) });
    expect(short.status).toBe(409);
    expect(short.json.code).toBe("SCAN_MISMATCH");
    expect(short.json.missing.map((i: any) => i.id)).toEqual([ids[0]]);
    const extra = await hand.post(`/api/v1/kits/${kit.id}/transitions`, { to: "loaded", scannedItemIds: [...ids, stranger.id] });
    expect(extra.status).toBe(409);
    expect(extra.json.unexpected.map((i: any) => i.tagCode)).toEqual([stranger.tagCode]);
    expect((await testDb("kits").where({ id: kit.id }).first("state")).state).toBe("ready");
    const loaded = await hand.post(`/api/v1/kits/${kit.id}/transitions`, { to: "loaded", scannedItemIds: [...ids].reverse() });
    expect(loaded.status).toBe(200);
    expect(loaded.json.state).toBe("loaded");

    // Returning: a missing item stops it; a damaged one is tagged out.
    const missing = await hand.post(`/api/v1/kits/${kit.id}/transitions`, { to: "returned", scannedItemIds: ids.slice(0, -1) });
    expect(missing.status).toBe(409);
    expect(missing.json.missing.map((i: any) => i.id)).toEqual([ids.at(-1)]);
    const back = await hand.post(`/api/v1/kits/${kit.id}/transitions`, { to: "returned", scannedItemIds: ids, damaged: [{ itemId: ids[0], note: "Hook opened up" }] });
    expect(back.status).toBe(200);
    expect(back.json.state).toBe("returned");
    expect((await testDb("items").where({ id: ids[0] }).first("status")).status).toBe("tagged_out");
    expect((await testDb("items").where({ id: ids[1] }).first("status")).status).toBe("in_service");
    expect((await latestMailTo(ownerEmail, { subject: /^Tagged out:/ })).subject).toMatch(/^Tagged out: Chain, grade 70, 3\/8 in \(/);

    // History: each step in every item's history, and the tag-out with its own audit row.
    const history = await planner.get(`/api/v1/items/${ids[0]}/events`);
    const kitNotes = history.json.data.filter((e: any) => e.type === "kit").map((e: any) => e.note);
    expect(kitNotes).toEqual([
      `In kit for Hollins driveway, ${date}: returned`,
      `In kit for Hollins driveway, ${date}: loaded`,
      `In kit for Hollins driveway, ${date}: marked ready`,
    ]);
    expect(history.json.data[0].type).toBe("tag_out");
    expect(history.json.data[0].note).toContain("Hook opened up");
    for (const id of ids) expect(await countRows("item_events", { item_id: id, type: "kit" })).toBe(3);
    expect(await countRows("audit_log", { organisation_id: organisationId, entity_id: ids[0], action: "item.tagged_out" })).toBe(1);
    for (const action of ["kit.ready", "kit.loaded", "kit.returned"]) {
      expect(await countRows("audit_log", { organisation_id: organisationId, entity_id: kit.id, action })).toBe(1);
    }
    // Returned is the end.
    expect((await planner.post(`/api/v1/kits/${kit.id}/transitions`, { to: "draft" })).json.code).toBe("TRANSITION_NOT_ALLOWED");
  }, 60_000);

  it("will not load a ready kit whose gear was tagged out since, and lets a planner put it back to draft", async () => {
    const { kit, parts } = await fullKit(day(61));
    expect((await planner.post(`/api/v1/kits/${kit.id}/transitions`, { to: "ready" })).status).toBe(200);
    expect((await hand.post(`/api/v1/items/${parts[2]!.binder.id}/events`, { type: "tag_out", note: "Ratchet slips" })).status).toBe(201);
    const all = parts.flatMap((p) => [p.chain.id, p.binder.id]);
    const res = await hand.post(`/api/v1/kits/${kit.id}/transitions`, { to: "loaded", scannedItemIds: all });
    expect(res.status).toBe(409);
    expect(res.json.code).toBe("KIT_DOES_NOT_PASS");
    expect(res.json.blockers[0]).toMatchObject({ code: "ITEM_NOT_USABLE", itemId: parts[2]!.binder.id });
    expect((await hand.post(`/api/v1/kits/${kit.id}/transitions`, { to: "draft" })).status).toBe(403);
    const draft = await planner.post(`/api/v1/kits/${kit.id}/transitions`, { to: "draft" });
    expect(draft.json.state).toBe("draft");
    expect(draft.json.pass).toBe(false);
    const tiedown = draft.json.tiedowns[2];
    expect((await planner.delete(`/api/v1/kits/${kit.id}/tiedowns/${tiedown.id}/items/${parts[2]!.binder.id}`)).status).toBe(200);
    const binder = await makeBinder(planner);
    const fixed = await planner.post(`/api/v1/kits/${kit.id}/tiedowns/${tiedown.id}/items`, { itemIds: [binder.id] });
    expect(fixed.status).toBe(201);
    expect(fixed.json.pass).toBe(true);
  }, 60_000);

  it("marks items lost when the yard hand reports them not back", async () => {
    const { kit, parts } = await fullKit(day(62));
    const all = parts.flatMap((p) => [p.chain.id, p.binder.id]);
    await planner.post(`/api/v1/kits/${kit.id}/transitions`, { to: "ready" });
    expect((await hand.post(`/api/v1/kits/${kit.id}/transitions`, { to: "loaded", scannedItemIds: all })).status).toBe(200);
    const back = await hand.post(`/api/v1/kits/${kit.id}/transitions`, { to: "returned", scannedItemIds: all.slice(1), lost: [{ itemId: all[0], note: "Left at the site, foreman has it" }] });
    expect(back.status).toBe(200);
    expect((await testDb("items").where({ id: all[0] }).first("status")).status).toBe("lost");
  }, 60_000);
});

describe("an articulated machine", () => {
  it("records the articulation lock in a draft only, and the check follows it", async () => {
    const loader = await makeMachine(planner, { class: "wheel-loader", articulated: true, weight: { value: 11000, unit: "lb" } });
    const kit = await makeKit(planner, { date: day(63), machineId: loader.id, trailerId: trailer.id });
    let answer: any;
    for (const [label, anchor] of corners) {
      const res = await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { label, anchorPointId: anchorId(trailer, anchor), attachment: "direct", itemIds: [(await makeChain(planner)).id, (await makeBinder(planner)).id] });
      answer = res.json;
    }
    const codes = (k: any) => k.check.findings.filter((f: any) => f.severity === "fail").map((f: any) => f.code);
    expect(codes(answer)).toEqual(["ARTICULATION_NOT_RESTRAINED"]);
    const locked = await planner.request("PATCH", `/api/v1/kits/${kit.id}`, { articulationRestrained: true });
    expect(locked.status).toBe(200);
    expect(codes(locked.json)).toEqual([]);
    expect(locked.json.pass).toBe(true);
    expect((await planner.post(`/api/v1/kits/${kit.id}/transitions`, { to: "ready" })).status).toBe(200);
    const late = await planner.request("PATCH", `/api/v1/kits/${kit.id}`, { articulationRestrained: false });
    expect(late.status).toBe(409);
    expect(late.json.code).toBe("KIT_NOT_DRAFT");
    const words = await planner.request("PATCH", `/api/v1/kits/${kit.id}`, { site: "Gate 2, north entrance" });
    expect(words.json.site).toBe("Gate 2, north entrance");
    expect((await hand.request("PATCH", `/api/v1/kits/${kit.id}`, { site: "x" })).status).toBe(403);
  }, 60_000);
});

describe("quick building", () => {
  it("suggests binders that take the chain, and fills the other three corners with the same sorts of items", async () => {
    const kit = await makeKit(planner, { date: day(70), machineId: machine.id, trailerId: trailer.id });
    const chain = await makeChain(planner);
    const wrongBinder = await makeBinder(planner, ["1/2", "5/8"], 13000);
    const rightBinder = await makeBinder(planner, ["5/16", "3/8"], 5400);
    const first = await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { label: "front left", machinePoint: "front left", anchorPointId: anchorId(trailer, "FL"), attachment: "direct", itemIds: [chain.id] });
    const tiedownId = first.json.tiedowns[0].id;
    const free = await planner.get(`/api/v1/kits/${kit.id}/free-items?forTiedownId=${tiedownId}`);
    expect(free.status).toBe(200);
    const suggested = free.json.suggestions.map((s: any) => s.itemId);
    expect(suggested).toContain(rightBinder.id);
    expect(suggested).not.toContain(wrongBinder.id);
    expect(free.json.suggestions.find((s: any) => s.itemId === rightBinder.id).reason).toBe("Takes 3/8 in chain");
    expect(free.json.data.map((i: any) => i.id)).not.toContain(chain.id);
    await planner.post(`/api/v1/kits/${kit.id}/tiedowns/${tiedownId}/items`, { itemIds: [rightBinder.id] });
    for (let i = 0; i < 3; i++) {
      await makeChain(planner);
      await makeBinder(planner);
    }
    const filled = await planner.post(`/api/v1/kits/${kit.id}/corners`, { fromTiedownId: tiedownId });
    expect(filled.status).toBe(201);
    const k = filled.json.kit;
    expect(k.tiedowns.map((t: any) => t.label)).toEqual(["front left", "front right", "rear left", "rear right"]);
    const anchorLabel = (id: string) => trailer.anchorPoints.find((a: any) => a.id === id).label;
    expect(k.tiedowns.map((t: any) => anchorLabel(t.anchorPointId))).toEqual(["FL", "FR", "RL", "RR"]);
    for (const t of k.tiedowns) {
      expect(t.items.map((i: any) => i.description)).toEqual(["Chain, grade 70, 3/8 in", "Ratchet binder, for 5/16–3/8 in chain"]);
    }
    expect(filled.json.corners.every((c: any) => c.gaps.length === 0)).toBe(true);
    expect(k.pass).toBe(true);
  }, 60_000);

  it("copies a kit to another date, leaving out what is not usable or not free that day", async () => {
    const { kit, parts } = await fullKit(day(80));
    await setItem(parts[0]!.chain.id, { next_inspection_due: day(82) });
    const holder = await makeKit(planner2, { date: day(85), machineId: machine.id, trailerId: trailer.id });
    expect((await planner2.post(`/api/v1/kits/${holder.id}/tiedowns`, { anchorPointId: anchorId(trailer, "FL"), attachment: "direct", itemIds: [parts[1]!.binder.id] })).status).toBe(201);
    const res = await planner.post(`/api/v1/kits/${kit.id}/copies`, { date: day(85) });
    expect(res.status).toBe(201);
    expect(res.json.kit.state).toBe("draft");
    expect(res.json.kit.date).toBe(day(85));
    expect(res.json.kit.tiedowns).toHaveLength(4);
    expect(res.json.leftOut.map((l: any) => [l.itemId, l.code])).toEqual([
      [parts[0]!.chain.id, "ITEM_NOT_USABLE"],
      [parts[1]!.binder.id, "ITEM_IN_OTHER_KIT"],
    ]);
    expect(res.json.leftOut[1].kitId).toBe(holder.id);
    expect(res.json.kit.tiedowns.flatMap((t: any) => t.itemIds)).toHaveLength(6);
  }, 60_000);
});

describe("machines and trailers", () => {
  it("stores kg and metres as whole pounds and millimetres, and answers them so", async () => {
    const m = await makeMachine(planner, { weight: { value: 3674, unit: "kg" }, length: { value: 4.9, unit: "m" }, cgFromFront: { value: 7, unit: "ft" }, accessories: ["bucket", "blade"], tiedownPoints: [{ label: "rear left", side: "left", position: { value: 4.6, unit: "m" } }] });
    expect(m.weight).toEqual({ value: 8100, unit: "lb" });
    expect(m.length).toEqual({ value: 4900, unit: "mm" });
    expect(m.cgFromFront).toEqual({ value: 2134, unit: "mm" });
    expect(m.cgAssumed).toBe(false);
    expect(m.tiedownPoints).toEqual([{ label: "rear left", side: "left", position: { value: 4600, unit: "mm" } }]);
    const again = await planner.request("PUT", `/api/v1/machines/${m.id}`, { ...m, id: undefined, classLabel: undefined, cgAssumed: undefined });
    expect(again.status, again.text).toBe(200);
    expect(again.json).toEqual(m);
  });

  it("refuses what the engine would refuse, naming the field", async () => {
    const res = await planner.post("/api/v1/machines", { ...machineBody(), accessories: ["bucket", "Machine", "BUCKET"], class: "space-shuttle" });
    expect(res.status).toBe(400);
    expect(res.json.issues.map((i: any) => i.path).sort()).toEqual(["accessories.1", "accessories.2"]);
    const cls = await planner.post("/api/v1/machines", machineBody({ class: "Trencher" }));
    expect(cls.status).toBe(400);
    expect(cls.json.issues[0].path).toBe("class");
    expect((await planner.post("/api/v1/machine-classes", { name: "Trencher" })).status).toBe(403);
    expect((await owner.post("/api/v1/machine-classes", { name: "Trencher" })).status).toBe(201);
    const now = await planner.post("/api/v1/machines", machineBody({ class: "trencher" }));
    expect(now.status).toBe(201);
    expect(now.json.class).toBe("Trencher");
  });

  it("keeps, updates, adds and retires anchor points when a trailer is replaced, and never deletes one", async () => {
    const t = await makeTrailer(planner);
    const kit = await makeKit(planner, { date: day(90), machineId: machine.id, trailerId: t.id });
    await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: anchorId(t, "C1"), attachment: "direct", itemIds: [] });
    const { id: _id, typeLabel: _tl, anchorPoints, ...rest } = t;
    const kept = anchorPoints.filter((a: any) => a.label !== "C1").map((a: any) => ({ id: a.id, label: a.label, side: a.side, position: a.position, wll: a.wll, nextInspectionDue: a.nextInspectionDue }));
    kept[0].wll = { value: 5000, unit: "lb" };
    const res = await planner.request("PUT", `/api/v1/trailers/${t.id}`, { ...rest, anchorPoints: [...kept, { label: "C2", side: "centre", position: { value: 10, unit: "ft" }, wll: { value: 2268, unit: "kg" } }] });
    expect(res.status, res.text).toBe(200);
    expect(res.json.anchorPoints.map((a: any) => a.label).sort()).toEqual(["C2", "FL", "FR", "RL", "RR"]);
    expect(res.json.anchorPoints.find((a: any) => a.label === "C2").wll).toEqual({ value: 5000, unit: "lb" });
    expect(res.json.anchorPoints.find((a: any) => a.label === "FL").wll).toEqual({ value: 5000, unit: "lb" });
    expect(res.json.retired).toEqual([anchorId(t, "C1")]);
    expect((await testDb("anchor_points").where({ id: anchorId(t, "C1") }).first("status")).status).toBe("retired");
    // The kit still shows the retired point, as a blocker.
    const k = (await planner.get(`/api/v1/kits/${kit.id}`)).json;
    // (The tiedown has no items yet, so it is also reported as holding nothing down.)
    expect(k.blockers.map((b: any) => b.code).sort()).toEqual(["ANCHOR_NOT_USABLE", "NO_TIEDOWN_MATERIAL"]);
    const history = await planner.get(`/api/v1/anchor-points/${anchorId(t, "FL")}/events`);
    expect(history.json.data[0]).toMatchObject({ type: "edited", changes: { wllLb: [6600, 5000] } });
  });
});

describe("another organisation's ids", () => {
  it("are not found, whatever the route, and nothing changes", async () => {
    const { kit, parts } = await fullKit(day(100));
    const other = await newOrganisation("Other Kit Co");
    const outsider = other.owner;
    const theirMachine = await makeMachine(outsider);
    const theirTrailer = await makeTrailer(outsider);
    const theirKit = await makeKit(outsider, { date: day(100), machineId: theirMachine.id, trailerId: theirTrailer.id });
    const before = await testDb("kits").where({ id: kit.id }).first();
    const tiedown = kit.tiedowns[0];
    const attempts = [
      outsider.get(`/api/v1/kits/${kit.id}`),
      outsider.get(`/api/v1/machines/${machine.id}`),
      outsider.get(`/api/v1/trailers/${trailer.id}`),
      outsider.request("PUT", `/api/v1/machines/${machine.id}`, machineBody()),
      outsider.request("PATCH", `/api/v1/kits/${kit.id}`, { job: "mine now" }),
      outsider.post(`/api/v1/kits/${kit.id}/tiedowns`, { anchorPointId: anchorId(trailer, "FL"), attachment: "direct", itemIds: [] }),
      outsider.delete(`/api/v1/kits/${kit.id}/tiedowns/${tiedown.id}`),
      outsider.delete(`/api/v1/kits/${kit.id}/tiedowns/${tiedown.id}/items/${parts[0]!.chain.id}`),
      outsider.post(`/api/v1/kits/${kit.id}/transitions`, { to: "ready" }),
      outsider.post(`/api/v1/kits/${kit.id}/copies`, { date: day(101) }),
      outsider.get(`/api/v1/kits/${kit.id}/free-items`),
      outsider.post(`/api/v1/anchor-points/${anchorId(trailer, "FL")}/events`, { type: "tag_out", note: "sabotage attempt" }),
      outsider.post("/api/v1/kits", { date: day(100), job: "x", machineId: machine.id, trailerId: theirTrailer.id }),
      outsider.post("/api/v1/kits", { date: day(100), job: "x", machineId: theirMachine.id, trailerId: trailer.id }),
      // Their own kit, with this organisation's item or anchor point.
      outsider.post(`/api/v1/kits/${theirKit.id}/tiedowns`, { anchorPointId: anchorId(trailer, "FL"), attachment: "direct", itemIds: [] }),
      outsider.post(`/api/v1/kits/${theirKit.id}/tiedowns`, { anchorPointId: anchorId(theirTrailer, "FL"), attachment: "direct", itemIds: [parts[1]!.chain.id] }),
    ];
    for (const res of await Promise.all(attempts)) expect(res.status, res.text).toBe(404);
    expect(await testDb("kits").where({ id: kit.id }).first()).toEqual(before);
    expect(await countRows("kit_tiedowns", { kit_id: theirKit.id })).toBe(0);
    expect((await testDb("anchor_points").where({ id: anchorId(trailer, "FL") }).first("status")).status).toBe("in_service");
    const list = await outsider.get(`/api/v1/kits?from=${day(100)}&to=${day(100)}`);
    expect(list.json.data.map((k: any) => k.id)).toEqual([theirKit.id]);
    expect((await outsider.get("/api/v1/machines")).json.data.map((m: any) => m.id)).toEqual([theirMachine.id]);
  }, 60_000);
});

describe("the kit list", () => {
  it("lists the coming days' kits by date with each kit's verdict", async () => {
    const date = day(110);
    const good = (await fullKit(date)).kit;
    const bad = await makeKit(planner, { date, machineId: machine.id, trailerId: trailer.id, job: "A lonely chain" });
    const res = await hand.get(`/api/v1/kits?from=${date}&to=${date}`);
    expect(res.status).toBe(200);
    const byId = Object.fromEntries(res.json.data.map((k: any) => [k.id, k]));
    expect(byId[good.id]).toMatchObject({ date, state: "draft", pass: true, machine: { id: machine.id, name: machine.name }, trailer: { id: trailer.id, name: trailer.name } });
    expect(byId[bad.id].pass).toBe(false);
    expect((await hand.get(`/api/v1/kits?from=${date}&to=2020-01-01`)).status).toBe(400);
  });
});
