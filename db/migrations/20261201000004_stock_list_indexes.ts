import type { Knex } from "knex";

// Indexes for the stock list's sorts and prefix searches (bench/stock-list.ts measures them).
export async function up(knex: Knex): Promise<void> {
  await knex.raw("CREATE INDEX items_org_wll ON items (organisation_id, wll_lb)");
  await knex.raw("CREATE INDEX items_org_tag_prefix ON items (organisation_id, tag_code text_pattern_ops)");
  await knex.raw("CREATE INDEX items_org_serial_prefix ON items (organisation_id, upper(serial) text_pattern_ops)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP INDEX IF EXISTS items_org_wll; DROP INDEX IF EXISTS items_org_tag_prefix; DROP INDEX IF EXISTS items_org_serial_prefix");
}
