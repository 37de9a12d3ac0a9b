import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { createRequire } from "node:module";
import { tmpdir } from "node:os";
import path from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowser, SCREENSHOT_DIR, type OpenBrowser } from "./support/browser";
import { cameraReport, countDecoderFrames, writeQrVideo } from "./support/fake-camera";
import { BASE_URL } from "../support/http";
import { testDb } from "../support/db";
import { itemUsability } from "@/lib/stock/usability";
import type { ItemStatus } from "@/lib/stock/labels";

// The kit builder on a phone, with the demo outfit's kits for tomorrow: the list, a kit
// that passes and one that does not, adding a chain to a tiedown by pointing the camera at
// its tag, loading a kit by scanning, and axe-core on every new page.

const DEMO = { password: "yard-demo-2026", domain: "corvid-hollow.example" };
const APP_URL = process.env.APP_URL ?? BASE_URL;
const AXE = createRequire(import.meta.url).resolve("axe-core/axe.min.js");

let orgId: string;
let passing: { id: string; date: string };
let failing: { id: string; date: string };
let work: string;
let phone: OpenBrowser;
let page: Page;
const pageErrors: string[] = [];

async function signIn(p: Page, who: string) {
  await p.goto(`${BASE_URL}/sign-in`);
  await p.getByLabel("E-mail").fill(`${who}@${DEMO.domain}`);
  await p.getByLabel("Password").fill(DEMO.password);
  await p.getByRole("button", { name: "Sign in" }).click();
  await p.waitForURL(`${BASE_URL}/`);
}

/** A full-page screenshot; the phone's bottom bar is let down to the end so that it hides nothing. */
async function shoot(p: Page, name: string) {
  await p.evaluate(() => window.scrollTo(0, 0));
  const bar = await p.addStyleTag({ content: "nav.fixed { position: static !important; }" });
  await p.screenshot({ path: `${SCREENSHOT_DIR}/${name}.png`, fullPage: true });
  await bar.evaluate((el) => (el as HTMLElement).remove());
}

/** axe-core's violations on the page as it stands, as "rule: target" lines. */
async function axeViolations(p: Page): Promise<string[]> {
  await p.addScriptTag({ path: AXE });
  const result = await p.evaluate(async () => (window as unknown as { axe: { run: (o?: unknown) => Promise<{ violations: { id: string; impact: string; nodes: { target: string[] }[] }[] }> } }).axe.run());
  return result.violations.flatMap((v) => v.nodes.map((n) => `${v.id} (${v.impact}): ${n.target.join(" ")}`));
}

/** Controls a gloved thumb hits, under 48 px high. */
async function smallTargets(p: Page): Promise<string[]> {
  return p.evaluate(() => {
    const out: string[] = [];
    for (const el of document.querySelectorAll<HTMLElement>("main button, main select, main input:not([type=radio]):not([type=checkbox]), main summary, main a.min-h-tap")) {
      const r = el.getBoundingClientRect();
      if (r.width === 0 && r.height === 0) continue;
      if (r.height < 47.5) out.push(`${el.tagName} "${(el.textContent || el.getAttribute("aria-label") || "").trim().slice(0, 40)}" ${Math.round(r.height)}px`);
    }
    return out;
  });
}

beforeAll(async () => {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  work = mkdtempSync(path.join(tmpdir(), "linkyard-kits-"));
  orgId = (await testDb("organisations").where({ name: "Corvid Hollow Groundworks" }).first("id")).id;
  const kits = await testDb("kits").where({ organisation_id: orgId }).select("id", "job", testDb.raw("to_char(date, 'YYYY-MM-DD') as date"));
  passing = kits.find((k) => k.job === "Hollins driveway")!;
  failing = kits.find((k) => k.job === "Brookside culvert")!;
  expect(passing && failing).toBeTruthy();
  phone = await openBrowser({ phone: true });
  page = await phone.context.newPage();
  page.on("pageerror", (e) => pageErrors.push(e.message));
  await signIn(page, "pete");
});

afterAll(async () => {
  await phone?.close();
  await testDb.destroy();
  rmSync(work, { recursive: true, force: true });
});

describe("the planner's screens, on a phone", () => {
  it("lists tomorrow's kits with their state and verdict in words", async () => {
    await page.goto(`${BASE_URL}/kits`);
    const tomorrow = page.getByRole("heading", { name: /^Tomorrow, / });
    await expect.poll(() => tomorrow.count()).toBe(1);
    const good = page.locator(`[data-kit-id="${passing.id}"]`);
    const bad = page.locator(`[data-kit-id="${failing.id}"]`);
    expect(await good.textContent()).toContain("Passes the check");
    expect(await good.textContent()).toContain("Unit 12 mini excavator on Deck 20 tilt");
    expect(await bad.textContent()).toContain("Does not pass");
    expect(await bad.textContent()).toContain("1 part not usable that day");
    expect(await good.textContent()).toContain("Draft");
    expect(await smallTargets(page)).toEqual([]);
    await shoot(page, "kits-list-phone");
    expect(await axeViolations(page)).toEqual([]);
  });

  it("shows a passing kit: the verdict, the figures against the rule, each tiedown's WLL and limit", async () => {
    await page.goto(`${BASE_URL}/kits/${passing.id}`);
    const verdict = page.getByTestId("kit-verdict");
    expect(await verdict.getAttribute("data-pass")).toBe("true");
    expect(await verdict.textContent()).toContain("Passes the check");
    expect(await verdict.textContent()).toMatch(/Aggregate WLL 20,200 lb \([\d,.]+ kg\) of 4,050 lb \([\d,.]+ kg\) needed/);
    const cards = page.getByTestId("tiedown-card");
    expect(await cards.count()).toBe(6);
    expect(await cards.first().getByTestId("limited-by").textContent()).toMatch(/the binder [0-9A-Z]{4}-[0-9A-Z]{4}/);
    expect(await page.locator("#verdict-details").textContent()).toContain("What this covers");
    expect(await page.locator('[data-practice="CORNERS_AND_ACCESSORIES"]').getAttribute("data-met")).toBe("true");
    expect(await smallTargets(page)).toEqual([]);
    await shoot(page, "kit-pass-phone");
    expect(await axeViolations(page)).toEqual([]);
  });

  it("shows a failing kit with the reasons a planner acts on", async () => {
    await page.goto(`${BASE_URL}/kits/${failing.id}`);
    const verdict = page.getByTestId("kit-verdict");
    expect(await verdict.getAttribute("data-pass")).toBe("false");
    const text = (await verdict.textContent()) ?? "";
    expect(text).toContain("Does not pass");
    expect(text).toContain("3 tiedowns on the machine, 4 needed (49 CFR 393.130(c)(1))");
    const details = (await page.locator("#verdict-details").textContent()) ?? "";
    expect(details).toContain("anchor point R3 may not be used");
    expect(details).toContain("nothing holds the bucket");
    expect(await page.getByRole("button", { name: "Mark ready to load" }).isDisabled()).toBe(true);
    await shoot(page, "kit-fail-phone");
    expect(await axeViolations(page)).toEqual([]);
  });

  it("passes axe-core on the other new pages", async () => {
    const machine = await testDb("machines").where({ organisation_id: orgId }).orderBy("name").first("id");
    const trailer = await testDb("trailers").where({ organisation_id: orgId, name: "Gooseneck 25+5" }).first("id");
    for (const [url, name] of [
      ["/kits/new", "kit-new-phone"],
      ["/machines", "machines-phone"],
      [`/machines/${machine.id}`, "machine-phone"],
      ["/trailers", "trailers-phone"],
      [`/trailers/${trailer.id}`, "trailer-phone"],
    ] as const) {
      await page.goto(`${BASE_URL}${url}`);
      await shoot(page, name);
      expect(await axeViolations(page), url).toEqual([]);
    }
    const bent = page.locator('[data-testid="anchor-point"][data-label="R3"]');
    expect(await bent.textContent()).toContain("Out of use");
    expect(await bent.textContent()).toContain("Stake pocket bent");
    expect(await bent.textContent()).toContain("Brookside culvert");
  });
});

describe("the units an owner chooses", () => {
  it("show every figure in metric first, the US figure beside it", async () => {
    const owner = await openBrowser({ phone: true });
    try {
      const p = await owner.context.newPage();
      await signIn(p, "olive");
      await p.goto(`${BASE_URL}/settings`);
      const form = p.locator("form").filter({ has: p.getByRole("heading", { name: "Units shown" }) });
      await form.locator("label", { has: p.getByRole("radio", { name: /Metric/ }) }).click();
      await form.getByRole("button", { name: "Save the units" }).click();
      await expect.poll(() => form.getByRole("status").textContent()).toContain("Metric (kg, m) first");
      await p.goto(`${BASE_URL}/kits/${passing.id}`);
      expect(await p.locator("header").filter({ hasText: "Hollins driveway" }).textContent()).toContain("3,674 kg (8,100 lb) · 4.90 m (16 ft 1 in) long");
      await shoot(p, "kit-pass-metric-phone");
    } finally {
      await testDb("organisations").where({ id: orgId }).update({ units: "us" });
      await owner.close();
    }
  });
});

describe("adding an item by scanning its tag", () => {
  it("puts the chain the camera reads into the tiedown, and the verdict follows", async () => {
    const stock = await testDb("items")
      .where({ organisation_id: orgId, kind: "chain", grade: 70, size: "3/8" })
      .whereNotExists(testDb("kit_items").whereRaw("kit_items.item_id = items.id").where("kit_date", failing.date))
      .orderBy("serial")
      .select("id", "tag_code", "status", "wll_lb", testDb.raw("to_char(next_inspection_due, 'YYYY-MM-DD') as due"));
    const chain = stock.find((i) => itemUsability({ status: i.status as ItemStatus, nextInspectionDue: i.due, wllLb: i.wll_lb }, failing.date).ok)!;
    expect(chain).toBeTruthy();
    const video = path.join(work, "chain.y4m");
    await writeQrVideo(video, `${APP_URL}/t/${chain.tag_code}`, { size: 480, margin: 10 });
    const camera = await openBrowser({ phone: true, extraArgs: ["--use-fake-ui-for-media-stream", "--use-fake-device-for-media-stream", `--use-file-for-fake-video-capture=${video}`] });
    try {
      const p = await camera.context.newPage();
      await countDecoderFrames(p);
      await signIn(p, "pete");
      await p.goto(`${BASE_URL}/kits/${failing.id}`);
      // The missing corner: front right, on R1.
      const form = p.getByRole("form", { name: "Add a tiedown" });
      await form.getByLabel("Anchor point on the trailer").selectOption({ label: await optionLabel(p, "R1") });
      await form.getByLabel("Tie-down point on the machine").selectOption({ value: "front right" });
      await form.getByRole("button", { name: "Add the tiedown, then its items" }).click();
      const card = p.getByTestId("tiedown-card").filter({ hasText: "front right" });
      await expect.poll(() => card.count(), { timeout: 15_000 }).toBe(1);
      try {
        await expect.poll(() => p.getByTestId("scan-note").textContent(), { timeout: 30_000 }).toContain(`Added ${chain.tag_code}`);
      } catch (error) {
        await shoot(p, "kit-scan-failed");
        const note = await p.getByTestId("scan-note").textContent();
        throw new Error(`The camera did not add ${chain.tag_code} within 30 s: ${await cameraReport(p, SCREENSHOT_DIR, "kit-scan-failed")}; note: ${note}`, { cause: error });
      }
      expect(await card.textContent()).toContain(chain.tag_code);
      const rows = await testDb("kit_items").where({ kit_id: failing.id, item_id: chain.id }).count<{ count: string }[]>("id as count");
      expect(Number(rows[0]!.count)).toBe(1);
      // Four tiedowns on the machine now: the count is met; the bent pocket still blocks.
      await expect.poll(() => p.getByTestId("kit-verdict").textContent()).toContain("4 tiedowns on the machine, 4 needed");
      await shoot(p, "kit-scan-phone");
      // The same tag again is not added twice.
      await p.getByLabel("Tag code").fill(chain.tag_code);
      await p.getByRole("button", { name: "Add this item" }).click();
      await expect.poll(() => p.getByTestId("scan-note").textContent()).toContain("already in this kit");
    } finally {
      await camera.close();
    }
  }, 90_000);
});

async function optionLabel(p: Page, anchor: string): Promise<string> {
  const labels = await p.getByLabel("Anchor point on the trailer").locator("option").allTextContents();
  const found = labels.find((l) => l.startsWith(`${anchor} ·`));
  if (!found) throw new Error(`no option for ${anchor} in ${labels.join(" | ")}`);
  return found;
}

describe("loading by scanning", () => {
  it("a planner marks the passing kit ready; the yard hand scans each item on, and a stranger is flagged", async () => {
    await page.goto(`${BASE_URL}/kits/${passing.id}`);
    await page.getByRole("button", { name: "Mark ready to load" }).click();
    await expect.poll(() => page.locator("header").filter({ hasText: "Hollins driveway" }).textContent()).toContain("Ready to load");

    const yard = await openBrowser({ phone: true });
    try {
      const p = await yard.context.newPage();
      await signIn(p, "yara");
      await p.goto(`${BASE_URL}/kits`);
      await p.locator(`[data-kit-id="${passing.id}"]`).getByRole("link", { name: "Load by scanning" }).click();
      await p.waitForURL(`${BASE_URL}/kits/${passing.id}/load`);
      const items = await testDb("kit_items as ki").join("items as i", "i.id", "ki.item_id").where("ki.kit_id", passing.id).select("i.tag_code");
      const stranger = await testDb("items").where({ organisation_id: orgId, status: "in_service" }).whereNotIn("tag_code", items.map((i) => i.tag_code)).first("tag_code");
      const type = async (code: string) => {
        await p.getByLabel("Tag code").fill(code);
        await p.getByRole("button", { name: "This one is on" }).click();
        // The note names the code while it is looked up, then says what came of it.
        await expect.poll(() => p.getByTestId("scan-note").textContent()).toMatch(new RegExp(`^(?!Looking up).*${code}`));
      };
      for (const i of items.slice(0, -1)) await type(i.tag_code);
      await type(stranger.tag_code);
      expect(await p.getByTestId("scan-note").textContent()).toContain("is not in this kit");
      expect(await p.getByTestId("scan-count").textContent()).toContain(`${items.length - 1} of ${items.length} scanned`);
      await shoot(p, "kit-load-phone");
      expect(await axeViolations(p)).toEqual([]);
      // The server refuses a scan that does not match, and the kit stays ready.
      await p.getByRole("button", { name: "Mark the kit loaded" }).click();
      await expect.poll(() => p.getByTestId("load-problem").textContent()).toContain("The scan does not match the kit");
      expect((await testDb("kits").where({ id: passing.id }).first("state")).state).toBe("ready");
      await p.getByRole("button", { name: "Left off: remove" }).click();
      await type(items.at(-1)!.tag_code);
      await p.getByRole("button", { name: "Mark the kit loaded" }).click();
      await p.waitForURL(`${BASE_URL}/kits/${passing.id}`);
      await expect.poll(async () => (await testDb("kits").where({ id: passing.id }).first("state")).state).toBe("loaded");
      await expect.poll(() => p.locator("header").filter({ hasText: "Hollins driveway" }).textContent()).toContain("Loaded");

      // Back in the yard: everything scanned back; a damaged item would be reported here.
      await p.getByRole("link", { name: "Return: scan what came back" }).click();
      await p.waitForURL(`${BASE_URL}/kits/${passing.id}/load`);
      const back = async (code: string) => {
        await p.getByLabel("Tag code").fill(code);
        await p.getByRole("button", { name: "This one is back" }).click();
        await expect.poll(() => p.getByTestId("scan-note").textContent()).toMatch(new RegExp(`^(?!Looking up).*${code}`));
      };
      for (const i of items) await back(i.tag_code);
      const first = p.getByTestId("expected-item").first();
      await first.getByLabel("Damaged: tag it out").check();
      await first.getByLabel("What happened").fill("Hook throat opened");
      await shoot(p, "kit-return-phone");
      expect(await axeViolations(p)).toEqual([]);
      await first.getByLabel("Damaged: tag it out").uncheck(); // a demo item stays in service for the other tests
      await p.getByRole("button", { name: "Mark the kit returned" }).click();
      await p.waitForURL(`${BASE_URL}/kits/${passing.id}`);
      await expect.poll(async () => (await testDb("kits").where({ id: passing.id }).first("state")).state).toBe("returned");
      const events = await testDb("item_events").whereIn("item_id", testDb("kit_items").where({ kit_id: passing.id }).select("item_id")).where({ type: "kit" }).select("outcome");
      expect(events.filter((e) => e.outcome === "returned")).toHaveLength(items.length);
    } finally {
      await yard.close();
    }
  }, 90_000);

  it("raised no page errors", () => {
    expect(pageErrors).toEqual([]);
  });
});
