import "server-only";
import pg from "pg";
import PgBoss from "pg-boss";
import { db } from "@/db";
import { JOB_CHANNEL, JOB_SCHEMA, QUEUES } from "@/db/jobs";
import { deleteExpiredSignUpRequests } from "@/db/signups";
import { sendPasswordReset } from "@/lib/auth/accounts";
import { config } from "@/lib/config";
import { runDueDays } from "@/lib/reminders/daily";
import { deliverMessage, giveUpMessage } from "./mail-job";

// The worker process beside the web server (npm start runs it; scripts/worker.ts is its
// entry). Any number may run: pg-boss hands each job to one of them, the mail rows are
// locked while sent, and an organisation's day is claimed in the database. Nothing about
// the queue lives in this process's memory: killed at any point, the jobs it held are
// retried once pg-boss sees them expire, and a new worker carries on.

/** Mail jobs taken at once by one worker process. */
const MAIL_CONCURRENCY = 2;

export interface RunningWorker {
  stop(): Promise<void>;
}

export async function startWorker(log: (line: string) => void = console.log): Promise<RunningWorker> {
  const boss = new PgBoss({
    connectionString: config.DATABASE_URL,
    schema: JOB_SCHEMA,
    application_name: "linkyard-worker",
    max: 4,
    supervise: true,
    schedule: true,
    migrate: true,
  });
  boss.on("error", (error) => log(`job queue error: ${error.message}`));
  await boss.start();

  // Retries from the configuration (tests shorten them); they apply to jobs sent from now on.
  const retries = { retryLimit: config.MAIL_RETRY_LIMIT, retryDelay: config.MAIL_RETRY_DELAY_SECONDS, retryBackoff: true };
  await boss.updateQueue(QUEUES.mail, { name: QUEUES.mail, ...retries, expireInSeconds: 120, deadLetter: QUEUES.mailFailed });
  await boss.updateQueue(QUEUES.resetRequest, { name: QUEUES.resetRequest, ...retries, expireInSeconds: 60 });

  const polling = { pollingIntervalSeconds: config.JOB_POLL_SECONDS };
  const workers = new Map<string, string[]>();
  const work = async <T extends object>(queue: string, handler: (job: PgBoss.Job<T>) => Promise<unknown>, count = 1) => {
    const ids: string[] = [];
    for (let i = 0; i < count; i++) ids.push(await boss.work<T>(queue, { ...polling, batchSize: 1 }, ([job]) => handler(job)));
    workers.set(queue, ids);
  };

  await work<{ messageId: string }>(
    QUEUES.mail,
    async (job) => {
      const outcome = await deliverMessage(job.data.messageId);
      log(`mail ${job.data.messageId}: ${outcome}`);
    },
    MAIL_CONCURRENCY,
  );
  await work<{ messageId: string }>(QUEUES.mailFailed, async (job) => {
    await giveUpMessage(job.data.messageId);
    log(`mail ${job.data.messageId}: failed, out of retries`);
  });
  await work<{ email: string }>(QUEUES.resetRequest, (job) => sendPasswordReset(job.id, job.data.email));
  await work(QUEUES.dailyTick, async () => {
    for (const run of await runDueDays()) log(`daily reminders queued: organisation ${run.organisationId}, ${run.day}`);
    // Sign-ups never finished keep a password hash: gone a day after their link expired.
    await deleteExpiredSignUpRequests(new Date(Date.now() - 86_400_000));
  });

  // Every minute; and once now, so that a day missed while no worker ran is caught up at once.
  await boss.schedule(QUEUES.dailyTick, "* * * * *");
  await boss.send(QUEUES.dailyTick, {}, { singletonKey: "worker-start", singletonSeconds: 20 });

  const listener = listen((queue) => {
    for (const id of workers.get(queue) ?? []) boss.notifyWorker(id);
  }, log);

  return {
    async stop() {
      await listener.stop();
      // Lets running jobs finish (up to 20 s); pg-boss fails what is left, to be retried.
      await boss.stop({ graceful: true, wait: true, timeout: 20_000 });
      await db.destroy();
    },
  };
}

/**
 * LISTEN on the job channel, so that a committed change wakes the workers at once instead of
 * at their next poll. A lost connection is made again after a pause; meanwhile polling works.
 */
function listen(onJob: (queue: string) => void, log: (line: string) => void) {
  let client: pg.Client | undefined;
  let stopped = false;
  let timer: NodeJS.Timeout | undefined;
  const later = () => {
    if (!stopped && !timer) timer = setTimeout(() => ((timer = undefined), void connect()), 2000);
  };
  const connect = async () => {
    const c = new pg.Client({ connectionString: config.DATABASE_URL, application_name: "linkyard-worker-listen" });
    c.on("notification", (n) => onJob(n.payload ?? ""));
    c.on("error", () => undefined);
    c.on("end", later);
    try {
      await c.connect();
      await c.query(`LISTEN ${JOB_CHANNEL}`);
      client = c;
    } catch (error) {
      log(`job wake-ups unavailable (${(error as Error).message}); polling meanwhile`);
      await c.end().catch(() => undefined);
      later();
    }
  };
  void connect();
  return {
    async stop() {
      stopped = true;
      clearTimeout(timer);
      await client?.end().catch(() => undefined);
    },
  };
}
