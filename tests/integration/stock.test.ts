import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { callAction, discoveredActions } from "../support/actions";
import { countRows, testDb } from "../support/db";
import { addMember, Client, latestMailTo, newOrganisation } from "../support/http";
import { addDays, todayIn } from "@/lib/time";

const s3 = new S3Client({
  endpoint: process.env.S3_ENDPOINT ?? "http://127.0.0.1:54370",
  region: "us-east-1",
  forcePathStyle: true,
  credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" },
});
const objectCount = async (prefix: string) =>
  (await s3.send(new ListObjectsV2Command({ Bucket: process.env.S3_BUCKET ?? "linkyard-files", Prefix: prefix }))).KeyCount ?? 0;

const CHAIN = { kind: "chain", marking: "grade", grade: 70, size: "3/8 in", length: { value: 20, unit: "ft" } };
const answersFor = async (client: Client, itemId: string, defect: string | null) => {
  // the checklist points, read from the pre-use check page would be the user's way; the ids are stable
  const kind = (await client.get(`/api/v1/items/${itemId}`)).json.kind as string;
  const ids: Record<string, string[]> = {
    chain: ["cracked", "bent", "worn", "hooks", "repairs", "heat"],
    binder: ["handle", "hooks", "hold", "threads", "marking"],
  };
  return ids[kind].map((id) => ({ id, defect: id === defect }));
};

let org: Awaited<ReturnType<typeof newOrganisation>>;
let planner: Client;
let hand: Client;
let designatedHand: Client;
let yardId: string;

beforeAll(async () => {
  org = await newOrganisation("Stock Co");
  planner = (await addMember(org.owner, "planner")).client;
  hand = (await addMember(org.owner, "yard_hand")).client;
  designatedHand = (await addMember(org.owner, "yard_hand", true)).client;
  const [yard] = await testDb("yards").insert({ organisation_id: org.organisationId, name: "Main yard" }).returning("id");
  yardId = yard.id;
}, 60_000);
afterAll(async () => {
  s3.destroy();
  await testDb.destroy();
});

async function newChain(extra: Record<string, unknown> = {}) {
  const res = await planner.post("/api/v1/items", { ...CHAIN, ...extra });
  expect(res.status).toBe(201);
  return res.json;
}

describe("adding stock", () => {
  it("gives the item a tag code and its published WLL, with a created event and an audit row", async () => {
    const item = await newChain({ yardId, serial: `S-${Date.now()}` });
    expect(item.tagCode).toMatch(/^[34679ACDEFGHJKMNPQRTWXY]{4}-[34679ACDEFGHJKMNPQRTWXY]{4}$/);
    // 49 CFR 393.108 chain table: grade 70, 3/8 in = 6,600 lb / 2,990 kg published (2,994 kg by conversion)
    expect(item).toMatchObject({ wllLb: 6600, status: "in_service", size: "3/8", lengthMm: 6096, yard: { id: yardId, name: "Main yard" } });
    expect(item.wllSource).toMatch(/393\.108/);
    expect(item.nextInspectionDue).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    const events = (await hand.get(`/api/v1/items/${item.id}/events`)).json.data;
    expect(events.map((e: { type: string }) => e.type)).toEqual(["created"]);
    expect(await countRows("audit_log", { entity: "item", entity_id: item.id, action: "item.created" })).toBe(1);
  });

  it("refuses bad input by field and writes nothing", async () => {
    const before = await countRows("items", { organisation_id: org.organisationId });
    const bad = await planner.post("/api/v1/items", { ...CHAIN, size: "9/16" });
    expect(bad.status).toBe(400);
    expect(bad.json.issues).toEqual([{ path: "size", message: "Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in" }]);
    const negative = await planner.post("/api/v1/items", { kind: "web-strap", marking: "wll", markedWll: { value: -1, unit: "lb" }, size: "2" });
    expect(negative.json.issues[0].path).toBe("markedWll.value");
    const foreignYard = await testDb("yards").insert({ organisation_id: (await newOrganisation()).organisationId, name: "Theirs" }).returning("id");
    const yard = await planner.post("/api/v1/items", { ...CHAIN, yardId: foreignYard[0].id });
    expect(yard.status).toBe(400);
    expect(yard.json.issues[0].path).toBe("yardId");
    expect(await countRows("items", { organisation_id: org.organisationId })).toBe(before);
  });

  it("refuses a serial that another item already has", async () => {
    const serial = `DUP-${Date.now()}`;
    await newChain({ serial });
    const again = await planner.post("/api/v1/items", { ...CHAIN, serial });
    expect(again.status).toBe(409);
    expect(again.json.issues[0].path).toBe("serial");
  });

  it("records an edit as an event with what changed", async () => {
    const item = await newChain();
    const res = await planner.request("PUT", `/api/v1/items/${item.id}`, { ...CHAIN, marking: "wll", markedWll: { value: 7100, unit: "lb" }, grade: 70 });
    expect(res.status).toBe(200);
    expect(res.json.wllLb).toBe(7100);
    const [edit] = (await hand.get(`/api/v1/items/${item.id}/events`)).json.data;
    expect(edit.type).toBe("edited");
    expect(edit.changes.wllLb).toEqual([6600, 7100]);
  });
});

describe("moving stock", () => {
  it("moves a selection in one go, records each move, and skips another organisation's items", async () => {
    const [north] = await testDb("yards").insert({ organisation_id: org.organisationId, name: `North ${Date.now()}` }).returning("id");
    const a = await newChain({ yardId });
    const b = await newChain({ yardId });
    const stranger = await newOrganisation();
    const theirs = (await stranger.owner.post("/api/v1/items", CHAIN)).json;
    const res = await planner.post("/api/v1/items/move", { itemIds: [a.id, b.id, theirs.id], yardId: north.id });
    expect(res.status).toBe(200);
    expect(res.json.moved).toBe(2);
    for (const id of [a.id, b.id]) {
      expect((await hand.get(`/api/v1/items/${id}`)).json.yard.id).toBe(north.id);
      const [moved] = (await hand.get(`/api/v1/items/${id}/events`)).json.data;
      expect(moved).toMatchObject({ type: "moved", changes: { yardName: ["Main yard", expect.stringMatching(/^North /)] } });
    }
    expect((await testDb("items").where({ id: theirs.id }).first("yard_id")).yard_id).toBeNull();
    const again = await planner.post("/api/v1/items/move", { itemIds: [a.id], yardId: north.id });
    expect(again.json.moved).toBe(0); // already there: no event
  });
});

describe("the stock list", () => {
  it("pages, filters and searches on the server", async () => {
    const a = await newChain({ serial: `FIND-${Date.now()}` });
    const page = await hand.get("/api/v1/items?perPage=2&sort=wllLb&order=desc");
    expect(page.status).toBe(200);
    expect(page.json.data).toHaveLength(2);
    expect(page.json.pageCount).toBe(Math.ceil(page.json.total / 2));
    const byTag = await hand.get(`/api/v1/items?q=${a.tagCode.toLowerCase().replace("-", "")}`);
    expect(byTag.json.data.map((i: { id: string }) => i.id)).toEqual([a.id]);
    const bySerial = await hand.get(`/api/v1/items?q=${a.serial}`);
    expect(bySerial.json.data.map((i: { id: string }) => i.id)).toEqual([a.id]);
    const tagged = await hand.get("/api/v1/items?status=tagged_out&perPage=100");
    for (const i of tagged.json.data) expect(i.status).toBe("tagged_out");
    const bad = await hand.get("/api/v1/items?perPage=1000");
    expect(bad.status).toBe(400);
    expect(bad.json.issues[0].path).toBe("perPage");
  });
});

describe("pre-use checks and tag-outs", () => {
  it("records a passing check by a yard hand", async () => {
    const item = await newChain();
    const res = await hand.post(`/api/v1/items/${item.id}/events`, { type: "check", answers: await answersFor(hand, item.id, null) });
    expect(res.status).toBe(201);
    expect(res.json.item.status).toBe("in_service");
    expect(res.json.item.lastCheckedAt).not.toBeNull();
  });

  it("tags the item out at once on any defect, and e-mails the owner", async () => {
    const item = await newChain();
    const res = await hand.post(`/api/v1/items/${item.id}/events`, { type: "check", answers: await answersFor(hand, item.id, "hooks"), note: "Hook opened at one end" });
    expect(res.status).toBe(201);
    expect(res.json.item.status).toBe("tagged_out");
    const types = (await hand.get(`/api/v1/items/${item.id}/events`)).json.data.map((e: { type: string }) => e.type);
    expect(types.slice(0, 2)).toEqual(["tag_out", "check"]);
    const mail = await latestMailTo(org.email, { subject: new RegExp(`^Tagged out: .*${item.tagCode}`) });
    expect(mail.subject).toBe(`Tagged out: Chain, grade 70, 3/8 in (${item.tagCode})`);
    expect(mail.text).toContain("End hooks opened, bent or twisted");
    expect(mail.text).toContain("Hook opened at one end");
    // A tagged-out item cannot pass a check.
    const again = await hand.post(`/api/v1/items/${item.id}/events`, { type: "check", answers: await answersFor(hand, item.id, null) });
    expect(again.status).toBe(409);
    expect(again.json.error).toMatch(/Tagged out/);
  });

  it("asks for a note or a photo when a defect is found, and an answer for every point", async () => {
    const item = await newChain();
    const noNote = await hand.post(`/api/v1/items/${item.id}/events`, { type: "check", answers: await answersFor(hand, item.id, "bent") });
    expect(noNote.status).toBe(400);
    expect(noNote.json.issues[0].path).toBe("note");
    const half = await hand.post(`/api/v1/items/${item.id}/events`, { type: "check", answers: [{ id: "cracked", defect: false }] });
    expect(half.status).toBe(400);
    expect(half.json.issues[0]).toEqual({ path: "answers.bent", message: 'Answer every point: "Bent, twisted or stretched links, or links that do not hinge freely" has no answer.' });
    expect((await hand.get(`/api/v1/items/${item.id}`)).json.status).toBe("in_service");
  });
});

describe("the usability verdict", () => {
  const orgToday = async () => todayIn((await testDb("organisations").where({ id: org.organisationId }).first("time_zone")).time_zone);

  it("is in the item, the list and the tag lookup: usable, with the day's pre-use check still to do", async () => {
    const item = await newChain();
    const expected = { ok: true, reasons: [], check: { done: false, message: "No pre-use check on record: do one before you use it." } };
    expect(item.usable).toEqual(expected);
    expect((await hand.get(`/api/v1/items/${item.id}`)).json.usable).toEqual(expected);
    expect((await hand.get(`/api/v1/items?q=${item.tagCode}`)).json.data[0].usable).toEqual(expected);
    expect((await hand.get(`/api/v1/tags/${item.tagCode}`)).json.usable).toEqual(expected);
    const passed = await hand.post(`/api/v1/items/${item.id}/events`, { type: "check", answers: await answersFor(hand, item.id, null) });
    expect(passed.json.item.usable).toEqual({ ok: true, reasons: [], check: { done: true, message: "Pre-use check passed today: no defects found." } });
  });

  it("refuses the pre-use check of an item overdue for inspection with 409 and the reasons, and records nothing", async () => {
    const item = await newChain();
    const yesterday = addDays(await orgToday(), -1);
    await testDb("items").where({ id: item.id }).update({ next_inspection_due: yesterday });
    const read = (await hand.get(`/api/v1/items/${item.id}`)).json.usable;
    expect(read).toEqual({ ok: false, reasons: [{ code: "INSPECTION_OVERDUE", message: `Periodic inspection overdue since ${yesterday}: have it inspected before use.` }] });
    const events = await countRows("item_events", { item_id: item.id });
    const res = await hand.post(`/api/v1/items/${item.id}/events`, { type: "check", answers: await answersFor(hand, item.id, null) });
    expect(res.status).toBe(409);
    expect(res.json).toMatchObject({ code: "NOT_USABLE", reasons: [{ code: "INSPECTION_OVERDUE" }] });
    expect(res.json.error).toContain("Set it aside, hang a red tag on it and tell the owner or a designated person.");
    expect(await countRows("item_events", { item_id: item.id })).toBe(events);
    // A damage report is still taken: the item can be tagged out.
    expect((await hand.post(`/api/v1/items/${item.id}/events`, { type: "tag_out", note: "Overdue and the hook looks opened" })).status).toBe(201);
  });

  it("lists overdue items apart from those merely due soon, and several statuses at once", async () => {
    const today = await orgToday();
    const late = await newChain();
    const soon = await newChain();
    await testDb("items").where({ id: late.id }).update({ next_inspection_due: addDays(today, -3) });
    await testDb("items").where({ id: soon.id }).update({ next_inspection_due: addDays(today, 10) });
    const ids = async (q: string) => (await hand.get(`/api/v1/items?perPage=100&${q}`)).json.data.map((i: { id: string }) => i.id);
    expect(await ids("due=overdue")).toContain(late.id);
    expect(await ids("due=overdue")).not.toContain(soon.id);
    expect(await ids("due=30d")).toContain(soon.id);
    expect(await ids("due=30d")).not.toContain(late.id);
    const lost = await newChain();
    await hand.post(`/api/v1/items/${lost.id}/events`, { type: "tag_out", note: "Bent" });
    await org.owner.post(`/api/v1/items/${lost.id}/events`, { type: "retired", reason: "Bent beyond repair" });
    const out = await hand.get("/api/v1/items?perPage=100&status=retired,lost");
    expect(out.json.data.map((i: { id: string }) => i.id)).toContain(lost.id);
    expect(out.json.data.every((i: { status: string }) => ["retired", "lost"].includes(i.status))).toBe(true);
  });
});

describe("inspection and return to service", () => {
  it("is for the owner or a designated person only", async () => {
    const item = await newChain();
    const body = { type: "inspection", answers: await answersFor(hand, item.id, null), measurements: { linkThickness: 0.36 }, verdict: "in_service" };
    expect((await planner.post(`/api/v1/items/${item.id}/events`, body)).status).toBe(403);
    expect((await hand.post(`/api/v1/items/${item.id}/events`, body)).status).toBe(403);
    const ok = await designatedHand.post(`/api/v1/items/${item.id}/events`, body);
    expect(ok.status).toBe(201);
    expect(ok.json.item.lastInspectedOn).toBe(new Date().toISOString().slice(0, 10));
  });

  it("will not keep in service an item measured past its limit", async () => {
    const item = await newChain();
    const answers = await answersFor(hand, item.id, null);
    const worn = await org.owner.post(`/api/v1/items/${item.id}/events`, { type: "inspection", answers, measurements: { linkThickness: 0.33 }, verdict: "in_service" });
    expect(worn.status).toBe(400);
    expect(worn.json.issues[0].path).toBe("verdict");
    expect(worn.json.error).toMatch(/below 0.342 in/);
    const retired = await org.owner.post(`/api/v1/items/${item.id}/events`, { type: "inspection", answers, measurements: { linkThickness: 0.33 }, verdict: "retire" });
    expect(retired.json.item.status).toBe("retired");
  });

  it("returns a tagged-out item to service only by a designated person, with a reason", async () => {
    const item = await newChain();
    await hand.post(`/api/v1/items/${item.id}/events`, { type: "tag_out", note: "Dropped off the deck" });
    expect((await hand.post(`/api/v1/items/${item.id}/events`, { type: "return_to_service", reason: "Looks fine" })).status).toBe(403);
    const noReason = await org.owner.post(`/api/v1/items/${item.id}/events`, { type: "return_to_service", reason: "" });
    expect(noReason.status).toBe(400);
    const ok = await designatedHand.post(`/api/v1/items/${item.id}/events`, { type: "return_to_service", reason: "Inspected: no damage from the drop" });
    expect(ok.json.item.status).toBe("in_service");
  });
});

describe("the service history is append-only", () => {
  it("refuses to edit or delete an event, and keeps corrections as new events", async () => {
    const item = await newChain();
    const [created] = (await hand.get(`/api/v1/items/${item.id}/events`)).json.data;
    for (const method of ["PATCH", "PUT", "DELETE"]) {
      const res = await hand.request(method, `/api/v1/items/${item.id}/events/${created.id}`, { note: "changed" });
      expect(res.status).toBe(405);
      expect(res.json.error).toMatch(/append-only/);
    }
    // Not even the database lets a row change.
    await expect(testDb("item_events").where({ id: created.id }).update({ note: "changed" })).rejects.toThrow(/append-only/);
    await expect(testDb("item_events").where({ id: created.id }).delete()).rejects.toThrow(/append-only/);
    const fix = await hand.post(`/api/v1/items/${item.id}/events`, { type: "correction", eventId: created.id, note: "It was put in service a week earlier" });
    expect(fix.status).toBe(201);
    const events = (await hand.get(`/api/v1/items/${item.id}/events`)).json.data;
    expect(events[0]).toMatchObject({ type: "correction", correctsEventId: created.id });
    expect(events[1]).toMatchObject({ id: created.id, type: "created", note: created.note });
  });
});

describe("uploads", () => {
  const PDF = new Blob([Buffer.from("%PDF-1.4\n% test certificate\n")], { type: "application/pdf" });

  it("stores a certificate in the bucket and serves it to the organisation only", async () => {
    const item = await newChain();
    const action = discoveredActions().get("app/(app)/items/[id]/actions.ts#certificateAction")!;
    const text = await callAction(planner, { ...action, page: `/items/${item.id}` }, { itemId: item.id, certificate: new File([PDF], "cert.pdf", { type: "application/pdf" }) });
    expect(text).toContain("Document stored with the item.");
    const row = await testDb("attachments").where({ item_id: item.id }).first("id", "storage_key", "size_bytes", "content_type");
    expect(row).toMatchObject({ content_type: "application/pdf", size_bytes: PDF.size });
    expect(await objectCount(row.storage_key)).toBe(1);
    const file = await hand.get(`/api/v1/attachments/${row.id}`);
    expect(file.status).toBe(200);
    expect(file.text).toContain("%PDF-1.4");
    const stranger = (await newOrganisation()).owner;
    expect((await stranger.get(`/api/v1/attachments/${row.id}`)).status).toBe(404);
  });

  it("refuses a file that is not what it claims, or too big, storing nothing", async () => {
    const item = await newChain();
    const action = discoveredActions().get("app/(app)/items/[id]/actions.ts#certificateAction")!;
    const at = { ...action, page: `/items/${item.id}` };
    const before = await objectCount(`${org.organisationId}/`);
    const fake = await callAction(planner, at, { itemId: item.id, certificate: new File(["MZ not a pdf"], "cert.pdf", { type: "application/pdf" }) });
    expect(fake).toContain("This file is not a PDF (or a JPEG or PNG scan) up to 15 MB.");
    const big = new Uint8Array(15 * 1024 * 1024 + 10);
    big.set(Buffer.from("%PDF-"));
    const tooBig = await callAction(planner, at, { itemId: item.id, certificate: new File([big], "huge.pdf", { type: "application/pdf" }) });
    expect(tooBig).toContain("The file is 15.0 MB");
    expect(await countRows("attachments", { item_id: item.id })).toBe(0);
    expect(await objectCount(`${org.organisationId}/`)).toBe(before);
  });

  it("removes a stored photo when the record it belongs to cannot be written", async () => {
    const item = await newChain();
    await hand.post(`/api/v1/items/${item.id}/events`, { type: "tag_out", note: "Bent handle" });
    const action = discoveredActions().get("app/(app)/items/[id]/actions.ts#itemEventAction")!;
    const before = await objectCount(`${org.organisationId}/damage-photo/`);
    const jpeg = new File([new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3, 4])], "damage.jpg", { type: "image/jpeg" });
    // A second damage report: the photo is stored first, then the tag-out is refused (already tagged out).
    const fields: Record<string, string | Blob> = { type: "tag_out", itemId: item.id, note: "still bent", photo: jpeg };
    const text = await callAction(hand, { ...action, page: `/items/${item.id}` }, fields);
    expect(text).toContain("This item is tagged out");
    expect(await objectCount(`${org.organisationId}/damage-photo/`)).toBe(before);
    expect(await countRows("attachments", { item_id: item.id })).toBe(0);
  });
});
