import "server-only";
import type { Cookie } from "lucia";

/** A JSON response that also sets a cookie (route handlers build their own headers). */
export function jsonWithCookie(body: unknown, cookie: Cookie, status = 200): Response {
  return Response.json(body, { status, headers: { "Set-Cookie": cookie.serialize() } });
}
