// The tag code alphabet and normalisation, with no Node imports so that the scan screen
// (a client component) can check what a person typed before asking the server.

/**
 * Tag codes are read aloud and typed by people in gloves, so the alphabet leaves out
 * characters that look or sound alike (0/O, 1/I/L, 5/S, 2/Z, 8/B, U/V).
 * 8 characters of 23 gives 23^8 ≈ 7.8e10 codes.
 */
export const TAG_ALPHABET = "34679ACDEFGHJKMNPQRTWXY";
export const TAG_CODE_LENGTH = 8;

/**
 * Normalises what a person typed: case, spaces and dashes do not matter. Returns null when
 * the input cannot be a tag code.
 * @example normaliseTagCode(" k7xm 3hqa ") // "K7XM-3HQA"
 */
export function normaliseTagCode(input: string): string | null {
  const raw = input.toUpperCase().replace(/[\s-]/g, "");
  if (raw.length !== TAG_CODE_LENGTH) return null;
  for (const ch of raw) if (!TAG_ALPHABET.includes(ch)) return null;
  return `${raw.slice(0, 4)}-${raw.slice(4)}`;
}
