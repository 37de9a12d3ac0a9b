import type { Knex } from "knex";

// The organisation's time zone (an IANA name): "today", overdue inspections and every date
// and time shown to its people are in it. Organisations made before it get UTC, which is
// what they saw until now; an owner sets the real zone on the Settings page.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("organisations", (t) => {
    t.text("time_zone").notNullable().defaultTo("UTC");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("organisations", (t) => {
    t.dropColumn("time_zone");
  });
}
