// What an uploaded file really is, read from its first bytes, never from its name or the
// browser's word. Pure; tested in tests/unit/storage/file-type.test.ts.

export type FilePurpose = "damage-photo" | "certificate";

export const UPLOAD_RULES: Record<FilePurpose, { types: readonly string[]; maxBytes: number; words: string }> = {
  "damage-photo": { types: ["image/jpeg", "image/png", "image/webp"], maxBytes: 8 * 1024 * 1024, words: "a JPEG, PNG or WebP photo up to 8 MB" },
  certificate: { types: ["application/pdf", "image/jpeg", "image/png"], maxBytes: 15 * 1024 * 1024, words: "a PDF (or a JPEG or PNG scan) up to 15 MB" },
};

/**
 * The content type that the bytes announce, or null when they match none we accept.
 * @example sniffContentType(new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d])) // "application/pdf"
 */
export function sniffContentType(head: Uint8Array): string | null {
  const starts = (...bytes: number[]) => bytes.every((b, i) => head[i] === b);
  if (starts(0xff, 0xd8, 0xff)) return "image/jpeg";
  if (starts(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a)) return "image/png";
  if (starts(0x52, 0x49, 0x46, 0x46) && head[8] === 0x57 && head[9] === 0x45 && head[10] === 0x42 && head[11] === 0x50) return "image/webp";
  if (starts(0x25, 0x50, 0x44, 0x46, 0x2d)) return "application/pdf";
  return null;
}

/** Why a file cannot be stored for a purpose, in words, or null when it can. */
export function uploadProblem(purpose: FilePurpose, size: number, head: Uint8Array): string | null {
  const rule = UPLOAD_RULES[purpose];
  if (size === 0) return "The file is empty.";
  if (size > rule.maxBytes) return `The file is ${(size / 1024 / 1024).toFixed(1)} MB; send ${rule.words}.`;
  const type = sniffContentType(head);
  if (!type || !rule.types.includes(type)) return `This file is not ${rule.words}.`;
  return null;
}
