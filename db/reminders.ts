import type { Knex } from "knex";
import { db } from "./index";

// What the reminders read: the organisations whose day may be due, the items of a digest,
// the kits an item is in on given dates; and daily_runs, the claim on an organisation's day.

export interface DailyOrganisation {
  id: string;
  name: string;
  timeZone: string;
  digestTime: string;
  /** YYYY-MM-DD of the last day run, or null. */
  lastDay: string | null;
  createdAt: Date;
}

/** Every organisation with its digest time and the last day its reminders ran. */
export async function listOrganisationsForDaily(): Promise<DailyOrganisation[]> {
  return db("organisations as o").select(
    "o.id",
    "o.name",
    "o.time_zone as timeZone",
    "o.digest_time as digestTime",
    "o.created_at as createdAt",
    db.raw(`(select to_char(max(r.day), 'YYYY-MM-DD') from daily_runs r where r.organisation_id = o.id) as "lastDay"`),
  );
}

/**
 * Takes an organisation's day: true for the one transaction that inserts the row; any other
 * worker, now or later, gets false (the key waits for a concurrent insert to commit or roll back).
 */
export async function claimDay(organisationId: string, day: string, trx: Knex): Promise<boolean> {
  const rows = await trx("daily_runs").insert({ organisation_id: organisationId, day }).onConflict(["organisation_id", "day"]).ignore().returning("day");
  return rows.length > 0;
}

export interface DigestRow {
  tagCode: string;
  kind: string;
  grade: number | null;
  size: string | null;
  details: Record<string, unknown> | null;
  yardName: string | null;
  nextInspectionDue: string | null;
  status: string;
}

/**
 * Items for the digest: in service with an inspection due on or before `dueBy` (overdue
 * included), and every item tagged out. Dates are YYYY-MM-DD on the organisation's calendar.
 */
export async function listDigestItems(organisationId: string, dueBy: string, trx: Knex = db): Promise<DigestRow[]> {
  return trx("items as i")
    .leftJoin("yards as y", "y.id", "i.yard_id")
    .where("i.organisation_id", organisationId)
    .where((w) => w.where((a) => a.where("i.status", "in_service").where("i.next_inspection_due", "<=", dueBy)).orWhere("i.status", "tagged_out"))
    .orderBy("i.tag_code")
    .select(
      "i.tag_code as tagCode", "i.kind", "i.grade", "i.size", "i.details", "y.name as yardName", "i.status",
      db.raw("to_char(i.next_inspection_due, 'YYYY-MM-DD') as \"nextInspectionDue\""),
    );
}

export interface KitHolding {
  kitId: string;
  job: string;
  date: string;
}

/** The kits, not yet loaded, that hold an item on the given dates. */
export async function openKitsHolding(organisationId: string, itemId: string, dates: string[], trx: Knex = db): Promise<KitHolding[]> {
  return trx("kit_items as ki")
    .join("kits as k", "k.id", "ki.kit_id")
    .where({ "ki.organisation_id": organisationId, "ki.item_id": itemId })
    .whereIn("ki.kit_date", dates)
    .whereIn("k.state", ["draft", "ready"])
    .orderBy("k.date")
    .select("k.id as kitId", "k.job", db.raw("to_char(k.date, 'YYYY-MM-DD') as date"));
}

/** Ids of the organisation's kits for a date that are not yet loaded. */
export async function openKitIdsOn(organisationId: string, date: string, trx: Knex = db): Promise<string[]> {
  const rows = await trx("kits").where({ organisation_id: organisationId, date }).whereIn("state", ["draft", "ready"]).orderBy("job").select("id");
  return rows.map((r) => r.id);
}
