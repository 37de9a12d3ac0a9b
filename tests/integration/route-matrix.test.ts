import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addMember, BASE_URL, Client, newOrganisation } from "../support/http";
import { callAction as callActionAt, discoveredActions, type ActionRef } from "../support/actions";
import { testDb } from "../support/db";
import { makeKit, makeMachine, makeTrailer } from "../support/fleet";

// Every route handler, page and server action, walked with every role, with no session and
// with a person of another organisation. The tables below are the expected access, written
// out literally; a route, page or action missing from them fails the coverage tests.

type Role = "owner" | "planner" | "yard_hand";
type Access = "public" | Role[];
const ALL: Role[] = ["owner", "planner", "yard_hand"];
const OWNER: Role[] = ["owner"];
const EDITORS: Role[] = ["owner", "planner"];

const API: Record<string, Access> = {
  "GET /api/health": "public",
  "POST /api/v1/sessions": "public",
  "DELETE /api/v1/sessions": "public",
  "POST /api/v1/signups": "public",
  "POST /api/v1/signups/confirm": "public",
  // One-click unsubscribe (RFC 8058): the signed token is the authority, no session.
  "GET /api/v1/unsubscribe/[token]": "public",
  "POST /api/v1/unsubscribe/[token]": "public",
  "GET /api/v1/me": ALL,
  "GET /api/v1/people": OWNER,
  "PATCH /api/v1/people/[id]": OWNER,
  "GET /api/v1/invites": OWNER,
  "POST /api/v1/invites": OWNER,
  "DELETE /api/v1/invites/[id]": OWNER,
  "POST /api/v1/invites/accept": "public",
  "POST /api/v1/password-resets": "public",
  "POST /api/v1/password-resets/confirm": "public",
  "GET /api/v1/items": ALL,
  "POST /api/v1/items": EDITORS,
  "GET /api/v1/items/[id]": ALL,
  "PUT /api/v1/items/[id]": EDITORS,
  "GET /api/v1/items/[id]/events": ALL,
  "POST /api/v1/items/[id]/events": ALL, // the service checks the role per event type
  "PUT /api/v1/items/[id]/events/[eventId]": ALL, // answers 405: history is append-only
  "PATCH /api/v1/items/[id]/events/[eventId]": ALL,
  "DELETE /api/v1/items/[id]/events/[eventId]": ALL,
  "POST /api/v1/items/move": EDITORS,
  "GET /api/v1/yards": ALL,
  "GET /api/v1/attachments/[id]": ALL,
  "POST /api/v1/securement-checks": ALL,
  // Saved checks: every role may save, list and open them (every role may run checks); the
  // handler lets the person who saved one, an owner or a planner change or delete it.
  "GET /api/v1/securement-checks/saved": ALL,
  "POST /api/v1/securement-checks/saved": ALL,
  "GET /api/v1/securement-checks/saved/[id]": ALL,
  "PUT /api/v1/securement-checks/saved/[id]": ALL,
  "DELETE /api/v1/securement-checks/saved/[id]": ALL,
  "GET /api/v1/ratings": ALL,
  "GET /api/v1/tags/[code]": ALL,
  // CSV import: owners only ("stock.import").
  "GET /api/v1/imports": OWNER,
  "POST /api/v1/imports": OWNER,
  "GET /api/v1/imports/[id]": OWNER,
  "POST /api/v1/imports/[id]/undo": OWNER,
  "GET /api/v1/imports/[id]/file": OWNER,
  "GET /api/v1/imports/[id]/rejected.csv": OWNER,
  "GET /api/v1/imports/template.csv": OWNER,
  "GET /api/v1/imports/mappings": OWNER,
  "POST /api/v1/imports/mappings": OWNER,
  "DELETE /api/v1/imports/mappings/[id]": OWNER,
  // The export is a read, but a full copy of the register with costs, made for editing and
  // importing back: owners and planners ("stock.edit"); a yard hand reads stock on screen.
  "GET /api/v1/items/export.csv": EDITORS,
  // Machines, trailers and kits: planners and owners build ("fleet.manage"), everyone looks.
  "GET /api/v1/machines": ALL,
  "POST /api/v1/machines": EDITORS,
  "GET /api/v1/machines/[id]": ALL,
  "PUT /api/v1/machines/[id]": EDITORS,
  "GET /api/v1/machine-classes": ALL,
  "POST /api/v1/machine-classes": OWNER,
  "GET /api/v1/trailers": ALL,
  "POST /api/v1/trailers": EDITORS,
  "GET /api/v1/trailers/[id]": ALL,
  "PUT /api/v1/trailers/[id]": EDITORS,
  "GET /api/v1/anchor-points/[id]/events": ALL,
  "POST /api/v1/anchor-points/[id]/events": ALL, // anyone takes a point out of use; the service checks the role per type
  "GET /api/v1/kits": ALL,
  "POST /api/v1/kits": EDITORS,
  "GET /api/v1/kits/[id]": ALL,
  "PATCH /api/v1/kits/[id]": EDITORS,
  "POST /api/v1/kits/[id]/tiedowns": EDITORS,
  "PATCH /api/v1/kits/[id]/tiedowns/[tiedownId]": EDITORS,
  "DELETE /api/v1/kits/[id]/tiedowns/[tiedownId]": EDITORS,
  "POST /api/v1/kits/[id]/tiedowns/[tiedownId]/items": EDITORS,
  "DELETE /api/v1/kits/[id]/tiedowns/[tiedownId]/items/[itemId]": EDITORS,
  "POST /api/v1/kits/[id]/corners": EDITORS,
  "GET /api/v1/kits/[id]/free-items": ALL,
  "POST /api/v1/kits/[id]/transitions": ALL, // yard hands load and return ("kits.load"); the service checks ready/draft
  "POST /api/v1/kits/[id]/copies": EDITORS,
  "PUT /api/v1/kits/[id]/placement": EDITORS,
  "POST /api/v1/kits/[id]/proposal": EDITORS, // with or without ?apply=true
  // The inspection and service record: owners, and designated persons of any role (the
  // matrix's planner and yard hand are not designated; tests/integration/owner-reports.test.ts
  // lets a designated yard hand in). The audit log: owners only.
  "GET /api/v1/records": OWNER,
  "GET /api/v1/audit": OWNER,
};

const PAGES: Record<string, Access> = {
  "/": ALL,
  "/stock": ALL,
  "/people": OWNER,
  "/settings": OWNER,
  "/audit": OWNER,
  "/records": OWNER, // or a designated person of any role
  "/more": ALL,
  "/stock/new": EDITORS,
  "/items/[id]": ALL,
  "/items/[id]/check": ALL,
  "/items/[id]/inspect": OWNER, // or a designated person of any role
  "/items/[id]/edit": EDITORS,
  "/check": ALL,
  "/ratings": ALL,
  "/scan": ALL,
  "/stock/import": OWNER,
  "/stock/import/history": OWNER,
  "/stock/import/[batchId]": OWNER,
  "/kits": ALL,
  "/kits/new": EDITORS,
  "/kits/[id]": ALL,
  "/kits/[id]/load": ALL,
  "/machines": ALL,
  "/machines/new": EDITORS,
  "/machines/[id]": ALL,
  "/trailers": ALL,
  "/trailers/new": EDITORS,
  "/trailers/[id]": ALL,
  "/preferences": ALL,
};

const ACTIONS: Record<string, Access> = {
  "app/(auth)/actions.ts#signInAction": "public",
  "app/(auth)/actions.ts#signUpAction": "public",
  "app/(auth)/actions.ts#acceptInviteAction": "public",
  "app/(auth)/actions.ts#requestResetAction": "public",
  "app/(auth)/actions.ts#resetPasswordAction": "public",
  "app/(auth)/actions.ts#signOutAction": "public",
  "app/(auth)/actions.ts#confirmSignUpAction": "public",
  "app/(auth)/actions.ts#unsubscribeAction": "public",
  "app/(app)/preferences/actions.ts#savePreferencesAction": ALL,
  "app/(app)/people/actions.ts#inviteAction": OWNER,
  "app/(app)/people/actions.ts#updatePersonAction": OWNER,
  "app/(app)/people/actions.ts#withdrawInviteAction": OWNER,
  "app/(app)/settings/actions.ts#saveOrganisationAction": OWNER,
  "app/(app)/settings/actions.ts#createTokenAction": OWNER,
  "app/(app)/settings/actions.ts#revokeTokenAction": OWNER,
  "app/(app)/settings/actions.ts#saveIntervalsAction": OWNER,
  "app/(app)/settings/actions.ts#saveUnitsAction": OWNER,
  "app/(app)/settings/actions.ts#saveDigestTimeAction": OWNER,
  "app/(app)/settings/actions.ts#resendMailAction": OWNER,
  "app/(app)/stock/actions.ts#createItemAction": EDITORS,
  "app/(app)/stock/actions.ts#editItemAction": EDITORS,
  "app/(app)/items/[id]/actions.ts#itemEventAction": ALL,
  "app/(app)/items/[id]/actions.ts#certificateAction": EDITORS,
};

const ROOT = path.resolve(__dirname, "../..");

/**
 * What a permitted call may answer here (an empty body, and an id that names nothing): 2xx,
 * a redirect, 400 for the missing input, 404 for the unknown id, 405 for the append-only
 * history. Anything else, a 500 above all, fails.
 */
const ALLOWED_ANSWERS = [200, 201, 202, 204, 301, 302, 303, 307, 308, 400, 404, 405];

function walk(dir: string, file: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return walk(full, file);
    return name === file ? [full] : [];
  });
}

function discoveredApi(): string[] {
  return walk(path.join(ROOT, "app/api"), "route.ts").flatMap((file) => {
    const url = "/" + path.relative(path.join(ROOT, "app"), path.dirname(file)).split(path.sep).join("/");
    const source = readFileSync(file, "utf8");
    return [...source.matchAll(/export (?:const|async function) (GET|POST|PUT|PATCH|DELETE)\b/g)].map((m) => `${m[1]} ${url}`);
  });
}

function discoveredPages(): string[] {
  return walk(path.join(ROOT, "app/(app)"), "page.tsx").map((file) => {
    const rel = path.relative(path.join(ROOT, "app/(app)"), path.dirname(file)).split(path.sep).join("/");
    return "/" + rel;
  }).map((p) => (p === "/" ? "/" : p.replace(/\/$/, "")));
}

const NIL = "00000000-0000-4000-8000-000000000000";
const fill = (p: string) =>
  p.replace("[id]", NIL).replace("[tiedownId]", NIL).replace("[itemId]", NIL).replace("[eventId]", "1").replace("[code]", "3333-4444");
/** Pages and action targets need a real row of the walking organisation: an item, a kit, a machine… */
const fillPage = (p: string) => {
  const id = p.startsWith("/kits/") ? own.kitId : p.startsWith("/machines/") ? own.machineId : p.startsWith("/trailers/") ? own.trailerId : ownItemId;
  return p.replace("[id]", id).replace("[batchId]", ownBatchId);
};
const callAction = (client: Client, action: ActionRef, fields: Record<string, string> = {}) =>
  callActionAt(client, { ...action, page: fillPage(action.page) }, fields);

let clients: Record<Role | "anonymous", Client>;
let outsider: Client;
let victim: { organisationId: string; plannerId: string; inviteId: string };
let ownItemId: string;
let ownBatchId: string;
const own = { kitId: "", machineId: "", trailerId: "" };

beforeAll(async () => {
  const org = await newOrganisation("Matrix Co");
  const planner = await addMember(org.owner, "planner");
  const hand = await addMember(org.owner, "yard_hand");
  clients = { owner: org.owner, planner: planner.client, yard_hand: hand.client, anonymous: new Client() };
  const other = await newOrganisation("Other Co");
  outsider = other.owner;
  const pending = await org.owner.post("/api/v1/invites", { email: `pending-${Date.now()}@linkyard-test.example`, role: "planner" });
  victim = { organisationId: org.organisationId, plannerId: planner.userId, inviteId: pending.json.id };
  const item = await org.owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8" });
  if (item.status !== 201) throw new Error(`item: ${item.status} ${item.text}`);
  ownItemId = item.json.id;
  const csv = new FormData();
  csv.append("file", new Blob(["Kind,Grade,Size\nchain,70,3/8\n"], { type: "text/csv" }), "matrix.csv");
  const batch = await org.owner.post("/api/v1/imports", csv);
  if (batch.status !== 201) throw new Error(`import: ${batch.status} ${batch.text}`);
  ownBatchId = batch.json.batchId;
  const machine = await makeMachine(org.owner);
  const trailer = await makeTrailer(org.owner);
  const kit = await makeKit(org.owner, { date: "2030-01-02", machineId: machine.id, trailerId: trailer.id });
  Object.assign(own, { kitId: kit.id, machineId: machine.id, trailerId: trailer.id });
}, 60_000);

afterAll(() => testDb.destroy());

describe("coverage", () => {
  it("every route handler has a row", () => {
    expect(discoveredApi().sort()).toEqual(Object.keys(API).sort());
  });
  it("every signed-in page has a row", () => {
    expect(discoveredPages().sort()).toEqual(Object.keys(PAGES).sort());
  });
  it("every server action has a row", () => {
    expect([...discoveredActions().keys()].sort()).toEqual(Object.keys(ACTIONS).sort());
  });
});

describe("route handlers", () => {
  for (const [key, access] of Object.entries(API)) {
    if (access === "public") continue;
    const [method, pattern] = key.split(" ");
    it(`${key}: 401 without a session`, async () => {
      const res = await clients.anonymous.request(method, fill(pattern), method === "GET" ? undefined : {});
      expect(res.status).toBe(401);
      expect(res.json.error).toBe("Sign in first.");
    });
    for (const role of ALL) {
      const allowed = access.includes(role);
      it(`${key}: ${role} is ${allowed ? "let through" : "refused with 403"}`, async () => {
        const res = await clients[role].request(method, fill(pattern), method === "GET" ? undefined : {});
        if (allowed) {
          // Through the role check to the handler: a success, or a refusal of the empty input
          // or the unknown id in the API's own shape. Never a 500.
          expect(ALLOWED_ANSWERS, `${key} answered ${res.status}: ${res.text.slice(0, 200)}`).toContain(res.status);
          if (res.status >= 400) expect(typeof res.json?.error).toBe("string");
        } else {
          expect(res.status).toBe(403);
          expect(res.json.error).toBe("Your role does not allow this.");
        }
      });
    }
  }
});

describe("pages", () => {
  for (const [page, access] of Object.entries(PAGES)) {
    it(`${page}: sends a stranger to sign-in`, async () => {
      const res = await fetch(BASE_URL + fillPage(page), { redirect: "manual" });
      expect(res.status).toBe(307);
      expect(res.headers.get("location")).toMatch(/\/sign-in$/);
    });
    for (const role of ALL) {
      const allowed = access === "public" || access.includes(role);
      it(`${page}: ${role} gets ${allowed ? 200 : 403}`, async () => {
        const res = await clients[role].get(fillPage(page));
        expect(res.status).toBe(allowed ? 200 : 403);
      });
    }
  }
});

describe("server actions", () => {
  for (const [key, access] of Object.entries(ACTIONS)) {
    if (access === "public") continue;
    it(`${key}: refuses without a session`, async () => {
      const id = discoveredActions().get(key)!;
      expect(await callAction(clients.anonymous, id)).toContain("Your session has ended. Sign in again.");
    });
    for (const role of ALL) {
      const allowed = access.includes(role);
      it(`${key}: ${role} is ${allowed ? "let through" : "refused"}`, async () => {
        const id = discoveredActions().get(key)!;
        const text = await callAction(clients[role], id);
        if (allowed) {
          expect(text).not.toContain("Your role does not allow this.");
          expect(text).not.toContain("Your session has ended.");
          expect(text).toMatch(/"fieldErrors":\{"/); // empty form: refused on input (a field named), not on role
        } else expect(text).toContain("Your role does not allow this.");
      });
    }
  }
});

describe("another organisation", () => {
  it("cannot see or change this organisation's people", async () => {
    const list = await outsider.get("/api/v1/people");
    expect(list.json.data.map((p: { id: string }) => p.id)).not.toContain(victim.plannerId);
    const patch = await outsider.patch(`/api/v1/people/${victim.plannerId}`, { role: "owner" });
    expect(patch.status).toBe(404);
    const row = await testDb("users").where({ id: victim.plannerId }).first("role");
    expect(row.role).toBe("planner");
  });

  it("cannot withdraw this organisation's invite", async () => {
    const res = await outsider.delete(`/api/v1/invites/${victim.inviteId}`);
    expect(res.status).toBe(404);
    const row = await testDb("invites").where({ id: victim.inviteId }).first("revoked_at");
    expect(row.revoked_at).toBeNull();
    const list = await outsider.get("/api/v1/invites");
    expect(list.json.data.map((i: { id: string }) => i.id)).not.toContain(victim.inviteId);
  });

  it("cannot change this organisation's people through the form action either", async () => {
    const id = discoveredActions().get("app/(app)/people/actions.ts#updatePersonAction")!;
    const text = await callAction(outsider, id, { userId: victim.plannerId, role: "owner" });
    expect(text).toContain("No such person in your organisation.");
    const row = await testDb("users").where({ id: victim.plannerId }).first("role");
    expect(row.role).toBe("planner");
  });
});

describe("another organisation's e-mail", () => {
  it("cannot be sent again from outside, and stays failed", async () => {
    const [row] = await testDb("mail_messages")
      .insert({ organisation_id: victim.organisationId, kind: "invite", idempotency_key: `matrix-failed-${Date.now()}`, to_address: "x@linkyard-test.example", subject: "Failed", body: "b", status: "failed", failed_at: new Date() })
      .returning("id");
    const id = discoveredActions().get("app/(app)/settings/actions.ts#resendMailAction")!;
    expect(await callAction(outsider, id, { messageId: row.id })).toContain("No failed e-mail with that id.");
    expect((await testDb("mail_messages").where({ id: row.id }).first("status")).status).toBe("failed");
    expect((await outsider.get("/settings")).text).not.toContain(row.id);
  });
});

describe("another organisation's stock", () => {
  it("is not found, whatever the route, and stays unchanged", async () => {
    const before = await testDb("items").where({ id: ownItemId }).first("status", "serial");
    expect((await outsider.get(`/api/v1/items/${ownItemId}`)).status).toBe(404);
    expect((await outsider.get(`/api/v1/items/${ownItemId}/events`)).status).toBe(404);
    expect((await outsider.request("PUT", `/api/v1/items/${ownItemId}`, { kind: "chain", marking: "grade", grade: 70, size: "3/8", serial: "X" })).status).toBe(404);
    expect((await outsider.post(`/api/v1/items/${ownItemId}/events`, { type: "tag_out", note: "mine now" })).status).toBe(404);
    expect((await outsider.get(`/items/${ownItemId}`)).status).toBe(404);
    const list = await outsider.get("/api/v1/items?perPage=100");
    expect(list.json.data.map((i: { id: string }) => i.id)).not.toContain(ownItemId);
    expect(await testDb("items").where({ id: ownItemId }).first("status", "serial")).toEqual(before);
  });
});

describe("last owner", () => {
  it("cannot be demoted", async () => {
    const org = await newOrganisation();
    const res = await org.owner.patch(`/api/v1/people/${org.userId}`, { role: "planner" });
    expect(res.status).toBe(400);
    expect(res.json.issues).toEqual([{ path: "role", message: "The organisation needs at least one active owner." }]);
  });
});
