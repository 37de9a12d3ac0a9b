import { mkdirSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { addDays, todayIn } from "@/lib/time";
import { testDb } from "../support/db";
import { BASE_URL } from "../support/http";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";

// The yard hand's one question, "may I use this?", answered once and the same everywhere,
// on a phone in the yard and at a desk: the verdict, the forms that forgive a gloved slip,
// tap targets, contrast (axe-core, with WCAG AAA contrast on) and the owner's import.

const DOMAIN = "corvid-hollow.example";
const AXE = createRequire(import.meta.url).resolve("axe-core/axe.min.js");
let phone: OpenBrowser;
let desk: OpenBrowser;
let org: { id: string; time_zone: string };
let today: string;
/** Items of this test's own, added to the demo company, so that no other test's kit or check is disturbed. */
const mine: Record<"overdue" | "failing" | "firstScreen" | "pages", { id: string; tagCode: string }> = {} as never;

const BINDER = { kind: "binder", marking: "wll", markedWll: { value: 5400, unit: "lb" }, mechanism: "ratchet", chainSizeRange: ["5/16", "3/8"] };
const CHAIN = { kind: "chain", marking: "grade", grade: 70, size: "3/8 in", length: { value: 20, unit: "ft" } };

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  phone = await openBrowser({ phone: true });
  desk = await openBrowser();
  org = await testDb("organisations").where({ name: "Corvid Hollow Groundworks" }).first("id", "time_zone");
  today = todayIn(org.time_zone);
  const page = await desk.context.newPage();
  await signIn(page, "olive");
  for (const [key, body] of [["overdue", BINDER], ["failing", BINDER], ["firstScreen", CHAIN], ["pages", CHAIN]] as const) {
    mine[key] = await page.evaluate(async (b) => {
      const res = await fetch("/api/v1/items", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(b) });
      if (res.status !== 201) throw new Error(`adding an item answered ${res.status}`);
      return (await res.json()) as { id: string; tagCode: string };
    }, body);
  }
  await page.close();
}, 60_000);
afterAll(async () => {
  await phone?.close();
  await desk?.close();
  await testDb.destroy();
});

async function signIn(page: Page, who: string) {
  await page.context().clearCookies();
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(`${who}@${DOMAIN}`);
  await page.getByLabel("Password").fill("yard-demo-2026");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${BASE_URL}/`);
}

const shot = (page: Page, name: string, fullPage = true) => page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage });

/** axe-core's violations, with WCAG AAA contrast (7:1 for body text) turned on. */
async function axeViolations(page: Page): Promise<string[]> {
  await page.addScriptTag({ path: AXE });
  const result = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, o: object) => Promise<{ violations: { id: string; nodes: { target: string[] }[] }[] }> } }).axe;
    return axe.run(document, { rules: { "color-contrast-enhanced": { enabled: true } } });
  });
  return result.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).slice(0, 5).join(" | ")}`);
}

/**
 * Every visible control a finger goes to, smaller than 48 px either way. A checkbox or radio
 * is measured by the label around it (the label is what the thumb presses).
 */
async function smallTargets(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    const controls = document.querySelectorAll<HTMLElement>("a[href], button, input:not([type=hidden]), select, textarea, summary");
    for (const el of controls) {
      const target = el instanceof HTMLInputElement && ["checkbox", "radio"].includes(el.type) ? (el.closest("label") ?? el) : el;
      const box = target.getBoundingClientRect();
      const style = getComputedStyle(target);
      if (style.visibility === "hidden" || style.display === "none" || (box.width <= 1 && box.height <= 1)) continue;
      if (target.closest("[aria-hidden=true]")) continue;
      if (box.height < 47.5 || box.width < 47.5) out.push(`${target.tagName.toLowerCase()} "${(target.textContent ?? (el as HTMLInputElement).name ?? "").trim().slice(0, 40)}" ${Math.round(box.width)}x${Math.round(box.height)}`);
    }
    return out;
  });
}

describe("one verdict", () => {
  it("an overdue binder shows only 'do not use', offers no check, and the API refuses the check with 409", async () => {
    const binder = mine.overdue;
    await testDb("items").where({ id: binder.id }).update({ next_inspection_due: addDays(today, -1) });
    {
      for (const [name, browser] of [["phone", phone], ["desk", desk]] as const) {
        const page = await browser.context.newPage();
        await signIn(page, "yara");
        await page.goto(`${BASE_URL}/items/${binder.id}`);
        const verdict = page.locator("[data-verdict]");
        expect(await verdict.getAttribute("data-verdict")).toBe("stop");
        const words = (await verdict.textContent())!;
        expect(words).toContain("Do not use");
        expect(words).toContain(`Periodic inspection overdue since ${addDays(today, -1)}`);
        expect(words).toContain("Set it aside, hang a red tag on it and tell the owner or a designated person.");
        // Nothing on the page says otherwise: no green status, no check to start.
        const main = (await page.locator("main").textContent())!;
        expect(main).not.toMatch(/Usable|In service/);
        expect(await page.getByRole("link", { name: /Pre-use check|Check it again/ }).count()).toBe(0);
        // The verdict is a solid block with white words.
        const colours = await verdict.evaluate((el) => [getComputedStyle(el).backgroundColor, getComputedStyle(el).color]);
        expect(colours).toEqual(["rgb(155, 28, 28)", "rgb(255, 255, 255)"]);
        await shot(page, `verdict-overdue-binder-${name}`, false);

        // The check page gives the verdict instead of the form, and the API refuses the check.
        await page.goto(`${BASE_URL}/items/${binder.id}/check`);
        expect(await page.getByRole("button", { name: "Record the check" }).count()).toBe(0);
        expect(await page.locator("[data-verdict]").getAttribute("data-verdict")).toBe("stop");
        const refused = await page.evaluate(async (id) => {
          const answers = ["handle", "hooks", "hold", "threads", "marking"].map((p) => ({ id: p, defect: false }));
          const res = await fetch(`/api/v1/items/${id}/events`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ type: "check", answers }) });
          return { status: res.status, body: await res.json() };
        }, binder.id);
        expect(refused.status).toBe(409);
        expect(refused.body.code).toBe("NOT_USABLE");
        expect(refused.body.reasons.map((r: { code: string }) => r.code)).toEqual(["INSPECTION_OVERDUE"]);
        expect(refused.body.error).toMatch(/^Do not use this item, and do not check it: Periodic inspection overdue/);
        await page.close();
      }
      expect((await testDb("items").where({ id: binder.id }).first("last_checked_at")).last_checked_at).toBeNull();
    }
  });

  it("the stock list, the cards and the scan answer with the same verdict", async () => {
    const page = await desk.context.newPage();
    await signIn(page, "olive");
    await page.goto(`${BASE_URL}/stock?due=overdue&status=in_service`);
    await page.locator("tbody tr").first().waitFor();
    const cells = await page.locator("tbody tr td:nth-child(5)").allTextContents();
    expect(cells.length).toBeGreaterThan(0);
    for (const c of cells) expect(c).toBe("Do not use: inspection overdue");
    await shot(page, "verdict-stock-overdue-desk");
    // Tag codes never wrap, in the table or anywhere on the item page.
    const wrapped = await page.evaluate(() =>
      [...document.querySelectorAll("main .font-mono")].filter((el) => {
        const range = document.createRange();
        range.selectNodeContents(el);
        return range.getClientRects().length > 1 && /^[A-Z0-9]{4}-[A-Z0-9]{4}$/.test(el.textContent!.trim());
      }).length,
    );
    expect(wrapped).toBe(0);
    await page.close();

    const cards = await phone.context.newPage();
    await signIn(cards, "yara");
    await cards.goto(`${BASE_URL}/stock?status=tagged_out`);
    await cards.locator("main ul li").first().waitFor();
    for (const t of await cards.locator("main ul li").allTextContents()) expect(t).toContain("Do not use: tagged out");
    await shot(cards, "verdict-stock-cards-phone", false);
    await cards.close();
  });
});

describe("forms that forgive gloves", () => {
  it("a missing answer and a missing note keep every answer, mark the question or field and move the focus there; a failed check shows red", async () => {
    const binder = mine.failing;
    const page = await phone.context.newPage();
    await signIn(page, "yara");
    await page.goto(`${BASE_URL}/items/${binder.id}/check`);
    const groups = page.getByRole("radiogroup");
    const n = await groups.count();
    // Every answer but the last, one of them a defect.
    for (let i = 0; i < n - 1; i++) await groups.nth(i).getByText(i === 1 ? "Yes, I see it" : "No", { exact: true }).click();
    await page.getByRole("button", { name: "Record the check" }).click();
    await expect.poll(() => groups.nth(n - 1).getAttribute("aria-invalid")).toBe("true");
    expect(await page.evaluate(() => (document.activeElement as HTMLInputElement).name)).toMatch(/^defect_/);
    expect(await page.evaluate(() => (document.activeElement as HTMLInputElement).closest("[role=radiogroup]")?.getAttribute("aria-invalid"))).toBe("true");
    expect(await page.locator("input[type=radio]:checked").count()).toBe(n - 1);
    await shot(page, "form-missing-answer-phone", false);

    // The last answer, still no note: the note is marked and focused, every answer kept.
    await groups.nth(n - 1).getByText("No", { exact: true }).click();
    await page.getByRole("button", { name: "Record the check" }).click();
    await expect.poll(() => page.locator("#note").getAttribute("aria-invalid")).toBe("true");
    expect(await page.evaluate(() => document.activeElement?.id)).toBe("note");
    expect(await page.locator("input[type=radio]:checked").count()).toBe(n);
    expect(await page.locator("#note-error").textContent()).toBe("Say what is wrong, or add a photo, so the owner can judge the damage.");
    const alert = (await page.locator("[data-form-alert]").textContent())!;
    expect(alert).not.toMatch(/Some fields need fixing|Invalid input|expected|NaN/);
    // The chosen answer shows a mark, never the browser's radio dot.
    const dot = await page.locator("input[type=radio]:checked").first().boundingBox();
    expect(dot!.width).toBeLessThanOrEqual(1);
    await shot(page, "form-missing-note-phone", false);

    await page.locator("#note").fill("Handle bent");
    await page.getByRole("button", { name: "Record the check" }).click();
    const result = page.locator("[data-form-alert]");
    await expect.poll(() => result.textContent(), { timeout: 15_000 }).toContain("Tagged out: do not use. Set it aside");
    expect(await result.evaluate((el) => [getComputedStyle(el).backgroundColor, getComputedStyle(el).color])).toEqual(["rgb(155, 28, 28)", "rgb(255, 255, 255)"]);
    await shot(page, "check-failed-red-phone", false);
    expect((await testDb("items").where({ id: binder.id }).first("status")).status).toBe("tagged_out");
    await page.close();
  });

  it("a bad number in the item form gets words, not a developer's message", async () => {
    const page = await desk.context.newPage();
    await signIn(page, "pete");
    await page.goto(`${BASE_URL}/stock/new`);
    await page.getByLabel("Kind").selectOption("shackle");
    await page.getByText("A WLL (working load limit)").click();
    await page.getByLabel("Marked WLL").fill("6500");
    await page.getByLabel(/^Size/).fill("5/8");
    await page.getByLabel("Cost in dollars (optional)").fill("about twenty");
    await page.getByRole("button", { name: "Add to stock" }).click();
    await expect.poll(() => page.locator("#cost-error").textContent()).not.toBe("");
    const words = await page.locator("#cost-error").textContent();
    expect(words).not.toMatch(/Invalid|expected|received|NaN/);
    expect(await page.evaluate(() => document.activeElement?.id)).toBe("cost");
    expect(await page.getByLabel("Marked WLL").inputValue()).toBe("6500");
    await shot(page, "form-bad-cost-desk", false);
    await page.close();
  });
});

describe("the item page in the yard", () => {
  it("opens at the top with the tag code, and 'Report damage and tag out' inside the first screen", async () => {
    const chain = mine.firstScreen;
    const page = await phone.context.newPage();
    await signIn(page, "yara");
    await page.goto(`${BASE_URL}/scan`);
    await page.evaluate(() => window.scrollTo(0, document.body.scrollHeight));
    await page.getByLabel("Tag code").fill(chain.tagCode);
    await page.getByRole("button", { name: "Open item" }).click();
    await page.waitForURL(`${BASE_URL}/items/${chain.id}`);
    await page.locator("[data-verdict]").waitFor();
    expect(await page.evaluate(() => window.scrollY)).toBe(0);
    const viewport = await page.evaluate(() => ({ height: window.innerHeight, bar: document.querySelector("nav[aria-label=Main].fixed")?.getBoundingClientRect().top ?? window.innerHeight }));
    const code = await page.getByTestId("item-tag-code").boundingBox();
    expect(await page.getByTestId("item-tag-code").textContent()).toBe(chain.tagCode);
    expect(code!.y).toBeGreaterThanOrEqual(0);
    const tagOut = page.getByText("Report damage and tag out");
    const box = (await tagOut.boundingBox())!;
    expect(box.y + box.height).toBeLessThanOrEqual(viewport.bar);
    await shot(page, "item-first-screen-phone", false);
    // One tap opens the form.
    await tagOut.click();
    await expect.poll(() => page.getByLabel("What is wrong?").isVisible()).toBe(true);
    await shot(page, "item-tag-out-open-phone", false);
    await page.close();
  });

  it("the scan page drops an old error as soon as a new code is typed", async () => {
    const page = await phone.context.newPage();
    await signIn(page, "yara");
    await page.goto(`${BASE_URL}/scan`);
    await page.getByLabel("Tag code").fill("WWWW-WWWW");
    await page.getByRole("button", { name: "Open item" }).click();
    await expect.poll(() => page.locator("#scan-result").textContent()).toContain("No item in your company has the tag code WWWW-WWWW");
    await shot(page, "scan-old-error-phone", false);
    await page.getByLabel("Tag code").press("End");
    await page.getByLabel("Tag code").press("Backspace");
    await expect.poll(() => page.locator("#scan-result").count()).toBe(0);
    await page.close();
  });

  it("the More page lists nothing the bottom bar already has", async () => {
    const page = await phone.context.newPage();
    await signIn(page, "olive");
    await page.goto(`${BASE_URL}/more`);
    const bar = await page.locator("nav[aria-label=Main].fixed a").evaluateAll((as) => as.map((a) => a.getAttribute("href")));
    const more = await page.locator("main a").evaluateAll((as) => as.map((a) => a.getAttribute("href")));
    expect(more.length).toBeGreaterThan(0);
    expect(more.filter((h) => bar.includes(h))).toEqual([]);
    await shot(page, "more-phone", false);
    await page.close();
  });
});

describe("import, seen by the owner", () => {
  it("a quantity column makes that many items; the done page lists their tag codes beside 'Print N tags'; the phone preview fits", async () => {
    const stamp = Date.now().toString(36).toUpperCase();
    const csv = ["Kind,Width,WLL lb,Qty,Serial,Yard", `web strap,4,5400,3,QTY-${stamp},Home yard`, `shackle,5/8,6500,1,SH-${stamp},Home yard`].join("\r\n");
    const page = await phone.context.newPage();
    await signIn(page, "olive");
    await page.goto(`${BASE_URL}/stock/import`);
    await page.getByLabel("CSV file").setInputFiles({ name: "qty.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    await page.getByRole("heading", { name: "2. Say what each column holds" }).waitFor();
    expect(await page.getByLabel('Read "Qty" as').inputValue()).toBe("quantity");
    await page.getByRole("button", { name: "Check the rows" }).click();
    await page.getByRole("heading", { name: "3. Check and import" }).waitFor();
    expect(await page.locator("main").textContent()).toContain("New: 3 items");
    // Nothing is cut off on the phone: the page is no wider than the screen.
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await shot(page, "import-preview-qty-phone");
    await page.getByRole("button", { name: "Import 2 rows" }).click();
    await page.waitForURL(/\/stock\/import\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await page.getByRole("heading", { name: "Import done" }).waitFor();
    const batchId = page.url().split("/").pop()!;
    const made = await testDb("items").where({ import_batch_id: batchId }).orderBy("tag_code").select("id", "tag_code", "serial");
    expect(made.map((i) => i.serial).sort()).toEqual([`QTY-${stamp}-01`, `QTY-${stamp}-02`, `QTY-${stamp}-03`, `SH-${stamp}`]);
    expect(await page.getByRole("link", { name: "Print 4 tags" }).getAttribute("href")).toBe(`/tags/sheet?ids=${made.map((i) => i.id).join(",")}`);
    const listed = await page.getByTestId("new-tag-codes").locator("li").allTextContents();
    expect(listed.map((t) => t.slice(0, 9))).toEqual(made.map((i) => i.tag_code));
    await shot(page, "import-done-qty-phone");
    expect(await smallTargets(page)).toEqual([]);
    expect(await axeViolations(page)).toEqual([]);

    const wide = await desk.context.newPage();
    await signIn(wide, "olive");
    await wide.goto(`${BASE_URL}/stock/import/${batchId}`);
    await shot(wide, "import-done-qty-desk");
    expect(await axeViolations(wide)).toEqual([]);
    await wide.close();
    await page.close();
  });
});

describe("every main page, for a thumb and in sunlight", () => {
  const pages = async () => {
    const chain = mine.pages;
    const out = await testDb("items").where({ organisation_id: org.id, status: "tagged_out" }).orderBy("tag_code").first("id");
    return { "home": "/", "stock": "/stock", "scan": "/scan", "item": `/items/${chain.id}`, "item-tagged-out": `/items/${out.id}`, "check": `/items/${chain.id}/check`, "more": "/more" };
  };

  it("has tap targets of 48 px or more on a phone, and no axe-core violation (AAA contrast on)", async () => {
    const page = await phone.context.newPage();
    await signIn(page, "yara");
    const problems: Record<string, { small: string[]; axe: string[] }> = {};
    for (const [name, url] of Object.entries(await pages())) {
      await page.goto(BASE_URL + url);
      await page.waitForLoadState("networkidle");
      if (name === "stock") await page.locator("main ul li").first().waitFor();
      await page.evaluate(() => document.fonts.ready);
      await shot(page, `main-${name}-phone`, name !== "stock");
      const small = await smallTargets(page);
      const axe = await axeViolations(page);
      if (small.length || axe.length) problems[name] = { small, axe };
    }
    expect(problems).toEqual({});
    await page.close();
  });

  it("reads on a desk too: no axe-core violation, the stock table's checkboxes and links as big as on a phone", async () => {
    const page = await desk.context.newPage();
    await signIn(page, "olive");
    const problems: Record<string, { small: string[]; axe: string[] }> = {};
    for (const [name, url] of Object.entries(await pages())) {
      if (name === "more") continue; // phones only
      await page.goto(BASE_URL + url);
      await page.waitForLoadState("networkidle");
      if (name === "stock") await page.locator("tbody tr").first().waitFor();
      await shot(page, `main-${name}-desk`, name !== "stock");
      const small = await smallTargets(page);
      const axe = await axeViolations(page);
      if (small.length || axe.length) problems[name] = { small, axe };
    }
    expect(problems).toEqual({});
    await page.close();
  });
});
