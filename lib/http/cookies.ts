import "server-only";

/** A JSON response that also sets a cookie (route handlers build their own headers). */
export function jsonWithCookie(body: unknown, cookie: { serialize(): string }, status = 200): Response {
  return Response.json(body, { status, headers: { "Set-Cookie": cookie.serialize() } });
}
