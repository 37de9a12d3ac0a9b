// Benchmark of "propose a kit" through the API, against a running app with the demo data
// (npm start): signs in as the demo planner and times POST /api/v1/kits/{id}/proposal (nothing
// saved) for each of tomorrow's demo kits, then prints the median and 95th percentile of the
// round trip against the target of 200 ms. Asserts nothing; changes nothing.
// Run: node --import tsx bench/kit-proposal-api.ts   (LINKYARD_BASE_URL, default http://127.0.0.1:$PORT or :3000)
import { performance } from "node:perf_hooks";

const BASE = process.env.LINKYARD_BASE_URL ?? `http://127.0.0.1:${process.env.PORT ?? 3000}`;
const RUNS = Number(process.env.RUNS ?? 60);
const TARGET_MS = 200;

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
}

async function main() {
  const signIn = await fetch(`${BASE}/api/v1/sessions`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: BASE },
    body: JSON.stringify({ email: "pete@corvid-hollow.example", password: "yard-demo-2026" }),
  });
  if (!signIn.ok) throw new Error(`sign-in failed: ${signIn.status} (is the demo data loaded at ${BASE}?)`);
  const cookie = signIn.headers.get("set-cookie")!.split(";")[0]!;
  const headers = { cookie, origin: BASE };
  const items = await (await fetch(`${BASE}/api/v1/items?perPage=1`, { headers })).json();
  const kits = (await (await fetch(`${BASE}/api/v1/kits`, { headers })).json()).data as { id: string; job: string; date: string }[];
  const demo = kits.filter((k) => k.job === "Hollins driveway" || k.job === "Brookside culvert");
  if (!demo.length) throw new Error("no demo kits in the coming days");
  console.log(`${BASE}; the demo yard: ${items.total} items; ${RUNS} proposals per kit after 5 to warm up; target < ${TARGET_MS} ms a round trip`);
  for (const kit of demo) {
    const propose = async () => {
      const res = await fetch(`${BASE}/api/v1/kits/${kit.id}/proposal`, { method: "POST", headers });
      if (!res.ok) throw new Error(`proposal: ${res.status} ${await res.text()}`);
      return res.json() as Promise<{ pass: boolean; tiedowns: { itemIds: string[] }[]; missing: string[] }>;
    };
    for (let i = 0; i < 5; i++) await propose();
    const times: number[] = [];
    let last = await propose();
    for (let i = 0; i < RUNS; i++) {
      const start = performance.now();
      last = await propose();
      times.push(performance.now() - start);
    }
    times.sort((a, b) => a - b);
    const verdict = last.pass ? `passes, ${last.tiedowns.flatMap((t) => t.itemIds).length} items` : `does not pass, ${last.missing.length} missing`;
    console.log(
      `${`${kit.job} (${kit.date})`.padEnd(32)} median ${percentile(times, 50).toFixed(1).padStart(6)} ms  p95 ${percentile(times, 95).toFixed(1).padStart(6)} ms  max ${times.at(-1)!.toFixed(1).padStart(6)} ms  (${verdict})`,
    );
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
