// The two ways the scanner reads QR codes from the rear camera, behind one shape:
// - the browser's own BarcodeDetector, where it exists and reads QR codes (Android's Chrome,
//   Safari on recent iPhones): no library to download at all;
// - otherwise html5-qrcode, imported only at this moment (a separate chunk, never part of the
//   scan page's first load).
// Browser-only: called from an effect of components/scan/camera-scanner.tsx.

/** A camera that is reading: stop() releases it (tracks stopped, video removed). */
export interface RunningCamera {
  stop(): Promise<void>;
}

/** What the scanner needs of the Barcode Detection API (not yet in TypeScript's DOM types). */
interface BarcodeDetectorLike {
  detect(source: HTMLVideoElement): Promise<{ rawValue: string }[]>;
}
interface BarcodeDetectorClass {
  new (options: { formats: string[] }): BarcodeDetectorLike;
  getSupportedFormats(): Promise<string[]>;
}

/** How often a frame is handed to the decoder: ten a second, as html5-qrcode is set to. */
const FRAME_MS = 100;

/** The native detector, when the browser has one that reads QR codes; otherwise null. */
async function nativeDetector(): Promise<BarcodeDetectorLike | null> {
  const Detector = (globalThis as { BarcodeDetector?: BarcodeDetectorClass }).BarcodeDetector;
  if (!Detector) return null;
  try {
    if (!(await Detector.getSupportedFormats()).includes("qr_code")) return null;
    return new Detector({ formats: ["qr_code"] });
  } catch {
    return null;
  }
}

/** Whether the device reports any camera at all (no library is loaded for a phone without one). */
export async function hasCamera(): Promise<boolean> {
  try {
    return (await navigator.mediaDevices.enumerateDevices()).some((d) => d.kind === "videoinput");
  } catch {
    return true; // cannot tell: let the camera start say what is wrong
  }
}

async function startNative(detector: BarcodeDetectorLike, region: HTMLElement, onText: (text: string) => void): Promise<RunningCamera> {
  const stream = await navigator.mediaDevices.getUserMedia({ video: { facingMode: "environment" }, audio: false });
  const video = document.createElement("video");
  video.muted = true;
  video.playsInline = true;
  video.srcObject = stream;
  region.replaceChildren(video);
  const release = () => {
    for (const track of stream.getTracks()) track.stop();
    video.remove();
  };
  try {
    await video.play();
  } catch (error) {
    release();
    throw error;
  }
  let busy = false;
  const timer = setInterval(async () => {
    if (busy || video.readyState < HTMLMediaElement.HAVE_CURRENT_DATA) return;
    busy = true;
    try {
      for (const code of await detector.detect(video)) onText(code.rawValue);
    } catch {
      /* a frame that could not be read: the next one will be */
    } finally {
      busy = false;
    }
  }, FRAME_MS);
  return {
    stop: async () => {
      clearInterval(timer);
      release();
    },
  };
}

async function startLibrary(region: HTMLElement, onText: (text: string) => void, cancelled: () => boolean): Promise<RunningCamera | null> {
  const { Html5Qrcode, Html5QrcodeSupportedFormats } = await import("html5-qrcode");
  if (cancelled()) return null;
  const scanner = new Html5Qrcode(region.id, { formatsToSupport: [Html5QrcodeSupportedFormats.QR_CODE], verbose: false });
  const stop = async () => {
    try {
      if (scanner.isScanning) await scanner.stop();
    } catch {
      /* already stopped */
    }
    try {
      scanner.clear();
    } catch {
      /* nothing to clear */
    }
  };
  try {
    // disableFlip: the rear camera never shows a tag mirrored, and without it the library
    // decodes every frame that holds no code twice (once more to try it mirrored).
    await scanner.start({ facingMode: "environment" }, { fps: 10, qrbox: 250, disableFlip: true }, (text) => onText(text), () => {});
  } catch (error) {
    await stop();
    throw error;
  }
  return { stop };
}

/**
 * Starts the rear camera in `region` (an element with an id), reading QR codes into `onText`,
 * with the native detector where there is one, else html5-qrcode. Answers null when
 * `cancelled()` turned true while it started (the camera is then already released).
 * Throws what the camera start threw (see lib/tags/camera.ts for the words).
 */
export async function startCamera(region: HTMLElement, onText: (text: string) => void, cancelled: () => boolean): Promise<RunningCamera | null> {
  const detector = await nativeDetector();
  if (cancelled()) return null;
  const running = detector ? await startNative(detector, region, onText) : await startLibrary(region, onText, cancelled);
  if (running && cancelled()) {
    await running.stop();
    return null;
  }
  return running;
}
