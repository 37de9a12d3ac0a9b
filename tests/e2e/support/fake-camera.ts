import { writeFileSync } from "node:fs";
import { PNG } from "pngjs";
import QRCode from "qrcode";

// A fake camera feed for Chromium (--use-file-for-fake-video-capture), written by the test
// itself: Y4M is a one-line text header and raw YUV 4:2:0 frames, so no video tool is needed.

const WIDTH = 640;
const HEIGHT = 480;

/**
 * Writes a 640 × 480 Y4M video that shows a QR code of `text` centred on white, `seconds`
 * long at 10 frames a second (Chromium loops the file). `size` is the QR picture's side in
 * pixels, quiet zone included; `margin` is the quiet zone in modules.
 */
export async function writeQrVideo(file: string, text: string, options: { size: number; margin: number; seconds?: number }) {
  const size = Math.min(options.size, HEIGHT);
  const png = PNG.sync.read(await QRCode.toBuffer(text, { errorCorrectionLevel: "Q", margin: options.margin, width: size }));
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
  const chroma = Buffer.alloc((WIDTH / 2) * (HEIGHT / 2) * 2, 128); // grey: no colour
  const frame = Buffer.concat([Buffer.from("FRAME\n"), y, chroma]);
  const frames = Math.round((options.seconds ?? 3) * 10);
  const header = Buffer.from(`YUV4MPEG2 W${WIDTH} H${HEIGHT} F10:1 Ip A1:1 C420jpeg\n`);
  writeFileSync(file, Buffer.concat([header, ...Array.from({ length: frames }, () => frame)]));
}
