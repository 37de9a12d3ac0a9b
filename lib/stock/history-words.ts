import { toFeet } from "@/lib/securement/units";

// An item's service history in plain words, as the item page shows it: what happened, and
// what an edit changed, field by field in the words of the item's page (never a column or
// key name). Pure: the page adds who and when.

/** A history entry as stored (the parts the words come from). */
export interface HistoryEntry {
  type: string;
  outcome: string | null;
  note: string | null;
}

const TYPE_WORDS: Record<string, string> = {
  created: "Added to stock",
  imported: "Imported",
  edited: "Details changed",
  moved: "Moved",
  check: "Pre-use check",
  inspection: "Periodic inspection",
  tag_out: "Tagged out: do not use",
  return_to_service: "Returned to service",
  retired: "Retired",
  lost: "Marked lost",
  found: "Marked found (held out of use until inspected)",
  correction: "Correction",
  kit: "Kit",
};

const OUTCOME_WORDS: Record<string, string> = {
  pass: "passed, no defects",
  fail: "failed, defects found (tagged out)",
  in_service: "keep in service",
  repair: "hold for repair (tagged out)",
  retire: "retire",
};

/** Notes the app itself writes that only repeat the headline. */
const SAME_AS_HEADLINE = new Set(["Added to stock"]);

/**
 * The headline of a history entry, and its note when the note says more than the headline.
 * A kit's entry is its note ("In kit for Hollins driveway, 2026-12-03: loaded").
 * @example entryWords({ type: "check", outcome: "pass", note: null }) // { headline: "Pre-use check: passed, no defects", note: null }
 * @example entryWords({ type: "kit", outcome: "loaded", note: "In kit for Hollins driveway, 2026-12-03: loaded" }) // { headline: "In kit for Hollins driveway, 2026-12-03: loaded", note: null }
 */
export function entryWords(e: HistoryEntry): { headline: string; note: string | null } {
  if (e.type === "kit") return { headline: e.note ?? `Kit: ${e.outcome ?? ""}`.trim(), note: null };
  const type = TYPE_WORDS[e.type] ?? e.type.replaceAll("_", " ");
  const headline = e.outcome ? `${type}: ${OUTCOME_WORDS[e.outcome] ?? e.outcome.replaceAll("_", " ")}` : type;
  const note = e.note && !SAME_AS_HEADLINE.has(e.note) ? e.note : null;
  return { headline, note };
}

const FIELD_WORDS: Record<string, string> = {
  grade: "Grade",
  gradeMarked: "Grade mark legible",
  size: "Size",
  lengthMm: "Length",
  markedWllLb: "Marked WLL",
  wllLb: "WLL used",
  serial: "Serial or lot",
  yardName: "Lives at",
  inServiceOn: "In service since",
  costCents: "Cost",
  mechanism: "Binder",
  chainSizeRange: "Takes chain",
  ends: "End fittings",
};

function valueWords(field: string, v: unknown): string {
  if (v === null || v === undefined || v === "") return "none";
  switch (field) {
    case "gradeMarked":
      return v ? "yes" : "no (counts as grade 30)";
    case "lengthMm":
      return `${toFeet({ value: Number(v), unit: "mm" }).value.toFixed(1)} ft`;
    case "markedWllLb":
    case "wllLb":
      return `${Number(v).toLocaleString("en-US")} lb`;
    case "costCents":
      return `$${(Number(v) / 100).toFixed(2)}`;
    case "chainSizeRange":
      return Array.isArray(v) ? `${v[0]} to ${v[1]}` : String(v);
    default:
      return typeof v === "object" ? JSON.stringify(v) : String(v);
  }
}

/**
 * What an edit or a move changed, one line per field, in the item page's words.
 * The details (binder, chain range, end fittings) are compared key by key.
 * @example changeLines({ yardName: ["North yard", "South yard"], lengthMm: [6096, 4877] })
 * // ["Lives at: North yard → South yard", "Length: 20.0 ft → 16.0 ft"]
 */
export function changeLines(changes: Record<string, [unknown, unknown]>): string[] {
  const lines: string[] = [];
  for (const [field, [before, after]] of Object.entries(changes)) {
    if (field === "details") {
      const a = (before ?? {}) as Record<string, unknown>;
      const b = (after ?? {}) as Record<string, unknown>;
      for (const key of [...new Set([...Object.keys(a), ...Object.keys(b)])]) {
        if (JSON.stringify(a[key] ?? null) === JSON.stringify(b[key] ?? null)) continue;
        lines.push(`${FIELD_WORDS[key] ?? "Other detail"}: ${valueWords(key, a[key])} → ${valueWords(key, b[key])}`);
      }
      continue;
    }
    lines.push(`${FIELD_WORDS[field] ?? field}: ${valueWords(field, before)} → ${valueWords(field, after)}`);
  }
  return lines;
}
