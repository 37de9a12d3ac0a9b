import { BlockList, isIP } from "node:net";

// Who is calling, by network address, for the server in front of Next (server.ts). A client
// can write any X-Forwarded-For it likes; only a reverse proxy we run (TRUSTED_PROXIES) is
// believed, and then only for the hops it and the proxies before it added: the right-most
// address that is not a trusted proxy is the client. Pure, so it is unit tested alone.

/** The trusted proxies, from TRUSTED_PROXIES: addresses and CIDR ranges, comma-separated. */
export interface TrustedProxies {
  has(address: string): boolean;
}

/**
 * Reads TRUSTED_PROXIES ("127.0.0.1, 10.0.0.0/8, ::1"). An empty value trusts nobody: the
 * socket's address is the client. Throws on an entry that is not an address or a range, so a
 * typing error stops the server instead of trusting the wrong hosts.
 * @example trustedProxies("10.0.0.0/8").has("10.1.2.3") // true
 */
export function trustedProxies(list: string | undefined): TrustedProxies {
  const blocks = new BlockList();
  for (const entry of (list ?? "").split(",").map((e) => e.trim()).filter(Boolean)) {
    const [address, bits, ...rest] = entry.split("/");
    const family = isIP(address);
    const prefix = bits === undefined ? (family === 6 ? 128 : 32) : Number(bits);
    if (!family || rest.length || !Number.isInteger(prefix) || prefix < 0 || prefix > (family === 6 ? 128 : 32)) {
      throw new Error(`TRUSTED_PROXIES: "${entry}" is not an IP address or a CIDR range (e.g. 10.0.0.0/8).`);
    }
    blocks.addSubnet(address, prefix, family === 6 ? "ipv6" : "ipv4");
  }
  return {
    has(candidate) {
      const address = plainAddress(candidate);
      const family = isIP(address);
      return family !== 0 && blocks.check(address, family === 6 ? "ipv6" : "ipv4");
    },
  };
}

/**
 * An address as people write it: an IPv4 address seen on an IPv6 socket loses its "::ffff:".
 * @example plainAddress("::ffff:203.0.113.9") // "203.0.113.9"
 */
export function plainAddress(address: string): string {
  const trimmed = address.trim();
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i.exec(trimmed);
  return mapped ? mapped[1] : trimmed;
}

/**
 * The client's address: the socket's peer, unless the peer is a trusted proxy; then the
 * right-most X-Forwarded-For hop that is not a trusted proxy (a chain of trusted proxies is
 * walked back). Entries a client wrote in front of the proxy's own are never reached.
 * @example clientAddress("10.0.0.2", "6.6.6.6, 203.0.113.9", trustedProxies("10.0.0.0/8")) // "203.0.113.9"
 * @example clientAddress("198.51.100.4", "6.6.6.6", trustedProxies("10.0.0.0/8")) // "198.51.100.4"
 */
export function clientAddress(peer: string, forwardedFor: string | string[] | undefined, trusted: TrustedProxies): string {
  let client = plainAddress(peer);
  if (!trusted.has(client)) return client;
  const hops = (Array.isArray(forwardedFor) ? forwardedFor.join(",") : (forwardedFor ?? ""))
    .split(",")
    .map(plainAddress)
    .filter(Boolean);
  while (hops.length && trusted.has(client)) {
    const hop = hops.pop()!;
    if (!isIP(hop)) break; // a garbled entry: the last trusted hop is as far as we can see
    client = hop;
  }
  return client;
}

/** The request headers that only a trusted proxy may set; dropped from anyone else. */
export const FORWARDED_HEADERS = ["x-forwarded-for", "x-forwarded-host", "x-forwarded-proto", "x-forwarded-port", "forwarded", "x-real-ip"] as const;
