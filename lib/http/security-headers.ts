// The security headers of every page, set by proxy.ts with a fresh nonce per answer. Next
// reads the nonce from the request's Content-Security-Policy header and puts it on its own
// scripts (pages are rendered per request for this: app/layout.tsx). Pure; unit tested.

/**
 * The Content-Security-Policy of a page: scripts only with this answer's nonce (and what
 * they load, 'strict-dynamic'), nothing framed or framing, no plugins, forms posting home.
 * Styles may be inline: React writes style attributes, which a nonce cannot cover.
 * @example contentSecurityPolicy({ nonce: "abc", dev: false, https: false }).includes("'nonce-abc'") // true
 */
export function contentSecurityPolicy({ nonce, dev, https }: { nonce: string; dev: boolean; https: boolean }): string {
  const directives = [
    "default-src 'self'",
    // next dev evaluates its hot-reloaded modules; a production build does not.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:", // QR codes are data URLs; the camera's still frames are blobs
    "font-src 'self'",
    "connect-src 'self'",
    "media-src 'self' blob:",
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-src 'none'",
    "frame-ancestors 'none'",
    ...(https ? ["upgrade-insecure-requests"] : []),
  ];
  return directives.join("; ");
}

/**
 * The headers proxy.ts adds to a page: its CSP, and HSTS when the app is served over https
 * (APP_URL), so a browser never comes back over plain http.
 * @example pageSecurityHeaders({ nonce: "abc", appUrl: "https://yard.example", dev: false })["Strict-Transport-Security"] // "max-age=31536000; includeSubDomains"
 */
export function pageSecurityHeaders({ nonce, appUrl, dev }: { nonce: string; appUrl: string; dev: boolean }): Record<string, string> {
  const https = appUrl.startsWith("https://");
  return {
    "Content-Security-Policy": contentSecurityPolicy({ nonce, dev, https }),
    ...(https && { "Strict-Transport-Security": "max-age=31536000; includeSubDomains" }),
  };
}

/**
 * A nonce for one answer: 128 random bits, base64.
 * @example newNonce().length // 24
 */
export function newNonce(): string {
  return btoa(String.fromCharCode(...crypto.getRandomValues(new Uint8Array(16))));
}
