import type { ItemRecord } from "@/db/items";
import { toKg } from "@/lib/securement/units";
import { KIND_LABELS, STATUS_LABELS, type ItemKind, type ItemStatus } from "./labels";


/**
 * "3/8 in", "10 mm", or null: sizes are stored as the trade label without the inch unit.
 * @example sizeLabel("3/8") // "3/8 in"
 */
export function sizeLabel(size: string | null): string | null {
  if (!size) return null;
  return /mm$/.test(size) ? size : `${size} in`;
}

/** A one-line description for lists and tags: "Chain, grade 70, 3/8 in". */
export function describeItem(item: { kind: string; grade: number | null; size: string | null; details?: Record<string, unknown> | null }): string {
  const parts: string[] = [KIND_LABELS[item.kind as ItemKind] ?? item.kind];
  const range = item.details?.chainSizeRange as [string, string] | undefined;
  if (item.kind === "binder" && item.details?.mechanism) parts[0] = `${item.details.mechanism === "lever" ? "Lever" : "Ratchet"} binder`;
  if (item.grade) parts.push(`grade ${item.grade}`);
  if (item.kind === "binder" && range) parts.push(`for ${range[0]}–${sizeLabel(range[1])} chain`);
  else if (item.kind === "web-strap" && item.size) parts.push(`${sizeLabel(item.size)} wide`);
  else if (item.size) parts.push(sizeLabel(item.size)!);
  return parts.join(", ");
}

/** The item as every API and scan screen answers it. */
export function toItemSummary(row: ItemRecord) {
  return {
    id: row.id,
    tagCode: row.tagCode,
    kind: row.kind,
    description: describeItem(row),
    grade: row.grade,
    size: row.size,
    lengthMm: row.lengthMm,
    status: row.status,
    statusLabel: STATUS_LABELS[row.status as ItemStatus]?.label ?? row.status,
    wllLb: row.wllLb,
    wllKg: row.wllLb == null ? null : Math.round(toKg({ value: row.wllLb, unit: "lb" }).value),
    wllSource: row.wllSource,
    markedWllLb: row.markedWllLb,
    serial: row.serial,
    yard: row.yardId ? { id: row.yardId, name: row.yardName } : null,
    nextInspectionDue: row.nextInspectionDue,
    lastCheckedAt: row.lastCheckedAt ? new Date(row.lastCheckedAt).toISOString() : null,
    lastInspectedOn: row.lastInspectedOn,
    url: `/items/${row.id}`,
  };
}

export type ItemSummaryJson = ReturnType<typeof toItemSummary>;
