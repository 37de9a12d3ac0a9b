// The two calls the securement screens make to the API v1, with the session cookie.
import type { DefaultRating, SecurementCheckResult } from "@/lib/securement";
import type { PathMessage, RequestBody } from "@/lib/forms/securement-draft";

/** A refusal from the API: its status, its sentence, and the fields at fault. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly issues: PathMessage[] = [],
    readonly nearest: string[] = [],
    readonly code?: string,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

async function call<T>(path: string, init?: RequestInit): Promise<T> {
  let res: Response;
  try {
    res = await fetch(path, { ...init, credentials: "same-origin", headers: { accept: "application/json", ...init?.headers } });
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

/** GET /api/v1/ratings?… */
export function fetchRating(search: string): Promise<DefaultRating> {
  return call<DefaultRating>(`/api/v1/ratings?${search}`);
}

/** POST /api/v1/securement-checks */
export function postCheck(body: RequestBody): Promise<SecurementCheckResult> {
  return call<SecurementCheckResult>("/api/v1/securement-checks", {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
}
