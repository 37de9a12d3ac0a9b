import { describe, expect, it } from "vitest";
import { checkSecurement, securementCheckRequestSchema, type SecurementCheckRequest } from "@/lib/securement";
import {
  blankDraft,
  describePath,
  exampleDraft,
  issueAt,
  newComponent,
  newTiedown,
  readNumber,
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
