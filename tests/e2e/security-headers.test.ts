import { mkdirSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";
import { testDb } from "../support/db";
import { BASE_URL } from "../support/http";

// Every kind of page, signed in as the demo owner in Chromium, under its Content-Security-
// Policy (a nonce per answer, proxy.ts): no script, style, image, font or frame is blocked,
// no page throws, and the pages that do the most in the browser (the camera scanner, the
// kit builder's SVG deck, the QR tag sheet, a printed check) still draw what they draw.

let desk: OpenBrowser;
let ids: { item: string; kit: string; machine: string; trailer: string };

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  desk = await openBrowser({ extraArgs: ["--use-fake-ui-for-media-stream", "--use-fake-device-for-media-stream"] });
  const org = await testDb("organisations").where({ name: "Corvid Hollow Groundworks" }).first("id");
  const item = await testDb("items").where({ organisation_id: org.id }).first("id");
  const kit = await testDb("kits").where({ organisation_id: org.id }).first("id");
  const machine = await testDb("machines").where({ organisation_id: org.id }).first("id");
  const trailer = await testDb("trailers").where({ organisation_id: org.id }).first("id");
  ids = { item: item.id, kit: kit.id, machine: machine.id, trailer: trailer.id };
});
afterAll(async () => {
  await desk?.close();
  await testDb.destroy();
});

/** Opens a page and collects what the CSP blocked and what the page threw. */
async function visit(page: Page, path: string) {
  const problems: string[] = [];
  page.on("pageerror", (e) => problems.push(`error: ${e.message}`));
  page.on("console", (m) => {
    if (m.type() === "error" && /Content Security Policy|Refused to/i.test(m.text())) problems.push(`console: ${m.text()}`);
  });
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      ((window as unknown as { violations: string[] }).violations ??= []).push(`${e.violatedDirective} ${e.blockedURI}`);
    });
  });
  const res = await page.goto(`${BASE_URL}${path}`, { waitUntil: "networkidle" });
  const violations = await page.evaluate(() => (window as unknown as { violations?: string[] }).violations ?? []);
  return { status: res?.status(), csp: (await res?.allHeaders())?.["content-security-policy"] ?? "", problems: [...problems, ...violations] };
}

describe("issue 11.10: every page works under its Content-Security-Policy", () => {
  it("signs in and opens each kind of page with nothing blocked", async () => {
    const page = await desk.context.newPage();
    const signIn = await visit(page, "/sign-in");
    expect(signIn.problems).toEqual([]);
    expect(signIn.csp).toMatch(/script-src 'self' 'nonce-[^']+' 'strict-dynamic'/);
    await page.getByLabel("E-mail").fill("olive@corvid-hollow.example");
    await page.getByLabel("Password").fill("yard-demo-2026");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(`${BASE_URL}/`);
    await page.close();

    const paths = [
      "/", "/stock", "/check", "/ratings", "/people", "/settings", "/audit", "/stock/import", "/more",
      `/items/${ids.item}`, `/items/${ids.item}/check`, "/kits", "/kits/new", `/kits/${ids.kit}`,
      "/machines", `/machines/${ids.machine}`, "/trailers", `/trailers/${ids.trailer}`,
      `/tags/sheet?ids=${ids.item}`,
    ];
    for (const path of paths) {
      const p = await desk.context.newPage();
      const { status, problems } = await visit(p, path);
      expect(status, path).toBe(200);
      expect(problems, path).toEqual([]);
      await p.close();
    }
  }, 120_000);

  it("draws the kit builder's deck, the tag sheet's QR codes and the scanner's camera", async () => {
    const kit = await desk.context.newPage();
    expect((await visit(kit, `/kits/${ids.kit}`)).problems).toEqual([]);
    expect(await kit.locator("svg").count()).toBeGreaterThan(0);
    await kit.screenshot({ path: `${SCREENSHOT_DIR}/csp-kit-deck.png`, fullPage: true });
    await kit.close();

    const sheet = await desk.context.newPage();
    expect((await visit(sheet, `/tags/sheet?ids=${ids.item}`)).problems).toEqual([]);
    const qr = sheet.locator("img, svg").first();
    await expect.poll(() => qr.count()).toBeGreaterThan(0);
    await sheet.screenshot({ path: `${SCREENSHOT_DIR}/csp-tag-sheet.png`, fullPage: true });
    await sheet.close();

    const scan = await desk.context.newPage();
    expect((await visit(scan, "/scan")).problems).toEqual([]);
    // The camera starts by itself (Chromium's fake device here), inside html5-qrcode.
    await expect.poll(() => scan.locator("video").count(), { timeout: 15_000 }).toBeGreaterThan(0);
    await scan.waitForTimeout(1000);
    const late = await scan.evaluate(() => (window as unknown as { violations?: string[] }).violations ?? []);
    expect(late).toEqual([]);
    await scan.screenshot({ path: `${SCREENSHOT_DIR}/csp-scan-camera.png`, fullPage: true });
    await scan.close();
  }, 90_000);

  it("cannot be framed by another site", async () => {
    const page = await desk.context.newPage();
    await page.setContent(`<iframe id="f" src="${BASE_URL}/sign-in" width="400" height="300"></iframe>`);
    await page.waitForTimeout(1500);
    const frame = page.frames().find((f) => f.url().startsWith(BASE_URL));
    const framedHeading = frame ? await frame.locator("h1").count().catch(() => 0) : 0;
    expect(framedHeading).toBe(0);
    await page.close();
  });
});
