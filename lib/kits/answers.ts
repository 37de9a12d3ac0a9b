/**
 * The JSON answers of the machines, trailers and kits API, made from the model. Stored
 * figures go out as `{ value, unit }` in pounds and millimetres, so that an answer can be
 * sent back in a PUT unchanged. A kit's `check` is exactly the engine's answer for the kit
 * (`checkSecurement(kitCheckRequest(kit))`); `pass` adds the blockers to it.
 *
 * @module
 */
import type { SecurementCheckResult, TiedownResult } from "@/lib/securement";
import { MACHINE_CLASS_LABELS, ANCHOR_STATUS_LABELS, KIT_STATE_LABELS, TRAILER_TYPE_LABELS, type AnchorPoint, type BuiltInMachineClass, type Kit, type KitItem, type Machine, type Trailer } from "./model";
import type { Placement } from "./placement";
import { checkedTiedowns, kitVerdict, placementFails, type KitBlocker, type PracticePoint } from "./plan";
import { lbQuantity, mmQuantity } from "./quantities";

/**
 * The words for a machine class: a built-in label, or the organisation's own name as given.
 *
 * @example
 * machineClassLabel("skid-steer"); // "Skid steer"
 * machineClassLabel("Trencher");   // "Trencher"
 */
export function machineClassLabel(machineClass: string): string {
  return MACHINE_CLASS_LABELS[machineClass as BuiltInMachineClass] ?? machineClass;
}

/**
 * A machine as the API answers it.
 *
 * @example
 * machineJson(machine).weight; // { value: 8100, unit: "lb" }
 */
export function machineJson(m: Machine) {
  return {
    id: m.id,
    name: m.name,
    class: m.machineClass,
    classLabel: machineClassLabel(m.machineClass),
    weight: lbQuantity(m.weightLb),
    length: mmQuantity(m.lengthMm),
    width: m.widthMm == null ? null : mmQuantity(m.widthMm),
    height: m.heightMm == null ? null : mmQuantity(m.heightMm),
    articulated: m.articulated,
    accessories: [...m.accessories],
    tiedownPoints: m.tiedownPoints.map((p) => ({ label: p.label, side: p.side, position: mmQuantity(p.positionMm) })),
    cgFromFront: m.cgFromFrontMm == null ? null : mmQuantity(m.cgFromFrontMm),
    /** True when no centre of gravity is recorded and the middle of the length is assumed. */
    cgAssumed: m.cgFromFrontMm == null,
  };
}
export type MachineJson = ReturnType<typeof machineJson>;

/**
 * An anchor point as the API answers it, with its verdict for the day asked.
 *
 * @example
 * anchorJson(a).usable; // { ok: false, reasons: [{ code: "TAGGED_OUT", … }] }
 */
export function anchorJson(a: AnchorPoint) {
  return {
    id: a.id,
    label: a.label,
    side: a.side,
    position: mmQuantity(a.positionMm),
    wll: lbQuantity(a.wllLb),
    status: a.status,
    statusLabel: ANCHOR_STATUS_LABELS[a.status],
    nextInspectionDue: a.nextInspectionDue,
    lastInspectedOn: a.lastInspectedOn ?? null,
    usable: a.usable,
  };
}
export type AnchorJson = ReturnType<typeof anchorJson>;

/**
 * A trailer as the API answers it.
 *
 * @example
 * trailerJson(trailer).anchorPoints[0].usable.ok;
 */
export function trailerJson(t: Trailer) {
  return {
    id: t.id,
    name: t.name,
    type: t.trailerType,
    typeLabel: TRAILER_TYPE_LABELS[t.trailerType],
    coupling: t.coupling,
    deckLength: mmQuantity(t.deckLengthMm),
    tiltLength: mmQuantity(t.tiltLengthMm),
    deckWidth: t.deckWidthMm == null ? null : mmQuantity(t.deckWidthMm),
    gvwr: lbQuantity(t.gvwrLb),
    emptyWeight: lbQuantity(t.emptyWeightLb),
    emptyTongueWeight: lbQuantity(t.emptyTongueWeightLb),
    hitchToAxle: mmQuantity(t.hitchToAxleMm),
    hitchToDeckFront: t.hitchToDeckFrontMm == null ? null : mmQuantity(t.hitchToDeckFrontMm),
    anchorPoints: t.anchorPoints.map(anchorJson),
  };
}
export type TrailerJson = ReturnType<typeof trailerJson>;

/**
 * An item of a kit: what it is, its WLL, and whether it may be used on the kit's date.
 *
 * @example
 * kitItemJson(item).usable.ok;
 */
export function kitItemJson(i: KitItem) {
  return {
    id: i.id,
    tagCode: i.tagCode,
    kind: i.kind,
    description: i.description,
    grade: i.grade,
    size: i.size,
    wllLb: i.wllLb,
    gradeMarked: i.gradeMarked,
    markedWllLb: i.markedWllLb,
    details: i.details,
    chainSizeRange: (i.details.chainSizeRange as [string, string] | null | undefined) ?? null,
    mechanism: (i.details.mechanism as string | undefined) ?? null,
    usable: i.usable,
    url: `/items/${i.id}`,
  };
}
export type KitItemJson = ReturnType<typeof kitItemJson>;

/**
 * A kit as GET /api/v1/kits/{id} answers it: the shape (`tiedowns[].itemIds`,
 * `check`), plus each tiedown's items with their verdict and its line of the check
 * (`result`, null when the tiedown is left out of the check), the blockers, the
 * common-practice points, where the machine sits and what the hitch carries (`placement`,
 * lib/kits/placement.ts; null when the machine is not placed or the trailer lacks a figure,
 * and `placementMissing` says which), and `pass` (the check passes, nothing blocks, and the
 * placement has no fail: no negative tongue weight, not over the GVWR).
 *
 * @example
 * const k = kitJson(kit);
 * k.pass === (k.check.pass && k.blockers.length === 0 && !k.placement?.findings.some((f) => f.severity === "fail")); // true
 */
export function kitJson(kit: Kit) {
  const verdict = kitVerdict(kit);
  const results = new Map<string, TiedownResult>(checkedTiedowns(kit).map((t, i) => [t.id, verdict.check.tiedowns[i]!]));
  return {
    id: kit.id,
    date: kit.date,
    job: kit.job,
    site: kit.site,
    state: kit.state,
    stateLabel: KIT_STATE_LABELS[kit.state],
    articulationRestrained: kit.articulationRestrained,
    machineFrontFromDeckFront: kit.machineFrontFromDeckFrontMm == null ? null : mmQuantity(kit.machineFrontFromDeckFrontMm),
    machine: machineJson(kit.machine),
    trailer: trailerJson(kit.trailer),
    tiedowns: kit.tiedowns.map((t) => ({
      id: t.id,
      label: t.label,
      anchorPointId: t.anchorPointId,
      attachment: t.attachment,
      secures: t.secures,
      machinePoint: t.machinePoint,
      itemIds: t.items.map((i) => i.id),
      items: t.items.map(kitItemJson),
      result: results.get(t.id) ?? null,
    })),
    check: verdict.check as SecurementCheckResult,
    blockers: verdict.blockers as KitBlocker[],
    practice: verdict.practice as PracticePoint[],
    placement: verdict.placement as Placement | null,
    placementMissing: verdict.placementMissing,
    pass: verdict.pass,
  };
}
export type KitJson = ReturnType<typeof kitJson>;

/**
 * A kit in the list of the coming days.
 *
 * @example
 * kitListEntry(kit); // { id, date, job, site, state, machine: { id, name }, trailer: { id, name }, pass, … }
 */
export function kitListEntry(kit: Kit) {
  const verdict = kitVerdict(kit);
  return {
    id: kit.id,
    date: kit.date,
    job: kit.job,
    site: kit.site,
    state: kit.state,
    stateLabel: KIT_STATE_LABELS[kit.state],
    machine: { id: kit.machine.id, name: kit.machine.name },
    trailer: { id: kit.trailer.id, name: kit.trailer.name },
    pass: verdict.pass,
    tiedownCount: kit.tiedowns.length,
    itemCount: kit.tiedowns.reduce((n, t) => n + t.items.length, 0),
    failCount: verdict.check.findings.filter((f) => f.severity === "fail").length,
    blockerCount: verdict.blockers.length,
    placementFailCount: placementFails(verdict.placement).length,
  };
}
export type KitListEntry = ReturnType<typeof kitListEntry>;

/**
 * The model back from a kit's answer, for screens that work on the live kit in the browser
 * (the deck picture, the placement control): `kitFromJson(kitJson(kit))` is `kit` again.
 *
 * @example
 * const kit = kitFromJson(useKit(id).data);
 * deckPicture(kit, kitVerdict(kit));
 */
export function kitFromJson(k: KitJson): Kit {
  const m = k.machine;
  const t = k.trailer;
  return {
    id: k.id,
    date: k.date,
    job: k.job,
    site: k.site,
    state: k.state,
    articulationRestrained: k.articulationRestrained,
    machineFrontFromDeckFrontMm: k.machineFrontFromDeckFront?.value ?? null,
    machine: {
      id: m.id,
      name: m.name,
      machineClass: m.class,
      weightLb: m.weight.value,
      lengthMm: m.length.value,
      widthMm: m.width?.value ?? null,
      heightMm: m.height?.value ?? null,
      articulated: m.articulated,
      accessories: [...m.accessories],
      tiedownPoints: m.tiedownPoints.map((p) => ({ label: p.label, side: p.side, positionMm: p.position.value })),
      cgFromFrontMm: m.cgFromFront?.value ?? null,
    },
    trailer: {
      id: t.id,
      name: t.name,
      trailerType: t.type,
      coupling: t.coupling,
      deckLengthMm: t.deckLength.value,
      tiltLengthMm: t.tiltLength.value,
      deckWidthMm: t.deckWidth?.value ?? null,
      gvwrLb: t.gvwr.value,
      emptyWeightLb: t.emptyWeight.value,
      emptyTongueWeightLb: t.emptyTongueWeight.value,
      hitchToAxleMm: t.hitchToAxle.value,
      hitchToDeckFrontMm: t.hitchToDeckFront?.value ?? null,
      anchorPoints: t.anchorPoints.map((a) => ({
        id: a.id,
        label: a.label,
        side: a.side,
        positionMm: a.position.value,
        wllLb: a.wll.value,
        status: a.status,
        nextInspectionDue: a.nextInspectionDue,
        lastInspectedOn: a.lastInspectedOn,
        usable: a.usable,
      })),
    },
    tiedowns: k.tiedowns.map((td) => ({
      id: td.id,
      label: td.label,
      anchorPointId: td.anchorPointId,
      attachment: td.attachment,
      secures: td.secures,
      machinePoint: td.machinePoint,
      items: td.items.map((i) => ({
        id: i.id,
        tagCode: i.tagCode,
        kind: i.kind,
        description: i.description,
        grade: i.grade,
        gradeMarked: i.gradeMarked,
        size: i.size,
        markedWllLb: i.markedWllLb,
        wllLb: i.wllLb,
        details: i.details,
        usable: i.usable,
      })),
    })),
  };
}
