import type { Knex } from "knex";

// CSV imports of stock: one batch per committed file (who, when, the original file, counts),
// the stored values an import replaced (so that it can be undone), and column mappings saved
// by name for the next file from the same supplier.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("import_batches", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("created_by").notNullable().references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("finished_at", { useTz: true });
    t.text("file_name").notNullable();
    t.text("file_key"); // the original file in object storage
    t.bigInteger("file_bytes").notNullable().defaultTo(0);
    t.text("rejected_key"); // the rejected rows with their errors, when only valid rows went in
    t.text("delimiter");
    t.text("encoding");
    t.jsonb("mapping").notNullable().defaultTo("{}"); // { header: field | null }
    t.boolean("valid_only").notNullable().defaultTo(false);
    t.text("status").notNullable().defaultTo("running");
    t.integer("rows_processed").notNullable().defaultTo(0); // progress while running
    t.bigInteger("bytes_processed").notNullable().defaultTo(0);
    t.integer("rows_total").notNullable().defaultTo(0);
    t.integer("created_count").notNullable().defaultTo(0);
    t.integer("updated_count").notNullable().defaultTo(0);
    t.integer("unchanged_count").notNullable().defaultTo(0);
    t.integer("rejected_count").notNullable().defaultTo(0);
    // the last history entry the import wrote: any later entry on its items blocks an undo
    t.bigInteger("last_event_id");
    t.timestamp("undone_at", { useTz: true });
    t.text("undone_by").references("users.id");
    t.index(["organisation_id", "created_at"]);
  });
  await knex.raw("ALTER TABLE import_batches ADD CONSTRAINT import_batches_status_check CHECK (status IN ('running','committed','undone'))");

  await knex.schema.alterTable("items", (t) => {
    t.uuid("import_batch_id").references("import_batches.id").onDelete("SET NULL");
    t.index(["import_batch_id"]);
  });

  await knex.schema.createTable("import_updates", (t) => {
    t.uuid("batch_id").notNullable().references("import_batches.id").onDelete("CASCADE");
    t.uuid("item_id").notNullable().references("items.id").onDelete("CASCADE");
    t.jsonb("before").notNullable(); // the stored columns the import replaced
    t.jsonb("after").notNullable();
    t.primary(["batch_id", "item_id"]);
  });

  await knex.schema.createTable("import_mappings", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.jsonb("mapping").notNullable();
    t.text("created_by").references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["organisation_id", "name"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("import_mappings");
  await knex.schema.dropTableIfExists("import_updates");
  await knex.schema.alterTable("items", (t) => t.dropColumn("import_batch_id"));
  await knex.schema.dropTableIfExists("import_batches");
}
