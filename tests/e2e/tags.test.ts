import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import jsQR from "jsqr";
import { PNG } from "pngjs";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";
import { cameraReport, countDecoderFrames, writeQrVideo } from "./support/fake-camera";
import { BASE_URL } from "../support/http";
import { testDb } from "../support/db";
import { cellBox, labelsPerSheet, sheetLayout } from "@/lib/tags/sheet";

// QR tags as a person meets them: a printed sheet whose every QR code an independent
// decoder reads back to the right item, the phone's camera reading a tag, typing a code,
// and the public view a stranger sees.

const DEMO = { password: "yard-demo-2026", domain: "corvid-hollow.example" };
const APP_URL = process.env.APP_URL ?? BASE_URL;
const SCALE = 3; // device pixels per CSS pixel for the sheet screenshots: about 288 dpi
const CSS_PX_PER_IN = 96;

interface DemoItem {
  id: string;
  tagCode: string;
  status: string;
  kind: string;
}

let demoOrgId: string;
let items: DemoItem[];
let work: string;

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  work = mkdtempSync(path.join(tmpdir(), "linkyard-tags-"));
  const org = await testDb("organisations").where({ name: "Corvid Hollow Groundworks" }).first("id");
  demoOrgId = org.id;
  items = await testDb("items").where({ organisation_id: demoOrgId }).orderBy("serial").select("id", "tag_code as tagCode", "status", "kind");
  // The seed's 68, and any that browser tests run before this file added for themselves.
  expect(items.length).toBeGreaterThanOrEqual(68);
});

afterAll(async () => {
  await testDb("organisations").where({ id: demoOrgId }).update({ public_tag_view: false });
  await testDb.destroy();
  rmSync(work, { recursive: true, force: true });
});

async function signIn(page: Page, who: string) {
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(`${who}@${DEMO.domain}`);
  await page.getByLabel("Password").fill(DEMO.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${BASE_URL}/`);
}

/** Every QR code on a sheet screenshot, read label by label at the label's known position. */
function decodeSheet(png: Buffer, layoutId: string): (string | null)[] {
  const image = PNG.sync.read(png);
  const layout = sheetLayout(layoutId);
  const px = (inches: number) => Math.round(inches * CSS_PX_PER_IN * SCALE);
  const out: (string | null)[] = [];
  for (let position = 0; position < labelsPerSheet(layout); position++) {
    const box = cellBox(layout, position);
    const x0 = px(box.xIn), y0 = px(box.yIn), w = px(box.widthIn), h = px(box.heightIn);
    const crop = new Uint8ClampedArray(w * h * 4);
    for (let y = 0; y < h; y++) {
      const from = ((y0 + y) * image.width + x0) * 4;
      crop.set(image.data.subarray(from, from + w * 4), y * w * 4);
    }
    out.push(jsQR(crop, w, h)?.data ?? null);
  }
  return out;
}

describe("printed tag sheets", () => {
  let desk: OpenBrowser;
  let page: Page;
  beforeAll(async () => {
    desk = await openBrowser({ scale: SCALE });
    page = await desk.context.newPage();
    await signIn(page, "pete");
  });
  afterAll(async () => desk?.close());

  const cases = [
    { layout: "large-10", count: 12, start: 1 },
    { layout: "small-30", count: 14, start: 21 },
  ];
  for (const c of cases) {
    it(`decode, label by label, to exactly the items asked for (${c.layout}, ${c.count} items, from label ${c.start})`, async () => {
      // Every fourth demo item, so the sheet is not simply the first rows of the table.
      const wanted = items.filter((_, i) => i % 4 === (c.layout === "small-30" ? 1 : 3)).slice(0, c.count);
      expect(wanted).toHaveLength(c.count);
      const ids = [...wanted.map((i) => i.id), "00000000-0000-4000-8000-000000000000"].join(",");
      // One item without a WLL, for the longest WLL line a label can carry.
      const unrated = wanted[1];
      const before = await testDb("items").where({ id: unrated.id }).first("wll_lb");
      await testDb("items").where({ id: unrated.id }).update({ wll_lb: null });
      try {
        await page.goto(`${BASE_URL}/tags/sheet?layout=${c.layout}&start=${c.start}&ids=${ids}`);
      } finally {
        await testDb("items").where({ id: unrated.id }).update({ wll_lb: before.wll_lb });
      }
      await page.evaluate(() => document.fonts.ready);
      await page.screenshot({ path: `${SCREENSHOT_DIR}/tag-sheet-${c.layout}.png`, fullPage: true });
      const unratedLabel = page.locator(`[data-tag-code="${unrated.tagCode}"]`);
      expect(await unratedLabel.textContent()).toContain("No WLL: do not use");
      await unratedLabel.screenshot({ path: `${SCREENSHOT_DIR}/tag-label-no-wll-${c.layout}.png` });
      // Nothing printed on a label runs past its edge.
      const overflowing = await page.evaluate(() =>
        [...document.querySelectorAll<HTMLElement>(".tag-cell, .tag-cell *")]
          .filter((el) => el.scrollWidth > el.clientWidth + 1 || el.scrollHeight > el.clientHeight + 1)
          .filter((el) => el.clientWidth > 0)
          .map((el) => `${el.closest<HTMLElement>(".tag-cell")!.dataset.tagCode} ${el.className}`),
      );
      expect(overflowing).toEqual([]);

      const sheets = page.locator("section.tag-sheet");
      const per = labelsPerSheet(sheetLayout(c.layout));
      const expectedSheets = Math.ceil((c.count + c.start - 1) / per);
      expect(await sheets.count()).toBe(expectedSheets);

      const decoded: string[] = [];
      let slot = 0;
      for (let s = 0; s < expectedSheets; s++) {
        const png = await sheets.nth(s).screenshot({ path: `${SCREENSHOT_DIR}/tag-sheet-${c.layout}-sheet-${s + 1}.png` });
        const found = decodeSheet(png, c.layout);
        found.forEach((text, position) => {
          const used = slot >= c.start - 1 && slot < c.start - 1 + c.count;
          if (used) expect(text, `sheet ${s + 1}, label ${position + 1}`).not.toBeNull();
          else expect(text, `sheet ${s + 1}, label ${position + 1} is blank`).toBeNull();
          if (text) decoded.push(text);
          slot++;
        });
      }
      const expected = wanted.map((i) => `${APP_URL}/t/${i.tagCode}`);
      expect([...decoded].sort()).toEqual([...expected].sort());

      // Each decoded address opens its own item for a signed-in member.
      for (const url of decoded) {
        const res = await page.request.get(url, { maxRedirects: 0 });
        expect(res.status()).toBe(307);
        const item = wanted.find((i) => url.endsWith(`/t/${i.tagCode}`))!;
        expect(res.headers()["location"]).toBe(`/items/${item.id}`);
      }
    });
  }

  it("lets a person tick items when no ids are given, then makes their sheet", async () => {
    await page.goto(`${BASE_URL}/tags/sheet?layout=small-30`);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/tag-sheet-picker.png` });
    const boxes = page.getByRole("checkbox");
    const [{ count }] = await testDb("items").where({ organisation_id: demoOrgId }).count<{ count: string }[]>("* as count");
    expect(await boxes.count()).toBe(Number(count));
    await boxes.nth(2).check();
    await boxes.nth(5).check();
    await page.getByRole("button", { name: "Make the tag sheet" }).last().click();
    await page.waitForURL(/\/tags\/sheet\?layout=small-30&ids=/);
    expect(await page.locator(".tag-cell").count()).toBe(2);
    expect(await page.getByRole("status").textContent()).toBe("2 tags on 1 sheet of 2⅝ in × 1 in labels.");
  });

  it("prints one sheet per US Letter page, without the toolbar", async () => {
    const ids = items.slice(0, 12).map((i) => i.id).join(",");
    await page.goto(`${BASE_URL}/tags/sheet?layout=large-10&ids=${ids}`);
    await page.emulateMedia({ media: "print" });
    expect(await page.locator(".tag-toolbar").isVisible()).toBe(false);
    await page.screenshot({ path: `${SCREENSHOT_DIR}/tag-sheet-large-10-print-media.png`, fullPage: true });
    const pdf = (await page.pdf({ preferCSSPageSize: true, printBackground: true })).toString("latin1");
    await page.emulateMedia({ media: "screen" });
    const pages = pdf.match(/\/Type\s*\/Page[^s]/g) ?? [];
    expect(pages.length).toBe(2);
    expect(pdf).toMatch(/\/MediaBox\s*\[\s*0 0 612 792\s*\]/); // 8.5 in × 11 in in points
  });
});

describe("scanning with the phone's camera", () => {
  it("reads a tag from the camera and opens the item", async () => {
    const item = items.find((i) => i.status === "in_service")!;
    const video = path.join(work, "qr.y4m");
    // A wide white margin, so that in the 640 × 480 frame the tag sits inside the scan box
    // the way a person holds it, rather than filling the whole picture.
    await writeQrVideo(video, `${APP_URL}/t/${item.tagCode}`, { size: 480, margin: 10 });
    const phone = await openBrowser({
      phone: true,
      extraArgs: ["--use-fake-ui-for-media-stream", "--use-fake-device-for-media-stream", `--use-file-for-fake-video-capture=${video}`],
    });
    try {
      const page = await phone.context.newPage();
      const logs: string[] = [];
      page.on("console", (m) => logs.push(`${m.type()}: ${m.text()}`));
      page.on("pageerror", (e) => logs.push(`pageerror: ${e.message}`));
      await countDecoderFrames(page);
      await signIn(page, "yara");
      const opened = Date.now();
      await page.goto(`${BASE_URL}/scan`);
      const cameraOn = page.waitForSelector('[data-camera="scanning"]', { timeout: 30_000 }).then(() => Date.now(), () => null);
      try {
        await page.waitForURL(`${BASE_URL}/items/${item.id}`, { timeout: 30_000 }); // slow only on a loaded machine
      } catch (error) {
        await page.screenshot({ path: `${SCREENSHOT_DIR}/scan-camera-failed-phone.png` });
        const report = await cameraReport(page, SCREENSHOT_DIR, "scan-camera-failed");
        const result = await page.locator("#scan-result").textContent({ timeout: 1000 }).catch(() => null);
        throw new Error(`The camera scan did not open the item within 30 s: ${report}; scan result: ${result}; browser: ${logs.join(" | ") || "nothing logged"}`, { cause: error });
      }
      const done = Date.now();
      const on = await cameraOn;
      console.log(`[tags e2e] camera scan: /scan opened to /items/${item.id} in ${done - opened} ms; camera running to item page ${on ? `${done - on} ms` : "not observed"}`);
    } finally {
      await phone.close();
    }
  });

  it("shows the camera running on the scan page", async () => {
    const video = path.join(work, "other.y4m");
    await writeQrVideo(video, "https://example.com/not-a-tag", { size: 360, margin: 4 });
    const phone = await openBrowser({
      phone: true,
      extraArgs: ["--use-fake-ui-for-media-stream", "--use-fake-device-for-media-stream", `--use-file-for-fake-video-capture=${video}`],
    });
    try {
      const page = await phone.context.newPage();
      await signIn(page, "yara");
      await page.goto(`${BASE_URL}/scan`);
      await expect.poll(() => page.locator("#scan-result").textContent(), { timeout: 15_000 }).toContain("This QR code is not a Linkyard tag.");
      expect(page.url()).toBe(`${BASE_URL}/scan`);
      await page.screenshot({ path: `${SCREENSHOT_DIR}/scan-camera-phone.png` });
      // Leaving the page (a client-side navigation, the same window) stops the camera.
      const live = () => page.evaluate(() => (window as unknown as { __tracks: MediaStreamTrack[] }).__tracks.map((t) => t.readyState));
      await page.evaluate(() => {
        const stream = document.querySelector("video")!.srcObject as MediaStream;
        (window as unknown as { __tracks: MediaStreamTrack[] }).__tracks = stream.getTracks();
      });
      expect(await live()).toEqual(["live"]);
      await page.getByRole("link", { name: "Stock" }).last().click();
      await page.waitForURL(`${BASE_URL}/stock`);
      await expect.poll(live).toEqual(["ended"]);
    } finally {
      await phone.close();
    }
  });
});

describe("scanning with a browser that has its own barcode detector", () => {
  it("reads the tag through BarcodeDetector and never downloads html5-qrcode", async () => {
    // Debian's Chromium has no BarcodeDetector (Android's and recent Safari do): the page gets
    // a stand-in that reads like the real one, answering the tag's URL once the camera's
    // video has a frame. The camera itself is Chromium's fake device, as above.
    const item = items.find((i) => i.status === "in_service")!;
    const video = path.join(work, "native.y4m");
    await writeQrVideo(video, `${APP_URL}/t/${item.tagCode}`, { size: 480, margin: 10 });
    const phone = await openBrowser({
      phone: true,
      extraArgs: ["--use-fake-ui-for-media-stream", "--use-fake-device-for-media-stream", `--use-file-for-fake-video-capture=${video}`],
    });
    try {
      const page = await phone.context.newPage();
      await page.addInitScript((text: string) => {
        const w = window as unknown as { BarcodeDetector: unknown; __detected: number };
        w.__detected = 0;
        w.BarcodeDetector = class {
          static async getSupportedFormats() {
            return ["qr_code", "ean_13"];
          }
          constructor(options: { formats: string[] }) {
            if (!options.formats.includes("qr_code")) throw new TypeError("qr_code expected");
          }
          async detect(source: HTMLVideoElement) {
            if (!(source instanceof HTMLVideoElement) || source.videoWidth === 0) return [];
            w.__detected++;
            return [{ rawValue: text, format: "qr_code" }];
          }
        };
      }, `${APP_URL}/t/${item.tagCode}`);
      const libraryLoaded: string[] = [];
      page.on("response", async (res) => {
        if (res.request().resourceType() !== "script") return;
        const body = await res.text().catch(() => "");
        if (body.includes("html5-qrcode")) libraryLoaded.push(res.url());
      });
      await signIn(page, "yara");
      await page.goto(`${BASE_URL}/scan`);
      await page.waitForURL(`${BASE_URL}/items/${item.id}`, { timeout: 30_000 });
      expect(await page.evaluate(() => (window as unknown as { __detected: number }).__detected)).toBeGreaterThan(0);
      expect(libraryLoaded).toEqual([]);
    } finally {
      await phone.close();
    }
  });
});

describe("typing a code on the scan page", () => {
  let phone: OpenBrowser;
  beforeAll(async () => {
    phone = await openBrowser({ phone: true }); // no camera at all
  });
  afterAll(async () => phone?.close());

  it("says the camera is missing, explains a wrong code in words, and opens the item for a right one", async () => {
    const page = await phone.context.newPage();
    await signIn(page, "yara");
    await page.goto(`${BASE_URL}/scan`);
    await expect.poll(() => page.locator("#camera-status").textContent(), { timeout: 10_000 }).toMatch(/type the code/i);
    expect(await page.getByRole("button", { name: "Start camera" }).isVisible()).toBe(true);

    const box = page.getByLabel("Tag code");
    expect(await box.getAttribute("autocapitalize")).toBe("characters");
    expect(await box.getAttribute("inputmode")).toBe("text");
    expect((await box.boundingBox())!.height).toBeGreaterThanOrEqual(48);
    const open = page.getByRole("button", { name: "Open item" });
    expect((await open.boundingBox())!.height).toBeGreaterThanOrEqual(48);

    await box.fill("k7xm-3hq0");
    await open.click();
    await expect.poll(() => page.locator("#tag-code-error").textContent()).toBe("Tag codes never use 0. Check the code on the tag again.");
    expect(await box.getAttribute("aria-invalid")).toBe("true");
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.screenshot({ path: `${SCREENSHOT_DIR}/scan-manual-error-phone.png`, fullPage: true });

    await box.fill("K7XM 3HQ");
    await open.click();
    await expect.poll(() => page.locator("#tag-code-error").textContent()).toBe("A tag code has 8 characters, like K7XM-3HQA; this has 7.");

    // A well-formed code that names nothing in this company.
    let unknown = "XXXX-XXXX";
    while (items.some((i) => i.tagCode === unknown)) unknown = "YYYY-YYYY";
    await box.fill(unknown);
    await open.click();
    await expect.poll(() => page.locator("#scan-result").textContent()).toContain(`No item in your company has the tag code ${unknown}.`);
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.screenshot({ path: `${SCREENSHOT_DIR}/scan-manual-unknown-phone.png`, fullPage: true });

    const item = items[7];
    await box.fill(item.tagCode.toLowerCase().replace("-", " "));
    await open.click();
    await page.waitForURL(`${BASE_URL}/items/${item.id}`, { timeout: 10_000 });
    await page.close();
  });
});

describe("the public tag view", () => {
  it("shows a stranger the item's summary on a phone", async () => {
    await testDb("organisations").where({ id: demoOrgId }).update({ public_tag_view: true });
    const phone = await openBrowser({ phone: true });
    try {
      const page = await phone.context.newPage();
      const inService = items.find((i) => i.status === "in_service" && i.kind === "chain")!;
      await testDb("items").where({ id: inService.id }).update({ last_inspected_on: "2026-09-30" });
      const res = await page.goto(`${BASE_URL}/t/${inService.tagCode}`);
      expect(res!.status()).toBe(200);
      expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Chain");
      expect(await page.locator("body").textContent()).toContain("September 30, 2026");
      await page.screenshot({ path: `${SCREENSHOT_DIR}/public-tag-view-phone.png`, fullPage: true });

      const taggedOut = items.find((i) => i.status === "tagged_out")!;
      await page.goto(`${BASE_URL}/t/${taggedOut.tagCode}`);
      // Only the verdict: "Do not use", its reason and what to do, nothing that says otherwise.
      const verdict = page.locator("[data-verdict]");
      expect(await verdict.getAttribute("data-verdict")).toBe("stop");
      expect(await verdict.textContent()).toContain("Do not use");
      expect(await verdict.textContent()).toContain("Tagged out");
      expect(await page.locator("body").textContent()).not.toMatch(/In service|Use it/);
      await page.screenshot({ path: `${SCREENSHOT_DIR}/public-tag-view-tagged-out-phone.png`, fullPage: true });

      // An unknown code looks to a stranger like another company's private tag: sign in first.
      await page.goto(`${BASE_URL}/t/XXXX-XXXX`);
      expect(page.url()).toBe(`${BASE_URL}/sign-in?next=%2Ft%2FXXXX-XXXX`);
      await page.screenshot({ path: `${SCREENSHOT_DIR}/public-tag-unknown-phone.png`, fullPage: true });
      const malformed = await page.goto(`${BASE_URL}/t/not-a-code`);
      expect(malformed!.status()).toBe(404);
    } finally {
      await phone.close();
      await testDb("organisations").where({ id: demoOrgId }).update({ public_tag_view: false });
    }
  });
});
