import type { Knex } from "knex";
import type { KitState } from "@/lib/kits/model";
import type { Attachment } from "@/lib/securement";
import type { ItemStatus } from "@/lib/stock/labels";
import { uniqueRefusal } from "./errors";
import { db } from "./index";

// Kits, their tiedowns and the items in them. Every function takes the organisation id and
// filters on it. kit_items' unique key on (item_id, kit_date) is what keeps an item in one
// kit per date; itemTakenRefusal() tells that refusal apart for the service.
// This file owns the shapes of a kit, a tiedown and an item in a kit as they are written
// and read; lib/kits/assemble.ts maps them to the planner's model.

const KIT_ITEM_DATE_KEY = "kit_items_item_date";

/**
 * Whether an error is KIT_ITEM_DATE_KEY's refusal (an item put into a second kit for a date,
 * which only a race between two requests reaches past the service's check): the item and the
 * date it names, when PostgreSQL's detail gives them; null for any other error.
 */
export function itemTakenRefusal(error: unknown): { itemId: string; date: string } | { itemId: null; date: null } | null {
  const refusal = uniqueRefusal(error);
  if (refusal?.key !== KIT_ITEM_DATE_KEY) return null;
  const match = /\(item_id, kit_date\)=\(([0-9a-f-]{36}), (\d{4}-\d{2}-\d{2})\)/.exec(refusal.detail);
  return match ? { itemId: match[1]!, date: match[2]! } : { itemId: null, date: null };
}

/** A kit as every query answers it (its machine, trailer and tiedowns by id). */
export interface KitRecord {
  id: string;
  /** YYYY-MM-DD */
  date: string;
  job: string;
  site: string | null;
  state: KitState;
  machineId: string;
  trailerId: string;
  articulationRestrained: boolean;
  machineFrontFromDeckFrontMm: number | null;
}

/** An item of stock as a kit reads it: what its description, rating and usability need. */
export interface KitItemRecord {
  id: string;
  tagCode: string;
  kind: string;
  grade: number | null;
  gradeMarked: boolean;
  size: string | null;
  markedWllLb: number | null;
  wllLb: number | null;
  status: ItemStatus;
  /** YYYY-MM-DD, or null when no periodic inspection is scheduled. */
  nextInspectionDue: string | null;
  details: Record<string, unknown>;
}

/** What a tiedown's details decide. */
export interface TiedownFields {
  label: string;
  anchorPointId: string;
  attachment: Attachment;
  secures: string;
  machinePoint: string | null;
}

/** A tiedown as it is read, with its items in order. */
export interface TiedownRecord extends TiedownFields {
  id: string;
  kitId: string;
  items: KitItemRecord[];
}

const KIT_COLUMNS = [
  "k.id", db.raw("to_char(k.date, 'YYYY-MM-DD') as date"), "k.job", "k.site", "k.state", "k.machine_id as machineId",
  "k.trailer_id as trailerId", "k.articulation_restrained as articulationRestrained",
  "k.machine_front_from_deck_front_mm as machineFrontFromDeckFrontMm",
];

export async function getKit(organisationId: string, id: string, trx: Knex = db): Promise<KitRecord | undefined> {
  return trx("kits as k").where({ "k.organisation_id": organisationId, "k.id": id }).first(KIT_COLUMNS);
}

/** Locks a kit row: every change to a kit (its tiedowns, items, state) takes this lock first. */
export async function lockKit(organisationId: string, id: string, trx: Knex): Promise<KitRecord | undefined> {
  return trx("kits as k").where({ "k.organisation_id": organisationId, "k.id": id }).forUpdate().first(KIT_COLUMNS);
}

/** Kits from one date to another (inclusive), by date then job. */
export async function listKits(organisationId: string, from: string, to: string): Promise<KitRecord[]> {
  return db("kits as k")
    .where("k.organisation_id", organisationId)
    .whereBetween("k.date", [from, to])
    .orderBy([{ column: "k.date" }, { column: "k.job" }, { column: "k.created_at" }])
    .select(KIT_COLUMNS);
}

/** A new kit (a copy names the kit it was copied from). */
export interface NewKit {
  date: string;
  job: string;
  site: string | null;
  machineId: string;
  trailerId: string;
  articulationRestrained: boolean;
  machineFrontFromDeckFrontMm?: number | null;
  copiedFrom?: string | null;
  createdBy: string;
}

export async function insertKit(organisationId: string, k: NewKit, trx: Knex): Promise<string> {
  const [row] = await trx("kits")
    .insert({
      organisation_id: organisationId,
      date: k.date,
      job: k.job,
      site: k.site,
      machine_id: k.machineId,
      trailer_id: k.trailerId,
      articulation_restrained: k.articulationRestrained,
      machine_front_from_deck_front_mm: k.machineFrontFromDeckFrontMm ?? null,
      copied_from: k.copiedFrom ?? null,
      created_by: k.createdBy,
    })
    .returning("id");
  return row.id;
}

/** A change to a kit: its job, site, state, articulation lock or placement. */
export type KitUpdate = Partial<Pick<KitRecord, "job" | "site" | "state" | "articulationRestrained" | "machineFrontFromDeckFrontMm">>;

export async function updateKit(
  organisationId: string,
  id: string,
  patch: KitUpdate,
  trx: Knex,
): Promise<void> {
  await trx("kits")
    .where({ organisation_id: organisationId, id })
    .update({
      ...(patch.job !== undefined && { job: patch.job }),
      ...(patch.site !== undefined && { site: patch.site }),
      ...(patch.state !== undefined && { state: patch.state }),
      ...(patch.articulationRestrained !== undefined && { articulation_restrained: patch.articulationRestrained }),
      ...(patch.machineFrontFromDeckFrontMm !== undefined && { machine_front_from_deck_front_mm: patch.machineFrontFromDeckFrontMm }),
      updated_at: trx.fn.now(),
    });
}

const ITEM_COLUMNS = [
  "i.id", "i.tag_code as tagCode", "i.kind", "i.grade", "i.grade_marked as gradeMarked", "i.size", "i.marked_wll_lb as markedWllLb",
  "i.wll_lb as wllLb", "i.status", db.raw("to_char(i.next_inspection_due, 'YYYY-MM-DD') as \"nextInspectionDue\""), "i.details",
];

/** The tiedowns of some kits, in order, each with its items in order. */
export async function listTiedowns(organisationId: string, kitIds: string[], trx: Knex = db): Promise<TiedownRecord[]> {
  if (!kitIds.length) return [];
  const tiedowns = await trx("kit_tiedowns")
    .where({ organisation_id: organisationId })
    .whereIn("kit_id", kitIds)
    .orderBy([{ column: "kit_id" }, { column: "position" }])
    .select("id", "kit_id as kitId", "label", "anchor_point_id as anchorPointId", "attachment", "secures", "machine_point as machinePoint");
  const items: (KitItemRecord & { tiedownId: string })[] = await trx("kit_items as ki")
    .join("items as i", "i.id", "ki.item_id")
    .where("ki.organisation_id", organisationId)
    .whereIn("ki.kit_id", kitIds)
    .orderBy([{ column: "ki.tiedown_id" }, { column: "ki.position" }, { column: "ki.id" }])
    .select([...ITEM_COLUMNS, "ki.tiedown_id as tiedownId"]);
  return tiedowns.map((t) => ({ ...t, items: items.filter((i) => i.tiedownId === t.id).map(({ tiedownId: _t, ...item }) => item) }));
}

export async function countTiedowns(kitId: string, trx: Knex): Promise<number> {
  const row = await trx("kit_tiedowns").where({ kit_id: kitId }).count<{ count: string }>("id as count").first();
  return Number(row?.count ?? 0);
}

export async function nextTiedownPosition(kitId: string, trx: Knex): Promise<number> {
  const row = await trx("kit_tiedowns").where({ kit_id: kitId }).max<{ max: number | null }>("position as max").first();
  return (row?.max ?? -1) + 1;
}

export async function insertTiedown(organisationId: string, kitId: string, t: TiedownFields, position: number, trx: Knex): Promise<string> {
  const [row] = await trx("kit_tiedowns")
    .insert({
      organisation_id: organisationId,
      kit_id: kitId,
      position,
      label: t.label,
      anchor_point_id: t.anchorPointId,
      attachment: t.attachment,
      secures: t.secures,
      machine_point: t.machinePoint,
    })
    .returning("id");
  return row.id;
}

export async function updateTiedown(organisationId: string, kitId: string, id: string, patch: Partial<TiedownFields>, trx: Knex): Promise<void> {
  await trx("kit_tiedowns")
    .where({ organisation_id: organisationId, kit_id: kitId, id })
    .update({
      ...(patch.label !== undefined && { label: patch.label }),
      ...(patch.anchorPointId !== undefined && { anchor_point_id: patch.anchorPointId }),
      ...(patch.attachment !== undefined && { attachment: patch.attachment }),
      ...(patch.secures !== undefined && { secures: patch.secures }),
      ...(patch.machinePoint !== undefined && { machine_point: patch.machinePoint }),
    });
}

/** Removes a tiedown and (by the foreign key's cascade) frees its items for the date. */
export async function deleteTiedown(organisationId: string, kitId: string, id: string, trx: Knex): Promise<boolean> {
  return (await trx("kit_tiedowns").where({ organisation_id: organisationId, kit_id: kitId, id }).delete()) > 0;
}

/** Removes every tiedown of a kit (a proposal replaces them) and so frees their items for the date. */
export async function deleteAllTiedowns(organisationId: string, kitId: string, trx: Knex): Promise<number> {
  return trx("kit_tiedowns").where({ organisation_id: organisationId, kit_id: kitId }).delete();
}

/**
 * Puts items into a tiedown. A second kit for the same item on the same date is refused by
 * the database (unique key KIT_ITEM_DATE_KEY: itemTakenRefusal()).
 */
export async function insertKitItems(
  organisationId: string,
  kit: { id: string; date: string },
  tiedownId: string,
  itemIds: string[],
  trx: Knex,
): Promise<void> {
  if (!itemIds.length) return;
  const row = await trx("kit_items").where({ tiedown_id: tiedownId }).max<{ max: number | null }>("position as max").first();
  const start = (row?.max ?? -1) + 1;
  await trx("kit_items").insert(
    itemIds.map((itemId, i) => ({ organisation_id: organisationId, kit_id: kit.id, tiedown_id: tiedownId, item_id: itemId, kit_date: kit.date, position: start + i })),
  );
}

export async function deleteKitItem(organisationId: string, kitId: string, tiedownId: string, itemId: string, trx: Knex): Promise<boolean> {
  return (await trx("kit_items").where({ organisation_id: organisationId, kit_id: kitId, tiedown_id: tiedownId, item_id: itemId }).delete()) > 0;
}

/** Every item id in a kit. */
export async function kitItemIds(organisationId: string, kitId: string, trx: Knex = db): Promise<string[]> {
  const rows = await trx("kit_items").where({ organisation_id: organisationId, kit_id: kitId }).orderBy("id").select("item_id");
  return rows.map((r) => r.item_id);
}

/** An item and the kit (with its job) that holds it on a date. */
export interface KitHolding {
  itemId: string;
  kitId: string;
  job: string;
}

/** Which kit holds each of these items on a date (an item is in at most one). */
export async function kitsHolding(organisationId: string, itemIds: string[], date: string, trx: Knex = db): Promise<KitHolding[]> {
  if (!itemIds.length) return [];
  return trx("kit_items as ki")
    .join("kits as k", "k.id", "ki.kit_id")
    .where({ "ki.organisation_id": organisationId, "ki.kit_date": date })
    .whereIn("ki.item_id", itemIds)
    .select("ki.item_id as itemId", "ki.kit_id as kitId", "k.job");
}

/**
 * Locks items of the organisation for a kit change, in id order (so that two kits locking
 * the same items never wait on each other in a circle), as the tag-out locks one item.
 */
export async function lockItemsForKit(organisationId: string, itemIds: string[], trx: Knex): Promise<KitItemRecord[]> {
  if (!itemIds.length) return [];
  return trx("items as i").where("i.organisation_id", organisationId).whereIn("i.id", itemIds).orderBy("i.id").forUpdate().select(ITEM_COLUMNS);
}

export async function getItemsForKit(organisationId: string, itemIds: string[], trx: Knex = db): Promise<KitItemRecord[]> {
  if (!itemIds.length) return [];
  return trx("items as i").where("i.organisation_id", organisationId).whereIn("i.id", itemIds).select(ITEM_COLUMNS);
}

/**
 * Items in no kit on a date (retired ones left out: they never come back). Whether each
 * may be used that day is the caller's question, answered by the usability verdict.
 */
export async function itemsFreeOn(organisationId: string, date: string, options: { kind?: string; limit?: number } = {}, trx: Knex = db): Promise<KitItemRecord[]> {
  const q = trx("items as i")
    .where("i.organisation_id", organisationId)
    .whereNot("i.status", "retired")
    .whereNotExists(trx("kit_items as ki").whereRaw("ki.item_id = i.id").where("ki.kit_date", date))
    .orderBy([{ column: "i.kind" }, { column: "i.wll_lb", order: "desc" }, { column: "i.tag_code" }])
    .limit(options.limit ?? 2000)
    .select(ITEM_COLUMNS);
  if (options.kind) q.where("i.kind", options.kind);
  return q;
}

/**
 * The stock a proposal chooses from: every item of the given kinds that is not retired, with
 * the kit (and its job) that holds it on the date, if any. Whether each may be used that day
 * is the caller's question (the usability verdict).
 */
export async function stockWithHoldersOn(
  organisationId: string,
  date: string,
  kinds: readonly string[],
  trx: Knex = db,
): Promise<(KitItemRecord & { holderKitId: string | null; holderJob: string | null })[]> {
  return trx("items as i")
    .leftJoin("kit_items as ki", function () {
      this.on("ki.item_id", "=", "i.id").andOn("ki.kit_date", "=", trx.raw("?::date", [date]));
    })
    .leftJoin("kits as k", "k.id", "ki.kit_id")
    .where("i.organisation_id", organisationId)
    .whereNot("i.status", "retired")
    .whereIn("i.kind", kinds as string[])
    .orderBy([{ column: "i.kind" }, { column: "i.tag_code" }])
    .limit(5000)
    .select([...ITEM_COLUMNS, "ki.kit_id as holderKitId", "k.job as holderJob"]);
}

/** Kits that use a trailer's anchor point on or after a date, not yet returned (for the trailer page). */
export async function kitsUsingAnchor(organisationId: string, anchorPointId: string, from: string): Promise<Pick<KitRecord, "id" | "date" | "job">[]> {
  return db("kit_tiedowns as t")
    .join("kits as k", "k.id", "t.kit_id")
    .where({ "t.organisation_id": organisationId, "t.anchor_point_id": anchorPointId })
    .where("k.date", ">=", from)
    .whereNot("k.state", "returned")
    .distinct("k.id", db.raw("to_char(k.date, 'YYYY-MM-DD') as date"), "k.job");
}
