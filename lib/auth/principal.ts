import "server-only";
import { createHmac, randomBytes, timingSafeEqual } from "node:crypto";
import { lucia } from "./lucia";
import type { Role } from "./roles";

// Who is asking, read from a session id; and the hand-over of that answer from proxy.ts to the
// page of the same request. proxy.ts reads the session of every signed-in page anyway (a
// database that cannot be reached must give a 503, which only the proxy can answer), so the
// page takes the proxy's answer instead of reading it again: one query per page, not two.
// Free of next/headers and React, so that proxy.ts can import it.

/** Who is asking, as every route and action sees it. */
export interface Principal {
  userId: string;
  organisationId: string;
  role: Role;
  designated: boolean;
  name: string;
  email: string;
  via: "session" | "token";
  /** The organisation's name and time zone, read with the session or token (no query of their own). */
  organisationName: string;
  timeZone: string;
}

/** The person of a session id, or null (unknown, expired, or a disabled account). One query. */
export async function principalFromSessionId(sessionId: string | undefined): Promise<Principal | null> {
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
    organisationName: user.organisationName,
    timeZone: user.timeZone,
  };
}

/** The request header that carries the proxy's answer to the page. proxy.ts removes any a client sent. */
export const PRINCIPAL_HEADER = "x-linkyard-principal";

// A key of this process only: the proxy and the pages run in the same process, and nothing
// outside it can make a hand-over that the page believes. (Were they ever apart, the page
// would find no valid hand-over and read the session itself.)
const holder = globalThis as typeof globalThis & { linkyardHandoffKey?: Buffer };
const KEY = (holder.linkyardHandoffKey ??= randomBytes(32));

const mac = (body: string) => createHmac("sha256", KEY).update(body).digest("base64url");

/** The proxy's answer for this session id, sealed for the page: `<body>.<mac>`. */
export function sealPrincipal(sessionId: string, principal: Principal | null): string {
  const body = Buffer.from(JSON.stringify({ sessionId, principal })).toString("base64url");
  return `${body}.${mac(body)}`;
}

/**
 * The proxy's answer, when the header holds a valid one for this same session id; undefined
 * when there is none to trust (then the caller reads the session itself).
 */
export function openPrincipal(value: string | null, sessionId: string | undefined): Principal | null | undefined {
  if (!value || !sessionId) return undefined;
  const [body, tag] = value.split(".");
  if (!body || !tag) return undefined;
  const expected = Buffer.from(mac(body));
  const given = Buffer.from(tag);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return undefined;
  const sealed = JSON.parse(Buffer.from(body, "base64url").toString("utf8")) as { sessionId: string; principal: Principal | null };
  return sealed.sessionId === sessionId ? sealed.principal : undefined;
}
