import { KIND_LABELS, STATUS_LABELS, type ItemKind, type ItemStatus } from "@/lib/stock/labels";
import { changeLines, entryWords } from "@/lib/stock/history-words";
import { formatDateTime } from "@/lib/time";

// One history entry of the inspection and service record in words: the same words on the
// printed report and in the CSV. Pure; the route and the page add the organisation's clock.

/** What the record reads of an entry (db/records.ts RecordEvent fits). */
export interface RecordEntry {
  id: number;
  at: Date | string;
  type: string;
  outcome: string | null;
  checklist: { label: string; defect: boolean }[] | null;
  measurements: { label: string; value: number; unit: string; limit: string; exceeded: boolean }[] | null;
  note: string | null;
  changes: Record<string, [unknown, unknown]> | null;
  correctsEventId: number | null;
  actorName: string | null;
  files: string[];
  tagCode: string;
  kind: string;
  grade: number | null;
  size: string | null;
  serial: string | null;
  wllLb: number | null;
  status: string;
}

/** A measured value as a person reads it. */
export interface MeasuredWords {
  label: string;
  value: string;
  limit: string;
  /** "past the limit" or "within the limit": in words, never by colour alone. */
  verdict: string;
  exceeded: boolean;
}

/** An entry in words. */
export interface EntryWords {
  /** YYYY-MM-DD HH:mm on the organisation's clock. */
  when: string;
  headline: string;
  /** The outcome alone (the verdict of a check or an inspection), or "". */
  outcome: string;
  defects: string[];
  measured: MeasuredWords[];
  note: string | null;
  changes: string[];
  by: string;
}

const OUTCOMES: Record<string, string> = {
  pass: "Passed, no defects",
  fail: "Failed, defects found",
  in_service: "Keep in service",
  repair: "Hold for repair",
  retire: "Retire",
};

/**
 * A measured value with its unit: "0.33 in", "4 %", "3" (a count).
 * @example measuredValue({ value: 4, unit: "%" }) // "4 %"
 */
export function measuredValue(m: { value: number; unit: string }): string {
  return m.unit === "count" ? String(m.value) : `${m.value} ${m.unit}`;
}

/**
 * An entry of the record in words, its time on the organisation's clock.
 * @example entryInWords({ type: "inspection", outcome: "in_service", at: "2026-12-01T15:00:00Z", actorName: "Olive", … }, "America/Chicago").when // "2026-12-01 09:00"
 */
export function entryInWords(e: RecordEntry, timeZone: string): EntryWords {
  const { headline, note } = entryWords(e);
  return {
    when: formatDateTime(e.at, timeZone),
    headline,
    outcome: e.outcome && e.type !== "kit" ? (OUTCOMES[e.outcome] ?? e.outcome.replaceAll("_", " ")) : "",
    defects: (e.checklist ?? []).filter((c) => c.defect).map((c) => c.label),
    measured: (e.measurements ?? []).map((m) => ({
      label: m.label,
      value: measuredValue(m),
      limit: m.limit,
      verdict: m.exceeded ? "past the limit" : "within the limit",
      exceeded: m.exceeded,
    })),
    note,
    changes: e.changes ? changeLines(e.changes) : [],
    by: e.actorName ?? "Linkyard",
  };
}

/** The CSV's columns, in order. */
export const RECORD_HEADERS = [
  "Date and time", "Time zone", "Tag code", "Serial/Lot", "Kind", "Grade", "Size", "WLL (lb)", "Entry", "Verdict or outcome",
  "Defects found", "Measured", "Limits", "Past a limit", "Note", "Changes", "Files", "By", "Corrects entry", "Entry number", "Status now",
] as const;

/**
 * An entry as a row of the CSV, in the order of {@link RECORD_HEADERS} (the caller writes it
 * with `csvLine`, which guards every cell against formula injection).
 */
export function recordRow(e: RecordEntry, timeZone: string): (string | number | null)[] {
  const w = entryInWords(e, timeZone);
  return [
    w.when,
    timeZone,
    e.tagCode,
    e.serial,
    KIND_LABELS[e.kind as ItemKind] ?? e.kind,
    e.grade,
    e.size,
    e.wllLb,
    w.headline,
    w.outcome,
    w.defects.join("; "),
    w.measured.map((m) => `${m.label}: ${m.value}`).join("; "),
    w.measured.map((m) => `${m.label}: ${m.limit}`).join("; "),
    w.measured.length ? (w.measured.some((m) => m.exceeded) ? `yes: ${w.measured.filter((m) => m.exceeded).map((m) => m.label).join("; ")}` : "no") : "",
    w.note,
    w.changes.join("; "),
    e.files.join("; "),
    w.by,
    e.correctsEventId,
    e.id,
    STATUS_LABELS[e.status as ItemStatus]?.label ?? e.status,
  ];
}
