import { afterAll, describe, expect, it } from "vitest";
import { db } from "@/db/index";
import { findItemByTag } from "@/db/items";
import { findSessionWithUser } from "@/db/sessions";
import { testDb } from "../support/db";

// The two reads every scan makes (the session, the item by tag code) run as named prepared
// statements on pooled connections (db/index.ts preparedFirst): each call must answer its own
// key's row, whichever connection it gets and however many run at once.

afterAll(async () => {
  await db.destroy();
  await testDb.destroy();
});

describe("prepared reads", () => {
  it("answers the item of each tag code, calls running at once on several connections", async () => {
    const rows = await testDb("items").select("id", "tag_code", "organisation_id").orderBy("tag_code").limit(40);
    expect(rows.length).toBeGreaterThan(10);
    const found = await Promise.all(rows.map((r) => findItemByTag(r.tag_code)));
    expect(found.map((f) => [f?.id, f?.tagCode, f?.organisationId])).toEqual(rows.map((r) => [r.id, r.tag_code, r.organisation_id]));
    // Again, now that each connection has the statement prepared.
    const again = await Promise.all(rows.map((r) => findItemByTag(r.tag_code)));
    expect(again.map((f) => f?.id)).toEqual(rows.map((r) => r.id));
  });

  it("answers nothing for a code or a session that does not exist", async () => {
    expect(await findItemByTag("XXXX-XXXX")).toBeUndefined();
    expect(await findSessionWithUser("no-such-session")).toBeUndefined();
  });
});
