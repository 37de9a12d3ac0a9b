import type { ItemFields } from "@/db/items";
import { itemRating } from "./rating";
import { toRatable, toWholeMm, type ItemInput } from "./schemas";

/**
 * The stored fields of an item that its input decides, with the effective WLL the rated-limit
 * engine gives it. Shared by the add/edit service and the CSV import so that an item is
 * stored the same way whichever door it came in by.
 * @example itemFields({ kind: "chain", marking: "grade", grade: 70, size: "3/8" }).wllLb // 6600
 */
export function itemFields(input: ItemInput): ItemFields {
  const ratable = toRatable(input);
  const rating = itemRating(ratable);
  return {
    kind: input.kind,
    grade: ratable.grade,
    gradeMarked: ratable.gradeMarked,
    size: input.size ?? (input.kind === "binder" ? (input.chainSizeRange?.[1] ?? null) : null),
    lengthMm: input.length ? toWholeMm(input.length) : null,
    markedWllLb: ratable.markedWllLb,
    serial: input.serial ?? null,
    yardId: input.yardId ?? null,
    inServiceOn: input.inServiceOn ?? null,
    costCents: input.costCents ?? null,
    details: itemDetails(input),
    wllLb: rating.wllLb,
    wllSource: rating.source,
  };
}

/** The kind-specific details an item's input sets (the keys the forms and the import manage). */
export function itemDetails(input: Pick<ItemInput, "mechanism" | "chainSizeRange" | "ends">): Record<string, unknown> {
  return {
    ...(input.mechanism && { mechanism: input.mechanism }),
    ...(input.chainSizeRange && { chainSizeRange: input.chainSizeRange }),
    ...(input.ends && { ends: input.ends }),
  };
}

/** Detail keys that {@link itemDetails} manages; any other key in `details` is kept as it is. */
export const MANAGED_DETAILS = ["mechanism", "chainSizeRange", "ends"] as const;
