import type { Knex } from "knex";

// The service history of every item, append-only, and the files attached to it.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("items", (t) => {
    // false when a chain carries no legible grade mark (49 CFR 393.108(d): rated as grade 30)
    t.boolean("grade_marked").notNullable().defaultTo(true);
    t.timestamp("last_checked_at", { useTz: true });
    t.date("last_inspected_on");
    // The effective WLL as lib/stock/rating.ts computed it at the last write, kept so that
    // the stock list can sort and filter on it; the engine stays the one source of truth.
    t.integer("wll_lb");
    t.text("wll_source");
  });
  await knex.raw("CREATE INDEX items_org_due ON items (organisation_id, next_inspection_due)");
  await knex.raw("CREATE INDEX items_org_yard ON items (organisation_id, yard_id)");
  await knex.raw("CREATE INDEX items_org_tag ON items (organisation_id, tag_code)");

  await knex.schema.alterTable("organisations", (t) => {
    // days between periodic inspections, by item kind; the app fills in defaults
    t.jsonb("inspection_interval_days").notNullable().defaultTo("{}");
  });

  await knex.schema.createTable("item_events", (t) => {
    t.bigIncrements("id");
    t.uuid("organisation_id").notNullable().references("organisations.id");
    t.uuid("item_id").notNullable().references("items.id");
    t.text("type").notNullable();
    t.text("outcome"); // pass / fail for checks; in_service / repair / retire for inspections
    t.jsonb("checklist"); // [{ id, label, ok }]
    t.jsonb("measurements"); // [{ id, label, value, unit, limit, exceeded }]
    t.text("note");
    t.jsonb("changes"); // for edits and moves: { field: [before, after] }
    t.bigInteger("corrects_event_id").references("item_events.id");
    t.text("actor_id").references("users.id");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["item_id", "at"]);
    t.index(["organisation_id", "at"]);
  });
  await knex.raw(`ALTER TABLE item_events ADD CONSTRAINT item_events_type_check CHECK (type IN
    ('created','imported','edited','moved','check','inspection','tag_out','return_to_service','retired','lost','found','correction'))`);
  // History is evidence: rows may be added, never changed or removed.
  await knex.raw(`
    CREATE FUNCTION item_events_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      RAISE EXCEPTION 'item_events is append-only: record a correction instead';
    END $$;
    CREATE TRIGGER item_events_no_update BEFORE UPDATE OR DELETE ON item_events
      FOR EACH ROW EXECUTE FUNCTION item_events_append_only();
  `);

  await knex.schema.createTable("attachments", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id");
    t.uuid("item_id").notNullable().references("items.id");
    t.bigInteger("event_id").references("item_events.id");
    t.text("purpose").notNullable(); // damage-photo / certificate
    t.text("storage_key").notNullable().unique();
    t.text("content_type").notNullable();
    t.integer("size_bytes").notNullable();
    t.text("original_name").notNullable();
    t.text("created_by").references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["item_id"]);
  });

  await knex.schema.createTable("tag_lookups", (t) => {
    // public tag views, for rate limiting enumeration attempts by address
    t.bigIncrements("id");
    t.text("ip").notNullable();
    t.boolean("found").notNullable();
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["ip", "at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("tag_lookups");
  await knex.schema.dropTableIfExists("attachments");
  await knex.raw("DROP TRIGGER IF EXISTS item_events_no_update ON item_events");
  await knex.schema.dropTableIfExists("item_events");
  await knex.raw("DROP FUNCTION IF EXISTS item_events_append_only()");
  await knex.schema.alterTable("organisations", (t) => t.dropColumn("inspection_interval_days"));
  await knex.raw("DROP INDEX IF EXISTS items_org_due; DROP INDEX IF EXISTS items_org_yard; DROP INDEX IF EXISTS items_org_tag");
  await knex.schema.alterTable("items", (t) => {
    t.dropColumn("grade_marked");
    t.dropColumn("last_checked_at");
    t.dropColumn("last_inspected_on");
    t.dropColumn("wll_lb");
    t.dropColumn("wll_source");
  });
}
