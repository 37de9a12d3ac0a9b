import { randomInt } from "node:crypto";
import { TAG_ALPHABET, TAG_CODE_LENGTH } from "./alphabet";

export { normaliseTagCode, TAG_ALPHABET } from "./alphabet";

/**
 * A fresh random tag code, shown as two groups of four. Codes are drawn at random (not
 * sequential) so that one code says nothing about its neighbours.
 * @example newTagCode() // "K7XM-3HQA"
 */
export function newTagCode(random: (max: number) => number = randomInt): string {
  let raw = "";
  for (let i = 0; i < TAG_CODE_LENGTH; i++) raw += TAG_ALPHABET[random(TAG_ALPHABET.length)];
  return `${raw.slice(0, 4)}-${raw.slice(4)}`;
}
