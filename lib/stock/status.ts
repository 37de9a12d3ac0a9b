import type { ItemStatus } from "./labels";

/** Things that change an item's status, each recorded as an event of the same name. */
export type StatusChange = "check_pass" | "check_fail" | "tag_out" | "inspect_in_service" | "inspect_repair" | "inspect_retire" | "return_to_service" | "retire" | "lost" | "found";

const TARGET: Record<StatusChange, ItemStatus> = {
  check_pass: "in_service",
  check_fail: "tagged_out",
  tag_out: "tagged_out",
  inspect_in_service: "in_service",
  inspect_repair: "tagged_out",
  inspect_retire: "retired",
  return_to_service: "in_service",
  retire: "retired",
  lost: "lost",
  found: "tagged_out", // back from lost: held out of use until someone inspects it
};

const FROM: Record<StatusChange, readonly ItemStatus[]> = {
  check_pass: ["in_service"],
  check_fail: ["in_service"],
  tag_out: ["in_service"],
  inspect_in_service: ["in_service", "tagged_out"],
  inspect_repair: ["in_service", "tagged_out"],
  inspect_retire: ["in_service", "tagged_out"],
  return_to_service: ["tagged_out"],
  retire: ["in_service", "tagged_out", "lost"],
  lost: ["in_service", "tagged_out"],
  found: ["lost"],
};

const WHY_NOT: Record<ItemStatus, string> = {
  in_service: "This item is in service.",
  tagged_out: "This item is tagged out: it may not be used until an owner or designated person inspects it or returns it to service.",
  retired: "This item is retired and may not be used again.",
  lost: "This item is marked lost. Mark it found first.",
};

/**
 * The status after a change, or the reason the change is not possible from here.
 * @example nextStatus("tagged_out", "check_pass") // { error: "This item is tagged out: …" }
 */
export function nextStatus(current: ItemStatus, change: StatusChange): { status: ItemStatus } | { error: string } {
  if (!FROM[change].includes(current)) return { error: WHY_NOT[current] };
  return { status: TARGET[change] };
}
