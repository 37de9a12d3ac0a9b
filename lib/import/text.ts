import type { TextEncoding } from "./file-check";

/**
 * Bytes to text, chunk by chunk: decodes in the file's encoding, drops a byte-order mark and
 * turns every line break (CRLF, CR, LF) into LF, also inside quoted values, so that a line
 * is a line whatever system wrote the file. Holds one chunk at a time.
 * @example for await (const text of decodeText(fileChunks, "utf-8")) parser.push(text)
 */
export async function* decodeText(bytes: AsyncIterable<Uint8Array | string>, encoding: TextEncoding): AsyncGenerator<string> {
  const decoder = new TextDecoder(encoding); // strips a leading byte-order mark itself
  let carry = "";
  let first = true;
  for await (const chunk of bytes) {
    let text = carry + (typeof chunk === "string" ? chunk : decoder.decode(chunk, { stream: true }));
    carry = "";
    if (first && text.charCodeAt(0) === 0xfeff) text = text.slice(1); // a string source keeps its mark
    first = first && text.length === 0;
    if (text.endsWith("\r")) {
      carry = "\r"; // its LF may start the next chunk
      text = text.slice(0, -1);
    }
    if (text) yield text.replace(/\r\n?/g, "\n");
  }
  const rest = carry + decoder.decode();
  if (rest) yield rest.replace(/\r\n?/g, "\n");
}
