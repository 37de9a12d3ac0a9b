import { afterAll, describe, expect, it } from "vitest";
import { Client, latestMailTo, linkIn, newOrganisation, TEST_PASSWORD, uniqueEmail } from "../support/http";
import { countRows, testDb } from "../support/db";
import { createHash } from "node:crypto";

afterAll(() => testDb.destroy());

const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");

describe("invites", () => {
  it("e-mails an invite link that joins the organisation with the chosen role, once", async () => {
    const { owner, organisationId } = await newOrganisation("Invite Co");
    const email = uniqueEmail("hand");
    const invite = await owner.post("/api/v1/invites", { email, role: "yard_hand", designated: true });
    expect(invite.status).toBe(201);

    const mail = await latestMailTo(email);
    expect(mail.subject).toBe("Owner Person invited you to Invite Co on Linkyard");
    const token = linkIn(mail.text, "/invite");
    // Only the hash is stored.
    expect(await countRows("invites", { token_hash: token })).toBe(0);
    expect(await countRows("invites", { token_hash: sha256(token) })).toBe(1);

    const member = new Client();
    const accepted = await member.post("/api/v1/invites/accept", { token, name: "Hana", password: TEST_PASSWORD });
    expect(accepted.status).toBe(201);
    const me = await member.get("/api/v1/me");
    expect(me.json).toMatchObject({ email, role: "yard_hand", designated: true, organisation: { id: organisationId } });

    const again = await new Client().post("/api/v1/invites/accept", { token, name: "Hana 2", password: TEST_PASSWORD });
    expect(again.status).toBe(410);
    expect(again.json.error).toMatch(/already been used/);
  });

  it("refuses an expired invite and creates no account", async () => {
    const { owner } = await newOrganisation();
    const email = uniqueEmail("late");
    await owner.post("/api/v1/invites", { email, role: "planner" });
    const token = linkIn((await latestMailTo(email)).text, "/invite");
    await testDb("invites").where({ token_hash: sha256(token) }).update({ expires_at: new Date(Date.now() - 1000) });
    const res = await new Client().post("/api/v1/invites/accept", { token, name: "Late", password: TEST_PASSWORD });
    expect(res.status).toBe(410);
    expect(res.json.error).toMatch(/expired/);
    expect(await countRows("users", { email })).toBe(0);
  });

  it("refuses a withdrawn invite", async () => {
    const { owner } = await newOrganisation();
    const email = uniqueEmail("gone");
    const created = await owner.post("/api/v1/invites", { email, role: "planner" });
    const token = linkIn((await latestMailTo(email)).text, "/invite");
    expect((await owner.delete(`/api/v1/invites/${created.json.id}`)).status).toBe(204);
    const res = await new Client().post("/api/v1/invites/accept", { token, name: "Gone", password: TEST_PASSWORD });
    expect(res.status).toBe(410);
  });

  it("refuses an unknown token, a weak password and a bad e-mail with clear messages", async () => {
    const { owner } = await newOrganisation();
    const unknown = await new Client().post("/api/v1/invites/accept", { token: "nope", name: "N", password: TEST_PASSWORD });
    expect(unknown.status).toBe(404);
    const weak = await new Client().post("/api/v1/invites/accept", { token: "nope", name: "N", password: "short" });
    expect(weak.status).toBe(400);
    expect(weak.json.issues[0]).toEqual({ path: "password", message: "Use at least 10 characters for the password." });
    const bad = await owner.post("/api/v1/invites", { email: "not-an-email", role: "planner" });
    expect(bad.status).toBe(400);
    expect(bad.json.issues).toEqual([{ path: "email", message: "Enter a valid e-mail address, like name@example.com." }]);
  });
});

describe("password reset", () => {
  it("e-mails a one-time link that sets a new password and ends other sessions", async () => {
    const { owner, email } = await newOrganisation();
    expect((await owner.post("/api/v1/password-resets", { email })).status).toBe(202);
    const token = linkIn((await latestMailTo(email, { subject: /^Reset your Linkyard password/ })).text, "/reset-password");
    const newPassword = "a-brand-new-password";
    const stranger = new Client();
    expect((await stranger.post("/api/v1/password-resets/confirm", { token, password: newPassword })).status).toBe(200);
    expect((await owner.get("/api/v1/me")).status).toBe(401); // the old session was ended
    expect((await new Client().post("/api/v1/sessions", { email, password: TEST_PASSWORD })).status).toBe(401);
    expect((await new Client().post("/api/v1/sessions", { email, password: newPassword })).status).toBe(200);
    const reuse = await new Client().post("/api/v1/password-resets/confirm", { token, password: "yet-another-password" });
    expect(reuse.status).toBe(410);
  });
});
