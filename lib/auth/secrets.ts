import { createHash, randomBytes } from "node:crypto";
import { hash, verify } from "@node-rs/argon2";

// Passwords: argon2id with the library's defaults (OWASP-recommended family).
export const hashPassword = (password: string) => hash(password);
export const verifyPassword = (hashed: string, password: string) => verify(hashed, password);

/** A random URL-safe secret for invite, reset and API-token links. */
export function newSecret(bytes = 32): string {
  return randomBytes(bytes).toString("base64url");
}

/** Secrets are stored only as SHA-256 hashes, so a leaked table reveals no live link. */
export function hashSecret(secret: string): string {
  return createHash("sha256").update(secret).digest("hex");
}
