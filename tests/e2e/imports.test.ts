import { mkdirSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { testDb } from "../support/db";
import { BASE_URL } from "../support/http";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";

// The owner brings a supplier's list into stock: a file with two bad rows, the columns, the
// check with its errors, the valid rows in, and the tags to print.

let desk: OpenBrowser;
let phone: OpenBrowser;

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  desk = await openBrowser();
  phone = await openBrowser({ phone: true });
});
afterAll(async () => {
  await desk?.close();
  await phone?.close();
  await testDb.destroy();
});

async function signInAsOwner(page: import("playwright-core").Page) {
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail").fill("olive@corvid-hollow.example");
  await page.getByLabel("Password").fill("yard-demo-2026");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${BASE_URL}/`);
}

describe("importing a supplier's list", () => {
  it("shows the columns, the errors by line, imports the valid rows and offers the tags", async () => {
    const stamp = Date.now().toString(36).toUpperCase();
    const csv = [
      "Item type,Grade,Chain size,WLL lb,Length (ft),End fittings,Serial #,Location,In service,Price,Colour",
      `chain,G70,3/8,,20,"grab hook, both ends",E2E-${stamp}-1,Home yard,2026-11-02,$119.00,yellow`,
      `chain,G80,1/2,,16,clevis grab hook both ends,E2E-${stamp}-2,North lot,2026-11-02,$245.00,silver`,
      `chain,G75,3/8,,20,grab hook both ends,E2E-${stamp}-3,Home yard,2026-11-02,$119.00,yellow`,
      `web strap,,4,5400,30,wire hooks,E2E-${stamp}-4,Home yard,2026-11-02,$49.00,yellow`,
      `chain,70,9/16,,20,grab hook both ends,E2E-${stamp}-5,Home yard,2026-11-02,$150.00,yellow`,
      `shackle,,5/8,6500,,screw pin anchor shackle,E2E-${stamp}-6,North lot,2026-11-02,$19.00,`,
    ].join("\r\n");

    const page = await desk.context.newPage();
    await signInAsOwner(page);

    await page.goto(`${BASE_URL}/stock?kind=chain&status=in_service`);
    // the export carries the table's filters
    expect(await page.getByRole("link", { name: /^Export CSV/ }).getAttribute("href")).toBe("/api/v1/items/export.csv?kind=chain&status=in_service");
    await page.getByRole("link", { name: "Import CSV" }).click();
    await page.waitForURL(`${BASE_URL}/stock/import`);
    await page.getByLabel("CSV file").setInputFiles({ name: "supplier-november.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });

    await page.getByRole("heading", { name: "2. Say what each column holds" }).waitFor();
    expect(await page.getByLabel('Read "Item type" as').inputValue()).toBe("kind");
    expect(await page.getByLabel('Read "WLL lb" as').inputValue()).toBe("wllLb");
    expect(await page.getByLabel('Read "Colour" as').inputValue()).toBe("");
    expect(await page.locator("main").textContent()).toContain("Not imported: Colour");
    await page.screenshot({ path: `${SCREENSHOT_DIR}/import-mapping.png`, fullPage: true });

    await page.getByRole("button", { name: "Check the rows" }).click();
    await page.getByRole("heading", { name: "3. Check and import" }).waitFor();
    const errors = page.getByRole("table", { name: "Problems by line and column" });
    await expect.poll(() => errors.locator("tbody tr").count()).toBe(2);
    expect(await errors.locator("tbody tr").nth(0).textContent()).toBe("4GradeGrade is one of 30, 43, 70, 80 or 100 (as stamped: 3, 4, 7, 8, 10 are read too).");
    expect(await errors.locator("tbody tr").nth(1).textContent()).toBe("6Chain sizeSize 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in");
    expect(await page.getByRole("table", { name: "The first rows as they will be stored" }).textContent()).toContain("6,600 lb");
    await page.screenshot({ path: `${SCREENSHOT_DIR}/import-preview-errors.png`, fullPage: true });

    await page.getByRole("button", { name: "Import only the 4 valid rows" }).click();
    await page.waitForURL(/\/stock\/import\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await page.getByRole("heading", { name: "Import done" }).waitFor();
    const batchId = page.url().split("/").pop()!;
    const ids = await testDb("items").where({ import_batch_id: batchId }).orderBy("tag_code").pluck("id");
    expect(ids).toHaveLength(4);
    expect(await page.getByRole("link", { name: "Print 4 tags" }).getAttribute("href")).toBe(`/tags/sheet?ids=${ids.join(",")}`);
    expect(await page.getByRole("link", { name: "Download the rejected rows" }).getAttribute("href")).toBe(`/api/v1/imports/${batchId}/rejected.csv`);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/import-result.png`, fullPage: true });

    await page.getByRole("link", { name: "Import history" }).click();
    await page.waitForURL(`${BASE_URL}/stock/import/history`);
    expect(await page.locator("main li").first().textContent()).toContain("supplier-november.csv");
    await page.screenshot({ path: `${SCREENSHOT_DIR}/import-history.png`, fullPage: true });
    await page.close();
  });

  it("on a phone, stacks each column with a big select", async () => {
    const page = await phone.context.newPage();
    await signInAsOwner(page);
    await page.goto(`${BASE_URL}/stock/import`);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/import-upload-phone.png`, fullPage: true });
    await page.getByLabel("CSV file").setInputFiles({ name: "list.csv", mimeType: "text/csv", buffer: Buffer.from("Type;Size;WLL kg;Lot\nshackle;5/8;2950;L-1\n") });
    await page.getByRole("heading", { name: "2. Say what each column holds" }).waitFor();
    const select = page.getByLabel('Read "WLL kg" as');
    expect(await select.inputValue()).toBe("wllKg");
    expect((await select.boundingBox())!.height).toBeGreaterThanOrEqual(48);
    expect(await page.locator("main").textContent()).toContain("columns separated by semicolons");
    await page.screenshot({ path: `${SCREENSHOT_DIR}/import-mapping-phone.png`, fullPage: true });
    await page.close();
  });
});
