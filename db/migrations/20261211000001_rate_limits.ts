import type { Knex } from "knex";

// One table for the limits on actions that send e-mail (password resets, invites,
// sign-ups): a row per counted attempt, by limit and by key (an address, an e-mail, an
// account). In the database, so that every app process counts the same attempts.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("rate_limit_hits", (t) => {
    t.bigIncrements("id");
    t.text("bucket").notNullable();
    t.text("key").notNullable();
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["bucket", "key", "at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("rate_limit_hits");
}
