import type { Knex } from "knex";
import { db } from "./index";

// The organisation itself: its name, its settings.

export interface Organisation {
  id: string;
  name: string;
  publicTagView: boolean;
  /** IANA name, e.g. "America/Chicago": "today" and every date shown to its people. */
  timeZone: string;
  /** HH:mm on the organisation's clock: when the daily digest goes out. */
  digestTime: string;
}

export async function createOrganisation(o: { id: string; name: string; timeZone: string }, trx: Knex = db): Promise<void> {
  await trx("organisations").insert({ id: o.id, name: o.name, time_zone: o.timeZone });
}

/** Holds the organisation's row until the transaction ends: changes to its people go one at a time. */
export async function lockOrganisation(id: string, trx: Knex): Promise<void> {
  await trx("organisations").where({ id }).forUpdate().first("id");
}

export async function getOrganisation(id: string, trx: Knex = db): Promise<Organisation | undefined> {
  return trx("organisations").where({ id }).first("id", "name", "public_tag_view as publicTagView", "time_zone as timeZone", "digest_time as digestTime");
}

/** The organisation's inspection intervals as stored (kinds it never set are missing). */
export async function getInspectionIntervals(id: string, trx: Knex = db): Promise<Record<string, unknown> | null> {
  const row = await trx("organisations").where({ id }).first("inspection_interval_days");
  return row?.inspection_interval_days ?? null;
}

/** The organisation's time zone alone (services that need "today"). */
export async function getTimeZone(id: string, trx: Knex = db): Promise<string | undefined> {
  const row = await trx("organisations").where({ id }).first("time_zone");
  return row?.time_zone;
}

export async function updateOrganisation(
  id: string,
  patch: { name?: string; publicTagView?: boolean; timeZone?: string; digestTime?: string },
  trx: Knex = db,
): Promise<void> {
  await trx("organisations").where({ id }).update({
    ...(patch.name !== undefined && { name: patch.name }),
    ...(patch.digestTime !== undefined && { digest_time: patch.digestTime }),
    ...(patch.publicTagView !== undefined && { public_tag_view: patch.publicTagView }),
    ...(patch.timeZone !== undefined && { time_zone: patch.timeZone }),
  });
}

export async function setInspectionIntervals(id: string, intervals: Record<string, number>, trx: Knex = db): Promise<void> {
  await trx("organisations").where({ id }).update({ inspection_interval_days: JSON.stringify(intervals) });
}
