// Throughput and latency of the scan's one request, against its baselines in the same run:
// - the no-database route: the same GET /api/v1/tags/{code} without a session, which the
//   route wrapper answers 401 before any query (Next's own floor for a route handler);
// - the tag lookup: signed in, a random one of the bench organisation's 50,000 items each time;
// - the bare baseline: bench/bare-server.ts (Node http + pg, the same two queries and JSON);
// - the item page, server-rendered and signed in, against the tag lookup; beside it, for
//   context, the sign-in page signed out: the smallest server-rendered page the app has (a
//   heading and a form, no query), the framework's own floor for a page;
// - the securement check API (a 12-tiedown plan) against the no-database route at 20 connections.
// Each run is autocannon for a fixed time with fixed connections, on 127.0.0.1, after a short
// warm-up. Run by bench/run.sh (it needs the bench server and bench/seed.ts's state).
import { spawn } from "node:child_process";
import { once } from "node:events";
import { BASE, benchState, load, ms, pct, record, ROOT, signIn } from "./lib";
import { twelveTiedownPlan } from "./plans";

const SECONDS = Number(process.env.BENCH_SECONDS ?? 20);
const CONNECTIONS = 50;
const BARE_PORT = Number(new URL(BASE).port) + 1;

async function main() {
  const state = benchState();
  const cookie = await signIn(state.email, state.password);
  const code = () => `/api/v1/tags/${state.tagCodes[Math.floor(Math.random() * state.tagCodes.length)]}`;
  const itemPage = () => `/items/${state.itemIds[Math.floor(Math.random() * state.itemIds.length)]}`;

  const bare = spawn(process.execPath, ["--import", "tsx", "bench/bare-server.ts", String(BARE_PORT)], { cwd: ROOT, stdio: ["ignore", "pipe", "inherit"], env: process.env });
  await once(bare.stdout!, "data");
  const BARE = `http://127.0.0.1:${BARE_PORT}`;
  try {
    const runs = {
      noDb: { label: "no-database route (tag lookup, no session: 401)", url: BASE, path: code, expect: 401 },
      tag: { label: "tag lookup API, signed in", url: BASE, path: code, headers: { cookie }, expect: 200 },
      bare: { label: "bare Node http + pg, same queries", url: BARE, path: code, headers: { cookie }, expect: 200 },
      page: { label: "item page, server-rendered, signed in", url: BASE, path: itemPage, headers: { cookie }, expect: 200 },
      floor: { label: "sign-in page, signed out (a page's floor)", url: BASE, path: () => "/sign-in", expect: 200 },
    };
    console.log(`${state.itemCount.toLocaleString("en-US")} items; ${CONNECTIONS} connections, ${SECONDS} s a run; warming up (3 s each)…`);
    for (const r of Object.values(runs)) await load({ ...r, label: `  (warm-up) ${r.label}`, connections: 10, seconds: 3 });
    const noDb = await load({ ...runs.noDb, connections: CONNECTIONS, seconds: SECONDS });
    const tag = await load({ ...runs.tag, connections: CONNECTIONS, seconds: SECONDS });
    const bareRun = await load({ ...runs.bare, connections: CONNECTIONS, seconds: SECONDS });
    const page = await load({ ...runs.page, connections: CONNECTIONS, seconds: SECONDS });
    const floor = await load({ ...runs.floor, connections: CONNECTIONS, seconds: SECONDS });

    const check = { method: "POST" as const, body: JSON.stringify(twelveTiedownPlan), headers: { cookie, origin: BASE, "content-type": "application/json" } };
    await load({ label: "  (warm-up) securement check API", url: `${BASE}/api/v1/securement-checks`, ...check, connections: 5, seconds: 3, expect: 200 });
    const noDb20 = await load({ ...runs.noDb, connections: 20, seconds: Math.ceil(SECONDS / 2) });
    const checkApi = await load({ label: "securement check API, 12 tiedowns, signed in", url: `${BASE}/api/v1/securement-checks`, ...check, connections: 20, seconds: Math.ceil(SECONDS / 2), expect: 200 });

    const figures = `${tag.rps.toFixed(0)} req/s, p95 ${ms(tag.p95)}`;
    record([
      {
        what: "tag lookup API: throughput vs the no-database route",
        figure: `${figures} = ${pct(tag.rps / noDb.rps)}`,
        target: "≥ 80 %",
        baseline: `no-database route ${noDb.rps.toFixed(0)} req/s`,
        met: tag.rps >= 0.8 * noDb.rps,
      },
      {
        what: "tag lookup API: throughput vs bare Node + pg",
        figure: `${tag.rps.toFixed(0)} req/s = ${pct(tag.rps / bareRun.rps)}`,
        target: "≥ 40 %",
        baseline: `bare ${bareRun.rps.toFixed(0)} req/s, p95 ${ms(bareRun.p95)}`,
        met: tag.rps >= 0.4 * bareRun.rps,
      },
      {
        what: "tag lookup API: p95 vs the no-database route's",
        figure: `${ms(tag.p95)} = ${(tag.p95 / noDb.p95).toFixed(2)} ×`,
        target: "≤ 1.5 ×",
        baseline: `no-database route p95 ${ms(noDb.p95)}`,
        met: tag.p95 <= 1.5 * noDb.p95,
      },
      {
        what: "item page (signed in): p95 vs the tag lookup's",
        figure: `${page.rps.toFixed(0)} req/s, p95 ${ms(page.p95)} = ${(page.p95 / tag.p95).toFixed(2)} ×`,
        target: "≤ 2 ×",
        baseline: `tag lookup p95 ${ms(tag.p95)} (the sign-in page, signed out: ${floor.rps.toFixed(0)} req/s, p95 ${ms(floor.p95)} = ${(floor.p95 / tag.p95).toFixed(2)} ×)`,
        met: page.p95 <= 2 * tag.p95,
      },
      {
        what: "securement check API (12 tiedowns), 20 connections: p95",
        figure: `${checkApi.rps.toFixed(0)} req/s, p95 ${ms(checkApi.p95)} = ${(checkApi.p95 / noDb20.p95).toFixed(2)} ×`,
        target: "< 2 ×",
        baseline: `no-database route at 20 connections: p95 ${ms(noDb20.p95)}`,
        met: checkApi.p95 < 2 * noDb20.p95,
      },
    ]);
  } finally {
    bare.kill();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
