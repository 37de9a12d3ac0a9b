import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { countRows, testDb } from "../support/db";
import { addMember, BASE_URL, Client, newOrganisation } from "../support/http";

// CSV import and export of stock through the running app: every refusal with its exact
// words and no trace in the database, the commits, updates, undo, export round trip and who
// may do what.

const FIXTURES = path.resolve(__dirname, "../fixtures/imports");
const TAG = /^[34679ACDEFGHJKMNPQRTWXY]{4}-[34679ACDEFGHJKMNPQRTWXY]{4}$/;

let org: Awaited<ReturnType<typeof newOrganisation>>;
let owner: Client;
let planner: Client;
let hand: Client;
let yardId: string;
let stockTag: string;

function upload(name: string, content?: string | Uint8Array, fields: Record<string, string> = {}) {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  const bytes = content ?? readFileSync(path.join(FIXTURES, name));
  form.append("file", new Blob([bytes as BlobPart], { type: "text/csv" }), name);
  return form;
}
const post = (client: Client, name: string, content?: string | Uint8Array, fields: Record<string, string> = {}, query = "") =>
  client.post(`/api/v1/imports${query}`, upload(name, content, fields));

/** What an import may touch, for "nothing changed" checks. */
async function footprint(organisationId = org.organisationId) {
  return {
    items: await countRows("items", { organisation_id: organisationId }),
    events: await countRows("item_events", { organisation_id: organisationId }),
    batches: await countRows("import_batches", { organisation_id: organisationId }),
    audit: await countRows("audit_log", { organisation_id: organisationId }),
  };
}

beforeAll(async () => {
  org = await newOrganisation("Import Co");
  owner = org.owner;
  planner = (await addMember(owner, "planner")).client;
  hand = (await addMember(owner, "yard_hand")).client;
  const [yard] = await testDb("yards").insert({ organisation_id: org.organisationId, name: "Main yard" }).returning("id");
  yardId = yard.id;
  const chain = await owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8", serial: "STOCK-CH-1" });
  expect(chain.status).toBe(201);
  stockTag = chain.json.tagCode;
}, 60_000);
afterAll(() => testDb.destroy());

const KIND_MISSING =
  "No column says what each item is. Add a Kind column (chain, ratchet binder, lever binder, web strap, hook, shackle…), or choose which of your columns is the Kind.";

describe("a file that cannot go in", () => {
  const rejected: [string, () => { line: number; column: string | null; message: string }[]][] = [
    ["pipe-separated.csv", () => [{ line: 1, column: null, message: "The columns are separated by vertical bars (|). Linkyard reads columns separated by commas, semicolons or tabs: save the file as CSV from the spreadsheet." }]],
    ["missing-kind-column.csv", () => [{ line: 1, column: null, message: KIND_MISSING }]],
    ["unknown-grade.csv", () => [{ line: 3, column: "Grade", message: "Grade is one of 30, 43, 70, 80 or 100 (as stamped: 3, 4, 7, 8, 10 are read too)." }]],
    ["size-not-in-table.csv", () => [{ line: 4, column: "Chain size", message: "Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in" }]],
    ["negative-wll.csv", () => [{ line: 3, column: "WLL lb", message: "The WLL must be more than 0." }]],
    ["duplicate-serials.csv", () => [{ line: 4, column: "Serial", message: "Serial DUP-1 is already on line 2; each serial may appear once in the file." }]],
    [
      "duplicate-against-stock.csv",
      () => [{ line: 2, column: "Kind", message: `This row matches item ${stockTag}, which is a chain; the kind of an item cannot change. Give this row its own serial to add it as a new item.` }],
    ],
    ["mixed-units.csv", () => [{ line: 3, column: "WLL (lb)", message: 'This column holds lb (its header says so) but this value is in kg. Convert it to lb, or put it in a column of its own named "WLL (kg)".' }]],
    [
      "broken-quotes.csv",
      () => [{ line: 3, column: null, message: "Quotes broken mid-file: a quoted value starts on line 3 and is never closed, so the rest of the file cannot be read. Close the quote (or remove it) and upload again." }],
    ],
    ["header-only.csv", () => [{ line: 2, column: null, message: "The file names its columns but has no items under them." }]],
  ];
  for (const [file, expected] of rejected) {
    it(`${file}: 422 with the exact error, and nothing written`, async () => {
      const before = await footprint();
      const res = await post(owner, file);
      expect(res.status).toBe(422);
      expect(res.json.errors).toEqual(expected());
      expect(res.json.errorCount).toBe(expected().length);
      expect(res.json.error).toMatch(/nothing was imported/);
      expect(res.json.batchId).toBeNull();
      expect(await footprint()).toEqual(before);
    });
  }

  it("a file that cannot be read is refused even when only valid rows were asked for", async () => {
    const before = await footprint();
    const res = await post(owner, "broken-quotes.csv", undefined, { validOnly: "true" });
    expect(res.status).toBe(422);
    expect(res.json.error).toBe("The file cannot be imported as it is; nothing was imported.");
    expect(await footprint()).toEqual(before);
  });

  const refused: [string, number, string][] = [
    ["workbook.xlsx", 415, "This is a spreadsheet workbook (.xlsx) or another zip file, not a CSV file. In the spreadsheet, save or download the sheet as CSV (comma-separated values) and upload that file."],
    ["photo.png", 415, "This is an image, not a CSV file. Upload the stock list as CSV."],
    ["empty.csv", 400, "The file is empty."],
  ];
  for (const [file, status, message] of refused) {
    it(`${file}: ${status}, "${message.slice(0, 40)}…", nothing written`, async () => {
      const before = await footprint();
      const res = await post(owner, file);
      expect(res.status).toBe(status);
      expect(res.json).toEqual({ error: message, issues: [{ path: "file", message }] });
      expect(await footprint()).toEqual(before);
    });
  }

  it("a file over 50 MB: 413, nothing written", async () => {
    const before = await footprint();
    const big = new Uint8Array(50 * 1024 * 1024 + 1).fill(0x61);
    big.set(new TextEncoder().encode("Kind,Size\n"));
    const res = await post(owner, "big.csv", big);
    expect(res.status).toBe(413);
    expect(res.json.error).toBe("The file is over 50 MB. Split it into smaller files and import them one after the other.");
    expect(await footprint()).toEqual(before);
  });

  it("a request without a file, or with a mapping that is not one, is a 400", async () => {
    expect((await owner.post("/api/v1/imports", {})).json.error).toBe('Send the file as multipart/form-data in the field "file".');
    const form = new FormData();
    form.append("dryRun", "true");
    expect((await owner.post("/api/v1/imports", form)).json.issues).toEqual([{ path: "file", message: "Choose a CSV file." }]);
    const bad = await post(owner, "x.csv", "Kind\nchain\n", { mapping: JSON.stringify({ Kind: "colour" }) });
    expect(bad.status).toBe(400);
    expect(bad.json.issues[0].path).toBe("mapping.Kind");
  });
});

describe("checking a file (dry run)", () => {
  it("reports counts, mapping, unknown columns and the rows as they will be stored, and writes nothing", async () => {
    const before = await footprint();
    const res = await post(owner, "good-supplier.csv", undefined, {}, "?dryRun=true");
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ dryRun: true, batchId: null, delimiter: "comma", encoding: "UTF-8", rows: 6, created: 6, updated: 0, rejected: 0, errors: [], unknownColumns: ["Colour"] });
    expect(res.json.mapping).toEqual({
      Item: "kind", Grade: "grade", "Chain size": "size", "WLL lb": "wllLb", Binder: "mechanism", "Takes chain": "chainRange", "Length (ft)": "lengthFt",
      "End fittings": "ends", "Serial/Lot": "serial", Location: "yard", "In service": "inServiceOn", Price: "cost", Colour: null,
    });
    expect(res.json.preview[1]).toMatchObject({ line: 3, action: "create", description: "Chain, grade 80, 10 mm", wllLb: 7100, lengthMm: 4877, inServiceOn: "2026-01-20", costCents: 24500 });
    expect(res.json.preview[2]).toMatchObject({ line: 5, description: "Ratchet binder, for 5/16–3/8 in chain", wllLb: 5400 }); // the quoted line break made line 3 two lines long
    expect(await footprint()).toEqual(before);
  });

  it("takes the owner's mapping for odd headers", async () => {
    const res = await post(owner, "odd.csv", "Art;Qual;Dia\nchain;7;3/8\n", { mapping: JSON.stringify({ Art: "kind", Qual: "grade", Dia: "size" }), dryRun: "true" });
    expect(res.json).toMatchObject({ delimiter: "semicolon", created: 1, errors: [] });
  });

  it("imports its own template without an error", async () => {
    const template = await owner.get("/api/v1/imports/template.csv");
    expect(template.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(template.text).toContain("Main yard");
    const res = await post(owner, "template.csv", template.text, { dryRun: "true" });
    expect(res.json).toMatchObject({ rows: 7, created: 10, rejected: 0, errors: [] }); // its web strap row has a quantity of 4
  });
});

describe("committing", () => {
  it("puts every row in, with tag codes, imported history, the stored file and a tag sheet link", async () => {
    const before = await footprint();
    const res = await post(owner, "good-supplier.csv");
    expect(res.status).toBe(201);
    expect(res.json).toMatchObject({ created: 6, updated: 0, rejected: 0, errors: [] });
    const batchId = res.json.batchId;
    const items = await testDb("items").where({ import_batch_id: batchId }).orderBy("serial").select("*");
    expect(items).toHaveLength(6);
    for (const i of items) {
      expect(i.tag_code).toMatch(TAG);
      expect(i.status).toBe("in_service");
      expect(i.organisation_id).toBe(org.organisationId);
    }
    const bySerial = Object.fromEntries(items.map((i) => [i.serial, i]));
    expect(bySerial["GS-CH-002"]).toMatchObject({ grade: 80, size: "10 mm", wll_lb: 7100, details: { ends: "clevis grab hook\nboth ends" }, cost_cents: 24500 });
    expect(bySerial["GS-BR-002"]).toMatchObject({ kind: "binder", yard_id: yardId, details: { mechanism: "lever", chainSizeRange: ["5/16", "3/8"] }, marked_wll_lb: 5400 });
    expect(bySerial["GS-WS-001"]).toMatchObject({ kind: "web-strap", size: "4", marked_wll_lb: 5400, length_mm: 9144 });
    // next inspection from the organisation's intervals (chain 365 days, web strap 180)
    const due = (serial: string) => testDb.raw("select to_char(next_inspection_due, 'YYYY-MM-DD') as d from items where import_batch_id = ? and serial = ?", [batchId, serial]);
    expect((await due("GS-CH-001")).rows[0].d).toBe("2027-01-15");
    expect((await due("GS-WS-001")).rows[0].d).toBe("2026-07-14");
    const events = await testDb("item_events").whereIn("item_id", items.map((i) => i.id)).select("type", "note");
    expect(events).toHaveLength(6);
    expect(events.every((e) => e.type === "imported")).toBe(true);
    expect(events.map((e) => e.note)).toContain("Imported from good-supplier.csv, line 3");
    const after = await footprint();
    expect(after).toEqual({ items: before.items + 6, events: before.events + 6, batches: before.batches + 1, audit: before.audit + 1 });
    expect(await countRows("audit_log", { entity: "import_batch", entity_id: batchId, action: "items.imported" })).toBe(1);

    expect(res.json.tagSheet).toBe(`/tags/sheet?ids=${[...items].sort((a, b) => (a.tag_code < b.tag_code ? -1 : 1)).map((i) => i.id).join(",")}`);
    const original = await owner.get(`/api/v1/imports/${batchId}/file`);
    const stored = new Uint8Array(await (await fetch(BASE_URL + `/api/v1/imports/${batchId}/file`, { headers: { cookie: owner.cookie } })).arrayBuffer());
    expect(Buffer.from(stored).equals(readFileSync(path.join(FIXTURES, "good-supplier.csv")))).toBe(true); // byte for byte, mark and CRLF included
    expect(original.status).toBe(200);
    const batch = await owner.get(`/api/v1/imports/${batchId}`);
    expect(batch.json).toMatchObject({ status: "committed", progress: 1, rows: 6, created: 6, fileName: "good-supplier.csv", canUndo: true, rejectedFile: null });
    expect((await owner.get("/api/v1/imports")).json.data[0].id).toBe(batchId);
    const page = await owner.get(`/stock/import/${batchId}`);
    expect(page.status).toBe(200);
    expect(page.text.includes("Print 6 tags")).toBe(true);
  });

  it("imports only the valid rows when asked, and hands back the rejected ones with their errors", async () => {
    const csv = "Kind,Grade,Size,Serial\nchain,70,3/8,VO-1\nchain,75,3/8,VO-2\nchain,80,1/2,VO-3\nchain,70,9/16,VO-4\n";
    const before = await footprint();
    const res = await post(owner, "mixed.csv", csv, { validOnly: "true" });
    expect(res.status).toBe(201);
    expect(res.json).toMatchObject({ created: 2, rejected: 2, validOnly: true });
    expect(await testDb("items").where({ import_batch_id: res.json.batchId }).orderBy("serial").pluck("serial")).toEqual(["VO-1", "VO-3"]);
    expect(res.json.rejectedFile).toBe(`/api/v1/imports/${res.json.batchId}/rejected.csv`);
    const file = await owner.get(res.json.rejectedFile);
    expect(file.text).toBe(
      "Kind,Grade,Size,Serial,error\r\n" + // (fetch's text() drops the byte-order mark the file starts with)
        'chain,75,3/8,VO-2,"Grade: Grade is one of 30, 43, 70, 80 or 100 (as stamped: 3, 4, 7, 8, 10 are read too)."\r\n' +
        'chain,70,9/16,VO-4,"Size: Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in"\r\n',
    );
    expect(await footprint()).toMatchObject({ items: before.items + 2, batches: before.batches + 1 });
    // fixed and uploaded again, the error column is not imported
    const fixed = file.text.replace("chain,75,", "chain,70,").replace("9/16", "1/2");
    const again = await post(owner, "mixed-rejected.csv", fixed);
    expect(again.json).toMatchObject({ created: 2, rejected: 0, unknownColumns: ["error"] });
  });

  it("refuses a batch id that is taken", async () => {
    const first = await post(owner, "one.csv", "Kind,Grade,Size\nchain,70,3/8\n");
    const again = await post(owner, "one.csv", "Kind,Grade,Size\nchain,70,3/8\n", { batchId: first.json.batchId });
    expect(again.status).toBe(409);
  });
});

describe("updating stock by serial", () => {
  it("changes the matched item, with an edited entry naming the changes", async () => {
    const item = (await owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8", serial: "UPD-1", costCents: 10000, length: { value: 20, unit: "ft" } })).json;
    const res = await post(owner, "prices.csv", "Kind,Grade,Size,Serial,Cost\nchain,80,3/8,UPD-1,130.00\n");
    expect(res.status).toBe(201);
    expect(res.json).toMatchObject({ created: 0, updated: 1, unchanged: 0 });
    const row = await testDb("items").where({ id: item.id }).first();
    expect(row).toMatchObject({ grade: 80, wll_lb: 7100, cost_cents: 13000, length_mm: 6096, tag_code: item.tagCode }); // length: not in the file, kept
    const events = await testDb("item_events").where({ item_id: item.id }).orderBy("id").select("type", "changes", "note");
    expect(events.map((e) => e.type)).toEqual(["created", "edited"]);
    expect(events[1].changes).toEqual({ grade: [70, 80], wllLb: [6600, 7100], costCents: [10000, 13000] });
    expect(events[1].note).toBe("Imported from prices.csv, line 2");
  });
});

describe("undo", () => {
  it("retires the new items, frees their serials and restores the updated ones", async () => {
    const updated = (await owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "5/16", serial: "UND-U" })).json;
    const res = await post(owner, "undo.csv", "Kind,Grade,Size,Serial\nchain,70,3/8,UND-1\nchain,80,1/2,UND-2\nchain,80,5/16,UND-U\n");
    expect(res.json).toMatchObject({ created: 2, updated: 1 });
    const batchId = res.json.batchId;
    const created = await testDb("items").where({ import_batch_id: batchId }).pluck("id");

    const undo = await owner.post(`/api/v1/imports/${batchId}/undo`);
    expect(undo.status).toBe(200);
    expect(undo.json).toEqual({ undone: true, retired: 2, restored: 1 });
    const rows = await testDb("items").whereIn("id", created).select("status", "serial");
    expect(rows).toEqual([{ status: "retired", serial: null }, { status: "retired", serial: null }]);
    const retiredEvents = await testDb("item_events").whereIn("item_id", created).where({ type: "retired" }).select("note", "changes");
    expect(retiredEvents).toHaveLength(2);
    expect(retiredEvents[0].note).toBe("Import undone");
    expect(await testDb("items").where({ id: updated.id }).first("grade", "wll_lb")).toEqual({ grade: 70, wll_lb: 4700 });
    const last = await testDb("item_events").where({ item_id: updated.id }).orderBy("id", "desc").first("type", "note", "changes");
    expect(last).toEqual({ type: "edited", note: "Import undone", changes: { grade: [80, 70], wllLb: [4500, 4700] } });
    expect((await owner.get(`/api/v1/imports/${batchId}`)).json).toMatchObject({ status: "undone", canUndo: false });

    const twice = await owner.post(`/api/v1/imports/${batchId}/undo`);
    expect(twice.status).toBe(409);
    expect(twice.json.error).toBe("This import has been undone already.");
    // the serials are free again: the corrected file goes in as new items
    expect((await post(owner, "undo-again.csv", "Kind,Grade,Size,Serial\nchain,70,3/8,UND-1\n", { dryRun: "true" })).json).toMatchObject({ created: 1, errors: [] });
  });

  it("is refused once an item of the import has been used, and changes nothing", async () => {
    const res = await post(owner, "used.csv", "Kind,Grade,Size,Serial\nchain,70,3/8,USED-1\n");
    const [id] = await testDb("items").where({ import_batch_id: res.json.batchId }).pluck("id");
    const [other] = await testDb("yards").insert({ organisation_id: org.organisationId, name: `Pit ${Date.now()}` }).returning("id");
    expect((await owner.post("/api/v1/items/move", { itemIds: [id], yardId: other.id })).status).toBe(200);
    const tag = (await testDb("items").where({ id }).first("tag_code")).tag_code;
    const before = await footprint();
    const undo = await owner.post(`/api/v1/imports/${res.json.batchId}/undo`);
    expect(undo.status).toBe(409);
    expect(undo.json.error).toBe(`Item ${tag} has a move recorded since this import, so the import can no longer be undone. Change or retire its items one by one instead.`);
    expect(await footprint()).toEqual(before);
    expect((await owner.get(`/api/v1/imports/${res.json.batchId}`)).json).toMatchObject({ canUndo: false, undoBlockedBecause: undo.json.error });
  });
});

describe("export", () => {
  it("streams the stock as CSV, neutralising formulas, and imports back with no error and nothing new", async () => {
    await post(owner, "formula.csv", 'Kind,Grade,Size,End fittings,Serial\nchain,70,3/8,"=HYPERLINK(""http://x"")",-FX-1\n');
    const res = await owner.get("/api/v1/items/export.csv");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="linkyard-stock-\d{4}-\d{2}-\d{2}\.csv"/);
    const lines = res.text.split("\r\n");
    const raw = new Uint8Array(await (await fetch(BASE_URL + "/api/v1/items/export.csv", { headers: { cookie: owner.cookie } })).arrayBuffer());
    expect([...raw.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]); // a byte-order mark, so that spreadsheets read UTF-8
    expect(lines[0]).toBe("Tag code,Kind,Marking,Grade,Size,Marked WLL (lb),Binder,Takes chain,Length (ft),End fittings,Serial/Lot,Yard,In service,Cost,Status,WLL used (lb),Inspection due,Usable today");
    // every row carries the day's verdict, as the stock list shows it
    expect(lines.slice(1).filter(Boolean).every((l) => /,(yes|"?no: [a-z, ]+"?)$/.test(l))).toBe(true);
    expect(res.text).toContain(`"'=HYPERLINK(""http://x"")",'-FX-1,`);
    const total = await countRows("items", { organisation_id: org.organisationId });
    expect(lines.filter(Boolean)).toHaveLength(total + 1);

    const before = await footprint();
    const back = await post(owner, "export.csv", res.text);
    expect(back.status).toBe(201);
    expect(back.json).toMatchObject({ created: 0, rejected: 0, errors: [], unknownColumns: [], setByLinkyard: ["Status", "WLL used (lb)", "Inspection due", "Usable today"] });
    expect(back.json.updated + back.json.unchanged).toBe(total);
    expect(back.json.updated).toBe(0);
    const after = await footprint();
    expect(after.items).toBe(before.items);
    expect(after.events).toBe(before.events);
  });

  it("honours the stock table's filters", async () => {
    const res = await planner.get("/api/v1/items/export.csv?kind=binder&sort=serial&order=desc");
    expect(res.status).toBe(200);
    const rows = res.text.trim().split("\r\n").slice(1);
    const binders = await testDb("items").where({ organisation_id: org.organisationId, kind: "binder" }).orderBy("serial", "desc").pluck("serial");
    expect(rows.map((r) => r.split(",")[10])).toEqual(binders);
    expect(rows.every((r) => r.split(",")[1] === "Chain binder")).toBe(true);
  });
});

describe("saved mappings", () => {
  it("are saved by name, replaced under the same name, listed and deleted", async () => {
    const a = await owner.post("/api/v1/imports/mappings", { name: "Acme Rigging", mapping: { Art: "kind", Dia: "size" } });
    expect(a.status).toBe(201);
    const b = await owner.post("/api/v1/imports/mappings", { name: "Acme Rigging", mapping: { Art: "kind", Dia: "sizeMm" } });
    expect(b.json.id).toBe(a.json.id);
    const list = await owner.get("/api/v1/imports/mappings");
    expect(list.json.data).toEqual([expect.objectContaining({ id: a.json.id, name: "Acme Rigging", mapping: { Art: "kind", Dia: "sizeMm" } })]);
    const other = await newOrganisation();
    expect((await other.owner.delete(`/api/v1/imports/mappings/${a.json.id}`)).status).toBe(404);
    expect((await other.owner.get("/api/v1/imports/mappings")).json.data).toEqual([]);
    expect((await owner.delete(`/api/v1/imports/mappings/${a.json.id}`)).status).toBe(200);
    expect((await owner.get("/api/v1/imports/mappings")).json.data).toEqual([]);
    expect((await owner.post("/api/v1/imports/mappings", { name: "", mapping: {} })).json.issues).toEqual([{ path: "name", message: "Give the mapping a name, e.g. the supplier's." }]);
  });
});

describe("who may import", () => {
  it("planners and yard hands are refused with 403, strangers with 401, and nothing is written", async () => {
    const before = await footprint();
    for (const client of [planner, hand]) {
      const res = await post(client, "good-supplier.csv");
      expect(res.status).toBe(403);
      expect(res.json.error).toBe("Your role does not allow this.");
      expect((await client.get("/stock/import")).status).toBe(403);
    }
    const anonymous = await post(new Client(), "good-supplier.csv");
    expect(anonymous.status).toBe(401);
    expect((await hand.get("/api/v1/items/export.csv")).status).toBe(403);
    expect(await footprint()).toEqual(before);
  });

  it("another organisation can neither see nor undo a batch", async () => {
    const res = await post(owner, "mine.csv", "Kind,Grade,Size\nchain,70,3/8\n");
    const id = res.json.batchId;
    const other = (await newOrganisation("Other Yard")).owner;
    for (const url of [`/api/v1/imports/${id}`, `/api/v1/imports/${id}/file`, `/api/v1/imports/${id}/rejected.csv`, `/stock/import/${id}`]) {
      expect((await other.get(url)).status).toBe(404);
    }
    expect((await other.get("/api/v1/imports")).json.data).toEqual([]);
    const undo = await other.post(`/api/v1/imports/${id}/undo`);
    expect(undo.status).toBe(404);
    expect((await testDb("import_batches").where({ id }).first("status")).status).toBe("committed");
    expect(await testDb("items").where({ import_batch_id: id }).pluck("status")).toEqual(["in_service"]);
    // and its own export does not carry this organisation's items
    const theirs = await other.get("/api/v1/items/export.csv");
    expect(theirs.text.trim().split("\r\n")).toHaveLength(1);
  });
});
