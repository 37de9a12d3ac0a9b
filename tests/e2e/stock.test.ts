import { mkdirSync } from "node:fs";
import { PNG } from "pngjs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { testDb } from "../support/db";
import { BASE_URL, MAIL_API, latestMailTo } from "../support/http";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";

// The yard hand's and the owner's day with the stock, on the demo company's gear.

const DOMAIN = "corvid-hollow.example";
let phone: OpenBrowser;
let desk: OpenBrowser;
let demoOrg: string;

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  phone = await openBrowser({ phone: true });
  desk = await openBrowser();
  demoOrg = (await testDb("organisations").where({ name: "Corvid Hollow Groundworks" }).first("id")).id;
});
afterAll(async () => {
  await phone?.close();
  await desk?.close();
  await testDb.destroy();
});

async function signIn(page: Page, who: string) {
  await page.context().clearCookies(); // each test signs in as its own person
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(`${who}@${DOMAIN}`);
  await page.getByLabel("Password").fill("yard-demo-2026");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${BASE_URL}/`);
}

const demoItem = (where: Record<string, unknown>) =>
  testDb("items").where({ organisation_id: demoOrg, ...where }).orderBy("tag_code").first("id", "tag_code", "kind");

describe("the item page answers 'may I use this?'", () => {
  it("in every status, on a phone", async () => {
    const page = await phone.context.newPage();
    await signIn(page, "yara");
    for (const status of ["in_service", "tagged_out", "retired", "lost"]) {
      // An in-service item whose inspection is not yet due, so the verdict must say "Usable".
      const target =
        status === "in_service"
          ? await testDb("items").where({ organisation_id: demoOrg, status }).where("next_inspection_due", ">", testDb.raw("current_date")).orderBy("tag_code").first("id")
          : await demoItem({ status });
      await page.goto(`${BASE_URL}/items/${target.id}`);
      const text = await page.locator("[data-verdict]").textContent();
      expect(text).toContain(status === "in_service" ? "Usable" : "Do not use");
      expect(await page.locator("main").textContent()).toContain("Working load limit");
      await page.screenshot({ path: `${SCREENSHOT_DIR}/item-${status}-phone.png`, fullPage: true });
    }
    await page.close();
  });
});

describe("a failed pre-use check", () => {
  it("tags the item out, keeps the photo and e-mails the owner", async () => {
    const item = await testDb("items")
      .where({ organisation_id: demoOrg, status: "in_service", kind: "binder" })
      .where("next_inspection_due", ">", testDb.raw("current_date"))
      .orderBy("tag_code", "desc")
      .first("id", "tag_code");
    const page = await phone.context.newPage();
    await signIn(page, "yara");
    await page.goto(`${BASE_URL}/items/${item.id}`);
    await page.getByRole("link", { name: "Pre-use check" }).click();
    await page.waitForURL(`${BASE_URL}/items/${item.id}/check`);
    const groups = page.getByRole("radiogroup");
    const n = await groups.count();
    for (let i = 0; i < n; i++) await groups.nth(i).getByText("No", { exact: true }).click();
    await groups.nth(0).getByText("Yes, I see it").click(); // handle bent
    await page.getByLabel(/^Note/).fill("Handle bent after it slipped off the deck");
    const photo = new PNG({ width: 32, height: 32 });
    photo.data.fill(180);
    await page.getByLabel("Photo of the damage (optional)").setInputFiles({ name: "handle.png", mimeType: "image/png", buffer: PNG.sync.write(photo) });
    await page.screenshot({ path: `${SCREENSHOT_DIR}/check-filled-phone.png`, fullPage: true });
    await page.getByRole("button", { name: "Record the check" }).click();
    await expect.poll(() => page.locator("[data-form-alert]").textContent(), { timeout: 15_000 }).toContain("Tagged out: do not use. Set it aside");
    await page.screenshot({ path: `${SCREENSHOT_DIR}/check-failed-phone.png`, fullPage: true });

    const row = await testDb("items").where({ id: item.id }).first("status");
    expect(row.status).toBe("tagged_out");
    expect(await testDb("attachments").where({ item_id: item.id, purpose: "damage-photo" }).first("content_type")).toMatchObject({ content_type: "image/png" });

    const mail = await latestMailTo(`olive@${DOMAIN}`, { subject: new RegExp(`^Tagged out: .*${item.tag_code}`) });
    expect(mail.subject).toContain(item.tag_code);
    const inbox = await desk.context.newPage();
    await inbox.goto(MAIL_API);
    await inbox.getByText(mail.subject).first().click();
    await inbox.waitForTimeout(500);
    await inbox.screenshot({ path: `${SCREENSHOT_DIR}/tag-out-mail-inbox.png` });
    await inbox.close();

    await page.getByRole("link", { name: "Back to the item" }).click();
    await page.waitForURL(`${BASE_URL}/items/${item.id}`);
    expect(await page.locator("[data-verdict]").textContent()).toContain("Do not use");
    await page.screenshot({ path: `${SCREENSHOT_DIR}/item-after-failed-check-phone.png`, fullPage: true });
    await page.close();
  });
});

describe("the stock table", () => {
  it("filters on the server and offers bulk actions", async () => {
    const page = await desk.context.newPage();
    await signIn(page, "olive");
    await page.goto(`${BASE_URL}/stock`);
    await expect.poll(() => page.getByText(/\d+ items/).first().textContent()).toMatch(/^\d+ items$/);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/stock-table.png`, fullPage: true });
    await page.getByLabel("Status").selectOption("tagged_out");
    await page.waitForURL(/status=tagged_out/);
    await expect.poll(async () => (await page.locator("tbody tr").allTextContents()).every((t) => t.includes("Do not use: tagged out"))).toBe(true);
    const rows = await page.locator("tbody tr").count();
    await page.getByLabel("Select all on this page").check();
    expect(await page.getByText(/\d+ selected/).textContent()).toBe(`${rows} selected`);
    expect(await page.getByRole("link", { name: "Print tags" }).getAttribute("href")).toMatch(/^\/tags\/sheet\?ids=/);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/stock-table-filtered.png`, fullPage: true });
    await page.close();
  });

  it("shows cards on a phone", async () => {
    const page = await phone.context.newPage();
    await signIn(page, "pete");
    await page.goto(`${BASE_URL}/stock`);
    await expect.poll(() => page.locator("main ul li").count()).toBeGreaterThan(3);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/stock-cards-phone.png`, fullPage: false });
    await page.close();
  });
});

describe("adding an item", () => {
  it("names the field at fault, then lands on the new item", async () => {
    const page = await phone.context.newPage();
    await signIn(page, "pete");
    await page.goto(`${BASE_URL}/stock/new`);
    await page.getByLabel("Kind").selectOption("chain");
    await page.getByLabel("A grade only").check();
    await page.getByLabel("Grade", { exact: true }).selectOption("70");
    await page.getByLabel(/^Size/).fill("9/16");
    await page.getByRole("button", { name: "Add to stock" }).click();
    await expect.poll(() => page.locator("#size-error").textContent()).toBe("Size 9/16 in is not in the 49 CFR 393.108 chain table; nearest: 1/2 in, 5/8 in");
    await page.screenshot({ path: `${SCREENSHOT_DIR}/add-item-error-phone.png`, fullPage: true });
    await page.getByLabel(/^Size/).fill("1/2");
    await page.getByRole("button", { name: "Add to stock" }).click();
    await page.waitForURL(/\/items\/[0-9a-f-]{36}/);
    expect(await page.locator("main").textContent()).toContain("11,300 lb"); // 49 CFR 393.108 chain table, G70 1/2 in
    await page.close();
  });
});
