"use client";
import { useEffect, useRef, useState } from "react";
import { buttonClass } from "@/components/ui/button";
import { CAMERA_MESSAGES, cameraProblem, type CameraProblem } from "@/lib/tags/camera";
import { hasCamera, startCamera, type RunningCamera } from "./camera-engines";

const REGION_ID = "tag-camera";

type CameraState = { on: "starting" } | { on: "scanning" } | { on: "stopped" } | { on: "failed"; problem: CameraProblem };

/**
 * The rear camera, reading QR codes ten times a second: with the browser's own barcode
 * detector where it has one, else with html5-qrcode, loaded only when a camera starts
 * (components/scan/camera-engines.ts). The camera stops when this leaves the screen, and
 * through `stopRef` before the page navigates away.
 */
export function CameraScanner({
  onText,
  stopRef,
}: {
  onText: (text: string) => void;
  stopRef: React.RefObject<(() => Promise<void>) | null>;
}) {
  const [camera, setCamera] = useState<CameraState>({ on: "starting" });
  const [run, setRun] = useState(0);
  // The camera calls the latest onText without restarting when the parent renders again.
  const onTextRef = useRef(onText);
  useEffect(() => {
    onTextRef.current = onText;
  }, [onText]);

  useEffect(() => {
    if (run < 0) return;
    let cancelled = false;
    let running: RunningCamera | null = null;

    const stop = async () => {
      cancelled = true;
      const r = running;
      running = null;
      await r?.stop();
    };
    stopRef.current = stop;

    (async () => {
      if (!window.isSecureContext) return setCamera({ on: "failed", problem: "insecure" });
      if (!navigator.mediaDevices?.getUserMedia) return setCamera({ on: "failed", problem: "unsupported" });
      if (!(await hasCamera())) {
        if (!cancelled) setCamera({ on: "failed", problem: "none" });
        return;
      }
      try {
        running = await startCamera(document.getElementById(REGION_ID)!, (text) => onTextRef.current(text), () => cancelled);
        if (running) setCamera({ on: "scanning" });
      } catch (error) {
        if (!cancelled) setCamera({ on: "failed", problem: cameraProblem(error) });
      }
    })();

    return () => {
      void stop();
    };
  }, [run, stopRef]);

  async function toggle() {
    if (camera.on === "scanning" || camera.on === "starting") {
      await stopRef.current?.();
      setCamera({ on: "stopped" });
      setRun(-1);
    } else {
      // One render shows the camera box again before the effect starts the camera in it.
      setCamera({ on: "starting" });
      setRun((r) => Math.abs(r) + 1);
    }
  }

  const words =
    camera.on === "starting"
      ? "Starting the camera…"
      : camera.on === "scanning"
        ? "Point the camera at the QR tag and hold still."
        : camera.on === "stopped"
          ? "The camera is off."
          : CAMERA_MESSAGES[camera.problem];

  return (
    <section aria-labelledby="camera-heading" className="flex flex-col gap-3">
      <h2 id="camera-heading" className="sr-only">Camera</h2>
      {/* The box keeps its place whatever the camera does (starting, off, missing), with its words
          inside: the typed code's field below does not jump under a finger about to tap it. */}
      <div className="relative min-h-64 overflow-hidden rounded-xl border-2 border-ink bg-ink">
        {/* The video keeps its own shape: html5-qrcode maps its scan box from the shown size. */}
        <div id={REGION_ID} className="min-h-64 w-full [&_video]:block [&_video]:w-full" data-camera={camera.on} />
        <p
          id="camera-status"
          role="status"
          aria-live="polite"
          className={
            camera.on === "scanning"
              ? "absolute inset-x-0 bottom-0 bg-ink/85 p-2 text-center text-lg font-bold text-white"
              : "absolute inset-0 flex items-center justify-center p-4 text-center text-xl font-bold text-white"
          }
        >
          <span>
            {camera.on === "failed" && <span aria-hidden="true">⚠ </span>}
            {words}
          </span>
        </p>
      </div>
      <button type="button" onClick={toggle} className={buttonClass("secondary", "w-full")}>
        {camera.on === "scanning" || camera.on === "starting" ? "Stop camera" : "Start camera"}
      </button>
    </section>
  );
}
