import { NextResponse, type NextRequest } from "next/server";
import { SESSION_COOKIE } from "@/lib/auth/session-cookie";
import { config as app } from "@/lib/config";
import { clientIp } from "@/lib/http/client-ip";
import { appOrigin, isCrossSite } from "@/lib/http/csrf";
import { newNonce, pageSecurityHeaders } from "@/lib/http/security-headers";
import { isConnectionFailure, unavailablePage } from "@/lib/http/unavailable";
import { PRINCIPAL_HEADER, principalFromSessionId, sealPrincipal } from "@/lib/auth/principal";
import { tagLookupsExhausted, tooManyLookupsResponse } from "@/lib/tags/lookups";

// Every page (not the API, whose route wrapper does its own checks) passes through here:
// - a POST to a page is a server action: refused with 403 unless it comes from the app's own
//   origin (Next's own check lets a request without Origin through, and answers 500 to a
//   foreign one);
// - the tag resolver's rate limit is checked before the page runs (a page cannot answer 429;
//   the page records each lookup);
// - a signed-in page's session is read here, once (lib/auth/principal.ts): the page takes this
//   answer from a sealed request header instead of reading it again; a database that cannot
//   be reached gives a plain 503 page (a page cannot answer 503 either), within the pool's
//   few seconds;
// - every page gets its Content-Security-Policy with a fresh nonce, which Next reads from
//   the request header and puts on its scripts.
const APP_ORIGIN = appOrigin(app.APP_URL); // once, not per request

export async function proxy(request: NextRequest) {
  const crossSite = isCrossSite(
    {
      method: request.method,
      origin: request.headers.get("origin"),
      secFetchSite: request.headers.get("sec-fetch-site"),
      hasSessionCookie: request.cookies.has(SESSION_COOKIE),
      bearer: false,
    },
    APP_ORIGIN,
  );
  if (crossSite) {
    return new Response("Cross-site request refused.", { status: 403, headers: { "content-type": "text/plain; charset=utf-8", "cache-control": "no-store" } });
  }
  const forward = new Headers(request.headers);
  forward.delete(PRINCIPAL_HEADER); // only ever the proxy's own
  try {
    if (request.nextUrl.pathname.startsWith("/t/")) {
      if (await tagLookupsExhausted(clientIp(request.headers))) return tooManyLookupsResponse();
    }
    const sessionId = request.cookies.get(SESSION_COOKIE)?.value;
    if (sessionId) forward.set(PRINCIPAL_HEADER, sealPrincipal(sessionId, await principalFromSessionId(sessionId)));
  } catch (error) {
    if (isConnectionFailure(error)) return unavailablePage();
    throw error;
  }

  const headers = pageSecurityHeaders({ nonce: newNonce(), appUrl: app.APP_URL, dev: process.env.NODE_ENV !== "production" });
  forward.set("content-security-policy", headers["Content-Security-Policy"]);
  const response = NextResponse.next({ request: { headers: forward } });
  for (const [name, value] of Object.entries(headers)) response.headers.set(name, value);
  return response;
}

export const config = { matcher: "/((?!api/|_next/static/|_next/image|icon.svg|favicon.ico).*)" };
