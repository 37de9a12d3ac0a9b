"use client";
import { useCallback, useRef, useState } from "react";
import { CameraScanner } from "@/components/scan/camera-scanner";
import { ManualEntry } from "@/components/scan/manual-entry";
import { apiJson, ApiError } from "@/lib/http/client";
import type { ItemJson } from "@/lib/stock/item-json";
import { codeFromScan } from "@/lib/tags/entry";

/** How long the same code in front of the camera is ignored after it was read. */
const REPEAT_QUIET_MS = 4000;

export type ScanNote = { tone: "ok" | "stop" | "info"; text: string } | null;

const TONE = {
  ok: "border-ok bg-ok-bg text-ink",
  stop: "border-stop bg-stop-bg text-stop",
  info: "border-ink bg-white text-ink",
};

/**
 * The camera and the typed code, one tag after another, for a kit: each code is looked up in
 * the organisation's stock and handed to `onItem`, which says what came of it (`ScanNote`).
 * Stays on the page (unlike the scan screen, which opens the item).
 */
export function TagScanner({ onItem, submitLabel }: { onItem: (item: ItemJson) => Promise<ScanNote>; submitLabel: string }) {
  const stopCamera = useRef<(() => Promise<void>) | null>(null);
  const last = useRef<{ code: string; at: number } | null>(null);
  const busy = useRef(false);
  const [note, setNote] = useState<ScanNote>(null);
  const [working, setWorking] = useState(false);

  const handle = useCallback(
    async (code: string) => {
      if (busy.current) return;
      busy.current = true;
      setWorking(true);
      setNote({ tone: "info", text: `Looking up ${code}…` });
      try {
        const item = await apiJson<ItemJson>(`/api/v1/tags/${encodeURIComponent(code)}`);
        setNote(await onItem(item));
      } catch (error) {
        const message = error instanceof ApiError && error.status === 404 ? `No item in your company has the tag code ${code}.` : error instanceof Error ? error.message : "The lookup failed. Try again.";
        setNote({ tone: "stop", text: message });
      } finally {
        busy.current = false;
        setWorking(false);
      }
    },
    [onItem],
  );

  const onText = useCallback(
    (text: string) => {
      const code = codeFromScan(text);
      if (!code) return setNote({ tone: "stop", text: "This QR code is not a Linkyard tag. Scan the tag on the item, or type its code." });
      const now = Date.now();
      if (last.current && last.current.code === code && now - last.current.at < REPEAT_QUIET_MS) return;
      last.current = { code, at: now };
      void handle(code);
    },
    [handle],
  );

  return (
    <div className="flex flex-col gap-4">
      <CameraScanner onText={onText} stopRef={stopCamera} />
      <p role="status" aria-live="assertive" data-testid="scan-note" className={`min-h-tap rounded-lg border-2 p-3 text-xl font-bold ${note ? TONE[note.tone] : "border-transparent"}`}>
        {note?.text}
      </p>
      <ManualEntry onCode={(code) => void handle(code)} busy={working} submitLabel={submitLabel} busyLabel="Adding…" clearAfter />
    </div>
  );
}
