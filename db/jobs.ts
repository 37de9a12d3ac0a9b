import type { Knex } from "knex";
import PgBoss from "pg-boss";

// The job queue (pg-boss, in PostgreSQL). A job is written by the change that causes it, in
// that change's transaction: pg-boss runs its SQL through the adapter below, over the Knex
// transaction, so the job commits or rolls back with the change. The worker process
// (lib/jobs/worker.ts) takes the jobs.

export const JOB_SCHEMA = "pgboss";

/** Wakes the workers at once when a change that sent a job commits (polling is the fallback). */
export const JOB_CHANNEL = "linkyard_jobs";

export const QUEUES = {
  /** One e-mail: { messageId } of a mail_messages row. */
  mail: "mail",
  /** Where pg-boss puts a mail job that used up its retries: the row is marked failed. */
  mailFailed: "mail-failed",
  /** A password reset asked for an address: { email }. Looked up by the worker, not the request. */
  resetRequest: "password-reset-request",
  /** Every minute: digests and kit checks of the organisations whose time has come. */
  dailyTick: "daily-tick",
} as const;

export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

/** A value as the pg driver would send it: plain objects as JSON (Knex refuses undefined inside them). */
function binding(value: unknown): unknown {
  if (value === undefined) return null;
  if (value !== null && typeof value === "object" && Object.getPrototypeOf(value) === Object.prototype) return JSON.stringify(value);
  return value;
}

/**
 * pg-boss's SQL ($1, $2… placeholders) through Knex, which takes `?`: each `$n` becomes a `?`
 * with its value (a value used twice is passed twice), and literal question marks are escaped.
 */
export function knexJobDb(trx: Knex) {
  return {
    async executeSql(text: string, values: unknown[] = []) {
      const bindings: unknown[] = [];
      const sql = text.replaceAll("?", "\\?").replace(/\$(\d+)/g, (_, n: string) => {
        bindings.push(binding(values[Number(n) - 1]));
        return "?";
      });
      const result = await trx.raw(sql, bindings as Knex.RawBinding[]);
      return { rows: (result as { rows?: unknown[] }).rows ?? [] };
    },
  };
}

// Sends only: no connection of its own, every send names the transaction it belongs to.
const sender = new PgBoss({
  schema: JOB_SCHEMA,
  db: {
    executeSql: () => Promise.reject(new Error("A job is sent inside a change's transaction: use sendJob(trx, …).")),
  },
});

/**
 * Sends a job inside a transaction; it becomes visible to the workers when the transaction
 * commits, and is gone if it rolls back. Returns the job's id, or null when pg-boss's
 * singleton key refused a second job (only the daily tick uses one).
 * @example await sendJob(trx, QUEUES.mail, { messageId })
 */
export async function sendJob(trx: Knex, queue: QueueName, data: object, options: PgBoss.SendOptions = {}): Promise<string | null> {
  const id = await sender.send(queue, data, { ...options, db: knexJobDb(trx) });
  if (!id && !options.singletonKey) throw new Error(`The job queue "${queue}" did not take the job: is the database migrated?`);
  // NOTIFY is delivered on commit, never for a rolled-back change.
  await trx.raw("select pg_notify(?, ?)", [JOB_CHANNEL, queue]);
  return id;
}
