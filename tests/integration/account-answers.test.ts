import { afterAll, describe, expect, it } from "vitest";
import { countRows, testDb } from "../support/db";
import { Client, latestMailTo, mailsTo, newOrganisation, TEST_PASSWORD, uniqueEmail } from "../support/http";
import { QUEUES, waitFor } from "../support/services";

// Issue 11.3: the account forms answer the same whether or not an address has an account;
// the person who has one is told by e-mail. (How long each answer takes is measured by
// bench/account-answers.ts: timings are not asserted in tests.)

afterAll(() => testDb.destroy());

/** An answer as a stranger sees it: status, body and the names of the headers, with the address written as ADDRESS. */
function seen(res: { status: number; text: string; headers: Headers }, email: string) {
  const headers = [...res.headers.keys()].filter((h) => h !== "date").sort();
  return { status: res.status, body: res.text.replaceAll(email, "ADDRESS"), headers };
}

describe("issue 11.3: the account forms do not tell which addresses have accounts", () => {
  it("issue 11.3: a reset for a known and for an unknown address answers the same, and only the known one gets a link", async () => {
    const known = await newOrganisation("Reset Answer Co");
    const unknown = uniqueEmail("nobody");
    const a = await new Client().post("/api/v1/password-resets", { email: known.email });
    const b = await new Client().post("/api/v1/password-resets", { email: unknown });
    expect(a.status).toBe(202);
    expect(seen(a, known.email)).toEqual(seen(b, unknown));

    expect((await latestMailTo(known.email, { subject: /^Reset your Linkyard password/ })).text).toContain("/reset-password/");
    // The unknown address's request was looked up by the worker, which sent nothing.
    await waitFor("the unknown address's request to be handled", async () => {
      const job = await testDb("pgboss.job").where({ name: QUEUES.resetRequest }).whereRaw("data->>'email' = ?", [unknown]).first("state");
      return job?.state === "completed";
    });
    expect(await countRows("mail_messages", { to_address: unknown })).toBe(0);
    expect(await mailsTo(unknown)).toEqual([]);
  });

  it("issue 11.3: sign-up with an address that has an account answers as for a new one, makes nothing, and tells that person by e-mail", async () => {
    const existing = await newOrganisation("Existing Outfit");
    const fresh = uniqueEmail("fresh");
    const organisations = await countRows("organisations");
    const a = await new Client().post("/api/v1/signups", { organisationName: "Second Try Co", name: "Sam", email: existing.email, password: TEST_PASSWORD });
    const b = await new Client().post("/api/v1/signups", { organisationName: "Second Try Co", name: "Sam", email: fresh, password: TEST_PASSWORD });
    expect(a.status).toBe(202);
    expect(seen(a, existing.email)).toEqual(seen(b, fresh));

    const told = await latestMailTo(existing.email, { subject: /^Your Linkyard account already exists$/ });
    expect(told.text).toContain("tried to set up a new company, Second Try Co");
    expect(told.text).toContain("already has a Linkyard account, with Existing Outfit, so no new company was made");
    expect(told.text).not.toContain("/sign-up/confirm/");
    expect((await latestMailTo(fresh)).subject).toBe("Confirm your e-mail to set up Second Try Co on Linkyard");
    expect(await countRows("organisations")).toBe(organisations);
    expect(await countRows("users", { email: existing.email })).toBe(1);
  });

  it("issue 11.3: an invite to an address that has an account answers as any invite does; that person learns why by e-mail", async () => {
    const inviting = await newOrganisation("Inviting Co");
    const other = await newOrganisation("Other Yard Co");
    const fresh = uniqueEmail("fresh-invite");
    const a = await inviting.owner.post("/api/v1/invites", { email: other.email, role: "planner" });
    const b = await inviting.owner.post("/api/v1/invites", { email: fresh, role: "planner" });
    expect(a.status).toBe(201);
    const shape = (res: typeof a) => ({ status: res.status, keys: Object.keys(res.json).sort() });
    expect(shape(a)).toEqual(shape(b));
    const open = (await inviting.owner.get("/api/v1/invites")).json.data.map((i: { email: string }) => i.email);
    expect(open).toEqual(expect.arrayContaining([other.email, fresh]));

    const told = await latestMailTo(other.email, { subject: /^Owner Person invited you to Inviting Co on Linkyard$/ });
    expect(told.text).toContain("already has a Linkyard account, with Other Yard Co");
    expect(told.text).not.toContain("/invite/");
    expect((await latestMailTo(fresh)).text).toContain("/invite/");
    // Either way the message counts as the inviting company's, as the same subject.
    const rows = await testDb("mail_messages").whereIn("to_address", [other.email, fresh]).whereIn("kind", ["invite", "account_exists"]).select("organisation_id", "subject");
    expect(new Set(rows.map((r) => r.organisation_id))).toEqual(new Set([inviting.organisationId]));
    expect(new Set(rows.map((r) => r.subject)).size).toBe(1);
  });
});
