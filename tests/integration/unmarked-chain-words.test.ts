import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { newOrganisation } from "../support/http";
import { testDb } from "../support/db";

// Chain with no legible grade mark is rated as grade 30 proof coil (49 CFR 393.108(d),
// ECFRIO-108 text, verified); the item page and its printed tag say so in words where the
// WLL is shown, not only in the source line (lib/stock/wll-words.ts).

let org: Awaited<ReturnType<typeof newOrganisation>>;
let unmarked: { id: string; tagCode: string };
let marked: { id: string };

beforeAll(async () => {
  org = await newOrganisation("Unmarked Chain Co");
  unmarked = (await org.owner.post("/api/v1/items", { kind: "chain", marking: "none", size: "3/8" })).json;
  marked = (await org.owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8" })).json;
}, 60_000);

afterAll(() => testDb.destroy());

describe("unmarked chain in words", () => {
  const WORDS = "No grade mark: rated as proof coil, 2,650 lb";

  it("on the item page, beside its WLL; not on a marked chain's", async () => {
    const page = await org.owner.get(`/items/${unmarked.id}`);
    expect(page.status).toBe(200);
    expect(page.text).toContain(WORDS);
    expect((await org.owner.get(`/items/${marked.id}`)).text).not.toContain("No grade mark: rated as");
  });

  it("on its printed tag", async () => {
    const sheet = await org.owner.get(`/tags/sheet?ids=${unmarked.id},${marked.id}`);
    expect(sheet.status).toBe(200);
    expect(sheet.text).toContain(unmarked.tagCode);
    expect(sheet.text).toContain(WORDS);
    const markedOnly = await org.owner.get(`/tags/sheet?ids=${marked.id}`);
    expect(markedOnly.text).toContain("WLL 6,600 lb");
    expect(markedOnly.text).not.toContain("No grade mark: rated as");
  });
});
