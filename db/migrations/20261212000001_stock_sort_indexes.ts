import type { Knex } from "knex";

// The stock list sorts by WLL both ways, then by tag code (db/items.ts: `<sort> <order> nulls
// last, i.tag_code`). items_org_wll (organisation_id, wll_lb) served only the ascending half:
// on 50,000 items, "by WLL, descending" read and sorted every item of the organisation
// (a sequential scan and a top-N sort, 90-165 ms in bench/explain.ts). These two give the
// first page of either order straight from an index.
export async function up(knex: Knex): Promise<void> {
  await knex.raw("DROP INDEX IF EXISTS items_org_wll");
  await knex.raw("CREATE INDEX items_org_wll_tag ON items (organisation_id, wll_lb ASC NULLS LAST, tag_code)");
  await knex.raw("CREATE INDEX items_org_wll_desc_tag ON items (organisation_id, wll_lb DESC NULLS LAST, tag_code)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP INDEX IF EXISTS items_org_wll_tag; DROP INDEX IF EXISTS items_org_wll_desc_tag");
  await knex.raw("CREATE INDEX items_org_wll ON items (organisation_id, wll_lb)");
}
