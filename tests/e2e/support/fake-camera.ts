import { writeFileSync } from "node:fs";
import path from "node:path";
import type { Page } from "playwright-core";
import { PNG } from "pngjs";
import QRCode from "qrcode";

// A fake camera feed for Chromium (--use-file-for-fake-video-capture), written by the test
// itself: Y4M is a one-line text header and raw YUV 4:2:0 frames, so no video tool is needed.

const WIDTH = 640;
const HEIGHT = 480;

/**
 * Writes a 640 × 480 Y4M video that shows a QR code of `text` centred on white, `seconds`
 * long at 10 frames a second (Chromium loops the file). `size` is the QR picture's largest
 * side in pixels, quiet zone included; `margin` is the quiet zone in modules.
 *
 * The picture moves toward and away from the camera as a hand does, from 70 % of `size` to
 * all of it and back: a code held perfectly still at one scale can be one the decoder never
 * reads (html5-qrcode's ZXing missed a clean tag at one scale, yet read it at 70–85 % of
 * it), and no phone in a hand is that still.
 */
export async function writeQrVideo(file: string, text: string, options: { size: number; margin: number; seconds?: number }) {
  const largest = Math.min(options.size, HEIGHT);
  const count = Math.round((options.seconds ?? 3) * 10);
  const chroma = Buffer.alloc((WIDTH / 2) * (HEIGHT / 2) * 2, 128); // grey: no colour
  const frames: Buffer[] = [];
  for (let k = 0; k < count; k++) {
    const swing = (1 - Math.cos((2 * Math.PI * k) / count)) / 2; // 0 → 1 → 0 over the loop
    const size = Math.round(largest * (1 - 0.3 * swing));
    frames.push(Buffer.from("FRAME\n"), await qrLuma(text, size, options.margin), chroma);
  }
  const header = Buffer.from(`YUV4MPEG2 W${WIDTH} H${HEIGHT} F10:1 Ip A1:1 C420jpeg\n`);
  writeFileSync(file, Buffer.concat([header, ...frames]));
}

/** One frame's luma plane: the QR code of `text`, `size` pixels a side, centred on white. */
async function qrLuma(text: string, size: number, margin: number): Promise<Buffer> {
  const png = PNG.sync.read(await QRCode.toBuffer(text, { errorCorrectionLevel: "Q", margin, width: size }));
  // Luma in the limited range of BT.601 video (16 black … 235 white), as encoders write it.
  const y = Buffer.alloc(WIDTH * HEIGHT, 235);
  const left = Math.floor((WIDTH - png.width) / 2);
  const top = Math.floor((HEIGHT - png.height) / 2);
  for (let row = 0; row < png.height; row++) {
    for (let col = 0; col < png.width; col++) {
      const i = (row * png.width + col) * 4;
      const luminance = (0.299 * png.data[i]! + 0.587 * png.data[i + 1]! + 0.114 * png.data[i + 2]!) / 255;
      y[(top + row) * WIDTH + left + col] = Math.round(16 + 219 * luminance);
    }
  }
  return y;
}

/**
 * Counts the frames the page draws for its QR decoder (every canvas drawImage) and the
 * camera starts (getUserMedia calls), so that a failed camera test can tell a stalled scan
 * loop from one that runs and does not read the code, or a camera started twice. Call
 * before the page loads.
 */
export async function countDecoderFrames(page: Page): Promise<void> {
  await page.addInitScript(() => {
    const w = window as unknown as { __framesDrawn: number; __cameraStarts: number };
    w.__framesDrawn = 0;
    w.__cameraStarts = 0;
    const media = navigator.mediaDevices;
    if (media?.getUserMedia) {
      const getUserMedia = media.getUserMedia.bind(media);
      media.getUserMedia = (constraints?: MediaStreamConstraints) => {
        w.__cameraStarts++;
        return getUserMedia(constraints);
      };
    }
    const draw = CanvasRenderingContext2D.prototype.drawImage as (...args: unknown[]) => void;
    CanvasRenderingContext2D.prototype.drawImage = function (this: CanvasRenderingContext2D, ...args: unknown[]) {
      w.__framesDrawn++;
      return draw.apply(this, args);
    } as typeof CanvasRenderingContext2D.prototype.drawImage;
  });
}

/**
 * What the camera box showed when a camera test failed, in words for the failure message:
 * its status, the video's sizes, the frames drawn in one second (see countDecoderFrames) and
 * each decoder canvas, whose last picture is saved as `${name}-canvas-N.png` in `dir`.
 */
export async function cameraReport(page: Page, dir: string, name: string): Promise<string> {
  const frames = () => page.evaluate(() => (window as unknown as { __framesDrawn?: number }).__framesDrawn ?? null);
  const before = await frames();
  await page.waitForTimeout(1000);
  const after = await frames();
  const state = await page.evaluate(() => ({
    url: location.pathname,
    cameraStarts: (window as unknown as { __cameraStarts?: number }).__cameraStarts ?? null,
    camera: document.querySelector("#camera-status")?.textContent ?? null,
    videos: [...document.querySelectorAll("video")].map((v) => ({ w: v.videoWidth, h: v.videoHeight, cw: v.clientWidth, ch: v.clientHeight, ready: v.readyState, paused: v.paused })),
    canvases: [...document.querySelectorAll("#tag-camera canvas")].map((c) => {
      const canvas = c as HTMLCanvasElement;
      const t = canvas.getContext("2d")!.getTransform();
      return { w: canvas.width, h: canvas.height, transform: [t.a, t.b, t.c, t.d, t.e, t.f], png: canvas.toDataURL("image/png") };
    }),
  }));
  state.canvases.forEach((c, i) => writeFileSync(path.join(dir, `${name}-canvas-${i}.png`), Buffer.from(c.png.split(",")[1]!, "base64")));
  const framesInOneSecond = before === null || after === null ? null : after - before;
  return JSON.stringify({ ...state, framesInOneSecond, canvases: state.canvases.map(({ png: _png, ...c }) => c) });
}
