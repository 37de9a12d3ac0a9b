import Papa from "papaparse";
import type { Delimiter } from "./delimiter";

/** One record of the file, with the line it starts on as a person counts lines (header = 1). */
export interface CsvRecord {
  line: number;
  fields: string[];
  /** A quote in the wrong place on this record (the values may be cut wrongly). */
  quoteProblem?: string;
}

/** The file cannot be read past this point: reported, and nothing is imported. */
export interface CsvFatal {
  line: number;
  fatal: string;
}

/** No record is this long; a partial record past it means a quote was opened and never closed. */
const MAX_RECORD_CHARS = 256 * 1024;

export const UNCLOSED_QUOTE = (line: number) =>
  `Quotes broken mid-file: a quoted value starts on line ${line} and is never closed, so the rest of the file cannot be read. Close the quote (or remove it) and upload again.`;
export const MISPLACED_QUOTE =
  'A quote is in the wrong place in this row: a quoted value must end with its quote right before the next comma or line break, and a quote inside a value is written twice ("").';

const breaks = (s: string) => {
  let n = 0;
  for (let i = s.indexOf("\n"); i !== -1; i = s.indexOf("\n", i + 1)) n++;
  return n;
};

/**
 * Reads CSV records from text chunks (LF line breaks, as {@link decodeText} gives them) with
 * papaparse's parser, keeping only the unfinished last record between chunks. Quoted values
 * may hold delimiters and line breaks; a record's line is the line it starts on. Blank lines
 * (or lines of empty cells) are skipped but counted.
 * @example for await (const r of readRecords(chunks, ",")) if ("fatal" in r) stop(r); else use(r.line, r.fields)
 */
export async function* readRecords(chunks: AsyncIterable<string>, delimiter: Delimiter): AsyncGenerator<CsvRecord | CsvFatal> {
  const parser = new Papa.Parser({ delimiter, newline: "\n" });
  let partial = "";
  let line = 1;

  function* emit(result: Papa.ParseResult<string[]>): Generator<CsvRecord> {
    const misplaced = new Set(result.errors.filter((e) => e.code === "InvalidQuotes").map((e) => e.row));
    for (let i = 0; i < result.data.length; i++) {
      const fields = result.data[i];
      const start = line;
      line += 1 + fields.reduce((n, f) => n + breaks(f), 0);
      if (fields.every((f) => f.trim() === "")) continue;
      yield misplaced.has(i) ? { line: start, fields, quoteProblem: MISPLACED_QUOTE } : { line: start, fields };
    }
  }

  for await (const chunk of chunks) {
    const text = partial + chunk;
    const result = parser.parse(text, 0, true) as Papa.ParseResult<string[]>; // keep the last, maybe unfinished, record
    partial = text.slice(result.meta.cursor);
    yield* emit(result);
    if (partial.length > MAX_RECORD_CHARS) {
      yield { line, fatal: UNCLOSED_QUOTE(line) };
      return;
    }
  }
  const result = parser.parse(partial, 0, false) as Papa.ParseResult<string[]>;
  if (result.errors.some((e) => e.code === "MissingQuotes")) {
    // the records before the unclosed quote are complete
    const good = { ...result, data: result.data.slice(0, -1) };
    yield* emit(good);
    yield { line, fatal: UNCLOSED_QUOTE(line) };
    return;
  }
  yield* emit(result);
}
