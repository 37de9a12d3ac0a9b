import { randomUUID } from "node:crypto";
import { readFileSync } from "node:fs";
import type { ChildProcess } from "node:child_process";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { newTagCode } from "@/lib/tags/code";
import { Client, mailsTo, latestMailTo, newOrganisation, TEST_PASSWORD, uniqueEmail } from "../support/http";
import { testDb } from "../support/db";
import { sleep, startAppServer, startWorker, stopAppServer, stopWorker } from "../support/services";

// Several app processes behind a load balancer, against one PostgreSQL: two more servers of
// the same build, started as the scripts start theirs, on ports of their own, with the test
// server's environment. Whatever one process knows, the other must know too, because it
// lives in the database: sessions, the sign-in and tag-lookup limits, an import's progress;
// and two job workers send each queued e-mail once.

const PORTS = [10, 11].map((n) => Number(process.env.LINKYARD_TEST_PORT ?? 3100) + n);
const [A, B] = PORTS.map((p) => `http://127.0.0.1:${p}`) as [string, string];
const servers: ChildProcess[] = [];
const SECOND_WORKER = "test-worker-processes";

beforeAll(async () => {
  // Each server is kept as soon as it is up, so that afterAll stops it even if the other fails.
  await Promise.all(PORTS.map(async (port) => servers.push(await startAppServer(port))));
}, 90_000);
afterAll(() => Promise.all(servers.map(stopAppServer)));

/** One caller (one client address) reaching the app through either process. */
function through(client: Client, base: string): Client {
  client.base = base;
  return client;
}

describe("two app processes against one database", () => {
  it("each runs with the heap budget the scripts give every web process", () => {
    // Without it V8 sizes the heap from the machine's memory, and the footprint with it.
    for (const child of servers) {
      const argv = readFileSync(`/proc/${child.pid}/cmdline`, "utf8").split("\0");
      expect(argv).toContain(`--max-old-space-size=${process.env.LINKYARD_HEAP_MB}`);
      expect(argv).toContain("server.mts");
    }
    expect(Number(process.env.LINKYARD_HEAP_MB)).toBeGreaterThan(0);
  });

  it("a session made on one works on the other, and ends on both", async () => {
    const { email } = await newOrganisation("Two Process Co");
    const person = new Client(undefined, A);
    expect((await person.post("/api/v1/sessions", { email, password: TEST_PASSWORD })).status).toBe(200);
    const me = await through(person, B).get("/api/v1/me");
    expect(me.status).toBe(200);
    expect(me.json.email).toBe(email);
    const stock = await through(person, B).get("/stock");
    expect(stock.status).toBe(200);

    const cookie = person.cookie;
    expect((await through(person, B).delete("/api/v1/sessions")).status).toBeLessThan(300);
    const stale = new Client(undefined, A);
    stale.cookie = cookie;
    expect((await stale.get("/api/v1/me")).status).toBe(401);
  });

  it("counts failed sign-ins across both processes", async () => {
    const { email } = await newOrganisation("Guessed Co");
    const guesser = new Client();
    // SIGN_IN_MAX_FAILURES (5) wrong passwords, alternating between the processes…
    for (let i = 0; i < 5; i++) {
      const res = await through(guesser, i % 2 ? B : A).post("/api/v1/sessions", { email, password: `wrong-password-${i}` });
      expect(res.status).toBe(401);
    }
    // …and then even the right one is refused on both.
    expect((await through(guesser, B).post("/api/v1/sessions", { email, password: TEST_PASSWORD })).status).toBe(429);
    expect((await through(guesser, A).post("/api/v1/sessions", { email, password: TEST_PASSWORD })).status).toBe(429);
  });

  it("counts tag-code misses across both processes", async () => {
    const guesser = new Client();
    // TAG_MISS_LIMIT (20) unknown codes from one address, alternating between the processes…
    for (let i = 0; i < 20; i++) {
      const res = await through(guesser, i % 2 ? B : A).get(`/t/${newTagCode()}`);
      expect(res.status).not.toBe(429);
    }
    // …then both refuse the next, on either.
    expect((await through(guesser, A).get(`/t/${newTagCode()}`)).status).toBe(429);
    expect((await through(guesser, B).get(`/t/${newTagCode()}`)).status).toBe(429);
  });

  it("shows an import's progress from both while it runs on one", async () => {
    const { owner } = await newOrganisation("Import Watch Co");
    const rows = 20_000;
    const lines = ["Kind,Grade,Size,Length (ft),End fittings,Serial/Lot,In service"];
    for (let i = 1; i <= rows; i++) lines.push(`chain,G70,3/8,20,grab hook both ends,TP-${i},2026-01-15`);
    const batchId = randomUUID();
    const form = new FormData();
    form.append("file", new Blob([lines.join("\r\n")], { type: "text/csv" }), "two-processes.csv");
    form.append("batchId", batchId);
    const importing = through(owner, A).post("/api/v1/imports", form);

    // Watched from both processes while the first one works.
    const watchA = new Client(undefined, A);
    const watchB = new Client(undefined, B);
    watchA.cookie = watchB.cookie = owner.cookie;
    const seen: { at: "A" | "B"; progress: number }[] = [];
    let finished = false;
    void importing.finally(() => (finished = true));
    while (!finished) {
      for (const [at, watcher] of [["A", watchA], ["B", watchB]] as const) {
        const res = await watcher.get(`/api/v1/imports/${batchId}`);
        if (res.status === 200 && res.json.status === "running") seen.push({ at, progress: res.json.progress });
      }
      await sleep(100);
    }
    const done = await importing;
    expect(done.status).toBe(201);
    expect(seen.some((s) => s.at === "A")).toBe(true);
    expect(seen.some((s) => s.at === "B")).toBe(true);
    expect(seen.some((s) => s.progress > 0 && s.progress < 1)).toBe(true);

    const [fromA, fromB] = await Promise.all([watchA.get(`/api/v1/imports/${batchId}`), watchB.get(`/api/v1/imports/${batchId}`)]);
    expect(fromA.json).toEqual(fromB.json);
    expect(fromB.json).toMatchObject({ status: "committed", created: rows, progress: 1 });
  }, 120_000);

  it("with two mail workers, sends each e-mail queued through either process once", async () => {
    const { owner } = await newOrganisation("Twin Process Mail Co");
    const emails = Array.from({ length: 8 }, () => uniqueEmail("twin-process"));
    try {
      startWorker(SECOND_WORKER);
      for (const [i, email] of emails.entries()) {
        const res = await through(owner, i % 2 ? B : A).post("/api/v1/invites", { email, role: "yard_hand", designated: false });
        expect(res.status).toBe(201);
      }
      for (const email of emails) await latestMailTo(email, { timeoutMs: 20_000 });
      await sleep(2000); // time for a second copy to arrive, were one sent
      for (const email of emails) expect(await mailsTo(email)).toHaveLength(1);
      const sent = await testDb("mail_messages").whereIn("to_address", emails).where({ status: "sent" }).count<{ n: string }[]>("* as n");
      expect(Number(sent[0]!.n)).toBe(emails.length);
    } finally {
      stopWorker(SECOND_WORKER);
    }
  }, 90_000);
});
