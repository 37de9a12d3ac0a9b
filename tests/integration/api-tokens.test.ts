import { afterAll, describe, expect, it } from "vitest";
import { callAction, discoveredActions } from "../support/actions";
import { testDb } from "../support/db";
import { addMember, Client, latestMailTo, linkIn, newOrganisation } from "../support/http";

// API tokens act for the person who made them, never with more rights than that person has
// now: the settings page makes the token, the API uses it as an integration would.

afterAll(() => testDb.destroy());

/** Creates a token through the settings form, as an owner does, and returns its secret. */
async function createToken(owner: Client, role: "owner" | "planner" | "yard_hand"): Promise<string> {
  const action = discoveredActions().get("app/(app)/settings/actions.ts#createTokenAction")!;
  const text = await callAction(owner, action, { name: `token ${role}`, role });
  const secret = text.match(/lky_[A-Za-z0-9_-]+/)?.[0];
  if (!secret) throw new Error(`no token in the answer: ${text.slice(0, 300)}`);
  return secret;
}

async function auditActions(organisationId: string): Promise<string[]> {
  return testDb("audit_log").where({ organisation_id: organisationId }).orderBy("id").pluck("action");
}

describe("issue 11.1: a token never outlives its creator's role", () => {
  it("acts at most with the creator's current role once the creator is demoted, and the audit log says so", async () => {
    const org = await newOrganisation("Token Demotion Co");
    const second = await addMember(org.owner, "owner");
    const secret = await createToken(org.owner, "owner");
    const token = new Client(secret);
    expect((await token.get("/api/v1/people")).status).toBe(200); // an owner token, for now

    const demote = await second.client.patch(`/api/v1/people/${org.userId}`, { role: "yard_hand" });
    expect(demote.status).toBe(200);

    // The token cannot promote its maker back, nor do anything else of an owner.
    const promote = await token.patch(`/api/v1/people/${org.userId}`, { role: "owner" });
    expect(promote.status).toBe(403);
    expect((await testDb("users").where({ id: org.userId }).first("role")).role).toBe("yard_hand");
    expect((await token.get("/api/v1/people")).status).toBe(403);
    // It still does what a yard hand may do: the cap, not a revocation.
    expect((await token.get("/api/v1/items")).status).toBe(200);
    const me = await token.get("/api/v1/me");
    expect(me.json.role).toBe("yard_hand");

    const row = await testDb("api_tokens").where({ created_by: org.userId }).first("role", "revoked_at");
    expect(row).toEqual({ role: "yard_hand", revoked_at: null });
    const capped = await testDb("audit_log").where({ organisation_id: org.organisationId, action: "api_token.capped" }).first("actor_id", "before", "after");
    expect(capped).toEqual({ actor_id: second.userId, before: { role: "owner" }, after: { role: "yard_hand" } });
    expect((await second.client.get("/audit")).text).toContain("API token lowered to its maker"); // in words

    // Promoted again, the person gets the role back, but the capped token does not.
    expect((await second.client.patch(`/api/v1/people/${org.userId}`, { role: "owner" })).status).toBe(200);
    expect((await token.get("/api/v1/people")).status).toBe(403);
  });

  it("stops answering once its creator is disabled, even after the person is enabled again", async () => {
    const org = await newOrganisation("Token Disable Co");
    const second = await addMember(org.owner, "owner");
    const token = new Client(await createToken(org.owner, "planner"));
    expect((await token.get("/api/v1/items")).status).toBe(200);

    expect((await second.client.patch(`/api/v1/people/${org.userId}`, { disabled: true })).status).toBe(200);
    expect((await token.get("/api/v1/items")).status).toBe(401);
    expect((await second.client.patch(`/api/v1/people/${org.userId}`, { disabled: false })).status).toBe(200);
    expect((await token.get("/api/v1/items")).status).toBe(401);

    expect((await testDb("api_tokens").where({ created_by: org.userId }).first("revoked_at")).revoked_at).not.toBeNull();
    expect(await auditActions(org.organisationId)).toContain("api_token.revoked");
  });

  it("stops answering once its creator resets the password", async () => {
    const org = await newOrganisation("Token Reset Co");
    const token = new Client(await createToken(org.owner, "owner"));
    expect((await token.get("/api/v1/me")).status).toBe(200);

    expect((await new Client().post("/api/v1/password-resets", { email: org.email })).status).toBe(202);
    const link = linkIn((await latestMailTo(org.email, { subject: /^Reset your Linkyard password/ })).text, "/reset-password");
    expect((await new Client().post("/api/v1/password-resets/confirm", { token: link, password: "a-fresh-password-26" })).status).toBe(200);

    expect((await token.get("/api/v1/me")).status).toBe(401);
    const revoked = await testDb("audit_log").where({ organisation_id: org.organisationId, action: "api_token.revoked" }).first("actor_id", "after");
    expect(revoked).toEqual({ actor_id: org.userId, after: { reason: "password reset" } });
  });

  it("never acts above its creator's role, whatever its own role says", async () => {
    // A token row whose role is above its maker's (as left by a demotion before this fix).
    const org = await newOrganisation("Token Row Co");
    const second = await addMember(org.owner, "owner");
    const secret = await createToken(org.owner, "owner");
    await testDb("users").where({ id: org.userId }).update({ role: "planner" });
    const token = new Client(secret);
    expect((await token.get("/api/v1/me")).json.role).toBe("planner");
    expect((await token.patch(`/api/v1/people/${second.userId}`, { role: "yard_hand" })).status).toBe(403);
  });
});
