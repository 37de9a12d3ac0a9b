// The calls the securement screens make to the API v1, with the session cookie.
import type { DefaultRating, SavedCheckAnswer, SecurementCheckResult } from "@/lib/securement";
import type { RequestBody } from "@/lib/forms/securement-draft";
import { ApiError, apiJson as call } from "@/lib/http/client";

export { ApiError };

/** GET /api/v1/ratings?… */
export function fetchRating(search: string): Promise<DefaultRating> {
  return call<DefaultRating>(`/api/v1/ratings?${search}`);
}

/** POST /api/v1/securement-checks */
export function postCheck(body: RequestBody): Promise<SecurementCheckResult> {
  return call<SecurementCheckResult>("/api/v1/securement-checks", {
    method: "POST",
    body: JSON.stringify(body),
  });
}

/** One line of the saved checks list (GET /api/v1/securement-checks/saved). */
export interface SavedCheckLine {
  id: string;
  name: string;
  passAtSave: boolean;
  savedBy: string;
  savedAt: string;
  updatedBy: string;
  updatedAt: string;
  mayChange: boolean;
}

/** GET /api/v1/securement-checks/saved */
export async function fetchSavedChecks(): Promise<SavedCheckLine[]> {
  return (await call<{ data: SavedCheckLine[] }>("/api/v1/securement-checks/saved")).data;
}

/** GET /api/v1/securement-checks/saved/{id} */
export function fetchSavedCheck(id: string): Promise<SavedCheckAnswer> {
  return call<SavedCheckAnswer>(`/api/v1/securement-checks/saved/${encodeURIComponent(id)}`);
}

/** POST /api/v1/securement-checks/saved (a new name), or PUT …/saved/{id} (save over it). */
export function saveCheck(input: { id?: string; name: string; request: RequestBody }): Promise<SavedCheckAnswer> {
  const body = JSON.stringify({ name: input.name, request: input.request });
  return input.id
    ? call<SavedCheckAnswer>(`/api/v1/securement-checks/saved/${encodeURIComponent(input.id)}`, { method: "PUT", body })
    : call<SavedCheckAnswer>("/api/v1/securement-checks/saved", { method: "POST", body });
}

/** DELETE /api/v1/securement-checks/saved/{id} */
export function deleteSavedCheck(id: string): Promise<{ ok: true }> {
  return call<{ ok: true }>(`/api/v1/securement-checks/saved/${encodeURIComponent(id)}`, { method: "DELETE" });
}
