// The one place that says who is calling, by network address: the sign-in limits, the
// tag-lookup limit (proxy.ts and /t/{code}), the mail-sending limits and every route handler
// (lib/http/route.ts) ask it.

/**
 * The client's address. server.mts, in front of Next, decides it from the socket (and from
 * forwarded headers only when the socket is a trusted proxy, TRUSTED_PROXIES) and writes it
 * as the only X-Forwarded-For entry; whatever the client sent there is gone by then.
 * "unknown" when the app runs without server.mts (e.g. plain `next start`, which would pass
 * a client's own header through: never serve the app that way).
 * @example clientIp(new Headers({ "x-forwarded-for": "203.0.113.9" })) // "203.0.113.9"
 */
export function clientIp(headers: Pick<Headers, "get">): string {
  return headers.get("x-forwarded-for")?.split(",")[0]?.trim() || "unknown";
}
