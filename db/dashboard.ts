import type { TagOutReason } from "@/lib/dashboard/charts";
import type { ItemKind, ItemStatus } from "@/lib/stock/labels";
import { db } from "./index";

// The owner's dashboard: counts the home page turns into figures and charts
// (lib/dashboard/ shapes them). Every query takes the organisation id; days and instants
// come in as parameters (the organisation's clock is lib/time's, never the database's).

/** In-service items whose periodic inspection falls due on one day. */
export interface DueDayCount {
  /** YYYY-MM-DD */
  day: string;
  count: number;
}

/**
 * In-service items by the day their periodic inspection falls due, from `from` to `to`
 * (YYYY-MM-DD, both included): what the stock list shows for
 * `status=in_service&dueFrom=…&dueBy=…`.
 */
export async function inspectionsDueByDay(organisationId: string, from: string, to: string): Promise<DueDayCount[]> {
  const rows = (await db("items")
    .where({ organisation_id: organisationId, status: "in_service" })
    .whereBetween("next_inspection_due", [from, to])
    .groupBy("next_inspection_due")
    .orderBy("next_inspection_due")
    .select(db.raw("to_char(next_inspection_due, 'YYYY-MM-DD') as day"))
    .count("id as count")) as unknown as { day: string; count: string }[];
  return rows.map((r) => ({ day: r.day, count: Number(r.count) }));
}

/** Items of one kind in one status. */
export interface KindStatusCount {
  kind: ItemKind;
  status: ItemStatus;
  count: number;
}

/** The whole stock counted by kind and status: what `/stock?kind=…&status=…` lists. */
export async function stockByKindAndStatus(organisationId: string): Promise<KindStatusCount[]> {
  const rows = (await db("items")
    .where({ organisation_id: organisationId })
    .groupBy("kind", "status")
    .orderBy(["kind", "status"])
    .select("kind", "status")
    .count("id as count")) as unknown as { kind: string; status: string; count: string }[];
  return rows.map((r) => ({ kind: r.kind as ItemKind, status: r.status as ItemStatus, count: Number(r.count) }));
}

/** Tag-outs of one reason on one day of the organisation's calendar. */
export interface TagOutDayCount {
  /** YYYY-MM-DD in the organisation's time zone. */
  day: string;
  reason: TagOutReason;
  count: number;
}

/**
 * Every time an item went from usable (or lost) to tagged out, between two instants, by the
 * organisation's calendar day and reason: a failed pre-use check (its own tag-out entry,
 * written in the same change at the same instant, is not counted again), damage reported
 * outside a check, a periodic inspection that held an item in service for repair (one that
 * was already tagged out is a decision, not a new tag-out), and an item found after being
 * lost (held out of use until inspected).
 */
export async function tagOutsByDay(organisationId: string, since: Date, until: Date, timeZone: string): Promise<TagOutDayCount[]> {
  const { rows } = await db.raw<{ rows: { day: string; reason: TagOutReason; count: string }[] }>(
    `select to_char((e.at at time zone :zone)::date, 'YYYY-MM-DD') as day, r.reason, count(*) as count
       from item_events e
       cross join lateral (select case
         when e.type = 'check' and e.outcome = 'fail' then 'check_failed'
         when e.type = 'tag_out' then 'damage_reported'
         when e.type = 'inspection' and e.outcome = 'repair' then 'inspection_repair'
         when e.type = 'found' then 'found' end as reason) r
      where e.organisation_id = :organisationId and e.at >= :since and e.at < :until
        and r.reason is not null
        and not (e.type = 'tag_out' and exists (
          select 1 from item_events c
           where c.item_id = e.item_id and c.organisation_id = e.organisation_id
             and c.type = 'check' and c.outcome = 'fail' and c.at = e.at))
        and not (e.type = 'inspection' and coalesce((
          select p.type || ':' || coalesce(p.outcome, '') from item_events p
           where p.item_id = e.item_id and p.organisation_id = e.organisation_id and p.id < e.id
             and p.type in ('check', 'tag_out', 'inspection', 'return_to_service', 'found', 'lost')
           order by p.id desc limit 1), '') in ('check:fail', 'tag_out:', 'inspection:repair', 'found:'))
      group by 1, 2
      order by 1, 2`,
    { zone: timeZone, organisationId, since, until },
  );
  return rows.map((r) => ({ day: r.day, reason: r.reason, count: Number(r.count) }));
}

/** A tagged-out item waiting for a decision, and since when. */
export interface TaggedOutItem {
  id: string;
  tagCode: string;
  kind: ItemKind;
  grade: number | null;
  size: string | null;
  details: Record<string, unknown>;
  /** When it was last tagged out (its latest history entry that put it there). */
  since: Date | null;
  note: string | null;
}

/** Tagged-out items, the longest waiting first. */
export async function taggedOutItems(organisationId: string, limit = 8): Promise<TaggedOutItem[]> {
  return db("items as i")
    .where({ "i.organisation_id": organisationId, "i.status": "tagged_out" })
    .joinRaw(
      `left join lateral (select e.at, e.note from item_events e
         where e.item_id = i.id and e.organisation_id = i.organisation_id
           and (e.type in ('tag_out', 'found') or (e.type = 'check' and e.outcome = 'fail') or (e.type = 'inspection' and e.outcome = 'repair'))
         order by e.id desc limit 1) t on true`,
    )
    .orderByRaw("t.at asc nulls first, i.tag_code")
    .limit(limit)
    .select("i.id", "i.tag_code as tagCode", "i.kind", "i.grade", "i.size", "i.details", "t.at as since", "t.note");
}
