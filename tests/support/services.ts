import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { QUEUES, sendJob, type QueueName } from "../../db/jobs";
import { testDb } from "./db";

// The project's own local services, stopped and started through scripts/lib.sh's functions
// (the same the scripts use, with the ports and environment of this test run), for the
// tests of what happens when the mail server, the job worker, PostgreSQL or the file store
// goes away. They act only on this clone's cluster and pid files, on this run's ports.

const ROOT = path.resolve(__dirname, "../..");

function lib(command: string): void {
  try {
    execFileSync("bash", ["-c", `source scripts/lib.sh && ${command}`], { cwd: ROOT, env: process.env, stdio: "pipe", timeout: 90_000 });
  } catch (error) {
    // What the script said (which port, which log) belongs in the test's failure.
    const { stdout, stderr } = error as { stdout?: Buffer; stderr?: Buffer };
    throw new Error(`${command} failed: ${[stdout, stderr].map((b) => b?.toString().trim()).filter(Boolean).join("\n") || "no output"}`, { cause: error });
  }
}

const ended = (child: ChildProcess) => child.exitCode !== null || child.signalCode !== null;

/**
 * One more web process of the same build, started as the scripts start theirs (APP_SERVER),
 * answered once its health check answers. A server that exits or is not up in 40 s is a
 * failure (and is stopped).
 */
export async function startAppServer(port: number, env: NodeJS.ProcessEnv = process.env): Promise<ChildProcess> {
  // exec: the child is node itself, so that signals reach it.
  const child = spawn("bash", ["-c", `source scripts/lib.sh && exec "\${APP_SERVER[@]}" -H 127.0.0.1 -p ${port}`], { cwd: ROOT, env, stdio: "ignore" });
  for (let i = 0; i < 160; i++) {
    try {
      if ((await fetch(`http://127.0.0.1:${port}/api/health`)).ok) return child;
    } catch {
      /* not up yet */
    }
    if (ended(child)) throw new Error(`the server on port ${port} exited (${child.exitCode ?? child.signalCode})`);
    await sleep(250);
  }
  await stopAppServer(child);
  throw new Error(`the server on port ${port} did not start within 40 s`);
}

/** Stops a server of startAppServer and waits until it has exited. */
export async function stopAppServer(child: ChildProcess): Promise<void> {
  if (ended(child)) return;
  const exited = new Promise((r) => child.once("exit", r));
  child.kill("SIGTERM");
  await exited;
}

export const stopMail = () => lib("stop_mail");
export const startMail = () => lib("start_mail");
/** The worker npm test started is "test-worker"; others may run beside it under other names. */
export const stopWorker = (name = "test-worker") => lib(`stop_worker ${name}`);
export const startWorker = (name = "test-worker") => lib(`start_worker ${name}`);

/** Polls until `probe` answers something, or fails after the timeout. */
export async function waitFor<T>(what: string, probe: () => Promise<T | undefined | null | false>, timeoutMs = 30_000): Promise<T> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const value = await probe();
    if (value) return value;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`timed out waiting for ${what}`);
}

export const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Sends a job as the app does, in a committed transaction of its own. */
export async function sendTestJob(queue: QueueName, data: object = {}): Promise<void> {
  await testDb.transaction((trx) => sendJob(trx, queue, data));
}

export { QUEUES };

/** Runs a function of scripts/lib.sh for the fault tests of PostgreSQL and the file store. */
export function service(fn: "stop_postgres" | "start_postgres" | "stop_s3" | "start_s3"): void {
  lib(fn);
}

/** Polls until `ready` holds (or throws after `ms`), answering how long it took. */
export async function waitUntil(ready: () => Promise<boolean>, ms: number): Promise<number> {
  const start = Date.now();
  while (Date.now() - start < ms) {
    try {
      if (await ready()) return Date.now() - start;
    } catch {
      /* not yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`not ready within ${ms} ms`);
}
