import { recentTagMisses, recordTagLookup } from "@/db/items";

// Rate limit of the tag resolver (/t/{code}), against guessing codes to find other
// companies' gear. Every lookup is recorded in tag_lookups by client address; an address
// with TAG_MISS_LIMIT misses in the last TAG_MISS_WINDOW_MINUTES gets 429 until the oldest
// miss leaves the window. A real tag always hits, so a yard hand never meets the limit;
// a guesser gets 20 tries per 10 minutes against 23^8 ≈ 7.8e10 codes.

/** Misses (unknown or malformed codes) allowed per address in the window. */
export const TAG_MISS_LIMIT = 20;
/** Length of the window, in minutes. */
export const TAG_MISS_WINDOW_MINUTES = 10;

/** Whether this address has used up its misses. */
export async function tagLookupsExhausted(ip: string, now = new Date()): Promise<boolean> {
  const since = new Date(now.getTime() - TAG_MISS_WINDOW_MINUTES * 60_000);
  return (await recentTagMisses(ip, since)) >= TAG_MISS_LIMIT;
}

export async function recordLookup(ip: string, found: boolean): Promise<void> {
  await recordTagLookup(ip, found);
}

/** The plain page of a 429: no app chrome, no scripts, readable on a phone in the sun. */
export function tooManyLookupsResponse(): Response {
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex"><title>Too many tag codes tried · Linkyard</title>
<style>body{font:19px/1.45 Arial,sans-serif;color:#111827;background:#fff;margin:0;padding:2rem 1rem}main{max-width:30rem;margin:0 auto}h1{font-size:1.8rem;line-height:1.2}</style></head>
<body><main><h1>Too many tag codes tried</h1>
<p>This connection asked for too many tag codes that do not exist. Wait ${TAG_MISS_WINDOW_MINUTES} minutes, then scan the tag again.</p>
<p>If you work with this gear, sign in to Linkyard and scan from the app.</p></main></body></html>`;
  return new Response(html, {
    status: 429,
    headers: {
      "content-type": "text/html; charset=utf-8",
      "retry-after": String(TAG_MISS_WINDOW_MINUTES * 60),
      "cache-control": "no-store",
    },
  });
}
