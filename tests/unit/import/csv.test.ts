import { describe, expect, it } from "vitest";
import { MISPLACED_QUOTE, UNCLOSED_QUOTE, readRecords } from "@/lib/import/csv";
import { detectDelimiter } from "@/lib/import/delimiter";
import { detectEncoding, detectFileEncoding, fileRefusal } from "@/lib/import/file-check";
import { openCsv } from "@/lib/import/source";
import { decodeText } from "@/lib/import/text";
import { chunksOf, records } from "./support";

const rows = (rs: Awaited<ReturnType<typeof records>>) => rs.map((r) => ("fatal" in r ? { line: r.line, fatal: r.fatal } : { line: r.line, fields: r.fields, ...(r.quoteProblem && { quoteProblem: true }) }));

describe("delimiter detection", () => {
  const cases: [string, string, ReturnType<typeof detectDelimiter>][] = [
    ["commas", "Kind,Grade,Size\nchain,70,3/8\nchain,80,1/2\n", { delimiter: ",", name: "comma" }],
    ["semicolons with decimal commas", "Kind;Length m;Cost\nchain;6,1;119,00\nstrap;9,1;49,00\n", { delimiter: ";", name: "semicolon" }],
    ["tabs", "Kind\tSize\nchain\t3/8\n", { delimiter: "\t", name: "tab" }],
    ["commas with a quoted semicolon", 'Kind,End fittings\nchain,"grab; slip"\nchain,grab\n', { delimiter: ",", name: "comma" }],
    ["semicolons with commas in amounts", "Kind;Cost\nchain;1,234.50\nbinder;69.00\n", { delimiter: ";", name: "semicolon" }],
    ["one column", "Kind\nchain\n", { delimiter: ",", name: "comma" }],
    [
      "vertical bars",
      "Kind|Size|Cost\nchain|3/8|1,234\n",
      { error: "The columns are separated by vertical bars (|). Linkyard reads columns separated by commas, semicolons or tabs: save the file as CSV from the spreadsheet." },
    ],
  ];
  for (const [name, head, expected] of cases) it(name, () => expect(detectDelimiter(head)).toEqual(expected));
});

describe("reading records", () => {
  const cases: [string, string, ReturnType<typeof rows>][] = [
    ["plain rows, header on line 1", "Kind,Size\nchain,3/8\nbinder,1/2\n", [{ line: 1, fields: ["Kind", "Size"] }, { line: 2, fields: ["chain", "3/8"] }, { line: 3, fields: ["binder", "1/2"] }]],
    ["CRLF line breaks", "Kind,Size\r\nchain,3/8\r\n", [{ line: 1, fields: ["Kind", "Size"] }, { line: 2, fields: ["chain", "3/8"] }]],
    ["CR-only line breaks", "Kind,Size\rchain,3/8\r", [{ line: 1, fields: ["Kind", "Size"] }, { line: 2, fields: ["chain", "3/8"] }]],
    ["no line break at the end", "Kind,Size\nchain,3/8", [{ line: 1, fields: ["Kind", "Size"] }, { line: 2, fields: ["chain", "3/8"] }]],
    ["a UTF-8 byte-order mark", "\ufeffKind,Size\nchain,3/8\n", [{ line: 1, fields: ["Kind", "Size"] }, { line: 2, fields: ["chain", "3/8"] }]],
    ["quoted commas", 'Kind,Ends\nchain,"grab hook, both ends"\n', [{ line: 1, fields: ["Kind", "Ends"] }, { line: 2, fields: ["chain", "grab hook, both ends"] }]],
    ["doubled quotes inside a value", 'Kind,Size\nchain,"3/8"""\n', [{ line: 1, fields: ["Kind", "Size"] }, { line: 2, fields: ["chain", '3/8"'] }]],
    [
      "a quoted line break: the record's line is where it starts",
      'Kind,Ends\nchain,"grab hook\r\nboth ends"\nbinder,x\n',
      [{ line: 1, fields: ["Kind", "Ends"] }, { line: 2, fields: ["chain", "grab hook\nboth ends"] }, { line: 4, fields: ["binder", "x"] }],
    ],
    ["blank lines are skipped but counted", "Kind,Size\n\nchain,3/8\n,\nbinder,1/2\n", [{ line: 1, fields: ["Kind", "Size"] }, { line: 3, fields: ["chain", "3/8"] }, { line: 5, fields: ["binder", "1/2"] }]],
    [
      "quotes broken mid-file",
      'Kind,Ends\nchain,grab\nchain,"grab hook\nbinder,x\nhook,y\n',
      [{ line: 1, fields: ["Kind", "Ends"] }, { line: 2, fields: ["chain", "grab"] }, { line: 3, fatal: UNCLOSED_QUOTE(3) }],
    ],
    [
      "a quote in the wrong place",
      'Kind,Ends\nchain,"grab" hook,x\nbinder,y\n',
      [{ line: 1, fields: ["Kind", "Ends"] }, { line: 2, fatal: UNCLOSED_QUOTE(2) }],
    ],
  ];
  for (const [name, text, expected] of cases) {
    for (const chunk of [1, 5, 4096]) {
      it(`${name} (chunks of ${chunk})`, async () => expect(rows(await records(text, ",", chunk))).toEqual(expected));
    }
  }

  it("marks a misplaced quote on its row and reads on", async () => {
    const out = rows(await records('Kind,Ends\nchain,"grab"x",y\nbinder,"z"\n', ",", 4096));
    expect(out[1]).toMatchObject({ line: 2, quoteProblem: true });
    expect(MISPLACED_QUOTE).toMatch(/quote is in the wrong place/);
  });

  it("gives up on a quote that never closes without holding the rest of a large file", async () => {
    const body = 'Kind,Ends\nchain,"open\n' + "chain,3/8\n".repeat(40_000);
    const out = [];
    for await (const r of readRecords(decodeText(chunksOf(body, 65_536), "utf-8"), ",")) out.push(r);
    expect(out.at(-1)).toEqual({ line: 2, fatal: UNCLOSED_QUOTE(2) });
  });
});

describe("encodings", () => {
  it("reads UTF-16 (a spreadsheet's 'Unicode text') and Windows-1252", async () => {
    const utf16 = new Uint8Array([0xff, 0xfe, ...[..."Kind\tSize\nchain\t3/8\n"].flatMap((c) => [c.charCodeAt(0), 0])]);
    expect(detectEncoding(utf16)).toBe("utf-16le");
    const csv = await openCsv(chunksOf(utf16, 3) as AsyncIterable<Uint8Array>, "utf-16le");
    if ("error" in csv) throw new Error(csv.error);
    expect(csv.delimiterName).toBe("tab");
    const got = [];
    for await (const r of csv.records) got.push(r);
    expect(got).toEqual([{ line: 1, fields: ["Kind", "Size"] }, { line: 2, fields: ["chain", "3/8"] }]);

    const latin = new Uint8Array([...Buffer.from("Kind,Ends\nchain,"), 0xe9, ...Buffer.from("lingue\n")]);
    expect(detectEncoding(latin)).toBe("windows-1252");
    let text = "";
    for await (const t of decodeText(chunksOf(latin, 4) as AsyncIterable<Uint8Array>, "windows-1252")) text += t;
    expect(text).toBe("Kind,Ends\nchain,élingue\n");
  });
});

describe("issue 11.12: the encoding is decided on the whole file (detectFileEncoding)", () => {
  const plain = Buffer.from("Kind,Grade,Size,Serial\n" + Array.from({ length: 60 }, (_, i) => `chain,70,3/8,PLAIN-${i}\n`).join(""));

  it("finds Windows-1252 by an accent past byte 1,000, in any chunking", async () => {
    const latin = new Uint8Array([...plain, ...Buffer.from("chain,70,3/8,LOT-Cr"), 0xe9, ...Buffer.from("cy\n")]);
    expect(latin.indexOf(0xe9)).toBeGreaterThan(1000);
    expect(detectEncoding(latin.subarray(0, 64))).toBe("utf-8"); // what the first bytes alone said
    for (const size of [64, 1000, 4096]) expect(await detectFileEncoding(chunksOf(latin, size) as AsyncIterable<Uint8Array>), `chunks of ${size}`).toBe("windows-1252");
  });

  it("keeps UTF-8 whose characters are split between chunks, and refuses one cut off at the end", async () => {
    const utf8 = new Uint8Array([...plain, ...Buffer.from("chain,70,3/8,LOT-Crécy-€\n")]);
    for (const size of [1, 3, 7, 4096]) expect(await detectFileEncoding(chunksOf(utf8, size) as AsyncIterable<Uint8Array>), `chunks of ${size}`).toBe("utf-8");
    expect(await detectFileEncoding([utf8.subarray(0, utf8.length - 3)])).toBe("windows-1252"); // "€" cut in two
  });

  it("lets a byte-order mark decide", async () => {
    expect(await detectFileEncoding([new Uint8Array([0xff, 0xfe, 0x4b, 0x00])])).toBe("utf-16le");
    expect(await detectFileEncoding([new Uint8Array([0xef, 0xbb, 0xbf, 0x4b, 0xe9])])).toBe("utf-8");
  });
});

describe("file type", () => {
  const bytes = (...b: number[]) => new Uint8Array(b);
  const cases: [string, Uint8Array, number, number | null][] = [
    ["text", new TextEncoder().encode("Kind,Size\n"), 10, null],
    ["empty", bytes(), 0, 400],
    ["over the limit", new TextEncoder().encode("Kind"), 50 * 1024 * 1024 + 1, 413],
    ["xlsx (zip)", bytes(0x50, 0x4b, 0x03, 0x04, 0x14, 0, 6, 0), 4000, 415],
    ["old xls", bytes(0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1), 4000, 415],
    ["PNG", bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a), 4000, 415],
    ["JPEG", bytes(0xff, 0xd8, 0xff, 0xe0), 4000, 415],
    ["PDF", new TextEncoder().encode("%PDF-1.7"), 4000, 415],
    ["binary with NUL bytes", bytes(0x01, 0x00, 0x02, 0x00, 0x41), 4000, 415],
    ["UTF-16 text (NUL bytes, but a byte-order mark)", bytes(0xff, 0xfe, 0x4b, 0x00), 4000, null],
  ];
  for (const [name, head, size, status] of cases) it(name, () => expect(fileRefusal(head, size)?.status ?? null).toBe(status));

  it("says what to do with a workbook", () => {
    expect(fileRefusal(bytes(0x50, 0x4b, 0x03, 0x04), 10)?.message).toBe(
      "This is a spreadsheet workbook (.xlsx) or another zip file, not a CSV file. In the spreadsheet, save or download the sheet as CSV (comma-separated values) and upload that file.",
    );
  });
});
