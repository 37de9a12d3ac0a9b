import path from "node:path";
import type { Page } from "playwright-core";
import { afterAll, describe, expect, it } from "vitest";
import { testDb } from "../support/db";
import { BASE_URL, latestMailTo, linkIn, TEST_PASSWORD, uniqueEmail } from "../support/http";
import { openBrowser, SCREENSHOT_DIR } from "./support/browser";

// A company set up from a browser in Chicago (through the e-mailed link) gets Chicago's time
// zone; Settings shows it and the audit log speaks in words, on Chicago's clock.

const ROOT = path.resolve(__dirname, "../..");

afterAll(() => testDb.destroy());

async function axeViolations(page: Page): Promise<string[]> {
  await page.addScriptTag({ path: path.join(ROOT, "node_modules/axe-core/axe.min.js") });
  const result = await page.evaluate(async () => (window as unknown as { axe: { run: () => Promise<{ violations: { id: string; nodes: unknown[] }[] }> } }).axe.run());
  return result.violations.map((v) => `${v.id} (${v.nodes.length})`);
}

describe("the organisation's time zone in the browser", () => {
  it("comes from the browser at sign-up, shows on Settings, and the audit log reads in words on that clock", async () => {
    const browser = await openBrowser({ phone: true, timezoneId: "America/Chicago" });
    try {
      const page = await browser.context.newPage();
      const email = uniqueEmail("chicago");
      await page.goto(`${BASE_URL}/sign-up`);
      await page.getByLabel("Company name").fill("Prairie Haul Co");
      await page.getByLabel("Your name").fill("Pat Prairie");
      await page.getByLabel("E-mail").fill(email);
      await page.getByLabel("Password").fill(TEST_PASSWORD);
      await page.getByRole("button", { name: "Set up company" }).click();
      // The answer is the same for an address with an account (issue 11.3): the e-mail finishes it.
      await expect.poll(() => page.getByRole("status").first().textContent()).toContain(`Check your e-mail: we sent a message to ${email}`);
      await page.screenshot({ path: `${SCREENSHOT_DIR}/sign-up-check-mail-phone.png`, fullPage: true });
      const token = linkIn((await latestMailTo(email, { subject: /^Confirm your e-mail/ })).text, "/sign-up/confirm");
      await page.goto(`${BASE_URL}/sign-up/confirm/${token}`);
      expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Set up Prairie Haul Co");
      await page.screenshot({ path: `${SCREENSHOT_DIR}/sign-up-confirm-phone.png`, fullPage: true });
      expect(await axeViolations(page)).toEqual([]);
      await page.getByRole("button", { name: "Set up company and sign in" }).click();
      await page.waitForURL(`${BASE_URL}/`);
      const org = await testDb("users as u").join("organisations as o", "o.id", "u.organisation_id").where("u.email", email).first("o.time_zone");
      expect(org.time_zone).toBe("America/Chicago");

      await page.goto(`${BASE_URL}/settings`);
      await expect.poll(() => page.getByLabel("Time zone").inputValue()).toBe("America/Chicago");
      await page.screenshot({ path: `${SCREENSHOT_DIR}/settings-time-zone-phone.png`, fullPage: true });
      expect(await axeViolations(page)).toEqual([]);

      await page.goto(`${BASE_URL}/audit`);
      const text = await page.locator("main").innerText();
      expect(text).toContain("Company set up");
      expect(text).toContain("Times are in America/Chicago.");
      expect(text).not.toContain("UTC");
      await page.screenshot({ path: `${SCREENSHOT_DIR}/audit-log-phone.png`, fullPage: true });
      expect(await axeViolations(page)).toEqual([]);
    } finally {
      await browser.close();
    }
  });
});
