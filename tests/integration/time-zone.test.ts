import { afterAll, describe, expect, it } from "vitest";
import { addDays, todayIn } from "@/lib/time";
import { callAction, discoveredActions } from "../support/actions";
import { testDb } from "../support/db";
import { Client, latestMailTo, linkIn, newOrganisation, TEST_PASSWORD, uniqueEmail } from "../support/http";

// An organisation has a time zone: "today" and "overdue" are its own, not the server's.

afterAll(() => testDb.destroy());

/** Signs up and follows the e-mailed link; `res` is the answer that made the company (or the refusal). */
async function signUp(timeZone?: string) {
  const email = uniqueEmail("zone");
  const requested = await new Client().post("/api/v1/signups", { organisationName: "Zone Co", name: "Zoe Zone", email, password: TEST_PASSWORD, ...(timeZone !== undefined && { timeZone }) });
  if (requested.status !== 202) return { client: new Client(), res: requested };
  const token = linkIn((await latestMailTo(email, { subject: /^Confirm your e-mail/ })).text, "/sign-up/confirm");
  const client = new Client();
  return { client, res: await client.post("/api/v1/signups/confirm", { token }) };
}

async function zoneOf(client: Client): Promise<string> {
  const me = await client.get("/api/v1/me");
  return (await testDb("organisations").where({ id: me.json.organisation.id }).first("time_zone")).time_zone;
}

describe("an organisation's time zone", () => {
  it("is chosen at sign-up, UTC when not given, and refused when Intl does not know it", async () => {
    const chicago = await signUp("America/Chicago");
    expect(chicago.res.status).toBe(201);
    expect(await zoneOf(chicago.client)).toBe("America/Chicago");

    const none = await signUp();
    expect(none.res.status).toBe(201);
    expect(await zoneOf(none.client)).toBe("UTC");

    const bad = await signUp("Mars/Olympus");
    expect(bad.res.status).toBe(400);
    expect(bad.res.json.issues).toEqual([{ path: "timeZone", message: "Choose a time zone from the list, e.g. America/Chicago." }]);
  });

  it("is changed by an owner on the Settings page, with an audit row", async () => {
    const org = await newOrganisation("Zone Settings Co");
    const action = discoveredActions().get("app/(app)/settings/actions.ts#saveOrganisationAction")!;
    const refused = await callAction(org.owner, action, { name: "Zone Settings Co", timeZone: "Nowhere/Special" });
    expect(refused).toContain("Choose a time zone from the list");
    expect(await zoneOf(org.owner)).toBe("UTC");

    const saved = await callAction(org.owner, action, { name: "Zone Settings Co", timeZone: "America/Denver" });
    expect(saved).toContain("Settings saved.");
    expect(await zoneOf(org.owner)).toBe("America/Denver");
    const audit = await testDb("audit_log").where({ organisation_id: org.organisationId, action: "organisation.updated" }).first("before", "after");
    expect(audit.before.timeZone).toBe("UTC");
    expect(audit.after.timeZone).toBe("America/Denver");
  });

  it("decides what is overdue: an inspection due yesterday there is overdue, one due today there is not", async () => {
    // Kiritimati (UTC+14) and Pago Pago (UTC-11) are 25 hours apart: at any hour, at least
    // one of them has a date other than UTC's, so a list counted in UTC gets one of them wrong.
    for (const zone of ["Pacific/Kiritimati", "Pacific/Pago_Pago"]) {
      const { client } = await signUp(zone);
      const today = todayIn(zone);
      const ids: Record<string, string> = {};
      for (const [name, due] of [["yesterday", addDays(today, -1)], ["today", today]] as const) {
        const item = await client.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8", serial: `${zone}-${name}` });
        expect(item.status).toBe(201);
        await testDb("items").where({ id: item.json.id }).update({ next_inspection_due: due });
        ids[name] = item.json.id;
      }
      const overdue = await client.get("/api/v1/items?due=overdue");
      expect(overdue.json.data.map((i: { id: string }) => i.id)).toEqual([ids.yesterday]);
      const page = await client.get(`/items/${ids.today}`);
      expect(page.text).not.toContain("(overdue)");
      expect((await client.get(`/items/${ids.yesterday}`)).text).toContain("(overdue)");
    }
  });
});
