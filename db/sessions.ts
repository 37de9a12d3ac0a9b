import { db, preparedFirst } from "./index";

// The one read every signed-in request makes: the session, its person and the person's
// organisation (its name and time zone, which the app shell and "today" need), in one query.
// lucia's own PostgreSQL adapter reads the session and the person in two (lib/auth/lucia.ts).

/** A session row with what a request needs of its person and organisation. Never a password hash. */
export interface SessionWithUser {
  sessionId: string;
  userId: string;
  expiresAt: Date;
  email: string;
  name: string;
  role: string;
  designated: boolean;
  organisationId: string;
  disabledAt: Date | null;
  timeZone: string;
  organisationName: string;
}

// Every signed-in request runs it: its SQL is built once and prepared on each connection.
export const findSessionWithUser = preparedFirst<SessionWithUser>(
  "session_with_user",
  db("user_sessions as s")
    .join("users as u", "u.id", "s.user_id")
    .join("organisations as o", "o.id", "u.organisation_id")
    .where("s.id", "")
    .first(
      "s.id as sessionId", "s.user_id as userId", "s.expires_at as expiresAt", "u.email", "u.name", "u.role", "u.designated",
      "u.organisation_id as organisationId", "u.disabled_at as disabledAt", "o.time_zone as timeZone", "o.name as organisationName",
    ),
);
