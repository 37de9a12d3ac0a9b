// Page weight of the scan page and the item page, signed in, on a phone profile:
// - first-load JavaScript: every script the page loads until the network is idle, in Chromium
//   (headless, no camera: what a phone loads before a camera stream exists), each
//   gzip-compressed here (level 6, as the server compresses) and summed;
// - Lighthouse 12.2.3 (its default mobile profile: a mid-range phone, simulated slow 4G and
//   CPU) performance and accessibility scores, on Debian's Chromium (CHROME_PATH), never a
//   downloaded browser.
// Run by bench/run.sh; `--label before|after` only names the figures in the output.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { gzipSync } from "node:zlib";
import { chromium } from "playwright-core";
import { CHROMIUM_ARGS } from "../tests/e2e/support/browser";
import { BASE, benchState, record, signIn } from "./lib";

const CHROME = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const JS_LIMIT_KB = 150;

async function firstLoadJs(cookie: string, pagePath: string): Promise<{ kb: number; scripts: number }> {
  const dir = mkdtempSync(path.join(tmpdir(), "linkyard-bench-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: CHROME,
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: { width: 390, height: 844 },
    isMobile: true,
    hasTouch: true,
  });
  try {
    const [name, value] = cookie.split("=") as [string, string];
    await context.addCookies([{ name, value, url: BASE }]);
    const page = await context.newPage();
    const bodies: Promise<Buffer | null>[] = [];
    page.on("response", (res) => {
      if (res.request().resourceType() === "script") bodies.push(res.body().catch(() => null));
    });
    const res = await page.goto(BASE + pagePath, { waitUntil: "networkidle" });
    if (res?.status() !== 200) throw new Error(`${pagePath}: ${res?.status()}`);
    const all = (await Promise.all(bodies)).filter((b): b is Buffer => b !== null);
    const bytes = all.reduce((sum, b) => sum + gzipSync(b, { level: 6 }).length, 0);
    return { kb: bytes / 1024, scripts: all.length };
  } finally {
    await context.close();
    rmSync(dir, { recursive: true, force: true });
  }
}

async function lighthouseScores(cookie: string, pagePath: string): Promise<{ performance: number; accessibility: number }> {
  process.env.CHROME_PATH = CHROME;
  const { launch } = await import("chrome-launcher");
  const lighthouse = (await import("lighthouse")).default;
  const chrome = await launch({ chromePath: CHROME, chromeFlags: ["--headless=new", ...CHROMIUM_ARGS] });
  try {
    const result = await lighthouse(BASE + pagePath, {
      port: chrome.port,
      output: "json",
      logLevel: "error",
      onlyCategories: ["performance", "accessibility"],
      extraHeaders: { Cookie: cookie },
    });
    const c = result!.lhr.categories;
    const failed = result!.lhr.runtimeError;
    if (failed) throw new Error(`lighthouse: ${failed.code} ${failed.message}`);
    return { performance: Math.round((c.performance!.score ?? 0) * 100), accessibility: Math.round((c.accessibility!.score ?? 0) * 100) };
  } finally {
    await chrome.kill();
  }
}

async function main() {
  const label = process.argv.includes("--label") ? process.argv[process.argv.indexOf("--label") + 1] : "";
  const state = benchState();
  const cookie = await signIn(state.email, state.password);
  const pages: [string, string][] = [
    ["scan page", "/scan"],
    ["item page", `/items/${state.itemIds[0]}`],
  ];
  for (const [name, pagePath] of pages) {
    const js = await firstLoadJs(cookie, pagePath);
    console.log(`${label ? `${label}: ` : ""}${name} (${pagePath.replace(/[0-9a-f-]{36}/, "{id}")}): first-load JavaScript ${js.kb.toFixed(1)} KB gzip in ${js.scripts} scripts`);
    const lh = await lighthouseScores(cookie, pagePath);
    console.log(`${label ? `${label}: ` : ""}${name}: Lighthouse mobile performance ${lh.performance}, accessibility ${lh.accessibility}`);
    if (process.argv.includes("--record")) {
      record([
        { what: `${name}: first-load JavaScript (gzip)`, figure: `${js.kb.toFixed(1)} KB (${js.scripts} scripts)`, target: `≤ ${JS_LIMIT_KB} KB`, baseline: "—", met: js.kb <= JS_LIMIT_KB },
        { what: `${name}: Lighthouse mobile performance / accessibility`, figure: `${lh.performance} / ${lh.accessibility}`, target: "≥ 90 / ≥ 95", baseline: "—", met: lh.performance >= 90 && lh.accessibility >= 95 },
      ]);
    }
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
