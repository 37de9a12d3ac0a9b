import Papa from "papaparse";

export type Delimiter = "," | ";" | "\t";

export const DELIMITER_NAMES: Record<Delimiter, "comma" | "semicolon" | "tab"> = { ",": "comma", ";": "semicolon", "\t": "tab" };

const CANDIDATES: Delimiter[] = [",", ";", "\t"];
const OTHERS: [string, string][] = [
  ["|", "vertical bars (|)"],
  [":", "colons (:)"],
  ["^", "carets (^)"],
];

export type DelimiterResult = { delimiter: Delimiter; name: "comma" | "semicolon" | "tab" } | { error: string };

function shape(head: string, delimiter: string) {
  const rows = Papa.parse<string[]>(head, { delimiter, newline: "\n", preview: 30, skipEmptyLines: true }).data;
  // the last row of a head may be cut short; judge on whole rows when there are enough
  const judged = rows.length > 2 ? rows.slice(0, -1) : rows;
  const width = judged[0]?.length ?? 0;
  const same = judged.filter((r) => r.length === width).length;
  return { width, consistency: judged.length ? same / judged.length : 0 };
}

/**
 * Which of comma, semicolon or tab separates the columns, judged on the first rows: the one
 * that gives the header more than one column and the same number of columns on every row.
 * A file split by another character is refused with words, not misread as one column.
 * @example detectDelimiter("Kind;Size\nchain;3/8\n") // { delimiter: ";", name: "semicolon" }
 */
export function detectDelimiter(head: string): DelimiterResult {
  let best: { delimiter: Delimiter; width: number; consistency: number } | null = null;
  for (const delimiter of CANDIDATES) {
    const s = shape(head, delimiter);
    if (s.width < 2) continue;
    if (!best || s.consistency > best.consistency || (s.consistency === best.consistency && s.width > best.width)) best = { delimiter, ...s };
  }
  if (best) return { delimiter: best.delimiter, name: DELIMITER_NAMES[best.delimiter] };
  for (const [other, words] of OTHERS) {
    if (shape(head, other).width >= 2) {
      return { error: `The columns are separated by ${words}. Linkyard reads columns separated by commas, semicolons or tabs: save the file as CSV from the spreadsheet.` };
    }
  }
  // One column only: read it as comma-separated; the column mapping then says what is missing.
  return { delimiter: ",", name: "comma" };
}
