import { afterAll, describe, expect, it } from "vitest";
import { BASE_URL, Client, latestMailTo, linkIn, newOrganisation, TEST_PASSWORD, uniqueEmail } from "../support/http";
import { countRows, testDb } from "../support/db";

afterAll(() => testDb.destroy());

describe("sign-up, sign-in and sign-out over the API", () => {
  it("signs up a new owner of a new organisation through the e-mailed link, with a httpOnly SameSite cookie", async () => {
    const email = uniqueEmail("signup");
    const res = await new Client().post("/api/v1/signups", { organisationName: "Gravel Pit Co", name: "Gia", email, password: TEST_PASSWORD });
    expect(res.status).toBe(202);
    expect(res.json.message).toContain(`we sent a message to ${email}`);
    expect(res.headers.get("set-cookie")).toBeNull();
    expect(await countRows("users", { email })).toBe(0); // nothing is made before the link is used

    const mail = await latestMailTo(email);
    expect(mail.subject).toBe("Confirm your e-mail to set up Gravel Pit Co on Linkyard");
    const token = linkIn(mail.text, "/sign-up/confirm");
    expect(await countRows("signup_requests", { token_hash: token })).toBe(0); // only the hash is kept

    const client = new Client();
    const confirmed = await client.post("/api/v1/signups/confirm", { token });
    expect(confirmed.status).toBe(201);
    const cookie = confirmed.headers.get("set-cookie")!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const me = await client.get("/api/v1/me");
    expect(me.status).toBe(200);
    expect(me.json).toMatchObject({ email, role: "owner", organisation: { name: "Gravel Pit Co" } });
    // The session lives in PostgreSQL, so it outlasts a restart of the app.
    expect(await countRows("user_sessions", { user_id: me.json.id })).toBe(1);

    const again = await new Client().post("/api/v1/signups/confirm", { token });
    expect(again.status).toBe(410);
    expect(again.json.error).toMatch(/already been used/);
    expect((await new Client().post("/api/v1/signups/confirm", { token: "not-a-token" })).status).toBe(404);
  });

  it("answers bad input with 400 and the fields at fault", async () => {
    const res = await new Client().post("/api/v1/signups", { organisationName: "", email: "nope", password: "short" });
    expect(res.status).toBe(400);
    expect(res.json.error).toBe("Some fields need fixing.");
    const paths = res.json.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["organisationName", "name", "email", "password"]));
  });

  it("answers broken JSON with 400", async () => {
    const res = await new Client().post("/api/v1/sessions", "{not json", { "content-type": "application/json" });
    expect(res.status).toBe(400);
    expect(res.json.error).toMatch(/not valid JSON/);
  });

  it("signs in, and signs out", async () => {
    const { email } = await newOrganisation();
    const client = new Client();
    const wrong = await client.post("/api/v1/sessions", { email, password: "wrong-password!" });
    expect(wrong.status).toBe(401);
    expect(wrong.json.error).toBe("That e-mail and password do not match an account.");
    const ok = await client.post("/api/v1/sessions", { email: email.toUpperCase(), password: TEST_PASSWORD });
    expect(ok.status).toBe(200);
    expect((await client.get("/api/v1/me")).status).toBe(200);
    const cookie = client.cookie;
    expect((await client.delete("/api/v1/sessions")).status).toBe(204);
    const stale = new Client();
    stale.cookie = cookie;
    expect((await stale.get("/api/v1/me")).status).toBe(401);
  });

  it("refuses sign-in after five failures for one account, even with the right password", async () => {
    const { email } = await newOrganisation();
    const client = new Client();
    for (let i = 0; i < 5; i++) expect((await client.post("/api/v1/sessions", { email, password: `bad-${i}-password` })).status).toBe(401);
    const blocked = await client.post("/api/v1/sessions", { email, password: TEST_PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.json.error).toMatch(/Too many failed sign-ins/);
    expect(blocked.headers.get("set-cookie")).toBeNull();
  });

  it("refuses a cookie-authenticated mutation from another site, writing nothing", async () => {
    const { owner, organisationId } = await newOrganisation();
    const before = await countRows("invites", { organisation_id: organisationId });
    const foreign = await owner.post("/api/v1/invites", { email: uniqueEmail(), role: "planner" }, { origin: "https://evil.example" });
    expect(foreign.status).toBe(403);
    expect(foreign.json.error).toBe("Cross-site request refused.");
    expect(await countRows("invites", { organisation_id: organisationId })).toBe(before);
  });

  it("serves pages to a signed-in browser and sends strangers to sign-in", async () => {
    const anonymous = await fetch(`${BASE_URL}/stock`, { redirect: "manual" });
    expect(anonymous.status).toBe(307);
    expect(anonymous.headers.get("location")).toMatch(/\/sign-in$/);
  });
});
