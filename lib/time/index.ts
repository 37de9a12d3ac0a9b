import { TZDate } from "@date-fns/tz";
import { addMonths as addCalendarMonths, differenceInCalendarDays, format, startOfWeek } from "date-fns";
import { boundedMemo } from "@/lib/memo";

// One "today", and every date and time shown to a person, in the organisation's time zone
// (an IANA name such as "America/Chicago"). Calendar dates (inspection due, in service since)
// are YYYY-MM-DD strings and have no zone; an instant (a check, an audit row) is turned into
// the organisation's wall-clock date and time here, and nowhere else. Arithmetic and
// formatting are date-fns with @date-fns/tz, except an instant's wall-clock date and time,
// which every signed-in request needs ("today"): Intl answers it from one formatter per zone,
// kept with its last answer (a TZDate and format took about 80 µs a call in the served app).
// Pure: no server or browser APIs beyond Intl.

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
  return wallClock(now.getTime(), zone).slice(0, 10);
}

/** A formatter of wall-clock numbers in one zone, made once per zone (making one is the slow part). */
const zoneFormatter = boundedMemo(
  (zone: string) =>
    new Intl.DateTimeFormat("en-US", { timeZone: zone, hourCycle: "h23", year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit" }),
  { limit: 1000, key: (zone) => zone },
);

/**
 * The last answer per zone with the UTC minute it holds for. Every zone's offset has been whole
 * minutes since 1972 (Liberia's −0:44:30 was the last odd one; from memory), so a wall clock
 * turns only when a UTC minute does, and "today" is read once a minute, not once a request.
 */
const lastMinute = new Map<string, { minute: number; text: string }>();
const WHOLE_MINUTE_OFFSETS_SINCE = Date.UTC(1973, 0, 1);

/** "YYYY-MM-DD HH:mm" of an instant (ms) on the wall clock of a zone; throws RangeError for an unknown zone or an invalid time. */
function wallClock(at: number, zone: string): string {
  if (!Number.isFinite(at)) throw new RangeError("Invalid time value");
  const minute = Math.floor(at / 60_000);
  const last = lastMinute.get(zone);
  if (last?.minute === minute) return last.text;
  const part: Partial<Record<Intl.DateTimeFormatPartTypes, string>> = {};
  for (const p of zoneFormatter(zone).formatToParts(at)) part[p.type] = p.value;
  const text = `${part.year!.padStart(4, "0")}-${part.month}-${part.day} ${part.hour}:${part.minute}`;
  if (at >= WHOLE_MINUTE_OFFSETS_SINCE) {
    if (lastMinute.size >= 1000) lastMinute.clear();
    lastMinute.set(zone, { minute, text });
  }
  return text;
}

/**
 * A calendar date plus whole days (months and leap years as the calendar has them).
 * @example addDays("2026-01-31", 30) // "2026-03-02"
 */
export function addDays(day: string, days: number): string {
  // Plain UTC arithmetic: a calendar date has no zone, UTC has no clock changes, and a Date is
  // some 50 times quicker than a TZDate and format (an import adds days for every new item).
  const [y, m, d] = day.split("-").map(Number);
  return new Date(Date.UTC(y, m - 1, d + days)).toISOString().slice(0, 10);
}

/**
 * The date (YYYY-MM-DD) of an instant on the wall calendar of a zone.
 * @example formatDay(new Date("2026-12-02T01:00:00Z"), "America/Chicago") // "2026-12-01"
 */
export function formatDay(at: Date | string, zone: string): string {
  return wallClock(new Date(at).getTime(), zone).slice(0, 10);
}

/**
 * The date and time (to the minute, 24-hour) of an instant on the wall clock of a zone.
 * @example formatDateTime(new Date("2026-12-02T01:04:00Z"), "America/Chicago") // "2026-12-01 19:04"
 */
export function formatDateTime(at: Date | string, zone: string): string {
  return wallClock(new Date(at).getTime(), zone);
}

const ISO_DAY = /^\d{4}-\d{2}-\d{2}$/;

/**
 * Whether a text is a real calendar date written YYYY-MM-DD.
 * @example isIsoDate("2028-02-29") // true
 * @example isIsoDate("2026-02-29") // false
 */
export function isIsoDate(text: string): boolean {
  if (!ISO_DAY.test(text)) return false;
  const at = new Date(`${text}T00:00:00Z`); // an impossible day (Feb 30) is Invalid Date or rolls over
  return !Number.isNaN(at.getTime()) && at.toISOString().slice(0, 10) === text;
}

/** A calendar date (YYYY-MM-DD) as a date-fns date at midnight UTC: calendar arithmetic with no zone in it. */
function calendarDay(day: string): TZDate {
  const [y, m, d] = day.split("-").map(Number);
  return new TZDate(y, m - 1, d, "UTC");
}

/**
 * Whole calendar days from one date to another (negative when `to` comes first).
 * @example daysBetween("2026-12-01", "2026-12-14") // 13
 */
export function daysBetween(from: string, to: string): number {
  return differenceInCalendarDays(calendarDay(to), calendarDay(from));
}

/**
 * A calendar date written out for people: weekday, day, month, year.
 * @example writtenDate("2026-12-03") // "Thu 3 Dec 2026"
 */
export function writtenDate(day: string): string {
  return format(calendarDay(day), "EEE d MMM yyyy");
}

/**
 * A date as a planner says it, relative to today: "Today", "Tomorrow", "Yesterday", else the
 * weekday; always followed by the date itself.
 * @example dayLabel("2026-12-03", "2026-12-02") // "Tomorrow, Thu 3 Dec 2026"
 * @example dayLabel("2026-12-09", "2026-12-02") // "Wed 9 Dec 2026"
 */
export function dayLabel(day: string, today: string): string {
  const written = writtenDate(day);
  const offset = daysBetween(today, day);
  const word = offset === 0 ? "Today" : offset === 1 ? "Tomorrow" : offset === -1 ? "Yesterday" : null;
  return word ? `${word}, ${written}` : written;
}

/**
 * The short English weekday of a calendar date.
 * @example weekday("2026-12-09") // "Wed"
 */
export function weekday(day: string): string {
  return format(calendarDay(day), "EEE");
}

/**
 * The wall-clock time (HH:mm, 24-hour) of an instant in a zone.
 * @example clockTimeIn("America/Chicago", new Date("2026-12-02T13:05:00Z")) // "07:05"
 */
export function clockTimeIn(zone: string, now: Date = new Date()): string {
  return wallClock(now.getTime(), zone).slice(11);
}

/**
 * A zone as a sentence reads it: "Chicago time" for America/Chicago; UTC as "Coordinated
 * Universal Time (UTC), until an owner sets the company's time zone in Settings".
 * @example zoneWords("America/Chicago") // "Chicago time"
 * @example zoneWords("America/Argentina/Buenos_Aires") // "Buenos Aires time"
 */
export function zoneWords(zone: string): string {
  if (zone === DEFAULT_TIME_ZONE) return "Coordinated Universal Time (UTC), until an owner sets the company's time zone in Settings";
  const place = zone.split("/").pop()!.replaceAll("_", " ");
  return `${place} time`;
}

/**
 * The Monday that starts the calendar week of a date (weeks run Monday to Sunday, ISO 8601).
 * @example weekStart("2026-12-03") // "2026-11-30"
 * @example weekStart("2026-11-30") // "2026-11-30"
 */
export function weekStart(day: string): string {
  return format(startOfWeek(calendarDay(day), { weekStartsOn: 1 }), "yyyy-MM-dd");
}

/**
 * The month (YYYY-MM) of a calendar date.
 * @example monthOf("2026-12-03") // "2026-12"
 */
export function monthOf(day: string): string {
  return day.slice(0, 7);
}

/**
 * A month (YYYY-MM) plus whole months.
 * @example addMonths("2026-02", -3) // "2025-11"
 */
export function addMonths(month: string, months: number): string {
  return format(addCalendarMonths(calendarDay(`${month}-01`), months), "yyyy-MM");
}

/**
 * A month written out: "Dec 2026".
 * @example monthWords("2026-12") // "Dec 2026"
 */
export function monthWords(month: string): string {
  return format(calendarDay(`${month}-01`), "MMM yyyy");
}

/**
 * A date written short, for a chart's axis: day and month.
 * @example shortDate("2026-12-03") // "3 Dec"
 */
export function shortDate(day: string): string {
  return format(calendarDay(day), "d MMM");
}

/**
 * The instant a calendar date begins on the wall clock of a zone: where a period of days
 * (a report from one date to another) starts and ends among stored instants.
 * @example startOfDayIn("2026-12-01", "America/Chicago").toISOString() // "2026-12-01T06:00:00.000Z"
 */
export function startOfDayIn(day: string, zone: string): Date {
  const [y, m, d] = day.split("-").map(Number);
  return new Date(new TZDate(y, m - 1, d, zone).getTime());
}
