import { describe, expect, it } from "vitest";
import { isCrossSite, type RequestFacts } from "@/lib/http/csrf";

const base: RequestFacts = {
  method: "POST",
  origin: null,
  host: "127.0.0.1:3000",
  secFetchSite: null,
  hasSessionCookie: true,
  bearer: false,
};

describe("isCrossSite", () => {
  it("lets reads through", () => {
    expect(isCrossSite({ ...base, method: "GET", origin: "https://evil.example" })).toBe(false);
  });
  it("refuses a foreign Origin", () => {
    expect(isCrossSite({ ...base, origin: "https://evil.example" })).toBe(true);
    expect(isCrossSite({ ...base, origin: "http://127.0.0.1:3001" })).toBe(true);
  });
  it("accepts the same host, and a configured public host", () => {
    expect(isCrossSite({ ...base, origin: "http://127.0.0.1:3000" })).toBe(false);
    expect(isCrossSite({ ...base, origin: "https://yard.example" }, ["yard.example"])).toBe(false);
  });
  it("refuses a cookie-carrying mutation with no proof of origin", () => {
    expect(isCrossSite(base)).toBe(true);
    expect(isCrossSite({ ...base, secFetchSite: "cross-site" })).toBe(true);
    expect(isCrossSite({ ...base, secFetchSite: "same-origin" })).toBe(false);
  });
  it("lets bearer-token and cookie-less requests through", () => {
    expect(isCrossSite({ ...base, bearer: true, origin: "https://evil.example" })).toBe(false);
    expect(isCrossSite({ ...base, hasSessionCookie: false })).toBe(false);
  });
  it("refuses an Origin it cannot parse", () => {
    expect(isCrossSite({ ...base, origin: "not a url" })).toBe(true);
  });
});
