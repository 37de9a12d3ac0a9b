/**
 * From stored records (db/fleet.ts, db/kits.ts) to the planner's model (model.ts), with the
 * usability verdict of every item and anchor point for the day that matters: the kit's date.
 * The verdict is lib/stock/usability.ts's, never derived again here.
 *
 * @module
 */
import type { AnchorRecord, MachineRecord, TrailerRecord } from "@/db/fleet";
import type { KitItemRecord, KitRecord, TiedownRecord } from "@/db/kits";
import { describeItem } from "@/lib/stock/describe";
import { itemUsability } from "@/lib/stock/usability";
import type { AnchorPoint, Kit, KitItem, KitTiedown, Machine, Side, Trailer } from "./model";

/**
 * @example
 * toMachine(row).accessories; // ["bucket", "blade"]
 */
export function toMachine(row: MachineRecord): Machine {
  return { ...row, accessories: [...row.accessories], tiedownPoints: [...row.tiedownPoints] };
}

/**
 * An anchor point with its verdict for a day.
 *
 * @example
 * toAnchor(row, "2026-12-03").usable.ok; // false when it is out of use
 */
export function toAnchor(row: AnchorRecord, on: string): AnchorPoint {
  return {
    id: row.id,
    label: row.label,
    side: row.side,
    positionMm: row.positionMm,
    wllLb: row.wllLb,
    status: row.status,
    nextInspectionDue: row.nextInspectionDue,
    lastInspectedOn: row.lastInspectedOn,
    // An anchor point is rated hardware: the same verdict as an item of stock.
    usable: itemUsability(row, on),
  };
}

/**
 * A trailer with its anchor points judged for a day, front to back, left before right.
 *
 * @example
 * toTrailer(row, anchors, "2026-12-03").anchorPoints.length;
 */
export function toTrailer(row: TrailerRecord, anchors: readonly AnchorRecord[], on: string): Trailer {
  const sideOrder: Record<Side, number> = { left: 0, centre: 1, right: 2 };
  return {
    ...row,
    anchorPoints: anchors
      .filter((a) => a.trailerId === row.id)
      .sort((a, b) => a.positionMm - b.positionMm || sideOrder[a.side] - sideOrder[b.side] || a.label.localeCompare(b.label))
      .map((a) => toAnchor(a, on)),
  };
}

/**
 * An item of stock as a kit sees it, with its verdict for the kit's date.
 *
 * @example
 * toKitItem(row, "2026-12-03").description; // "Chain, grade 70, 3/8 in"
 */
export function toKitItem(row: KitItemRecord, on: string): KitItem {
  return {
    id: row.id,
    tagCode: row.tagCode,
    kind: row.kind,
    description: describeItem(row),
    grade: row.grade,
    gradeMarked: row.gradeMarked,
    size: row.size,
    markedWllLb: row.markedWllLb,
    wllLb: row.wllLb,
    details: row.details ?? {},
    usable: itemUsability(row, on),
  };
}

/**
 * A whole kit in the model, every part judged for the kit's date.
 *
 * @example
 * const k = toKit(kitRow, machineRow, trailerRow, anchorRows, tiedownRows);
 * kitVerdict(k).pass;
 */
export function toKit(
  row: KitRecord,
  machine: MachineRecord,
  trailer: TrailerRecord,
  anchors: readonly AnchorRecord[],
  tiedowns: readonly TiedownRecord[],
): Kit {
  const used = new Set(tiedowns.map((t) => t.anchorPointId));
  // Retired points stay out of the trailer's list unless this kit still uses one.
  const shown = anchors.filter((a) => a.status !== "retired" || used.has(a.id));
  const kitTiedowns: KitTiedown[] = tiedowns
    .filter((t) => t.kitId === row.id)
    .map((t) => ({
      id: t.id,
      label: t.label,
      anchorPointId: t.anchorPointId,
      attachment: t.attachment,
      secures: t.secures,
      machinePoint: t.machinePoint,
      items: t.items.map((i) => toKitItem(i, row.date)),
    }));
  return {
    id: row.id,
    date: row.date,
    job: row.job,
    site: row.site,
    state: row.state,
    machine: toMachine(machine),
    trailer: toTrailer(trailer, shown, row.date),
    articulationRestrained: row.articulationRestrained,
    machineFrontFromDeckFrontMm: row.machineFrontFromDeckFrontMm,
    tiedowns: kitTiedowns,
  };
}
