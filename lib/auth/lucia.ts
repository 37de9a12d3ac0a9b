import "server-only";
import { generateIdFromEntropySize, Lucia, type DatabaseSession, type DatabaseUser } from "lucia";
import { NodePostgresAdapter } from "@lucia-auth/adapter-postgresql";
import { pool } from "@/db";
import { findSessionWithUser } from "@/db/sessions";
import { cookieSecure } from "@/lib/config";
import type { Role } from "./roles";
import { SESSION_COOKIE } from "./session-cookie";

// lucia v3 is in maintenance; only lib/auth imports this file (everything else talks to
// lib/auth/session.ts), so it can be swapped here without touching routes.
// Its adapter reads a session and its person in two queries on every request (and every
// column of the person); ours reads them, with the organisation's name and time zone, in one.
class OneQueryAdapter extends NodePostgresAdapter {
  override async getSessionAndUser(sessionId: string): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    const row = await findSessionWithUser(sessionId);
    if (!row) return [null, null];
    return [
      { id: row.sessionId, userId: row.userId, expiresAt: row.expiresAt, attributes: {} },
      {
        id: row.userId,
        attributes: {
          email: row.email,
          name: row.name,
          role: row.role as Role,
          designated: row.designated,
          organisation_id: row.organisationId,
          disabled_at: row.disabledAt,
          time_zone: row.timeZone,
          organisation_name: row.organisationName,
        },
      },
    ];
  }
}

const adapter = new OneQueryAdapter(pool, { user: "users", session: "user_sessions" });

export const lucia = new Lucia(adapter, {
  sessionCookie: {
    name: SESSION_COOKIE,
    expires: false, // keep the cookie; lucia expires and extends the session server-side
    attributes: { secure: cookieSecure, sameSite: "lax" },
  },
  getUserAttributes: (row) => ({
    email: row.email,
    name: row.name,
    role: row.role,
    designated: row.designated,
    organisationId: row.organisation_id,
    disabledAt: row.disabled_at,
    timeZone: row.time_zone,
    organisationName: row.organisation_name,
  }),
});

declare module "lucia" {
  interface Register {
    Lucia: typeof lucia;
    DatabaseUserAttributes: {
      email: string;
      name: string;
      role: Role;
      designated: boolean;
      organisation_id: string;
      disabled_at: Date | null;
      time_zone: string;
      organisation_name: string;
    };
  }
}

/** A new person's id, in the form the session tables use. */
export function newUserId(): string {
  return generateIdFromEntropySize(10);
}
