import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";
import { BASE_URL } from "../support/http";

// The two securement screens on a phone, as a yard hand uses them at the roadside: look up
// a WLL, run the prefilled check, and watch an unmarked chain take a heavier load below the rule.

const DEMO = { password: "yard-demo-2026", domain: "corvid-hollow.example" };
let phone: OpenBrowser;
let page: Page;
/** Errors the page itself reports (a failed hydration, an exception); refused API calls are expected. */
const pageErrors: string[] = [];

async function signIn(p: Page, email: string) {
  await p.goto(`${BASE_URL}/sign-in`);
  await p.getByLabel("E-mail").fill(email);
  await p.getByLabel("Password").fill(DEMO.password);
  await p.getByRole("button", { name: "Sign in" }).click();
  await p.waitForURL(`${BASE_URL}/`);
}

/** Every control in the page's main area a gloved thumb has to hit is at least 48 px high. */
async function smallTargets(p: Page): Promise<string[]> {
  return p.evaluate(() => {
    const out: string[] = [];
    const controls = document.querySelectorAll<HTMLElement>(
      "main button, main select, main input:not([type=radio]):not([type=checkbox]), main summary, main label:has(input[type=radio]), main label:has(input[type=checkbox])",
    );
    for (const el of controls) {
      const r = el.getBoundingClientRect();
      if (r.width === 0 && r.height === 0) continue; // not shown (closed details)
      if (r.height < 47.5) out.push(`${el.tagName} "${(el.textContent || el.getAttribute("aria-label") || "").trim().slice(0, 40)}" ${Math.round(r.height)}px`);
    }
    return out;
  });
}

/** Taps a big choice button: the label around the radio of that name, in the named group. */
async function choose(p: Page, group: string, option: RegExp) {
  await p.getByRole("group", { name: group }).locator("label", { has: p.getByRole("radio", { name: option }) }).click();
}

/** axe-core's violations on the page as it stands (impact and rule id, with the first offending node). */
async function axeViolations(p: Page): Promise<string[]> {
  await p.addScriptTag({ path: path.resolve(__dirname, "../../node_modules/axe-core/axe.min.js") });
  return p.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (context?: unknown) => Promise<{ violations: { id: string; impact: string; nodes: { target: string[] }[] }[] }> } }).axe;
    const r = await axe.run(document);
    return r.violations.map((v) => `${v.impact} ${v.id}: ${v.nodes[0]?.target.join(" ")}`);
  });
}

/** A full-page screenshot from the top, so the sticky header sits where it belongs. */
async function shoot(p: Page, name: string) {
  await p.evaluate(() => window.scrollTo(0, 0));
  await p.screenshot({ path: `${SCREENSHOT_DIR}/${name}.png`, fullPage: true });
}

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  phone = await openBrowser({ phone: true });
  page = await phone.context.newPage();
  page.on("pageerror", (e) => pageErrors.push(e.message));
  page.on("console", (m) => {
    if (m.type() === "error" && !m.text().startsWith("Failed to load resource")) pageErrors.push(m.text());
  });
  await signIn(page, `yara@${DEMO.domain}`);
});
afterAll(async () => {
  await phone?.close();
});

describe("WLL lookup", () => {
  it("shows 6,600 lb for 3/8 in grade 70 chain, with its source", async () => {
    await page.goto(`${BASE_URL}/ratings`);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("WLL lookup");
    await choose(page, "Grade mark on the links", /^G70 /);
    await choose(page, "Chain size", /^3\/8 in /);
    const wll = page.getByTestId("rating-wll");
    await expect.poll(() => wll.textContent()).toContain("6,600 lb");
    expect(await wll.textContent()).toContain("2,990 kg");
    const result = page.getByRole("region", { name: /chain/ });
    expect(await result.textContent()).toContain("49 CFR 393.108, chain table");
    expect(await result.textContent()).toContain("Verified");
    expect(await page.getByRole("heading", { name: "Marked or not: which number counts" }).isVisible()).toBe(true);
    expect(await smallTargets(page)).toEqual([]);
    await shoot(page, "ratings-chain-g70-phone");
  });

  it("reads a typed size, and names the nearest sizes for one the table does not have", async () => {
    await page.getByLabel("Or type it").fill("9/16");
    await page.getByRole("button", { name: "Look up", exact: true }).click();
    const alert = page.locator("main [role=alert]");
    await expect.poll(() => alert.textContent()).toContain("Not a size in the table");
    expect(await alert.textContent()).toContain("9/16 in is not in the 49 CFR 393.108 chain table");
    await shoot(page, "ratings-not-in-table-phone");
    await alert.getByRole("button", { name: "Look up 1/2 in" }).click();
    await expect.poll(() => page.getByTestId("rating-wll").textContent()).toContain("11,300 lb");

    await page.getByLabel("Or type it").fill("10 mm");
    await page.getByLabel("Or type it").press("Enter");
    await expect.poll(() => page.getByTestId("rating-wll").textContent()).toContain("6,600 lb");
  });

  it("rates chain with no legible mark as grade 30", async () => {
    await choose(page, "Grade mark on the links", /^No mark /);
    await choose(page, "Chain size", /^5\/16 in /);
    await expect.poll(() => page.getByTestId("rating-wll").textContent()).toContain("1,900 lb");
    const result = page.getByRole("region", { name: /chain/ });
    expect(await result.textContent()).toContain("5/16 in chain with no grade mark");
    expect(await result.textContent()).toContain("49 CFR 393.108(d)");
    await shoot(page, "ratings-unmarked-phone");
  });
});

describe("Load check", () => {
  const check = async () => {
    await page.getByRole("button", { name: "Check these tiedowns" }).click();
  };
  const verdict = () => page.locator("#verdict-heading");

  it("opens with a prefilled mini excavator that meets the published minimums", async () => {
    await page.goto(`${BASE_URL}/check`);
    expect(await page.getByLabel("Weight", { exact: true }).inputValue()).toBe("9800");
    await shoot(page, "check-form-phone");
    expect(await smallTargets(page)).toEqual([]);
    await check();
    await expect.poll(() => verdict().textContent()).toBe("Meets the published minimums");
    const figures = page.getByRole("region", { name: "The figures" });
    expect(await figures.textContent()).toContain("15,500 lb");
    expect(await figures.textContent()).toContain("4,900 lb");
    expect(await page.getByRole("complementary", { name: "What this check covers" }).textContent()).toContain("49 CFR Part 393");
    expect(await page.getByTestId("tiedown-result-0").textContent()).toContain("Limited by the binder");
    await shoot(page, "check-meets-phone");
    expect(await smallTargets(page)).toEqual([]);
  });

  it("fails a heavier machine once one chain has no legible grade mark, and says why", async () => {
    await page.getByLabel("Weight", { exact: true }).fill("30000");
    await check();
    await expect.poll(() => verdict().textContent()).toBe("Meets the published minimums");

    const summary = page.locator("summary", { hasText: "Tiedown 1: front left" });
    await summary.click();
    const first = page.locator("details", { has: summary });
    await first.getByLabel("Grade mark").selectOption("");
    expect(await page.getByText("The entries changed after this check").isVisible()).toBe(true);
    await check();
    await expect.poll(() => verdict().textContent()).toBe("Does not meet the published minimums");
    const aggregate = page.locator("[data-code=AGGREGATE_WLL_BELOW_REQUIRED]");
    expect(await aggregate.textContent()).toContain("Does not meet the rule");
    expect(await aggregate.textContent()).toContain("49 CFR 393.106(d)");
    expect(await page.locator("[data-code=RATED_AS_UNMARKED]").textContent()).toContain("rated as grade 30 proof coil");
    const t0 = page.getByTestId("tiedown-result-0");
    expect(await t0.textContent()).toContain("2,650 lb");
    expect(await t0.textContent()).toContain("Limited by the chain");
    await shoot(page, "check-does-not-meet-phone");
    await page.locator("[data-code=AGGREGATE_WLL_BELOW_REQUIRED]").scrollIntoViewIfNeeded();
    await page.screenshot({ path: `${SCREENSHOT_DIR}/check-findings-phone.png` });
  });

  it("names the field when an entry cannot be read, and sends nothing wrong to the engine", async () => {
    await page.getByLabel("Weight", { exact: true }).fill("");
    await check();
    const alert = page.locator("main [role=alert]");
    await expect.poll(() => alert.textContent()).toContain("Not checked: some entries need fixing");
    expect(await alert.textContent()).toContain("Weight: The value must be a number");
    expect(await page.getByLabel("Weight", { exact: true }).getAttribute("aria-invalid")).toBe("true");
    await shoot(page, "check-needs-fixing-phone");
  });
});

describe("Load check: every material, copies, grouped findings, save and reopen", () => {
  const NAME = `Wire rope plan ${Date.now()}`;
  const summary = (n: number) => page.locator("summary", { hasText: new RegExp(`Tiedown ${n}(:|\\b)`) }).first();

  it("adds a wire rope part to a tiedown, with its construction and nominal strength", async () => {
    await page.goto(`${BASE_URL}/check`);
    await page.getByRole("button", { name: "Load the example" }).click();
    await summary(1).click();
    const first = page.locator("details", { has: summary(1) });
    await first.getByRole("button", { name: "Add wire rope to tiedown 1" }).click();
    const rope = first.getByRole("group", { name: "Part 4: Wire rope" });
    await rope.getByLabel("Diameter").selectOption("1/2 in");
    await rope.getByLabel("Construction, if known").fill("6x19 IWRC");
    await rope.getByLabel("Nominal strength (maker's catalogue)").fill("26600");
    expect(await first.locator("summary").textContent()).toContain("1/2 in wire rope");
    // the binder of tiedown 1 left without a WLL or a range, to be copied below
    const binder = first.getByRole("group", { name: "Part 2: Binder" });
    await binder.getByLabel("WLL stamped on the binder").fill("");
    await binder.getByLabel("For chain from").selectOption("");
    await binder.getByLabel("to", { exact: true }).selectOption("");
    await rope.scrollIntoViewIfNeeded();
    await page.screenshot({ path: `${SCREENSHOT_DIR}/check-wire-rope-part-phone.png` });
    expect(await smallTargets(page)).toEqual([]);
  });

  it("adds 3 more like tiedown 1", async () => {
    const first = page.locator("details", { has: summary(1) });
    await first.getByRole("button", { name: "+ Add 3 more like this one" }).click();
    await expect.poll(() => page.locator("#tiedowns-heading").textContent()).toBe("Tiedowns (9)");
    for (const n of [7, 8, 9]) expect(await summary(n).textContent()).toContain(`Tiedown ${n}: tiedown ${n}`);
    expect(await summary(9).textContent()).toContain("1/2 in wire rope");
  });

  it("groups the four binders without a WLL into one finding, and marks their empty fields in the form", async () => {
    await page.getByRole("button", { name: "Check these tiedowns" }).click();
    await expect.poll(() => page.locator("#verdict-heading").textContent()).toBe("Does not meet the published minimums");
    const missing = page.locator("[data-code=MISSING_WLL]");
    expect(await missing.count()).toBe(1);
    expect(await missing.getAttribute("data-tiedowns")).toBe("0,6,7,8");
    expect(await missing.textContent()).toContain("4 tiedowns");
    expect(await missing.textContent()).toContain("Tiedowns 1 (front left), 7, 8 and 9, component 2: A binder must carry a marked WLL");
    expect(await page.locator("[data-code=BINDER_RANGE_NOT_GIVEN]").getAttribute("data-tiedowns")).toBe("0,6,7,8");
    // the wire rope counts a quarter of its nominal strength (49 CFR 393.108(e)(1))
    expect(await page.getByTestId("tiedown-result-1").textContent()).toContain("Limited by the binder");
    await page.getByTestId("tiedown-result-0").getByText("Parts (4)").click();
    expect(await page.getByTestId("tiedown-result-0").textContent()).toContain("6,650 lb");
    await missing.scrollIntoViewIfNeeded();
    await page.screenshot({ path: `${SCREENSHOT_DIR}/check-grouped-finding-phone.png` });

    // the empty fields, marked in the form itself
    const wll = page.locator("details", { has: summary(1) }).getByLabel("WLL stamped on the binder");
    expect(await wll.getAttribute("aria-invalid")).toBe("true");
    expect(await page.locator(`[id="${await wll.getAttribute("id")}-error"]`).textContent()).toBe("Empty: enter the WLL stamped on it. Until then this tiedown counts 0");
    expect(await page.getByTestId("tiedown-marks-6").textContent()).toBe("✕ 2 fields to fill in");
    await wll.scrollIntoViewIfNeeded();
    await page.screenshot({ path: `${SCREENSHOT_DIR}/check-empty-fields-marked-phone.png` });
    expect(await axeViolations(page)).toEqual([]);
  });

  let savedId = "";
  it("saves the check with a name and reopens it", async () => {
    await page.getByLabel("Name of this check").fill(NAME);
    await page.getByRole("button", { name: "Save", exact: true }).click();
    await expect.poll(() => page.getByRole("status").filter({ hasText: "Saved as" }).textContent()).toBe(`Saved as “${NAME}”.`);
    await expect.poll(() => new URL(page.url()).searchParams.get("saved")).toMatch(/^[0-9a-f-]{36}$/);
    savedId = new URL(page.url()).searchParams.get("saved")!;
    await page.locator("#save-heading").scrollIntoViewIfNeeded();
    await page.screenshot({ path: `${SCREENSHOT_DIR}/check-saved-phone.png` });

    // start afresh, then open it from the list
    await page.getByRole("button", { name: "Start empty" }).click();
    await expect.poll(() => page.locator("#tiedowns-heading").textContent()).toBe("Tiedowns (1)");
    await page.locator("summary", { hasText: "Saved checks" }).click();
    await page.getByRole("button", { name: `Open ${NAME}` }).click();
    await expect.poll(() => page.locator("#tiedowns-heading").textContent()).toBe("Tiedowns (9)");
    expect(await page.getByLabel("Weight", { exact: true }).inputValue()).toBe("9800");
    await expect.poll(() => page.locator("#verdict-heading").textContent()).toBe("Does not meet the published minimums");
    expect(await page.getByText("The entries changed after this check").count()).toBe(0);
    await summary(1).click();
    const rope = page.locator("details", { has: summary(1) }).getByRole("group", { name: "Part 4: Wire rope" });
    expect(await rope.getByLabel("Nominal strength (maker's catalogue)").inputValue()).toBe("26600");
    expect(await rope.getByLabel("Construction, if known").inputValue()).toBe("6x19 IWRC");
    await page.screenshot({ path: `${SCREENSHOT_DIR}/check-reopened-phone.png`, fullPage: true });

    // and straight from its address
    await page.goto(`${BASE_URL}/check?saved=${savedId}`);
    await expect.poll(() => page.locator("#tiedowns-heading").textContent()).toBe("Tiedowns (9)");
    expect(await page.getByRole("button", { name: `Save changes to “${NAME}”` }).isVisible()).toBe(true);
    expect(await axeViolations(page)).toEqual([]);
  });

  it("prints the saved check (print page, print media and a PDF through Chromium)", async () => {
    await page.goto(`${BASE_URL}/checks/${savedId}/print`);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe(NAME);
    expect(await page.locator("[data-code=MISSING_WLL]").textContent()).toContain("4 tiedowns");
    await shoot(page, "check-print-screen-phone");
    expect(await axeViolations(page)).toEqual([]);
    await page.emulateMedia({ media: "print" });
    expect(await page.locator(".check-print__toolbar").isVisible()).toBe(false);
    await shoot(page, "check-print-media-phone");
    const pdf = await page.pdf({ format: "Letter", printBackground: false });
    writeFileSync(`${SCREENSHOT_DIR}/check-print.pdf`, pdf);
    const pages = (pdf.toString("latin1").match(/\/Type\s*\/Page[^s]/g) ?? []).length;
    expect(pages).toBeGreaterThanOrEqual(1);
    expect(pages).toBeLessThanOrEqual(6);
    await page.emulateMedia({ media: "screen" });
  });
});

describe("both screens", () => {
  it("ran without an error in the page (no failed hydration, no exception)", () => {
    expect(pageErrors).toEqual([]);
  });
});
