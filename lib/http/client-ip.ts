// The one place that says who is calling, by network address: the sign-in limits, the
// tag-lookup limit (proxy.ts and /t/{code}) and every route handler (lib/http/route.ts) ask it.

/**
 * The client's address as the reverse proxy reports it: the first x-forwarded-for entry,
 * else "local" (a direct connection in development and tests).
 *
 * The hardening issue (issue 11, item 2) changes how this reads the address: the socket's
 * address, and forwarded headers only from a configured trusted proxy. Change it here only.
 * @example clientIp(new Headers({ "x-forwarded-for": "203.0.113.9, 10.0.0.1" })) // "203.0.113.9"
 */
export function clientIp(headers: Pick<Headers, "get">): string {
  return headers.get("x-forwarded-for")?.split(",")[0]?.trim() || "local";
}
