import "server-only";
import { randomUUID } from "node:crypto";
import { createWriteStream } from "node:fs";
import { rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { Readable } from "node:stream";
import { finished, pipeline } from "node:stream/promises";
import type { ReadableStream as WebReadableStream } from "node:stream/web";
import busboy from "busboy";
import { badRequest } from "./errors";

// A multipart upload read as a stream: the file part goes to a temporary file on disk as it
// arrives (keeping its first bytes for a type check), the small text fields are kept. The
// server's memory holds one network chunk at a time, whatever the file's size.

export interface SpooledFile {
  path: string;
  name: string;
  size: number;
  /** The first bytes, to tell what the file really is. */
  head: Uint8Array;
  /** Past the size limit: the rest of the upload was read and thrown away. */
  tooLarge: boolean;
}

export interface SpooledUpload {
  file: SpooledFile | null;
  fields: Record<string, string>;
  /** Removes the temporary file. */
  cleanup: () => Promise<void>;
}

const HEAD_BYTES = 64;

export async function spoolMultipart(request: Request, options: { fileField: string; maxFileBytes: number }): Promise<SpooledUpload> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data") || !request.body) {
    throw badRequest(`Send the file as multipart/form-data in the field "${options.fileField}".`, [{ path: options.fileField, message: "Choose a CSV file." }]);
  }
  const fields: Record<string, string> = {};
  const tmp = path.join(tmpdir(), `linkyard-upload-${randomUUID()}`);
  let file: SpooledFile | null = null;
  const cleanup = () => rm(tmp, { force: true });

  let parser: busboy.Busboy;
  try {
    parser = busboy({
      headers: { "content-type": type },
      limits: { files: 1, fields: 20, fieldSize: 256 * 1024, fileSize: options.maxFileBytes, parts: 40 },
    });
  } catch {
    throw badRequest("The upload could not be read: send it as multipart/form-data.");
  }
  const writes: Promise<void>[] = [];
  parser.on("field", (name, value) => {
    fields[name] = value;
  });
  parser.on("file", (name, stream, info) => {
    if (name !== options.fileField || file) {
      stream.resume(); // not ours: read and drop
      return;
    }
    const spooled: SpooledFile = { path: tmp, name: (info.filename || "upload.csv").slice(0, 200), size: 0, head: new Uint8Array(0), tooLarge: false };
    file = spooled;
    const out = createWriteStream(tmp);
    stream.on("data", (chunk: Buffer) => {
      if (spooled.head.length < HEAD_BYTES) spooled.head = new Uint8Array(Buffer.concat([spooled.head, chunk.subarray(0, HEAD_BYTES)]).subarray(0, HEAD_BYTES));
      spooled.size += chunk.length;
    });
    stream.on("limit", () => {
      spooled.tooLarge = true;
    });
    stream.pipe(out);
    writes.push(finished(out));
  });

  try {
    const body = Readable.fromWeb(request.body as WebReadableStream<Uint8Array>);
    await pipeline(body, parser);
    await Promise.all(writes);
  } catch (error) {
    await cleanup();
    throw badRequest(`The upload was cut off or could not be read (${(error as Error).message}). Try again.`);
  }
  return { file, fields, cleanup };
}
