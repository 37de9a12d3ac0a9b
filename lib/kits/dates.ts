/**
 * Calendar days for kits: a kit is for a date (YYYY-MM-DD) in the organisation's time zone,
 * and "tomorrow" is the day after today there, not in UTC.
 *
 * @module
 */

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/**
 * Whether a text is a real calendar date written YYYY-MM-DD.
 *
 * @example
 * isIsoDate("2026-12-03"); // true
 * isIsoDate("2026-02-30"); // false
 */
export function isIsoDate(text: string): boolean {
  if (!ISO_DATE.test(text)) return false;
  const d = new Date(`${text}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === text;
}

/**
 * The calendar date of an instant in a time zone (an IANA name such as "America/Chicago").
 *
 * @example
 * dayIn("America/Chicago", new Date("2026-12-03T03:00:00Z")); // "2026-12-02"
 */
export function dayIn(timeZone: string, at: Date = new Date()): string {
  const parts = new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).formatToParts(at);
  const get = (type: string) => parts.find((p) => p.type === type)?.value ?? "";
  return `${get("year")}-${get("month")}-${get("day")}`;
}

/**
 * A date `days` later (or earlier, when negative).
 *
 * @example
 * addDays("2026-12-31", 1); // "2027-01-01"
 */
export function addDays(date: string, days: number): string {
  const d = new Date(`${date}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

/**
 * Whole days from `from` to `to`.
 *
 * @example
 * daysBetween("2026-12-01", "2026-12-03"); // 2
 */
export function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000);
}

/**
 * A date written out for people: weekday, day, month, year.
 *
 * @example
 * writtenDate("2026-12-03"); // "Thu 3 Dec 2026"
 */
export function writtenDate(date: string): string {
  return new Date(`${date}T00:00:00Z`).toLocaleDateString("en-GB", { timeZone: "UTC", weekday: "short", day: "numeric", month: "short", year: "numeric" }).replace(/,/g, "");
}

/**
 * A date as a planner says it, relative to today: "Today", "Tomorrow", "Yesterday", else
 * the weekday; always followed by the date itself.
 *
 * @example
 * dayLabel("2026-12-03", "2026-12-02"); // "Tomorrow, Thu 3 Dec 2026"
 * dayLabel("2026-12-09", "2026-12-02"); // "Wed 9 Dec 2026"
 */
export function dayLabel(date: string, today: string): string {
  const written = writtenDate(date);
  const offset = daysBetween(today, date);
  const word = offset === 0 ? "Today" : offset === 1 ? "Tomorrow" : offset === -1 ? "Yesterday" : null;
  return word ? `${word}, ${written}` : written;
}
