import { itemRating } from "./rating";
import { toMillimetres, toRatable, type ItemInput } from "./schemas";

/**
 * The columns of an `items` row that an item's input decides, with the effective WLL the
 * rated-limit engine gives it. Shared by the add/edit service and the CSV import so that an
 * item is stored the same way whichever door it came in by.
 * @example itemRow({ kind: "chain", marking: "grade", grade: 70, size: "3/8" }).wll_lb // 6600
 */
export function itemRow(input: ItemInput) {
  const ratable = toRatable(input);
  const rating = itemRating(ratable);
  return {
    kind: input.kind,
    grade: ratable.grade,
    grade_marked: ratable.gradeMarked,
    size: input.size ?? (input.kind === "binder" ? (input.chainSizeRange?.[1] ?? null) : null),
    length_mm: input.length ? toMillimetres(input.length) : null,
    marked_wll_lb: ratable.markedWllLb,
    serial: input.serial ?? null,
    yard_id: input.yardId ?? null,
    in_service_on: input.inServiceOn ?? null,
    cost_cents: input.costCents ?? null,
    details: JSON.stringify(itemDetails(input)),
    wll_lb: rating.wllLb,
    wll_source: rating.source,
  };
}

export type ItemRowValues = ReturnType<typeof itemRow>;

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
