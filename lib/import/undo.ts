import "server-only";
import { audited } from "@/db/audit";
import * as imports from "@/db/imports";
import { insertEvents, listYards, updateItem, type ItemEventInput } from "@/db/items";
import type { Principal } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { conflict, forbidden, notFound } from "@/lib/http/errors";
import { itemChanges } from "@/lib/stock/changes";
import { IMPORT_CHUNK_ROWS } from "./commit";

/**
 * Undoes an import while none of its items has been used since (no history entry after the
 * import's own).
 *
 * Why items are retired, not deleted: item history is append-only (a trigger refuses any
 * UPDATE or DELETE on item_events), so an item's 'imported' entry can never be removed, and an
 * item with history cannot be deleted either. Undo therefore retires every item the import
 * added, with a 'retired' entry noting "Import undone", and frees its serial so that the
 * corrected file can be imported again; the tags were never used, and the record of what
 * happened stays. Items the import updated get their previous values back, with an 'edited'
 * entry.
 */
export async function undoImport(actor: Principal, batchId: string): Promise<{ retired: number; restored: number }> {
  if (!can(actor, "stock.import")) throw forbidden();
  return audited(actor, async (trx, audit) => {
    const batch = await imports.lockBatch(actor.organisationId, batchId, trx);
    if (!batch) throw notFound("No such import.");
    if (batch.status === "undone") throw conflict("This import has been undone already.");
    if (batch.status !== "committed") throw conflict("This import is still running.");
    if (Number(batch.created) + Number(batch.updated) === 0) throw conflict("Nothing to undo: the import changed no items.");
    const later = batch.lastEventId == null ? undefined : await imports.laterEvent(actor.organisationId, batchId, Number(batch.lastEventId), trx);
    if (later) throw conflict(undoBlockedMessage(later));
    const retired = await imports.retireBatchItems(trx, actor.organisationId, batchId, actor.userId);
    const updates = await imports.updatesOf(trx, batchId);
    const yards = new Map((await listYards(actor.organisationId)).map((y) => [y.id, y.name]));
    const yardName = (id: string | null | undefined) => (id ? (yards.get(id) ?? null) : null);
    const events: ItemEventInput[] = [];
    for (const { itemId, before, after } of updates) {
      await updateItem(actor.organisationId, itemId, { ...before, details: before.details ?? {} }, trx);
      // from what the import wrote back to what it replaced
      const changes = itemChanges({ ...after, yardName: yardName(after.yardId) }, { ...before, yardName: yardName(before.yardId) });
      events.push({ organisationId: actor.organisationId, itemId, type: "edited", note: "Import undone", changes, actorId: actor.userId });
    }
    for (let i = 0; i < events.length; i += IMPORT_CHUNK_ROWS) await insertEvents(events.slice(i, i + IMPORT_CHUNK_ROWS), trx);
    await imports.markUndone(trx, batchId, actor.userId);
    await audit({ action: "items.import_undone", entity: "import_batch", entityId: batchId, after: { retired, restored: updates.length } });
    return { retired, restored: updates.length };
  });
}

const EVENT_WORDS: Record<string, string> = {
  check: "a pre-use check", inspection: "an inspection", tag_out: "a tag-out", moved: "a move", edited: "an edit",
  retired: "a retirement", lost: "a loss report", found: "a found report", correction: "a correction", return_to_service: "a return to service", imported: "another import",
};

export function undoBlockedMessage(later: { type: string; tagCode: string }): string {
  return `Item ${later.tagCode} has ${EVENT_WORDS[later.type] ?? "a history entry"} recorded since this import, so the import can no longer be undone. Change or retire its items one by one instead.`;
}

/** Whether a batch can be undone now, and if not, why in words. */
export async function undoState(organisationId: string, batch: imports.BatchRow): Promise<{ canUndo: boolean; reason: string | null }> {
  if (batch.status === "undone") return { canUndo: false, reason: "Undone." };
  if (batch.status === "running") return { canUndo: false, reason: "Still running." };
  if (batch.created + batch.updated === 0) return { canUndo: false, reason: "Nothing to undo: the import changed no items." };
  const later = batch.lastEventId == null ? undefined : await imports.laterEvent(organisationId, batch.id, batch.lastEventId);
  return later ? { canUndo: false, reason: undoBlockedMessage(later) } : { canUndo: true, reason: null };
}
