import { readRecords, type CsvFatal, type CsvRecord } from "./csv";
import { detectDelimiter, type Delimiter } from "./delimiter";
import type { TextEncoding } from "./file-check";
import { decodeText } from "./text";

const HEAD_CHARS = 64 * 1024;

export type OpenedCsv =
  | { delimiter: Delimiter; delimiterName: "comma" | "semicolon" | "tab"; records: AsyncIterable<CsvRecord | CsvFatal> }
  | { error: string };

/**
 * A file's bytes as CSV records: decoded, its delimiter judged on the first 64 KB of text,
 * then read record by record as the bytes arrive.
 * @example const csv = await openCsv(createReadStream(path), "utf-8"); if (!("error" in csv)) for await (const r of csv.records) …
 */
export async function openCsv(bytes: AsyncIterable<Uint8Array | string>, encoding: TextEncoding): Promise<OpenedCsv> {
  const texts = decodeText(bytes, encoding)[Symbol.asyncIterator]();
  const buffered: string[] = [];
  let size = 0;
  while (size < HEAD_CHARS) {
    const next = await texts.next();
    if (next.done) break;
    buffered.push(next.value);
    size += next.value.length;
  }
  const found = detectDelimiter(buffered.join(""));
  if ("error" in found) {
    await texts.return?.(undefined);
    return found;
  }
  async function* all() {
    while (buffered.length) yield buffered.shift()!;
    for (;;) {
      const next = await texts.next();
      if (next.done) return;
      yield next.value;
    }
  }
  return { delimiter: found.delimiter, delimiterName: found.name, records: readRecords(all(), found.delimiter) };
}
