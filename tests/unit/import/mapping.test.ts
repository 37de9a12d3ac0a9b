import { describe, expect, it } from "vitest";
import { autoMap, fieldForHeader, resolveMapping, uniqueHeaders, type ImportField } from "@/lib/import/fields";
import { EXPORT_HEADERS, TEMPLATE_HEADERS } from "@/lib/import/csv-write";

describe("header auto-mapping", () => {
  const cases: [string, ImportField | null | "set-by-linkyard"][] = [
    ["Type", "kind"], ["Kind", "kind"], ["Item", "kind"], ["ITEM TYPE", "kind"],
    ["Grade", "grade"], ["Chain grade", "grade"],
    ["Size", "size"], ["Chain size", "size"], ["Diameter", "size"], ["Width", "size"], ["Size (in)", "size"], ["Size (mm)", "sizeMm"], ["Diameter mm", "sizeMm"],
    ["WLL (lb)", "wllLb"], ["WLL lb", "wllLb"], ["WLL lbs", "wllLb"], ["WLL #", "wllLb"], ["WLL kg", "wllKg"], ["WLL [kg]", "wllKg"],
    ["Working load limit", "wll"], ["Working Load Limit (lbs)", "wllLb"], ["Marked WLL (lb)", "wllLb"], ["WLL", "wll"],
    ["Serial", "serial"], ["Lot", "serial"], ["Serial/Lot", "serial"], ["Serial #", "serial"], ["Serial No.", "serial"], ["Lot number", "serial"],
    ["Length (ft)", "lengthFt"], ["Length ft", "lengthFt"], ["Length m", "lengthM"], ["Length (metres)", "lengthM"], ["Length", "length"],
    ["Binder", "mechanism"], ["Mechanism", "mechanism"],
    ["Takes chain", "chainRange"], ["Chain range", "chainRange"],
    ["End fittings", "ends"], ["Ends", "ends"],
    ["Yard", "yard"], ["Location", "yard"],
    ["In service", "inServiceOn"], ["Date", "inServiceOn"], ["Date in service", "inServiceOn"],
    ["Cost", "cost"], ["Price", "cost"], ["Cost ($)", "cost"], ["Unit price USD", "cost"],
    ["Marking", "marking"], ["Tag code", "tagCode"],
    ["Status", "set-by-linkyard"], ["WLL used (lb)", "set-by-linkyard"], ["Inspection due", "set-by-linkyard"],
    ["Colour", null], ["Notes", null], ["", null],
  ];
  for (const [header, field] of cases) it(`"${header}" → ${field}`, () => expect(fieldForHeader(header)).toBe(field));

  it("lists unknown columns, and gives a field to its first column only", () => {
    expect(autoMap(["Type", "WLL (kg)", "Colour", "WLL lb", "Status"])).toEqual({
      mapping: { Type: "kind", "WLL (kg)": "wllKg", Colour: null, "WLL lb": null, Status: null },
      unknown: ["Colour"],
      setByLinkyard: ["Status"],
    });
  });

  it("maps the export's and the template's own headers, with no unknown column", () => {
    for (const headers of [EXPORT_HEADERS, TEMPLATE_HEADERS]) {
      const auto = autoMap([...headers]);
      expect(auto.unknown).toEqual([]);
      expect(new Set(Object.values(auto.mapping).filter(Boolean)).size).toBe(Object.values(auto.mapping).filter(Boolean).length);
    }
    expect(autoMap([...EXPORT_HEADERS]).setByLinkyard).toEqual(["Status", "WLL used (lb)", "Inspection due", "Usable today"]);
  });

  it("makes headers unique", () => {
    expect(uniqueHeaders(["Size", "", "Size", " Kind "])).toEqual(["Size", "Column 2", "Size (2)", "Kind"]);
  });

  it("takes the owner's choices over the automatic ones, and refuses two columns for one value", () => {
    expect(resolveMapping(["Type", "Colour"], { Colour: "ends", Type: null }).mapping).toEqual({ Type: null, Colour: "ends" });
    expect(resolveMapping(["WLL lb", "WLL kg"], { "WLL kg": "wllKg" }).problems).toEqual([
      { column: "WLL kg", message: 'Both "WLL lb" and "WLL kg" are read as Marked WLL; choose one of them and set the other to "Not imported".' },
    ]);
  });
});
