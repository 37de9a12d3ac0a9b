import { describe, expect, it } from "vitest";
import { appOrigin, isCrossSite, type RequestFacts } from "@/lib/http/csrf";

const APP = "http://127.0.0.1:3000";
const base: RequestFacts = {
  method: "POST",
  origin: null,
  secFetchSite: null,
  hasSessionCookie: true,
  bearer: false,
};

describe("isCrossSite", () => {
  it("lets reads through", () => {
    expect(isCrossSite({ ...base, method: "GET", origin: "https://evil.example" }, APP)).toBe(false);
  });
  it("refuses a foreign Origin", () => {
    expect(isCrossSite({ ...base, origin: "https://evil.example" }, APP)).toBe(true);
    expect(isCrossSite({ ...base, origin: "http://127.0.0.1:3001" }, APP)).toBe(true);
  });
  it("accepts the app's own origin", () => {
    expect(isCrossSite({ ...base, origin: "http://127.0.0.1:3000" }, APP)).toBe(false);
    expect(isCrossSite({ ...base, origin: "https://yard.example" }, appOrigin("https://yard.example/"))).toBe(false);
  });
  it("issue 11.9: compares the whole origin, scheme and port included", () => {
    expect(isCrossSite({ ...base, origin: "https://127.0.0.1:3000" }, APP)).toBe(true);
    expect(isCrossSite({ ...base, origin: "http://yard.example" }, "https://yard.example")).toBe(true);
    expect(isCrossSite({ ...base, origin: "https://yard.example:8443" }, "https://yard.example")).toBe(true);
    expect(isCrossSite({ ...base, origin: "null" }, APP)).toBe(true);
  });
  it("refuses a cookie-carrying mutation with no proof of origin", () => {
    expect(isCrossSite(base, APP)).toBe(true);
    expect(isCrossSite({ ...base, secFetchSite: "cross-site" }, APP)).toBe(true);
    expect(isCrossSite({ ...base, secFetchSite: "same-origin" }, APP)).toBe(false);
  });
  it("lets bearer-token and cookie-less requests through", () => {
    expect(isCrossSite({ ...base, bearer: true, origin: "https://evil.example" }, APP)).toBe(false);
    expect(isCrossSite({ ...base, hasSessionCookie: false }, APP)).toBe(false);
  });
  it("refuses an Origin that is not the app's, even one it cannot parse", () => {
    expect(isCrossSite({ ...base, origin: "not a url" }, APP)).toBe(true);
  });
});
