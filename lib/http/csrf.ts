// Cross-site request defence for cookie-authenticated mutations, for route handlers
// (lib/http/route.ts) and server actions (proxy.ts) alike. Pure, so it is unit tested
// without a server.

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

export interface RequestFacts {
  method: string;
  origin: string | null;
  secFetchSite: string | null;
  hasSessionCookie: boolean;
  bearer: boolean;
}

/**
 * True when a mutating request should be refused as cross-site: its Origin is not the app's
 * own (scheme, host and port, as APP_URL has them; a Host or X-Forwarded-Host header is
 * never asked, so a client cannot vouch for itself), or it rides on a session cookie
 * without any proof of coming from this site. Bearer-token requests carry no ambient
 * authority and pass.
 * @example isCrossSite({ method: "POST", origin: "https://127.0.0.1:3000", secFetchSite: null, hasSessionCookie: true, bearer: false }, "http://127.0.0.1:3000") // true
 */
export function isCrossSite(r: RequestFacts, appOrigin: string): boolean {
  if (SAFE_METHODS.has(r.method.toUpperCase()) || r.bearer) return false;
  if (r.origin) return r.origin !== appOrigin; // "null" (a sandboxed or privacy-hidden origin) included
  if (r.secFetchSite) return r.secFetchSite !== "same-origin" && r.secFetchSite !== "none";
  // No Origin and no Fetch Metadata: old clients and scripts. Only refuse when a session
  // cookie would lend them someone's authority.
  return r.hasSessionCookie;
}

/**
 * The origin of the app's public address, as browsers write the Origin header.
 * @example appOrigin("https://yard.example/") // "https://yard.example"
 */
export function appOrigin(appUrl: string): string {
  return new URL(appUrl).origin;
}
