import { normaliseTagCode, TAG_ALPHABET, TAG_CODE_LENGTH } from "./alphabet";

// Reading what the scan screen gets: the text of a scanned QR code (a tag URL, or a bare
// code on an older tag), or what a person typed. Errors are sentences a yard hand can act on.

export type TagInput = { ok: true; code: string } | { ok: false; message: string };

export const EXAMPLE_TAG_CODE = "K7XM-3HQA";

/** The characters a tag code can hold, spaced for reading: "3 4 6 7 9 A C D …". */
export const ALPHABET_HINT = TAG_ALPHABET.split("").join(" ");

/**
 * The tag code in a scanned QR code: a tag URL (`…/t/K7XM-3HQA`) or a bare code.
 * @example codeFromScan("https://yard.example.com/t/K7XM-3HQA") // "K7XM-3HQA"
 * @example codeFromScan("WIFI:S:yard;;") // null
 */
export function codeFromScan(text: string): string | null {
  const trimmed = text.trim();
  const fromUrl = codeFromTagUrl(trimmed);
  if (fromUrl !== undefined) return fromUrl;
  return normaliseTagCode(trimmed);
}

/** undefined when the text is not a URL with a /t/ path; null when it is, with a bad code. */
function codeFromTagUrl(text: string): string | null | undefined {
  if (!/^https?:\/\//i.test(text)) return undefined;
  let url: URL;
  try {
    url = new URL(text);
  } catch {
    return undefined;
  }
  const match = url.pathname.match(/^\/t\/([^/]+)\/?$/);
  if (!match) return undefined;
  try {
    return normaliseTagCode(decodeURIComponent(match[1]));
  } catch {
    return null;
  }
}

/**
 * What a person typed (or pasted) into the tag code box, checked and normalised, or a
 * sentence that says what is wrong with it.
 * @example readTypedTagCode("k7xm 3hqa") // { ok: true, code: "K7XM-3HQA" }
 * @example readTypedTagCode("K7XM-3HQ0") // { ok: false, message: "Tag codes never use 0. …" }
 */
export function readTypedTagCode(input: string): TagInput {
  const text = input.trim();
  if (!text) return { ok: false, message: "Type the code printed under the QR code." };
  const fromUrl = codeFromTagUrl(text);
  if (fromUrl) return { ok: true, code: fromUrl };

  const raw = text.toUpperCase().replace(/[\s-]/g, "");
  const foreign = [...new Set(raw.split("").filter((ch) => !TAG_ALPHABET.includes(ch)))];
  if (foreign.length) {
    const list = foreign.map((ch) => (ch === " " ? "a space" : ch));
    const words = list.length === 1 ? list[0] : `${list.slice(0, -1).join(", ")} or ${list[list.length - 1]}`;
    return {
      ok: false,
      message: `Tag codes never use ${words}. Check the code on the tag again.`,
    };
  }
  if (raw.length !== TAG_CODE_LENGTH) {
    return {
      ok: false,
      message: `A tag code has ${TAG_CODE_LENGTH} characters, like ${EXAMPLE_TAG_CODE}; this has ${raw.length}.`,
    };
  }
  const code = normaliseTagCode(raw);
  return code ? { ok: true, code } : { ok: false, message: "That is not a tag code." };
}

/**
 * The tag code in a URL path segment (`/t/{code}`, `/api/v1/tags/{code}`), percent-decoded
 * if needed, or null.
 * @example tagCodeFromPath("k7xm%203hqa") // "K7XM-3HQA"
 */
export function tagCodeFromPath(segment: string): string | null {
  let text = segment;
  try {
    text = decodeURIComponent(segment);
  } catch {
    return null;
  }
  return normaliseTagCode(text);
}
