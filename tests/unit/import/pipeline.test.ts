import { describe, expect, it } from "vitest";
import { templateCsv } from "@/lib/import/csv-write";
import { commitRefusal, runImport, type ImportOptions } from "@/lib/import/pipeline";
import { readRecords } from "@/lib/import/csv";
import { decodeText } from "@/lib/import/text";
import { chunksOf, MemoryStore, stockChain } from "./support";

const yards = [{ id: "8e0c8a51-2f1a-4c36-9d55-6f0a8c1b2a01", name: "Home yard" }];
const run = (text: string, store = new MemoryStore(), options: Partial<ImportOptions> = {}) =>
  runImport(readRecords(decodeText(chunksOf(text, 13), "utf-8"), ","), { yards, chunkSize: 2, ...options }, store);

describe("importing rows", () => {
  it("creates items as the add-item form would, with the WLL from the engine", async () => {
    const store = new MemoryStore();
    const s = await run("Type,Grade,Size,WLL (lb),Takes chain,Serial,Yard,Length (ft)\nchain,G70,3/8\",,,A1,home yard,20\nratchet binder,,,5400,5/16-3/8,B1,,\n", store);
    expect(s).toMatchObject({ rows: 2, created: 2, updated: 0, rejected: 0, errors: [], fatal: false });
    expect(store.creates.map((c) => [c.line, c.row.kind, c.row.grade, c.row.size, c.row.wllLb, c.row.markedWllLb, c.row.serial, c.row.yardId, c.row.lengthMm])).toEqual([
      [2, "chain", 70, "3/8", 6600, null, "A1", yards[0].id, 6096],
      [3, "binder", null, "3/8", 5400, 5400, "B1", null, null],
    ]);
    expect(store.creates[1].row.details).toEqual({ mechanism: "ratchet", chainSizeRange: ["5/16", "3/8"] });
  });

  it("derives the marking: a WLL means WLL marked, a grade means grade only, else none", async () => {
    const store = new MemoryStore();
    await run("Kind,Grade,Size,WLL lb\nchain,70,3/8,7000\nchain,70,3/8,\nchain,,3/8,\n", store);
    expect(store.creates.map((c) => [c.input.marking, c.row.wllLb, c.row.gradeMarked])).toEqual([
      ["wll", 7000, true],
      ["grade", 6600, true],
      ["none", 2650, false], // 49 CFR 393.108(d): chain without a legible grade mark is rated as grade 30
    ]);
  });

  it("reads grade mark 40 and 400 as grade 43 and notes it by line and column (New York State cargo manual's copy; trade stamp)", async () => {
    const store = new MemoryStore();
    const s = await run("Kind,Chain grade,Size\nchain,G40,3/8\nchain,70,3/8\nchain,400,1/2\n", store);
    expect(s).toMatchObject({ created: 3, rejected: 0 });
    expect(store.creates.map((c) => [c.row.grade, c.row.wllLb])).toEqual([[43, 5400], [70, 6600], [43, 9200]]);
    expect(s.notes).toEqual([
      { line: 2, column: "Chain grade", message: 'Grade mark "G40" is read as grade 43: grade 43 (high test) chain is also stamped 4, 40 or 400.' },
      { line: 4, column: "Chain grade", message: 'Grade mark "400" is read as grade 43: grade 43 (high test) chain is also stamped 4, 40 or 400.' },
    ]);
  });

  it("reports every problem by line and column, in words", async () => {
    const text = [
      "Kind,Grade,Size,WLL (lb),Serial,Yard",
      "chain,75,3/8,,S1,", // 2
      "chain,70,9/16,,S2,", // 3
      "web strap,,2,-5,S3,", // 4
      "tarp,,,,S4,", // 5
      "shackle,,5/8,6500,S5,South pit", // 6
      "chain,70,3/8,,S1,", // 7: duplicate of line 2, in another chunk
    ].join("\n");
    const s = await run(text);
    expect(s.errors).toEqual([
      { line: 2, column: "Grade", message: "Grade is one of 30, 43, 70, 80 or 100 (as stamped: 3, 4, 7, 8, 10 are read too)." },
      { line: 3, column: "Size", message: "Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in" },
      { line: 4, column: "WLL (lb)", message: "The WLL must be more than 0." },
      { line: 5, column: "Kind", message: '"tarp" is not a kind Linkyard knows. Write chain, ratchet binder, lever binder, web strap, wire rope, hook, shackle or rated item.' },
      { line: 6, column: "Yard", message: 'There is no yard called "South pit". Your yards: Home yard.' },
      { line: 7, column: "Serial", message: "Serial S1 is already on line 2; each serial may appear once in the file." },
    ]);
    expect(s).toMatchObject({ rows: 6, created: 0, rejected: 6, errorCount: 6 });
    expect(commitRefusal(s, false)).toBe("6 rows need fixing; nothing was imported. Fix them and upload again, or import only the valid rows.");
  });

  it("asks for the marked WLL of a shackle in the WLL column, even when the file has none", async () => {
    const s = await run("Kind,Size\nshackle,5/8\n");
    expect(s.errors).toEqual([{ line: 2, column: "WLL (lb)", message: expect.stringMatching(/WLL/) }]);
  });

  it("updates an item in stock matched by serial, and refuses a change of kind", async () => {
    const store = new MemoryStore([stockChain()]);
    const s = await run("Kind,Grade,Size,Serial,Cost\nchain,80,3/8,CH-1,130\n", store);
    expect(s).toMatchObject({ created: 0, updated: 1, unchanged: 0, rejected: 0 });
    expect(store.updates[0].changes).toEqual({ grade: [70, 80], wllLb: [6600, 7100], costCents: [11900, 13000] });
    expect(store.updates[0].row.details).toEqual({ ends: "grab hook both ends" }); // columns the file does not have stay as they are

    const kind = await run("Kind,Serial\nbinder,CH-1\n", new MemoryStore([stockChain()]));
    expect(kind.errors).toEqual([
      { line: 2, column: "Kind", message: "This row matches item K7XM-3HQA, which is a chain; the kind of an item cannot change. Give this row its own serial to add it as a new item." },
    ]);
  });

  it("matches by tag code, counts a row that changes nothing as unchanged", async () => {
    const store = new MemoryStore([stockChain()]);
    const s = await run("Tag code,Kind,Grade,Size,Length (ft),Serial/Lot,Cost,End fittings\nK7XM-3HQA,Chain,70,3/8,20,CH-1,119.00,grab hook both ends\n", store);
    expect(s).toMatchObject({ created: 0, updated: 0, unchanged: 1, rejected: 0, errors: [] });
    const missing = await run("Tag code,Kind\nK7XM-3HQY,chain\n");
    expect(missing.errors[0]).toEqual({ line: 2, column: "Tag code", message: "No item in your stock has tag code K7XM-3HQY. Leave the tag code empty to add a new item." });
  });

  it("writes only valid rows when asked, and hands the rejected rows back", async () => {
    const store = new MemoryStore();
    const s = await run("Kind,Grade,Size\nchain,70,3/8\nchain,70,9/16\nchain,80,1/2\n", store, { validOnly: true });
    expect(s).toMatchObject({ created: 2, rejected: 1 });
    expect(store.creates.map((c) => c.line)).toEqual([2, 4]);
    expect(store.rejectedRows).toEqual([{ fields: ["chain", "70", "9/16"], messages: ["Size: Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in"] }]);
    expect(commitRefusal(s, true)).toBeNull();
  });

  it("writes nothing once a row is rejected, unless valid rows only were asked for", async () => {
    const store = new MemoryStore();
    await run("Kind,Grade,Size\nchain,70,9/16\nchain,70,3/8\nchain,80,1/2\n", store);
    expect(store.creates).toEqual([]);
  });

  it("refuses a file without a Kind column, and one with broken quotes, as a whole", async () => {
    const noKind = await run("Grade,Size,WLL lb\n70,3/8,6600\n");
    expect(noKind.fatal).toBe(true);
    expect(noKind.errors).toEqual([
      { line: 1, column: null, message: "No column says what each item is. Add a Kind column (chain, ratchet binder, lever binder, web strap, hook, shackle…), or choose which of your columns is the Kind." },
    ]);
    const broken = await run('Kind,Size,Ends\nchain,3/8,grab\nchain,3/8,"grab\nchain,1/2,x\n', new MemoryStore(), { validOnly: true });
    expect(broken.fatal).toBe(true);
    expect(commitRefusal(broken, true)).toBe("The file cannot be imported as it is; nothing was imported.");
    expect(broken.errors.at(-1)?.line).toBe(3);
  });

  it("keeps only the first errors, and counts them all", async () => {
    const s = await run("Kind,Size\n" + "chain,9/16\n".repeat(30), new MemoryStore(), { maxErrors: 5 });
    expect(s.errors).toHaveLength(5);
    expect(s.errorCount).toBe(30);
  });

  it("imports its own template without a single error", async () => {
    const store = new MemoryStore();
    const s = await run(templateCsv("Home yard"), store);
    expect(s.errors).toEqual([]);
    expect(s).toMatchObject({ rows: 7, created: 10 }); // the web strap row makes 4 items
    expect(store.creates.filter((c) => c.row.kind === "web-strap").map((c) => c.row.serial)).toEqual(["SUP-WS-0001-01", "SUP-WS-0001-02", "SUP-WS-0001-03", "SUP-WS-0001-04"]);
  });
});
