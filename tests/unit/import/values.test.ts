import { describe, expect, it } from "vitest";
import { csvLine, neutralise } from "@/lib/import/csv-write";
import {
  readChainRange, readCost, readDate, readKind, readLength, readMarking, readMechanism, readCellNumber, readSize, readTagCode, readWeight, readYard, unneutralise,
} from "@/lib/import/values";

describe("value normalisation", () => {
  it.each([
    ["chain", { kind: "chain" }], ["Transport chain", { kind: "chain" }], ["Chain binder", { kind: "binder" }],
    ["ratchet binder", { kind: "binder", mechanism: "ratchet" }], ["Lever Binder", { kind: "binder", mechanism: "lever" }],
    ["strap", { kind: "web-strap" }], ["web strap", { kind: "web-strap" }], ["Web-strap", { kind: "web-strap" }], ["ratchet strap", { kind: "web-strap" }],
    ["hook", { kind: "hook" }], ["Grab hook", { kind: "hook" }], ["shackle", { kind: "shackle" }], ["wire rope", { kind: "wire-rope" }],
    ["Other rated item", { kind: "rated-item" }],
  ])("kind %s", (cell, value) => expect(readKind(cell)).toEqual({ value }));

  it("refuses an unknown kind with the words it knows", () => {
    expect(readKind("tarp")).toEqual({ error: '"tarp" is not a kind Linkyard knows. Write chain, ratchet binder, lever binder, web strap, wire rope, hook, shackle or rated item.' });
  });

  it.each([["wll", "wll"], ["WLL marked", "wll"], ["grade", "grade"], ["none", "none"], ["Unmarked", "none"]])("marking %s", (cell, value) =>
    expect(readMarking(cell)).toEqual({ value }),
  );
  it.each([["Ratchet", "ratchet"], ["lever", "lever"], ["lever binder", "lever"]])("binder %s", (cell, value) => expect(readMechanism(cell)).toEqual({ value }));

  it.each([
    ["5,400", 5400], ["5 400", 5400], ["5400", 5400], ["2,5", 2.5], ["1,234.50", 1234.5], ["$119.00", 119], ["-5", -5], ["12.", 12], ["abc", undefined], ["1,23,4", undefined],
  ])("number %s", (text, n) => expect(readCellNumber(text)).toBe(n));

  it.each([
    ["5400", "lb", { value: { value: 5400, unit: "lb" } }],
    ["5,400 lb", undefined, { value: { value: 5400, unit: "lb" } }],
    ["2450kg", undefined, { value: { value: 2450, unit: "kg" } }],
    ["2450 KGS", "kg", { value: { value: 2450, unit: "kg" } }],
    ["-5400", "lb", { value: { value: -5400, unit: "lb" } }], // the schema refuses it, with its own words
    ["5400", undefined, { error: 'Say the unit of the WLL: write "5400 lb" or "5400 kg", or name the column "WLL (lb)" or "WLL (kg)".' }],
    ["2450 kg", "lb", { error: 'This column holds lb (its header says so) but this value is in kg. Convert it to lb, or put it in a column of its own named "WLL (kg)".' }],
    ["5 tons", undefined, { error: '"tons" is not a unit Linkyard reads for a WLL: use lb or kg.' }],
    ["lots", "lb", { error: '"lots" is not a number. Write the WLL as a number, e.g. 5400.' }],
  ] as const)("weight %s in a %s column", (cell, unit, expected) => expect(readWeight(cell, unit)).toEqual(expected));

  it.each([
    ["20", "ft", { value: { value: 20, unit: "ft" } }],
    ["6,1", "m", { value: { value: 6.1, unit: "m" } }],
    ["20 ft", undefined, { value: { value: 20, unit: "ft" } }],
    ["20'", undefined, { value: { value: 20, unit: "ft" } }],
    ["6 m", "ft", { error: 'This column holds ft (its header says so) but this value is in m. Convert it to ft, or put it in a column of its own named "Length (m)".' }],
  ] as const)("length %s in a %s column", (cell, unit, expected) => expect(readLength(cell, unit)).toEqual(expected));

  it.each([
    ["3/8", undefined, "3/8"], ['3/8"', undefined, '3/8"'], ["3/8 inch", undefined, "3/8 in"], ["10 mm", undefined, "10 mm"], ["10", "mm", "10 mm"],
  ] as const)("size %s in a %s column", (cell, unit, value) => expect(readSize(cell, unit)).toEqual({ value }));

  it.each([
    ["5/16-3/8", ["5/16", "3/8"]], ["5/16 - 3/8", ["5/16", "3/8"]], ["5/16 to 3/8", ["5/16", "3/8"]], ["5/16–3/8", ["5/16", "3/8"]],
    ["8-10 mm", ["8 mm", "10 mm"]], ["3/8", ["3/8", "3/8"]], ["1-3/4", ["1-3/4", "1-3/4"]],
  ])("chain range %s", (cell, value) => expect(readChainRange(cell, undefined)).toEqual({ value }));

  it.each([
    ["2026-03-14", { value: "2026-03-14" }], ["2026/3/4", { value: "2026-03-04" }], ["3/14/2026", { value: "2026-03-14" }], ["2026-03-14 00:00:00", { value: "2026-03-14" }],
    ["14/3/2026", { error: '"14/3/2026" is not a date in the calendar (dates like 3/14/2026 are month/day/year).' }],
    ["March 14", { error: '"March 14" is not a date Linkyard reads: write it as YYYY-MM-DD (2026-03-14) or M/D/YYYY (3/14/2026).' }],
  ])("date %s", (cell, expected) => expect(readDate(cell)).toEqual(expected));

  it("reads costs, tag codes and yards", () => {
    expect(readCost("$1,234.50")).toEqual({ value: 123450 });
    expect(readTagCode(" k7xm 3hqa ")).toEqual({ value: "K7XM-3HQA" });
    expect(readTagCode("ABC")).toHaveProperty("error");
    const yards = [{ id: "y1", name: "Home yard" }, { id: "y2", name: "North lot" }];
    expect(readYard("home  YARD", yards)).toEqual({ value: "y1" });
    expect(readYard("South pit", yards)).toEqual({ error: 'There is no yard called "South pit". Your yards: Home yard, North lot.' });
  });
});

describe("formula neutralisation", () => {
  it.each([
    ["=SUM(A1:A2)", "'=SUM(A1:A2)"], ["+1+1", "'+1+1"], ["-A12", "'-A12"], ["@cmd", "'@cmd"], ["\tx", "'\tx"], ["\rx", "'\rx"],
    ["-5", "-5"], ["+1.5", "+1.5"], ["3/8", "3/8"], ["grab hook", "grab hook"], ["", ""],
  ])("%j → %j", (value, expected) => expect(neutralise(value)).toBe(expected));

  it("reads a neutralised cell back as it was", () => {
    for (const v of ["=SUM(A1:A2)", "-A12", "@x", "+1+1"]) expect(unneutralise(neutralise(v))).toBe(v);
    expect(unneutralise("'quoted on purpose")).toBe("'quoted on purpose");
  });

  it("quotes what needs quoting", () => {
    expect(csvLine(["3/8", 'a "b"', null, "x,y", "=1+1", 6600])).toBe('3/8,"a ""b""",,"x,y",\'=1+1,6600\r\n');
  });
});
