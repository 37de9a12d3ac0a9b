// What an uploaded import file is, read from its first bytes, never from its name or the
// browser's word: a spreadsheet workbook, an image or a PDF is refused with what to do
// instead, before anything is read as CSV. Pure; tested in tests/unit/import/.

/** The largest CSV file the import takes. 100,000 rows of stock are about 10 MB. */
export const MAX_IMPORT_BYTES = 50 * 1024 * 1024;

export type TextEncoding = "utf-8" | "utf-16le" | "utf-16be" | "windows-1252";

export interface FileRefusal {
  /** 400 empty, 413 too large, 415 not a text file. */
  status: 400 | 413 | 415;
  message: string;
}

const SAVE_AS_CSV = "In the spreadsheet, save or download the sheet as CSV (comma-separated values) and upload that file.";

/**
 * Why a file cannot be imported, or null when its first bytes look like text.
 * @example fileRefusal(new Uint8Array([0x50, 0x4b, 0x03, 0x04]), 4)?.status // 415
 */
export function fileRefusal(head: Uint8Array, size: number, maxBytes = MAX_IMPORT_BYTES): FileRefusal | null {
  if (size === 0) return { status: 400, message: "The file is empty." };
  if (size > maxBytes) {
    return { status: 413, message: `The file is over ${Math.round(maxBytes / 1024 / 1024)} MB. Split it into smaller files and import them one after the other.` };
  }
  const starts = (...bytes: number[]) => bytes.every((b, i) => head[i] === b);
  if (starts(0x50, 0x4b, 0x03, 0x04) || starts(0x50, 0x4b, 0x05, 0x06)) {
    return { status: 415, message: `This is a spreadsheet workbook (.xlsx) or another zip file, not a CSV file. ${SAVE_AS_CSV}` };
  }
  if (starts(0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1)) {
    return { status: 415, message: `This is an old-style spreadsheet workbook (.xls), not a CSV file. ${SAVE_AS_CSV}` };
  }
  if (
    starts(0x89, 0x50, 0x4e, 0x47) || // PNG
    starts(0xff, 0xd8, 0xff) || // JPEG
    starts(0x47, 0x49, 0x46, 0x38) || // GIF
    (starts(0x52, 0x49, 0x46, 0x46) && head[8] === 0x57 && head[9] === 0x45 && head[10] === 0x42 && head[11] === 0x50) // WebP
  ) {
    return { status: 415, message: "This is an image, not a CSV file. Upload the stock list as CSV." };
  }
  if (starts(0x25, 0x50, 0x44, 0x46, 0x2d)) {
    return { status: 415, message: "This is a PDF, not a CSV file. Ask the supplier for the list as a spreadsheet and save it as CSV." };
  }
  const encoding = detectEncoding(head);
  if (encoding === "utf-8" || encoding === "windows-1252") {
    // Text never holds a NUL byte in these encodings; a binary file almost always does.
    if (head.includes(0)) return { status: 415, message: `This file is not text, so it cannot be CSV. ${SAVE_AS_CSV}` };
  }
  return null;
}

/**
 * The text encoding of some bytes: a byte-order mark decides; without one, UTF-8 when the
 * bytes are valid UTF-8, else Windows-1252 (what older spreadsheets write). Given a file's
 * first bytes only, it cannot see an accent further on: a whole file goes through
 * {@link detectFileEncoding}.
 * @example detectEncoding(new Uint8Array([0xef, 0xbb, 0xbf, 0x41])) // "utf-8"
 */
export function detectEncoding(head: Uint8Array): TextEncoding {
  if (head[0] === 0xff && head[1] === 0xfe) return "utf-16le";
  if (head[0] === 0xfe && head[1] === 0xff) return "utf-16be";
  return isUtf8(head) ? "utf-8" : "windows-1252";
}

/**
 * The text encoding of a whole file, read as a stream: a byte-order mark decides; without
 * one, the file is UTF-8 only if every byte of it is valid UTF-8 (the platform's strict
 * decoder checks it, chunk by chunk, so memory holds one chunk), else Windows-1252. A file
 * whose first accented letter is on line 5,000 is judged on that letter too.
 * @example await detectFileEncoding([new TextEncoder().encode("Kind\nchain\n"), new Uint8Array([0xe9])]) // "windows-1252"
 */
export async function detectFileEncoding(chunks: AsyncIterable<Uint8Array> | Iterable<Uint8Array>): Promise<TextEncoding> {
  const strict = new TextDecoder("utf-8", { fatal: true });
  let head: Uint8Array | null = null;
  try {
    for await (const chunk of chunks) {
      if (!head) {
        head = chunk;
        if (head[0] === 0xef && head[1] === 0xbb && head[2] === 0xbf) return "utf-8"; // by its mark
        const bom = detectEncoding(head);
        if (bom !== "utf-8" && bom !== "windows-1252") return bom; // UTF-16 by its mark
      }
      strict.decode(chunk, { stream: true });
    }
    strict.decode(); // a sequence cut off at the end of the file is not UTF-8 either
    return "utf-8";
  } catch (error) {
    if (error instanceof TypeError) return "windows-1252";
    throw error;
  }
}

/** Valid UTF-8, allowing a sequence cut off at the very end (the head is a slice). */
function isUtf8(bytes: Uint8Array): boolean {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i];
    const extra = b < 0x80 ? 0 : b >= 0xc2 && b <= 0xdf ? 1 : b >= 0xe0 && b <= 0xef ? 2 : b >= 0xf0 && b <= 0xf4 ? 3 : -1;
    if (extra < 0) return false;
    for (let k = 1; k <= extra; k++) {
      if (i + k >= bytes.length) return true; // cut off by the slice
      if ((bytes[i + k] & 0xc0) !== 0x80) return false;
    }
    i += extra + 1;
  }
  return true;
}

/** The encoding in words, for the preview ("UTF-8"). */
export const ENCODING_WORDS: Record<TextEncoding, string> = {
  "utf-8": "UTF-8",
  "utf-16le": "UTF-16",
  "utf-16be": "UTF-16",
  "windows-1252": "Windows-1252 (older spreadsheet text)",
};
