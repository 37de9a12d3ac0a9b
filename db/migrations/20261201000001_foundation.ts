import type { Knex } from "knex";

// Organisations, people, sign-in and the audit log. Every business row carries
// organisation_id; queries always filter on the caller's organisation.
export async function up(knex: Knex): Promise<void> {
  await knex.raw('CREATE EXTENSION IF NOT EXISTS "pgcrypto"');

  await knex.schema.createTable("organisations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("name").notNullable();
    t.boolean("public_tag_view").notNullable().defaultTo(false);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // lucia reads users by id (text) and user_sessions(id, user_id, expires_at).
  await knex.schema.createTable("users", (t) => {
    t.text("id").primary();
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("email").notNullable().unique(); // stored lower-cased
    t.text("name").notNullable();
    t.text("role").notNullable();
    t.boolean("designated").notNullable().defaultTo(false);
    t.text("password_hash").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("disabled_at", { useTz: true });
    t.index(["organisation_id"]);
  });
  await knex.raw(
    "ALTER TABLE users ADD CONSTRAINT users_role_check CHECK (role IN ('owner','planner','yard_hand'))",
  );

  await knex.schema.createTable("user_sessions", (t) => {
    t.text("id").primary();
    t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.index(["user_id"]);
  });

  await knex.schema.createTable("invites", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("email").notNullable();
    t.text("role").notNullable();
    t.boolean("designated").notNullable().defaultTo(false);
    t.text("token_hash").notNullable().unique();
    t.text("invited_by").notNullable().references("users.id");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("accepted_at", { useTz: true });
    t.timestamp("revoked_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["organisation_id"]);
  });
  await knex.raw(
    "ALTER TABLE invites ADD CONSTRAINT invites_role_check CHECK (role IN ('owner','planner','yard_hand'))",
  );

  await knex.schema.createTable("password_resets", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("token_hash").notNullable().unique();
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("sign_in_attempts", (t) => {
    t.bigIncrements("id");
    t.text("email").notNullable();
    t.text("ip").notNullable();
    t.boolean("succeeded").notNullable();
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["email", "at"]);
    t.index(["ip", "at"]);
  });

  // Bearer tokens for integrators; the secret is shown once and only its hash is kept.
  await knex.schema.createTable("api_tokens", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("created_by").notNullable().references("users.id");
    t.text("name").notNullable();
    t.text("role").notNullable();
    t.text("token_hash").notNullable().unique();
    t.timestamp("last_used_at", { useTz: true });
    t.timestamp("revoked_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("audit_log", (t) => {
    t.bigIncrements("id");
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("actor_id").references("users.id");
    t.text("action").notNullable();
    t.text("entity").notNullable();
    t.text("entity_id");
    t.jsonb("before");
    t.jsonb("after");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["organisation_id", "at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [
    "audit_log",
    "api_tokens",
    "sign_in_attempts",
    "password_resets",
    "invites",
    "user_sessions",
    "users",
    "organisations",
  ]) {
    await knex.schema.dropTableIfExists(table);
  }
}
