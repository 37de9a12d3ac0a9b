import { mkdirSync } from "node:fs";
import path from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { testDb } from "../support/db";
import { BASE_URL, deleteMailTo, latestMailTo, MAIL_API } from "../support/http";
import { QUEUES, sendTestJob } from "../support/services";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";

// The demo company's e-mail on screen: its morning digest in the mail fake's inbox, the
// unsubscribe page the digest links to (no sign-in), each person's E-mail page, and the
// owner's E-mail section of Settings with a message that could not be sent.

const ROOT = path.resolve(__dirname, "../..");
const DOMAIN = "corvid-hollow.example";
let phone: OpenBrowser;
let desk: OpenBrowser;
let demoOrg: string;

async function axeViolations(page: Page): Promise<string[]> {
  await page.addScriptTag({ path: path.join(ROOT, "node_modules/axe-core/axe.min.js") });
  const result = await page.evaluate(async () => (window as unknown as { axe: { run: () => Promise<{ violations: { id: string; nodes: unknown[] }[] }> } }).axe.run());
  return result.violations.map((v) => `${v.id} (${v.nodes.length})`);
}

async function signIn(page: Page, who: string) {
  await page.context().clearCookies();
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(`${who}@${DOMAIN}`);
  await page.getByLabel("Password").fill("yard-demo-2026");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${BASE_URL}/`);
}

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

describe("the demo company's e-mail", () => {
  it("sends its digest, which reads in the inbox and links to a one-click unsubscribe page", async () => {
    // As if the company had been set up days ago and its digest time had come.
    await deleteMailTo(`olive@${DOMAIN}`); // digests of earlier runs carry links of an earlier database
    await testDb("daily_runs").where({ organisation_id: demoOrg }).delete();
    await testDb("organisations").where({ id: demoOrg }).update({ digest_time: "00:00", created_at: new Date(Date.now() - 3 * 86_400_000) });
    await sendTestJob(QUEUES.dailyTick);
    const digest = await latestMailTo(`olive@${DOMAIN}`, { subject: /\(Linkyard digest, /, timeoutMs: 20_000 });
    expect(digest.text).toContain("Inspection overdue: may not be used until inspected");

    const inbox = await desk.context.newPage();
    await inbox.goto(MAIL_API);
    await inbox.getByText(digest.subject).first().click();
    await inbox.waitForTimeout(500);
    await inbox.screenshot({ path: `${SCREENSHOT_DIR}/digest-mail-inbox.png` });
    await inbox.close();

    const link = digest.text.match(/Stop the daily digest: (\S+)/)![1];
    const page = await phone.context.newPage();
    await page.context().clearCookies();
    await page.goto(link);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Stop the daily digest?");
    await page.screenshot({ path: `${SCREENSHOT_DIR}/unsubscribe-phone.png`, fullPage: true });
    expect(await axeViolations(page)).toEqual([]);
    await page.getByRole("button", { name: "Stop the daily digest" }).click();
    await expect.poll(() => page.getByRole("status").first().textContent()).toContain(`Linkyard stops sending the daily digest to olive@${DOMAIN}`);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/unsubscribe-done-phone.png`, fullPage: true });
    await page.close();
  });

  it("lets each person choose their reminders on the E-mail page", async () => {
    const page = await phone.context.newPage();
    await signIn(page, "olive");
    await page.goto(`${BASE_URL}/preferences`);
    const digest = page.getByRole("checkbox", { name: /Daily digest/ });
    expect(await digest.isChecked()).toBe(false); // stopped from the e-mail in the test before
    await digest.check();
    await page.getByRole("button", { name: "Save e-mail choices" }).click();
    await expect.poll(() => page.getByRole("status").first().textContent()).toContain("Your e-mail choices are saved.");
    await page.screenshot({ path: `${SCREENSHOT_DIR}/preferences-phone.png`, fullPage: true });
    expect(await axeViolations(page)).toEqual([]);
    expect(await testDb("mail_opt_outs").join("users", "users.id", "mail_opt_outs.user_id").where("users.email", `olive@${DOMAIN}`).count("* as n").first()).toEqual({ n: "0" });
    await page.close();
  });

  it("shows the owner, on Settings, the digest time and the e-mail that could not be sent", async () => {
    await testDb("mail_messages").insert({
      organisation_id: demoOrg,
      kind: "invite",
      idempotency_key: `e2e-failed-${Date.now()}`,
      to_address: "ferris@typo-domain.example",
      subject: "Olive Marchetti invited you to Corvid Hollow Groundworks on Linkyard",
      body: "An invite.",
      status: "failed",
      attempts: 10,
      last_error: "getaddrinfo ENOTFOUND typo-domain.example",
      failed_at: new Date(),
    });
    const page = await desk.context.newPage();
    await signIn(page, "olive");
    await page.goto(`${BASE_URL}/settings`);
    const section = page.locator("section", { has: page.getByRole("heading", { name: "E-mail", exact: true }) });
    await expect.poll(() => section.textContent()).toContain("Not sent to ferris@typo-domain.example");
    await section.scrollIntoViewIfNeeded();
    await section.screenshot({ path: `${SCREENSHOT_DIR}/settings-mail-desk.png` });
    expect(await axeViolations(page)).toEqual([]);
    await page.close();
  });
});
