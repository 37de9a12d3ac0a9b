import { describe, expect, it } from "vitest";
import { clientIp } from "@/lib/http/client-ip";

describe("clientIp", () => {
  it("reads the first x-forwarded-for entry", () => {
    expect(clientIp(new Headers({ "x-forwarded-for": " 203.0.113.9 , 10.0.0.1" }))).toBe("203.0.113.9");
  });
  it("answers local for a direct connection", () => {
    expect(clientIp(new Headers())).toBe("local");
    expect(clientIp(new Headers({ "x-forwarded-for": "" }))).toBe("local");
  });
});
