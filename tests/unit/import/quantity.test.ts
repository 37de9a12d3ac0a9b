import { describe, expect, it } from "vitest";
import { autoMap } from "@/lib/import/fields";
import { runImport, type ImportOptions } from "@/lib/import/pipeline";
import { readRecords } from "@/lib/import/csv";
import { decodeText } from "@/lib/import/text";
import { quantitySerials, readQuantity } from "@/lib/import/values";
import { chunksOf, MemoryStore, stockChain } from "./support";

// A quantity column ("Qty", "Quantity") makes that many items from one row, each with its own
// tag code and, when the row gives a serial, its own numbered serial.

const yards = [{ id: "8e0c8a51-2f1a-4c36-9d55-6f0a8c1b2a01", name: "Home yard" }];
const run = (text: string, store = new MemoryStore(), options: Partial<ImportOptions> = {}) =>
  runImport(readRecords(decodeText(chunksOf(text, 11), "utf-8"), ","), { yards, chunkSize: 2, ...options }, store);

describe("the quantity column", () => {
  it("is found under the trade's names", () => {
    expect(autoMap(["Qty", "Kind"]).mapping.Qty).toBe("quantity");
    expect(autoMap(["Quantity"]).mapping.Quantity).toBe("quantity");
    expect(autoMap(["No. of items"]).mapping["No. of items"]).toBe("quantity");
  });

  it("reads whole numbers from 1 to 500, and says why not otherwise", () => {
    expect(readQuantity("12")).toEqual({ value: 12 });
    expect(readQuantity("12 pcs")).toEqual({ value: 12 });
    expect(readQuantity("x3")).toEqual({ value: 3 });
    for (const bad of ["0", "2.5", "-3", "501", "some"]) expect(readQuantity(bad)).toHaveProperty("error");
  });

  it("numbers serials with two digits, three from 100 items", () => {
    expect(quantitySerials("BR-26", 3)).toEqual(["BR-26-01", "BR-26-02", "BR-26-03"]);
    expect(quantitySerials("W", 120)[119]).toBe("W-120");
    expect(quantitySerials("W", 120)[0]).toBe("W-001");
    expect(quantitySerials(undefined, 2)).toEqual([undefined, undefined]);
  });

  it("makes that many items from one row, each with its own serial", async () => {
    const store = new MemoryStore();
    const s = await run("Kind,Grade,Size,Qty,Serial,Takes chain,WLL lb\nchain,70,3/8,4,CH-NOV,,\nratchet binder,,,1,B-1,5/16-3/8,5400\n", store);
    expect(s).toMatchObject({ rows: 2, created: 5, rejected: 0, errors: [] });
    expect(store.creates.map((c) => [c.line, c.row.serial])).toEqual([
      [2, "CH-NOV-01"], [2, "CH-NOV-02"], [2, "CH-NOV-03"], [2, "CH-NOV-04"], [3, "B-1"],
    ]);
    expect(store.creates.every((c) => c.row.kind !== "chain" || c.row.wllLb === 6600)).toBe(true);
    expect(s.preview[0]).toMatchObject({ action: "create", quantity: 4, serial: "CH-NOV-01 … CH-NOV-04" });
    expect(s.preview[1]).not.toHaveProperty("quantity");
  });

  it("makes items without serials when the row has none, and takes a blank quantity as one", async () => {
    const store = new MemoryStore();
    const s = await run("Kind,Width,Quantity\nweb strap,4,3\nweb strap,2,\n", store);
    expect(s).toMatchObject({ created: 4, rejected: 0 });
    expect(store.creates.map((c) => c.row.serial)).toEqual([null, null, null, null]);
  });

  it("checks each numbered serial like any serial: against the stock and the rest of the file", async () => {
    const store = new MemoryStore([stockChain({ serial: "CH-NOV-02", tagCode: "K7XM-3HQA" })]);
    const inStock = await run("Kind,Grade,Size,Qty,Serial\nchain,70,3/8,3,CH-NOV\n", store);
    expect(inStock.rejected).toBe(1);
    expect(inStock.errors[0]).toMatchObject({ line: 2, column: "Serial" });
    expect(inStock.errors[0].message).toContain("CH-NOV-02 is already item K7XM-3HQA");

    const inFile = await run("Kind,Grade,Size,Qty,Serial\nchain,70,3/8,3,S\nchain,70,3/8,1,S-03\n");
    expect(inFile.errors).toEqual([{ line: 3, column: "Serial", message: "Serial S-03 is already on line 2; each serial may appear once in the file." }]);
  });

  it("refuses a quantity on a row that names an item to update", async () => {
    const store = new MemoryStore([stockChain()]);
    const s = await run("Tag code,Qty,Length (ft)\nK7XM-3HQA,2,16\n", store);
    expect(s.rejected).toBe(1);
    expect(s.errors[0]).toMatchObject({ line: 2, column: "Qty" });
    expect(s.errors[0].message).toMatch(/Set the quantity to 1/);
  });

  it("refuses a quantity that is not a whole number, naming the cell", async () => {
    const s = await run("Kind,Grade,Size,Qty\nchain,70,3/8,2.5\n");
    expect(s.errors).toEqual([{ line: 2, column: "Qty", message: expect.stringContaining('"2.5" is not a number of items') }]);
  });
});
