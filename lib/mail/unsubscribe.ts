import { createHmac, timingSafeEqual } from "node:crypto";
import { isReminderKind, type ReminderKind } from "./kinds";

// One-click unsubscribe links: the person and the kind of reminder, signed with a key the
// database keeps (signing_keys), so no sign-in is needed and a link stops only its own kind
// for its own person. The links do not expire: an old e-mail's link still works.

const b64 = (s: string) => Buffer.from(s, "utf8").toString("base64url");

function signature(key: string, userId: string, kind: ReminderKind): string {
  return createHmac("sha256", key).update(`unsubscribe:${userId}:${kind}`).digest("base64url");
}

/**
 * @example unsubscribeToken("k3y", "u1", "digest") // "dTE.digest.<43 characters>"
 */
export function unsubscribeToken(key: string, userId: string, kind: ReminderKind): string {
  return `${b64(userId)}.${kind}.${signature(key, userId, kind)}`;
}

/**
 * The person and kind a token names, or null when it is malformed or its signature is wrong.
 * @example readUnsubscribeToken("k3y", unsubscribeToken("k3y", "u1", "kit")) // { userId: "u1", kind: "kit" }
 * @example readUnsubscribeToken("other", unsubscribeToken("k3y", "u1", "kit")) // null
 */
export function readUnsubscribeToken(key: string, token: string): { userId: string; kind: ReminderKind } | null {
  const [encodedUser, kind, given, ...rest] = token.split(".");
  if (rest.length || !encodedUser || !given || !isReminderKind(kind)) return null;
  const userId = Buffer.from(encodedUser, "base64url").toString("utf8");
  if (b64(userId) !== encodedUser) return null;
  const expected = Buffer.from(signature(key, userId, kind));
  const actual = Buffer.from(given);
  if (actual.length !== expected.length || !timingSafeEqual(actual, expected)) return null;
  return { userId, kind };
}
