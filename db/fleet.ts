import type { Knex } from "knex";
import type { UnitSystem } from "@/lib/kits/display";
import type { AnchorStatus, Coupling, Side, TrailerType } from "@/lib/kits/model";
import { uniqueRefusal } from "./errors";
import { db } from "./index";

// Machines, their classes, trailers and their anchor points. Every function takes the
// organisation id and filters on it. This file owns the shapes of a machine, a trailer and
// an anchor point as they are written (…Fields) and read (…Record); lib/kits/assemble.ts
// maps the records to the planner's model.

/** The unique keys of names and labels in the fleet tables, by what they keep apart. */
const NAME_KEYS = {
  machines_org_name: "machine-name",
  trailers_org_name: "trailer-name",
  anchor_points_trailer_label: "anchor-label",
} as const;

/**
 * Which name a unique key refused: a machine's or a trailer's name in the organisation, or an
 * anchor point's label on its trailer (among points in use); null for any other error.
 */
export function nameRefusal(error: unknown): (typeof NAME_KEYS)[keyof typeof NAME_KEYS] | null {
  const key = uniqueRefusal(error)?.key;
  return key && Object.hasOwn(NAME_KEYS, key) ? NAME_KEYS[key as keyof typeof NAME_KEYS] : null;
}

// Settings the fleet screens read

/** The organisation's preferred units (its time zone is organisationClock()'s, lib/organisations/service.ts). */
export async function getUnits(organisationId: string): Promise<UnitSystem> {
  const row = await db("organisations").where({ id: organisationId }).first("units");
  return row?.units === "metric" ? "metric" : "us";
}

export async function setUnits(organisationId: string, units: UnitSystem, trx: Knex): Promise<UnitSystem | undefined> {
  const before = await trx("organisations").where({ id: organisationId }).first("units");
  await trx("organisations").where({ id: organisationId }).update({ units });
  return before?.units;
}

// Machine classes

export async function listMachineClasses(organisationId: string): Promise<{ id: string; name: string }[]> {
  return db("machine_classes").where({ organisation_id: organisationId }).orderByRaw("lower(name)").select("id", "name");
}

export async function insertMachineClass(organisationId: string, name: string, trx: Knex): Promise<string | null> {
  const rows = await trx.raw(
    `INSERT INTO machine_classes (organisation_id, name) VALUES (?, ?) ON CONFLICT (organisation_id, lower(name)) DO NOTHING RETURNING id`,
    [organisationId, name],
  );
  return rows.rows[0]?.id ?? null;
}

export async function machineClassExists(organisationId: string, name: string, trx: Knex = db): Promise<string | null> {
  const row = await trx("machine_classes").where({ organisation_id: organisationId }).whereRaw("lower(name) = lower(?)", [name]).first("name");
  return row?.name ?? null;
}

// Machines

const MACHINE_COLUMNS = [
  "id", "name", "machine_class as machineClass", "weight_lb as weightLb", "length_mm as lengthMm", "width_mm as widthMm",
  "height_mm as heightMm", "articulated", "accessories", "tiedown_points as tiedownPoints", "cg_from_front_mm as cgFromFrontMm",
];

/** A tie-down point on a machine, measured from the machine's front (kept in the machine's row). */
export interface MachinePointFields {
  label: string;
  side: Side;
  positionMm: number;
}

/** What a machine's details decide: whole pounds and millimetres. */
export interface MachineFields {
  name: string;
  /** A built-in class key (lib/kits/model.ts) or the organisation's own class name. */
  machineClass: string;
  weightLb: number;
  lengthMm: number;
  widthMm: number | null;
  heightMm: number | null;
  articulated: boolean;
  accessories: string[];
  tiedownPoints: MachinePointFields[];
  cgFromFrontMm: number | null;
}

/** A machine as every query answers it. */
export interface MachineRecord extends MachineFields {
  id: string;
}

function machineColumns(m: MachineFields) {
  return {
    name: m.name,
    machine_class: m.machineClass,
    weight_lb: m.weightLb,
    length_mm: m.lengthMm,
    width_mm: m.widthMm,
    height_mm: m.heightMm,
    articulated: m.articulated,
    accessories: JSON.stringify(m.accessories),
    tiedown_points: JSON.stringify(m.tiedownPoints),
    cg_from_front_mm: m.cgFromFrontMm,
  };
}

export async function listMachines(organisationId: string): Promise<MachineRecord[]> {
  return db("machines").where({ organisation_id: organisationId }).orderByRaw("lower(name)").select(MACHINE_COLUMNS);
}

export async function getMachine(organisationId: string, id: string, trx: Knex = db): Promise<MachineRecord | undefined> {
  return trx("machines").where({ organisation_id: organisationId, id }).first(MACHINE_COLUMNS);
}

export async function getMachinesByIds(organisationId: string, ids: string[], trx: Knex = db): Promise<MachineRecord[]> {
  if (!ids.length) return [];
  return trx("machines").where({ organisation_id: organisationId }).whereIn("id", ids).select(MACHINE_COLUMNS);
}

export async function machineNameTaken(organisationId: string, name: string, exceptId: string | null, trx: Knex): Promise<boolean> {
  const q = trx("machines").where({ organisation_id: organisationId }).whereRaw("lower(name) = lower(?)", [name]);
  if (exceptId) q.whereNot("id", exceptId);
  return Boolean(await q.first("id"));
}

export async function insertMachine(organisationId: string, m: MachineFields, trx: Knex): Promise<string> {
  const [row] = await trx("machines").insert({ organisation_id: organisationId, ...machineColumns(m) }).returning("id");
  return row.id;
}

export async function updateMachine(organisationId: string, id: string, m: MachineFields, trx: Knex): Promise<void> {
  await trx("machines").where({ organisation_id: organisationId, id }).update({ ...machineColumns(m), updated_at: trx.fn.now() });
}

/** Locks a machine row for an edit. */
export async function lockMachine(organisationId: string, id: string, trx: Knex): Promise<MachineRecord | undefined> {
  return trx("machines").where({ organisation_id: organisationId, id }).forUpdate().first(MACHINE_COLUMNS);
}

// Trailers

const TRAILER_COLUMNS = [
  "id", "name", "trailer_type as trailerType", "coupling", "deck_length_mm as deckLengthMm", "tilt_length_mm as tiltLengthMm",
  "deck_width_mm as deckWidthMm", "gvwr_lb as gvwrLb", "empty_weight_lb as emptyWeightLb", "empty_tongue_weight_lb as emptyTongueWeightLb",
  "hitch_to_axle_mm as hitchToAxleMm", "hitch_to_deck_front_mm as hitchToDeckFrontMm",
];

/** What a trailer's details decide (its anchor points apart): whole pounds and millimetres. */
export interface TrailerFields {
  name: string;
  trailerType: TrailerType;
  coupling: Coupling;
  deckLengthMm: number;
  tiltLengthMm: number;
  deckWidthMm: number | null;
  gvwrLb: number;
  emptyWeightLb: number;
  emptyTongueWeightLb: number;
  hitchToAxleMm: number;
  hitchToDeckFrontMm: number | null;
}

/** A trailer as every query answers it (its anchor points apart). */
export interface TrailerRecord extends TrailerFields {
  id: string;
}

function trailerColumns(t: TrailerFields) {
  return {
    name: t.name,
    trailer_type: t.trailerType,
    coupling: t.coupling,
    deck_length_mm: t.deckLengthMm,
    tilt_length_mm: t.tiltLengthMm,
    deck_width_mm: t.deckWidthMm,
    gvwr_lb: t.gvwrLb,
    empty_weight_lb: t.emptyWeightLb,
    empty_tongue_weight_lb: t.emptyTongueWeightLb,
    hitch_to_axle_mm: t.hitchToAxleMm,
    hitch_to_deck_front_mm: t.hitchToDeckFrontMm,
  };
}

export async function listTrailers(organisationId: string): Promise<TrailerRecord[]> {
  return db("trailers").where({ organisation_id: organisationId }).orderByRaw("lower(name)").select(TRAILER_COLUMNS);
}

export async function getTrailer(organisationId: string, id: string, trx: Knex = db): Promise<TrailerRecord | undefined> {
  return trx("trailers").where({ organisation_id: organisationId, id }).first(TRAILER_COLUMNS);
}

export async function getTrailersByIds(organisationId: string, ids: string[], trx: Knex = db): Promise<TrailerRecord[]> {
  if (!ids.length) return [];
  return trx("trailers").where({ organisation_id: organisationId }).whereIn("id", ids).select(TRAILER_COLUMNS);
}

export async function lockTrailer(organisationId: string, id: string, trx: Knex): Promise<TrailerRecord | undefined> {
  return trx("trailers").where({ organisation_id: organisationId, id }).forUpdate().first(TRAILER_COLUMNS);
}

export async function trailerNameTaken(organisationId: string, name: string, exceptId: string | null, trx: Knex): Promise<boolean> {
  const q = trx("trailers").where({ organisation_id: organisationId }).whereRaw("lower(name) = lower(?)", [name]);
  if (exceptId) q.whereNot("id", exceptId);
  return Boolean(await q.first("id"));
}

export async function insertTrailer(organisationId: string, t: TrailerFields, trx: Knex): Promise<string> {
  const [row] = await trx("trailers").insert({ organisation_id: organisationId, ...trailerColumns(t) }).returning("id");
  return row.id;
}

export async function updateTrailer(organisationId: string, id: string, t: TrailerFields, trx: Knex): Promise<void> {
  await trx("trailers").where({ organisation_id: organisationId, id }).update({ ...trailerColumns(t), updated_at: trx.fn.now() });
}

// Anchor points

/** What an anchor point's details decide. */
export interface AnchorFields {
  label: string;
  side: Side;
  positionMm: number;
  wllLb: number;
  /** YYYY-MM-DD, or null when no periodic inspection is scheduled. */
  nextInspectionDue: string | null;
}

/** An anchor point as every query answers it, with its standing. */
export interface AnchorRecord extends AnchorFields {
  id: string;
  trailerId: string;
  status: AnchorStatus;
  /** YYYY-MM-DD */
  lastInspectedOn: string | null;
}

/** A change to an anchor point: some of its details, its standing, its inspection dates. */
export type AnchorUpdate = Partial<AnchorFields> & { status?: AnchorStatus; lastInspectedOn?: string | null };

const ANCHOR_COLUMNS = [
  "id", "trailer_id as trailerId", "label", "side", "position_mm as positionMm", "wll_lb as wllLb", "status",
  db.raw("to_char(next_inspection_due, 'YYYY-MM-DD') as \"nextInspectionDue\""),
  db.raw("to_char(last_inspected_on, 'YYYY-MM-DD') as \"lastInspectedOn\""),
];

/** The anchor points of some trailers; retired ones only when asked. */
export async function listAnchorPoints(organisationId: string, trailerIds: string[], options: { withRetired?: boolean } = {}, trx: Knex = db): Promise<AnchorRecord[]> {
  if (!trailerIds.length) return [];
  const q = trx("anchor_points").where({ organisation_id: organisationId }).whereIn("trailer_id", trailerIds);
  if (!options.withRetired) q.whereNot("status", "retired");
  return q.orderBy("position_mm").select(ANCHOR_COLUMNS);
}

export async function getAnchorPoint(organisationId: string, id: string, trx: Knex = db): Promise<AnchorRecord | undefined> {
  return trx("anchor_points").where({ organisation_id: organisationId, id }).first(ANCHOR_COLUMNS);
}

/** Locks an anchor point for a change of standing. */
export async function lockAnchorPoint(organisationId: string, id: string, trx: Knex): Promise<AnchorRecord | undefined> {
  return trx("anchor_points").where({ organisation_id: organisationId, id }).forUpdate().first(ANCHOR_COLUMNS);
}

export async function insertAnchorPoint(organisationId: string, trailerId: string, a: AnchorFields, trx: Knex): Promise<string> {
  const [row] = await trx("anchor_points")
    .insert({ organisation_id: organisationId, trailer_id: trailerId, label: a.label, side: a.side, position_mm: a.positionMm, wll_lb: a.wllLb, next_inspection_due: a.nextInspectionDue })
    .returning("id");
  return row.id;
}

export async function updateAnchorPoint(
  organisationId: string,
  id: string,
  patch: AnchorUpdate,
  trx: Knex,
): Promise<void> {
  await trx("anchor_points")
    .where({ organisation_id: organisationId, id })
    .update({
      ...(patch.label !== undefined && { label: patch.label }),
      ...(patch.side !== undefined && { side: patch.side }),
      ...(patch.positionMm !== undefined && { position_mm: patch.positionMm }),
      ...(patch.wllLb !== undefined && { wll_lb: patch.wllLb }),
      ...(patch.nextInspectionDue !== undefined && { next_inspection_due: patch.nextInspectionDue }),
      ...(patch.status !== undefined && { status: patch.status }),
      ...(patch.lastInspectedOn !== undefined && { last_inspected_on: patch.lastInspectedOn }),
      updated_at: trx.fn.now(),
    });
}

/** A history entry of an anchor point. */
export interface NewAnchorEvent {
  organisationId: string;
  anchorPointId: string;
  type: "created" | "edited" | "inspection" | "tag_out" | "return_to_service" | "retired";
  outcome?: string | null;
  note?: string | null;
  changes?: unknown;
  actorId: string | null;
}

export async function insertAnchorEvent(e: NewAnchorEvent, trx: Knex): Promise<void> {
  await trx("anchor_point_events").insert({
    organisation_id: e.organisationId,
    anchor_point_id: e.anchorPointId,
    type: e.type,
    outcome: e.outcome ?? null,
    note: e.note ?? null,
    changes: e.changes === undefined ? null : JSON.stringify(e.changes),
    actor_id: e.actorId,
  });
}

/** A history entry of an anchor point as it is read, with who made it. */
export interface AnchorEventRecord {
  id: number;
  type: NewAnchorEvent["type"];
  outcome: string | null;
  note: string | null;
  changes: unknown;
  at: Date;
  actorName: string | null;
}

/** An anchor point's history, newest first. */
export async function listAnchorEvents(organisationId: string, anchorPointId: string): Promise<AnchorEventRecord[]> {
  const rows = await db("anchor_point_events as e")
    .leftJoin("users as u", "u.id", "e.actor_id")
    .where({ "e.organisation_id": organisationId, "e.anchor_point_id": anchorPointId })
    .orderBy("e.id", "desc")
    .select("e.id", "e.type", "e.outcome", "e.note", "e.changes", "e.at", "u.name as actorName");
  return rows.map((r) => ({ ...r, id: Number(r.id) }));
}

/** The latest history entry of each anchor point of a trailer (what took it out of use, and when). */
export async function latestAnchorEvents(organisationId: string, trailerId: string): Promise<Map<string, Pick<AnchorEventRecord, "type" | "note" | "at" | "actorName">>> {
  const rows = await db("anchor_point_events as e")
    .join("anchor_points as a", "a.id", "e.anchor_point_id")
    .leftJoin("users as u", "u.id", "e.actor_id")
    .where({ "e.organisation_id": organisationId, "a.trailer_id": trailerId })
    .distinctOn("e.anchor_point_id")
    .orderBy([{ column: "e.anchor_point_id" }, { column: "e.id", order: "desc" }])
    .select("e.anchor_point_id as anchorPointId", "e.type", "e.note", "e.at", "u.name as actorName");
  return new Map(rows.map((r) => [r.anchorPointId, { type: r.type, note: r.note, at: r.at, actorName: r.actorName }]));
}
