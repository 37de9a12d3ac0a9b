// Stock list speed with 50,000 items in one organisation, through the served app: the
// bench organisation of bench/seed.ts. Run by bench/run.sh (the bench server and its state).
import { BASE, benchState, signIn } from "./lib";

const ROUNDS = 20;

async function main() {
  const state = benchState();
  const cookie = await signIn(state.email, state.password);
  console.log(`${state.itemCount.toLocaleString("en-US")} items in the bench organisation`);
  const cases: [string, string][] = [
    ["first page, by tag", "page=1&perPage=25"],
    ["page 1000, by tag", "page=1000&perPage=25"],
    ["sorted by WLL, descending", "sort=wllLb&order=desc"],
    ["tagged out, by inspection due", "status=tagged_out&sort=nextInspectionDue"],
    ["kind chain + overdue", "kind=chain&due=overdue"],
    ["search a serial prefix", "q=BY-4999"],
    ["search a tag code prefix", "q=ab"],
  ];
  console.log(`\nGET /api/v1/items, ${ROUNDS} rounds each (ms)`);
  console.log("case".padEnd(34), "p50".padStart(7), "p95".padStart(7), "max".padStart(7), "rows".padStart(7));
  for (const [label, query] of cases) {
    const times: number[] = [];
    let total = 0;
    for (let i = 0; i < ROUNDS; i++) {
      const t = performance.now();
      const res = await fetch(`${BASE}/api/v1/items?${query}`, { headers: { cookie } });
      const body = await res.json();
      times.push(performance.now() - t);
      total = body.total;
      if (res.status !== 200) throw new Error(`${label}: ${res.status} ${JSON.stringify(body)}`);
    }
    times.sort((a, b) => a - b);
    const p = (q: number) => times[Math.min(times.length - 1, Math.floor(q * times.length))].toFixed(1);
    console.log(label.padEnd(34), p(0.5).padStart(7), p(0.95).padStart(7), times.at(-1)!.toFixed(1).padStart(7), String(total).padStart(7));
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
