import type { Knex } from "knex";

// Load checks saved by name (the request as POST /api/v1/securement-checks takes it), to be
// reopened, printed and checked again against the current rules. The verdict at the time of
// saving is kept for the list; the answer itself is always worked out afresh.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("saved_checks", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.jsonb("request").notNullable();
    t.boolean("pass_at_save").notNullable();
    t.text("created_by").notNullable().references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text("updated_by").notNullable().references("users.id");
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  // One name per organisation, whatever its case.
  await knex.raw("CREATE UNIQUE INDEX saved_checks_name_unique ON saved_checks (organisation_id, lower(name))");
  await knex.raw("CREATE INDEX saved_checks_recent ON saved_checks (organisation_id, updated_at DESC)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("saved_checks");
}
