"use client";
import { buttonClass } from "@/components/ui/button-class";

/**
 * A page that failed while rendering: most often the database went away mid-page (proxy.ts
 * answers a plain 503 before a page starts when it is already gone). The words say what to
 * do; the cause is in the server's log.
 */
export default function PageError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="mx-auto flex max-w-md flex-col gap-4 px-4 py-8">
      <h1 className="text-3xl font-bold">This page could not be shown</h1>
      <p className="text-lg">
        Linkyard could not finish this page, perhaps because it cannot reach its database just now. Wait a minute and
        try again; if you were saving something, check afterwards that it was saved.
      </p>
      <button type="button" onClick={reset} className={buttonClass("primary")}>
        Try again
      </button>
    </main>
  );
}
