import "server-only";
import type { Tx } from "@/db";
import { audited } from "@/db/audit";
import { KIT_STATE_ACTIONS } from "@/lib/audit/actions";
import * as fleet from "@/db/fleet";
import * as items from "@/db/items";
import * as kits from "@/db/kits";
import { can, type Permission } from "@/lib/auth/roles";
import type { Principal } from "@/lib/auth/session";
import { AppError, badRequest, fieldError, forbidden, notFound } from "@/lib/http/errors";
import { nextStatus } from "@/lib/stock/status";
import type { UsabilityReason } from "@/lib/stock/usability";
import { queueTagOutMail } from "@/lib/reminders/tag-out";
import { kitItemJson, kitJson, kitListEntry, type KitJson } from "./answers";
import { toAnchor, toKit, toKitItem } from "./assemble";
import { addDays } from "@/lib/time";
import { compareScan, kitEventNote, transitionRule } from "./lifecycle";
import { cornerPlans, suggestItems, type CornerPlan } from "./matching";
import { MAX_KIT_TIEDOWNS, type Kit, type KitItem } from "./model";
import { kitVerdict, placementFails } from "./plan";
import { PROPOSAL_KINDS, proposalStock, proposeKit, type Proposal } from "./proposal";
import type { KitCreateInput, KitPatchInput, PlacementInput, TiedownInput, TiedownPatchInput, TransitionInput } from "./schemas";

// Kits: building them (draft only), their life from draft to returned, copies. Every change
// locks the kit row first and the item rows next (in id order), then writes the change, the
// history entries and one audit row in the same transaction. The database's unique key on
// (item_id, kit_date) is the last word on "one kit per item per date".

function require(actor: Principal, permission: Permission) {
  if (!can(actor, permission)) throw forbidden();
}

// Reading

/** Whole kits in the model, judged for their own dates, in a few queries whatever their number. */
async function modelsOf(organisationId: string, rows: kits.KitRecord[], trx?: Tx): Promise<Kit[]> {
  if (!rows.length) return [];
  const machineIds = [...new Set(rows.map((r) => r.machineId))];
  const trailerIds = [...new Set(rows.map((r) => r.trailerId))];
  const reads = [
    () => fleet.getMachinesByIds(organisationId, machineIds, trx),
    () => fleet.getTrailersByIds(organisationId, trailerIds, trx),
    () => fleet.listAnchorPoints(organisationId, trailerIds, { withRetired: true }, trx),
    () => kits.listTiedowns(organisationId, rows.map((r) => r.id), trx),
  ] as const;
  // Side by side on the pool; in turn on a transaction, whose one connection runs a query at
  // a time anyway (pg queues the rest, and says that it will refuse to from pg 9).
  const [machines, trailers, anchors, tiedowns] = trx
    ? [await reads[0](), await reads[1](), await reads[2](), await reads[3]()]
    : await Promise.all([reads[0](), reads[1](), reads[2](), reads[3]()]);
  return rows.map((row) => {
    const machine = machines.find((m) => m.id === row.machineId)!;
    const trailer = trailers.find((t) => t.id === row.trailerId)!;
    return toKit(row, machine, trailer, anchors.filter((a) => a.trailerId === row.trailerId), tiedowns.filter((t) => t.kitId === row.id));
  });
}

export async function loadKit(organisationId: string, id: string, trx?: Tx): Promise<Kit | undefined> {
  const row = await kits.getKit(organisationId, id, trx);
  return row ? (await modelsOf(organisationId, [row], trx))[0] : undefined;
}

/** GET /api/v1/kits/{id}: the kit with its check, blockers, practice points and verdict. */
export async function kitAnswer(organisationId: string, id: string): Promise<KitJson> {
  const kit = await loadKit(organisationId, id);
  if (!kit) throw notFound("No such kit.");
  return kitJson(kit);
}

/** Kits from one date to another, each with its verdict. */
export async function listKitEntries(organisationId: string, from: string, to: string) {
  return (await modelsOf(organisationId, await kits.listKits(organisationId, from, to))).map(kitListEntry);
}

// Creating and editing

async function requireMachineAndTrailer(organisationId: string, machineId: string, trailerId: string, trx: Tx) {
  const machine = await fleet.getMachine(organisationId, machineId, trx);
  if (!machine) throw notFound("No such machine.");
  const trailer = await fleet.getTrailer(organisationId, trailerId, trx);
  if (!trailer) throw notFound("No such trailer.");
  return { machine, trailer };
}

export async function createKit(actor: Principal, input: KitCreateInput): Promise<string> {
  require(actor, "fleet.manage");
  return audited(actor, async (trx, audit) => {
    const { machine } = await requireMachineAndTrailer(actor.organisationId, input.machineId, input.trailerId, trx);
    const id = await kits.insertKit(
      actor.organisationId,
      { ...input, site: input.site ?? null, articulationRestrained: machine.articulated ? input.articulationRestrained : false, createdBy: actor.userId },
      trx,
    );
    await audit({ action: "kit.created", entity: "kit", entityId: id, after: input });
    return id;
  });
}

async function lockDraft(actor: Principal, kitId: string, trx: Tx): Promise<kits.KitRecord> {
  const kit = await kits.lockKit(actor.organisationId, kitId, trx);
  if (!kit) throw notFound("No such kit.");
  if (kit.state !== "draft") {
    throw new AppError(409, `The kit is ${kit.state}: put it back to draft to change it.`, [], { code: "KIT_NOT_DRAFT", state: kit.state });
  }
  return kit;
}

/** The job, site and articulation lock of a kit; the lock changes the check, so only in a draft. */
export async function patchKit(actor: Principal, kitId: string, input: KitPatchInput): Promise<void> {
  require(actor, "fleet.manage");
  await audited(actor, async (trx, audit) => {
    const kit = await kits.lockKit(actor.organisationId, kitId, trx);
    if (!kit) throw notFound("No such kit.");
    if (input.articulationRestrained !== undefined && kit.state !== "draft") {
      throw new AppError(409, `The kit is ${kit.state}: put it back to draft to change it.`, [], { code: "KIT_NOT_DRAFT", state: kit.state });
    }
    if (kit.state === "returned") throw new AppError(409, "The kit has been returned; its record stays as it was.", [], { code: "KIT_RETURNED" });
    await kits.updateKit(actor.organisationId, kitId, { job: input.job, site: input.site, articulationRestrained: input.articulationRestrained }, trx);
    await audit({ action: "kit.updated", entity: "kit", entityId: kitId, before: kit, after: input });
  });
}

/** The kit's anchor point, which must be on its trailer and may be used on its date. */
async function requireAnchor(actor: Principal, kit: kits.KitRecord, anchorPointId: string, trx: Tx) {
  const anchor = await fleet.getAnchorPoint(actor.organisationId, anchorPointId, trx);
  if (!anchor) throw notFound("No such anchor point.");
  if (anchor.trailerId !== kit.trailerId) throw fieldError("anchorPointId", "This anchor point is on another trailer; choose one on the kit's trailer.");
  const usable = toAnchor(anchor, kit.date).usable;
  if (!usable.ok) {
    throw new AppError(409, `Anchor point ${anchor.label} may not be used on ${kit.date}. ${usable.reasons.map((r) => r.message).join(" ")}`, [], {
      code: "ANCHOR_NOT_USABLE",
      anchorPointId,
      reasons: usable.reasons,
    });
  }
  return anchor;
}

async function requireSecures(organisationId: string, kit: kits.KitRecord, secures: string, trx: Tx): Promise<string> {
  if (secures.toLowerCase() === "machine") return "machine";
  const machine = await fleet.getMachine(organisationId, kit.machineId, trx);
  const accessory = machine?.accessories.find((a) => a.toLowerCase() === secures.toLowerCase());
  if (!accessory) {
    throw fieldError("secures", `"${secures}" is not on ${machine?.name ?? "the machine"}: use "machine"${machine?.accessories.length ? ` or one of ${machine.accessories.join(", ")}` : ""}.`);
  }
  return accessory;
}

function tooManyTiedowns() {
  return new AppError(409, `A kit holds at most ${MAX_KIT_TIEDOWNS} tiedowns, the most one securement check takes.`, [], { code: "TOO_MANY_TIEDOWNS" });
}

/**
 * Puts items into a tiedown of a locked kit: every item of the organisation, locked, may be
 * used on the kit's date (the usability verdict), and is in no kit that date.
 */
async function putItems(actor: Principal, kit: kits.KitRecord, tiedownId: string, itemIds: string[], trx: Tx): Promise<void> {
  if (!itemIds.length) return;
  const locked = await kits.lockItemsForKit(actor.organisationId, itemIds, trx);
  for (const id of itemIds) {
    const item = locked.find((i) => i.id === id);
    if (!item) throw new AppError(404, "No such item in your stock.", [], { itemId: id });
    const usable = toKitItem(item, kit.date).usable;
    if (!usable.ok) {
      throw new AppError(409, `${item.tagCode} may not be used on ${kit.date}. ${usable.reasons.map((r) => r.message).join(" ")}`, [], {
        code: "ITEM_NOT_USABLE",
        itemId: id,
        reasons: usable.reasons,
      });
    }
  }
  // Under the item locks no other kit can take these items meanwhile; the unique key backs it.
  const held = await kits.kitsHolding(actor.organisationId, itemIds, kit.date, trx);
  if (held.length) throw takenError(held[0]!, kit, locked);
  await kits.insertKitItems(actor.organisationId, { id: kit.id, date: kit.date }, tiedownId, itemIds, trx);
}

function takenError(holder: { itemId: string; kitId: string; job: string }, kit: { id: string; date: string }, known: kits.KitItemRecord[] = []) {
  const tag = known.find((i) => i.id === holder.itemId)?.tagCode ?? "This item";
  const where = holder.kitId === kit.id ? "is already in this kit" : `is already in the kit for ${holder.job} on ${kit.date}`;
  return new AppError(409, `${tag} ${where}.`, [], { code: "ITEM_IN_OTHER_KIT", itemId: holder.itemId, kitId: holder.kitId });
}

/**
 * Runs a kit change; a refusal by the (item_id, kit_date) key, which only a race between two
 * requests reaches past the check in putItems, becomes the same 409 naming the kit that holds it.
 */
async function guardTaken<T>(actor: Principal, kitId: string, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    const taken = kits.itemTakenRefusal(error);
    if (!taken) throw error;
    const kit = await kits.getKit(actor.organisationId, kitId);
    if (taken.itemId && kit) {
      const [holder] = await kits.kitsHolding(actor.organisationId, [taken.itemId], taken.date);
      if (holder) throw takenError(holder, kit, await kits.getItemsForKit(actor.organisationId, [holder.itemId]));
    }
    throw new AppError(409, "An item was taken by another kit at the same moment. Look again and retry.", [], { code: "ITEM_IN_OTHER_KIT" });
  }
}

export async function addTiedown(actor: Principal, kitId: string, input: TiedownInput): Promise<string> {
  require(actor, "fleet.manage");
  return guardTaken(actor, kitId, () =>
    audited(actor, async (trx, audit) => {
      const kit = await lockDraft(actor, kitId, trx);
      const anchor = await requireAnchor(actor, kit, input.anchorPointId, trx);
      const secures = await requireSecures(actor.organisationId, kit, input.secures, trx);
      if ((await kits.countTiedowns(kitId, trx)) >= MAX_KIT_TIEDOWNS) throw tooManyTiedowns();
      const position = await kits.nextTiedownPosition(kitId, trx);
      const label = input.label || input.machinePoint || (secures === "machine" ? `tiedown ${position + 1}` : secures);
      const id = await kits.insertTiedown(actor.organisationId, kitId, { label, anchorPointId: anchor.id, attachment: input.attachment, secures, machinePoint: input.machinePoint ?? null }, position, trx);
      await putItems(actor, kit, id, input.itemIds, trx);
      await audit({ action: "kit.tiedown_added", entity: "kit", entityId: kitId, after: { tiedownId: id, ...input, label, secures } });
      return id;
    }),
  );
}

export async function patchTiedown(actor: Principal, kitId: string, tiedownId: string, input: TiedownPatchInput): Promise<void> {
  require(actor, "fleet.manage");
  await audited(actor, async (trx, audit) => {
    const kit = await lockDraft(actor, kitId, trx);
    const tiedown = (await kits.listTiedowns(actor.organisationId, [kitId], trx)).find((t) => t.id === tiedownId);
    if (!tiedown) throw notFound("No such tiedown in this kit.");
    if (input.anchorPointId) await requireAnchor(actor, kit, input.anchorPointId, trx);
    const secures = input.secures === undefined ? undefined : await requireSecures(actor.organisationId, kit, input.secures, trx);
    await kits.updateTiedown(actor.organisationId, kitId, tiedownId, { ...input, secures }, trx);
    await audit({ action: "kit.tiedown_updated", entity: "kit", entityId: kitId, after: { tiedownId, ...input } });
  });
}

export async function removeTiedown(actor: Principal, kitId: string, tiedownId: string): Promise<void> {
  require(actor, "fleet.manage");
  await audited(actor, async (trx, audit) => {
    await lockDraft(actor, kitId, trx);
    if (!(await kits.deleteTiedown(actor.organisationId, kitId, tiedownId, trx))) throw notFound("No such tiedown in this kit.");
    await audit({ action: "kit.tiedown_removed", entity: "kit", entityId: kitId, after: { tiedownId } });
  });
}

export async function addItems(actor: Principal, kitId: string, tiedownId: string, itemIds: string[]): Promise<void> {
  require(actor, "fleet.manage");
  await guardTaken(actor, kitId, () =>
    audited(actor, async (trx, audit) => {
      const kit = await lockDraft(actor, kitId, trx);
      const tiedown = (await kits.listTiedowns(actor.organisationId, [kitId], trx)).find((t) => t.id === tiedownId);
      if (!tiedown) throw notFound("No such tiedown in this kit.");
      if (tiedown.items.length + itemIds.length > 10) throw fieldError("itemIds", "At most 10 items in one tiedown.");
      await putItems(actor, kit, tiedownId, itemIds, trx);
      await audit({ action: "kit.items_added", entity: "kit", entityId: kitId, after: { tiedownId, itemIds } });
    }),
  );
}

export async function removeItem(actor: Principal, kitId: string, tiedownId: string, itemId: string): Promise<void> {
  require(actor, "fleet.manage");
  await audited(actor, async (trx, audit) => {
    await lockDraft(actor, kitId, trx);
    if (!(await kits.deleteKitItem(actor.organisationId, kitId, tiedownId, itemId, trx))) throw notFound("No such item in this tiedown.");
    await audit({ action: "kit.item_removed", entity: "kit", entityId: kitId, after: { tiedownId, itemId } });
  });
}

// Where the machine sits

/**
 * Saves where the machine sits on the deck (its front, back from the deck front; null takes
 * it away). Only in a draft: a ready kit was checked as it stood, placement included (a
 * placement can fail the kit), so it goes back to draft to be moved, like its tiedowns.
 */
export async function placeKit(actor: Principal, kitId: string, input: PlacementInput): Promise<void> {
  require(actor, "fleet.manage");
  await audited(actor, async (trx, audit) => {
    const kit = await lockDraft(actor, kitId, trx);
    const mm = input.machineFrontFromDeckFrontMm;
    if (mm !== null) {
      const trailer = (await fleet.getTrailer(actor.organisationId, kit.trailerId, trx))!;
      if (mm > trailer.deckLengthMm) {
        throw fieldError("machineFrontFromDeckFront", `The machine's front would sit behind the rear of ${trailer.name}'s deck (${trailer.deckLengthMm} mm long); give a distance from 0 to ${trailer.deckLengthMm} mm.`);
      }
    }
    await kits.updateKit(actor.organisationId, kitId, { machineFrontFromDeckFrontMm: mm }, trx);
    await audit({ action: "kit.placed", entity: "kit", entityId: kitId, before: { machineFrontFromDeckFrontMm: kit.machineFrontFromDeckFrontMm }, after: { machineFrontFromDeckFrontMm: mm } });
  });
}

// A proposed kit

/** The stock a proposal of this kit chooses from, and what it may not use with why (lib/kits/proposal.ts). */
async function stockForProposal(organisationId: string, kit: Kit, trx?: Tx) {
  const rows = await kits.stockWithHoldersOn(organisationId, kit.date, PROPOSAL_KINDS, trx);
  return proposalStock(
    kit.id,
    rows.map(({ holderKitId, holderJob, ...row }) => ({ item: toKitItem(row, kit.date), holder: holderKitId ? { kitId: holderKitId, job: holderJob ?? "another job" } : null })),
  );
}

/** A proposal as the API answers it: the tiedowns (the POST tiedowns body), its check and verdict, what is missing, notes, and the items it names. */
function proposalAnswer(proposal: Proposal, free: readonly KitItem[]) {
  const named = new Set(proposal.tiedowns.flatMap((t) => t.itemIds));
  return {
    tiedowns: proposal.tiedowns,
    check: proposal.check,
    pass: proposal.pass,
    missing: proposal.missing,
    notes: proposal.notes,
    items: free.filter((i) => named.has(i.id)).map(kitItemJson),
  };
}
export type ProposalAnswer = ReturnType<typeof proposalAnswer> & { applied: boolean };

/**
 * "Propose a kit" (lib/kits/proposal.ts) from the gear free and usable on the kit's date.
 * Without `apply` nothing is saved. With `apply`, in one transaction: the draft is locked,
 * the proposal worked out again from the stock as it stands, every item it names locked (in
 * id order, once, so that it never waits in a circle with another kit's change), and the
 * kit's tiedowns replaced through the same path as adding items by hand (usability on the
 * kit's date, no other kit holding the item that day, the (item_id, kit_date) key as the
 * last word): a planner adding one of those items by hand at the same moment either gets it
 * (and the proposal is refused with 409 naming that kit) or is refused. A proposal that does
 * not pass is not saved (409 PROPOSAL_DOES_NOT_PASS, with what is missing).
 */
export async function proposeForKit(actor: Principal, kitId: string, options: { apply: boolean }): Promise<ProposalAnswer> {
  require(actor, "fleet.manage");
  if (!options.apply) {
    const kit = await loadKit(actor.organisationId, kitId);
    if (!kit) throw notFound("No such kit.");
    const { free, unavailable } = await stockForProposal(actor.organisationId, kit);
    return { ...proposalAnswer(proposeKit(kit, free, unavailable), free), applied: false };
  }
  return guardTaken(actor, kitId, () =>
    audited(actor, async (trx, audit) => {
      const row = await lockDraft(actor, kitId, trx);
      const kit = (await modelsOf(actor.organisationId, [row], trx))[0]!;
      const { free, unavailable } = await stockForProposal(actor.organisationId, kit, trx);
      const proposal = proposeKit(kit, free, unavailable);
      if (!proposal.pass) {
        throw new AppError(409, `The proposal does not pass, so it was not saved. ${proposal.missing.join(" ")}`, [], { code: "PROPOSAL_DOES_NOT_PASS", missing: proposal.missing });
      }
      await kits.lockItemsForKit(actor.organisationId, proposal.tiedowns.flatMap((t) => [...t.itemIds]), trx);
      await kits.deleteAllTiedowns(actor.organisationId, kitId, trx);
      for (const [position, t] of proposal.tiedowns.entries()) {
        await requireAnchor(actor, row, t.anchorPointId, trx);
        const id = await kits.insertTiedown(actor.organisationId, kitId, { label: t.label, anchorPointId: t.anchorPointId, attachment: t.attachment, secures: t.secures, machinePoint: t.machinePoint }, position, trx);
        await putItems(actor, row, id, [...t.itemIds], trx);
      }
      const before = kit.tiedowns.map((t) => ({ label: t.label, anchorPointId: t.anchorPointId, itemIds: t.items.map((i) => i.id) }));
      await audit({ action: "kit.proposal_applied", entity: "kit", entityId: kitId, before: { tiedowns: before }, after: { tiedowns: proposal.tiedowns } });
      return { ...proposalAnswer(proposal, free), applied: true };
    }),
  );
}

// Quick building

/** Free items for the kit's date that may be used that day, and those that fit a tiedown. */
export async function freeItems(actor: Principal, kitId: string, options: { forTiedownId?: string; kind?: string }) {
  require(actor, "fleet.view");
  const kit = await loadKit(actor.organisationId, kitId);
  if (!kit) throw notFound("No such kit.");
  const free = (await kits.itemsFreeOn(actor.organisationId, kit.date, { kind: options.kind })).map((i) => toKitItem(i, kit.date)).filter((i) => i.usable.ok);
  const tiedown = options.forTiedownId ? kit.tiedowns.find((t) => t.id === options.forTiedownId) : undefined;
  if (options.forTiedownId && !tiedown) throw notFound("No such tiedown in this kit.");
  const suggestions = tiedown ? suggestItems(tiedown.items, free).map((s) => ({ itemId: s.item.id, reason: s.reason })) : [];
  return { date: kit.date, data: free.map(kitItemJson), suggestions };
}

/**
 * "Use the same for all four corners": copies a tiedown's attachment and sorts of items to
 * the machine's other corners, on free anchor points of the same side, with free items of
 * the same kind, grade and size (lib/kits/matching.ts). Corners that could not be filled
 * are answered with what was missing.
 */
export async function fillCorners(actor: Principal, kitId: string, fromTiedownId: string): Promise<CornerPlan[]> {
  require(actor, "fleet.manage");
  return guardTaken(actor, kitId, () =>
    audited(actor, async (trx, audit) => {
      await lockDraft(actor, kitId, trx);
      const kit = (await loadKit(actor.organisationId, kitId, trx))!;
      const from = kit.tiedowns.find((t) => t.id === fromTiedownId);
      if (!from) throw notFound("No such tiedown in this kit.");
      if (!from.items.length) throw fieldError("fromTiedownId", "Put the items into this tiedown first; its items are what is copied.");
      const free = (await kits.itemsFreeOn(actor.organisationId, kit.date, {}, trx)).map((i) => toKitItem(i, kit.date));
      const plans = cornerPlans(kit, from, free);
      if (kit.tiedowns.length + plans.filter((p) => !p.tiedownId && p.anchorPointId).length > MAX_KIT_TIEDOWNS) throw tooManyTiedowns();
      const stored = (await kits.getKit(actor.organisationId, kitId, trx))!;
      let position = await kits.nextTiedownPosition(kitId, trx);
      for (const plan of plans) {
        if (!plan.anchorPointId) continue;
        const tiedownId =
          plan.tiedownId ??
          (await kits.insertTiedown(actor.organisationId, kitId, { label: plan.label, anchorPointId: plan.anchorPointId, attachment: plan.attachment, secures: "machine", machinePoint: plan.machinePoint }, position++, trx));
        await putItems(actor, stored, tiedownId, [...plan.itemIds], trx);
      }
      await audit({ action: "kit.corners_filled", entity: "kit", entityId: kitId, after: { fromTiedownId, plans } });
      return plans;
    }),
  );
}

// Life of a kit

function itemBrief(i: { id: string; tagCode: string; description: string }) {
  return { id: i.id, tagCode: i.tagCode, description: i.description };
}

/**
 * Takes a kit a step along draft → ready → loaded → returned (or ready → draft):
 * - ready: only when the kit passes (the engine's check and no blocker);
 * - loaded: the yard hand's scan must be exactly the kit's items, and the kit must still
 *   pass on its date (gear tagged out since it was marked ready stops it);
 * - returned: everything must be scanned back (or reported lost); damaged items are tagged
 *   out and lost ones marked lost, in the same transaction.
 * Every step writes an entry into each item's history and an audit row.
 */
export async function transitionKit(actor: Principal, kitId: string, input: TransitionInput): Promise<void> {
  require(actor, "kits.load");
  await audited(actor, async (trx, audit) => {
    const row = await kits.lockKit(actor.organisationId, kitId, trx);
    if (!row) throw notFound("No such kit.");
    const rule = transitionRule(row.state, input.to);
    if ("error" in rule) throw new AppError(409, rule.error, [], { code: "TRANSITION_NOT_ALLOWED", state: row.state });
    require(actor, rule.permission);

    const ids = await kits.kitItemIds(actor.organisationId, kitId, trx);
    const locked = await kits.lockItemsForKit(actor.organisationId, ids, trx);
    const kit = (await modelsOf(actor.organisationId, [row], trx))[0]!;
    const all = kit.tiedowns.flatMap((t) => t.items);

    if (input.to === "ready" || input.to === "loaded") {
      const verdict = kitVerdict(kit);
      if (!verdict.pass) {
        const fails = verdict.check.findings.filter((f) => f.severity === "fail").map((f) => f.message);
        const placement = placementFails(verdict.placement);
        throw new AppError(409, `The kit cannot be ${input.to === "ready" ? "marked ready" : "loaded"}: ${[...verdict.blockers.map((b) => b.message), ...fails, ...placement.map((f) => f.message)].join(" ")}`, [], {
          code: "KIT_DOES_NOT_PASS",
          blockers: verdict.blockers,
          findings: verdict.check.findings.filter((f) => f.severity === "fail"),
          placementFindings: placement,
        });
      }
    }

    if (input.to === "loaded" || input.to === "returned") {
      const lost = new Set(input.lost.map((l) => l.itemId));
      const scanned = input.scannedItemIds ?? [];
      const { missing, unexpected } = compareScan(ids, [...scanned, ...lost]);
      const both = scanned.filter((id) => lost.has(id));
      if (missing.length || unexpected.length || both.length) {
        const strangers = (await kits.getItemsForKit(actor.organisationId, unexpected, trx)).map((i) => toKitItem(i, row.date));
        const named = (list: string[]) =>
          list.map((id) => itemBrief(all.find((i) => i.id === id) ?? strangers.find((i) => i.id === id) ?? { id, tagCode: "unknown", description: "Not an item of your stock" }));
        const parts = [
          missing.length ? `not scanned: ${named(missing).map((i) => i.tagCode).join(", ")}` : "",
          unexpected.length ? `not in this kit: ${named(unexpected).map((i) => i.tagCode).join(", ")}` : "",
          both.length ? `both scanned and reported lost: ${named(both).map((i) => i.tagCode).join(", ")}` : "",
        ].filter(Boolean);
        throw new AppError(409, `The scan does not match the kit (${parts.join("; ")}). The kit stays ${row.state}.`, [], {
          code: "SCAN_MISMATCH",
          missing: named(missing),
          unexpected: named(unexpected),
          both: named(both),
        });
      }
      const notInKit = [...input.damaged, ...input.lost].map((d) => d.itemId).filter((id) => !ids.includes(id));
      if (notInKit.length) throw badRequest("Only items of this kit can be reported damaged or lost.", [{ path: "damaged", message: "Only items of this kit can be reported damaged or lost." }]);
    }

    const note = kitEventNote(row, input.to);
    for (const id of ids) {
      await items.insertEvents([{ organisationId: actor.organisationId, itemId: id, type: "kit", outcome: input.to, note, actorId: actor.userId }], trx);
    }
    for (const d of input.damaged) {
      const item = locked.find((i) => i.id === d.itemId)!;
      const next = nextStatus(item.status, "tag_out");
      if ("error" in next) continue; // already out of use: the kit entry and the note below say it
      const [eventId] = await items.insertEvents([{ organisationId: actor.organisationId, itemId: item.id, type: "tag_out", note: `Reported damaged on return (${row.job}, ${row.date}): ${d.note}`, actorId: actor.userId }], trx);
      await items.updateItem(actor.organisationId, item.id, { status: next.status }, trx);
      await audit({ action: "item.tagged_out", entity: "item", entityId: item.id, after: { status: next.status, note: d.note, kitId } });
      await queueTagOutMail(trx, { organisationId: actor.organisationId, eventId: eventId!, reporterName: actor.name, item, defects: [], note: d.note });
    }
    for (const l of input.lost) {
      const item = locked.find((i) => i.id === l.itemId)!;
      const next = nextStatus(item.status, "lost");
      if ("error" in next) continue;
      await items.insertEvents([{ organisationId: actor.organisationId, itemId: item.id, type: "lost", note: `Not back from ${row.job} (${row.date}): ${l.note}`, actorId: actor.userId }], trx);
      await items.updateItem(actor.organisationId, item.id, { status: next.status }, trx);
      await audit({ action: "item.lost", entity: "item", entityId: item.id, after: { status: next.status, note: l.note, kitId } });
    }
    await kits.updateKit(actor.organisationId, kitId, { state: input.to }, trx);
    await audit({ action: KIT_STATE_ACTIONS[input.to], entity: "kit", entityId: kitId, before: { state: row.state }, after: { state: input.to, scannedItemIds: input.scannedItemIds, damaged: input.damaged, lost: input.lost } });
  });
}

/**
 * A copy of a kit for another date, as a draft: the same machine, trailer and tiedowns; each
 * item only when it may be used on the new date and is in no kit that day. What was left
 * out is answered, with the reason.
 */
export async function copyKit(actor: Principal, kitId: string, input: { date: string; job?: string; site?: string | null }) {
  require(actor, "fleet.manage");
  return guardTaken(actor, kitId, () =>
    audited(actor, async (trx, audit) => {
      const source = await loadKit(actor.organisationId, kitId, trx);
      if (!source) throw notFound("No such kit.");
      const row = (await kits.getKit(actor.organisationId, kitId, trx))!;
      const copyId = await kits.insertKit(
        actor.organisationId,
        {
          date: input.date,
          job: input.job ?? source.job,
          site: input.site === undefined ? source.site : input.site,
          machineId: row.machineId,
          trailerId: row.trailerId,
          articulationRestrained: source.articulationRestrained,
          machineFrontFromDeckFrontMm: source.machineFrontFromDeckFrontMm,
          copiedFrom: kitId,
          createdBy: actor.userId,
        },
        trx,
      );
      const copy = { id: copyId, date: input.date };
      const wanted = source.tiedowns.flatMap((t) => t.items.map((i) => i.id));
      const locked = await kits.lockItemsForKit(actor.organisationId, wanted, trx);
      const held = await kits.kitsHolding(actor.organisationId, wanted, input.date, trx);
      const leftOut: { itemId: string; tagCode: string; description: string; tiedownLabel: string; code: string; reasons: UsabilityReason[] | null; kitId: string | null; message: string }[] = [];
      for (const [position, t] of source.tiedowns.entries()) {
        const tiedownId = await kits.insertTiedown(actor.organisationId, copyId, { label: t.label, anchorPointId: t.anchorPointId, attachment: t.attachment, secures: t.secures, machinePoint: t.machinePoint }, position, trx);
        const keep: string[] = [];
        for (const item of t.items) {
          const stored = locked.find((i) => i.id === item.id)!;
          const usable = toKitItem(stored, input.date).usable;
          const holder = held.find((h) => h.itemId === item.id);
          if (!usable.ok) {
            leftOut.push({ itemId: item.id, tagCode: item.tagCode, description: item.description, tiedownLabel: t.label, code: "ITEM_NOT_USABLE", reasons: usable.reasons, kitId: null, message: usable.reasons.map((r) => r.message).join(" ") });
          } else if (holder) {
            leftOut.push({ itemId: item.id, tagCode: item.tagCode, description: item.description, tiedownLabel: t.label, code: "ITEM_IN_OTHER_KIT", reasons: null, kitId: holder.kitId, message: `In the kit for ${holder.job} on ${input.date}.` });
          } else keep.push(item.id);
        }
        await kits.insertKitItems(actor.organisationId, copy, tiedownId, keep, trx);
      }
      await audit({ action: "kit.copied", entity: "kit", entityId: copyId, after: { from: kitId, date: input.date, leftOut: leftOut.map((l) => l.itemId) } });
      return { id: copyId, leftOut };
    }),
  );
}

/** Loaded kits of earlier days: gear still out on jobs. */
export async function kitsStillOut(organisationId: string, before: string) {
  const rows = (await kits.listKits(organisationId, addDays(before, -92), addDays(before, -1))).filter((k) => k.state === "loaded");
  return (await modelsOf(organisationId, rows)).map(kitListEntry);
}
