// Writing CSV that a spreadsheet opens without running anything: the stock export, the
// rejected rows of an import and the template. Pure.
import { KIND_LABELS, STATUS_LABELS, type ItemKind, type ItemStatus } from "@/lib/stock/labels";
import type { ItemRecord } from "@/db/items";
import { toFeet } from "@/lib/securement/units";
import { REASON_SHORT, type Usability } from "@/lib/stock/usability";

/**
 * A cell a spreadsheet would run as a formula (it starts with =, +, -, @, a tab or a carriage
 * return) gets a leading single quote, so it shows as text. A plain number, such as -5 or
 * +1.5, is left alone: it is not a formula, and stock data has no negative numbers anyway.
 * The import reads the quote back off (lib/import/values.ts `unneutralise`).
 * @example neutralise("=HYPERLINK(\"x\")") // "'=HYPERLINK(\"x\")"
 * @example neutralise("-A12") // "'-A12"
 * @example neutralise("-5") // "-5"
 */
export function neutralise(value: string): string {
  if (/^[+-]?(\d+(\.\d+)?|\.\d+)$/.test(value)) return value;
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/**
 * One CSV line (RFC 4180, CRLF): values with a delimiter, quote or line break, or with
 * spaces at either end, are quoted; every value is neutralised.
 * @example csvLine(["3/8", 'a "b"', null]) // '3/8,"a ""b""",\r\n'
 */
export function csvLine(values: readonly (string | number | null | undefined)[], delimiter = ","): string {
  return (
    values
      .map((v) => {
        if (v === null || v === undefined) return "";
        const s = neutralise(String(v));
        return /[",\r\n;\t]/.test(s) || s.includes(delimiter) || /^\s|\s$/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
      })
      .join(delimiter) + "\r\n"
  );
}

/** The export's columns; each one maps to itself on import, or is one Linkyard sets and the import leaves alone. */
export const EXPORT_HEADERS = [
  "Tag code", "Kind", "Marking", "Grade", "Size", "Marked WLL (lb)", "Binder", "Takes chain", "Length (ft)",
  "End fittings", "Serial/Lot", "Yard", "In service", "Cost", "Status", "WLL used (lb)", "Inspection due", "Usable today",
] as const;

/** What the export reads of a stored item. */
export type ExportItem = Pick<
  ItemRecord,
  | "tagCode" | "kind" | "grade" | "gradeMarked" | "size" | "lengthMm" | "markedWllLb" | "wllLb" | "serial"
  | "status" | "yardName" | "nextInspectionDue" | "inServiceOn" | "costCents"
> & { details: ItemRecord["details"] | null };

const trimZeros = (n: number, decimals: number) => String(Number(n.toFixed(decimals)));

/**
 * The verdict as a cell: "yes", or "no" with its reasons in a few words.
 * @example usableCell({ ok: false, reasons: [{ code: "INSPECTION_OVERDUE", message: "…" }] }) // "no: inspection overdue"
 */
export function usableCell(usable: Usability): string {
  return usable.ok ? "yes" : `no: ${usable.reasons.map((r) => REASON_SHORT[r.code]).join(", ")}`;
}

/**
 * An item as a row of the export, in the order of {@link EXPORT_HEADERS}, with its verdict on
 * the day of the export. Lengths go out in feet to 3 decimals, which reads back to the same
 * whole millimetre.
 */
export function exportRow(item: ExportItem, usable: Usability): (string | number | null)[] {
  const d = item.details ?? {};
  const range = Array.isArray(d.chainSizeRange) ? (d.chainSizeRange as string[]) : null;
  return [
    item.tagCode,
    KIND_LABELS[item.kind as ItemKind] ?? item.kind,
    item.markedWllLb != null ? "wll" : item.gradeMarked ? "grade" : "none",
    item.grade,
    item.size,
    item.markedWllLb,
    typeof d.mechanism === "string" ? d.mechanism : null,
    range ? `${range[0]}-${range[1]}` : null,
    item.lengthMm != null ? trimZeros(toFeet({ value: item.lengthMm, unit: "mm" }).value, 3) : null,
    typeof d.ends === "string" ? d.ends : null,
    item.serial,
    item.yardName,
    item.inServiceOn,
    item.costCents != null ? (item.costCents / 100).toFixed(2) : null,
    STATUS_LABELS[item.status as ItemStatus]?.label ?? item.status,
    item.wllLb,
    item.nextInspectionDue,
    usableCell(usable),
  ];
}

/** The template's columns: what a supplier's list usually has, in words the import reads. */
export const TEMPLATE_HEADERS = ["Kind", "Grade", "Size", "WLL (lb)", "Takes chain", "Length (ft)", "End fittings", "Serial/Lot", "Yard", "In service", "Cost", "Qty"] as const;

/** The template: its header and example rows that import as they are. */
export function templateCsv(yardName: string | null): string {
  const yard = yardName ?? "";
  const rows: (string | number)[][] = [
    ["chain", "G70", "3/8", "", "", 20, "grab hook both ends", "SUP-CH-0001", yard, "2026-01-15", "119.00", 1],
    ["chain", "80", "10 mm", "", "", 16, "clevis grab hook both ends", "SUP-CH-0002", yard, "2026-01-15", "245.00", 1],
    ["ratchet binder", "", "", 5400, "5/16-3/8", "", "", "SUP-BR-0001", yard, "2026-01-15", "69.00", 1],
    ["lever binder", "", "", 5400, "5/16-3/8", "", "", "SUP-BR-0002", yard, "2026-01-15", "42.00", 1],
    // A quantity makes that many items from the row, the serial numbered for each (SUP-WS-0001-01 …).
    ["web strap", "", "4", 5400, "", 30, "wire hooks", "SUP-WS-0001", yard, "2026-01-15", "49.00", 4],
    ["hook", "70", "3/8", 6600, "", "", "clevis grab hook", "SUP-HK-0001", yard, "2026-01-15", "14.00", 1],
    ["shackle", "", "5/8", 6500, "", "", "screw pin anchor shackle", "SUP-SH-0001", yard, "2026-01-15", "19.00", 1],
  ];
  return [csvLine([...TEMPLATE_HEADERS]), ...rows.map((r) => csvLine(r))].join("");
}
