import { clockTimeIn, formatDay, todayIn } from "@/lib/time";

// When an organisation's day of reminders is due: at its digest time on its own clock, once
// per local day. Pure; the worker asks it every minute for each organisation, and the
// database's daily_runs key makes sure that only one worker runs a given day.

/** The digest time of an organisation that never chose one: early, before the trucks leave. */
export const DEFAULT_DIGEST_TIME = "06:00";

/**
 * The local day whose reminders are due now, or null: the organisation's clock has reached
 * its digest time and that day has not been run. A worker that was down at the digest time
 * runs the day when it comes back, the same day; a day missed entirely is not sent late.
 * An organisation's first reminders come the day after it was set up.
 * @example dailyRunDue({ timeZone: "America/Chicago", digestTime: "06:00", lastDay: "2026-12-08", createdAt: new Date("2026-11-01") }, new Date("2026-12-09T12:30:00Z")) // "2026-12-09" (06:30 in Chicago)
 * @example dailyRunDue({ timeZone: "America/Chicago", digestTime: "06:00", lastDay: "2026-12-08", createdAt: new Date("2026-11-01") }, new Date("2026-12-09T11:30:00Z")) // null (05:30 in Chicago)
 */
export function dailyRunDue(org: { timeZone: string; digestTime: string; lastDay: string | null; createdAt: Date }, now: Date): string | null {
  const day = todayIn(org.timeZone, now);
  if (org.lastDay !== null && org.lastDay >= day) return null;
  if (formatDay(org.createdAt, org.timeZone) >= day) return null;
  return clockTimeIn(org.timeZone, now) >= org.digestTime ? day : null;
}
