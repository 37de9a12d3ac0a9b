import "server-only";
import type { Tx } from "@/db";
import { audited } from "@/db/audit";
import * as fleet from "@/db/fleet";
import { can, type Permission } from "@/lib/auth/roles";
import type { Principal } from "@/lib/auth/session";
import { AppError, conflict, fieldError, forbidden, notFound } from "@/lib/http/errors";
import type { AuditAction } from "@/lib/audit/actions";
import { inspectionIntervals, organisationClock } from "@/lib/organisations/service";
import { nextDue } from "@/lib/stock/intervals";
import { machineClassLabel } from "./answers";
import { toMachine, toTrailer } from "./assemble";
import type { UnitSystem } from "./display";
import { MACHINE_CLASSES, type AnchorStatus, type Machine, type Trailer } from "./model";
import type { AnchorEventInput, MachineInput, TrailerInput } from "./schemas";

// Machines, machine classes, trailers and anchor points: permission, organisation, rule,
// then one transaction that writes the change, its history and an audit row.

function require(actor: Principal, permission: Permission) {
  if (!can(actor, permission)) throw forbidden();
}

export async function setUnitsPreference(actor: Principal, units: UnitSystem): Promise<void> {
  require(actor, "settings.manage");
  await audited(actor, async (trx, audit) => {
    const before = await fleet.setUnits(actor.organisationId, units, trx);
    await audit({ action: "organisation.units_updated", entity: "organisation", entityId: actor.organisationId, before: { units: before }, after: { units } });
  });
}

// Machine classes

/** The built-in class a name stands for ("Mini excavator" → "mini-excavator"), or null. */
function builtInClass(name: string): string | null {
  const key = name.toLowerCase().replace(/\s+/g, "-");
  return (MACHINE_CLASSES as readonly string[]).includes(key) ? key : null;
}

/** Built-in classes and the organisation's own, as choices for the machine form. */
export async function machineClassChoices(organisationId: string): Promise<{ value: string; label: string; own: boolean }[]> {
  const own = await fleet.listMachineClasses(organisationId);
  return [
    ...MACHINE_CLASSES.filter((c) => c !== "other").map((c) => ({ value: c, label: machineClassLabel(c), own: false })),
    ...own.map((c) => ({ value: c.name, label: c.name, own: true })),
    { value: "other", label: machineClassLabel("other"), own: false },
  ];
}

export async function addMachineClass(actor: Principal, name: string): Promise<{ name: string; created: boolean }> {
  require(actor, "settings.manage");
  if (builtInClass(name)) {
    throw conflict(`"${name}" is already a built-in class.`, [{ path: "name", message: `"${name}" is already a built-in class.` }]);
  }
  return audited(actor, async (trx, audit) => {
    const id = await fleet.insertMachineClass(actor.organisationId, name, trx);
    if (!id) return { name: (await fleet.machineClassExists(actor.organisationId, name, trx)) ?? name, created: false };
    await audit({ action: "machine_class.created", entity: "machine_class", entityId: id, after: { name } });
    return { name, created: true };
  });
}

/** The stored class of a machine: a built-in key, or the organisation's own name as first written. */
async function resolveClass(organisationId: string, given: string, trx: Tx): Promise<string> {
  const key = builtInClass(given);
  if (key) return key;
  const own = await fleet.machineClassExists(organisationId, given, trx);
  if (own) return own;
  throw fieldError("class", `"${given}" is not a machine class here: choose one from the list, or ask an owner to add it.`);
}

// Machines

export async function listMachines(organisationId: string): Promise<Machine[]> {
  return (await fleet.listMachines(organisationId)).map(toMachine);
}

export async function getMachine(organisationId: string, id: string): Promise<Machine> {
  const row = await fleet.getMachine(organisationId, id);
  if (!row) throw notFound("No such machine.");
  return toMachine(row);
}

export async function createMachine(actor: Principal, input: MachineInput): Promise<string> {
  require(actor, "fleet.manage");
  return withLabelGuard(() =>
    audited(actor, async (trx, audit) => {
      const machineClass = await resolveClass(actor.organisationId, input.machineClass, trx);
      if (await fleet.machineNameTaken(actor.organisationId, input.name, null, trx)) throw nameTaken("machine");
      const row = { ...input, machineClass };
      const id = await fleet.insertMachine(actor.organisationId, row, trx);
      await audit({ action: "machine.created", entity: "machine", entityId: id, after: row });
      return id;
    }),
  );
}

export async function editMachine(actor: Principal, id: string, input: MachineInput): Promise<void> {
  require(actor, "fleet.manage");
  await audited(actor, async (trx, audit) => {
    const before = await fleet.lockMachine(actor.organisationId, id, trx);
    if (!before) throw notFound("No such machine.");
    const machineClass = await resolveClass(actor.organisationId, input.machineClass, trx);
    if (await fleet.machineNameTaken(actor.organisationId, input.name, id, trx)) throw nameTaken("machine");
    const row = { ...input, machineClass };
    await fleet.updateMachine(actor.organisationId, id, row, trx);
    await audit({ action: "machine.updated", entity: "machine", entityId: id, before, after: row });
  });
}

function nameTaken(what: "machine" | "trailer") {
  const message = `Another ${what} already has this name.`;
  return conflict(message, [{ path: "name", message }]);
}

// Trailers

export async function listTrailers(organisationId: string, on: string): Promise<Trailer[]> {
  const rows = await fleet.listTrailers(organisationId);
  const anchors = await fleet.listAnchorPoints(organisationId, rows.map((r) => r.id));
  return rows.map((r) => toTrailer(r, anchors, on));
}

/** A trailer with its anchor points in use or out of use (retired ones when asked), judged for a day. */
export async function getTrailer(organisationId: string, id: string, on: string, options: { withRetired?: boolean } = {}): Promise<Trailer> {
  const row = await fleet.getTrailer(organisationId, id);
  if (!row) throw notFound("No such trailer.");
  return toTrailer(row, await fleet.listAnchorPoints(organisationId, [id], options), on);
}

function trailerRow(input: TrailerInput): fleet.TrailerFields {
  const { anchorPoints: _a, ...row } = input;
  return row;
}

export async function createTrailer(actor: Principal, input: TrailerInput): Promise<string> {
  require(actor, "fleet.manage");
  if (input.anchorPoints.some((a) => a.id)) {
    const i = input.anchorPoints.findIndex((a) => a.id);
    throw fieldError(`anchorPoints.${i}.id`, "A new trailer's anchor points have no ids yet; leave the id out.");
  }
  return withLabelGuard(() =>
    audited(actor, async (trx, audit) => {
      if (await fleet.trailerNameTaken(actor.organisationId, input.name, null, trx)) throw nameTaken("trailer");
      const id = await fleet.insertTrailer(actor.organisationId, trailerRow(input), trx);
      for (const a of input.anchorPoints) {
        const anchorId = await fleet.insertAnchorPoint(actor.organisationId, id, a, trx);
        await fleet.insertAnchorEvent({ organisationId: actor.organisationId, anchorPointId: anchorId, type: "created", actorId: actor.userId }, trx);
      }
      await audit({ action: "trailer.created", entity: "trailer", entityId: id, after: input });
      return id;
    }),
  );
}

const ANCHOR_TRACKED = ["label", "side", "positionMm", "wllLb", "nextInspectionDue"] as const;

/**
 * Replaces the trailer's details and its list of anchor points: points sent with their id
 * are kept (and updated), new ones are created, points left out are retired (never
 * deleted: kits refer to them), each with its history entry.
 */
export async function editTrailer(actor: Principal, id: string, input: TrailerInput): Promise<{ retired: string[] }> {
  require(actor, "fleet.manage");
  return withLabelGuard(() =>
    audited(actor, async (trx, audit) => {
      const before = await fleet.lockTrailer(actor.organisationId, id, trx);
      if (!before) throw notFound("No such trailer.");
      if (await fleet.trailerNameTaken(actor.organisationId, input.name, id, trx)) throw nameTaken("trailer");
      const current = await fleet.listAnchorPoints(actor.organisationId, [id], { withRetired: true }, trx);
      const byId = new Map(current.map((a) => [a.id, a]));
      input.anchorPoints.forEach((a, i) => {
        if (!a.id) return;
        const known = byId.get(a.id);
        if (!known) throw fieldError(`anchorPoints.${i}.id`, "This anchor point is not on this trailer; leave the id out to add a new one.");
        if (known.status === "retired") throw fieldError(`anchorPoints.${i}.id`, `Anchor point ${known.label} is retired; add a new one instead.`);
      });
      await fleet.updateTrailer(actor.organisationId, id, trailerRow(input), trx);

      // Retire the points left out first, so that a new point may take a freed label.
      const kept = new Set(input.anchorPoints.map((a) => a.id).filter(Boolean));
      const retired: string[] = [];
      for (const a of current) {
        if (a.status === "retired" || kept.has(a.id)) continue;
        await fleet.updateAnchorPoint(actor.organisationId, a.id, { status: "retired" }, trx);
        await fleet.insertAnchorEvent({ organisationId: actor.organisationId, anchorPointId: a.id, type: "retired", note: "Removed from the trailer's list of anchor points", actorId: actor.userId }, trx);
        retired.push(a.id);
      }
      for (const a of input.anchorPoints) {
        if (!a.id) {
          const anchorId = await fleet.insertAnchorPoint(actor.organisationId, id, a, trx);
          await fleet.insertAnchorEvent({ organisationId: actor.organisationId, anchorPointId: anchorId, type: "created", actorId: actor.userId }, trx);
          continue;
        }
        const was = byId.get(a.id)!;
        const changes: Record<string, [unknown, unknown]> = {};
        for (const key of ANCHOR_TRACKED) if (was[key] !== a[key]) changes[key] = [was[key], a[key]];
        if (!Object.keys(changes).length) continue;
        await fleet.updateAnchorPoint(actor.organisationId, a.id, a, trx);
        await fleet.insertAnchorEvent({ organisationId: actor.organisationId, anchorPointId: a.id, type: "edited", changes, actorId: actor.userId }, trx);
      }
      await audit({ action: "trailer.updated", entity: "trailer", entityId: id, before: { ...before, anchorPoints: current }, after: input });
      return { retired };
    }),
  );
}

/**
 * Names and labels that the database's unique indexes refuse (two requests at once, or two
 * anchor points swapping labels, which the index checks row by row) become 409s that name
 * the field.
 */
async function withLabelGuard<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    const refused = fleet.nameRefusal(error);
    if (refused === "anchor-label") {
      throw conflict("Two anchor points in use would share a label; give each its own.", [{ path: "anchorPoints", message: "Two anchor points in use would share a label." }]);
    }
    if (refused === "trailer-name") throw nameTaken("trailer");
    if (refused === "machine-name") throw nameTaken("machine");
    throw error;
  }
}

// Anchor points: a rated part like an item, with its own standing and history

type AnchorChange = { to: AnchorStatus; from: readonly AnchorStatus[]; permission: Permission; action: AuditAction };

function anchorChange(input: AnchorEventInput): AnchorChange {
  switch (input.type) {
    case "inspection":
      return {
        to: input.outcome === "in_service" ? "in_service" : input.outcome === "tag_out" ? "tagged_out" : "retired",
        from: ["in_service", "tagged_out"],
        permission: "items.inspect",
        action: "anchor_point.inspected",
      };
    case "tag_out":
      // Anyone who finds a bent or overloaded point takes it out of use, like an item (49 CFR 393.104(b)).
      return { to: "tagged_out", from: ["in_service"], permission: "items.check", action: "anchor_point.tagged_out" };
    case "return_to_service":
      return { to: "in_service", from: ["tagged_out"], permission: "items.inspect", action: "anchor_point.returned_to_service" };
    case "retired":
      return { to: "retired", from: ["in_service", "tagged_out"], permission: "fleet.manage", action: "anchor_point.retired" };
  }
}

const ANCHOR_WHY_NOT: Record<AnchorStatus, string> = {
  in_service: "This anchor point is in use.",
  tagged_out: "This anchor point is out of use: an owner or designated person inspects it or returns it to use.",
  retired: "This anchor point is retired.",
};

/** Inspects an anchor point, takes it out of use, returns it to use, or retires it. */
export async function recordAnchorEvent(actor: Principal, anchorPointId: string, input: AnchorEventInput): Promise<{ status: AnchorStatus; trailerId: string }> {
  const change = anchorChange(input);
  require(actor, change.permission);
  const { today } = await organisationClock(actor.organisationId);
  const intervals = await inspectionIntervals(actor.organisationId);
  return audited(actor, async (trx, audit) => {
    const anchor = await fleet.lockAnchorPoint(actor.organisationId, anchorPointId, trx);
    if (!anchor) throw notFound("No such anchor point.");
    if (!change.from.includes(anchor.status)) throw new AppError(409, ANCHOR_WHY_NOT[anchor.status]);
    const note = input.type === "tag_out" ? input.note : input.type === "inspection" ? (input.note ?? null) : input.reason;
    if (input.type === "inspection") {
      // A trailer's anchor points are rated hardware: the organisation's interval for other
      // rated items applies (ASME B30.26's yearly periodic inspection by default).
      const due = change.to === "retired" ? null : (input.nextInspectionDue ?? nextDue(today, intervals["rated-item"]));
      if (due !== null && due <= today) throw fieldError("nextInspectionDue", "The next inspection must fall after today.");
      await fleet.updateAnchorPoint(actor.organisationId, anchorPointId, { status: change.to, lastInspectedOn: today, nextInspectionDue: due }, trx);
    } else {
      await fleet.updateAnchorPoint(actor.organisationId, anchorPointId, { status: change.to }, trx);
    }
    await fleet.insertAnchorEvent({ organisationId: actor.organisationId, anchorPointId, type: input.type, outcome: input.type === "inspection" ? input.outcome : null, note, actorId: actor.userId }, trx);
    await audit({ action: change.action, entity: "anchor_point", entityId: anchorPointId, before: { status: anchor.status }, after: { status: change.to, note } });
    return { status: change.to, trailerId: anchor.trailerId };
  });
}
