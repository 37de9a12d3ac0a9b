import type { Knex } from "knex";

// Machines, trailers with their rated anchor points, and kits: the tiedowns planned for one
// machine on one trailer on one date. Weights in whole pounds, lengths in whole millimetres.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("organisations", (t) => {
    // the system figures are shown in first; the other one is always shown beside it
    t.text("units").notNullable().defaultTo("us");
  });
  await knex.raw("ALTER TABLE organisations ADD CONSTRAINT organisations_units_check CHECK (units IN ('us','metric'))");

  // The organisation's own machine classes, beside the built-in list of lib/kits/model.ts.
  await knex.schema.createTable("machine_classes", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("CREATE UNIQUE INDEX machine_classes_org_name ON machine_classes (organisation_id, lower(name))");

  await knex.schema.createTable("machines", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.text("machine_class").notNullable(); // a built-in key or one of the organisation's class names
    t.integer("weight_lb").notNullable();
    t.integer("length_mm").notNullable();
    t.integer("width_mm");
    t.integer("height_mm");
    t.boolean("articulated").notNullable().defaultTo(false);
    t.jsonb("accessories").notNullable().defaultTo("[]"); // ["bucket", "blade"]
    t.jsonb("tiedown_points").notNullable().defaultTo("[]"); // [{ label, side, positionMm }]
    t.integer("cg_from_front_mm"); // null: the middle of the length is assumed
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("CREATE UNIQUE INDEX machines_org_name ON machines (organisation_id, lower(name))");
  await knex.raw("ALTER TABLE machines ADD CONSTRAINT machines_figures_check CHECK (weight_lb > 0 AND length_mm > 0)");

  await knex.schema.createTable("trailers", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.text("trailer_type").notNullable();
    t.text("coupling").notNullable();
    t.integer("deck_length_mm").notNullable();
    t.integer("tilt_length_mm").notNullable().defaultTo(0);
    t.integer("deck_width_mm");
    t.integer("gvwr_lb").notNullable();
    t.integer("empty_weight_lb").notNullable();
    t.integer("empty_tongue_weight_lb").notNullable();
    t.integer("hitch_to_axle_mm").notNullable();
    t.integer("hitch_to_deck_front_mm");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("CREATE UNIQUE INDEX trailers_org_name ON trailers (organisation_id, lower(name))");
  await knex.raw(`ALTER TABLE trailers
    ADD CONSTRAINT trailers_type_check CHECK (trailer_type IN ('tilt-deck','split-tilt-deck','tag-along','gooseneck','lowboy','other')),
    ADD CONSTRAINT trailers_coupling_check CHECK (coupling IN ('ball','pintle','gooseneck','fifth-wheel')),
    ADD CONSTRAINT trailers_deck_check CHECK (deck_length_mm > 0 AND tilt_length_mm >= 0 AND tilt_length_mm <= deck_length_mm)`);

  // Rated gear fixed to the deck. Never deleted (kits refer to them): retired instead.
  await knex.schema.createTable("anchor_points", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.uuid("trailer_id").notNullable().references("trailers.id");
    t.text("label").notNullable();
    t.text("side").notNullable();
    t.integer("position_mm").notNullable(); // from the front of the deck
    t.integer("wll_lb").notNullable();
    t.text("status").notNullable().defaultTo("in_service");
    t.date("next_inspection_due");
    t.date("last_inspected_on");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["trailer_id"]);
  });
  await knex.raw(`ALTER TABLE anchor_points
    ADD CONSTRAINT anchor_points_side_check CHECK (side IN ('left','right','centre')),
    ADD CONSTRAINT anchor_points_status_check CHECK (status IN ('in_service','tagged_out','retired')),
    ADD CONSTRAINT anchor_points_figures_check CHECK (wll_lb > 0 AND position_mm >= 0)`);
  // Two points in use on one trailer never share a label (a retired one may).
  await knex.raw("CREATE UNIQUE INDEX anchor_points_trailer_label ON anchor_points (trailer_id, lower(label)) WHERE status <> 'retired'");

  await knex.schema.createTable("anchor_point_events", (t) => {
    t.bigIncrements("id");
    t.uuid("organisation_id").notNullable().references("organisations.id");
    t.uuid("anchor_point_id").notNullable().references("anchor_points.id");
    t.text("type").notNullable();
    t.text("outcome");
    t.text("note");
    t.jsonb("changes");
    t.text("actor_id").references("users.id");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["anchor_point_id", "at"]);
  });
  await knex.raw(`ALTER TABLE anchor_point_events ADD CONSTRAINT anchor_point_events_type_check CHECK (type IN
    ('created','edited','inspection','tag_out','return_to_service','retired'))`);
  // Evidence, like item_events: rows may be added, never changed or removed.
  await knex.raw(`
    CREATE FUNCTION anchor_point_events_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      RAISE EXCEPTION 'anchor_point_events is append-only';
    END $$;
    CREATE TRIGGER anchor_point_events_no_update BEFORE UPDATE OR DELETE ON anchor_point_events
      FOR EACH ROW EXECUTE FUNCTION anchor_point_events_append_only();
  `);

  await knex.schema.createTable("kits", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.date("date").notNullable(); // never changes: a kit for another date is a copy
    t.text("job").notNullable();
    t.text("site");
    t.uuid("machine_id").notNullable().references("machines.id");
    t.uuid("trailer_id").notNullable().references("trailers.id");
    t.text("state").notNullable().defaultTo("draft");
    t.boolean("articulation_restrained").notNullable().defaultTo(false);
    t.integer("machine_front_from_deck_front_mm");
    t.uuid("copied_from").references("kits.id").onDelete("SET NULL");
    t.text("created_by").references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["organisation_id", "date"]);
    t.unique(["id", "date"]); // target of kit_items' (kit_id, kit_date) key
  });
  await knex.raw("ALTER TABLE kits ADD CONSTRAINT kits_state_check CHECK (state IN ('draft','ready','loaded','returned'))");

  await knex.schema.createTable("kit_tiedowns", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.uuid("kit_id").notNullable().references("kits.id").onDelete("CASCADE");
    t.integer("position").notNullable();
    t.text("label").notNullable();
    t.uuid("anchor_point_id").notNullable().references("anchor_points.id");
    t.text("attachment").notNullable();
    t.text("secures").notNullable().defaultTo("machine");
    t.text("machine_point");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["kit_id"]);
    t.unique(["id", "kit_id"]); // target of kit_items' (tiedown_id, kit_id) key
  });
  await knex.raw("ALTER TABLE kit_tiedowns ADD CONSTRAINT kit_tiedowns_attachment_check CHECK (attachment IN ('direct','indirect-same-side','indirect-across'))");

  // One row per item in a kit. kit_date repeats the kit's date so that the database itself
  // refuses a second kit for the same item on the same date (kit_items_item_date); the
  // composite keys keep it equal to the kit's date and the tiedown inside the same kit.
  await knex.schema.createTable("kit_items", (t) => {
    t.bigIncrements("id");
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.uuid("kit_id").notNullable();
    t.uuid("tiedown_id").notNullable();
    t.uuid("item_id").notNullable().references("items.id");
    t.date("kit_date").notNullable();
    t.integer("position").notNullable();
    t.foreign(["kit_id", "kit_date"]).references(["id", "date"]).inTable("kits").onDelete("CASCADE");
    t.foreign(["tiedown_id", "kit_id"]).references(["id", "kit_id"]).inTable("kit_tiedowns").onDelete("CASCADE");
    t.unique(["item_id", "kit_date"], { indexName: "kit_items_item_date" });
    t.index(["kit_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("kit_items");
  await knex.schema.dropTableIfExists("kit_tiedowns");
  await knex.schema.dropTableIfExists("kits");
  await knex.raw("DROP TRIGGER IF EXISTS anchor_point_events_no_update ON anchor_point_events");
  await knex.schema.dropTableIfExists("anchor_point_events");
  await knex.raw("DROP FUNCTION IF EXISTS anchor_point_events_append_only()");
  await knex.schema.dropTableIfExists("anchor_points");
  await knex.schema.dropTableIfExists("trailers");
  await knex.schema.dropTableIfExists("machines");
  await knex.schema.dropTableIfExists("machine_classes");
  await knex.raw("ALTER TABLE organisations DROP CONSTRAINT IF EXISTS organisations_units_check");
  await knex.schema.alterTable("organisations", (t) => t.dropColumn("units"));
}
