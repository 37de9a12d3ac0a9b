import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DATABASE_DOWN } from "@/lib/http/unavailable";
import { callAction, discoveredActions } from "../support/actions";
import { testDb } from "../support/db";
import { BASE_URL, Client, newOrganisation, TEST_PASSWORD } from "../support/http";
import { service, waitUntil } from "../support/services";

// PostgreSQL stopped under the running app, then started again: every kind of request
// answers a clear 503 within seconds instead of hanging, and the app recovers by itself,
// with every write it had acknowledged still there.

const CHAIN = { kind: "chain", marking: "grade", grade: 70, size: "3/8" };
let org: Awaited<ReturnType<typeof newOrganisation>>;
let acknowledged: string;

beforeAll(async () => {
  org = await newOrganisation("Outage Co");
  const res = await org.owner.post("/api/v1/items", { ...CHAIN, serial: "BEFORE-OUTAGE" });
  expect(res.status).toBe(201);
  acknowledged = res.json.id;
});

// Whatever happens in the tests, PostgreSQL is running again afterwards.
afterAll(async () => {
  service("start_postgres");
  await testDb.destroy();
});

/** The time a request takes, with its answer. */
async function timed<T>(work: () => Promise<T>): Promise<[T, number]> {
  const start = Date.now();
  const out = await work();
  return [out, Date.now() - start];
}

describe("PostgreSQL stopped while the app runs", () => {
  it("answers a clear 503 within seconds everywhere, and recovers by itself when it is back", async () => {
    service("stop_postgres");
    try {
      const [list, listMs] = await timed(() => org.owner.get("/api/v1/items"));
      expect(list.status).toBe(503);
      expect(list.json).toEqual({ error: DATABASE_DOWN });
      expect(list.headers.get("retry-after")).toBe("30");
      expect(listMs).toBeLessThan(6000);

      const [write, writeMs] = await timed(() => org.owner.post("/api/v1/items", { ...CHAIN, serial: "DURING-OUTAGE" }));
      expect(write.status).toBe(503);
      expect(writeMs).toBeLessThan(6000);

      const [page, pageMs] = await timed(() => org.owner.get("/stock"));
      expect(page.status).toBe(503);
      expect(page.text).toContain("Linkyard is not available just now");
      expect(page.text).toContain(DATABASE_DOWN);
      expect(pageMs).toBeLessThan(6000);

      const health = await fetch(`${BASE_URL}/api/health`);
      expect(health.status).toBe(503);

      const signIn = discoveredActions().get("app/(auth)/actions.ts#signInAction")!;
      const [form, formMs] = await timed(() => callAction(new Client(), signIn, { email: org.email, password: TEST_PASSWORD }));
      expect(form).toContain(DATABASE_DOWN);
      expect(formMs).toBeLessThan(6000);
    } finally {
      service("start_postgres");
    }

    // Back without restarting the app: the pools make new connections on their own.
    const recoveredMs = await waitUntil(async () => (await org.owner.get("/api/v1/items")).status === 200, 20_000);
    expect(recoveredMs).toBeLessThan(20_000);
    const item = await org.owner.get(`/api/v1/items/${acknowledged}`);
    expect(item.status).toBe(200);
    expect(item.json.serial).toBe("BEFORE-OUTAGE");
    expect(await testDb("items").where({ organisation_id: org.organisationId, serial: "DURING-OUTAGE" }).first("id")).toBeUndefined();
    const after = await org.owner.post("/api/v1/items", { ...CHAIN, serial: "AFTER-OUTAGE" });
    expect(after.status).toBe(201);
    expect((await org.owner.get("/stock")).status).toBe(200);
    expect((await fetch(`${BASE_URL}/api/health`)).status).toBe(200);
  });
});
