import type { Knex } from "knex";

// Each step of a kit (ready, back to draft, loaded, returned) is written into the history of
// every item in it, as a 'kit' event whose outcome is the new state.
const BEFORE = "'created','imported','edited','moved','check','inspection','tag_out','return_to_service','retired','lost','found','correction'";

export async function up(knex: Knex): Promise<void> {
  await knex.raw("ALTER TABLE item_events DROP CONSTRAINT item_events_type_check");
  await knex.raw(`ALTER TABLE item_events ADD CONSTRAINT item_events_type_check CHECK (type IN (${BEFORE},'kit'))`);
}

export async function down(knex: Knex): Promise<void> {
  // History is append-only, so the kit entries cannot be removed: the rollback leaves them
  // out of the check with NOT VALID, which keeps existing rows and refuses new ones.
  await knex.raw("ALTER TABLE item_events DROP CONSTRAINT item_events_type_check");
  await knex.raw(`ALTER TABLE item_events ADD CONSTRAINT item_events_type_check CHECK (type IN (${BEFORE})) NOT VALID`);
}
