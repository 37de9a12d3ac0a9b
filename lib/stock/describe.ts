// How an item is named to people: its size with its unit, and a one-line description.
import { KIND_LABELS, type ItemKind } from "./labels";

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
