import type { Knex } from "knex";

// Whether the item's last pre-use check passed, beside the time of that check
// (last_checked_at), so that the usability verdict can say "checked today, no defects"
// without reading the history. Filled from the history for items checked before.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("items", (t) => {
    t.boolean("last_check_passed");
  });
  await knex.raw(`
    UPDATE items i SET last_check_passed = (e.outcome = 'pass')
    FROM (SELECT DISTINCT ON (item_id) item_id, outcome FROM item_events WHERE type = 'check' ORDER BY item_id, id DESC) e
    WHERE e.item_id = i.id
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("items", (t) => {
    t.dropColumn("last_check_passed");
  });
}
