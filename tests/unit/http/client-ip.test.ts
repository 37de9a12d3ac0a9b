import { describe, expect, it } from "vitest";
import { clientIp } from "@/lib/http/client-ip";
import { clientAddress, plainAddress, trustedProxies } from "@/lib/http/forwarded";

describe("clientIp", () => {
  it("reads the address server.mts wrote", () => {
    expect(clientIp(new Headers({ "x-forwarded-for": " 203.0.113.9 " }))).toBe("203.0.113.9");
  });
  it("answers unknown when nothing was written (the app served without server.mts)", () => {
    expect(clientIp(new Headers())).toBe("unknown");
    expect(clientIp(new Headers({ "x-forwarded-for": "" }))).toBe("unknown");
  });
});

describe("issue 11.2: X-Forwarded-For is trusted only from a configured proxy (clientAddress)", () => {
  const proxies = trustedProxies("127.0.0.1, 10.0.0.0/8, fd00::/8");

  it("takes the socket's address from a caller that is not a trusted proxy, whatever it forwards", () => {
    expect(clientAddress("198.51.100.4", "203.0.113.9", proxies)).toBe("198.51.100.4");
    expect(clientAddress("198.51.100.4", undefined, proxies)).toBe("198.51.100.4");
    expect(clientAddress("::ffff:198.51.100.4", "10.0.0.1", proxies)).toBe("198.51.100.4");
  });

  it("takes the right-most hop that is not a trusted proxy from a trusted one", () => {
    expect(clientAddress("127.0.0.1", "6.6.6.6, 203.0.113.9", proxies)).toBe("203.0.113.9");
    expect(clientAddress("127.0.0.1", "6.6.6.6, 203.0.113.9, 10.1.2.3", proxies)).toBe("203.0.113.9");
    expect(clientAddress("10.0.0.2", ["6.6.6.6", "2001:db8::7"], proxies)).toBe("2001:db8::7");
  });

  it("stops at the last trusted hop when the chain runs out or is garbled", () => {
    expect(clientAddress("127.0.0.1", "", proxies)).toBe("127.0.0.1");
    expect(clientAddress("127.0.0.1", "10.0.0.9", proxies)).toBe("10.0.0.9");
    expect(clientAddress("127.0.0.1", "203.0.113.9, not-an-address", proxies)).toBe("127.0.0.1");
  });

  it("trusts nobody when TRUSTED_PROXIES is empty or unset", () => {
    expect(clientAddress("127.0.0.1", "203.0.113.9", trustedProxies(""))).toBe("127.0.0.1");
    expect(clientAddress("127.0.0.1", "203.0.113.9", trustedProxies(undefined))).toBe("127.0.0.1");
  });

  it("refuses a TRUSTED_PROXIES entry that is not an address or a range", () => {
    for (const bad of ["localhost", "10.0.0.0/33", "10.0.0.0/8/1", "fd00::/129"]) {
      expect(() => trustedProxies(bad), bad).toThrow(/TRUSTED_PROXIES/);
    }
  });

  it("writes IPv4 addresses seen on an IPv6 socket plainly", () => {
    expect(plainAddress("::ffff:127.0.0.1")).toBe("127.0.0.1");
    expect(plainAddress("2001:db8::1")).toBe("2001:db8::1");
  });
});
