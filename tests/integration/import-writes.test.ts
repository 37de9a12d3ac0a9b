import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { copyRows } from "@/db/copy";
import { copyImportedItems, copyImportedUpdates, createImportWriteTable, type ImportedItem, type ImportWriter } from "@/db/imports";
import type { ItemFields } from "@/db/items";
import { newTagCode } from "@/lib/tags/code";
import { countRows, testDb } from "../support/db";
import { newOrganisation } from "../support/http";

// The bulk writes of an import's commit (db/imports.ts through COPY, db/copy.ts), against the
// real database: what they write, that a failure part-way leaves nothing, and that another
// organisation's items are never touched.

let writer: ImportWriter;
let other: { organisationId: string; userId: string };

const fields = (over: Partial<ItemFields> = {}): ItemFields => ({
  kind: "chain", grade: 70, gradeMarked: true, size: "3/8", lengthMm: 6096, markedWllLb: null, serial: null, yardId: null,
  inServiceOn: "2026-01-15", costCents: 11900, details: { ends: "grab hook\tboth ends \\ \"sewn\"\nline two" }, wllLb: 6600, wllSource: "49 CFR 393.108", ...over,
});
const newItems = (n: number, prefix: string): ImportedItem[] =>
  Array.from({ length: n }, (_, i) => ({ fields: fields({ serial: `${prefix}-${i}` }), tagCode: newTagCode(), nextInspectionDue: "2027-01-15", note: `Imported from w.csv, line ${i + 2}` }));

async function newBatch(organisationId: string, userId: string) {
  const id = randomUUID();
  await testDb("import_batches").insert({ id, organisation_id: organisationId, created_by: userId, file_name: "w.csv" });
  return id;
}

beforeAll(async () => {
  const mine = await newOrganisation("Copy Writes Co");
  writer = { organisationId: mine.organisationId, actorId: mine.userId, batchId: await newBatch(mine.organisationId, mine.userId) };
  const theirs = await newOrganisation("Copy Writes Other Co");
  other = { organisationId: theirs.organisationId, userId: theirs.userId };
}, 60_000);
afterAll(async () => {
  await db.destroy();
  await testDb.destroy();
});

describe("copyImportedItems", () => {
  it("adds the items with their fields and an 'imported' entry each, and answers the last entry's id", async () => {
    const items = newItems(3, `CW-${randomUUID().slice(0, 8)}`);
    const last = await db.transaction((trx) => copyImportedItems(trx, writer, items));
    const stored = await testDb("items").whereIn("tag_code", items.map((i) => i.tagCode)).orderBy("serial");
    expect(stored).toHaveLength(3);
    expect(stored[0]).toMatchObject({
      organisation_id: writer.organisationId, import_batch_id: writer.batchId, status: "in_service", kind: "chain", grade: 70, grade_marked: true,
      size: "3/8", length_mm: 6096, marked_wll_lb: null, serial: items[0].fields.serial, yard_id: null, cost_cents: 11900, wll_lb: 6600,
      wll_source: "49 CFR 393.108", details: items[0].fields.details,
    });
    const events = await testDb("item_events").whereIn("item_id", stored.map((s) => s.id)).orderBy("id");
    expect(events.map((e) => [e.type, e.note, e.actor_id, e.organisation_id])).toEqual(
      items.map((i) => ["imported", i.note, writer.actorId, writer.organisationId]),
    );
    expect(Number(events.at(-1).id)).toBe(last);
  });

  it("leaves nothing written when a row fails part-way through a commit, chunks before it included", async () => {
    const before = { items: await countRows("items", { organisation_id: writer.organisationId }), events: await countRows("item_events", { organisation_id: writer.organisationId }) };
    const prefix = `CF-${randomUUID().slice(0, 8)}`;
    const bad = newItems(3, `${prefix}-b`);
    bad[1].fields.serial = "has a \u0000 byte"; // PostgreSQL refuses a NUL in text: the COPY fails on this row
    await expect(
      db.transaction(async (trx) => {
        await copyImportedItems(trx, writer, newItems(5, `${prefix}-a`));
        await copyImportedItems(trx, writer, bad);
      }),
    ).rejects.toThrow();
    expect(await countRows("items", { organisation_id: writer.organisationId })).toBe(before.items);
    expect(await countRows("item_events", { organisation_id: writer.organisationId })).toBe(before.events);
    expect(await testDb("items").where("serial", "like", `${prefix}%`).count("* as n").first()).toEqual({ n: "0" });
  });

  it("refuses to run outside a transaction", async () => {
    await expect(copyRows(db, "items", ["id"], [[randomUUID()]])).rejects.toThrow(/inside a transaction/);
  });
});

describe("copyImportedUpdates", () => {
  it("changes the organisation's items, keeps what it replaced, writes an 'edited' entry, and leaves another organisation's item alone", async () => {
    const [mine] = newItems(1, `CU-${randomUUID().slice(0, 8)}`);
    await db.transaction((trx) => copyImportedItems(trx, writer, [mine]));
    const { id: myId } = await testDb("items").where({ tag_code: mine.tagCode }).first("id");
    const theirBatch = await newBatch(other.organisationId, other.userId);
    const [theirs] = newItems(1, `CO-${randomUUID().slice(0, 8)}`);
    await db.transaction((trx) => copyImportedItems(trx, { organisationId: other.organisationId, actorId: other.userId, batchId: theirBatch }, [theirs]));
    const { id: theirId } = await testDb("items").where({ tag_code: theirs.tagCode }).first("id");

    const { kind: _kind, ...changed } = fields({ grade: 80, wllLb: 7100, serial: mine.fields.serial, costCents: 12500, details: { ends: "clevis" } });
    const last = await db.transaction(async (trx) => {
      await createImportWriteTable(trx);
      return copyImportedUpdates(trx, writer, [
        { itemId: myId, fields: changed, before: fields({ serial: mine.fields.serial }), changes: { grade: [70, 80] }, note: "Imported from w.csv, line 2" },
        // another organisation's item, named by a caller gone wrong: not changed
        { itemId: theirId, fields: changed, before: fields(), changes: { grade: [70, 80] }, note: "Imported from w.csv, line 3" },
      ]);
    });
    expect(await testDb("items").where({ id: myId }).first("grade", "wll_lb", "cost_cents", "details")).toEqual({ grade: 80, wll_lb: 7100, cost_cents: 12500, details: { ends: "clevis" } });
    expect(await testDb("items").where({ id: theirId }).first("grade", "cost_cents")).toEqual({ grade: 70, cost_cents: 11900 });
    const undo = await testDb("import_updates").where({ batch_id: writer.batchId, item_id: myId }).first("before", "after");
    expect(undo.before).toMatchObject({ grade: 70, cost_cents: 11900 });
    expect(undo.after).toMatchObject({ grade: 80, cost_cents: 12500, details: { ends: "clevis" } });
    const edited = await testDb("item_events").where({ item_id: myId, type: "edited" }).first("id", "note", "changes");
    expect(edited).toMatchObject({ note: "Imported from w.csv, line 2", changes: { grade: [70, 80] } });
    expect(Number(edited.id)).toBe(last);
    expect(await countRows("item_events", { item_id: theirId, type: "edited" })).toBe(0);
    expect(await countRows("import_updates", { item_id: theirId })).toBe(0);
  });
});
