import "server-only";
import { cache } from "react";
import { cookies } from "next/headers";
import { forbidden, redirect } from "next/navigation";
import { findActiveApiToken, markApiTokenUsed } from "@/db/api-tokens";
import { lucia } from "./lucia";
import { can, lowerRole, type Permission, type Role } from "./roles";
import { hashSecret } from "./secrets";

/** Who is asking, as every route and action sees it. */
export interface Principal {
  userId: string;
  organisationId: string;
  role: Role;
  designated: boolean;
  name: string;
  email: string;
  via: "session" | "token";
}

async function principalFromSessionId(sessionId: string | undefined): Promise<Principal | null> {
  if (!sessionId) return null;
  // validateSession also extends a session that is past half its life (sliding expiry);
  // the cookie itself lasts, so nothing needs re-setting here.
  const { session, user } = await lucia.validateSession(sessionId);
  if (!session || !user || user.disabledAt) return null;
  return {
    userId: user.id,
    organisationId: user.organisationId,
    role: user.role,
    designated: user.designated,
    name: user.name,
    email: user.email,
    via: "session",
  };
}

/** The signed-in person of this request (cookie), or null. Cached per request. */
export const getPrincipal = cache(async (): Promise<Principal | null> => {
  const jar = await cookies();
  return principalFromSessionId(jar.get(lucia.sessionCookieName)?.value);
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
  await markApiTokenUsed(token.id);
  return {
    userId: token.userId,
    organisationId: token.organisationId,
    // A token never acts above its maker's current role (a demotion caps it at once).
    role: lowerRole(token.role, token.creatorRole),
    designated: false,
    name: `${token.name} (API token)`,
    email: token.email,
    via: "token",
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
