// Zod schemas of the request and the ratings query, read through the one issue mapper (zodIssues).
import { describe, expect, it } from "vitest";
import { zodIssues } from "@/lib/field-issues";
import { ratingQuerySchema, securementCheckRequestSchema } from "@/lib/securement/schema";

const contract = {
  cargo: { weight: { value: 9800, unit: "lb" }, length: { value: 16, unit: "ft" }, kind: "machine", blockedAtFront: false, articulated: false, accessories: ["bucket", "blade"] },
  tiedowns: [
    {
      label: "front left",
      attachment: "direct",
      secures: "machine",
      components: [
        { type: "chain", grade: 70, size: "3/8 in" },
        { type: "binder", wll: { value: 5400, unit: "lb" }, chainSizeRange: ["5/16 in", "3/8 in"] },
        { type: "anchor", wll: { value: 6000, unit: "lb" } },
      ],
    },
  ],
};

function paths(body: unknown) {
  const r = securementCheckRequestSchema.safeParse(body);
  if (r.success) return [];
  return zodIssues(r.error);
}

describe("securementCheckRequestSchema", () => {
  it("accepts the contract example, and re-parsing its output changes nothing", () => {
    const r = securementCheckRequestSchema.safeParse(contract);
    expect(r.success).toBe(true);
    expect(securementCheckRequestSchema.parse(r.data)).toEqual(r.data);
  });

  it("accepts every component type and unit", () => {
    const body = structuredClone(contract) as { cargo: Record<string, unknown>; tiedowns: { components: unknown[] }[] };
    body.cargo.weight = { value: 4445, unit: "kg" };
    body.cargo.length = { value: 4.9, unit: "m" };
    body.tiedowns[0]!.components = [
      { type: "chain", grade: "G70", size: "10 mm", marked: false, label: "chain 7", gearId: "c-7" },
      { type: "webbing", width: "1 3/4", wll: { value: 1500, unit: "daN" } },
      { type: "wire-rope", size: 0.5 },
      { type: "wire-rope", size: "1/2", construction: "6x19 IWRC", nominalStrength: { value: 26600, unit: "lb" } },
      { type: "rope", fibre: "double-braided-nylon", size: "1/2\"" },
      { type: "steel-strapping", width: "1-1/4 in", thickness: "0.029 in" },
      { type: "hook", grade: 70, wll: { value: 6600, unit: "lb" } },
      { type: "shackle", wll: { value: 3, unit: "kg" } },
      { type: "anchor", label: "D-ring", wll: { value: 5000, unit: "lb" } },
    ];
    expect(paths(body)).toEqual([]);
  });

  it("maps problems to dotted paths", () => {
    const body = structuredClone(contract) as any;
    body.cargo.weight.value = 0;
    body.tiedowns[0].attachment = "sideways";
    body.tiedowns[0].components[0].size = "three eighths";
    body.tiedowns[0].components[1].wll = { value: 5400, unit: "tons" };
    body.tiedowns[0].components[2].wl = 5;
    expect(paths(body)).toEqual([
      { path: "cargo.weight.value", message: "The value must be greater than 0" },
      { path: "tiedowns.0.attachment", message: "The attachment must be direct, indirect-same-side or indirect-across" },
      { path: "tiedowns.0.components.0.size", message: "Cannot read this size; write it as 3/8, 3/8 in, 1 3/4 in, 0.375 or 10 mm" },
      { path: "tiedowns.0.components.1.wll.unit", message: "The unit must be lb, kg or daN" },
      { path: "tiedowns.0.components.2.wl", message: 'Unknown field "wl"' },
    ]);
  });

  it("rejects unknown component types, unknown grades and empty tiedowns", () => {
    const body = structuredClone(contract) as any;
    body.tiedowns[0].components[0] = { type: "strap" };
    body.tiedowns.push({ attachment: "direct", components: [] });
    body.tiedowns.push({ attachment: "direct", components: [{ type: "chain", grade: "alloy", size: "3/8" }] });
    expect(paths(body).map((p) => p.path)).toEqual(["tiedowns.0.components.0.type", "tiedowns.1.components", "tiedowns.2.components.0.grade"]);
  });

  it("reads a wire rope's construction and nominal strength (393.108(e)(1)), and refuses bad ones at their path", () => {
    const body = structuredClone(contract) as any;
    body.tiedowns[0].components[0] = { type: "wire-rope", size: "1/2", construction: " ", nominalStrength: { value: -1, unit: "lb" } };
    expect(paths(body)).toEqual([
      { path: "tiedowns.0.components.0.construction", message: "The construction is empty" },
      { path: "tiedowns.0.components.0.nominalStrength.value", message: "The value must be greater than 0" },
    ]);
  });

  it("checks secures against the declared accessories", () => {
    const body = structuredClone(contract) as any;
    body.tiedowns[0].secures = "boom";
    body.cargo.accessories = ["bucket", "Bucket", "machine"];
    expect(paths(body)).toEqual([
      { path: "cargo.accessories.1", message: 'Accessory "Bucket" is listed twice' },
      { path: "cargo.accessories.2", message: '"machine" is the machine itself, not an accessory' },
      { path: "tiedowns.0.secures", message: '"boom" is not a declared accessory; use "machine" or one of: bucket, Bucket, machine' },
    ]);
    body.cargo.accessories = ["boom"];
    expect(paths(body)).toEqual([]);
  });

  it("rejects NaN and infinite figures", () => {
    const body = structuredClone(contract) as any;
    body.cargo.length.value = Number.POSITIVE_INFINITY;
    expect(paths(body).map((p) => p.path)).toEqual(["cargo.length.value"]);
  });
});

describe("ratingQuerySchema", () => {
  it("accepts query-string values", () => {
    expect(ratingQuerySchema.safeParse({ material: "chain", grade: "70", size: "3/8" }).success).toBe(true);
    expect(ratingQuerySchema.safeParse({ material: "steel-strapping", width: "1 1/4", thickness: "0.029" }).success).toBe(true);
  });

  it("asks for the fields the material needs", () => {
    const r = ratingQuerySchema.safeParse({ material: "steel-strapping", width: "2" });
    expect(r.success).toBe(false);
    expect(zodIssues(r.error!)).toEqual([{ path: "thickness", message: "A thickness is needed for steel-strapping" }]);
    const w = ratingQuerySchema.safeParse({ material: "webbing", size: "4" });
    expect(zodIssues(w.error!).map((i) => i.path)).toEqual(["width"]);
    const m = ratingQuerySchema.safeParse({ material: "cable", size: "1/2" });
    expect(zodIssues(m.error!)).toEqual([{ path: "material", message: "The material must be chain, webbing, wire-rope, rope or steel-strapping" }]);
  });
});
