import type { ItemKind } from "./labels";

/**
 * Pre-use checklists, one per kind of item. Each point is a defect: the yard hand answers
 * "no" (not found) for every point to pass; any "yes" fails the check and tags the item out.
 * 49 CFR 393.104(b) forbids tiedowns with damaged or weakened components; the points below
 * name the damage that the cited standards list as grounds for removal.
 */
export interface CheckPoint {
  id: string;
  label: string;
  source: string;
}

const DAMAGED = "49 CFR 393.104(b)";

export const PRE_USE_CHECKLISTS: Record<ItemKind, readonly CheckPoint[]> = {
  chain: [
    { id: "cracked", label: "Cracked, cut or gouged links", source: `${DAMAGED}; ASME B30.9 §9-1.9.5 (chain removal list)` },
    { id: "bent", label: "Bent, twisted or stretched links, or links that do not hinge freely", source: "ASME B30.9 §9-1.9.5" },
    { id: "worn", label: "Links worn thin, nicked or pitted by corrosion", source: "ASME B30.9 §9-1.9.5" },
    { id: "hooks", label: "End hooks opened, bent or twisted", source: "ASME B30.10 (hook removal criteria)" },
    { id: "repairs", label: "Knots, or repairs with lap links, bolts or welds", source: "CVSA out-of-service criteria, tiedown defect table (knots); 49 CFR 393.104(f)" },
    { id: "heat", label: "Heat damage, weld spatter or discolouration", source: "ASME B30.9 §9-1.9.5" },
  ],
  binder: [
    { id: "handle", label: "Handle bent, cracked or extended with a cheater bar", source: `${DAMAGED}; common practice` },
    { id: "hooks", label: "Binder hooks opened, bent or cracked", source: "ASME B30.10 (hook removal criteria)" },
    { id: "hold", label: "Ratchet pawl slips or the lever will not stay over centre", source: `${DAMAGED}; common practice` },
    { id: "threads", label: "Screw threads damaged, or the barrel or swivel seized", source: `${DAMAGED}; common practice` },
    { id: "marking", label: "WLL marking missing or unreadable", source: "ASME B30.26 §26-1.8.4 (identification); common practice" },
  ],
  "web-strap": [
    { id: "cuts", label: "Cuts, tears, holes or snags in the webbing", source: `${DAMAGED}; WSTDA-T-1 removal list (from memory, not verified)` },
    { id: "burns", label: "Burns, melting, charring or chemical damage", source: "WSTDA-T-1 removal list (from memory, not verified)" },
    { id: "stitching", label: "Broken or worn stitching", source: "WSTDA-T-1 removal list (from memory, not verified)" },
    { id: "knots", label: "Knots in the webbing", source: "CVSA out-of-service criteria, tiedown defect table" },
    { id: "label", label: "Label missing or unreadable", source: "WSTDA-T-1 (identification, from memory, not verified)" },
    { id: "hardware", label: "Hooks or ratchet distorted, cracked or corroded", source: DAMAGED },
  ],
  "wire-rope": [
    { id: "broken", label: "Broken wires (10 in one lay, or 5 in one strand in one lay, means remove)", source: "ASME B30.9 §9-2.9.5" },
    { id: "kinks", label: "Kinks, crushing, birdcaging or other distortion", source: "ASME B30.9 §9-2.9.5" },
    { id: "corrosion", label: "Heavy corrosion or heat damage", source: "ASME B30.9 §9-2.9.5" },
    { id: "ends", label: "End fittings cracked, worn or pulling out", source: "ASME B30.9 §9-2.9.5" },
  ],
  hook: [
    { id: "throat", label: "Throat opened wider than when new", source: "ASME B30.10 (throat opening increase)" },
    { id: "twist", label: "Any visible bend or twist", source: "ASME B30.10" },
    { id: "cracks", label: "Cracks, nicks or gouges", source: "ASME B30.10" },
    { id: "latch", label: "Latch missing or broken (where fitted)", source: "ASME B30.10" },
  ],
  shackle: [
    { id: "pin", label: "Pin missing, bent, not fully seated or not the shackle's own", source: "ASME B30.26 §26-1.8.4" },
    { id: "body", label: "Body bent, twisted, cracked or opened", source: "ASME B30.26 §26-1.8.4" },
    { id: "marking", label: "Rated load or maker's name missing or unreadable", source: "ASME B30.26 §26-1.8.4" },
    { id: "heat", label: "Heat damage or weld spatter", source: "ASME B30.26 §26-1.8.4" },
  ],
  "rated-item": [
    { id: "damage", label: "Cracks, bends, cuts or other visible damage", source: DAMAGED },
    { id: "marking", label: "WLL marking missing or unreadable", source: "common practice" },
  ],
};

export interface CheckAnswer {
  id: string;
  defect: boolean;
}

/**
 * The outcome of a pre-use check: every point of the kind's list must be answered, and
 * any defect fails it. A refusal names the point at fault (`point`), so that a form can mark
 * that question.
 * @example preUseOutcome("hook", [{ id: "throat", defect: true }, ...]) // { outcome: "fail", defects: ["Throat opened …"] }
 * @example preUseOutcome("hook", []) // { error: 'Answer every point: "Throat opened wider than when new" has no answer.', point: "throat" }
 */
export function preUseOutcome(kind: ItemKind, answers: readonly CheckAnswer[]):
  | { outcome: "pass" | "fail"; defects: string[]; checklist: { id: string; label: string; defect: boolean }[] }
  | { error: string; point: string } {
  const points = PRE_USE_CHECKLISTS[kind];
  const byId = new Map(answers.map((a) => [a.id, a.defect]));
  const unknown = answers.find((a) => !points.some((p) => p.id === a.id));
  if (unknown) return { error: `"${unknown.id}" is not a point of the ${kind} checklist.`, point: unknown.id };
  const missing = points.find((p) => !byId.has(p.id));
  if (missing) return { error: `Answer every point: "${missing.label}" has no answer.`, point: missing.id };
  const checklist = points.map((p) => ({ id: p.id, label: p.label, defect: byId.get(p.id)! }));
  const defects = checklist.filter((c) => c.defect).map((c) => c.label);
  return { outcome: defects.length ? "fail" : "pass", defects, checklist };
}
