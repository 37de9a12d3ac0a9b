import http from "node:http";
import { BASE_URL } from "./http";

// Requests from a chosen loopback address (127.0.0.2, 127.0.0.3, …), so that a test can be a
// caller the app does not trust as a proxy, or the trusted proxy itself (127.0.0.1), whatever
// forwarded headers it sends. Node's fetch cannot choose its source address; http can.

export interface PeerAnswer {
  status: number;
  headers: http.IncomingHttpHeaders;
  text: string;
  json: any;
}

/** One request from `from` (a 127.x.y.z address) to the test app. */
export function requestFrom(
  from: string,
  method: string,
  path: string,
  options: { headers?: Record<string, string>; body?: unknown } = {},
): Promise<PeerAnswer> {
  const url = new URL(path, BASE_URL);
  const payload = options.body === undefined ? undefined : typeof options.body === "string" ? options.body : JSON.stringify(options.body);
  const headers: Record<string, string> = { ...options.headers };
  if (payload !== undefined) {
    headers["content-type"] ??= "application/json";
    headers["content-length"] = String(Buffer.byteLength(payload));
  }
  if (method !== "GET" && method !== "HEAD") headers.origin ??= BASE_URL;
  return new Promise((resolve, reject) => {
    const req = http.request(
      { host: url.hostname, port: url.port, path: url.pathname + url.search, method, headers, localAddress: from },
      (res) => {
        const chunks: Buffer[] = [];
        res.on("data", (c: Buffer) => chunks.push(c));
        res.on("end", () => {
          const text = Buffer.concat(chunks).toString("utf8");
          let json: any;
          try {
            json = text ? JSON.parse(text) : undefined;
          } catch {
            /* not JSON */
          }
          resolve({ status: res.statusCode ?? 0, headers: res.headers, text, json });
        });
      },
    );
    req.on("error", reject);
    if (payload !== undefined) req.write(payload);
    req.end();
  });
}

let next = Math.floor(Math.random() * 200);
/** A loopback address no other test uses in this run: an untrusted caller of its own. */
export function freshLoopback(): string {
  next = (next + 1) % 250;
  return `127.0.${Math.floor(Math.random() * 250) + 1}.${next + 2}`;
}
