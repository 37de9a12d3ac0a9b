// The job worker: sends the queued e-mail and runs the daily reminders (lib/jobs/worker.ts).
// scripts/lib.sh starts it beside the web server:
//   node --conditions=react-server --import tsx scripts/worker.ts
// (react-server: the server-only marker of lib/ modules resolves as it does inside Next).
// SIGTERM or SIGINT stops it cleanly: running jobs finish, the rest wait for the next worker.
import { startWorker } from "@/lib/jobs/worker";

const log = (line: string) => console.log(`${new Date().toISOString()} ${line}`);

async function main() {
  const worker = await startWorker(log);
  log("worker ready");
  let stopping = false;
  for (const signal of ["SIGTERM", "SIGINT"] as const) {
    process.on(signal, async () => {
      if (stopping) return;
      stopping = true;
      log(`${signal}: stopping`);
      await worker.stop();
      log("worker stopped");
      process.exit(0);
    });
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
