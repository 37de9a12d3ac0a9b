// What the bench scripts share: where the bench server is, who signs in, the load generator
// (autocannon) with exact percentiles, and the results file the table is printed from.
// bench/run.sh sets LINKYARD_BENCH_URL and DATABASE_URL (the bench database) and runs
// bench/seed.ts first, which writes .data/bench/state.json.
import { appendFileSync, mkdirSync, readFileSync } from "node:fs";
import path from "node:path";
import autocannon from "autocannon";

export const ROOT = path.resolve(__dirname, "..");
export const OUT = path.join(ROOT, ".data", "bench");
export const BASE = process.env.LINKYARD_BENCH_URL ?? "http://127.0.0.1:3102";
const RESULTS = path.join(OUT, "results.jsonl");

/** What bench/seed.ts left: the bench organisation, its owner, and some of its items. */
export interface BenchState {
  organisationId: string;
  email: string;
  importOrganisationId: string;
  importEmail: string;
  password: string;
  itemCount: number;
  tagCodes: string[];
  itemIds: string[];
}

export function benchState(): BenchState {
  return JSON.parse(readFileSync(path.join(OUT, "state.json"), "utf8"));
}

/** A random address in IPv6's documentation range: the bench server trusts 127.0.0.1 as its proxy. */
export function benchAddress(): string {
  const part = () => Math.floor(Math.random() * 0x10000).toString(16);
  return `2001:db8:be:${part()}:${part()}:${part()}:${part()}:${part()}`;
}

/** Signs in through the API and answers the session cookie ("name=value"). */
export async function signIn(email: string, password: string, base = BASE): Promise<string> {
  const res = await fetch(`${base}/api/v1/sessions`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: base, "x-forwarded-for": benchAddress() },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`sign-in as ${email} failed: ${res.status} ${await res.text()}`);
  return res.headers.get("set-cookie")!.split(";")[0]!;
}

/** The value at quantile q (0..1) of ascending numbers. */
export function quantile(sorted: number[], q: number): number {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1))]!;
}

export interface LoadResult {
  label: string;
  connections: number;
  seconds: number;
  requests: number;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  statuses: Record<string, number>;
  /** Requests without an answer (timeouts after 10 s, broken connections): reported, never hidden. */
  failures: number;
}

export interface LoadOptions {
  label: string;
  url: string;
  connections: number;
  seconds: number;
  /** A new path for each request (e.g. another tag code); otherwise the url's own. */
  path?: () => string;
  method?: "GET" | "POST";
  headers?: Record<string, string>;
  body?: string;
  /** The one status every answer must have: a run with any other is reported as failed. */
  expect: number;
}

/**
 * One run of autocannon, bounded in time (seconds) and by its connections, on loopback. Its own
 * histogram has no 95th percentile, so every response time is kept and sorted here.
 */
export async function load(o: LoadOptions): Promise<LoadResult> {
  const times: number[] = [];
  const statuses: Record<string, number> = {};
  const url = new URL(o.url);
  let done!: (r: autocannon.Result) => void;
  let failed!: (e: unknown) => void;
  const finished = new Promise<autocannon.Result>((resolve, reject) => ((done = resolve), (failed = reject)));
  const instance = autocannon({
    url: url.origin,
    connections: o.connections,
    duration: o.seconds,
    timeout: 10,
    requests: [
      {
        method: o.method ?? "GET",
        path: url.pathname + url.search,
        headers: o.headers,
        body: o.body,
        ...(o.path && { setupRequest: (req: autocannon.Request) => ({ ...req, path: o.path!() }) }),
      },
    ],
  }, (error, result) => (error ? failed(error) : done(result)));
  instance.on("response", (_client, status: number, _bytes: number, ms: number) => {
    times.push(ms);
    statuses[status] = (statuses[status] ?? 0) + 1;
  });
  const result = await finished;
  times.sort((a, b) => a - b);
  const failures = result.errors + result.timeouts; // no answer in 10 s, or a broken connection
  const r: LoadResult = {
    label: o.label,
    connections: o.connections,
    seconds: o.seconds,
    requests: times.length,
    rps: times.length / o.seconds,
    p50: quantile(times, 0.5),
    p95: quantile(times, 0.95),
    p99: quantile(times, 0.99),
    statuses,
    failures,
  };
  const wrong = Object.entries(statuses).filter(([s]) => s !== String(o.expect));
  console.log(
    `${o.label.padEnd(58)} ${r.rps.toFixed(0).padStart(6)} req/s  p50 ${r.p50.toFixed(1).padStart(6)} ms  p95 ${r.p95.toFixed(1).padStart(6)} ms  p99 ${r.p99.toFixed(1).padStart(6)} ms  (${o.connections} conn, ${o.seconds} s, ${r.requests} answers${wrong.length ? `; UNEXPECTED ${JSON.stringify(statuses)}` : `, all ${o.expect}`}${failures ? `; ${failures} WITHOUT ANSWER` : ""})`,
  );
  if (wrong.length) throw new Error(`${o.label}: answers other than ${o.expect}: ${JSON.stringify(statuses)}`);
  return r;
}

/** One line of the final table: a figure beside its target and the baseline it is a ratio of. */
export interface Row {
  what: string;
  figure: string;
  target: string;
  baseline: string;
  met: boolean | null;
}

export function record(rows: Row[]): void {
  mkdirSync(OUT, { recursive: true });
  for (const row of rows) appendFileSync(RESULTS, JSON.stringify(row) + "\n");
}

export function recordedRows(): Row[] {
  try {
    return readFileSync(RESULTS, "utf8").split("\n").filter(Boolean).map((l) => JSON.parse(l) as Row);
  } catch {
    return [];
  }
}

export const ms = (n: number) => `${n < 10 ? n.toFixed(2) : n.toFixed(0)} ms`;
export const pct = (n: number) => `${(n * 100).toFixed(0)} %`;
