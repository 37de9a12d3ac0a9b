import { execFileSync } from "node:child_process";
import { mkdirSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import type { Page, Response } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";
import { BASE_URL } from "../support/http";
import { testDb } from "../support/db";
import { addDays, todayIn } from "@/lib/time";

// The owner's screens with the demo outfit's data: the dashboard on a phone and a desktop
// (its charts drawn, the chart library fetched there and not on the scan or item pages), the
// records page and its printed report through Chromium to PDF and then to pictures, and the
// audit log; axe-core on each. Reads only: the demo data stays as the other tests expect it.

const DEMO = { password: "yard-demo-2026", domain: "corvid-hollow.example" };
const AXE = createRequire(import.meta.url).resolve("axe-core/axe.min.js");
const LETTER = { width: 612, height: 792 };

let browsers: { phone: OpenBrowser; desktop: OpenBrowser };
let pages: { phone: Page; desktop: Page };
let today: string;
const pageErrors: string[] = [];

async function signIn(p: Page, who: string) {
  await p.goto(`${BASE_URL}/sign-in`);
  await p.getByLabel("E-mail").fill(`${who}@${DEMO.domain}`);
  await p.getByLabel("Password").fill(DEMO.password);
  await p.getByRole("button", { name: "Sign in" }).click();
  await p.waitForURL(`${BASE_URL}/`);
}

async function shoot(p: Page, name: string) {
  const bar = await p.addStyleTag({ content: "nav.fixed { position: static !important; }" });
  await p.screenshot({ path: `${SCREENSHOT_DIR}/${name}.png`, fullPage: true });
  await bar.evaluate((el) => (el as HTMLElement).remove());
}

async function axeViolations(p: Page): Promise<string[]> {
  await p.addScriptTag({ path: AXE });
  const result = await p.evaluate(async () => (window as unknown as { axe: { run: () => Promise<{ violations: { id: string; impact: string; nodes: { target: string[] }[] }[] }> } }).axe.run());
  return result.violations.flatMap((v) => v.nodes.map((n) => `${v.id} (${v.impact}): ${n.target.join(" ")}`));
}

/** The scripts a page loads, with their sizes, while `load` runs. */
async function scriptsOf(p: Page, load: () => Promise<unknown>): Promise<{ url: string; bytes: number; text: string }[]> {
  const seen: Promise<{ url: string; bytes: number; text: string }>[] = [];
  const onResponse = (r: Response) => {
    if (r.request().resourceType() === "script") seen.push(r.text().then((text) => ({ url: r.url(), bytes: Buffer.byteLength(text), text })).catch(() => ({ url: r.url(), bytes: 0, text: "" })));
  };
  p.on("response", onResponse);
  try {
    await load();
    await p.waitForLoadState("networkidle");
  } finally {
    p.off("response", onResponse);
  }
  return Promise.all(seen);
}

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const org = await testDb("organisations").where({ name: "Corvid Hollow Groundworks" }).first("time_zone");
  today = todayIn(org.time_zone);
  browsers = { phone: await openBrowser({ phone: true }), desktop: await openBrowser() };
  pages = { phone: await browsers.phone.context.newPage(), desktop: await browsers.desktop.context.newPage() };
  for (const p of Object.values(pages)) {
    p.on("pageerror", (e) => pageErrors.push(e.message));
    await signIn(p, "olive");
  }
});

afterAll(async () => {
  await browsers?.phone.close();
  await browsers?.desktop.close();
  await testDb.destroy();
});

describe("the dashboard", () => {
  for (const size of ["phone", "desktop"] as const) {
    it(`draws its three charts with the demo data on a ${size}, each with its table, and no axe violations`, async () => {
      const p = pages[size];
      await p.goto(`${BASE_URL}/`);
      await expect.poll(() => p.locator(".recharts-wrapper").count(), { timeout: 15_000 }).toBe(3);
      // The bars are drawn with their numbers; the tables hold the same figures as links.
      await expect.poll(() => p.locator(".recharts-bar-rectangle").count()).toBeGreaterThan(10);
      expect(await p.locator("#due-weeks-heading").textContent()).toBe("Inspections due, week by week");
      expect(await p.locator('section[aria-labelledby="due-weeks-heading"] tbody tr').count()).toBe(12);
      expect(await p.locator('section[aria-labelledby="tag-outs-heading"] tbody tr').count()).toBe(6);
      expect(await p.getByText("Tagged out: waiting for a decision").count()).toBeGreaterThan(0);
      await shoot(p, `dashboard-${size}`);
      expect(await axeViolations(p), size).toEqual([]);
      expect(await p.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
      expect(pageErrors).toEqual([]);
    });
  }

  it("opens the stock list of exactly a week's items from the chart's table", async () => {
    const p = pages.desktop;
    await p.goto(`${BASE_URL}/`);
    const chart = p.locator('section[aria-labelledby="due-weeks-heading"]');
    await chart.getByText("The figures, each with its list").click();
    const link = chart.locator("tbody tr").nth(1).locator("a");
    const count = Number(await link.textContent());
    await link.click();
    await p.waitForURL(/\/stock\?status=in_service&dueFrom=/);
    await expect.poll(() => p.getByText(`${count} items`, { exact: true }).count()).toBe(1);
    expect(await p.getByRole("button", { name: "Clear these dates" }).count()).toBe(1);
  });

  it("fetches the chart library on the dashboard only, not on the scan or an item page", async () => {
    const p = pages.desktop;
    const marker = "recharts-surface";
    const home = await scriptsOf(p, () => p.goto(`${BASE_URL}/`));
    await expect.poll(() => p.locator(".recharts-wrapper").count()).toBe(3);
    const item = await testDb("items").first("id");
    const fresh = await browsers.desktop.context.newPage();
    try {
      const scan = await scriptsOf(fresh, () => fresh.goto(`${BASE_URL}/scan`));
      const itemPage = await scriptsOf(fresh, () => fresh.goto(`${BASE_URL}/items/${item.id}`));
      const kb = (list: { bytes: number }[]) => Math.round(list.reduce((a, s) => a + s.bytes, 0) / 1024);
      const chartKb = Math.round(home.filter((s) => s.text.includes(marker)).reduce((a, s) => a + s.bytes, 0) / 1024);
      console.log(`JavaScript loaded (uncompressed): dashboard ${kb(home)} KB (chart chunks ${chartKb} KB), scan ${kb(scan)} KB, item page ${kb(itemPage)} KB`);
      expect(home.some((s) => s.text.includes(marker))).toBe(true);
      expect(scan.some((s) => s.text.includes(marker))).toBe(false);
      expect(itemPage.some((s) => s.text.includes(marker))).toBe(false);
    } finally {
      await fresh.close();
    }
  });
});

describe("records", () => {
  it("shows the records page with the year's count and who made the entries, and no axe violations", async () => {
    const p = pages.phone;
    await p.goto(`${BASE_URL}/records`);
    expect(await p.locator("#summary-heading").textContent()).toBe("All stock");
    expect(await p.getByRole("table").first().textContent()).toContain("Olive Marchetti");
    await shoot(p, "records-phone");
    expect(await axeViolations(p)).toEqual([]);
  });

  it("prints the report through Chromium to PDF on US Letter, its pages looked at", async () => {
    const p = await browsers.desktop.context.newPage();
    try {
      await p.goto(`${BASE_URL}/records/print?from=${addDays(today, -90)}&to=${today}&kind=web-strap`);
      await p.evaluate(() => document.fonts.ready);
      const text = (await p.locator("article.record-report").textContent()) ?? "";
      expect(text).toContain("Corvid Hollow Groundworks");
      expect(text).toContain("Inspection and service record");
      expect(text).toContain("Web straps");
      expect(text).toContain("Olive Marchetti");
      expect(text).toMatch(/limit larger than 0\.(375|75) in on \d in webbing: ✓ within the limit/);
      expect(await p.getByTestId("printed-at").textContent()).toContain(today);
      await p.screenshot({ path: `${SCREENSHOT_DIR}/records-print-screen.png`, fullPage: true });
      expect(await axeViolations(p)).toEqual([]);
      await p.emulateMedia({ media: "print" });
      const pdf = await p.pdf({ preferCSSPageSize: true, printBackground: true });
      const file = path.join(SCREENSHOT_DIR, "records-letter.pdf");
      writeFileSync(file, pdf);
      const boxes = [...pdf.toString("latin1").matchAll(/\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/g)].map((m) => [Number(m[1]), Number(m[2])]);
      expect(boxes.length).toBeGreaterThanOrEqual(1);
      for (const [w, h] of boxes) {
        expect(Math.abs(w! - LETTER.width)).toBeLessThan(1);
        expect(Math.abs(h! - LETTER.height)).toBeLessThan(1);
      }
      const prefix = path.join(SCREENSHOT_DIR, "records-letter-page");
      // Pages of an earlier, longer report would otherwise be counted with this one's.
      for (const old of readdirSync(SCREENSHOT_DIR).filter((f) => f.startsWith("records-letter-page-"))) rmSync(path.join(SCREENSHOT_DIR, old));
      execFileSync("pdftoppm", ["-r", "80", "-png", file, prefix]);
      expect(readdirSync(SCREENSHOT_DIR).filter((f) => f.startsWith("records-letter-page-") && f.endsWith(".png")).length).toBe(boxes.length);
    } finally {
      await p.close();
    }
  });
});

describe("the audit log", () => {
  it("lists the changes in words with its filters, and no axe violations", async () => {
    const p = pages.desktop;
    await p.goto(`${BASE_URL}/audit`);
    expect(await p.getByLabel("Kind of change").count()).toBe(1);
    expect(await p.locator("tbody tr").count()).toBeGreaterThan(0);
    await shoot(p, "audit-desktop");
    expect(await axeViolations(p)).toEqual([]);
    await pages.phone.goto(`${BASE_URL}/audit`);
    // The table fits the phone: nothing to scroll sideways.
    expect(await pages.phone.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
    await shoot(pages.phone, "audit-phone");
    expect(await axeViolations(pages.phone)).toEqual([]);
  });
});
