import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { createElement, type ReactElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import postcss from "postcss";
import tailwind from "@tailwindcss/postcss";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { KitDeck } from "@/components/kits/deck/kit-deck";
import { PlacementControl } from "@/components/kits/placement/placement-control";
import { deckPicture } from "@/lib/kits/deck";
import { kitVerdict } from "@/lib/kits/plan";
import type { Kit } from "@/lib/kits/model";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";
import { failingScene, passingScene } from "../unit/kits/scenes";

// The deck picture and the placement control, rendered on the server as the app will render
// them, put in a page with the app's own stylesheet and looked at in Chromium on a phone and
// a desktop, on screen and in print. No app server is needed: the components are pure.

const ROOT = path.resolve(__dirname, "../..");
let css = "";
let browsers: { phone: OpenBrowser; desktop: OpenBrowser };

async function appCss(): Promise<string> {
  const from = path.join(ROOT, "app/globals.css");
  const out = await postcss([tailwind()]).process(readFileSync(from, "utf8"), { from });
  return out.css;
}

function writePage(name: string, element: ReactElement): string {
  const font = (w: number) => pathToFileURL(path.join(ROOT, `node_modules/@fontsource/roboto-condensed/${w}.css`)).href;
  const html = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${name}</title><link rel="stylesheet" href="${font(400)}"><link rel="stylesheet" href="${font(700)}"><style>${css}</style></head>
<body class="min-h-dvh"><main class="mx-auto flex max-w-3xl flex-col gap-6 p-4"><h1 class="text-2xl font-bold">${name}</h1>${renderToStaticMarkup(element)}</main></body></html>`;
  const file = path.join(SCREENSHOT_DIR, `${name}.html`);
  writeFileSync(file, html);
  return pathToFileURL(file).href;
}

function deckOf(kit: Kit, idPrefix = "deck") {
  return createElement(KitDeck, { picture: deckPicture(kit, kitVerdict(kit)), idPrefix });
}

async function axeViolations(page: Page): Promise<string[]> {
  await page.addScriptTag({ path: path.join(ROOT, "node_modules/axe-core/axe.min.js") });
  const result = await page.evaluate(async () => (window as unknown as { axe: { run: () => Promise<{ violations: { id: string; nodes: unknown[] }[] }> } }).axe.run());
  return result.violations.map((v) => `${v.id} (${v.nodes.length})`);
}

/** The rendered size, in CSS pixels, of the picture's label text. */
async function labelPixels(page: Page): Promise<number> {
  return page.evaluate(() => {
    const svg = document.querySelector("figure.kit-deck svg") as SVGSVGElement;
    const vb = svg.viewBox.baseVal;
    const text = svg.querySelector("a[data-state] text") as SVGTextElement;
    return (Number(text.getAttribute("font-size")) * svg.getBoundingClientRect().width) / vb.width;
  });
}

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  css = await appCss();
  browsers = { phone: await openBrowser({ phone: true }), desktop: await openBrowser() };
});

afterAll(async () => {
  await browsers?.phone.close();
  await browsers?.desktop.close();
});

describe("the deck picture in a browser", () => {
  for (const [scene, kit] of [
    ["pass", passingScene()],
    ["fail", failingScene()],
  ] as const) {
    for (const size of ["phone", "desktop"] as const) {
      it(`draws the ${scene}ing kit on a ${size}, readable, with no axe violations`, async () => {
        const page = await browsers[size].context.newPage();
        await page.goto(writePage(`kit-deck-${scene}-${size}`, deckOf(kit)));
        await page.evaluate(() => document.fonts.ready);
        await page.screenshot({ path: path.join(SCREENSHOT_DIR, `kit-deck-${scene}-${size}.png`), fullPage: true });
        // Labels read at 12 px or more, and the picture fits the screen's width.
        expect(await labelPixels(page)).toBeGreaterThanOrEqual(12);
        expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
        expect(await axeViolations(page)).toEqual([]);
        await page.close();
      });
    }
  }

  it("prints: the failing kit on paper, in colour, the picture kept whole", async () => {
    const page = await browsers.desktop.context.newPage();
    await page.goto(writePage("kit-deck-print", deckOf(failingScene())));
    await page.emulateMedia({ media: "print" });
    await page.evaluate(() => document.fonts.ready);
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, "kit-deck-print.png"), fullPage: true });
    const pdf = await page.pdf({ format: "Letter", printBackground: true });
    writeFileSync(path.join(SCREENSHOT_DIR, "kit-deck-print.pdf"), pdf);
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    // The anchor-point list is for the screen only; the picture and the tiedowns in words print.
    expect(await page.locator("figure.kit-deck details").isVisible()).toBe(false);
    expect(await page.getByRole("heading", { name: "Tiedowns in words" }).isVisible()).toBe(true);
    await page.close();
  });
});

describe("the placement control in a browser", () => {
  it("shows the figures at three positions on a phone", async () => {
    const kit = passingScene();
    for (const at of [0, 600, 1200]) {
      const page = await browsers.phone.context.newPage();
      await page.goto(writePage(`kit-placement-${at}`, createElement(PlacementControl, { machine: kit.machine, trailer: kit.trailer, initialMm: at })));
      await page.evaluate(() => document.fonts.ready);
      await page.screenshot({ path: path.join(SCREENSHOT_DIR, `kit-placement-${at}.png`), fullPage: true });
      expect(await axeViolations(page)).toEqual([]);
      await page.close();
    }
  });
});
