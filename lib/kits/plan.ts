/**
 * A kit as the rated-limit engine sees it, and what the kit builder says beyond the engine.
 *
 * - {@link kitCheckRequest} writes the kit as a `POST /api/v1/securement-checks` request, so the
 *   kit's check is the engine's own answer (`checkSecurement(kitCheckRequest(kit))`).
 * - {@link kitBlockers}: gear the kit may not use on its date (the usability verdict of each
 *   item and anchor point), and tiedowns that no longer fit the machine or trailer; a kit with
 *   a blocker cannot be marked ready.
 * - {@link practicePoints}: common-practice points and reminders, each marked met, not met,
 *   or a reminder for the driver.
 *
 * @module
 */
import { checkSecurement, type Component, type SecurementCheckRequest, type SecurementCheckResult } from "@/lib/securement";
import { itemComponent } from "@/lib/stock/rating";
import type { ItemKind } from "@/lib/stock/labels";
import type { AnchorPoint, Kit, KitItem, KitTiedown } from "./model";
import { kitPlacement, type Placement, type PlacementFinding } from "./placement";

const MACHINE = "machine";

function itemAsComponent(item: KitItem): Component {
  const component = itemComponent({
    kind: item.kind as ItemKind,
    grade: item.grade,
    gradeMarked: item.gradeMarked,
    size: item.size,
    markedWllLb: item.markedWllLb,
    details: item.details as { chainSizeRange?: [string, string] | null },
  });
  return { ...component, label: item.tagCode, gearId: item.id };
}

function anchorAsComponent(anchor: AnchorPoint): Component {
  return { type: "anchor", wll: { value: anchor.wllLb, unit: "lb" }, label: `anchor point ${anchor.label}`, gearId: anchor.id };
}

function anchorOf(kit: Kit, tiedown: KitTiedown): AnchorPoint | undefined {
  return kit.trailer.anchorPoints.find((a) => a.id === tiedown.anchorPointId);
}

function holdsKnownPart(kit: Kit, tiedown: KitTiedown): boolean {
  const secures = tiedown.secures.toLowerCase();
  return secures === MACHINE || kit.machine.accessories.some((a) => a.toLowerCase() === secures);
}

/** Item kinds that are tiedown material (a binder, hook or shackle alone holds nothing down). */
const MATERIAL_KINDS = new Set(["chain", "web-strap", "wire-rope"]);

function hasMaterial(tiedown: KitTiedown): boolean {
  return tiedown.items.some((i) => MATERIAL_KINDS.has(i.kind));
}

/** Why a kit tiedown is left out of the check, or null when it goes in. */
function leftOutBecause(kit: Kit, t: KitTiedown): KitBlocker | null {
  if (!holdsKnownPart(kit, t)) {
    return { code: "ACCESSORY_NOT_ON_MACHINE", tiedownId: t.id, message: `Tiedown "${t.label}" holds the ${t.secures}, which ${kit.machine.name} no longer lists; it is not counted.` };
  }
  if (!hasMaterial(t)) {
    return { code: "NO_TIEDOWN_MATERIAL", tiedownId: t.id, message: `Tiedown "${t.label}" has no chain, web strap or wire rope, so it holds nothing down; it is not counted until one is added.` };
  }
  return null;
}

/**
 * The kit's tiedowns that go into its check request, in the request's order: index i of
 * `checkSecurement(kitCheckRequest(kit)).tiedowns` is the i-th of these. A tiedown for an
 * accessory the machine no longer lists, or one with no chain, strap or wire rope (a binder
 * on its own), is left out and counts nothing: the conservative reading (see {@link kitBlockers}).
 * The scratch check only warns about a tiedown without material (NO_TIEDOWN_MATERIAL); a kit
 * is made of real items, so there the part is missing, not merely unlisted.
 *
 * @example
 * checkedTiedowns(kit).map((t) => t.id);
 */
export function checkedTiedowns(kit: Kit): KitTiedown[] {
  return kit.tiedowns.filter((t) => leftOutBecause(kit, t) === null);
}

/**
 * The securement check request for a kit: the machine is the cargo (kind "machine", its
 * weight, length, accessories and articulation), and each tiedown lists its items in order
 * followed by its anchor point, whose WLL caps the tiedown (49 CFR 393.108(a)). Items are
 * labelled with their tag codes and anchor points with their labels, so that the engine's
 * "limited by" names the physical part.
 *
 * @example
 * const request = kitCheckRequest(kit);
 * checkSecurement(request).pass; // the kit's verdict under 49 CFR 393
 */
export function kitCheckRequest(kit: Kit): SecurementCheckRequest {
  const { machine } = kit;
  // A tiedown for an accessory the machine no longer lists is left out (counted as nothing,
  // the conservative reading) and reported by kitBlockers, rather than failing the request.
  return {
    cargo: {
      kind: "machine",
      weight: { value: machine.weightLb, unit: "lb" },
      length: { value: machine.lengthMm, unit: "mm" },
      articulated: machine.articulated,
      articulationRestrained: machine.articulated ? kit.articulationRestrained : undefined,
      accessories: [...machine.accessories],
    },
    tiedowns: checkedTiedowns(kit).map((t) => {
      const anchor = anchorOf(kit, t);
      return {
        label: t.label,
        attachment: t.attachment,
        secures: t.secures,
        components: [...t.items.map(itemAsComponent), ...(anchor ? [anchorAsComponent(anchor)] : [])],
      };
    }),
  };
}

/**
 * Why a kit may not use a piece of gear on its date.
 *
 * @example
 * const b: KitBlocker = { code: "ITEM_NOT_USABLE", tiedownId: "…", itemId: "…", message: "Item K7XM-3HQA: Tagged out: …" };
 */
export interface KitBlocker {
  readonly code: "ITEM_NOT_USABLE" | "ANCHOR_NOT_USABLE" | "ANCHOR_NOT_ON_TRAILER" | "ACCESSORY_NOT_ON_MACHINE" | "NO_TIEDOWN_MATERIAL";
  readonly message: string;
  readonly tiedownId: string;
  readonly itemId?: string;
  readonly anchorPointId?: string;
}

/**
 * Gear in the kit that may not be used on the kit's date: items and anchor points whose
 * usability verdict says no (tagged out, retired, lost, inspection overdue, not rated), and
 * anchor points that are not on the kit's trailer. 49 CFR 393.104(b) and (c): no damaged or
 * weakened tiedowns, components or anchor points.
 *
 * @example
 * kitBlockers(kit); // [] when every part may be used on kit.date
 */
export function kitBlockers(kit: Kit): KitBlocker[] {
  const out: KitBlocker[] = [];
  for (const t of kit.tiedowns) {
    const leftOut = leftOutBecause(kit, t);
    if (leftOut) out.push(leftOut);
    const anchor = anchorOf(kit, t);
    if (!anchor) {
      out.push({ code: "ANCHOR_NOT_ON_TRAILER", tiedownId: t.id, anchorPointId: t.anchorPointId, message: `Tiedown "${t.label}": its anchor point is not on ${kit.trailer.name}.` });
    } else if (!anchor.usable.ok) {
      out.push({
        code: "ANCHOR_NOT_USABLE",
        tiedownId: t.id,
        anchorPointId: anchor.id,
        message: `Tiedown "${t.label}": anchor point ${anchor.label} may not be used. ${anchor.usable.reasons.map((r) => r.message).join(" ")}`,
      });
    }
    for (const item of t.items) {
      if (item.usable.ok) continue;
      out.push({
        code: "ITEM_NOT_USABLE",
        tiedownId: t.id,
        itemId: item.id,
        message: `Tiedown "${t.label}": ${item.description} (${item.tagCode}) may not be used on ${kit.date}. ${item.usable.reasons.map((r) => r.message).join(" ")}`,
      });
    }
  }
  return out;
}

/**
 * A point of common practice beyond the rule: `met` true or false where the kit shows it,
 * null for a reminder the driver answers at the trailer.
 *
 * @example
 * const p: PracticePoint = { code: "CORNERS_AND_ACCESSORIES", met: true, message: "…", source: "Common practice" };
 */
export interface PracticePoint {
  readonly code: "CORNERS_AND_ACCESSORIES" | "BINDER_ON_EVERY_CHAIN" | "LOOP_THROUGH_POINTS" | "LATCHED";
  readonly met: boolean | null;
  readonly message: string;
  readonly source: string;
}

const PRACTICE = "Common practice";

/**
 * Common-practice points for a machine's kit (none of them a 49 CFR rule; the engine's
 * findings carry the rules):
 * - a tiedown at each corner of the machine (4) plus one for each accessory;
 * - every chain has a binder to tension it (49 CFR 393.112 asks that a tiedown can be
 *   tightened in transit: section title verified, text from memory);
 * - chains looped through or around the machine's tie-down points rather than hooked onto a
 *   thin tab, which can bend under a binder's pull (reminder);
 * - cab doors, windows and compartments latched (reminder).
 *
 * @example
 * practicePoints(kit).find((p) => p.code === "CORNERS_AND_ACCESSORIES")?.met; // true with 4 + 1 per accessory
 */
export function practicePoints(kit: Kit): PracticePoint[] {
  const onMachine = kit.tiedowns.filter((t) => t.secures.toLowerCase() === MACHINE);
  const unheld = kit.machine.accessories.filter((a) => !kit.tiedowns.some((t) => t.secures.toLowerCase() === a.toLowerCase()));
  const cornersMet = onMachine.length >= 4 && unheld.length === 0;
  const wanted = 4 + kit.machine.accessories.length;
  const noBinder = kit.tiedowns.filter((t) => t.items.some((i) => i.kind === "chain") && !t.items.some((i) => i.kind === "binder"));
  return [
    {
      code: "CORNERS_AND_ACCESSORIES",
      met: cornersMet,
      message: cornersMet
        ? `A tiedown at each corner and one for each accessory: ${onMachine.length} on the machine${kit.machine.accessories.length ? `, and the ${kit.machine.accessories.join(", ")} held` : ""}.`
        : `A tiedown at each corner (4) plus one for each accessory (${wanted} in all) is common practice: ${onMachine.length} on the machine${unheld.length ? `; nothing holds the ${unheld.join(", ")}` : ""}.`,
      source: PRACTICE,
    },
    {
      code: "BINDER_ON_EVERY_CHAIN",
      met: noBinder.length === 0,
      message: noBinder.length === 0
        ? "Every chain has a binder to tension it."
        : `No binder on ${noBinder.map((t) => `"${t.label}"`).join(", ")}: a chain is tensioned with a binder sized for it, so that it can be tightened along the way (49 CFR 393.112, from memory).`,
      source: PRACTICE,
    },
    {
      code: "LOOP_THROUGH_POINTS",
      met: null,
      message: "Loop each chain through or around the machine's tie-down point and hook it back on itself, rather than hooking onto a thin tab that a binder's pull can bend.",
      source: PRACTICE,
    },
    {
      code: "LATCHED",
      met: null,
      message: "Latch and lock the cab door, windows, hood and compartments before the trip.",
      source: PRACTICE,
    },
  ];
}

/**
 * The placement findings that stop a kit: a negative tongue weight (the trailer would lift
 * the hitch) and a loaded weight over the GVWR (lib/kits/placement.ts). A share outside the
 * band is a warning only, and a kit not placed yet, or whose trailer lacks a figure, is not
 * stopped: placing the machine is not asked by 49 CFR 393, so the kit can still pass
 * without it (the builder says what is missing).
 *
 * @example
 * placementFails(placeMachine(machine, trailer, 6000)).map((f) => f.code); // ["TONGUE_WEIGHT_NEGATIVE"]
 */
export function placementFails(placement: Placement | null): PlacementFinding[] {
  return placement ? placement.findings.filter((f) => f.severity === "fail") : [];
}

/**
 * A kit's whole verdict: the engine's check of its plan, the gear it may not use, where the
 * machine sits and what the hitch carries (`placement`, null with `placementMissing` saying
 * why), and the common-practice points. `pass` is the engine's pass with no blocker and no
 * placement fail ({@link placementFails}); a kit that does not pass cannot be marked ready.
 *
 * @example
 * const v = kitVerdict(kit);
 * v.check.aggregateWllLb; v.blockers; v.placement?.tongueWeightLb; v.practice; v.pass;
 */
export function kitVerdict(kit: Kit): {
  pass: boolean;
  check: SecurementCheckResult;
  blockers: KitBlocker[];
  practice: PracticePoint[];
  placement: Placement | null;
  placementMissing: string[];
} {
  const check = checkSecurement(kitCheckRequest(kit));
  const blockers = kitBlockers(kit);
  const { placement, missing } = kitPlacement(kit);
  return {
    pass: check.pass && blockers.length === 0 && placementFails(placement).length === 0,
    check,
    blockers,
    practice: practicePoints(kit),
    placement,
    placementMissing: missing,
  };
}
