import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { TAG_MISS_LIMIT } from "@/lib/tags/lookups";
import { newTagCode } from "@/lib/tags/code";
import { config } from "@/lib/config";
import { countRows, testDb } from "../support/db";
import { newOrganisation, testAddress, uniqueEmail } from "../support/http";
import { freshLoopback, requestFrom } from "../support/peer";

// Who is calling, by network address. scripts/test.sh serves the app with TRUSTED_PROXIES
// set to 127.0.0.1: the tests may stand in for a reverse proxy on that address, and any other
// loopback address (127.0.x.y) is a client connecting directly, whose headers are not believed.

const PROXY = "127.0.0.1";
const SIGN_IN_IP_LIMIT = config.SIGN_IN_MAX_FAILURES * 4;

let item: { tagCode: string };

beforeAll(async () => {
  const org = await newOrganisation("Forwarded Co");
  const created = await org.owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8" });
  expect(created.status).toBe(201);
  item = { tagCode: created.json.tagCode };
});
afterAll(() => testDb.destroy());

describe("issue 11.2: X-Forwarded-For is trusted only from a configured proxy", () => {
  it("a direct caller cannot dodge the per-address sign-in limit by rotating X-Forwarded-For", async () => {
    const peer = freshLoopback();
    for (let i = 0; i < SIGN_IN_IP_LIMIT; i++) {
      const res = await requestFrom(peer, "POST", "/api/v1/sessions", {
        headers: { "x-forwarded-for": `203.0.113.${i + 1}` },
        body: { email: uniqueEmail("nobody"), password: "wrong-password-1" },
      });
      expect(res.status).toBe(401);
    }
    const next = await requestFrom(peer, "POST", "/api/v1/sessions", {
      headers: { "x-forwarded-for": "203.0.113.250" },
      body: { email: uniqueEmail("nobody"), password: "wrong-password-1" },
    });
    expect(next.status).toBe(429);
    expect(next.json.error).toMatch(/Too many failed sign-ins/);
  });

  it("a direct caller cannot dodge the /t/{code} miss limit by rotating X-Forwarded-For", async () => {
    const peer = freshLoopback();
    for (let i = 0; i < TAG_MISS_LIMIT; i++) {
      const res = await requestFrom(peer, "GET", `/t/${newTagCode()}`, { headers: { "x-forwarded-for": `192.0.2.${i + 1}` } });
      expect(res.status).not.toBe(429);
    }
    const limited = await requestFrom(peer, "GET", `/t/${item.tagCode}`, { headers: { "x-forwarded-for": "192.0.2.200" } });
    expect(limited.status).toBe(429);
    expect(await countRows("tag_lookups", { ip: peer, found: false })).toBe(TAG_MISS_LIMIT);
  });

  it("a direct caller cannot spend another address's budget by naming it in X-Forwarded-For", async () => {
    const victim = freshLoopback();
    const attacker = freshLoopback();
    for (let i = 0; i < TAG_MISS_LIMIT + 2; i++) {
      await requestFrom(attacker, "GET", `/t/${newTagCode()}`, { headers: { "x-forwarded-for": victim } });
    }
    const own = await requestFrom(victim, "GET", `/t/${item.tagCode}`);
    expect(own.status).not.toBe(429);
    expect(await countRows("tag_lookups", { ip: victim, found: false })).toBe(0);
  });

  it("behind the trusted proxy, the right-most address the proxy did not add is the client", async () => {
    // The proxy appends the address it saw; what the client wrote in front of it is not believed.
    const [written, seen, behindTwo] = [testAddress(), testAddress(), testAddress()];
    await requestFrom(PROXY, "GET", `/t/${newTagCode()}`, { headers: { "x-forwarded-for": `${written}, ${seen}` } });
    expect(await countRows("tag_lookups", { ip: seen, found: false })).toBe(1);
    expect(await countRows("tag_lookups", { ip: written })).toBe(0);
    // A trusted hop in the chain is skipped: the address before it is the client.
    await requestFrom(PROXY, "GET", `/t/${newTagCode()}`, { headers: { "x-forwarded-for": `${behindTwo}, ${PROXY}` } });
    expect(await countRows("tag_lookups", { ip: behindTwo, found: false })).toBe(1);
  });

  it("the trusted proxy itself is the client when it forwards no address", async () => {
    const before = await countRows("tag_lookups", { ip: PROXY, found: false });
    await requestFrom(PROXY, "GET", `/t/${newTagCode()}`);
    expect(await countRows("tag_lookups", { ip: PROXY, found: false })).toBe(before + 1);
  });
});
