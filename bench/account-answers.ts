// Issue 11.3: how long the account forms take to answer for an address that has an account
// and for one that has none. Run by bench/run.sh against the bench server (demo data loaded),
// or by hand against another app and ITS database (DATABASE_URL):
//   LINKYARD_BENCH_URL=http://127.0.0.1:3200 DATABASE_URL=… node --import tsx bench/account-answers.ts
// The e-mail limits (lib/auth/mail-limits.ts: 3 resets or sign-ups an hour per e-mail address)
// would answer 429 from the fourth request on, which measures the limit, not the form: before
// each request this empties the rate_limit_hits table of the database it is given, so point
// it only at a bench or test database, never at one whose limits matter.
// Known address: the demo owner. Requests alternate known / unknown, one at a time, after a
// few warm-up requests; it prints the median, the 10th and 90th percentiles in ms, and the
// statuses seen. Each known request queues a real e-mail (the worker sends it).

import knex from "knex";
import knexConfig from "../knexfile";

const BASE = process.env.LINKYARD_BENCH_URL ?? process.env.LINKYARD_BASE_URL ?? "http://127.0.0.1:3000";
const db = knex(knexConfig);
const N = Number(process.env.BENCH_REQUESTS ?? 50);
const KNOWN = process.env.BENCH_KNOWN_EMAIL ?? "olive@corvid-hollow.example";

async function timed(path: string, body: unknown): Promise<{ ms: number; status: number }> {
  await db("rate_limit_hits").delete();
  const started = performance.now();
  const res = await fetch(BASE + path, { method: "POST", headers: { "content-type": "application/json", origin: BASE }, body: JSON.stringify(body) });
  await res.text();
  return { ms: performance.now() - started, status: res.status };
}

const quantile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];

function summary(name: string, runs: { ms: number; status: number }[]) {
  const ms = runs.map((r) => r.ms).sort((a, b) => a - b);
  const statuses = [...new Set(runs.map((r) => r.status))].join(",");
  console.log(`${name.padEnd(26)} n=${runs.length}  median ${quantile(ms, 0.5).toFixed(1)} ms  p10 ${quantile(ms, 0.1).toFixed(1)}  p90 ${quantile(ms, 0.9).toFixed(1)}  status ${statuses}`);
}

async function compare(label: string, path: string, bodyFor: (email: string) => unknown) {
  const unknownEmail = () => `nobody-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}@bench.example`;
  for (let i = 0; i < 5; i++) {
    await timed(path, bodyFor(KNOWN));
    await timed(path, bodyFor(unknownEmail()));
  }
  const known: { ms: number; status: number }[] = [];
  const unknown: { ms: number; status: number }[] = [];
  for (let i = 0; i < N; i++) {
    known.push(await timed(path, bodyFor(KNOWN)));
    unknown.push(await timed(path, bodyFor(unknownEmail())));
  }
  summary(`${label}, known address`, known);
  summary(`${label}, unknown address`, unknown);
}

async function main() {
  console.log(`${BASE}, ${N} requests of each, alternating`);
  await compare("password reset", "/api/v1/password-resets", (email) => ({ email }));
  await compare("sign-up", "/api/v1/signups", (email) => ({ organisationName: "Bench Co", name: "Bench", email, password: "bench-password-2026" }));
  await db.destroy();
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
