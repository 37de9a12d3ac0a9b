// Tag sheet of 1,000 labels to a print-ready page: the bench organisation's items on sheets
// (app/(print)/tags/sheet), loaded in Chromium until the page, its QR codes and its fonts are
// ready. One request takes at most MAX_SHEET_ITEMS ids (the ids travel in the URL), so 1,000
// labels are that many requests, one after another; the figure is their sum. Run by bench/run.sh.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { chromium } from "playwright-core";
import { MAX_SHEET_ITEMS } from "../lib/tags/sheet";
import { BASE, benchState, record, signIn } from "./lib";
import { CHROMIUM_ARGS } from "../tests/e2e/support/browser";

const LABELS = 1000;
const TARGET_S = 5;

async function main() {
  const state = benchState();
  const cookie = await signIn(state.email, state.password);
  const dir = mkdtempSync(path.join(tmpdir(), "linkyard-bench-"));
  const context = await chromium.launchPersistentContext(dir, { executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", headless: true, args: CHROMIUM_ARGS });
  try {
    const [name, value] = cookie.split("=") as [string, string];
    await context.addCookies([{ name, value, url: BASE }]);
    const page = await context.newPage();
    const ids = state.itemIds.slice(0, LABELS);
    const open = async (chunk: string[]) => {
      const t0 = performance.now();
      const res = await page.goto(`${BASE}/tags/sheet?ids=${chunk.join(",")}`, { waitUntil: "load" });
      if (res?.status() !== 200) throw new Error(`tag sheet: ${res?.status()}`);
      await page.evaluate(() => document.fonts.ready.then(() => undefined));
      const labels = await page.locator(".tag__qr").count();
      return { ms: performance.now() - t0, labels };
    };
    await open(ids.slice(0, 20)); // warm-up
    let total = 0;
    let labels = 0;
    const requests: string[] = [];
    for (let i = 0; i < ids.length; i += MAX_SHEET_ITEMS) {
      const r = await open(ids.slice(i, i + MAX_SHEET_ITEMS));
      total += r.ms;
      labels += r.labels;
      requests.push(`${r.labels} in ${(r.ms / 1000).toFixed(2)} s`);
    }
    console.log(`tag sheet: ${labels} labels in ${requests.length} requests (${requests.join("; ")}): ${(total / 1000).toFixed(2)} s in all`);
    if (labels !== LABELS) throw new Error(`expected ${LABELS} labels, counted ${labels}`);
    record([{ what: `tag sheet, ${LABELS.toLocaleString("en-US")} labels to print-ready pages`, figure: `${(total / 1000).toFixed(2)} s (${requests.length} requests of ≤ ${MAX_SHEET_ITEMS})`, target: `< ${TARGET_S} s`, baseline: "—", met: total / 1000 < TARGET_S }]);
  } finally {
    await context.close();
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
