import { describe, expect, it } from "vitest";
import { keysSeenInMemory } from "@/lib/import/pipeline";
import { RowReader } from "@/lib/import/row-reader";
import { resolveMapping } from "@/lib/import/fields";

describe("keysSeenInMemory", () => {
  it("answers, for each key seen in an earlier call, the line it was first seen on", async () => {
    const firstSeen = keysSeenInMemory();
    expect(await firstSeen([{ key: "s:A1", line: 2 }, { key: "t:K7XM-3HQA", line: 3 }])).toEqual(new Map());
    expect(await firstSeen([{ key: "s:A1", line: 9 }, { key: "s:B2", line: 10 }])).toEqual(new Map([["s:A1", 2]]));
    expect(await firstSeen([{ key: "s:B2", line: 40 }, { key: "t:K7XM-3HQA", line: 41 }])).toEqual(new Map([["s:B2", 10], ["t:K7XM-3HQA", 3]]));
  });

  it("keeps one file's keys apart from another's", async () => {
    const one = keysSeenInMemory();
    const other = keysSeenInMemory();
    await one([{ key: "s:A1", line: 2 }]);
    expect(await other([{ key: "s:A1", line: 5 }])).toEqual(new Map());
  });
});

describe("RowReader on repeated cells", () => {
  const headers = ["Kind", "Size", "Takes chain", "Yard", "In service", "Serial"];
  const yards = [{ id: "11111111-1111-4111-8111-111111111111", name: "Home yard" }];
  const reader = () => new RowReader(headers, resolveMapping(headers, undefined).mapping, yards);

  it("reads a cell the same the hundredth time as the first, valid or not, with its own line", () => {
    const r = reader();
    const first = r.read(2, ["ratchet binder", "", "5/16-3/8", "home yard", "3/14/2026", "BR-1"]);
    for (let line = 3; line < 100; line++) r.read(line, ["ratchet binder", "", "5/16-3/8", "home yard", "3/14/2026", `BR-${line}`]);
    const later = r.read(100, ["ratchet binder", "", "5/16-3/8", "home yard", "3/14/2026", "BR-100"]);
    expect(later.values).toEqual({ ...first.values, serial: "BR-100" });
    expect(later.values).toMatchObject({ kind: "binder", mechanism: "ratchet", chainSizeRange: ["5/16", "3/8"], yardId: yards[0].id, inServiceOn: "2026-03-14" });
    const bad = () => r.read(101, ["chain", "3/8", "", "Far yard", "2026-02-30", "C-1"]).errors;
    expect(bad()).toEqual(bad());
    expect(bad().map((e) => [e.line, e.column])).toEqual([[101, "Yard"], [101, "In service"]]);
  });

  it("hands out values that cannot be changed by one row for the next", () => {
    const r = reader();
    const a = r.read(2, ["ratchet binder", "", "5/16-3/8", "", "", "BR-1"]);
    expect(() => (a.values.chainSizeRange as string[]).push("1/2")).toThrow(TypeError);
    expect(r.read(3, ["ratchet binder", "", "5/16-3/8", "", "", "BR-2"]).values.chainSizeRange).toEqual(["5/16", "3/8"]);
  });

  it("validates a remembered row the same as a fresh one", () => {
    const fresh = reader();
    const used = reader();
    for (let line = 2; line < 50; line++) used.validate(used.read(line, ["chain", "9/16", "", "", "", `C-${line}`]), undefined);
    const row = ["chain", "9/16", "", "", "", "C-99"];
    expect(used.validate(used.read(99, row), undefined)).toEqual(fresh.validate(fresh.read(99, row), undefined));
  });
});
