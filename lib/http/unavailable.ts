// When a service the app needs is down: what counts as "could not reach it", and the words
// and the 503 answers people get instead of a hang or a 500. Pure; unit tested.

/** Error codes of a connection that could not be made, or was lost: node's and PostgreSQL's. */
const CONNECTION_CODES = new Set([
  "ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "EPIPE", "EHOSTUNREACH", "ENETUNREACH", "ENOTFOUND", "EAI_AGAIN",
  // PostgreSQL: class 08 (connection exception), shutting down, starting up, too many connections.
  "08000", "08001", "08003", "08004", "08006", "57P01", "57P02", "57P03", "53300",
]);
const CONNECTION_WORDS = /connection terminated|connection timeout|timeout exceeded when trying to connect|Client was closed|Connection ended unexpectedly/i;

/**
 * Whether an error means the database (or another service) could not be reached, rather than
 * a fault of the request or the code: a refused or lost connection, a pool that waited in vain.
 * Looks through `cause` and AggregateError's errors, as drivers wrap them.
 * @example isConnectionFailure(Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:5432"), { code: "ECONNREFUSED" })) // true
 */
export function isConnectionFailure(error: unknown, depth = 0): boolean {
  if (!error || typeof error !== "object" || depth > 5) return false;
  const e = error as { name?: unknown; code?: unknown; message?: unknown; cause?: unknown; errors?: unknown };
  if (e.name === "KnexTimeoutError") return true; // no connection from the pool in time
  if (typeof e.code === "string" && CONNECTION_CODES.has(e.code)) return true;
  if (typeof e.message === "string" && CONNECTION_WORDS.test(e.message)) return true;
  if (Array.isArray(e.errors) && e.errors.some((inner) => isConnectionFailure(inner, depth + 1))) return true;
  return isConnectionFailure(e.cause, depth + 1);
}

/** What a person reads when the database cannot be reached. */
export const DATABASE_DOWN = "Linkyard cannot reach its database just now. Wait a minute and try again; if you were saving something, check afterwards that it was saved.";

/** What a person reads when the file store cannot be reached during an upload. */
export const FILE_STORE_DOWN = "The file store is not answering, so the file was not saved and nothing was recorded. Try again in a few minutes.";

/** Seconds a client should wait before asking again. */
export const RETRY_AFTER_SECONDS = 30;

/** The plain page of a 503: no app chrome, no scripts (the app cannot render without its database). */
export function unavailablePage(): Response {
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex"><title>Linkyard is not available just now</title>
<style>body{font:19px/1.45 Arial,sans-serif;color:#111827;background:#fff;margin:0;padding:2rem 1rem}main{max-width:30rem;margin:0 auto}h1{font-size:1.8rem;line-height:1.2}</style></head>
<body><main><h1>Linkyard is not available just now</h1>
<p>${DATABASE_DOWN}</p>
<p>Until it is back, checks and tag-outs cannot be recorded here: note them on paper and record them when Linkyard answers again.</p></main></body></html>`;
  return new Response(html, {
    status: 503,
    headers: { "content-type": "text/html; charset=utf-8", "retry-after": String(RETRY_AFTER_SECONDS), "cache-control": "no-store" },
  });
}
