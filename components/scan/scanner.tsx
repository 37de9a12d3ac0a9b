"use client";
import Link from "next/link";
import { useCallback, useEffect, useRef } from "react";
import { VerdictBadge } from "@/components/items/verdict";
import { codeFromScan } from "@/lib/tags/entry";
import { CameraScanner } from "./camera-scanner";
import { ManualEntry } from "./manual-entry";
import { useTagLookup, type LookupState } from "./use-tag-lookup";

/** How long a code that did not open is ignored while it stays in front of the camera. */
const REPEAT_QUIET_MS = 3000;

/** The scan screen: the camera, the typed code, and what came of the last lookup. */
export function Scanner() {
  const stopCamera = useRef<(() => Promise<void>) | null>(null);
  const before = useCallback(async () => {
    await stopCamera.current?.();
  }, []);
  const { state, lookUp, fail, clear } = useTagLookup(before);
  const last = useRef<{ text: string; at: number } | null>(null);

  const onText = useCallback(
    (text: string) => {
      const now = Date.now();
      if (last.current && last.current.text === text && now - last.current.at < REPEAT_QUIET_MS) return;
      last.current = { text, at: now };
      const code = codeFromScan(text);
      if (code) void lookUp(code, "camera");
      else fail("This QR code is not a Linkyard tag. Scan the tag on the item, or type its code below.");
    },
    [lookUp, fail],
  );

  return (
    <div className="flex flex-col gap-6">
      <CameraScanner onText={onText} stopRef={stopCamera} />
      {state.step !== "idle" && state.source === "camera" && <LookupResult state={state} />}
      <ManualEntry onCode={(code) => void lookUp(code, "typed")} onTyping={clear} busy={state.step === "looking" || state.step === "found"}>
        {state.step !== "idle" && state.source === "typed" && <LookupResult state={state} />}
      </ManualEntry>
    </div>
  );
}

function LookupResult({ state }: { state: LookupState }) {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    ref.current?.scrollIntoView({ block: "nearest" });
  }, [state]);
  return (
    <div id="scan-result" ref={ref} aria-live="assertive" role="alert" className="scroll-mb-24">
      {state.step === "looking" && (
        <p className="rounded-lg border-2 border-ink p-3 text-xl font-bold">Looking up {state.code}…</p>
      )}
      {state.step === "found" && (
        <div className="flex flex-col gap-2 rounded-lg border-2 border-ink p-3 text-xl text-ink">
          <p className="font-bold">
            Found <span className="whitespace-nowrap font-mono">{state.item.tagCode}</span>: {state.item.description}. Opening…
          </p>
          <span><VerdictBadge usable={state.item.usable} /></span>
        </div>
      )}
      {state.step === "failed" && (
        <div className="flex flex-col gap-1 rounded-lg border-2 border-stop bg-stop-bg p-3 text-xl font-bold text-stop">
          <p>{state.message}</p>
          {state.unknown && (
            <Link href={`/t/${state.code}`} className="inline-flex min-h-tap items-center text-lg underline">
              Check the tag&apos;s public page
            </Link>
          )}
        </div>
      )}
    </div>
  );
}
