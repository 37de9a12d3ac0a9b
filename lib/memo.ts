/**
 * A pure function's answers kept by a key, for inputs that repeat (the same sizes, grades and
 * ratings in every tiedown of a check, every row of an import). At most `limit` answers are
 * kept; past it the memory starts over, so odd input cannot grow it without bound. `key`
 * answers null for an input not worth keeping (a long text). A call that throws keeps
 * nothing, so its error is made fresh each time. Answers are shared between callers: keep
 * only values no caller can change (freeze them).
 *
 * @example
 * const label = boundedMemo((n: number) => `#${n}`, { limit: 100, key: (n) => n });
 * label(7); // "#7", worked out once
 */
export function boundedMemo<I, V>(compute: (input: I) => V, options: { limit: number; key: (input: I) => string | number | null }): (input: I) => V {
  const kept = new Map<string | number, V>();
  return (input) => {
    const key = options.key(input);
    if (key === null) return compute(input);
    const hit = kept.get(key);
    if (hit !== undefined || kept.has(key)) return hit as V;
    const value = compute(input);
    if (kept.size >= options.limit) kept.clear();
    kept.set(key, value);
    return value;
  };
}

/** The input itself as a key when it is a number or a text of at most `max` characters, else null (anything else). */
export function shortKey(input: unknown, max: number): string | number | null {
  if (typeof input === "number") return input;
  return typeof input === "string" && input.length <= max ? input : null;
}
