import { DUE_THIS_WEEK_DAYS } from "@/lib/stock/api-schemas";
import { addDays, daysBetween, weekday } from "@/lib/time";

// The daily digest: what may not be used or soon may not, in one plain-text e-mail. Pure:
// the worker reads the items and the organisation's today, this builds the words.

export interface DigestItem {
  tagCode: string;
  /** "Chain, grade 70, 3/8 in" (lib/stock/describe.ts). */
  description: string;
  yardName: string | null;
  /** YYYY-MM-DD, the next periodic inspection. */
  nextInspectionDue: string | null;
}

export interface DigestInput {
  organisationName: string;
  /** The organisation's today, YYYY-MM-DD. */
  today: string;
  /** In service, inspection due before today. */
  overdue: DigestItem[];
  /** In service, inspection due from today to 6 days on. */
  dueThisWeek: DigestItem[];
  /** Tagged out, waiting for an owner's or designated person's decision. */
  taggedOut: DigestItem[];
  appUrl: string;
}

/** Items listed per section; the rest are counted and linked. */
export const DIGEST_LIST_LIMIT = 40;

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function line(item: DigestItem, today: string, withDue: "overdue" | "due" | null): string {
  const where = item.yardName ? ` (${item.yardName})` : "";
  let due = "";
  if (withDue && item.nextInspectionDue) {
    const days = daysBetween(item.nextInspectionDue, today);
    due =
      withDue === "overdue"
        ? `: was due ${item.nextInspectionDue}, ${plural(days, "day", "days")} overdue`
        : `: due ${weekday(item.nextInspectionDue)} ${item.nextInspectionDue}${days === 0 ? " (today)" : ""}`;
  }
  return `- ${item.tagCode} ${item.description}${where}${due}`;
}

function section(title: string, items: DigestItem[], today: string, withDue: "overdue" | "due" | null, link: string): string[] {
  if (!items.length) return [];
  const shown = items.slice(0, DIGEST_LIST_LIMIT).map((i) => line(i, today, withDue));
  const more = items.length > DIGEST_LIST_LIMIT ? [`…and ${items.length - DIGEST_LIST_LIMIT} more.`] : [];
  return [`${title} (${items.length}):`, ...shown, ...more, `The list in Linkyard: ${link}`, ""];
}

/**
 * The digest's subject and text, or null when there is nothing to say (no e-mail is sent).
 * Overdue items come first, oldest first, as they may not be used until inspected.
 * @example
 * buildDigest({ organisationName: "Acme", today: "2026-12-09", overdue: [{ tagCode: "AB12-CD34", description: "Chain, grade 70, 3/8 in", yardName: null, nextInspectionDue: "2026-12-01" }], dueThisWeek: [], taggedOut: [], appUrl: "https://x" })!.subject
 * // "Acme: 1 inspection overdue (Linkyard digest, Wed 2026-12-09)"
 */
export function buildDigest(input: DigestInput): { subject: string; text: string } | null {
  const { overdue, dueThisWeek, taggedOut, today, appUrl } = input;
  if (!overdue.length && !dueThisWeek.length && !taggedOut.length) return null;
  const byDue = (a: DigestItem, b: DigestItem) => (a.nextInspectionDue ?? "").localeCompare(b.nextInspectionDue ?? "") || a.tagCode.localeCompare(b.tagCode);
  const weekEnd = addDays(today, DUE_THIS_WEEK_DAYS);
  const headline = [
    overdue.length ? plural(overdue.length, "inspection overdue", "inspections overdue") : "",
    dueThisWeek.length ? `${plural(dueThisWeek.length, "inspection", "inspections")} due this week` : "",
    taggedOut.length ? `${plural(taggedOut.length, "item", "items")} tagged out` : "",
  ].filter(Boolean);
  return {
    subject: `${input.organisationName}: ${headline.join(", ")} (Linkyard digest, ${weekday(today)} ${today})`,
    text: [
      `Good morning. This is ${input.organisationName}'s gear on ${weekday(today)} ${today}.`,
      "",
      ...section(
        "Inspection overdue: may not be used until inspected",
        [...overdue].sort(byDue),
        today,
        "overdue",
        `${appUrl}/stock?due=overdue&status=in_service`,
      ),
      ...section(`Inspection due in the next 7 days, to ${weekday(weekEnd)} ${weekEnd}`, [...dueThisWeek].sort(byDue), today, "due", `${appUrl}/stock?due=7d&status=in_service`),
      ...section(
        "Tagged out, waiting for an inspection to return it to service, send it for repair or retire it",
        [...taggedOut].sort((a, b) => a.tagCode.localeCompare(b.tagCode)),
        today,
        null,
        `${appUrl}/stock?status=tagged_out`,
      ),
      "Dates are on your company's calendar. A list here is no substitute for the pre-use check before each trip.",
    ].join("\n"),
  };
}
