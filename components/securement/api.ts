// The two calls the securement screens make to the API v1, with the session cookie.
import type { DefaultRating, SecurementCheckResult } from "@/lib/securement";
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
