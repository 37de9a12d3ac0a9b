import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { chromium, type BrowserContext } from "playwright-core";

// Debian's Chromium, never a downloaded browser. The flags keep it off the network.
export const CHROMIUM_ARGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export interface OpenBrowser {
  context: BrowserContext;
  close: () => Promise<void>;
}

/**
 * A fresh profile each time; `phone` gives a 390x844 touch viewport; `scale` is the device
 * pixel ratio; `timezoneId` the browser's own time zone (an IANA name).
 */
export async function openBrowser(options: { phone?: boolean; extraArgs?: string[]; scale?: number; timezoneId?: string } = {}): Promise<OpenBrowser> {
  const dir = mkdtempSync(path.join(tmpdir(), "linkyard-chromium-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: [...CHROMIUM_ARGS, ...(options.extraArgs ?? [])],
    viewport: options.phone ? { width: 390, height: 844 } : { width: 1280, height: 860 },
    deviceScaleFactor: options.scale ?? 1,
    hasTouch: options.phone ?? false,
    isMobile: options.phone ?? false,
    ...(options.timezoneId && { timezoneId: options.timezoneId }),
  });
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export const SCREENSHOT_DIR = path.resolve(__dirname, "../screenshots");
