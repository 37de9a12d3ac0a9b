import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addMember, BASE_URL, Client, newOrganisation, testAddress } from "../support/http";
import { countRows, testDb } from "../support/db";
import { newTagCode } from "@/lib/tags/code";
import { TAG_MISS_LIMIT } from "@/lib/tags/lookups";

// Tag codes through the API, the tag resolver (/t/{code}) with and without a session, the
// public tag view, its rate limit, and the printable tag sheet.

/**
 * A fresh client address per test, so that one test's misses never limit another. The test
 * server trusts 127.0.0.1 as its reverse proxy (scripts/test.sh), so the address the tests
 * put in X-Forwarded-For is the one a proxy would report; a direct caller's header is not
 * believed (forwarded.test.ts).
 */
const freshIp = () => testAddress();

async function insertItem(organisationId: string, extra: Record<string, unknown> = {}) {
  const tagCode = newTagCode();
  const [row] = await testDb("items")
    .insert({
      organisation_id: organisationId,
      tag_code: tagCode,
      kind: "chain",
      grade: 70,
      size: "3/8",
      length_mm: 6096,
      status: "in_service",
      wll_lb: 6600,
      marked_wll_lb: 6600,
      wll_source: "marked",
      serial: `SER-${tagCode}`,
      last_inspected_on: "2026-10-14",
      ...extra,
    })
    .returning("id");
  return { id: row.id as string, tagCode };
}

let org: Awaited<ReturnType<typeof newOrganisation>>;
let hand: Client;
let planner: Client;
let other: Awaited<ReturnType<typeof newOrganisation>>;
let chain: { id: string; tagCode: string };
let unrated: { id: string; tagCode: string };
let othersChain: { id: string; tagCode: string };
const YARD_NAME = "Hidden Gulch Lot";

beforeAll(async () => {
  org = await newOrganisation("Tag Test Outfit");
  hand = (await addMember(org.owner, "yard_hand")).client;
  planner = (await addMember(org.owner, "planner")).client;
  other = await newOrganisation("Other Tag Outfit");
  const [yard] = await testDb("yards").insert({ organisation_id: org.organisationId, name: YARD_NAME }).returning("id");
  chain = await insertItem(org.organisationId, { yard_id: yard.id });
  unrated = await insertItem(org.organisationId, {
    kind: "binder", grade: null, size: "3/8", wll_lb: null, marked_wll_lb: null, status: "tagged_out",
    last_inspected_on: null, details: JSON.stringify({ mechanism: "ratchet", chainSizeRange: ["5/16", "3/8"] }),
  });
  othersChain = await insertItem(other.organisationId);
}, 60_000);

afterAll(() => testDb.destroy());

describe("GET /api/v1/tags/{code}", () => {
  it("answers the item summary for a tag of the caller's organisation", async () => {
    const res = await hand.get(`/api/v1/tags/${chain.tagCode}`);
    expect(res.status).toBe(200);
    expect(res.json).toEqual({
      id: chain.id,
      tagCode: chain.tagCode,
      kind: "chain",
      description: "Chain, grade 70, 3/8 in",
      grade: 70,
      size: "3/8",
      lengthMm: 6096,
      status: "in_service",
      statusLabel: "In service",
      wllLb: 6600,
      wllKg: 2994,
      wllSource: "marked",
      markedWllLb: 6600,
      serial: `SER-${chain.tagCode}`,
      yard: { id: expect.any(String), name: YARD_NAME },
      nextInspectionDue: null,
      lastCheckedAt: null,
      lastInspectedOn: "2026-10-14",
      // The verdict for the organisation's today: may be used, and no pre-use check yet.
      usable: { ok: true, reasons: [], check: { done: false, message: "No pre-use check on record: do one before you use it." } },
      url: `/items/${chain.id}`,
    });
  });

  it("takes the code as a person typed it: any case, no dash", async () => {
    const res = await planner.get(`/api/v1/tags/${chain.tagCode.toLowerCase().replace("-", "")}`);
    expect(res.status).toBe(200);
    expect(res.json.id).toBe(chain.id);
  });

  it("answers an item without a WLL with nulls, not a guess", async () => {
    const res = await org.owner.get(`/api/v1/tags/${unrated.tagCode}`);
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ wllLb: null, wllKg: null, status: "tagged_out", statusLabel: "Tagged out: do not use", description: "Ratchet binder, for 5/16–3/8 in chain" });
    expect(res.json.usable).toEqual({ ok: false, reasons: [expect.objectContaining({ code: "TAGGED_OUT" }), expect.objectContaining({ code: "NOT_RATED" })] });
  });

  it("answers another organisation's code exactly like an unknown one", async () => {
    const foreign = await hand.get(`/api/v1/tags/${othersChain.tagCode}`);
    let unknownCode = newTagCode();
    while (unknownCode === othersChain.tagCode) unknownCode = newTagCode();
    const unknown = await hand.get(`/api/v1/tags/${unknownCode}`);
    expect(foreign.status).toBe(404);
    expect(unknown.status).toBe(404);
    expect(foreign.json).toEqual({ error: "No item has this tag code.", issues: [] });
    expect(foreign.text).toBe(unknown.text);
    expect(foreign.text).not.toContain(othersChain.id);
  });

  it("refuses a malformed code with 400", async () => {
    for (const bad of ["hello", "K7XM-3HQ0", "K7XM-3HQAA", "K7XM%203HQ"]) {
      const res = await hand.get(`/api/v1/tags/${bad}`);
      expect(res.status).toBe(400);
      expect(res.json.error).toBe("That is not a tag code.");
      expect(res.json.issues[0].path).toBe("code");
    }
  });

  it("answers 401 without a session", async () => {
    const res = await new Client().get(`/api/v1/tags/${chain.tagCode}`);
    expect(res.status).toBe(401);
    expect(res.json.error).toBe("Sign in first.");
  });
});

describe("the tag resolver /t/{code}", () => {
  const visit = (client: Client, code: string, ip = freshIp()) => client.get(`/t/${code}`, { "x-forwarded-for": ip });

  it("sends a stranger to sign-in while the organisation keeps its tags private (the default)", async () => {
    const res = await visit(new Client(), chain.tagCode);
    expect(res.status).toBe(307);
    // back to the tag after signing in
    expect(res.headers.get("location")).toMatch(new RegExp(`/sign-in\\?next=%2Ft%2F${chain.tagCode}$`));
  });

  it("sends a signed-in member of the organisation to the item", async () => {
    for (const client of [hand, planner, org.owner]) {
      const res = await visit(client, chain.tagCode);
      expect(res.status).toBe(307);
      expect(res.headers.get("location")).toBe(`/items/${chain.id}`);
    }
    const typed = await visit(hand, chain.tagCode.toLowerCase().replace("-", ""));
    expect(typed.headers.get("location")).toBe(`/items/${chain.id}`);
  });

  it("answers 404 in words to a signed-in person for an unknown code, and to anyone for text that is no code", async () => {
    const unknown = await visit(hand, newTagCode());
    expect(unknown.status).toBe(404);
    expect(unknown.text).toContain("No item has this tag code");
    for (const code of ["not-a-code", "K7XM-3HQ0"]) {
      const res = await visit(new Client(), code);
      expect(res.status).toBe(404);
      expect(res.text).toContain("No item has this tag code");
    }
  });

  it("sends a stranger to sign-in for an unknown code too, as for a private one (issue 11.11)", async () => {
    const code = newTagCode();
    const res = await visit(new Client(), code);
    expect(res.status).toBe(307);
    expect(res.headers.get("location")).toMatch(new RegExp(`/sign-in\\?next=%2Ft%2F${code}$`));
  });

  it("answers a member of another organisation like an unknown code while tags are private", async () => {
    const res = await visit(other.owner, chain.tagCode);
    expect(res.status).toBe(404);
    expect(res.text).toContain("No item has this tag code");
  });

  it("records every lookup by client address", async () => {
    const ip = freshIp();
    await visit(new Client(), chain.tagCode, ip);
    await visit(new Client(), newTagCode(), ip);
    expect(await countRows("tag_lookups", { ip, found: true })).toBe(1);
    expect(await countRows("tag_lookups", { ip, found: false })).toBe(1);
  });

  describe("with the public tag view on", () => {
    beforeAll(async () => {
      await testDb("organisations").where({ id: org.organisationId }).update({ public_tag_view: true });
    });
    afterAll(async () => {
      await testDb("organisations").where({ id: org.organisationId }).update({ public_tag_view: false });
    });

    it("shows a stranger only what the item is and whether it may be used", async () => {
      const res = await visit(new Client(), chain.tagCode);
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toContain("text/html");
      for (const words of ["Chain", "Grade", "70", "3/8 in", "WLL 6,600 lb", "Usable", "October 14, 2026", "not a substitute for the driver"]) {
        expect(res.text).toContain(words);
      }
      expect(res.text).not.toContain(`SER-${chain.tagCode}`); // no serial
      expect(res.text).not.toContain(YARD_NAME); // no location
      expect(res.text).not.toContain("Tag Test Outfit"); // nothing about the organisation
      expect(res.text).not.toContain(chain.id);
      expect(res.text).toContain('name="robots" content="noindex');
    });

    it("says plainly when an item has no WLL and is tagged out", async () => {
      const res = await visit(new Client(), unrated.tagCode);
      expect(res.status).toBe(200);
      expect(res.text).toContain("No WLL: do not use");
      expect(res.text).toContain("Do not use");
      expect(res.text).toContain("Tagged out: it may not be used until the owner or a designated person inspects it");
      expect(res.text).toContain("No working load limit: it cannot be counted in a tiedown.");
      expect(res.text).toContain("Ratchet binder");
      expect(res.text).toContain("None on record");
    });

    it("still sends a member to the item, and shows a member of another organisation the public view", async () => {
      expect((await visit(hand, chain.tagCode)).headers.get("location")).toBe(`/items/${chain.id}`);
      const outsider = await visit(other.owner, chain.tagCode);
      expect(outsider.status).toBe(200);
      expect(outsider.text).toContain("WLL 6,600 lb");
    });

    it(`answers 429 to an address after ${TAG_MISS_LIMIT} misses, even for a real code, and not to others`, async () => {
      const ip = freshIp();
      for (let i = 0; i < TAG_MISS_LIMIT; i++) {
        const res = await visit(new Client(), newTagCode(), ip);
        expect(res.status).toBe(307); // to sign-in, as for a private code
      }
      const limited = await visit(new Client(), chain.tagCode, ip);
      expect(limited.status).toBe(429);
      expect(limited.headers.get("retry-after")).toBe("600");
      expect(limited.text).toContain("Too many tag codes tried");
      expect(limited.text).not.toContain("WLL");
      const guess = await visit(new Client(), newTagCode(), ip);
      expect(guess.status).toBe(429);
      // Another address is not affected.
      expect((await visit(new Client(), chain.tagCode)).status).toBe(200);
    });

    it("never limits an address that only scans real tags", async () => {
      const ip = freshIp();
      for (let i = 0; i < TAG_MISS_LIMIT + 5; i++) {
        expect((await visit(new Client(), chain.tagCode, ip)).status).toBe(200);
      }
    });
  });
});

describe("the tag sheet /tags/sheet", () => {
  it("sends a stranger to sign-in", async () => {
    const res = await fetch(`${BASE_URL}/tags/sheet?ids=${chain.id}`, { redirect: "manual" });
    expect(res.status).toBe(307);
    expect(res.headers.get("location")).toMatch(/\/sign-in$/);
  });

  it("opens for every role (stock.view)", async () => {
    for (const client of [org.owner, planner, hand]) {
      const res = await client.get(`/tags/sheet?ids=${chain.id}`);
      expect(res.status).toBe(200);
      expect(res.text).toContain(chain.tagCode);
    }
    const picker = await hand.get("/tags/sheet");
    expect(picker.status).toBe(200);
    expect(picker.text).toContain("Make the tag sheet");
  });

  it("prints only the caller's items, and ignores unknown and malformed ids", async () => {
    const ids = [chain.id, othersChain.id, "00000000-0000-4000-8000-000000000000", "nonsense", unrated.id].join(",");
    const res = await hand.get(`/tags/sheet?layout=small-30&ids=${encodeURIComponent(ids)}`);
    expect(res.status).toBe(200);
    expect(res.text).toContain(chain.tagCode);
    expect(res.text).toContain(unrated.tagCode);
    expect(res.text).not.toContain(othersChain.tagCode);
    expect(res.text).toContain("WLL 6,600 lb");
    expect(res.text).toContain("No WLL: do not use");
    expect(res.text).toContain("2 tags on 1 sheet");
    expect(res.text).toContain("size: letter");
  });
});
