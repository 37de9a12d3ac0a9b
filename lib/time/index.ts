import { TZDate } from "@date-fns/tz";
import { addDays as addCalendarDays, format } from "date-fns";

// One "today", and every date and time shown to a person, in the organisation's time zone
// (an IANA name such as "America/Chicago"). Calendar dates (inspection due, in service since)
// are YYYY-MM-DD strings and have no zone; an instant (a check, an audit row) is turned into
// the organisation's wall-clock date and time here, and nowhere else. Arithmetic and
// formatting are date-fns with @date-fns/tz. Pure: no server or browser APIs beyond Intl.

/** The zone of an organisation that never chose one (made before the setting, or by an API sign-up without it). */
export const DEFAULT_TIME_ZONE = "UTC";

/**
 * Every time zone a person can choose: this runtime's Intl list, with UTC first.
 * @example timeZones().includes("America/Chicago") // true
 */
export function timeZones(): string[] {
  return [DEFAULT_TIME_ZONE, ...Intl.supportedValuesOf("timeZone").filter((z) => z !== DEFAULT_TIME_ZONE)];
}

/**
 * The name of a time zone as Intl's list spells it, or null when Intl does not know it.
 * A browser may report an alias (Asia/Kolkata where the list has Asia/Calcutta): it is
 * taken under the list's name.
 * @example canonicalTimeZone("America/Chicago") // "America/Chicago"
 * @example canonicalTimeZone("Mars/Olympus") // null
 */
export function canonicalTimeZone(name: string): string | null {
  const list = timeZones();
  if (list.includes(name)) return name;
  let resolved: string;
  try {
    resolved = new Intl.DateTimeFormat("en-US", { timeZone: name }).resolvedOptions().timeZone;
  } catch {
    return null;
  }
  if (resolved === "Etc/UTC" || resolved === "Etc/GMT") return DEFAULT_TIME_ZONE;
  return list.includes(resolved) ? resolved : null;
}

/**
 * Whether Intl knows a time zone by this name.
 * @example isTimeZone("Europe/Paris") // true
 */
export function isTimeZone(name: string): boolean {
  return canonicalTimeZone(name) !== null;
}

/**
 * Today's date (YYYY-MM-DD) on the wall calendar of a zone.
 * @example todayIn("America/Chicago", new Date("2026-12-02T01:00:00Z")) // "2026-12-01" (7 pm in Chicago)
 */
export function todayIn(zone: string, now: Date = new Date()): string {
  return format(new TZDate(now.getTime(), zone), "yyyy-MM-dd");
}

/**
 * A calendar date plus whole days (months and leap years as the calendar has them).
 * @example addDays("2026-01-31", 30) // "2026-03-02"
 */
export function addDays(day: string, days: number): string {
  const [y, m, d] = day.split("-").map(Number);
  return format(addCalendarDays(new TZDate(y, m - 1, d, "UTC"), days), "yyyy-MM-dd");
}

/**
 * The date (YYYY-MM-DD) of an instant on the wall calendar of a zone.
 * @example formatDay(new Date("2026-12-02T01:00:00Z"), "America/Chicago") // "2026-12-01"
 */
export function formatDay(at: Date | string, zone: string): string {
  return format(new TZDate(new Date(at).getTime(), zone), "yyyy-MM-dd");
}

/**
 * The date and time (to the minute, 24-hour) of an instant on the wall clock of a zone.
 * @example formatDateTime(new Date("2026-12-02T01:04:00Z"), "America/Chicago") // "2026-12-01 19:04"
 */
export function formatDateTime(at: Date | string, zone: string): string {
  return format(new TZDate(new Date(at).getTime(), zone), "yyyy-MM-dd HH:mm");
}

/**
 * Whole calendar days from one date to another (negative when `to` is earlier).
 * @example daysBetween("2026-12-01", "2026-12-09") // 8
 */
export function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000);
}

/**
 * The short English weekday of a calendar date.
 * @example weekday("2026-12-09") // "Wed"
 */
export function weekday(day: string): string {
  return format(new TZDate(Date.parse(`${day}T12:00:00Z`), "UTC"), "EEE");
}

/**
 * The wall-clock time (HH:mm, 24-hour) of an instant in a zone.
 * @example clockTimeIn("America/Chicago", new Date("2026-12-02T13:05:00Z")) // "07:05"
 */
export function clockTimeIn(zone: string, now: Date = new Date()): string {
  return format(new TZDate(now.getTime(), zone), "HH:mm");
}
