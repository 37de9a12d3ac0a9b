"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import type { FieldIssue } from "@/lib/field-issues";
import { ApiError, apiJson } from "@/lib/http/client";

/** What a refused save says: its message, and the API's issues by field path (read them with `issueAt`). */
export interface SaveProblem {
  message: string;
  issues: readonly FieldIssue[];
}

/**
 * A screen form that sends its body to the API as JSON and, once saved, opens the saved
 * thing's page. `busy` holds while the request is on its way; a refusal becomes `problem`
 * (`notSaved` when the error says nothing). `refresh` re-reads the server's pages after the
 * move, for a page that shows what was saved.
 */
export function useApiSave(notSaved: string) {
  const router = useRouter();
  const [problem, setProblem] = useState<SaveProblem | null>(null);
  const [busy, setBusy] = useState(false);

  async function save(path: string, method: "POST" | "PUT", body: unknown, then: { to: (id: string) => string; refresh?: boolean }) {
    setBusy(true);
    setProblem(null);
    try {
      const saved = await apiJson<{ id: string }>(path, { method, body: JSON.stringify(body) });
      router.push(then.to(saved.id));
      if (then.refresh) router.refresh();
    } catch (error) {
      setBusy(false);
      setProblem({ message: error instanceof Error ? error.message : notSaved, issues: error instanceof ApiError ? error.issues : [] });
    }
  }

  return { problem, issues: problem?.issues ?? [], busy, save };
}

/** The message of a refused save, announced where the form starts. */
export function SaveAlert({ problem }: { problem: SaveProblem | null }) {
  return (
    <div role="alert" aria-live="polite">
      {problem && <p className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg font-bold text-stop">{problem.message}</p>}
    </div>
  );
}
