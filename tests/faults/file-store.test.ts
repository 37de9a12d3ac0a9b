import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { FILE_STORE_DOWN } from "@/lib/http/unavailable";
import { callAction, discoveredActions } from "../support/actions";
import { countRows, testDb } from "../support/db";
import { newOrganisation } from "../support/http";
import { service } from "../support/services";

// The file store (the local S3 fake) stopped under the running app: an upload fails with
// words that say so, and no record is half-written: no attachment row, no check that was
// to carry the photo.

const PDF = () => new File([Buffer.from("%PDF-1.4\n% certificate\n")], "cert.pdf", { type: "application/pdf" });
let org: Awaited<ReturnType<typeof newOrganisation>>;
let itemId: string;

beforeAll(async () => {
  org = await newOrganisation("Store Outage Co");
  const res = await org.owner.post("/api/v1/items", { kind: "chain", marking: "grade", grade: 70, size: "3/8" });
  expect(res.status).toBe(201);
  itemId = res.json.id;
});

afterAll(async () => {
  service("start_s3");
  await testDb.destroy();
});

describe("the file store stopped while the app runs", () => {
  it("refuses an upload in words, writing nothing, and takes it once the store is back", async () => {
    const certificate = discoveredActions().get("app/(app)/items/[id]/actions.ts#certificateAction")!;
    const check = discoveredActions().get("app/(app)/items/[id]/actions.ts#itemEventAction")!;
    const at = (ref: typeof certificate) => ({ ...ref, page: `/items/${itemId}` });
    const events = await countRows("item_events", { item_id: itemId });

    service("stop_s3");
    try {
      const start = Date.now();
      const text = await callAction(org.owner, at(certificate), { itemId, certificate: PDF() });
      expect(text).toContain(FILE_STORE_DOWN);
      expect(Date.now() - start).toBeLessThan(15_000);
      expect(await countRows("attachments", { item_id: itemId })).toBe(0);

      const photo = new File([new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3, 4])], "bent.jpg", { type: "image/jpeg" });
      const fields: Record<string, string | Blob> = { type: "check", itemId, note: "bent link", photo };
      for (const id of ["cracked", "bent", "worn", "hooks", "repairs", "heat"]) fields[`defect_${id}`] = id === "bent" ? "yes" : "no";
      expect(await callAction(org.owner, at(check), fields)).toContain(FILE_STORE_DOWN);
      expect(await countRows("item_events", { item_id: itemId })).toBe(events);
      expect(await countRows("attachments", { item_id: itemId })).toBe(0);
    } finally {
      service("start_s3");
    }

    const stored = await callAction(org.owner, at(certificate), { itemId, certificate: PDF() });
    expect(stored).toContain("Document stored with the item.");
    expect(await countRows("attachments", { item_id: itemId })).toBe(1);
  });
});
