/**
 * Where to go after signing in: only a path on this site, never another host
 * ("//evil.example", "/\\evil", "https://…" are refused).
 * @example safeNextPath("/t/K7XM-3HQA") // "/t/K7XM-3HQA"
 * @example safeNextPath("//evil.example") // null
 */
export function safeNextPath(value: unknown): string | null {
  if (typeof value !== "string" || value.length > 200) return null;
  if (!value.startsWith("/") || value.startsWith("//") || value.includes("\\")) return null;
  if (/[\u0000-\u001f]/.test(value)) return null;
  return value;
}
