import { describe, expect, it } from "vitest";
import { checkSecurement, securementCheckRequestSchema, type SecurementCheckRequest } from "@/lib/securement";
import {
  blankDraft,
  copiesOf,
  describePath,
  exampleDraft,
  fieldMarks,
  fromRequest,
  issueAt,
  newComponent,
  newTiedown,
  readNumber,
  ROPE_SIZES,
  strappingThicknesses,
  toRequest,
  type CheckDraft,
} from "@/lib/forms/securement-draft";

const check = (draft: CheckDraft) => checkSecurement(toRequest(draft) as unknown as SecurementCheckRequest);

describe("the example the check screen opens with", () => {
  it("is a valid request that meets the published minimums", () => {
    const body = toRequest(exampleDraft());
    expect(securementCheckRequestSchema.safeParse(body).success).toBe(true);
    const r = check(exampleDraft());
    expect(r.pass).toBe(true);
    expect(r.cargo.weightLb).toBe(9800);
    expect(r.requiredAggregateWllLb).toBe(4900);
    // Four corner chains limited by their 5,400 lb binders, two 5/16 in chains at 4,700 lb: half of each.
    expect(r.aggregateWllLb).toBe(4 * 2700 + 2 * 2350);
    expect(r.tiedowns.map((t) => t.limitedBy)).toEqual(["binder", "binder", "binder", "binder", "chain", "chain"]);
    expect(r.minimumTiedowns).toBe(3); // 16 ft, under 10,000 lb: 49 CFR 393.110
    expect(r.tiedownsCounted).toBe(4);
  });

  it("sends the parts as the API expects them", () => {
    expect(toRequest(exampleDraft()).tiedowns[0]).toEqual({
      label: "front left",
      attachment: "direct",
      secures: "machine",
      components: [
        { type: "chain", grade: 70, size: "3/8 in" },
        { type: "binder", wll: { value: 5400, unit: "lb" }, chainSizeRange: ["5/16 in", "3/8 in"] },
        { type: "anchor", label: "D-ring", wll: { value: 6000, unit: "lb" } },
      ],
    });
  });

  it("at 30,000 lb still meets the aggregate, and one chain with no legible mark takes it below", () => {
    const heavy = exampleDraft();
    heavy.cargo.weight = "30,000";
    expect(check(heavy).pass).toBe(true);
    const chain = heavy.tiedowns[0]!.components[0]!;
    if (chain.type !== "chain") throw new Error("chain first");
    chain.grade = "";
    expect((toRequest(heavy).tiedowns[0]!.components as unknown[])[0]).toEqual({ type: "chain", size: "3/8 in", marked: false });
    const r = check(heavy);
    expect(r.pass).toBe(false);
    expect(r.tiedowns[0]).toMatchObject({ wllLb: 2650, limitedBy: "chain" });
    expect(r.findings.map((f) => f.code)).toEqual(expect.arrayContaining(["AGGREGATE_WLL_BELOW_REQUIRED", "RATED_AS_UNMARKED"]));
  });
});

describe("toRequest", () => {
  it("sends kilograms and metres as typed, and leaves out empty optional fields", () => {
    const d = blankDraft();
    d.cargo = { ...d.cargo, weight: "4 445", weightUnit: "kg", length: "4.9", lengthUnit: "m", articulated: true, articulationRestrained: true };
    d.wllUnit = "kg";
    d.tiedowns[0]!.components = [
      { key: "a", type: "chain", grade: "80", size: "5/16 in", wll: "" },
      { key: "b", type: "binder", wll: "2450", rangeFrom: "", rangeTo: "3/8 in" },
      { key: "c", type: "hook", grade: "", wll: "" },
      { key: "d", type: "webbing", width: "2 in", wll: "1000" },
      { key: "e", type: "anchor", label: "  ", wll: "2700" },
    ];
    const body = toRequest(d);
    expect(body.cargo).toEqual({
      weight: { value: 4445, unit: "kg" },
      length: { value: 4.9, unit: "m" },
      kind: "machine",
      blockedAtFront: false,
      articulated: true,
      articulationRestrained: true,
    });
    expect(body.tiedowns[0]!.components).toEqual([
      { type: "chain", grade: 80, size: "5/16 in" },
      { type: "binder", wll: { value: 2450, unit: "kg" } },
      { type: "hook" },
      { type: "webbing", width: "2 in", wll: { value: 1000, unit: "kg" } },
      { type: "anchor", wll: { value: 2700, unit: "kg" } },
    ]);
    expect(securementCheckRequestSchema.safeParse(body).success).toBe(true);
  });

  it("sends an empty or unreadable weight so the API names the field", () => {
    const d = blankDraft();
    const r1 = securementCheckRequestSchema.safeParse(toRequest(d));
    expect(r1.success).toBe(false);
    expect(r1.error!.issues.map((i) => i.path.join("."))).toEqual(expect.arrayContaining(["cargo.weight.value", "cargo.length.value"]));
    d.cargo.weight = "heavy";
    expect(toRequest(d).cargo.weight).toEqual({ value: null, unit: "lb" });
  });

  it("reads numbers with separators", () => {
    expect(readNumber("9,800")).toBe(9800);
    expect(readNumber(" 12 000 ")).toBe(12000);
    expect(readNumber("4.5")).toBe(4.5);
    expect(readNumber("")).toBeUndefined();
    expect(readNumber("abc")).toBeNull();
  });
});

describe("new tiedowns and parts", () => {
  it("copies the parts of the tiedown above, with new keys", () => {
    const d = exampleDraft();
    const t = newTiedown(6, d.tiedowns[5]);
    expect(t.label).toBe("tiedown 7");
    expect(t.secures).toBe("machine");
    expect(t.components.map((c) => c.type)).toEqual(["chain", "binder", "anchor"]);
    expect(t.components[0]!.key).not.toBe(d.tiedowns[5]!.components[0]!.key);
  });

  it("starts a part with the common values", () => {
    expect(newComponent("chain")).toMatchObject({ type: "chain", grade: "70", size: "3/8 in", wll: "" });
    expect(newComponent("webbing")).toMatchObject({ type: "webbing", width: "4 in" });
    expect(newComponent("wire-rope")).toMatchObject({ type: "wire-rope", size: "1/2 in", construction: "", nominalStrength: "" });
    expect(newComponent("rope")).toMatchObject({ type: "rope", fibre: "", size: "1/2 in" });
    expect(newComponent("steel-strapping")).toMatchObject({ type: "steel-strapping", width: "1 1/4 in", thickness: "0.029 in" });
  });

  it("offers the tables' own sizes: rope by its 13 mm 1/2 in row, strapping thicknesses by width", () => {
    expect(ROPE_SIZES.map((s) => s.value)).toEqual(["3/8 in", "7/16 in", "1/2 in", "5/8 in", "3/4 in", "1 in"]);
    expect(strappingThicknesses("2 in").map((t) => t.value)).toEqual(["0.044 in", "0.050 in"]);
    expect(strappingThicknesses("1 1/4 in")).toHaveLength(6);
  });

  it("sends wire rope, fibre rope and steel strapping as the API reads them, and the engine rates them", () => {
    const d = blankDraft();
    d.cargo = { ...d.cargo, weight: "6000", length: "9" };
    d.tiedowns[0]!.components = [
      { key: "a", type: "wire-rope", size: "1/2 in", construction: " 6x19 IWRC ", nominalStrength: "26,600", wll: "" },
      { key: "b", type: "rope", fibre: "", size: "1/2 in", wll: "" },
      { key: "c", type: "rope", fibre: "nylon", size: "1/2 in", wll: "" },
      { key: "d", type: "steel-strapping", width: "2 in", thickness: "0.044 in", wll: "" },
      { key: "e", type: "anchor", label: "", wll: "20000" },
    ];
    const body = toRequest(d);
    expect(body.tiedowns[0]!.components).toEqual([
      { type: "wire-rope", size: "1/2 in", construction: "6x19 IWRC", nominalStrength: { value: 26600, unit: "lb" } },
      { type: "rope", size: "1/2 in" },
      { type: "rope", fibre: "nylon", size: "1/2 in" },
      { type: "steel-strapping", width: "2 in", thickness: "0.044 in" },
      { type: "anchor", wll: { value: 20000, unit: "lb" } },
    ]);
    const r = check(d);
    // 393.108(e)(1): 26,600 / 4; (c): polypropylene 625; nylon 525; strapping 2 x 0.044 in: 2,650 (FROM MEMORY row)
    expect(r.tiedowns[0]!.components.map((c) => c.wllLb)).toEqual([6650, 625, 525, 2650, 20000]);
    expect(r.tiedowns[0]!.wllLb).toBe(525);
  });

  it("makes three more like a tiedown, with every part and new names", () => {
    const d = exampleDraft();
    const copies = copiesOf(d.tiedowns[0]!, 3, d.tiedowns.length);
    expect(copies.map((t) => t.label)).toEqual(["tiedown 7", "tiedown 8", "tiedown 9"]);
    expect(copies.map((t) => toRequest({ ...d, tiedowns: [t] }).tiedowns[0]!.components)).toEqual([0, 1, 2].map(() => toRequest(d).tiedowns[0]!.components));
    expect(new Set(copies.flatMap((t) => [t.key, ...t.components.map((c) => c.key)])).size).toBe(12);
  });
});

describe("marks on the form's own fields", () => {
  it("marks every binder left without a WLL and its range, at the field's request path", () => {
    const d = exampleDraft();
    for (const t of d.tiedowns.slice(0, 4)) {
      const b = t.components[1]!;
      if (b.type !== "binder") throw new Error("binder second");
      b.wll = "";
      b.rangeFrom = "";
      b.rangeTo = "";
    }
    const marks = fieldMarks(check(d).findings);
    expect(marks.filter((m) => m.path.endsWith(".wll")).map((m) => m.path)).toEqual([0, 1, 2, 3].map((i) => `tiedowns.${i}.components.1.wll`));
    expect(issueAt(marks, "tiedowns.2.components.1.wll")).toBe("Empty: enter the WLL stamped on it. Until then this tiedown counts 0");
    expect(issueAt(marks, "tiedowns.2.components.1.chainSizeRange")).toBe("Not given: whether this binder takes the chain was not checked");
    expect(issueAt(marks, "cargo")).toBeUndefined();
  });
});

describe("fromRequest: a saved check back in the form", () => {
  it("gives back the same request for a check made in the form", () => {
    const d = exampleDraft();
    d.tiedowns[0]!.components.push(
      { key: "w", type: "wire-rope", size: "5/8 in", construction: "6x37 FC", nominalStrength: "", wll: "" },
      { key: "r", type: "rope", fibre: "polyester", size: "3/4 in", wll: "1880" },
      { key: "s", type: "steel-strapping", width: "1 1/4 in", thickness: "0.050 in", wll: "" },
      { key: "h", type: "hook", grade: "43", wll: "5400" },
    );
    const body = toRequest(d);
    const back = fromRequest(body as unknown as SecurementCheckRequest);
    expect(back.notes).toEqual([]);
    expect(toRequest(back.draft)).toEqual(body);
  });

  it("says what it had to change: other units, a mark written another way, labels", () => {
    const back = fromRequest({
      cargo: { weight: { value: 4000, unit: "daN" }, length: { value: 4900, unit: "mm" }, kind: "machine" },
      tiedowns: [
        {
          attachment: "direct",
          components: [
            { type: "chain", grade: "G7", size: "10 mm", wll: { value: 3000, unit: "kg" } },
            { type: "binder", wll: { value: 6600, unit: "lb" }, chainSizeRange: ["8 mm", "10 mm"], label: "b1" },
            { type: "steel-strapping", width: "31.7 mm", thickness: "0.05" },
          ],
        },
      ],
    });
    expect(back.draft.cargo).toMatchObject({ weight: "8992.4", weightUnit: "lb", length: "4.9", lengthUnit: "m" });
    expect(back.draft.wllUnit).toBe("kg");
    expect(back.draft.tiedowns[0]!.label).toBe("tiedown 1");
    expect(back.draft.tiedowns[0]!.components).toEqual([
      expect.objectContaining({ type: "chain", grade: "70", size: "3/8 in", wll: "3000" }),
      expect.objectContaining({ type: "binder", wll: "2993.7", rangeFrom: "5/16 in", rangeTo: "3/8 in" }),
      expect.objectContaining({ type: "steel-strapping", width: "1 1/4 in", thickness: "0.050 in" }),
    ]);
    expect(back.notes).toEqual([
      "The weight was saved in daN and is shown in lb",
      "The length was saved in mm and is shown in metres",
      "Part names and stock ids are not shown in the form",
      "WLLs are shown in kg; some were saved in lb and are converted",
    ]);
  });
});

describe("issues", () => {
  const issues = [
    { path: "cargo.weight.value", message: "The value must be a number" },
    { path: "tiedowns.1.components.1.wll.value", message: "The value must be greater than 0" },
  ];

  it("finds an issue at a field or below it", () => {
    expect(issueAt(issues, "cargo.weight")).toBe("The value must be a number");
    expect(issueAt(issues, "tiedowns.1.components.1.wll")).toBe("The value must be greater than 0");
    expect(issueAt(issues, "tiedowns.1")).toBe("The value must be greater than 0");
    expect(issueAt(issues, "tiedowns.10")).toBeUndefined();
    expect(issueAt(issues, "cargo.length")).toBeUndefined();
  });

  it("names a path in words", () => {
    const d = exampleDraft();
    expect(describePath("cargo.weight.value", d)).toBe("Weight");
    expect(describePath("cargo.weight.unit", d)).toBe("Weight unit");
    expect(describePath("tiedowns.1.components.1.wll.value", d)).toBe("Tiedown 2 (front right), part 2 (binder): WLL");
    expect(describePath("tiedowns.4.secures", d)).toBe("Tiedown 5 (bucket): what it holds");
    expect(describePath("tiedowns.0", d)).toBe("Tiedown 1 (front left)");
    expect(describePath("", d)).toBe("The check");
  });
});
