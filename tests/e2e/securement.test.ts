import { mkdirSync } from "node:fs";
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

describe("both screens", () => {
  it("ran without an error in the page (no failed hydration, no exception)", () => {
    expect(pageErrors).toEqual([]);
  });
});
