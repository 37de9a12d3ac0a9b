import "server-only";
import { generateIdFromEntropySize, Lucia } from "lucia";
import { NodePostgresAdapter } from "@lucia-auth/adapter-postgresql";
import { pool } from "@/db";
import { cookieSecure } from "@/lib/config";
import type { Role } from "./roles";
import { SESSION_COOKIE } from "./session-cookie";

// lucia v3 is in maintenance; only lib/auth imports this file (everything else talks to
// lib/auth/session.ts), so it can be swapped here without touching routes.
const adapter = new NodePostgresAdapter(pool, { user: "users", session: "user_sessions" });

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
    };
  }
}

/** A new person's id, in the form the session tables use. */
export function newUserId(): string {
  return generateIdFromEntropySize(10);
}
