import type { Knex } from "knex";
import PgBoss from "pg-boss";
import { JOB_SCHEMA, knexJobDb } from "../jobs";

// Durable e-mail and reminders.
// - pg-boss's own tables (schema "pgboss") and its queues, made here rather than by the worker
//   at start, so that a job sent by the web app inside a change always finds its queue, and a
//   test database rolled back to empty loses its jobs with everything else. The worker's
//   pg-boss migrates this schema itself when pg-boss is upgraded.
// - mail_messages: one row per e-mail, unique by its idempotency key; the job carries only the
//   row's id. The worker sends a row once (see lib/jobs/mail-job.ts).
// - mail_opt_outs: the kinds of reminder a person chose not to receive.
// - signup_requests: a sign-up waits for its e-mail link, so that the form's answer says
//   nothing about whether the address already has an account.
// - daily_runs: one row per organisation and local day, taken by whichever worker runs the
//   day's digest first.
// - signing_keys: the key that signs unsubscribe links, shared by every process.

// No transaction around the migration: pg-boss's construction script holds its own BEGIN/COMMIT.
export const config = { transaction: false };

export async function up(knex: Knex): Promise<void> {
  const installed = await knex.raw("select 1 from information_schema.tables where table_schema = ? and table_name = 'version'", [JOB_SCHEMA]);
  if (!installed.rows.length) await knex.raw(PgBoss.getConstructionPlans(JOB_SCHEMA));
  const boss = new PgBoss({ db: knexJobDb(knex), schema: JOB_SCHEMA });
  // Retries: 30 s, then doubling with jitter (pg-boss's backoff), 9 times: between about 4
  // and 8.5 hours of a mail server being down before a message is marked failed. The worker
  // sets these from its configuration at start (tests shorten them).
  await boss.createQueue("mail-failed", { name: "mail-failed", retryLimit: 3, retryDelay: 30, retryBackoff: true });
  await boss.createQueue("mail", { name: "mail", retryLimit: 9, retryDelay: 30, retryBackoff: true, expireInSeconds: 120, deadLetter: "mail-failed" });
  await boss.createQueue("password-reset-request", { name: "password-reset-request", retryLimit: 9, retryDelay: 30, retryBackoff: true, expireInSeconds: 60 });
  await boss.createQueue("daily-tick", { name: "daily-tick", retryLimit: 1, retryDelay: 10, expireInSeconds: 300 });

  await knex.transaction(async (trx) => {
    await trx.schema.createTable("mail_messages", (t) => {
      t.uuid("id").primary().defaultTo(trx.raw("gen_random_uuid()"));
      t.uuid("organisation_id").references("organisations.id").onDelete("CASCADE");
      t.text("user_id").references("users.id").onDelete("SET NULL");
      t.text("kind").notNullable();
      t.text("idempotency_key").notNullable().unique();
      t.text("to_address").notNullable();
      t.text("subject").notNullable();
      // Emptied once sent: invite, reset and sign-up links are secrets.
      t.text("body");
      t.jsonb("headers").notNullable().defaultTo("{}");
      t.text("status").notNullable().defaultTo("queued");
      t.integer("attempts").notNullable().defaultTo(0);
      t.text("last_error");
      t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(trx.fn.now());
      t.timestamp("sent_at", { useTz: true });
      t.timestamp("failed_at", { useTz: true });
      t.index(["organisation_id", "status", "created_at"]);
    });
    await trx.raw("ALTER TABLE mail_messages ADD CONSTRAINT mail_messages_status_check CHECK (status IN ('queued','sent','failed'))");
    await trx.raw(
      "ALTER TABLE mail_messages ADD CONSTRAINT mail_messages_kind_check CHECK (kind IN ('invite','password_reset','signup','account_exists','tag_out','kit','digest'))",
    );

    await trx.schema.createTable("mail_opt_outs", (t) => {
      t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
      t.text("kind").notNullable();
      t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(trx.fn.now());
      t.primary(["user_id", "kind"]);
    });
    await trx.raw("ALTER TABLE mail_opt_outs ADD CONSTRAINT mail_opt_outs_kind_check CHECK (kind IN ('tag_out','kit','digest'))");

    await trx.schema.createTable("signup_requests", (t) => {
      t.uuid("id").primary().defaultTo(trx.raw("gen_random_uuid()"));
      t.text("email").notNullable();
      t.text("organisation_name").notNullable();
      t.text("name").notNullable();
      t.text("time_zone").notNullable();
      t.text("password_hash").notNullable();
      t.text("token_hash").notNullable().unique();
      t.timestamp("expires_at", { useTz: true }).notNullable();
      t.timestamp("used_at", { useTz: true });
      t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(trx.fn.now());
    });

    await trx.schema.createTable("daily_runs", (t) => {
      t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
      t.date("day").notNullable();
      t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(trx.fn.now());
      t.primary(["organisation_id", "day"]);
    });

    // Local wall-clock time of the daily digest, in the organisation's time zone.
    await trx.schema.alterTable("organisations", (t) => {
      t.text("digest_time").notNullable().defaultTo("06:00");
    });
    await trx.raw("ALTER TABLE organisations ADD CONSTRAINT organisations_digest_time_check CHECK (digest_time ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$')");

    await trx.schema.createTable("signing_keys", (t) => {
      t.text("name").primary();
      t.text("secret").notNullable();
    });
    await trx.raw("INSERT INTO signing_keys (name, secret) VALUES ('unsubscribe', encode(gen_random_bytes(32), 'hex'))");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.transaction(async (trx) => {
    for (const table of ["signing_keys", "daily_runs", "signup_requests", "mail_opt_outs", "mail_messages"]) {
      await trx.schema.dropTableIfExists(table);
    }
    await trx.raw("ALTER TABLE organisations DROP CONSTRAINT IF EXISTS organisations_digest_time_check");
    await trx.schema.alterTable("organisations", (t) => {
      t.dropColumn("digest_time");
    });
    await trx.raw(`DROP SCHEMA IF EXISTS ${JOB_SCHEMA} CASCADE`);
  });
}
