import { KIND_LABELS, type ItemKind } from "@/lib/stock/labels";
import { toFeet } from "@/lib/securement/units";
import { sizeLabel } from "@/lib/stock/describe";

// The words printed on a tag and shown on the public tag view: what the item is, its grade,
// size and WLL. The WLL is always in words; an item without one says so on the tag.

export interface TagLabelItem {
  kind: string;
  grade: number | null;
  gradeMarked?: boolean | null;
  size: string | null;
  lengthMm?: number | null;
  wllLb: number | null;
  details?: Record<string, unknown> | null;
}

export interface TagLabelText {
  /** "Chain", "Ratchet binder", "Web strap". */
  title: string;
  /** "Grade 70", or "No grade mark" for an unmarked chain; null when the kind has no grade. */
  grade: string | null;
  /** "3/8 in", "2 in wide", "For 5/16–3/8 in chain"; null when unknown. */
  size: string | null;
  /** "20 ft"; null when unknown. */
  length: string | null;
  /** "WLL 6,600 lb", or "No WLL: do not use". */
  wll: string;
  hasWll: boolean;
}


/**
 * WLL in words, as printed.
 * @example wllText(6600) // "WLL 6,600 lb"
 * @example wllText(null) // "No WLL: do not use"
 */
export function wllText(wllLb: number | null): string {
  return wllLb == null ? "No WLL: do not use" : `WLL ${wllLb.toLocaleString("en-US")} lb`;
}

/**
 * The words on one tag.
 * @example tagLabelText({ kind: "chain", grade: 70, size: "3/8", lengthMm: 6096, wllLb: 6600 })
 * // { title: "Chain", grade: "Grade 70", size: "3/8 in", length: "20 ft", wll: "WLL 6,600 lb", hasWll: true }
 */
export function tagLabelText(item: TagLabelItem): TagLabelText {
  let title: string = KIND_LABELS[item.kind as ItemKind] ?? item.kind;
  const mechanism = item.details?.mechanism;
  if (item.kind === "binder" && (mechanism === "ratchet" || mechanism === "lever")) {
    title = mechanism === "ratchet" ? "Ratchet binder" : "Lever binder";
  }

  let grade: string | null = null;
  if (item.kind === "chain" && item.gradeMarked === false) grade = "No grade mark";
  else if (item.grade) grade = `Grade ${item.grade}`;

  let size: string | null = sizeLabel(item.size);
  const range = item.details?.chainSizeRange;
  if (item.kind === "binder" && Array.isArray(range) && range.length === 2) size = `For ${range[0]}–${sizeLabel(String(range[1]))} chain`;
  else if (item.kind === "web-strap" && size) size = `${size} wide`;

  const length = item.lengthMm ? `${formatFeet(toFeet({ value: item.lengthMm, unit: "mm" }).value)} ft` : null;

  return { title, grade, size, length, wll: wllText(item.wllLb), hasWll: item.wllLb != null };
}

function formatFeet(feet: number): string {
  const halves = Math.round(feet * 2) / 2;
  return Number.isInteger(halves) ? String(halves) : halves.toFixed(1);
}

/**
 * A calendar day (YYYY-MM-DD) in words, the same in every time zone.
 * @example dayText("2026-11-02") // "November 2, 2026"
 */
export function dayText(isoDay: string): string {
  const date = new Date(`${isoDay}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return isoDay;
  return date.toLocaleDateString("en-US", { timeZone: "UTC", year: "numeric", month: "long", day: "numeric" });
}
