import "server-only";
import { getItem } from "@/db/items";
import { getOrganisation } from "@/db/organisations";
import { countRecordEvents, listRecordEvents, recordPeople, streamRecordEvents, type RecordEvent, type RecordFilters } from "@/db/records";
import { can } from "@/lib/auth/roles";
import type { Principal } from "@/lib/auth/session";
import { badRequest, forbidden, notFound } from "@/lib/http/errors";
import { principalClock } from "@/lib/organisations/service";
import { addDays, startOfDayIn } from "@/lib/time";
import { MAX_REPORT_EVENTS, recordPeriod, type Period, type RecordQuery } from "./query";

// The inspection and service record: who may read it, which entries a request selects on the
// organisation's calendar, and the bound on a report (the CSV streams any number).

/** A request's selection: its period, its filters as instants, the organisation's clock. */
export interface RecordSelection {
  period: Period;
  filters: RecordFilters;
  timeZone: string;
  today: string;
  /** The one item asked for, if any. */
  item: { id: string; tagCode: string } | null;
}

/**
 * Reads the request: the period (400 naming `from` or `to` when it makes no sense), the one
 * item (404 unless it is the organisation's), the days as instants of the organisation's zone.
 */
export async function recordSelection(actor: Principal, q: Omit<RecordQuery, "format">): Promise<RecordSelection> {
  if (!can(actor, "records.view")) throw forbidden();
  const { timeZone, today } = principalClock(actor);
  const asked = recordPeriod(q, today);
  if ("issue" in asked) throw badRequest(asked.issue.message, [asked.issue]);
  const { period } = asked;
  let item: RecordSelection["item"] = null;
  if (q.itemId) {
    const found = await getItem(actor.organisationId, q.itemId);
    if (!found) throw notFound("No such item in your stock.");
    item = { id: found.id, tagCode: found.tagCode };
  }
  return {
    period,
    timeZone,
    today,
    item,
    filters: {
      kind: q.kind,
      status: q.status,
      q: q.q,
      itemId: q.itemId,
      since: period.from === null ? null : startOfDayIn(period.from, timeZone),
      until: startOfDayIn(addDays(period.to, 1), timeZone),
    },
  };
}

/** A report for the screen or paper. */
export interface RecordReport extends RecordSelection {
  organisationName: string;
  total: number;
  events: RecordEvent[];
  people: { name: string | null; inspections: number; checks: number }[];
}

/**
 * The report of a selection, with everyone who made its entries. Over
 * {@link MAX_REPORT_EVENTS} entries it is refused with a 400 naming `from`: a shorter period,
 * fewer items, or the CSV, which streams every entry.
 */
export async function recordReport(actor: Principal, q: Omit<RecordQuery, "format">): Promise<RecordReport> {
  const selection = await recordSelection(actor, q);
  const total = await countRecordEvents(actor.organisationId, selection.filters);
  if (total > MAX_REPORT_EVENTS) {
    const message = `This selection holds ${total.toLocaleString("en-US")} entries, more than the ${MAX_REPORT_EVENTS.toLocaleString("en-US")} a report shows: choose a shorter period or fewer items, or download the CSV, which holds every entry.`;
    throw badRequest(message, [{ path: "from", message }]);
  }
  const [events, people, organisation] = await Promise.all([
    listRecordEvents(actor.organisationId, selection.filters, MAX_REPORT_EVENTS),
    recordPeople(actor.organisationId, selection.filters),
    getOrganisation(actor.organisationId),
  ]);
  return { ...selection, organisationName: organisation?.name ?? "", total, events, people };
}

/** Every entry of a selection, a batch at a time (the CSV). */
export function recordBatches(actor: Principal, selection: RecordSelection): AsyncGenerator<RecordEvent[]> {
  return streamRecordEvents(actor.organisationId, selection.filters);
}

/** A selection's size and its people, without its entries (the records page). */
export async function recordSummary(actor: Principal, q: Omit<RecordQuery, "format">) {
  const selection = await recordSelection(actor, q);
  const [total, people] = await Promise.all([countRecordEvents(actor.organisationId, selection.filters), recordPeople(actor.organisationId, selection.filters)]);
  return { ...selection, total, people };
}
