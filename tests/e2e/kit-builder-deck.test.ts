import { execFileSync } from "node:child_process";
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import jsQR from "jsqr";
import { PNG } from "pngjs";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { formatMetres } from "@/lib/kits/placement";
import { PAPER } from "@/lib/kits/sheet";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";
import { BASE_URL } from "../support/http";
import { testDb } from "../support/db";

// The kit on the deck in the real app, with the demo outfit's kits: the deck picture of the
// kit that passes and the one that does not on a phone and a desktop, tapping a tiedown and
// an anchor point in the picture, moving the machine (typed and slid) and the tongue weight
// saved, proposing a kit and using it, axe-core on the builder, and the load sheet printed
// through Chromium to PDF on US Letter and A4, its pages turned into images and its QR code
// read back. Kits that get changed are copies of the demo kits on later dates, so the demo
// kits of tomorrow stay as the other browser tests expect them.

const DEMO = { password: "yard-demo-2026", domain: "corvid-hollow.example" };
const APP_URL = process.env.APP_URL ?? BASE_URL;
const AXE = createRequire(import.meta.url).resolve("axe-core/axe.min.js");

let orgId: string;
let passing: { id: string; date: string };
let failing: { id: string; date: string };
let browsers: { phone: OpenBrowser; desktop: OpenBrowser };
let pages: { phone: Page; desktop: Page };
const pageErrors: string[] = [];

async function signIn(p: Page, who: string) {
  await p.goto(`${BASE_URL}/sign-in`);
  await p.getByLabel("E-mail").fill(`${who}@${DEMO.domain}`);
  await p.getByLabel("Password").fill(DEMO.password);
  await p.getByRole("button", { name: "Sign in" }).click();
  await p.waitForURL(`${BASE_URL}/`);
}

/** A full-page screenshot with the phone's bottom bar let down to the end, so that it hides nothing. */
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

/** Whether the element's top edge is on screen, below the sticky header. */
async function onScreen(p: Page, selector: string): Promise<boolean> {
  return p.locator(selector).evaluate((el) => {
    const r = el.getBoundingClientRect();
    return r.top >= 0 && r.top < window.innerHeight * 0.6;
  });
}

/**
 * A copy of a demo kit for a later date, made through the API with the page's session (the
 * copy keeps tiedowns and placement), under a job name of its own so that the other tests
 * still find the demo kits by theirs.
 */
async function copyOf(p: Page, kitId: string, date: string, job: string): Promise<string> {
  const res = await p.request.post(`${BASE_URL}/api/v1/kits/${kitId}/copies`, { data: { date, job }, headers: { origin: BASE_URL } });
  expect(res.status(), await res.text()).toBe(201);
  return (await res.json()).kit.id;
}

function later(date: string, days: number): string {
  const d = new Date(`${date}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  orgId = (await testDb("organisations").where({ name: "Corvid Hollow Groundworks" }).first("id")).id;
  const kits = await testDb("kits").where({ organisation_id: orgId }).whereNull("copied_from").select("id", "job", testDb.raw("to_char(date, 'YYYY-MM-DD') as date"));
  passing = kits.find((k) => k.job === "Hollins driveway")!;
  failing = kits.find((k) => k.job === "Brookside culvert")!;
  expect(passing && failing).toBeTruthy();
  browsers = { phone: await openBrowser({ phone: true }), desktop: await openBrowser() };
  pages = { phone: await browsers.phone.context.newPage(), desktop: await browsers.desktop.context.newPage() };
  for (const p of Object.values(pages)) {
    p.on("pageerror", (e) => pageErrors.push(e.message));
    await signIn(p, "pete");
  }
});

afterAll(async () => {
  await browsers?.phone.close();
  await browsers?.desktop.close();
  await testDb.destroy();
});

describe("the deck picture on the builder", () => {
  for (const size of ["phone", "desktop"] as const) {
    it(`draws the passing and the failing demo kit on a ${size}, with no axe violations`, async () => {
      const p = pages[size];
      for (const [name, kit, pass] of [
        ["pass", passing, true],
        ["fail", failing, false],
      ] as const) {
        await p.goto(`${BASE_URL}/kits/${kit.id}`);
        const deck = p.locator("figure.kit-deck");
        await expect.poll(() => deck.count()).toBe(1);
        expect(await deck.textContent()).toContain(pass ? "The check passes" : "The check does not pass");
        expect(await p.getByTestId("kit-verdict").getAttribute("data-pass")).toBe(String(pass));
        if (!pass) {
          // The bent stake pocket R3 is crossed out, and the tiedown on it is drawn as blocked.
          expect(await deck.locator("[data-cross]").count()).toBe(1);
          expect(await deck.locator('svg g[data-state="blocked"]').count()).toBeGreaterThan(0);
          expect(await p.getByTestId("verdict-placement").textContent()).toContain("has not been measured");
        } else {
          expect(await p.getByTestId("verdict-placement").textContent()).toMatch(/Tongue weight [\d,]+ lb, [\d.]+ % of the loaded 11,700 lb \(band 10–15 %\)/);
        }
        await deck.scrollIntoViewIfNeeded();
        await deck.screenshot({ path: `${SCREENSHOT_DIR}/builder-deck-${name}-${size}.png` });
        await shoot(p, `builder-${name}-${size}`);
        expect(await axeViolations(p), `${name} on a ${size}`).toEqual([]);
        expect(await p.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
      }
    });
  }

  it("opens the tiedown or the anchor point tapped in the picture", async () => {
    const p = pages.phone;
    await p.goto(`${BASE_URL}/kits/${passing.id}`);
    const kit = await (await p.request.get(`${BASE_URL}/api/v1/kits/${passing.id}`)).json();
    const rear = kit.tiedowns.find((t: { label: string }) => t.label === "rear right");
    // The line and badge of the rear right tiedown, as a finger taps them.
    await p.locator(`figure.kit-deck svg g[data-tiedown="${rear.id}"] a`).first().tap();
    await p.waitForURL(`**/kits/${passing.id}#tiedown-${rear.id}`);
    await expect.poll(() => onScreen(p, `#tiedown-${rear.id}`)).toBe(true);
    expect(await p.locator(`#tiedown-${rear.id}`).textContent()).toContain("rear right");
    await p.screenshot({ path: `${SCREENSHOT_DIR}/builder-tap-tiedown-phone.png` });

    const l2 = kit.trailer.anchorPoints.find((a: { label: string }) => a.label === "L2");
    await p.locator("figure.kit-deck").scrollIntoViewIfNeeded();
    // Its square, where a finger lands (the link's box also spans the space to its label).
    await p.locator(`figure.kit-deck svg a[href="#anchor-${l2.id}"] > rect`).tap();
    await p.waitForURL(`**#anchor-${l2.id}`);
    await expect.poll(() => onScreen(p, `#anchor-${l2.id}`)).toBe(true);
    const card = p.locator(`#anchor-${l2.id}`);
    expect(await card.textContent()).toContain("Anchor point L2");
    expect(await card.textContent()).toContain("Used by");
    await p.screenshot({ path: `${SCREENSHOT_DIR}/builder-tap-anchor-phone.png` });
  });
});

describe("where the machine sits, on the builder", () => {
  it("moves the machine to three positions (typed and slid): the tongue weight changes at once and is saved", async () => {
    const p = pages.phone;
    const kitId = await copyOf(p, passing.id, later(passing.date, 21), "Hollins driveway, moved on the deck");
    await p.goto(`${BASE_URL}/kits/${kitId}`);
    const section = p.getByTestId("placement");
    const tongue = section.getByTestId("tongue-weight");
    const status = section.getByTestId("placement-status");
    await section.scrollIntoViewIfNeeded();
    expect(await tongue.textContent()).toBe("1,463 lb"); // the demo kit's 1 m, copied
    await section.getByRole("radio", { name: "m", exact: true }).click();

    const seen: string[] = [];
    const typed = (value: string) => async () => {
      await section.getByLabel("Or type the distance").fill(value);
      return Math.round(Number(value) * 1000);
    };
    // Slid with the keyboard as far back as it goes: the rear of the machine at the rear of
    // the deck, on the slider's 10 mm steps (6,096 − 4,900 = 1,196 mm, so 1,190 mm).
    const slid = async () => {
      const slider = section.getByRole("slider");
      await slider.focus();
      await p.keyboard.press("End");
      return Number(await slider.inputValue());
    };
    const positions: [string, () => Promise<number>][] = [
      ["typed 0 m", typed("0")],
      ["typed 0.6 m", typed("0.6")],
      ["slid to the rear", slid],
    ];
    for (const [i, [name, move]] of positions.entries()) {
      const before = await tongue.textContent();
      const mm = await move();
      await expect.poll(() => tongue.textContent(), { message: name }).not.toBe(before);
      await expect.poll(() => status.textContent(), { message: name, timeout: 10_000 }).toContain(`Saved: the front ${formatMetres(mm)} back`);
      const saved = await testDb("kits").where({ id: kitId }).first("machine_front_from_deck_front_mm as mm");
      expect(saved.mm, name).toBe(mm);
      // The server's figure, the screen's figure and the verdict's line agree.
      const answer = await (await p.request.get(`${BASE_URL}/api/v1/kits/${kitId}`)).json();
      const shown = (await tongue.textContent())!;
      expect(shown).toBe(`${answer.placement.tongueWeightLb.toLocaleString("en-US")} lb`);
      await expect.poll(() => p.getByTestId("verdict-placement").textContent()).toContain(`Tongue weight ${shown}`);
      seen.push(shown);
      await section.screenshot({ path: `${SCREENSHOT_DIR}/builder-placement-${i + 1}-phone.png` });
    }
    // By hand (Deck 20 tilt: 3,600 lb empty, 450 lb on the pintle, axle 18 ft = 5,486 mm from the hitch, deck 1,500 mm behind it;
    // Unit 12: 8,100 lb, CG 2,300 mm from its front): T = 450 + 8,100 × (5,486 − (1,500 + p + 2,300)) / 5,486.
    expect(seen).toEqual(["2,939 lb", "2,053 lb", "1,182 lb"]);
    expect(await section.textContent()).toContain("In the band");
    const audits = await testDb("audit_log").where({ entity: "kit", entity_id: kitId, action: "kit.placed" }).count<{ count: string }[]>("id as count");
    expect(Number(audits[0]!.count)).toBe(3);
    expect(await axeViolations(p)).toEqual([]);
  });
});

describe("propose a kit, on the builder", () => {
  it("shows a proposal that passes with its verdict, and uses it on confirmation", async () => {
    const p = pages.desktop;
    const kitId = await copyOf(p, passing.id, later(passing.date, 22), "Hollins driveway, proposed");
    await p.goto(`${BASE_URL}/kits/${kitId}`);
    const panel = p.getByTestId("proposal");
    await panel.getByRole("button", { name: "Propose a kit" }).click();
    const verdict = panel.getByTestId("proposal-verdict");
    await expect.poll(() => verdict.getAttribute("data-pass"), { timeout: 10_000 }).toBe("true");
    expect(await verdict.textContent()).toContain("This proposal passes the check");
    const proposed = panel.getByRole("list", { name: "Proposed tiedowns" }).locator(":scope > li");
    expect(await proposed.count()).toBe(6); // four corners, the bucket and the blade
    await panel.screenshot({ path: `${SCREENSHOT_DIR}/builder-proposal-desktop.png` });
    expect(await axeViolations(p)).toEqual([]);

    p.once("dialog", (d) => void d.accept());
    await panel.getByRole("button", { name: /^Use this proposal/ }).click();
    await expect.poll(() => verdict.textContent(), { timeout: 10_000 }).toContain("Saved");
    const saved = await (await p.request.get(`${BASE_URL}/api/v1/kits/${kitId}`)).json();
    expect(saved.pass).toBe(true);
    expect(saved.tiedowns.map((t: { label: string }) => t.label)).toEqual(["front left", "front right", "rear left", "rear right", "bucket", "blade"]);
    expect(await p.getByTestId("tiedown-card").count()).toBe(6);
    expect(await p.getByTestId("kit-verdict").getAttribute("data-pass")).toBe("true");
    await shoot(p, "builder-proposal-applied-desktop");
  });

  it("says what is missing when no proposal passes, on a phone", async () => {
    const p = pages.phone;
    const kitId = await copyOf(p, failing.id, later(failing.date, 23), "Brookside culvert, proposed");
    await p.goto(`${BASE_URL}/kits/${kitId}`);
    const panel = p.getByTestId("proposal");
    await panel.getByRole("button", { name: "Propose a kit" }).click();
    const verdict = panel.getByTestId("proposal-verdict");
    await expect.poll(() => verdict.getAttribute("data-pass"), { timeout: 10_000 }).toBe("false");
    const missing = (await panel.getByTestId("proposal-missing").textContent()) ?? "";
    // The loader's front tie-down points sit 0.5 m back; the gooseneck's first pockets are 1 m back.
    expect(missing).toContain("No anchor point on the left side ahead of the machine's front left tie-down point");
    expect(await panel.getByRole("button", { name: /^Use this proposal/ }).count()).toBe(0);
    await panel.screenshot({ path: `${SCREENSHOT_DIR}/builder-proposal-missing-phone.png` });
    expect(await axeViolations(p)).toEqual([]);
  });
});

describe("the load sheet", () => {
  for (const paper of ["letter", "a4"] as const) {
    it(`prints on ${PAPER[paper].label} through Chromium to PDF, its pages looked at and its QR code read back`, async () => {
      const p = await browsers.desktop.context.newPage();
      try {
        await p.goto(`${BASE_URL}/kits/${passing.id}/sheet?paper=${paper}`);
        await p.evaluate(() => document.fonts.ready);
        await p.screenshot({ path: `${SCREENSHOT_DIR}/load-sheet-${paper}-screen.png`, fullPage: true });
        expect(await axeViolations(p)).toEqual([]);
        await p.emulateMedia({ media: "print" });
        const pdf = await p.pdf({ preferCSSPageSize: true, printBackground: true });
        const file = path.join(SCREENSHOT_DIR, `load-sheet-${paper}.pdf`);
        writeFileSync(file, pdf);
        const text = pdf.toString("latin1");
        const boxes = [...text.matchAll(/\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/g)].map((m) => [Number(m[1]), Number(m[2])]);
        expect(boxes.length).toBeGreaterThanOrEqual(1);
        expect(boxes.length).toBeLessThanOrEqual(3);
        for (const [w, h] of boxes) {
          expect(Math.abs(w! - PAPER[paper].points.width), `width ${w}`).toBeLessThan(1);
          expect(Math.abs(h! - PAPER[paper].points.height), `height ${h}`).toBeLessThan(1);
        }
        // Every page as a picture to look at, and the first at 200 dpi to read the QR code from.
        const prefix = path.join(SCREENSHOT_DIR, `load-sheet-${paper}-page`);
        execFileSync("pdftoppm", ["-r", "80", "-png", file, prefix]);
        const images = readdirSync(SCREENSHOT_DIR).filter((f) => f.startsWith(`load-sheet-${paper}-page-`) && f.endsWith(".png"));
        expect(images.length).toBe(boxes.length);
        execFileSync("pdftoppm", ["-r", "200", "-png", "-f", "1", "-l", "1", "-singlefile", file, `${prefix}1-hires`]);
        const png = PNG.sync.read(readFileSync(`${prefix}1-hires.png`));
        const code = jsQR(new Uint8ClampedArray(png.data), png.width, png.height);
        expect(code?.data).toBe(`${APP_URL}/kits/${passing.id}`);
      } finally {
        await p.close();
      }
    });
  }

  it("prints the failing kit with what stops it: the blocked anchor point, the rule's findings, no placement figures until the hitch is measured", async () => {
    const p = await browsers.desktop.context.newPage();
    try {
      await p.goto(`${BASE_URL}/kits/${failing.id}/sheet?paper=letter`);
      const sheet = p.locator("article.load-sheet");
      expect(await sheet.getAttribute("data-pass")).toBe("false");
      const text = (await sheet.textContent()) ?? "";
      expect(text).toContain("Does not pass the check: do not load as planned");
      expect(text).toContain("May not be used:");
      expect(text).toContain("anchor point R3 may not be used");
      expect(text).toContain("Does not meet the rule:");
      expect(text).toContain("has not been measured");
      await p.emulateMedia({ media: "print" });
      const file = path.join(SCREENSHOT_DIR, "load-sheet-fail-letter.pdf");
      writeFileSync(file, await p.pdf({ preferCSSPageSize: true, printBackground: true }));
      execFileSync("pdftoppm", ["-r", "80", "-png", file, path.join(SCREENSHOT_DIR, "load-sheet-fail-letter-page")]);
    } finally {
      await p.close();
    }
  });

  it("the builder itself prints the picture, without the app's navigation", async () => {
    const p = await browsers.desktop.context.newPage();
    try {
      // A draft (the demo kit may have been loaded and returned by another test by now).
      const kitId = await copyOf(p, passing.id, later(passing.date, 24), "Hollins driveway, printed");
      await p.goto(`${BASE_URL}/kits/${kitId}`);
      expect(await p.getByTestId("proposal").isVisible()).toBe(true);
      expect(await p.getByRole("navigation", { name: "Main" }).first().isVisible()).toBe(true);
      await p.emulateMedia({ media: "print" });
      expect(await p.locator('figure.kit-deck svg[role="group"]').isVisible()).toBe(true);
      for (const nav of await p.getByRole("navigation", { name: "Main" }).all()) expect(await nav.isVisible()).toBe(false);
      expect(await p.getByTestId("proposal").isVisible()).toBe(false);
      await p.screenshot({ path: `${SCREENSHOT_DIR}/builder-print-desktop.png`, fullPage: true });
    } finally {
      await p.close();
    }
  });

  it("raised no page errors", () => {
    expect(pageErrors).toEqual([]);
  });
});
