/**
 * The planner's world in plain data: machines, trailers with their anchor points, and kits
 * (the tiedowns planned for one machine on one trailer on one date). Every weight is whole
 * pounds and every length whole millimetres, as stored; screens convert at the edges.
 *
 * @module
 */
import type { Attachment } from "@/lib/securement";
import type { Usability } from "@/lib/stock/usability";

/**
 * Built-in machine classes; an organisation can add its own names beside them.
 *
 * @example
 * MACHINE_CLASSES.includes("skid-steer"); // true
 */
export const MACHINE_CLASSES = ["mini-excavator", "skid-steer", "compact-track-loader", "wheel-loader", "roller", "other"] as const;
export type BuiltInMachineClass = (typeof MACHINE_CLASSES)[number];

/**
 * @example
 * MACHINE_CLASS_LABELS["compact-track-loader"]; // "Compact track loader"
 */
export const MACHINE_CLASS_LABELS: Record<BuiltInMachineClass, string> = {
  "mini-excavator": "Mini excavator",
  "skid-steer": "Skid steer",
  "compact-track-loader": "Compact track loader",
  "wheel-loader": "Wheel loader",
  roller: "Roller",
  other: "Other",
};

/**
 * Trailer body types.
 *
 * @example
 * TRAILER_TYPES[0]; // "tilt-deck"
 */
export const TRAILER_TYPES = ["tilt-deck", "split-tilt-deck", "tag-along", "gooseneck", "lowboy", "other"] as const;
export type TrailerType = (typeof TRAILER_TYPES)[number];

/**
 * @example
 * TRAILER_TYPE_LABELS["split-tilt-deck"]; // "Split tilt deck"
 */
export const TRAILER_TYPE_LABELS: Record<TrailerType, string> = {
  "tilt-deck": "Tilt deck",
  "split-tilt-deck": "Split tilt deck",
  "tag-along": "Tag-along (bumper pull)",
  gooseneck: "Gooseneck",
  lowboy: "Lowboy",
  other: "Other",
};

/**
 * How the trailer couples to the tow vehicle; it decides the tongue-weight band.
 *
 * @example
 * const c: Coupling = "gooseneck";
 */
export type Coupling = "ball" | "pintle" | "gooseneck" | "fifth-wheel";
export const COUPLINGS = ["ball", "pintle", "gooseneck", "fifth-wheel"] as const satisfies readonly Coupling[];

/**
 * @example
 * COUPLING_LABELS["fifth-wheel"]; // "Fifth wheel"
 */
export const COUPLING_LABELS: Record<Coupling, string> = {
  ball: "Ball",
  pintle: "Pintle hook",
  gooseneck: "Gooseneck ball",
  "fifth-wheel": "Fifth wheel",
};

/**
 * The usual coupling of each trailer type, used when none is given (common practice, from
 * memory: compact-equipment tilt decks come with a ball or pintle; a lowboy's detachable
 * neck sits on a fifth wheel).
 *
 * @example
 * DEFAULT_COUPLING["tag-along"]; // "ball"
 */
export const DEFAULT_COUPLING: Record<TrailerType, Coupling> = {
  "tilt-deck": "pintle",
  "split-tilt-deck": "pintle",
  "tag-along": "ball",
  gooseneck: "gooseneck",
  lowboy: "fifth-wheel",
  other: "ball",
};

/**
 * Where an anchor point sits across the deck.
 *
 * @example
 * const s: Side = "left";
 */
export type Side = "left" | "right" | "centre";
export const SIDES = ["left", "right", "centre"] as const satisfies readonly Side[];

/**
 * @example
 * SIDE_LABELS.centre; // "Centre"
 */
export const SIDE_LABELS: Record<Side, string> = { left: "Left", right: "Right", centre: "Centre" };

/**
 * A tie-down point on the machine, measured from the machine's front.
 *
 * @example
 * const p: MachinePoint = { label: "front left", side: "left", positionMm: 300 };
 */
export interface MachinePoint {
  readonly label: string;
  readonly side: Side;
  readonly positionMm: number;
}

/**
 * A machine as the planner knows it. `cgFromFrontMm` is null when unknown: the middle of the
 * machine's length is then assumed (and said so wherever it is used).
 *
 * @example
 * const m: Machine = { id: "…", name: "KX-3 mini excavator", machineClass: "mini-excavator", weightLb: 8100,
 *   lengthMm: 4900, widthMm: 1700, heightMm: 2500, articulated: false, accessories: ["bucket", "blade"],
 *   tiedownPoints: [], cgFromFrontMm: null };
 */
export interface Machine {
  readonly id: string;
  readonly name: string;
  readonly machineClass: string;
  readonly weightLb: number;
  readonly lengthMm: number;
  readonly widthMm: number | null;
  readonly heightMm: number | null;
  readonly articulated: boolean;
  readonly accessories: readonly string[];
  readonly tiedownPoints: readonly MachinePoint[];
  readonly cgFromFrontMm: number | null;
}

/** An anchor point's standing, like an item's: it can be taken out of use and retired. */
export type AnchorStatus = "in_service" | "tagged_out" | "retired";
export const ANCHOR_STATUSES = ["in_service", "tagged_out", "retired"] as const satisfies readonly AnchorStatus[];

/**
 * An anchor point's standing in words (never the colour alone).
 *
 * @example
 * ANCHOR_STATUS_LABELS.tagged_out; // "Out of use"
 */
export const ANCHOR_STATUS_LABELS: Record<AnchorStatus, string> = {
  in_service: "In use",
  tagged_out: "Out of use",
  retired: "Retired",
};

/**
 * A rated anchor point on a trailer deck (D-ring, stake pocket, rub-rail pocket), measured
 * from the front of the deck. `usable` is the verdict for the day asked.
 *
 * @example
 * const a: AnchorPoint = { id: "…", label: "L2", side: "left", positionMm: 1200, wllLb: 6600,
 *   status: "in_service", nextInspectionDue: "2027-06-01", usable: { ok: true, reasons: [] } };
 */
export interface AnchorPoint {
  readonly id: string;
  readonly label: string;
  readonly side: Side;
  readonly positionMm: number;
  readonly wllLb: number;
  readonly status: AnchorStatus;
  readonly nextInspectionDue: string | null;
  readonly lastInspectedOn?: string | null;
  readonly usable: Usability;
}

/**
 * A trailer. The deck is `deckLengthMm` long, of which the rear `tiltLengthMm` tilts
 * (0 for a fixed deck). `hitchToAxleMm` runs from the hitch point to the centre of the axle
 * group; `hitchToDeckFrontMm` from the hitch point to the front of the deck (null when not
 * measured yet).
 *
 * @example
 * const t: Trailer = { id: "…", name: "14K tilt", trailerType: "tilt-deck", coupling: "pintle", deckLengthMm: 6100,
 *   tiltLengthMm: 6100, deckWidthMm: 2080, gvwrLb: 14000, emptyWeightLb: 3600, emptyTongueWeightLb: 450,
 *   hitchToAxleMm: 6400, hitchToDeckFrontMm: 1500, anchorPoints: [] };
 */
export interface Trailer {
  readonly id: string;
  readonly name: string;
  readonly trailerType: TrailerType;
  readonly coupling: Coupling;
  readonly deckLengthMm: number;
  readonly tiltLengthMm: number;
  readonly deckWidthMm: number | null;
  readonly gvwrLb: number;
  readonly emptyWeightLb: number;
  readonly emptyTongueWeightLb: number;
  readonly hitchToAxleMm: number;
  readonly hitchToDeckFrontMm: number | null;
  readonly anchorPoints: readonly AnchorPoint[];
}

/**
 * An item of stock as a kit sees it: enough to rate it (lib/stock/rating.ts) and to say
 * whether it may be used on the kit's date.
 *
 * @example
 * const i: KitItem = { id: "…", tagCode: "K7XM3HQA", kind: "chain", description: "Chain, grade 70, 3/8 in", grade: 70,
 *   gradeMarked: true, size: "3/8", markedWllLb: 6600, wllLb: 6600, details: {}, usable: { ok: true, reasons: [] } };
 */
export interface KitItem {
  readonly id: string;
  readonly tagCode: string;
  readonly kind: string;
  readonly description: string;
  readonly grade: number | null;
  readonly gradeMarked: boolean;
  readonly size: string | null;
  readonly markedWllLb: number | null;
  readonly wllLb: number | null;
  readonly details: Readonly<Record<string, unknown>>;
  readonly usable: Usability;
}

/**
 * What a tiedown holds: the machine itself, or one of its accessories by name.
 *
 * @example
 * const s: Secures = "bucket";
 */
export type Secures = string;

/**
 * One planned tiedown: from an anchor point on the trailer to a tie-down point on the machine
 * (or an accessory), made of items of stock in order from the anchor.
 *
 * @example
 * const t: KitTiedown = { id: "…", label: "front left", anchorPointId: "…", attachment: "direct",
 *   secures: "machine", machinePoint: "front left", items: [] };
 */
export interface KitTiedown {
  readonly id: string;
  readonly label: string;
  readonly anchorPointId: string;
  readonly attachment: Attachment;
  readonly secures: Secures;
  readonly machinePoint: string | null;
  readonly items: readonly KitItem[];
}

/**
 * Most tiedowns one kit can hold: the securement engine checks at most 100 in one request
 * (lib/securement/schema.ts), and a kit is checked whole.
 *
 * @example
 * MAX_KIT_TIEDOWNS; // 100
 */
export const MAX_KIT_TIEDOWNS = 100;

/**
 * The states of a kit: planned (`draft`), checked and fit to go (`ready`), on the trailer
 * (`loaded`), back in the yard (`returned`).
 *
 * @example
 * KIT_STATES.indexOf("loaded"); // 2
 */
export const KIT_STATES = ["draft", "ready", "loaded", "returned"] as const;
export type KitState = (typeof KIT_STATES)[number];

/**
 * A kit's state in words.
 *
 * @example
 * KIT_STATE_LABELS.ready; // "Ready to load"
 */
export const KIT_STATE_LABELS: Record<KitState, string> = {
  draft: "Draft",
  ready: "Ready to load",
  loaded: "Loaded",
  returned: "Returned",
};

/**
 * A kit with everything it refers to, as read for one date.
 *
 * @example
 * const k: Kit = { id: "…", date: "2026-12-03", job: "Hollins driveway", site: "14 Quarry Lane", state: "draft",
 *   machine, trailer, articulationRestrained: false, machineFrontFromDeckFrontMm: null, tiedowns: [] };
 */
export interface Kit {
  readonly id: string;
  readonly date: string;
  readonly job: string;
  readonly site: string | null;
  readonly state: KitState;
  readonly machine: Machine;
  readonly trailer: Trailer;
  /** The machine's articulation joint is locked (lock bar or pin fitted): 49 CFR 393.130(b)(2). */
  readonly articulationRestrained: boolean;
  /** Where the machine's front sits, measured back from the front of the deck; null: not placed yet. */
  readonly machineFrontFromDeckFrontMm: number | null;
  readonly tiedowns: readonly KitTiedown[];
}
