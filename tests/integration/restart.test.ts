import type { ChildProcess } from "node:child_process";
import { afterAll, describe, expect, it } from "vitest";
import { newOrganisation, TEST_PASSWORD } from "../support/http";
import { startAppServer, stopAppServer } from "../support/services";

// Sessions live in PostgreSQL, so a person stays signed in when the app restarts. This test
// runs a second server of the same build on its own port, signs in, restarts it, and asks again.

const PORT = Number(process.env.LINKYARD_TEST_PORT ?? 3100) + 77;
const BASE = `http://127.0.0.1:${PORT}`;
let server: ChildProcess | undefined;

async function startServer(): Promise<void> {
  server = await startAppServer(PORT, { ...process.env, APP_URL: BASE });
}

async function stopServer(): Promise<void> {
  if (server) await stopAppServer(server);
}

afterAll(stopServer);

describe("a restart of the app", () => {
  it("keeps people signed in", async () => {
    const { email } = await newOrganisation("Restart Co");
    await startServer();
    const signIn = await fetch(`${BASE}/api/v1/sessions`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: BASE },
      body: JSON.stringify({ email, password: TEST_PASSWORD }),
    });
    expect(signIn.status).toBe(200);
    const cookie = signIn.headers.get("set-cookie")!.split(";")[0];
    const me = () => fetch(`${BASE}/api/v1/me`, { headers: { cookie } });
    expect((await me()).status).toBe(200);

    await stopServer();
    await expect(me()).rejects.toThrow(); // really down
    await startServer();
    const after = await me();
    expect(after.status).toBe(200);
    expect((await after.json()).email).toBe(email);
  }, 90_000);
});
