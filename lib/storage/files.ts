import "server-only";
import { randomUUID } from "node:crypto";
import { createReadStream } from "node:fs";
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { config } from "@/lib/config";
import { AppError, badRequest } from "@/lib/http/errors";
import { FILE_STORE_DOWN } from "@/lib/http/unavailable";
import { sniffContentType, uploadProblem, type FilePurpose } from "./file-type";

// Photos and certificates live in an S3-compatible bucket: the local fake in development
// and tests, a hosted bucket in production, by configuration alone.
const s3 = new S3Client({
  endpoint: config.S3_ENDPOINT,
  region: config.S3_REGION,
  forcePathStyle: true,
  // Checksums only where the service requires them: a streamed body is then sent as it is
  // (the SDK's default, a chunked upload with a trailing checksum, is not understood by
  // every S3-compatible service, the local fake among them).
  requestChecksumCalculation: "WHEN_REQUIRED",
  // A store that is down fails an upload within seconds (a clear 503), rather than hanging it.
  requestHandler: { connectionTimeout: 3_000, requestTimeout: 60_000 },
  maxAttempts: 2,
  credentials: { accessKeyId: config.S3_ACCESS_KEY_ID, secretAccessKey: config.S3_SECRET_ACCESS_KEY },
});

/** A call to the bucket; a bucket that cannot be reached is a 503 in words, not a 500. */
async function bucket<T>(call: () => Promise<T>, field?: string): Promise<T> {
  try {
    return await call();
  } catch (error) {
    if ((error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode) throw error; // the store answered: a real fault
    console.error(`file store: ${(error as Error).message}`);
    throw new AppError(503, FILE_STORE_DOWN, field ? [{ path: field, message: FILE_STORE_DOWN }] : []);
  }
}

export interface StoredFile {
  storageKey: string;
  contentType: string;
  sizeBytes: number;
  originalName: string;
}

/**
 * Checks and stores an uploaded file. Throws a 400 AppError naming the field when the file
 * is not acceptable; nothing is stored then.
 */
export async function storeUpload(organisationId: string, purpose: FilePurpose, file: File, field: string): Promise<StoredFile> {
  const bytes = new Uint8Array(await file.arrayBuffer());
  const problem = uploadProblem(purpose, bytes.byteLength, bytes.subarray(0, 16));
  if (problem) throw badRequest(problem, [{ path: field, message: problem }]);
  const contentType = sniffContentType(bytes.subarray(0, 16))!;
  const storageKey = `${organisationId}/${purpose}/${randomUUID()}`;
  await bucket(() => s3.send(new PutObjectCommand({ Bucket: config.S3_BUCKET, Key: storageKey, Body: bytes, ContentType: contentType })), field);
  return { storageKey, contentType, sizeBytes: bytes.byteLength, originalName: file.name.slice(0, 200) || "upload" };
}

/** Removes a stored file; used to undo an upload whose database record could not be written. */
export async function removeStored(storageKey: string): Promise<void> {
  await s3.send(new DeleteObjectCommand({ Bucket: config.S3_BUCKET, Key: storageKey }));
}

export async function readStored(storageKey: string) {
  const out = await bucket(() => s3.send(new GetObjectCommand({ Bucket: config.S3_BUCKET, Key: storageKey })));
  return out.Body!.transformToWebStream();
}

/**
 * Stores a file from disk under a key, streamed: an import's original file or its rejected
 * rows never sit in memory whole.
 */
export async function storeFromDisk(storageKey: string, path: string, sizeBytes: number, contentType: string): Promise<void> {
  await bucket(() => s3.send(new PutObjectCommand({ Bucket: config.S3_BUCKET, Key: storageKey, Body: createReadStream(path), ContentLength: sizeBytes, ContentType: contentType })), "file");
}
