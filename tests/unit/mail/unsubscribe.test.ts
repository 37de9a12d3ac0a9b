import { describe, expect, it } from "vitest";
import { readUnsubscribeToken, unsubscribeToken } from "@/lib/mail/unsubscribe";

describe("unsubscribe tokens", () => {
  const key = "a-key-of-the-database";
  it("name their person and kind", () => {
    expect(readUnsubscribeToken(key, unsubscribeToken(key, "u-17", "digest"))).toEqual({ userId: "u-17", kind: "digest" });
  });
  it("refuse another key, another kind, another person, and garbage", () => {
    const token = unsubscribeToken(key, "u-17", "digest");
    const [user, , sig] = token.split(".");
    expect(readUnsubscribeToken("another-key", token)).toBeNull();
    expect(readUnsubscribeToken(key, `${user}.kit.${sig}`)).toBeNull();
    expect(readUnsubscribeToken(key, `${Buffer.from("u-18").toString("base64url")}.digest.${sig}`)).toBeNull();
    expect(readUnsubscribeToken(key, `${user}.digest.${sig.slice(0, -1)}`)).toBeNull();
    expect(readUnsubscribeToken(key, `${user}.invite.${sig}`)).toBeNull();
    expect(readUnsubscribeToken(key, "nonsense")).toBeNull();
    expect(readUnsubscribeToken(key, `${token}.extra`)).toBeNull();
  });
  it("differ per kind and per person", () => {
    const tokens = new Set([unsubscribeToken(key, "a", "kit"), unsubscribeToken(key, "a", "digest"), unsubscribeToken(key, "b", "kit")]);
    expect(tokens.size).toBe(3);
  });
});
