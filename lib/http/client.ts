// The browser's side of the API v1: one caller for every screen that fetches JSON, so
// refusals read the same everywhere. Client-safe (no server imports).

import type { FieldIssue } from "@/lib/field-issues";

/** A refusal from the API: its status, its sentence, and the fields at fault. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly issues: FieldIssue[] = [],
    readonly nearest: string[] = [],
    readonly code?: string,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

/**
 * Fetches JSON from this site with the session cookie; throws ApiError with the API's own
 * words on a refusal, and a plain sentence when there is no connection.
 * @example await apiJson<{ moved: number }>("/api/v1/items/move", { method: "POST", body: JSON.stringify(b) })
 */
export async function apiJson<T>(path: string, init?: RequestInit): Promise<T> {
  let res: Response;
  try {
    res = await fetch(path, {
      ...init,
      credentials: "same-origin",
      headers: { accept: "application/json", ...(init?.body ? { "content-type": "application/json" } : {}), ...init?.headers },
    });
  } catch {
    throw new ApiError(0, "No connection to Linkyard. Check the signal and try again.");
  }
  const json = await res.json().catch(() => undefined);
  if (!res.ok) {
    const message = res.status === 401 ? "Your session has ended. Sign in again." : (json?.error ?? `The server answered ${res.status}.`);
    throw new ApiError(res.status, message, json?.issues ?? [], json?.nearest ?? [], json?.code);
  }
  return json as T;
}
