import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addMember, BASE_URL, Client, newOrganisation } from "../support/http";
import { testDb } from "../support/db";

// Load checks saved by name: POST/GET /api/v1/securement-checks/saved, GET/PUT/DELETE
// …/saved/{id}, and the print page /checks/{id}/print (under app/(print), so the route
// matrix does not walk it: its roles are tested here, as tags.test.ts does for the tag sheet).
// Decision: every role saves, lists, opens and prints; the person who saved a check, an
// owner or a planner may change or delete it; another organisation's check is not found.

const lb = (value: number) => ({ value, unit: "lb" });
const corner = (label: string, binderWll?: number) => ({
  label,
  attachment: "direct",
  components: [
    { type: "chain", grade: 70, size: "3/8 in" },
    { type: "binder", chainSizeRange: ["5/16 in", "3/8 in"], ...(binderWll ? { wll: lb(binderWll) } : {}) },
    { type: "anchor", wll: lb(6600) },
  ],
});
/** A 12,000 lb excavator on four corners; without binder WLLs it does not meet the rule. */
const request = (binderWll?: number) => ({
  cargo: { weight: lb(12000), length: { value: 19, unit: "ft" }, kind: "machine" },
  tiedowns: ["front left", "front right", "rear left", "rear right"].map((l) => corner(l, binderWll)),
});

let org: Awaited<ReturnType<typeof newOrganisation>>;
let planner: Client;
let hand: Client;
let otherHand: Client;
let outsider: Client;

beforeAll(async () => {
  org = await newOrganisation("Saved Checks Co");
  planner = (await addMember(org.owner, "planner")).client;
  hand = (await addMember(org.owner, "yard_hand")).client;
  otherHand = (await addMember(org.owner, "yard_hand")).client;
  outsider = (await newOrganisation("Elsewhere Co")).owner;
}, 60_000);

afterAll(() => testDb.destroy());

describe("saving and opening", () => {
  it("a yard hand saves a check by name; the answer is the check's own answer, worked out again", async () => {
    const res = await hand.post("/api/v1/securement-checks/saved", { name: "  Unit 12 on the tilt deck ", request: request() });
    expect(res.status).toBe(201);
    expect(res.json).toMatchObject({ name: "Unit 12 on the tilt deck", passAtSave: false, mayChange: true, request: request() });
    expect(res.json.result.pass).toBe(false);
    expect(res.json.result.findings.filter((f: { code: string }) => f.code === "MISSING_WLL")).toHaveLength(4);
    const audit = await testDb("audit_log").where({ entity: "saved_check", entity_id: res.json.id }).select("action", "actor_id");
    expect(audit.map((a) => a.action)).toEqual(["saved_check.saved"]);

    const list = await planner.get("/api/v1/securement-checks/saved");
    expect(list.status).toBe(200);
    expect(list.json.data).toEqual([expect.objectContaining({ id: res.json.id, name: "Unit 12 on the tilt deck", passAtSave: false, mayChange: true })]);
    const open = await otherHand.get(`/api/v1/securement-checks/saved/${res.json.id}`);
    expect(open.status).toBe(200);
    expect(open.json).toMatchObject({ id: res.json.id, mayChange: false, request: request() });
    expect(open.json.result.aggregateWllLb).toBe(0);
  });

  it("refuses a name already used in the organisation (any case) with 409, and bad input with 400 at its path", async () => {
    await planner.post("/api/v1/securement-checks/saved", { name: "Skid steer", request: request(5400) });
    const again = await hand.post("/api/v1/securement-checks/saved", { name: "SKID STEER", request: request(5400) });
    expect(again.status).toBe(409);
    expect(again.json.issues).toEqual([{ path: "name", message: "This name is already used by a saved check." }]);
    const bad = await hand.post("/api/v1/securement-checks/saved", { name: "", request: { ...request(), cargo: { ...request().cargo, weight: lb(-1) } } });
    expect(bad.status).toBe(400);
    expect(bad.json.issues.map((i: { path: string }) => i.path)).toEqual(["name", "request.cargo.weight.value"]);
    expect(await testDb("saved_checks").where({ organisation_id: org.organisationId }).whereRaw("lower(name) = 'skid steer'").count()).toEqual([{ count: "1" }]);
  });
});

describe("who may change or delete", () => {
  it("the person who saved it, an owner or a planner; not another yard hand", async () => {
    const saved = (await hand.post("/api/v1/securement-checks/saved", { name: "Mini ex", request: request() })).json;
    const url = `/api/v1/securement-checks/saved/${saved.id}`;

    const refused = await otherHand.request("PUT", url, { name: "Mini ex", request: request(5400) });
    expect(refused.status).toBe(403);
    expect(refused.json.error).toBe("Only the person who saved this check, an owner or a planner may change or delete it.");
    expect((await otherHand.delete(url)).status).toBe(403);

    const own = await hand.request("PUT", url, { name: "Mini ex, binders entered", request: request(5400) });
    expect(own.status).toBe(200);
    expect(own.json).toMatchObject({ name: "Mini ex, binders entered", passAtSave: true });
    expect(own.json.result.pass).toBe(true);
    const byPlanner = await planner.request("PUT", url, { name: "Mini ex, checked by the planner", request: request(5400) });
    expect(byPlanner.status).toBe(200);
    const row = await testDb("saved_checks").where({ id: saved.id }).first("name", "pass_at_save", "created_by", "updated_by");
    expect(row).toMatchObject({ name: "Mini ex, checked by the planner", pass_at_save: true });
    expect(row.updated_by).not.toBe(row.created_by);

    expect((await org.owner.delete(url)).status).toBe(200);
    expect((await hand.get(url)).status).toBe(404);
    const audit = await testDb("audit_log").where({ entity: "saved_check", entity_id: saved.id }).orderBy("id").pluck("action");
    expect(audit).toEqual(["saved_check.saved", "saved_check.updated", "saved_check.updated", "saved_check.deleted"]);
  });

  it("renaming onto another check's name is refused, and nothing changes", async () => {
    const a = (await hand.post("/api/v1/securement-checks/saved", { name: "Roller A", request: request() })).json;
    await hand.post("/api/v1/securement-checks/saved", { name: "Roller B", request: request() });
    const res = await hand.request("PUT", `/api/v1/securement-checks/saved/${a.id}`, { name: "roller b", request: request(5400) });
    expect(res.status).toBe(409);
    expect(await testDb("saved_checks").where({ id: a.id }).first("name", "pass_at_save")).toEqual({ name: "Roller A", pass_at_save: false });
  });
});

describe("another organisation", () => {
  it("cannot list, open, change, delete or print this organisation's checks", async () => {
    const saved = (await planner.post("/api/v1/securement-checks/saved", { name: "Private plan", request: request(5400) })).json;
    const url = `/api/v1/securement-checks/saved/${saved.id}`;
    expect((await outsider.get("/api/v1/securement-checks/saved")).json.data.map((c: { id: string }) => c.id)).not.toContain(saved.id);
    expect((await outsider.get(url)).status).toBe(404);
    expect((await outsider.request("PUT", url, { name: "Mine now", request: request() })).status).toBe(404);
    expect((await outsider.delete(url)).status).toBe(404);
    expect((await outsider.get(`/checks/${saved.id}/print`)).status).toBe(404);
    expect(await testDb("saved_checks").where({ id: saved.id }).first("name")).toEqual({ name: "Private plan" });
  });
});

describe("the print page /checks/{id}/print", () => {
  let id: string;
  beforeAll(async () => {
    id = (await hand.post("/api/v1/securement-checks/saved", { name: "Print me", request: request() })).json.id;
  });

  it("sends a stranger to sign-in", async () => {
    const res = await fetch(`${BASE_URL}/checks/${id}/print`, { redirect: "manual" });
    expect(res.status).toBe(307);
    expect(res.headers.get("location")).toMatch(/\/sign-in$/);
  });

  it("opens for every role, with the answer, the grouped findings and the caution", async () => {
    for (const client of [org.owner, planner, hand, otherHand]) {
      const res = await client.get(`/checks/${id}/print`);
      expect(res.status).toBe(200);
      expect(res.text).toContain("Print me");
      expect(res.text).toContain("Does not meet the published minimums");
      // four binders without a WLL: one finding naming the four tiedowns
      expect(res.text).toContain("Tiedowns 1 (front left), 2 (front right), 3 (rear left) and 4 (rear right), component 2: A binder must carry a marked WLL");
      expect(res.text).toContain("does not replace the driver&#x27;s own inspection");
    }
  });

  it("answers 404 for an unknown or malformed id", async () => {
    expect((await hand.get("/checks/00000000-0000-4000-8000-000000000000/print")).status).toBe(404);
    expect((await hand.get("/checks/nonsense/print")).status).toBe(404);
  });
});
