/**
 * The bodies and queries of the machines, trailers and kits API, as zod schemas: every
 * field checked with a message that names it, every quantity converted to whole pounds or
 * millimetres (quantities.ts). The screens send the same bodies.
 *
 * Limits that come from the securement engine's request schema (lib/securement/schema.ts):
 * at most 10 accessories per machine, each name at most 40 characters, never "machine"
 * (the word a tiedown uses for the machine itself), no name twice.
 *
 * @module
 */
import { z } from "zod";
import { ATTACHMENTS } from "@/lib/securement";
import { isIsoDate } from "@/lib/time";
import { UNIT_SYSTEMS } from "./display";
import { COUPLINGS, DEFAULT_COUPLING, KIT_STATES, SIDES, TRAILER_TYPES, type TrailerType } from "./model";
import { lengthField, weightField } from "./quantities";

const MAX_MACHINE_LB = 200_000; // beyond any machine a small outfit hauls on its own trailers
const MAX_TRAILER_LB = 200_000;
const MAX_LENGTH_MM = 30_000; // 98 ft
const MAX_ACCESSORIES = 10;

const text = (what: string, max: number) =>
  z
    .string({ error: `Enter the ${what}.` })
    .trim()
    .min(1, `Enter the ${what}.`)
    .max(max, `Keep the ${what} under ${max + 1} characters.`);

/** A few words of reason or note: one message whether it is empty or too short. */
const words = (message: string) =>
  z.string({ error: message }).trim().min(3, message).max(2000, "Keep it under 2,000 characters.");

const optionalText = (what: string, max: number) =>
  z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? null : v), z.string().trim().max(max, `Keep the ${what} under ${max + 1} characters.`).nullish());

/**
 * A date written YYYY-MM-DD that exists on the calendar.
 *
 * @example
 * dateField("date").parse("2026-12-03"); // "2026-12-03"
 */
export const dateField = (what: string) =>
  z.string({ error: `Enter the ${what} as YYYY-MM-DD.` }).refine(isIsoDate, { error: `Enter the ${what} as a real date, YYYY-MM-DD.` });

const uuid = (what: string) => z.uuid({ error: `${what} is not an id Linkyard gave.` });

function noRepeats(values: readonly string[], ctx: z.RefinementCtx, path: (i: number) => PropertyKey[], what: string) {
  const seen = new Set<string>();
  values.forEach((v, i) => {
    const key = v.toLowerCase();
    if (seen.has(key)) ctx.addIssue({ code: "custom", path: path(i), message: `${what} "${v}" is listed twice.` });
    seen.add(key);
  });
}

const side = z.enum(SIDES, { error: "The side is left, right or centre." });

/**
 * A machine, as POST and PUT /api/v1/machines take it.
 *
 * @example
 * machineInputSchema.parse({ name: "Unit 12", class: "mini-excavator", weight: { value: 8100, unit: "lb" },
 *   length: { value: 4.9, unit: "m" }, articulated: false, accessories: ["bucket", "blade"] });
 * // { ..., weightLb: 8100, lengthMm: 4900, ... }
 */
export const machineInputSchema = z
  .strictObject({
    name: text("machine's name", 80),
    class: text("machine class", 40),
    weight: weightField("shipping weight", MAX_MACHINE_LB),
    length: lengthField("transport length", 1, MAX_LENGTH_MM),
    width: lengthField("width", 1, MAX_LENGTH_MM).nullish(),
    height: lengthField("height", 1, MAX_LENGTH_MM).nullish(),
    articulated: z.boolean({ error: "Say whether the machine articulates (true or false)." }).default(false),
    accessories: z
      .array(text("accessory's name", 40), { error: "List the accessories by name." })
      .max(MAX_ACCESSORIES, `At most ${MAX_ACCESSORIES} accessories.`)
      .default([]),
    tiedownPoints: z
      .array(
        z.strictObject({
          label: text("tie-down point's label", 40),
          side,
          position: lengthField("position from the machine's front", 0, MAX_LENGTH_MM),
        }),
        { error: "List the tie-down points." },
      )
      .max(20, "At most 20 tie-down points.")
      .default([]),
    cgFromFront: lengthField("centre of gravity from the front", 0, MAX_LENGTH_MM).nullish(),
  })
  .superRefine((m, ctx) => {
    m.accessories.forEach((a, i) => {
      if (a.toLowerCase() === "machine") ctx.addIssue({ code: "custom", path: ["accessories", i], message: "\"machine\" is the machine itself; name the accessory (bucket, blade…)." });
    });
    noRepeats(m.accessories, ctx, (i) => ["accessories", i], "Accessory");
    noRepeats(m.tiedownPoints.map((p) => p.label), ctx, (i) => ["tiedownPoints", i, "label"], "Tie-down point");
    m.tiedownPoints.forEach((p, i) => {
      if (p.position > m.length) ctx.addIssue({ code: "custom", path: ["tiedownPoints", i, "position"], message: "This point is further back than the machine is long." });
    });
    if (m.cgFromFront != null && m.cgFromFront > m.length) ctx.addIssue({ code: "custom", path: ["cgFromFront"], message: "The centre of gravity must lie within the machine's length." });
  })
  .transform((m) => ({
    name: m.name,
    machineClass: m.class,
    weightLb: m.weight,
    lengthMm: m.length,
    widthMm: m.width ?? null,
    heightMm: m.height ?? null,
    articulated: m.articulated,
    accessories: m.accessories,
    tiedownPoints: m.tiedownPoints.map((p) => ({ label: p.label, side: p.side, positionMm: p.position })),
    cgFromFrontMm: m.cgFromFront ?? null,
  }));
export type MachineInput = z.output<typeof machineInputSchema>;

/**
 * A machine class of the organisation's own.
 *
 * @example
 * machineClassSchema.parse({ name: "Trencher" });
 */
export const machineClassSchema = z.strictObject({ name: text("class name", 40) });

const anchorPointInput = z.strictObject({
  id: uuid("The anchor point id").optional(),
  label: text("anchor point's label", 40),
  side,
  position: lengthField("position from the deck's front", 0, MAX_LENGTH_MM),
  wll: weightField("anchor point's WLL", 100_000),
  nextInspectionDue: z.preprocess((v) => (v === "" ? null : v), dateField("next inspection date").nullish()),
});

/** A tilt deck tilts whole; the other fixed-deck types do not tilt. */
function defaultTilt(type: TrailerType, deckLengthMm: number): number | null {
  if (type === "tilt-deck") return deckLengthMm;
  if (type === "split-tilt-deck") return null; // must be given
  return 0;
}

/**
 * A trailer with its anchor points, as POST and PUT /api/v1/trailers take it. The coupling
 * defaults from the type (model.ts DEFAULT_COUPLING); a tilt deck's tilting part defaults to
 * the whole deck, a split tilt deck's must be given, other decks do not tilt.
 *
 * @example
 * trailerInputSchema.parse({ name: "Deck 20", type: "tilt-deck", deckLength: { value: 20, unit: "ft" },
 *   gvwr: { value: 14000, unit: "lb" }, emptyWeight: { value: 3600, unit: "lb" },
 *   emptyTongueWeight: { value: 450, unit: "lb" }, hitchToAxle: { value: 21, unit: "ft" }, anchorPoints: [] });
 */
export const trailerInputSchema = z
  .strictObject({
    name: text("trailer's name", 80),
    type: z.enum(TRAILER_TYPES, { error: `The type is one of ${TRAILER_TYPES.join(", ")}.` }),
    coupling: z.enum(COUPLINGS, { error: `The coupling is one of ${COUPLINGS.join(", ")}.` }).nullish(),
    deckLength: lengthField("deck length", 1, MAX_LENGTH_MM),
    tiltLength: lengthField("tilting part of the deck", 0, MAX_LENGTH_MM).nullish(),
    deckWidth: lengthField("deck width", 1, 5_000).nullish(),
    gvwr: weightField("GVWR", MAX_TRAILER_LB),
    emptyWeight: weightField("empty weight", MAX_TRAILER_LB),
    emptyTongueWeight: weightField("empty tongue weight", 20_000),
    hitchToAxle: lengthField("distance from the hitch to the axles' centre", 1, MAX_LENGTH_MM),
    hitchToDeckFront: lengthField("distance from the hitch to the deck's front", 0, MAX_LENGTH_MM).nullish(),
    anchorPoints: z.array(anchorPointInput, { error: "List the anchor points." }).max(60, "At most 60 anchor points.").default([]),
  })
  .superRefine((t, ctx) => {
    const tilt = t.tiltLength ?? defaultTilt(t.type, t.deckLength);
    if (tilt === null) ctx.addIssue({ code: "custom", path: ["tiltLength"], message: "Give the length of the tilting part of a split tilt deck." });
    else if (tilt > t.deckLength) ctx.addIssue({ code: "custom", path: ["tiltLength"], message: "The tilting part cannot be longer than the deck." });
    if (t.emptyWeight >= t.gvwr) ctx.addIssue({ code: "custom", path: ["emptyWeight"], message: "The empty weight must be below the GVWR." });
    if (t.emptyTongueWeight >= t.emptyWeight) ctx.addIssue({ code: "custom", path: ["emptyTongueWeight"], message: "The empty tongue weight must be below the empty weight." });
    noRepeats(t.anchorPoints.map((a) => a.label), ctx, (i) => ["anchorPoints", i, "label"], "Anchor point");
    const ids = t.anchorPoints.map((a) => a.id).filter((id): id is string => !!id);
    noRepeats(ids, ctx, (i) => ["anchorPoints", t.anchorPoints.findIndex((a) => a.id === ids[i]), "id"], "Anchor point id");
    t.anchorPoints.forEach((a, i) => {
      if (a.position > t.deckLength) ctx.addIssue({ code: "custom", path: ["anchorPoints", i, "position"], message: "This anchor point is further back than the deck is long." });
    });
  })
  .transform((t) => ({
    name: t.name,
    trailerType: t.type,
    coupling: t.coupling ?? DEFAULT_COUPLING[t.type],
    deckLengthMm: t.deckLength,
    tiltLengthMm: t.tiltLength ?? defaultTilt(t.type, t.deckLength) ?? 0,
    deckWidthMm: t.deckWidth ?? null,
    gvwrLb: t.gvwr,
    emptyWeightLb: t.emptyWeight,
    emptyTongueWeightLb: t.emptyTongueWeight,
    hitchToAxleMm: t.hitchToAxle,
    hitchToDeckFrontMm: t.hitchToDeckFront ?? null,
    anchorPoints: t.anchorPoints.map((a) => ({ id: a.id ?? null, label: a.label, side: a.side, positionMm: a.position, wllLb: a.wll, nextInspectionDue: a.nextInspectionDue ?? null })),
  }));
export type TrailerInput = z.output<typeof trailerInputSchema>;

/**
 * What changes an anchor point's standing: an inspection (kept in use, taken out of use, or
 * retired), taking it out of use at once (bent, overloaded), returning it to use, retiring it.
 *
 * @example
 * anchorEventSchema.parse({ type: "tag_out", note: "Stake pocket bent after the last haul" });
 */
export const anchorEventSchema = z.discriminatedUnion(
  "type",
  [
    z.strictObject({
      type: z.literal("inspection"),
      outcome: z.enum(["in_service", "tag_out", "retire"], { error: "The outcome is in_service, tag_out or retire." }),
      note: optionalText("note", 2000),
      nextInspectionDue: z.preprocess((v) => (v === "" ? null : v), dateField("next inspection date").nullish()),
    }),
    z.strictObject({ type: z.literal("tag_out"), note: words("Say what is wrong.") }),
    z.strictObject({ type: z.literal("return_to_service"), reason: words("Give the reason in a few words.") }),
    z.strictObject({ type: z.literal("retired"), reason: words("Give the reason in a few words.") }),
  ],
  { error: "type is one of inspection, tag_out, return_to_service, retired." },
);
export type AnchorEventInput = z.output<typeof anchorEventSchema>;

/**
 * A new kit.
 *
 * @example
 * kitCreateSchema.parse({ date: "2026-12-03", job: "Hollins driveway", machineId, trailerId });
 */
export const kitCreateSchema = z.strictObject({
  date: dateField("date"),
  job: text("job", 120),
  site: optionalText("site", 200),
  machineId: uuid("machineId"),
  trailerId: uuid("trailerId"),
  articulationRestrained: z.boolean({ error: "articulationRestrained is true or false." }).default(false),
});
export type KitCreateInput = z.output<typeof kitCreateSchema>;

/**
 * Changes to a kit's words and facts (not its date, machine or trailer: a kit for another
 * date is a copy; another machine or trailer is another kit). Where the machine sits on the
 * deck is saved by its own route (PUT /api/v1/kits/{id}/placement, {@link placementSchema}).
 *
 * @example
 * kitPatchSchema.parse({ articulationRestrained: true });
 */
export const kitPatchSchema = z
  .strictObject({
    job: text("job", 120).optional(),
    site: optionalText("site", 200),
    articulationRestrained: z.boolean({ error: "articulationRestrained is true or false." }).optional(),
  })
  .refine((p) => Object.values(p).some((v) => v !== undefined), { error: "Send at least one field to change." });
export type KitPatchInput = z.output<typeof kitPatchSchema>;

/**
 * Where the machine sits: its front, measured back from the front of the deck; null takes
 * the placement away. The service also refuses a front behind the deck's rear.
 *
 * @example
 * placementSchema.parse({ machineFrontFromDeckFront: { value: 2, unit: "ft" } }); // { machineFrontFromDeckFrontMm: 610 }
 */
export const placementSchema = z
  .strictObject({
    machineFrontFromDeckFront: lengthField("distance from the deck's front to the machine's front", 0, MAX_LENGTH_MM).nullable(),
  })
  .transform((p) => ({ machineFrontFromDeckFrontMm: p.machineFrontFromDeckFront }));
export type PlacementInput = z.output<typeof placementSchema>;

/**
 * `?apply=true` saves the proposal; anything else only shows it.
 *
 * @example
 * proposalQuerySchema.parse({ apply: "true" }); // { apply: true }
 */
export const proposalQuerySchema = z
  .object({ apply: z.enum(["true", "false"], { error: "apply is true or false." }).optional() })
  .transform((q) => ({ apply: q.apply === "true" }));

const itemIds = z
  .array(uuid("An item id"), { error: "itemIds lists item ids." })
  .max(10, "At most 10 items in one tiedown.")
  .refine((ids) => new Set(ids).size === ids.length, { error: "An item is listed twice." });

const securesField = z.string().trim().min(1, "Say what the tiedown holds: machine, or an accessory.").max(40).default("machine");
const attachmentField = z.enum(ATTACHMENTS, { error: "The attachment is direct, indirect-same-side or indirect-across." });

/**
 * A new tiedown: an anchor point on the kit's trailer, how it attaches, what it holds, the
 * machine's tie-down point, and the items that make it up (in order from the anchor).
 *
 * @example
 * tiedownInputSchema.parse({ anchorPointId, attachment: "direct", secures: "machine", itemIds: [chainId, binderId] });
 */
export const tiedownInputSchema = z.strictObject({
  label: optionalText("label", 60),
  anchorPointId: uuid("anchorPointId"),
  attachment: attachmentField,
  secures: securesField,
  machinePoint: optionalText("machine point", 40),
  itemIds: itemIds.default([]),
});
export type TiedownInput = z.output<typeof tiedownInputSchema>;

/**
 * Changes to a tiedown (its items are added and removed on their own).
 *
 * @example
 * tiedownPatchSchema.parse({ attachment: "indirect-across" });
 */
export const tiedownPatchSchema = z
  .strictObject({
    label: text("label", 60).optional(),
    anchorPointId: uuid("anchorPointId").optional(),
    attachment: attachmentField.optional(),
    secures: z.string().trim().min(1).max(40).optional(),
    machinePoint: optionalText("machine point", 40),
  })
  .refine((p) => Object.values(p).some((v) => v !== undefined), { error: "Send at least one field to change." });
export type TiedownPatchInput = z.output<typeof tiedownPatchSchema>;

/**
 * Items to add to a tiedown.
 *
 * @example
 * tiedownItemsSchema.parse({ itemIds: [binderId] });
 */
export const tiedownItemsSchema = z.strictObject({ itemIds: itemIds.refine((ids) => ids.length > 0, { error: "Choose at least one item." }) });

/**
 * "Use the same for all four corners": the tiedown to copy.
 *
 * @example
 * cornersSchema.parse({ fromTiedownId });
 */
export const cornersSchema = z.strictObject({ fromTiedownId: uuid("fromTiedownId") });

const note = (what: "damage" | "loss") => words(`Say in a few words ${what === "damage" ? "what is damaged" : "what happened"}.`);

/**
 * A step in a kit's life. `scannedItemIds` lists what the yard hand scanned (loading: what
 * went on the trailer; returning: what came back); `damaged` items are tagged out and `lost`
 * items marked lost on return.
 *
 * @example
 * transitionSchema.parse({ to: "loaded", scannedItemIds: [a, b, c] });
 */
export const transitionSchema = z
  .strictObject({
    to: z.enum(KIT_STATES, { error: "to is one of draft, ready, loaded, returned." }),
    scannedItemIds: z
      .array(uuid("A scanned item id"), { error: "scannedItemIds lists item ids." })
      .max(200)
      .refine((ids) => new Set(ids).size === ids.length, { error: "An item is scanned twice." })
      .optional(),
    damaged: z.array(z.strictObject({ itemId: uuid("itemId"), note: note("damage") })).max(200).default([]),
    lost: z.array(z.strictObject({ itemId: uuid("itemId"), note: note("loss") })).max(200).default([]),
  })
  .superRefine((t, ctx) => {
    if ((t.to === "loaded" || t.to === "returned") && !t.scannedItemIds) {
      ctx.addIssue({ code: "custom", path: ["scannedItemIds"], message: `Scan every item to mark the kit ${t.to}.` });
    }
    const damaged = new Set(t.damaged.map((d) => d.itemId));
    t.lost.forEach((l, i) => {
      if (damaged.has(l.itemId)) ctx.addIssue({ code: "custom", path: ["lost", i, "itemId"], message: "An item is reported either damaged (it came back) or lost (it did not)." });
    });
    if (t.to !== "returned" && (t.damaged.length || t.lost.length)) {
      ctx.addIssue({ code: "custom", path: [t.damaged.length ? "damaged" : "lost"], message: "Damage and losses are reported when the kit is returned." });
    }
  });
export type TransitionInput = z.output<typeof transitionSchema>;

/**
 * A copy of a kit for another date.
 *
 * @example
 * copySchema.parse({ date: "2026-12-04" });
 */
export const copySchema = z.strictObject({
  date: dateField("date"),
  job: text("job", 120).optional(),
  site: optionalText("site", 200),
});

/**
 * The kit list's window: from and to (inclusive, YYYY-MM-DD), at most 92 days.
 *
 * @example
 * kitListQuerySchema.parse({ from: "2026-12-01", to: "2026-12-14" });
 */
export const kitListQuerySchema = z
  .object({
    from: dateField("from").optional(),
    to: dateField("to").optional(),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { error: "from must not be after to.", path: ["to"] })
  .refine((q) => !q.from || !q.to || Date.parse(q.to) - Date.parse(q.from) <= 92 * 86_400_000, { error: "Ask for at most 92 days at once.", path: ["to"] });

/**
 * A date to judge usability on (the verdict of anchor points in a trailer's answer).
 *
 * @example
 * onDateQuerySchema.parse({ on: "2026-12-03" });
 */
export const onDateQuerySchema = z.object({ on: dateField("on").optional() });

/**
 * Free items for a kit's date, optionally those that fit a tiedown.
 *
 * @example
 * freeItemsQuerySchema.parse({ forTiedownId, kind: "binder" });
 */
export const freeItemsQuerySchema = z.object({
  forTiedownId: uuid("forTiedownId").optional(),
  kind: z.string().trim().max(20).optional(),
});

/**
 * The organisation's preferred units.
 *
 * @example
 * unitsSchema.parse({ units: "metric" });
 */
export const unitsSchema = z.object({ units: z.enum(UNIT_SYSTEMS, { error: "Choose US or metric." }) });
