import type { Knex } from "knex";

// Where gear lives, and the gear itself. Weights in whole pounds, lengths in millimetres.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("yards", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.text("address");
    t.unique(["organisation_id", "name"]);
  });

  await knex.schema.createTable("items", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    // Global, not per organisation: a scanned tag must name exactly one item.
    t.text("tag_code").notNullable().unique();
    t.text("kind").notNullable();
    t.integer("grade");
    t.text("size"); // canonical trade label, e.g. "3/8" (inches) for chain and binders
    t.integer("length_mm");
    t.integer("marked_wll_lb"); // null when the item carries no WLL marking
    t.text("serial");
    t.text("status").notNullable().defaultTo("in_service");
    t.uuid("yard_id").references("yards.id");
    t.date("in_service_on");
    t.integer("cost_cents");
    t.date("next_inspection_due");
    t.jsonb("details").notNullable().defaultTo("{}"); // kind-specific: binder type, size range, width, fittings
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["organisation_id", "status"]);
    t.index(["organisation_id", "kind"]);
  });
  await knex.raw(
    "ALTER TABLE items ADD CONSTRAINT items_kind_check CHECK (kind IN ('chain','binder','web-strap','wire-rope','hook','shackle','rated-item'))",
  );
  await knex.raw(
    "ALTER TABLE items ADD CONSTRAINT items_status_check CHECK (status IN ('in_service','tagged_out','retired','lost'))",
  );
  await knex.raw("CREATE UNIQUE INDEX items_org_serial ON items (organisation_id, serial) WHERE serial IS NOT NULL");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("items");
  await knex.schema.dropTableIfExists("yards");
}
