import { mkdirSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";
import { testDb } from "../support/db";
import { BASE_URL, MAIL_API, latestMailTo, linkIn, uniqueEmail } from "../support/http";

// The foundation as a person meets it: sign in, see the shell of each role, invite a
// colleague who accepts from the e-mail, and get told plainly when input is wrong.

const DEMO = { password: "yard-demo-2026", domain: "corvid-hollow.example" };
let phone: OpenBrowser;
let desk: OpenBrowser;

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  phone = await openBrowser({ phone: true });
  desk = await openBrowser();
});
afterAll(async () => {
  await phone?.close();
  await desk?.close();
  await testDb.destroy();
});

async function signIn(page: Page, email: string, password = DEMO.password) {
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

async function signOut(page: Page) {
  await page.getByRole("button", { name: "Sign out" }).first().click();
  await page.waitForURL(`${BASE_URL}/sign-in`);
}

describe("sign-in", () => {
  it("tells a person plainly when the password is wrong, and keeps the e-mail", async () => {
    const page = await phone.context.newPage();
    await signIn(page, `pete@${DEMO.domain}`, "not-the-password");
    await expect.poll(() => page.getByRole("status").textContent()).toContain("That e-mail and password do not match an account.");
    expect(await page.getByLabel("E-mail").inputValue()).toBe(`pete@${DEMO.domain}`);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/sign-in-error-phone.png`, fullPage: true });
    await page.close();
  });

  it("names the field when the e-mail is malformed", async () => {
    const page = await phone.context.newPage();
    await signIn(page, "pete-at-nowhere", "whatever-password");
    await expect.poll(() => page.locator("#email-error").textContent()).toBe("Enter a valid e-mail address, like name@example.com.");
    expect(await page.getByLabel("E-mail").getAttribute("aria-invalid")).toBe("true");
    await page.close();
  });
});

describe("a scanned tag before signing in", () => {
  it("comes back to the item after sign-in", async () => {
    const item = await testDb("items as i")
      .join("organisations as o", "o.id", "i.organisation_id")
      .where("o.name", "Corvid Hollow Groundworks")
      .first("i.id", "i.tag_code");
    const page = await phone.context.newPage();
    await page.context().clearCookies();
    await page.goto(`${BASE_URL}/t/${item.tag_code}`);
    expect(page.url()).toContain("/sign-in?next=");
    expect(await page.locator("main").textContent()).toContain("Sign in to open the tag you scanned.");
    await page.getByLabel("E-mail").fill(`yara@${DEMO.domain}`);
    await page.getByLabel("Password").fill(DEMO.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(`${BASE_URL}/items/${item.id}`);
    await signOut(page);
    await page.close();
  });
});

describe("the shell of each role", () => {
  const cases = [
    { who: "olive", role: "Owner", nav: ["Today", "Scan", "Stock", "Kits", "More"], more: ["Load check", "Machines", "Trailers", "People", "Audit log", "Settings"] },
    { who: "pete", role: "Planner", nav: ["Today", "Scan", "Stock", "Kits", "More"], more: ["Load check", "Machines", "Trailers", "WLL lookup"] },
    { who: "yara", role: "Yard hand", nav: ["Today", "Scan", "Stock", "Kits", "More"], more: ["Load check", "Machines", "Trailers", "WLL lookup"] },
  ];
  for (const c of cases) {
    it(`shows ${c.role.toLowerCase()} only what the role may open, on a phone`, async () => {
      const page = await phone.context.newPage();
      await signIn(page, `${c.who}@${DEMO.domain}`);
      await page.waitForURL(`${BASE_URL}/`);
      const bar = page.locator("nav[aria-label=Main]").last();
      expect((await bar.getByRole("link").allTextContents()).map((t) => t.trim())).toEqual(c.nav);
      expect(await page.locator("header").textContent()).toContain(c.role);
      // Tap targets in the bottom bar are at least 48 px high (gloves).
      const box = await bar.getByRole("link").first().boundingBox();
      expect(box!.height).toBeGreaterThanOrEqual(48);
      await page.screenshot({ path: `${SCREENSHOT_DIR}/shell-${c.who}-phone.png`, fullPage: true });
      await bar.getByRole("link", { name: "More" }).click();
      await page.waitForURL(`${BASE_URL}/more`);
      const more = (await page.locator("main").getByRole("link").allTextContents()).map((t) => t.trim());
      for (const label of c.more) expect(more).toContain(label);
      if (c.who !== "olive") expect(more).not.toContain("People");
      await signOut(page);
      await page.close();
    });
  }

  it("answers 403 in words when a yard hand opens the people page", async () => {
    const page = await phone.context.newPage();
    await signIn(page, `yara@${DEMO.domain}`);
    await page.waitForURL(`${BASE_URL}/`);
    const res = await page.goto(`${BASE_URL}/people`);
    expect(res!.status()).toBe(403);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Not for your role");
    await signOut(page);
    await page.close();
  });
});

describe("inviting a colleague", () => {
  it("sends an invite from the people page that the colleague accepts from the e-mail", async () => {
    const owner = await desk.context.newPage();
    await signIn(owner, `olive@${DEMO.domain}`);
    await owner.waitForURL(`${BASE_URL}/`);
    await owner.goto(`${BASE_URL}/people`);
    const email = uniqueEmail("new-hand");
    const form = owner.locator("form", { has: owner.getByRole("button", { name: "Send invite" }) });
    await form.getByLabel("E-mail").fill(email);
    await form.getByLabel("Role").selectOption("yard_hand");
    await form.getByRole("button", { name: "Send invite" }).click();
    await expect.poll(() => form.getByRole("status").textContent()).toContain(`Invite sent to ${email}`);
    await owner.screenshot({ path: `${SCREENSHOT_DIR}/people-invite-sent.png`, fullPage: true });

    // The e-mail, as it sits in the local mail fake's inbox page.
    const mail = await latestMailTo(email);
    const inbox = await desk.context.newPage();
    await inbox.goto(MAIL_API);
    await inbox.getByText(mail.subject).first().click();
    await inbox.waitForTimeout(500);
    await inbox.screenshot({ path: `${SCREENSHOT_DIR}/invite-mail-inbox.png` });
    await inbox.close();

    const token = linkIn(mail.text, "/invite");
    const newcomer = await phone.context.newPage();
    await newcomer.goto(`${BASE_URL}/invite/${token}`);
    expect(await newcomer.getByRole("heading", { level: 1 }).textContent()).toBe("Join Corvid Hollow Groundworks");
    await newcomer.getByLabel("Your name").fill("Nico Brandt");
    await newcomer.getByLabel("Choose a password").fill("gloves-on-2026");
    await newcomer.screenshot({ path: `${SCREENSHOT_DIR}/invite-accept-phone.png`, fullPage: true });
    await newcomer.getByRole("button", { name: "Join and sign in" }).click();
    await newcomer.waitForURL(`${BASE_URL}/`);
    expect(await newcomer.locator("header").textContent()).toContain("Yard hand");
    await signOut(newcomer);

    // The link works once.
    await newcomer.goto(`${BASE_URL}/invite/${token}`);
    expect(await newcomer.getByRole("heading", { level: 1 }).textContent()).toBe("This invite cannot be used");
    await newcomer.close();
    await signOut(owner);
    await owner.close();
  });
});
