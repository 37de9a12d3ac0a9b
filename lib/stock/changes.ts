import type { ItemFields } from "@/db/items";

// What a change of an item's details changed, as its history shows edits: { field: [before, after] }.
// One diff for every door: the edit form and API, an import's update and the undo of an import.

/** The values whose change the history records, with the yard by name (as people know it). */
export type TrackedFields = Pick<
  ItemFields,
  "grade" | "gradeMarked" | "size" | "lengthMm" | "markedWllLb" | "wllLb" | "serial" | "inServiceOn" | "costCents" | "details"
> & { yardId: string | null; yardName: string | null };

export type ItemChanges = Record<string, [unknown, unknown]>;

const TRACKED = ["grade", "gradeMarked", "size", "lengthMm", "markedWllLb", "wllLb", "serial", "yardName", "inServiceOn", "costCents", "details"] as const;

/** JSON with the keys of every object sorted, so that `{a, b}` and `{b, a}` compare equal. */
const canonical = (v: unknown): string =>
  v && typeof v === "object" && !Array.isArray(v)
    ? `{${Object.keys(v).sort().map((k) => `${JSON.stringify(k)}:${canonical((v as Record<string, unknown>)[k])}`).join(",")}}`
    : JSON.stringify(v ?? null);

/**
 * The tracked values that differ; empty when nothing changed.
 * @example itemChanges({ ...chain, grade: 70 }, { ...chain, grade: 80 }) // { grade: [70, 80] }
 */
export function itemChanges(before: Partial<TrackedFields>, after: Partial<TrackedFields>): ItemChanges {
  const out: ItemChanges = {};
  for (const key of TRACKED) {
    const a = key === "details" ? (before.details ?? {}) : (before[key] ?? null);
    const b = key === "details" ? (after.details ?? {}) : (after[key] ?? null);
    if (canonical(a) !== canonical(b)) out[key] = [a, b];
  }
  // another yard of the same name is still a move
  if ((before.yardId ?? null) !== (after.yardId ?? null) && !out.yardName) out.yardName = [before.yardName ?? null, after.yardName ?? null];
  return out;
}
