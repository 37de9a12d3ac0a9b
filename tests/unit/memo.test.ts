import { describe, expect, it } from "vitest";
import { boundedMemo, shortKey } from "@/lib/memo";

describe("boundedMemo", () => {
  it("works an answer out once per key, and apart for each key", () => {
    const calls: number[] = [];
    const square = boundedMemo((n: number) => (calls.push(n), n * n), { limit: 10, key: (n) => n });
    expect([square(3), square(3), square(4)]).toEqual([9, 9, 16]);
    expect(calls).toEqual([3, 4]);
  });

  it("keeps at most its limit, starting over past it", () => {
    const calls: number[] = [];
    const id = boundedMemo((n: number) => (calls.push(n), n), { limit: 2, key: (n) => n });
    id(1);
    id(2);
    id(3); // full: the memory starts over with 3
    id(1);
    expect(calls).toEqual([1, 2, 3, 1]);
  });

  it("keeps nothing for an input without a key, nor for a call that throws", () => {
    let calls = 0;
    const read = boundedMemo(
      (s: string) => {
        calls++;
        if (s === "bad") throw new Error("refused");
        return s.length;
      },
      { limit: 10, key: (s) => shortKey(s, 3) },
    );
    read("long text");
    read("long text");
    expect(calls).toBe(2);
    expect(() => read("bad")).toThrow("refused");
    expect(() => read("bad")).toThrow("refused");
    expect(calls).toBe(4);
  });

  it("keeps an answer of null or undefined too", () => {
    let calls = 0;
    const none = boundedMemo(() => (calls++, undefined), { limit: 10, key: () => "k" });
    none(undefined);
    none(undefined);
    expect(calls).toBe(1);
  });
});

describe("shortKey", () => {
  it("is the input for a number or a short text, null for anything else", () => {
    expect(shortKey(70, 3)).toBe(70);
    expect(shortKey("G70", 3)).toBe("G70");
    expect(shortKey("grade 70", 3)).toBeNull();
    expect(shortKey(null, 3)).toBeNull();
    expect(shortKey({ length: 1 }, 3)).toBeNull();
  });
});
