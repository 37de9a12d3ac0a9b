import jsQR from "jsqr";
import QRCode from "qrcode";
import { describe, expect, it } from "vitest";
import { config } from "@/lib/config";
import { qrSvg, qrSymbol, QR_QUIET_ZONE, TAG_QR_LEVEL, tagQrSvg, tagUrl } from "@/lib/tags/qr";
import { newTagCode } from "@/lib/tags/code";

const SCALE = 4; // pixels per module when drawing the SVG path for the decoder

/** Draws an SVG of ours into RGBA pixels from its path data (black rectangles on white). */
function rasterise(svg: string, smudge?: { x: number; y: number; w: number; h: number }) {
  const size = Number(svg.match(/viewBox="0 0 (\d+) \1"/)![1]);
  const width = size * SCALE;
  const pixels = new Uint8ClampedArray(width * width * 4).fill(255);
  const d = svg.match(/<path fill="#000" d="([^"]*)"/)![1];
  const paint = (x: number, y: number, w: number, h: number, value: number) => {
    for (let py = y * SCALE; py < (y + h) * SCALE; py++)
      for (let px = x * SCALE; px < (x + w) * SCALE; px++) {
        const i = (py * width + px) * 4;
        pixels[i] = pixels[i + 1] = pixels[i + 2] = value;
      }
  };
  let rects = 0;
  for (const m of d.matchAll(/M(\d+) (\d+)h(\d+)v1h-\3z/g)) {
    paint(Number(m[1]), Number(m[2]), Number(m[3]), 1, 0);
    rects++;
  }
  expect(rects).toBeGreaterThan(0);
  // Every command in the path is one of our rectangles (nothing left unparsed).
  expect(d.replace(/M(\d+) (\d+)h(\d+)v1h-\3z/g, "")).toBe("");
  if (smudge) paint(smudge.x, smudge.y, smudge.w, smudge.h, 255);
  return { pixels, width, size };
}

function decode(svg: string, smudge?: { x: number; y: number; w: number; h: number }) {
  const { pixels, width } = rasterise(svg, smudge);
  return jsQR(pixels, width, width)?.data ?? null;
}

describe("tag URL", () => {
  it("is the app's address, /t/ and the code", () => {
    expect(tagUrl("K7XM-3HQA", "https://yard.example.com")).toBe("https://yard.example.com/t/K7XM-3HQA");
    expect(tagUrl("K7XM-3HQA", "https://yard.example.com///")).toBe("https://yard.example.com/t/K7XM-3HQA");
    expect(tagUrl("K7XM-3HQA", "https://example.com/linkyard/")).toBe("https://example.com/linkyard/t/K7XM-3HQA");
  });

  it("uses APP_URL by default", () => {
    expect(tagUrl("K7XM-3HQA")).toBe(`${config.APP_URL.replace(/\/$/, "")}/t/K7XM-3HQA`);
  });
});

describe("QR symbol", () => {
  it("uses error correction level Q, for scuffed outdoor labels", () => {
    expect(TAG_QR_LEVEL).toBe("Q");
    // The same text at level Q matches the library's own symbol at Q, module for module.
    const ours = qrSymbol("https://yard.example.com/t/K7XM-3HQA");
    const reference = QRCode.create("https://yard.example.com/t/K7XM-3HQA", { errorCorrectionLevel: "Q" });
    expect(ours.version).toBe(reference.version);
    expect(ours.size).toBe(reference.modules.size + 2 * QR_QUIET_ZONE);
  });

  it("keeps tag URLs small: version 4 or lower (33 modules) for an address up to 46 characters", () => {
    for (const base of ["http://127.0.0.1:3000", "https://linkyard.example.com", "https://gear.corvid-hollow.example"]) {
      const url = tagUrl(newTagCode(), base);
      expect(url.length).toBeLessThanOrEqual(46);
      expect(qrSymbol(url).version).toBeLessThanOrEqual(4);
    }
  });

  it("is pure: the same text gives the same SVG", () => {
    expect(qrSvg("https://a.example/t/K7XM-3HQA")).toBe(qrSvg("https://a.example/t/K7XM-3HQA"));
    expect(qrSvg("https://a.example/t/K7XM-3HQA")).not.toBe(qrSvg("https://a.example/t/K7XM-3HQC"));
  });

  it("is a scalable SVG with a white background and a quiet zone of 4 modules", () => {
    const svg = tagQrSvg("K7XM-3HQA", "https://yard.example.com");
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www.w3.org\/2000\/svg" viewBox="0 0 (\d+) \1" shape-rendering="crispEdges">/);
    expect(svg.slice(0, svg.indexOf(">"))).not.toContain("width="); // sized by its container
    expect(svg).toContain("<title>QR tag K7XM-3HQA</title>");
    expect(svg).toContain('<rect width="');
    const { path, size } = qrSymbol("https://yard.example.com/t/K7XM-3HQA");
    const xs = [...path.matchAll(/M(\d+) (\d+)h(\d+)/g)].flatMap((m) => [Number(m[1]), Number(m[1]) + Number(m[3])]);
    const ys = [...path.matchAll(/M(\d+) (\d+)/g)].map((m) => Number(m[2]));
    expect(Math.min(...xs)).toBe(QR_QUIET_ZONE);
    expect(Math.max(...xs)).toBe(size - QR_QUIET_ZONE);
    expect(Math.min(...ys)).toBe(QR_QUIET_ZONE);
    expect(Math.max(...ys)).toBe(size - QR_QUIET_ZONE - 1);
  });

  it("escapes the title", () => {
    expect(qrSvg("x", { title: `<a & "b">` })).toContain("<title>&lt;a &amp; &quot;b&quot;&gt;</title>");
  });
});

describe("read back by an independent decoder (jsQR)", () => {
  it("decodes to the tag URL, for many codes and addresses", () => {
    for (let i = 0; i < 25; i++) {
      const code = newTagCode();
      const base = i % 2 ? "http://127.0.0.1:3300" : "https://linkyard.example.com";
      expect(decode(tagQrSvg(code, base))).toBe(`${base}/t/${code}`);
    }
  });

  it("still decodes with a smudge over part of the symbol (level Q)", () => {
    const url = "https://linkyard.example.com/t/K7XM-3HQA";
    const svg = tagQrSvg("K7XM-3HQA", "https://linkyard.example.com");
    const { size } = qrSymbol(url);
    const inner = size - 2 * QR_QUIET_ZONE;
    // A 6 × 6 module blot in the data area, away from the three finder patterns:
    // 36 of the 33 × 33 = 1,089 modules, about 3 % of the symbol, crossing several codewords.
    const blot = { x: QR_QUIET_ZONE + inner - 14, y: QR_QUIET_ZONE + 12, w: 6, h: 6 };
    expect(decode(svg, blot)).toBe(url);
  });
});
