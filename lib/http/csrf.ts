// Cross-site request defence for cookie-authenticated mutations. Pure, so it is unit
// tested without a server. Server actions get Next's own Origin check on top of this.

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

export interface RequestFacts {
  method: string;
  origin: string | null;
  host: string | null;
  secFetchSite: string | null;
  hasSessionCookie: boolean;
  bearer: boolean;
}

/**
 * True when a mutating request should be refused as cross-site: its Origin names another
 * host, or it rides on a session cookie without any proof of coming from this site.
 * Bearer-token requests carry no ambient authority and pass.
 * @example isCrossSite({ method: "POST", origin: "https://evil.example", host: "127.0.0.1:3000", secFetchSite: null, hasSessionCookie: true, bearer: false }) // true
 */
export function isCrossSite(r: RequestFacts, allowedHosts: readonly string[] = []): boolean {
  if (SAFE_METHODS.has(r.method.toUpperCase()) || r.bearer) return false;
  if (r.origin && r.origin !== "null") {
    let originHost: string;
    try {
      originHost = new URL(r.origin).host;
    } catch {
      return true;
    }
    return originHost !== r.host && !allowedHosts.includes(originHost);
  }
  if (r.secFetchSite) return r.secFetchSite !== "same-origin" && r.secFetchSite !== "none";
  // No Origin and no Fetch Metadata: old clients and scripts. Only refuse when a session
  // cookie would lend them someone's authority.
  return r.hasSessionCookie;
}
