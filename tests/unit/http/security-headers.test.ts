import { describe, expect, it } from "vitest";
import { contentSecurityPolicy, newNonce, pageSecurityHeaders } from "@/lib/http/security-headers";

describe("issue 11.10: security headers (pageSecurityHeaders)", () => {
  it("allows scripts only with the answer's nonce, and no framing, plugins or foreign forms", () => {
    const csp = contentSecurityPolicy({ nonce: "n0nce", dev: false, https: false });
    expect(csp).toContain("script-src 'self' 'nonce-n0nce' 'strict-dynamic'");
    expect(csp).not.toContain("unsafe-eval");
    for (const d of ["frame-ancestors 'none'", "object-src 'none'", "base-uri 'self'", "form-action 'self'"]) expect(csp).toContain(d);
    expect(csp).not.toContain("upgrade-insecure-requests");
  });

  it("lets next dev evaluate its reloaded modules, and nothing else", () => {
    expect(contentSecurityPolicy({ nonce: "n", dev: true, https: false })).toContain("'unsafe-eval'");
  });

  it("sends HSTS only when APP_URL is https", () => {
    const secure = pageSecurityHeaders({ nonce: "n", appUrl: "https://yard.example", dev: false });
    expect(secure["Strict-Transport-Security"]).toBe("max-age=31536000; includeSubDomains");
    expect(secure["Content-Security-Policy"]).toContain("upgrade-insecure-requests");
    const plain = pageSecurityHeaders({ nonce: "n", appUrl: "http://127.0.0.1:3000", dev: false });
    expect(plain["Strict-Transport-Security"]).toBeUndefined();
  });

  it("makes a new nonce each time", () => {
    const a = newNonce();
    expect(a).toMatch(/^[A-Za-z0-9+/]{22}==$/);
    expect(newNonce()).not.toBe(a);
  });
});
