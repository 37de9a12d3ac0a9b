/**
 * Where the machine sits on the deck, and what the hitch carries.
 *
 * The model is plain statics: the loaded trailer is a beam resting on two supports, the
 * hitch point and the centre of its axle group. Distances run from the hitch point toward
 * the rear of the trailer.
 *
 * - `a`  hitch point to the centre of the axle group (`trailer.hitchToAxleMm`);
 * - `E`  the trailer's empty weight, `T0` its empty tongue weight (measured, or from the
 *        maker's plate), so the empty trailer puts `E − T0` on its axles;
 * - `W`  the machine's weight, whose centre of gravity sits at
 *        `x = hitchToDeckFront + machineFrontFromDeckFront + cgFromFront`
 *        (`cgFromFront` is the machine's own figure; when it is unknown, the middle of the
 *        machine's length is used, and a finding says so).
 *
 * Taking moments about the axle centre, the machine's weight splits in inverse proportion to
 * its distances from the two supports:
 *
 *     tongue weight       T = T0 + W · (a − x) / a
 *     axle-group load     A = (E − T0) + W · x / a
 *     loaded weight       G = E + W          (= T + A)
 *     tongue share        s = T / G
 *
 * A machine ahead of the axle (x < a) adds to the tongue; a machine behind it (x > a) takes
 * weight off the hitch, and past some point T turns negative: the trailer would lift the
 * tow vehicle's hitch. The gear's own weight (chains, binders: a few dozen pounds) is left
 * out. The model knows nothing of the tow vehicle, its hitch rating or axle ratings; the
 * caution says so.
 *
 * Bands for the tongue share (reference file §5, "Trailer loading rules of thumb"):
 * - ball (bumper pull): 10–15 % of the loaded trailer weight. A trailer maker's gooseneck
 *   owner's manual (§3.1, table "Tongue Weight as a Percentage of Loaded Trailer Weight")
 *   and a vehicle maker's owner's manual (towing section) both give it. VERIFIED in the
 *   reference.
 * - gooseneck and fifth wheel: 15–25 % (the vehicle maker's owner's manual: "fifth wheel or
 *   gooseneck kingpin weight should be 15 to 25 percent") or 20–25 % (the trailer maker's
 *   manual). VERIFIED, both. Decision: both are shown; the verdict uses 20–25 %, the range
 *   that both published figures accept, because Linkyard does not know whose figures apply
 *   to this rig and a warning only asks the planner to look. A share between 15 and 20 % gets
 *   a warning that says it is inside the vehicle maker's range and below the trailer maker's.
 * - pintle: no published figure was found. Common practice: the bumper-pull band, 10–15 %,
 *   because a pintle ring, like a ball, hangs the tongue behind the tow vehicle's rear axle.
 *
 * Severity: a negative tongue weight and a loaded weight over the GVWR are fails; a share
 * outside the band is a warning (the band is a maker's recommendation, not a regulation);
 * "about 60 % of the load ahead of the axle" is shown as common practice only (a note),
 * never as a rule: no standard or maker states it (reference §5).
 *
 * @module
 */
import { formatLbKg, formatNumber, MM_PER_IN, roundHalfUp, type Severity } from "@/lib/securement";
import type { Coupling, Kit, Machine, Trailer } from "./model";

/**
 * A tongue-weight band, as fractions of the loaded trailer weight, with where it comes from.
 *
 * @example
 * const b: TongueBand = { min: 0.1, max: 0.15, source: "…" };
 */
export interface TongueBand {
  readonly min: number;
  readonly max: number;
  readonly source: string;
}

/**
 * The band a verdict uses for a coupling, and every published band it was drawn from.
 *
 * @example
 * tongueBand("gooseneck").published.length; // 2
 */
export interface CouplingBand extends TongueBand {
  /** True when no published figure was found and the band is common practice. */
  readonly commonPractice: boolean;
  readonly published: readonly TongueBand[];
}

/**
 * The sources shown beside the bands and findings, in words; the reference file (§5) holds
 * their addresses.
 *
 * @example
 * BAND_SOURCES.sixtyForty; // "Common practice (a rule of thumb: …)"
 */
export const BAND_SOURCES = {
  trailerMakerBall: "A trailer maker's owner's manual (§3.1, tongue weight as a percentage of loaded trailer weight): 10–15 % for a ball hitch",
  vehicleMakerBall: "A vehicle maker's owner's manual (towing): 10–15 % for a conventional ball hitch",
  trailerMakerGooseneck: "A trailer maker's owner's manual (§3.1): 20–25 % for a gooseneck or fifth wheel",
  vehicleMakerGooseneck: "A vehicle maker's owner's manual (towing): fifth wheel or gooseneck kingpin weight 15–25 %",
  pintle: "Common practice: no published figure for pintle hitches was found; the bumper-pull band (10–15 %) is used, as a pintle ring, like a ball, sits behind the tow vehicle's rear axle",
  sixtyForty: "Common practice (a rule of thumb: no standard or maker's figure states it)",
  statics: "Plain statics about the axle-group centre (this estimate)",
  gvwr: "The trailer maker's GVWR (on its certification label; 49 CFR 567.4, from memory)",
} as const;

const BALL: CouplingBand = {
  min: 0.1,
  max: 0.15,
  source: "10–15 % of the loaded trailer weight: a trailer maker's manual and a vehicle maker's owner's manual agree",
  commonPractice: false,
  published: [
    { min: 0.1, max: 0.15, source: BAND_SOURCES.trailerMakerBall },
    { min: 0.1, max: 0.15, source: BAND_SOURCES.vehicleMakerBall },
  ],
};

const GOOSENECK: CouplingBand = {
  min: 0.2,
  max: 0.25,
  source: "20–25 % of the loaded trailer weight: the range both published figures accept (a trailer maker's manual 20–25 %, a vehicle maker's owner's manual 15–25 %)",
  commonPractice: false,
  published: [
    { min: 0.2, max: 0.25, source: BAND_SOURCES.trailerMakerGooseneck },
    { min: 0.15, max: 0.25, source: BAND_SOURCES.vehicleMakerGooseneck },
  ],
};

const PINTLE: CouplingBand = { min: 0.1, max: 0.15, source: BAND_SOURCES.pintle, commonPractice: true, published: [] };

const BANDS: Readonly<Record<Coupling, CouplingBand>> = { ball: BALL, pintle: PINTLE, gooseneck: GOOSENECK, "fifth-wheel": GOOSENECK };

/**
 * The tongue-weight band for a coupling, with its sources (see the module comment for the
 * choice made for goosenecks and fifth wheels, and for pintles).
 *
 * @example
 * tongueBand("ball");      // { min: 0.1, max: 0.15, source: "10–15 % …", commonPractice: false, published: [...] }
 * tongueBand("gooseneck"); // { min: 0.2, max: 0.25, … published: [20–25 % trailer maker, 15–25 % vehicle maker] }
 * tongueBand("pintle").commonPractice; // true
 */
export function tongueBand(coupling: Coupling): CouplingBand {
  return BANDS[coupling];
}

/**
 * The band in pounds for a loaded trailer weight.
 *
 * @example
 * // The trailer maker's worked example: a gooseneck loaded to 12,000 lb at 20–25 %.
 * tongueRangeLb(12000, tongueBand("gooseneck")); // { minLb: 2400, maxLb: 3000 }
 */
export function tongueRangeLb(trailerGrossLb: number, band: Pick<TongueBand, "min" | "max">): { minLb: number; maxLb: number } {
  return { minLb: roundHalfUp(trailerGrossLb * band.min, 1), maxLb: roundHalfUp(trailerGrossLb * band.max, 1) };
}

/**
 * Codes of the placement findings (stable: screens and tests key on them).
 *
 * @example
 * PLACEMENT_FINDING_CODES.includes("TONGUE_WEIGHT_NEGATIVE"); // true
 */
export const PLACEMENT_FINDING_CODES = [
  "TONGUE_WEIGHT_NEGATIVE",
  "OVER_GVWR",
  "TONGUE_SHARE_BELOW_BAND",
  "TONGUE_SHARE_ABOVE_BAND",
  "MACHINE_BEYOND_DECK",
  "CG_ASSUMED_MIDDLE",
  "SIXTY_FORTY",
] as const;
/**
 * A placement finding's code.
 *
 * @example
 * const code: PlacementFindingCode = "OVER_GVWR";
 */
export type PlacementFindingCode = (typeof PLACEMENT_FINDING_CODES)[number];

/**
 * One thing the placement says, with its severity (the engine's scale: fail, warn, info)
 * and its source.
 *
 * @example
 * const f: PlacementFinding = { code: "OVER_GVWR", severity: "fail", message: "…", source: BAND_SOURCES.gvwr };
 */
export interface PlacementFinding {
  readonly code: PlacementFindingCode;
  readonly severity: Severity;
  readonly message: string;
  readonly source: string;
}

/**
 * What the machine's position does to the trailer: the shape `GET /api/v1/kits/{id}` carries
 * as `placement`. Weights are whole pounds; `tongueWeightShare` is a fraction (0.123 =
 * 12.3 %), rounded to 4 places. The verdict uses unrounded values.
 *
 * @example
 * const p: Placement = placeMachine(machine, trailer, 1000);
 * p.tongueWeightLb; p.tongueWeightShare; p.trailerGrossLb; p.axleLoadLb; p.gvwrLb; p.band; p.findings;
 */
export interface Placement {
  readonly machineFrontFromDeckFrontMm: number;
  readonly cgFromHitchMm: number;
  readonly cgAssumed: boolean;
  readonly tongueWeightLb: number;
  readonly tongueWeightShare: number;
  readonly trailerGrossLb: number;
  readonly axleLoadLb: number;
  readonly gvwrLb: number;
  readonly band: CouplingBand & { readonly minLb: number; readonly maxLb: number };
  /** Positions of the machine's front (from the deck front) that keep the share in the band, within the deck. */
  readonly inBand: PositionRange | null;
  readonly pass: boolean;
  readonly findings: readonly PlacementFinding[];
  readonly caution: string;
}

/**
 * A range of positions of the machine's front, measured back from the deck front, in mm.
 *
 * @example
 * const r: PositionRange = { fromMm: 1000, toMm: 1350 };
 */
export interface PositionRange {
  readonly fromMm: number;
  readonly toMm: number;
}

/**
 * Said beside every placement figure.
 *
 * @example
 * <p>{PLACEMENT_CAUTION}</p>
 */
export const PLACEMENT_CAUTION =
  "These figures are an estimate from plain statics and the figures entered: the trailer's empty weight and empty tongue weight, " +
  "the distance from the hitch to the axle centre, and the machine's weight and centre of gravity. Too little tongue weight can make " +
  "the trailer sway; too much loads the tow vehicle's rear axle and lightens its front, so steering and braking suffer. Follow the " +
  "trailer maker's and the tow vehicle maker's figures (hitch and tongue ratings, GVWR, axle ratings) and local rules, and weigh the rig " +
  "where it matters. This does not replace the driver's inspection.";

const PLACED_RISKS = "too little tongue weight can make the trailer sway; too much loads the tow vehicle's rear axle and lightens its front, so steering and braking suffer";

type PlacementMachine = Pick<Machine, "weightLb" | "lengthMm" | "cgFromFrontMm">;
type PlacementTrailer = Pick<Trailer, "coupling" | "deckLengthMm" | "gvwrLb" | "emptyWeightLb" | "emptyTongueWeightLb" | "hitchToAxleMm" | "hitchToDeckFrontMm">;

/**
 * Formats a length in mm as metres with feet and inches beside it: "1.20 m (3 ft 11 in)".
 *
 * @example
 * formatMetres(1200); // "1.20 m (3 ft 11 in)"
 * formatMetres(-300); // "−0.30 m (−1 ft 0 in)"
 */
export function formatMetres(mm: number): string {
  const sign = mm < 0 ? "−" : "";
  const inches = Math.round(Math.abs(mm) / MM_PER_IN);
  return `${sign}${(Math.abs(mm) / 1000).toFixed(2)} m (${sign}${Math.floor(inches / 12)} ft ${inches % 12} in)`;
}

function percent(share: number): string {
  return `${formatNumber(share * 100)} %`;
}

/**
 * A band in words: "10–15 %".
 *
 * @example
 * bandWords({ min: 0.2, max: 0.25 }); // "20–25 %"
 */
export function bandWords(band: Pick<TongueBand, "min" | "max">): string {
  return `${formatNumber(band.min * 100)}–${formatNumber(band.max * 100)} %`;
}

function requireGeometry(trailer: PlacementTrailer): { a: number; h: number } {
  if (!(trailer.hitchToAxleMm > 0)) throw new RangeError("The trailer's hitch-to-axle distance must be above 0 mm.");
  if (trailer.hitchToDeckFrontMm === null) throw new RangeError("The trailer's hitch-to-deck-front distance has not been measured.");
  return { a: trailer.hitchToAxleMm, h: trailer.hitchToDeckFrontMm };
}

function cgOf(machine: PlacementMachine): { cg: number; assumed: boolean } {
  return machine.cgFromFrontMm === null ? { cg: machine.lengthMm / 2, assumed: true } : { cg: machine.cgFromFrontMm, assumed: false };
}

/** T(p) = T0 + W·(a − x)/a with x = h + p + cg: the tongue weight for a machine front at p. */
function tongueAt(machine: PlacementMachine, trailer: PlacementTrailer, p: number): number {
  const { a, h } = requireGeometry(trailer);
  const x = h + p + cgOf(machine).cg;
  return trailer.emptyTongueWeightLb + (machine.weightLb * (a - x)) / a;
}

/**
 * The positions the slider may take: from the deck front to where the machine's rear meets
 * the deck's rear (0 to 0 when the machine is longer than the deck).
 *
 * @example
 * positionLimits({ lengthMm: 3000 }, { deckLengthMm: 6100 }); // { fromMm: 0, toMm: 3100 }
 */
export function positionLimits(machine: Pick<Machine, "lengthMm">, trailer: Pick<Trailer, "deckLengthMm">): PositionRange {
  return { fromMm: 0, toMm: Math.max(0, trailer.deckLengthMm - machine.lengthMm) };
}

/**
 * The positions of the machine's front (mm back from the deck front) that keep the tongue
 * share inside `band`, clipped to {@link positionLimits}; null when no position on the deck
 * does. The share falls as the machine moves back, so the range is one interval: solve
 * T(p) = band.max · G for its front edge and T(p) = band.min · G for its rear edge.
 *
 * @example
 * // The hand-worked gooseneck of placeMachine's example: 25 % at 1,000 mm, 20 % at 1,350 mm.
 * inBandRange(machine, trailer); // { fromMm: 1000, toMm: 1350 } (the slider's marks)
 */
export function inBandRange(machine: PlacementMachine, trailer: PlacementTrailer, band: Pick<TongueBand, "min" | "max"> = tongueBand(trailer.coupling)): PositionRange | null {
  const { a, h } = requireGeometry(trailer);
  const limits = positionLimits(machine, trailer);
  const G = trailer.emptyWeightLb + machine.weightLb;
  const { cg } = cgOf(machine);
  const W = machine.weightLb;
  if (W <= 0) {
    const s = trailer.emptyTongueWeightLb / G;
    return s >= band.min && s <= band.max ? limits : null;
  }
  // T0 + W(a − x)/a = s·G  ⇒  x = a − a(s·G − T0)/W  ⇒  p = x − h − cg
  const positionFor = (share: number) => a - (a * (share * G - trailer.emptyTongueWeightLb)) / W - h - cg;
  // A micrometre of slack so that a band edge landing on a whole millimetre is not lost to rounding.
  const from = Math.max(limits.fromMm, positionFor(band.max) - 1e-3);
  const to = Math.min(limits.toMm, positionFor(band.min) + 1e-3);
  const fromMm = Math.ceil(from);
  const toMm = Math.floor(to);
  return fromMm > toMm ? null : { fromMm, toMm };
}

/**
 * The placement figures and findings for a machine whose front sits `machineFrontFromDeckFrontMm`
 * back from the front of the deck (see the module comment for the statics and the bands).
 *
 * @throws {RangeError} when the trailer's hitch-to-deck-front distance is unknown or its hitch-to-axle distance is not above 0.
 * @example
 * // Hand calculation: a = 5,000 mm, hitch to deck front 1,000 mm, machine 10,000 lb, 3,000 mm long,
 * // CG 1,500 mm from its front, placed 1,000 mm back: x = 1,000 + 1,000 + 1,500 = 3,500 mm.
 * // T = 500 + 10,000 × (5,000 − 3,500) / 5,000 = 3,500 lb; G = 4,000 + 10,000 = 14,000 lb; s = 25 %.
 * placeMachine(machine, trailer, 1000).tongueWeightLb; // 3500
 */
export function placeMachine(machine: PlacementMachine, trailer: PlacementTrailer, machineFrontFromDeckFrontMm: number): Placement {
  const { a, h } = requireGeometry(trailer);
  const { cg, assumed } = cgOf(machine);
  const W = machine.weightLb;
  const p = machineFrontFromDeckFrontMm;
  const x = h + p + cg;
  const tongue = tongueAt(machine, trailer, p);
  const axle = trailer.emptyWeightLb - trailer.emptyTongueWeightLb + (W * x) / a;
  const gross = trailer.emptyWeightLb + W;
  const share = tongue / gross;
  const band = tongueBand(trailer.coupling);
  const range = tongueRangeLb(gross, band);
  const inBand = inBandRange(machine, trailer, band);
  const findings: PlacementFinding[] = [];
  const where = inBand
    ? ` With this machine the share is in the band when its front sits between ${formatMetres(inBand.fromMm)} and ${formatMetres(inBand.toMm)} back from the deck front.`
    : " No position on this deck brings it into the band: check the trailer's and the machine's figures, or the choice of trailer.";

  if (tongue < 0) {
    findings.push({
      code: "TONGUE_WEIGHT_NEGATIVE",
      severity: "fail",
      message: `The tongue weight comes to ${formatNumber(Math.round(tongue))} lb: the machine's centre of gravity sits ${formatMetres(x - a)} behind the axle centre and the trailer will lift the hitch. Move the machine forward.${where}`,
      source: BAND_SOURCES.statics,
    });
  } else if (share < band.min || share > band.max) {
    const below = share < band.min;
    const vehicleMakerAccepts = !below ? false : band.published.some((b) => share >= b.min && share <= b.max);
    findings.push({
      code: below ? "TONGUE_SHARE_BELOW_BAND" : "TONGUE_SHARE_ABOVE_BAND",
      severity: "warn",
      message:
        `The tongue weight, ${formatLbKg(Math.round(tongue))}, is ${percent(share)} of the loaded trailer's weight, ${below ? "below" : "above"} the ${bandWords(band)} band (${formatNumber(range.minLb)}–${formatNumber(range.maxLb)} lb).` +
        (vehicleMakerAccepts ? " It is inside the vehicle maker's 15–25 % but below the trailer maker's 20–25 %." : "") +
        ` ${below ? "Move the machine forward" : "Move the machine back"}: ${PLACED_RISKS}. Follow the trailer and tow vehicle makers' figures and local rules.${where}`,
      source: band.source,
    });
  }

  if (gross > trailer.gvwrLb) {
    findings.push({
      code: "OVER_GVWR",
      severity: "fail",
      message: `The loaded trailer weighs ${formatLbKg(gross)} (empty ${formatNumber(trailer.emptyWeightLb)} lb plus the machine's ${formatNumber(W)} lb), ${formatNumber(gross - trailer.gvwrLb)} lb over its GVWR of ${formatLbKg(trailer.gvwrLb)}. Use a trailer rated for the load; moving the machine does not change this.`,
      source: BAND_SOURCES.gvwr,
    });
  }

  const rearMm = p + machine.lengthMm;
  if (p < 0 || rearMm > trailer.deckLengthMm) {
    findings.push({
      code: "MACHINE_BEYOND_DECK",
      severity: "warn",
      message: p < 0
        ? `The machine's front sits ${formatMetres(-p)} ahead of the deck front, off the deck.`
        : `The machine's rear reaches ${formatMetres(rearMm - trailer.deckLengthMm)} past the rear of the deck.`,
      source: "The trailer's and machine's own dimensions",
    });
  }

  if (assumed) {
    findings.push({
      code: "CG_ASSUMED_MIDDLE",
      severity: "info",
      message: "The machine's centre of gravity is not recorded; the middle of its length is used. A machine's CG is often nearer its heavy end (counterweight, engine): enter it from the maker's data for a better estimate.",
      source: BAND_SOURCES.statics,
    });
  }

  // Common practice only: the share of the machine's length ahead of the axle centre, its
  // weight taken as spread evenly along it (the rule of thumb speaks of the load's weight).
  const frontFromHitch = h + p;
  const ahead = Math.min(1, Math.max(0, (a - frontFromHitch) / machine.lengthMm));
  findings.push({
    code: "SIXTY_FORTY",
    severity: "info",
    message: `About ${formatNumber(Math.round(ahead * 100))} % of the machine's length sits ahead of the axle centre (its weight taken as spread evenly). Loaders often aim for about 60 % of the load ahead of the axle; this is a rule of thumb, not a rule: the band above and the makers' figures decide.`,
    source: BAND_SOURCES.sixtyForty,
  });

  const order: Record<Severity, number> = { fail: 0, warn: 1, info: 2 };
  const sorted = findings.map((f, i) => [f, i] as const).sort((l, r) => order[l[0].severity] - order[r[0].severity] || l[1] - r[1]).map(([f]) => f);
  return {
    machineFrontFromDeckFrontMm: p,
    cgFromHitchMm: roundHalfUp(x, 1),
    cgAssumed: assumed,
    tongueWeightLb: Math.round(tongue),
    tongueWeightShare: roundHalfUp(share, 4),
    trailerGrossLb: gross,
    axleLoadLb: Math.round(axle),
    gvwrLb: trailer.gvwrLb,
    band: { ...band, ...range },
    inBand,
    pass: !sorted.some((f) => f.severity === "fail"),
    findings: sorted,
    caution: PLACEMENT_CAUTION,
  };
}

/**
 * A kit's placement, or what is missing to work it out (the machine not placed yet, the
 * trailer's hitch-to-deck-front distance not measured).
 *
 * @example
 * kitPlacement(kit); // { placement: { tongueWeightLb: 4190, … }, missing: [] }
 * kitPlacement({ ...kit, machineFrontFromDeckFrontMm: null }); // { placement: null, missing: ["The machine has not been placed on the deck yet."] }
 */
export function kitPlacement(kit: Pick<Kit, "machine" | "trailer" | "machineFrontFromDeckFrontMm">): { placement: Placement | null; missing: string[] } {
  const missing: string[] = [];
  if (kit.machineFrontFromDeckFrontMm === null) missing.push("The machine has not been placed on the deck yet.");
  if (kit.trailer.hitchToDeckFrontMm === null) missing.push(`The distance from ${kit.trailer.name}'s hitch point to the front of its deck has not been measured.`);
  if (!(kit.trailer.hitchToAxleMm > 0)) missing.push(`The distance from ${kit.trailer.name}'s hitch point to its axle centre has not been entered.`);
  if (missing.length) return { placement: null, missing };
  return { placement: placeMachine(kit.machine, kit.trailer, kit.machineFrontFromDeckFrontMm!), missing };
}
