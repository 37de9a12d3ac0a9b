// The browser's side of the API v1: one caller for every screen that fetches JSON, so
// refusals read the same everywhere. Client-safe (no server imports).

import type { FieldIssue } from "@/lib/field-issues";

/** A refusal from the API: its status, its sentence, the fields at fault, and the whole answer. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly issues: FieldIssue[] = [],
    readonly nearest: string[] = [],
    readonly code?: string,
    /** The JSON the API answered with its refusal (an import's 422 carries its report), if any. */
    readonly body?: unknown,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

/**
 * Fetches JSON from this site with the session cookie; throws ApiError with the API's own
 * words on a refusal, and a plain sentence when there is no connection. A string body is
 * sent as JSON; a FormData body as multipart (the browser sets its boundary).
 * @example await apiJson<{ moved: number }>("/api/v1/items/move", { method: "POST", body: JSON.stringify(b) })
 * @example await apiJson<ImportBody>("/api/v1/imports", { method: "POST", body: form })
 */
export async function apiJson<T>(path: string, init?: RequestInit): Promise<T> {
  let res: Response;
  const json = typeof init?.body === "string";
  try {
    res = await fetch(path, {
      ...init,
      credentials: "same-origin",
      headers: { accept: "application/json", ...(json ? { "content-type": "application/json" } : {}), ...init?.headers },
    });
  } catch {
    throw new ApiError(0, "No connection to Linkyard. Check the signal and try again.");
  }
  const answer = await res.json().catch(() => undefined);
  if (!res.ok) {
    const message = res.status === 401 ? "Your session has ended. Sign in again." : (answer?.error ?? `The server answered ${res.status}.`);
    throw new ApiError(res.status, message, answer?.issues ?? [], answer?.nearest ?? [], answer?.code, answer);
  }
  return answer as T;
}
