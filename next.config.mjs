import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.dirname(fileURLToPath(import.meta.url));

/** @type {import('next').NextConfig} */
const nextConfig = {
  // knex loads optional dialect drivers at run time; argon2 is a native addon; COPY streams
  // ride on pg's connections, so they load beside pg.
  serverExternalPackages: ["knex", "pg", "pg-copy-streams", "@node-rs/argon2"],
  poweredByHeader: false,
  turbopack: { root },
  experimental: {
    authInterrupts: true, // forbidden() and unauthorized() in pages
    // Certificates may be up to 15 MB (lib/storage/file-type.ts); the action then refuses
    // a larger file itself, with a message, instead of the framework cutting it off.
    serverActions: { bodySizeLimit: "20mb" },
    // Every page POST (a server action) now passes proxy.ts, which holds its body up to this
    // size; past Next's 10 MB default a certificate upload would be cut short.
    proxyClientMaxBodySize: "20mb",
  },
  async headers() {
    return [
      {
        source: "/:path*",
        headers: [
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "Referrer-Policy", value: "same-origin" },
          { key: "X-Frame-Options", value: "DENY" },
          { key: "Permissions-Policy", value: "camera=(self), microphone=(), geolocation=()" },
        ],
      },
    ];
  },
};

export default nextConfig;
