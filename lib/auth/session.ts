import "server-only";
import { cache } from "react";
import { cookies, headers } from "next/headers";
import { forbidden, redirect } from "next/navigation";
import { findActiveApiToken, markApiTokenUsed } from "@/db/api-tokens";
import { lucia } from "./lucia";
import { openPrincipal, PRINCIPAL_HEADER, principalFromSessionId, type Principal } from "./principal";
import { can, lowerRole, type Permission } from "./roles";
import { hashSecret } from "./secrets";

export type { Principal } from "./principal";

/**
 * A token's last use is recorded at most once in this many minutes: a request with a token
 * reads, and writes only when the recorded use is older (the settings page shows the day).
 */
export const TOKEN_USE_RECORDED_EVERY_MINUTES = 5;

/**
 * The signed-in person of this request (cookie), or null. Cached per request. A page takes
 * what proxy.ts read for this same session (lib/auth/principal.ts); a server action that
 * changed the cookie, or a request the proxy did not see, reads the session here.
 */
export const getPrincipal = cache(async (): Promise<Principal | null> => {
  const sessionId = (await cookies()).get(lucia.sessionCookieName)?.value;
  const handed = openPrincipal((await headers()).get(PRINCIPAL_HEADER), sessionId);
  return handed !== undefined ? handed : principalFromSessionId(sessionId);
});

/** For pages: send a stranger to sign-in, and answer 403 to the wrong role. */
export async function requirePage(permission?: Permission): Promise<Principal> {
  const principal = await getPrincipal();
  if (!principal) redirect("/sign-in");
  if (permission && !can(principal, permission)) forbidden();
  return principal;
}

/** For route handlers: a bearer API token, else the session cookie. */
export async function principalFromRequest(request: Request): Promise<Principal | null> {
  const header = request.headers.get("authorization");
  if (header?.toLowerCase().startsWith("bearer ")) {
    return principalFromApiToken(header.slice(7).trim());
  }
  return principalFromSessionId(sessionIdFromRequest(request) ?? undefined);
}

async function principalFromApiToken(secret: string): Promise<Principal | null> {
  if (!secret) return null;
  const token = await findActiveApiToken(hashSecret(secret));
  if (!token) return null;
  const recordedSince = Date.now() - TOKEN_USE_RECORDED_EVERY_MINUTES * 60_000;
  if (!token.lastUsedAt || token.lastUsedAt.getTime() < recordedSince) await markApiTokenUsed(token.id, TOKEN_USE_RECORDED_EVERY_MINUTES);
  return {
    userId: token.userId,
    organisationId: token.organisationId,
    // A token never acts above its maker's current role (a demotion caps it at once).
    role: lowerRole(token.role, token.creatorRole),
    designated: false,
    name: `${token.name} (API token)`,
    email: token.email,
    via: "token",
    organisationName: token.organisationName,
    timeZone: token.timeZone,
  };
}

/** A cookie to set: for a route's Set-Cookie header (`serialize`) or for next/headers' cookies(). */
export interface SessionCookie {
  name: string;
  value: string;
  attributes: { secure?: boolean; path?: string; domain?: string; sameSite?: "lax" | "strict" | "none"; httpOnly?: boolean; maxAge?: number; expires?: Date };
  serialize(): string;
}

/** Starts a session and returns the cookie to set. */
export async function startSession(userId: string): Promise<SessionCookie> {
  const session = await lucia.createSession(userId, {});
  return lucia.createSessionCookie(session.id);
}

/** Ends a session and returns the blank cookie that removes it from the browser. */
export async function endSession(sessionId: string): Promise<SessionCookie> {
  await lucia.invalidateSession(sessionId);
  return lucia.createBlankSessionCookie();
}

/** The session id a request's Cookie header carries, or null. */
export function sessionIdFromRequest(request: Request): string | null {
  return lucia.readSessionCookie(request.headers.get("cookie") ?? "");
}

export async function currentSessionId(): Promise<string | undefined> {
  return (await cookies()).get(lucia.sessionCookieName)?.value;
}
