import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addMember, BASE_URL, Client, newOrganisation } from "../support/http";
import { testDb } from "../support/db";
import { anchorId, day, makeBinder, makeChain, makeKit, makeMachine, makeTrailer } from "../support/fleet";

// The load sheet /kits/{id}/sheet is a page made for paper under app/(print): the route
// matrix walks only app/(app), so its access is tested here, as the tag sheet's is.

let owner: Client;
let planner: Client;
let hand: Client;
let outsider: Client;
let kit: any;
let tagCodes: string[];

beforeAll(async () => {
  const org = await newOrganisation("Sheet Co");
  owner = org.owner;
  planner = (await addMember(owner, "planner")).client;
  hand = (await addMember(owner, "yard_hand")).client;
  outsider = (await newOrganisation("Other Sheet Co")).owner;
  const machine = await makeMachine(planner);
  const trailer = await makeTrailer(planner, { hitchToDeckFront: { value: 1.5, unit: "m" } });
  kit = await makeKit(planner, { date: day(60), machineId: machine.id, trailerId: trailer.id, job: "Sheet test job" });
  const chain = await makeChain(planner);
  const binder = await makeBinder(planner);
  tagCodes = [chain.tagCode, binder.tagCode];
  const res = await planner.post(`/api/v1/kits/${kit.id}/tiedowns`, { label: "front left", anchorPointId: anchorId(trailer, "FL"), attachment: "direct", itemIds: [chain.id, binder.id] });
  expect(res.status).toBe(201);
  expect((await planner.request("PUT", `/api/v1/kits/${kit.id}/placement`, { machineFrontFromDeckFront: { value: 300, unit: "mm" } })).status).toBe(200);
}, 60_000);

afterAll(() => testDb.destroy());

describe("the load sheet /kits/{id}/sheet", () => {
  it("sends a stranger to sign-in", async () => {
    const res = await fetch(`${BASE_URL}/kits/${kit.id}/sheet`, { redirect: "manual" });
    expect(res.status).toBe(307);
    expect(res.headers.get("location")).toMatch(/\/sign-in$/);
  });

  it("prints for every role of the organisation: the kit, its items by tag code, the figures, the driver's lines", async () => {
    for (const client of [owner, planner, hand]) {
      const res = await client.get(`/kits/${kit.id}/sheet`);
      expect(res.status).toBe(200);
      expect(res.text).toContain("Sheet test job");
      for (const code of tagCodes) expect(res.text).toContain(code);
      expect(res.text).toContain('data-testid="kit-qr"');
      expect(res.text).toContain("Tongue weight");
      expect(res.text).toContain("Driver&#x27;s name");
      expect(res.text).toContain("within the first 50 miles");
    }
  });

  it("prints on US Letter by default for an organisation in US units, and on A4 when asked", async () => {
    expect((await planner.get(`/kits/${kit.id}/sheet`)).text).toContain("@page { size: letter;");
    expect((await planner.get(`/kits/${kit.id}/sheet?paper=a4`)).text).toContain("@page { size: A4;");
    expect((await planner.get(`/kits/${kit.id}/sheet?paper=legal`)).text).toContain("@page { size: letter;");
  });

  it("is not found for another organisation, or for an id that is not a kit", async () => {
    expect((await outsider.get(`/kits/${kit.id}/sheet`)).status).toBe(404);
    expect((await planner.get("/kits/00000000-0000-4000-8000-000000000000/sheet")).status).toBe(404);
    expect((await planner.get("/kits/not-a-kit/sheet")).status).toBe(404);
  });
});
