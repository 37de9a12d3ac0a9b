"use client";
import { useRouter } from "next/navigation";
import { useCallback, useRef, useState } from "react";
import { ApiError, apiJson } from "@/lib/http/client";
import type { ItemJson } from "@/lib/stock/item-json";

/** Where the code came from: the result is shown beside it. */
export type LookupSource = "camera" | "typed";

export type LookupState =
  | { step: "idle" }
  | { step: "looking"; code: string; source: LookupSource }
  | { step: "found"; code: string; source: LookupSource; item: ItemJson }
  | { step: "failed"; code: string | null; source: LookupSource; message: string; unknown: boolean };

/**
 * Asks the server for the item of a tag code and opens its page. One lookup at a time;
 * `before` runs before navigating (the scanner stops the camera there).
 */
export function useTagLookup(before?: () => Promise<void> | void) {
  const router = useRouter();
  const [state, setState] = useState<LookupState>({ step: "idle" });
  const busy = useRef(false);

  const lookUp = useCallback(
    async (code: string, source: LookupSource): Promise<boolean> => {
      if (busy.current) return false;
      busy.current = true;
      setState({ step: "looking", code, source });
      let item: ItemJson;
      try {
        item = await apiJson<ItemJson>(`/api/v1/tags/${encodeURIComponent(code)}`);
      } catch (error) {
        const status = error instanceof ApiError ? error.status : -1;
        const message =
          status === 404
            ? `No item in your company has the tag code ${code}.`
            : status === 401
              ? "Your session has ended. Sign in again, then scan."
              : error instanceof ApiError
                ? error.message
                : "The lookup failed. Try again.";
        setState({ step: "failed", code, source, message, unknown: status === 404 });
        busy.current = false;
        return false;
      }
      setState({ step: "found", code, source, item });
      await before?.();
      router.push(item.url);
      return true;
    },
    [before, router],
  );

  /** Forgets a failed lookup (a new code is being typed): the old error no longer applies. */
  const clear = useCallback(() => {
    if (!busy.current) setState((s) => (s.step === "failed" ? { step: "idle" } : s));
  }, []);

  /** Shows a problem found before asking the server (a QR code that is not a tag). */
  const fail = useCallback((message: string) => {
    if (!busy.current) setState({ step: "failed", code: null, source: "camera", message, unknown: false });
  }, []);

  return { state, lookUp, fail, clear };
}
