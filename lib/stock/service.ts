import "server-only";
import type { Tx } from "@/db";
import { audited } from "@/db/audit";
import type { AuditAction } from "@/lib/audit/actions";
import * as items from "@/db/items";
import type { Principal } from "@/lib/auth/session";
import { can, type Permission } from "@/lib/auth/roles";
import { AppError, badRequest, conflict, fieldError, forbidden, notFound } from "@/lib/http/errors";
import { inspectionIntervals, organisationClock } from "@/lib/organisations/service";
import { queueTagOutMail } from "@/lib/reminders/tag-out";
import { removeStored, storeUpload, type StoredFile } from "@/lib/storage/files";
import type { FilePurpose } from "@/lib/storage/file-type";
import { preUseOutcome, type CheckAnswer } from "./checklists";
import { evaluateMeasurements, verdictProblem, type InspectionVerdict } from "./inspection";
import { nextDue } from "./intervals";
import { itemChanges } from "./changes";
import { itemFields } from "./item-fields";
import type { ItemInput } from "./schemas";
import { nextStatus, type StatusChange } from "./status";
import { freshTagCodes } from "./tag-codes";
import { VERDICT_WORDS } from "./usability";
import { itemVerdict } from "./verdict";

// Everything that changes stock goes through here: permission, organisation, business rule,
// then one transaction that writes the item, its history event and an audit row.

/** Refuses with 403 unless the actor holds the permission. */
function mustBeAllowed(actor: Principal, permission: Permission) {
  if (!can(actor, permission)) throw forbidden();
}

async function checkReferences(actor: Principal, input: ItemInput, exceptId: string | undefined, trx: Tx) {
  if (input.yardId && !(await items.yardBelongs(actor.organisationId, input.yardId, trx))) {
    throw fieldError("yardId", "Choose a yard from the list.");
  }
  if (input.serial && (await items.serialTaken(actor.organisationId, input.serial, exceptId, trx))) {
    throw conflict("Another item already has this serial or lot.", [{ path: "serial", message: "Another item already has this serial or lot." }]);
  }
}

export async function createItem(actor: Principal, input: ItemInput): Promise<string> {
  mustBeAllowed(actor, "stock.edit");
  const intervals = await inspectionIntervals(actor.organisationId);
  const { today } = await organisationClock(actor.organisationId);
  return audited(actor, async (trx, audit) => {
    await checkReferences(actor, input, undefined, trx);
    const row = itemFields(input);
    const [tagCode] = await freshTagCodes(1, trx);
    const [id] = await items.insertItems(
      [{ ...row, organisationId: actor.organisationId, tagCode, status: "in_service", nextInspectionDue: nextDue(input.inServiceOn ?? today, intervals[input.kind]) }],
      trx,
    );
    await items.insertEvents([{ organisationId: actor.organisationId, itemId: id, type: "created", actorId: actor.userId, note: "Added to stock" }], trx);
    await audit({ action: "item.created", entity: "item", entityId: id, after: row });
    return id;
  });
}

export async function editItem(actor: Principal, id: string, input: ItemInput): Promise<void> {
  mustBeAllowed(actor, "stock.edit");
  await audited(actor, async (trx, audit) => {
    const before = await items.getItem(actor.organisationId, id, trx);
    if (!before) throw notFound("No such item in your stock.");
    if (before.kind !== input.kind) throw fieldError("kind", "The kind of an item cannot change; add a new item instead.");
    await checkReferences(actor, input, id, trx);
    const row = itemFields(input);
    await items.updateItem(actor.organisationId, id, row, trx);
    const after = (await items.getItem(actor.organisationId, id, trx))!;
    const changes = itemChanges(before, after);
    if (Object.keys(changes).length === 0) return;
    await items.insertEvents([{ organisationId: actor.organisationId, itemId: id, type: "edited", actorId: actor.userId, changes }], trx);
    await audit({ action: "item.updated", entity: "item", entityId: id, before, after });
  });
}

export async function moveItems(actor: Principal, itemIds: string[], yardId: string): Promise<number> {
  mustBeAllowed(actor, "stock.edit");
  return audited(actor, async (trx, audit) => {
    const yard = await items.getYard(actor.organisationId, yardId, trx);
    if (!yard) throw fieldError("yardId", "Choose a yard from the list.");
    // One read and one update for the whole selection; ids of other organisations drop out here.
    const toMove = (await items.getItemsByIds(actor.organisationId, itemIds, trx)).filter((i) => i.yardId !== yardId);
    if (toMove.length) await items.setYard(actor.organisationId, toMove.map((i) => i.id), yardId, trx);
    await items.insertEvents(
      toMove.map((before) => ({ organisationId: actor.organisationId, itemId: before.id, type: "moved", actorId: actor.userId, changes: { yardName: [before.yardName, yard.name] } })),
      trx,
    );
    const moved = toMove.length;
    await audit({ action: "items.moved", entity: "yard", entityId: yardId, after: { itemIds, moved } });
    return moved;
  });
}

/**
 * Stores an optional file, then runs the database work; when that fails, the stored file is
 * removed again, so a failure leaves neither a record nor an orphaned file.
 */
async function withUpload<T>(
  actor: Principal,
  file: File | null | undefined,
  purpose: FilePurpose,
  field: string,
  work: (stored: StoredFile | null) => Promise<T>,
): Promise<T> {
  const stored = file && file.size > 0 ? await storeUpload(actor.organisationId, purpose, file, field) : null;
  try {
    return await work(stored);
  } catch (error) {
    if (stored) await removeStored(stored.storageKey).catch(() => undefined);
    throw error;
  }
}

async function changeStatus(trx: Tx, actor: Principal, id: string, change: StatusChange) {
  const item = await items.lockItem(actor.organisationId, id, trx);
  if (!item) throw notFound("No such item in your stock.");
  const next = nextStatus(item.status, change);
  if ("error" in next) throw new AppError(409, next.error);
  return { item, status: next.status };
}

/** The item of the organisation and its checklist's answers read: the outcome, or a 400 naming the answers. */
async function checklistOf(actor: Principal, id: string, answers: CheckAnswer[]) {
  const current = await itemOf(actor, id);
  const outcome = preUseOutcome(current.kind, answers);
  if ("error" in outcome) throw badRequest(outcome.error, [{ path: `answers.${outcome.point}`, message: outcome.error }]);
  return { current, outcome };
}

/**
 * A pre-use check is for gear that may be used: an item whose verdict says no (tagged out,
 * overdue for inspection, not rated…) is refused with 409 and the reasons, and the words
 * say what to do instead. A pass must never read as leave to use it.
 */
async function mustBeUsable(actor: Principal, item: items.ItemRecord) {
  const verdict = itemVerdict(item, await organisationClock(actor.organisationId));
  if (verdict.ok) return;
  throw new AppError(409, `Do not use this item, and do not check it: ${verdict.reasons.map((r) => r.message).join(" ")} ${VERDICT_WORDS.setAside}`, [], {
    code: "NOT_USABLE",
    reasons: verdict.reasons,
  });
}

/** The item of the actor's organisation, or a 404. */
async function itemOf(actor: Principal, id: string): Promise<items.ItemRecord> {
  const item = await items.getItem(actor.organisationId, id);
  if (!item) throw notFound("No such item in your stock.");
  return item;
}

export interface PreUseCheckInput {
  answers: CheckAnswer[];
  note?: string;
  photo?: File | null;
}

/**
 * The yard hand's pre-use check. A pass is recorded; any defect records the failed check,
 * tags the item out at once and e-mails the owners.
 */
export async function recordPreUseCheck(actor: Principal, id: string, input: PreUseCheckInput) {
  mustBeAllowed(actor, "items.check");
  await mustBeUsable(actor, await itemOf(actor, id));
  const { current, outcome } = await checklistOf(actor, id, input.answers);
  if (outcome.outcome === "fail" && !input.note?.trim() && !(input.photo && input.photo.size > 0)) {
    throw fieldError("note", "Say what is wrong, or add a photo, so the owner can judge the damage.");
  }
  const result = await withUpload(actor, input.photo, "damage-photo", "photo", (stored) =>
    audited(actor, async (trx, audit) => {
      const { status } = await changeStatus(trx, actor, id, outcome.outcome === "pass" ? "check_pass" : "check_fail");
      const check = { organisationId: actor.organisationId, itemId: id, type: "check", outcome: outcome.outcome, checklist: outcome.checklist, note: input.note?.trim() || null, actorId: actor.userId };
      const tagOut = { organisationId: actor.organisationId, itemId: id, type: "tag_out", actorId: actor.userId, note: "Tagged out by a failed pre-use check" };
      const [eventId, tagOutId] = await items.insertEvents(outcome.outcome === "fail" ? [check, tagOut] : [check], trx);
      if (stored) await items.insertAttachment({ organisationId: actor.organisationId, itemId: id, eventId, purpose: "damage-photo", ...stored, createdBy: actor.userId }, trx);
      await items.updateItem(actor.organisationId, id, { status, checked: outcome.outcome }, trx);
      await audit({ action: outcome.outcome === "pass" ? "item.check_pass" : "item.check_fail", entity: "item", entityId: id, after: { status } });
      if (outcome.outcome === "fail") {
        await queueTagOutMail(trx, { organisationId: actor.organisationId, eventId: tagOutId!, reporterName: actor.name, item: current, defects: outcome.defects, note: input.note?.trim() || null });
      }
      return { outcome: outcome.outcome, status, defects: outcome.defects };
    }),
  );
  return result;
}

/** Report damage outside a check: tags the item out at once. */
export async function tagOut(actor: Principal, id: string, input: { note: string; photo?: File | null }) {
  mustBeAllowed(actor, "items.check");
  const current = await itemOf(actor, id);
  await withUpload(actor, input.photo, "damage-photo", "photo", (stored) =>
    audited(actor, async (trx, audit) => {
      const { status } = await changeStatus(trx, actor, id, "tag_out");
      const [eventId] = await items.insertEvents([{ organisationId: actor.organisationId, itemId: id, type: "tag_out", note: input.note, actorId: actor.userId }], trx);
      if (stored) await items.insertAttachment({ organisationId: actor.organisationId, itemId: id, eventId, purpose: "damage-photo", ...stored, createdBy: actor.userId }, trx);
      await items.updateItem(actor.organisationId, id, { status }, trx);
      await audit({ action: "item.tagged_out", entity: "item", entityId: id, after: { status, note: input.note } });
      await queueTagOutMail(trx, { organisationId: actor.organisationId, eventId, reporterName: actor.name, item: current, defects: [], note: input.note });
    }),
  );
}

export interface InspectionInput {
  answers: CheckAnswer[];
  measurements: Record<string, number | undefined>;
  verdict: InspectionVerdict;
  note?: string;
  certificate?: File | null;
}

/** Periodic inspection by an owner or designated person. */
export async function recordInspection(actor: Principal, id: string, input: InspectionInput) {
  mustBeAllowed(actor, "items.inspect");
  const { current, outcome } = await checklistOf(actor, id, input.answers);
  const kind = current.kind;
  const measured = evaluateMeasurements(kind, current.size, input.measurements);
  const problem = verdictProblem(input.verdict, outcome.defects.length, measured);
  if (problem) throw fieldError("verdict", problem);
  const intervals = await inspectionIntervals(actor.organisationId);
  const { today } = await organisationClock(actor.organisationId);
  const change: StatusChange = input.verdict === "in_service" ? "inspect_in_service" : input.verdict === "repair" ? "inspect_repair" : "inspect_retire";
  return withUpload(actor, input.certificate, "certificate", "certificate", (stored) =>
    audited(actor, async (trx, audit) => {
      const { status } = await changeStatus(trx, actor, id, change);
      const [eventId] = await items.insertEvents(
        [{ organisationId: actor.organisationId, itemId: id, type: "inspection", outcome: input.verdict, checklist: outcome.checklist, measurements: measured, note: input.note?.trim() || null, actorId: actor.userId }],
        trx,
      );
      if (stored) await items.insertAttachment({ organisationId: actor.organisationId, itemId: id, eventId, purpose: "certificate", ...stored, createdBy: actor.userId }, trx);
      await items.updateItem(
        actor.organisationId,
        id,
        { status, lastInspectedOn: today, nextInspectionDue: input.verdict === "retire" ? null : nextDue(today, intervals[kind]) },
        trx,
      );
      await audit({ action: "item.inspected", entity: "item", entityId: id, after: { status, verdict: input.verdict } });
      return { status, measured };
    }),
  );
}

/** Simple status changes that need a reason in words. */
export async function changeWithReason(
  actor: Principal,
  id: string,
  change: "return_to_service" | "retire" | "lost" | "found",
  reason: string,
) {
  const permission: Record<typeof change, Permission> = {
    return_to_service: "items.inspect",
    retire: "stock.retire",
    lost: "stock.edit",
    found: "stock.edit",
  };
  mustBeAllowed(actor, permission[change]);
  const recorded = {
    return_to_service: { event: "return_to_service", audit: "item.return_to_service" },
    retire: { event: "retired", audit: "item.retired" },
    lost: { event: "lost", audit: "item.lost" },
    found: { event: "found", audit: "item.found" },
  } as const satisfies Record<typeof change, { event: string; audit: AuditAction }>;
  const { event: eventType, audit: auditAction } = recorded[change];
  await audited(actor, async (trx, audit) => {
    const { status } = await changeStatus(trx, actor, id, change);
    await items.insertEvents([{ organisationId: actor.organisationId, itemId: id, type: eventType, note: reason, actorId: actor.userId }], trx);
    await items.updateItem(actor.organisationId, id, { status }, trx);
    await audit({ action: auditAction, entity: "item", entityId: id, after: { status, reason } });
  });
}

/** History is never edited: a mistake is answered by a correction event that points at it. */
export async function correctEvent(actor: Principal, itemId: string, eventId: number, note: string) {
  mustBeAllowed(actor, "items.check");
  await audited(actor, async (trx, audit) => {
    if (!(await items.eventExists(actor.organisationId, itemId, eventId, trx))) throw notFound("No such event on this item.");
    await items.insertEvents([{ organisationId: actor.organisationId, itemId, type: "correction", correctsEventId: eventId, note, actorId: actor.userId }], trx);
    await audit({ action: "item.event_corrected", entity: "item", entityId: itemId, after: { eventId, note } });
  });
}

/** A maker's certificate or other document kept with the item. */
export async function attachCertificate(actor: Principal, id: string, file: File) {
  mustBeAllowed(actor, "stock.edit");
  await itemOf(actor, id);
  await withUpload(actor, file, "certificate", "certificate", async (stored) => {
    if (!stored) throw fieldError("certificate", "Choose a file.");
    await audited(actor, async (trx, audit) => {
      await items.insertAttachment({ organisationId: actor.organisationId, itemId: id, eventId: null, purpose: "certificate", ...stored, createdBy: actor.userId }, trx);
      await audit({ action: "item.certificate_added", entity: "item", entityId: id, after: { name: stored.originalName } });
    });
  });
}
