import { describe, expect, it } from "vitest";
import { defaultRating, ratingQuerySchema } from "@/lib/securement";
import { GRADE_CHOICES, MATERIAL_CHOICES, nearestValue, ratingSearch, sizeChoices, thicknessChoices } from "@/lib/forms/rating-lookup";

const look = (search: string) => defaultRating(ratingQuerySchema.parse(Object.fromEntries(new URLSearchParams(search))));

describe("the lookup's buttons", () => {
  it("list the chain table's sizes that have a value for the grade", () => {
    expect(sizeChoices("chain", "70").map((c) => c.value)).toEqual(["1/4 in", "5/16 in", "3/8 in", "7/16 in", "1/2 in", "5/8 in"]);
    expect(sizeChoices("chain", "80").map((c) => c.value)).not.toContain("7/16 in");
    expect(sizeChoices("chain", "").length).toBe(6);
    expect(sizeChoices("chain", "70")[2]).toEqual({ value: "3/8 in", label: "3/8 in", sub: "10 mm" });
  });

  it("every size button of every material answers from the table", () => {
    for (const m of MATERIAL_CHOICES) {
      for (const s of sizeChoices(m.value, m.value === "chain" ? "70" : "")) {
        const thickness = m.value === "steel-strapping" ? thicknessChoices(s.value)[0]!.value : "";
        const search = ratingSearch({ material: m.value, grade: m.value === "chain" ? "70" : "", fibre: "", size: s.value, thickness });
        expect(look(search!).wllLb, `${m.value} ${s.value}`).toBeGreaterThan(0);
      }
    }
  });

  it("list the strapping thicknesses of a width, typed or tapped", () => {
    expect(thicknessChoices("2 in").map((c) => c.value)).toEqual(["0.044 in", "0.050 in"]);
    expect(thicknessChoices("1-1/4").length).toBe(6);
    expect(thicknessChoices("3 in")).toEqual([]);
    expect(thicknessChoices("")).toEqual([]);
  });

  it("offer every grade of the chain table and no mark", () => {
    expect(GRADE_CHOICES.map((g) => g.value)).toEqual(["30", "43", "70", "80", "100", ""]);
  });
});

describe("ratingSearch", () => {
  it("builds the query the API reads", () => {
    const q = ratingSearch({ material: "chain", grade: "70", fibre: "", size: "3/8 in", thickness: "" });
    expect(q).toBe("material=chain&grade=70&size=3%2F8+in");
    expect(look(q!).wllLb).toBe(6600);
    expect(ratingSearch({ material: "chain", grade: "", fibre: "", size: "5/16", thickness: "" })).toBe("material=chain&size=5%2F16");
    expect(ratingSearch({ material: "webbing", grade: "", fibre: "", size: "4 in", thickness: "" })).toBe("material=webbing&width=4+in");
    expect(ratingSearch({ material: "rope", grade: "", fibre: "nylon", size: "1/2", thickness: "" })).toBe("material=rope&fibre=nylon&size=1%2F2");
  });

  it("waits for a size, and for a thickness of strapping", () => {
    expect(ratingSearch({ material: "chain", grade: "70", fibre: "", size: " ", thickness: "" })).toBeNull();
    expect(ratingSearch({ material: "steel-strapping", grade: "", fibre: "", size: "2 in", thickness: "" })).toBeNull();
  });

  it("turns a nearest-size label back into a size", () => {
    expect(nearestValue("1/2 in")).toBe("1/2 in");
    expect(nearestValue("13 mm (1/2 in)")).toBe("13 mm");
  });
});
