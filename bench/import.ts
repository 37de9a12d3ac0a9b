// CSV import of 100,000 rows through the served app: time, and the server's memory, against
// the baseline of `psql \copy` of the same file into a plain table of text columns.
// Run by bench/run.sh (the bench server, its database, bench/seed.ts's import organisation);
// PSQL names the psql binary (scripts/lib.sh's PostgreSQL). By hand, against a served app:
//   LINKYARD_BENCH_URL=http://127.0.0.1:3200 DATABASE_URL=… PSQL=/usr/lib/postgresql/15/bin/psql node --import tsx bench/import.ts
// It writes the CSV to .data/bench/, checks the file (dry run), imports it, and samples the
// resident memory (VmRSS) of the process that listens on the app's port from /proc every
// 50 ms, with its peak (VmHWM). The items stay in the bench database (reset by every run).
import { createWriteStream, mkdirSync, openAsBlob, readdirSync, readFileSync, readlinkSync, statSync } from "node:fs";
import path from "node:path";
import { finished } from "node:stream/promises";
import { spawnSync } from "node:child_process";
import knex from "knex";
import knexConfig from "../knexfile";
import { BASE, benchState, ms, OUT, record, signIn } from "./lib";

const N = Number(process.env.BENCH_ROWS ?? 100_000);
const MEMORY_LIMIT_MB = 400;

async function writeCsv(file: string, yard: string) {
  const out = createWriteStream(file);
  const stamp = Date.now().toString(36).toUpperCase();
  out.write("Kind,Grade,Size,WLL (lb),Takes chain,Length (ft),End fittings,Serial/Lot,Yard,In service,Cost\r\n");
  const rows = [
    (i: number) => `chain,G70,3/8,,,20,grab hook both ends,B${stamp}-${i},${yard},2026-01-15,119.00`,
    (i: number) => `ratchet binder,,,5400,5/16-3/8,,,B${stamp}-${i},${yard},2026-01-15,69.00`,
    (i: number) => `web strap,,4,5400,,30,"flat hooks, sewn",B${stamp}-${i},${yard},2026-01-15,49.00`,
    (i: number) => `chain,80,1/2,,,16,clevis grab hook both ends,B${stamp}-${i},${yard},2026-01-15,245.00`,
    (i: number) => `shackle,,5/8,6500,,,screw pin anchor shackle,B${stamp}-${i},${yard},2026-01-15,19.00`,
  ];
  for (let i = 1; i <= N; i++) {
    if (!out.write(rows[i % rows.length](i) + "\r\n")) await new Promise<void>((r) => out.once("drain", () => r()));
  }
  out.end();
  await finished(out);
}

/** The process listening on the app's port, found through /proc (no ss or lsof needed). */
function serverPid(port: number): number {
  const inodes = new Set<string>();
  for (const table of ["/proc/net/tcp", "/proc/net/tcp6"]) {
    for (const line of readFileSync(table, "utf8").split("\n").slice(1)) {
      const f = line.trim().split(/\s+/);
      if (f.length > 9 && f[3] === "0A" && parseInt(f[1].split(":")[1], 16) === port) inodes.add(f[9]);
    }
  }
  for (const pid of readdirSync("/proc").filter((d) => /^\d+$/.test(d))) {
    try {
      for (const fd of readdirSync(`/proc/${pid}/fd`)) {
        const link = readlinkSync(`/proc/${pid}/fd/${fd}`);
        const m = /^socket:\[(\d+)\]$/.exec(link);
        if (m && inodes.has(m[1])) return Number(pid);
      }
    } catch {
      /* not ours to read, or gone */
    }
  }
  throw new Error(`no process listens on port ${port}`);
}

const memory = (pid: number) => {
  const status = readFileSync(`/proc/${pid}/status`, "utf8");
  const kb = (key: string) => Number(new RegExp(`^${key}:\\s+(\\d+) kB`, "m").exec(status)?.[1] ?? 0);
  return { rss: kb("VmRSS"), hwm: kb("VmHWM") };
};
const mb = (kb: number) => `${(kb / 1024).toFixed(0)} MB`;

async function measured<T>(pid: number, label: string, work: () => Promise<T>): Promise<{ value: T; seconds: number; peakKb: number }> {
  const before = memory(pid);
  let peak = before.rss;
  const timer = setInterval(() => (peak = Math.max(peak, memory(pid).rss)), 50);
  const t0 = performance.now();
  let seconds = 0;
  try {
    const value = await work();
    seconds = (performance.now() - t0) / 1000;
    return { value, seconds, peakKb: peak };
  } finally {
    clearInterval(timer);
    const after = memory(pid);
    peak = Math.max(peak, after.rss);
    console.log(
      `${label.padEnd(10)} ${((performance.now() - t0) / 1000).toFixed(1).padStart(6)} s   RSS before ${mb(before.rss).padStart(7)}   peak ${mb(peak).padStart(7)} (+${mb(peak - before.rss)})   after ${mb(after.rss).padStart(7)}   VmHWM ${mb(after.hwm)}`,
    );
  }
}

/** The baseline: psql's \copy of the same file into a plain table, timed from start to exit. */
function copyBaseline(file: string): number {
  const psql = process.env.PSQL ?? "psql";
  const url = process.env.DATABASE_URL!;
  const run = (command: string) => {
    const r = spawnSync(psql, [url, "-v", "ON_ERROR_STOP=1", "-qc", command], { encoding: "utf8" });
    if (r.status !== 0) throw new Error(`psql: ${r.stderr}`);
  };
  run("drop table if exists bench_copy; create table bench_copy (kind text, grade text, size text, wll text, takes_chain text, length text, fittings text, serial text, yard text, in_service text, cost text)");
  const t0 = performance.now();
  run(`\\copy bench_copy from '${file}' with (format csv, header true)`);
  const seconds = (performance.now() - t0) / 1000;
  run("drop table bench_copy");
  return seconds;
}

async function main() {
  const db = knex(knexConfig);
  const pid = serverPid(Number(new URL(BASE).port || 80));
  const atRestKb = memory(pid).rss;
  const state = benchState();
  const cookie = await signIn(state.importEmail, state.password);

  mkdirSync(OUT, { recursive: true });
  const file = path.join(OUT, `import-${N}.csv`);
  await writeCsv(file, "Import yard");
  console.log(`${N.toLocaleString("en-US")} rows, ${(statSync(file).size / 1024 / 1024).toFixed(1)} MB; server pid ${pid}\n`);

  const copySeconds = copyBaseline(file);
  console.log(`${"psql \\copy".padEnd(10)} ${copySeconds.toFixed(1).padStart(6)} s   (the same rows into a plain table: the baseline)`);

  const post = async (query: string) => {
    const form = new FormData();
    form.append("file", await openAsBlob(file, { type: "text/csv" }), path.basename(file));
    const res = await fetch(`${BASE}/api/v1/imports${query}`, { method: "POST", headers: { cookie, origin: BASE }, body: form });
    const body = await res.json();
    if (!res.ok) throw new Error(`${res.status}: ${JSON.stringify(body).slice(0, 500)}`);
    return body;
  };
  const check = await measured(pid, "dry run", () => post("?dryRun=true"));
  console.log(`           ${check.value.created} to add, ${check.value.errorCount} errors`);
  const done = await measured(pid, "import", () => post(""));
  console.log(`           ${done.value.created} added, ${done.value.rejected} rejected, batch ${done.value.batchId}`);
  const items = await db("items").where({ organisation_id: state.importOrganisationId }).count<{ count: string }[]>("id as count");
  console.log(`           ${items[0].count} items in the import organisation`);
  if (Number(items[0].count) !== N) throw new Error(`expected ${N} items after the import, found ${items[0].count}`);
  await db.destroy();

  const peakMb = Math.max(check.peakKb, done.peakKb) / 1024;
  if (process.argv.includes("--record")) {
    record([
      {
        what: `CSV import, ${N.toLocaleString("en-US")} rows checked and committed: time`,
        figure: `${done.seconds.toFixed(1)} s = ${(done.seconds / copySeconds).toFixed(1)} × (dry run alone ${check.seconds.toFixed(1)} s)`,
        target: "≤ 10 ×",
        baseline: `psql \\copy ${ms(copySeconds * 1000)}`,
        met: done.seconds <= 10 * copySeconds,
      },
      {
        what: "CSV import: server peak memory (RSS)",
        figure: `${peakMb.toFixed(0)} MB`,
        target: `< ${MEMORY_LIMIT_MB} MB`,
        baseline: `server RSS at rest ${(atRestKb / 1024).toFixed(0)} MB`,
        met: peakMb < MEMORY_LIMIT_MB,
      },
    ]);
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
