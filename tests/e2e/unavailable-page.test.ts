import { mkdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { unavailablePage } from "@/lib/http/unavailable";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";

// The plain 503 page that proxy.ts answers while the database is down (tests/faults check
// when it is sent): readable on a phone, in words, with no accessibility violations.

const ROOT = path.resolve(__dirname, "../..");
let phone: OpenBrowser;

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  phone = await openBrowser({ phone: true });
});
afterAll(() => phone?.close());

describe("the page shown while the database is down", () => {
  it("says what is wrong and what to do, on a phone, with no axe violations", async () => {
    const page = await phone.context.newPage();
    await page.setContent(await unavailablePage().text());
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Linkyard is not available just now");
    await page.addScriptTag({ path: path.join(ROOT, "node_modules/axe-core/axe.min.js") });
    const result = await page.evaluate(async () => (window as unknown as { axe: { run: () => Promise<{ violations: { id: string }[] }> } }).axe.run());
    expect(result.violations.map((v) => v.id)).toEqual([]);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/database-down-phone.png`, fullPage: true });
  });
});
