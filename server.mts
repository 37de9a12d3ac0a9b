// The app's HTTP server: Next's request handler behind a few lines that decide who is
// calling. Next itself fills X-Forwarded-For from the socket only when the client sent none
// (node_modules/next/dist/server/base-server.js), so a client could name any address and
// dodge or spend the per-address limits. Here, forwarded headers are kept only from a
// trusted proxy (TRUSTED_PROXIES); X-Forwarded-For is always rewritten to the one client
// address, which lib/http/client-ip.ts reads. Run: node --import tsx server.mts [-H host] [-p port] [--dev]
import { createServer } from "node:http";
import next from "next";
import { clientAddress, FORWARDED_HEADERS, trustedProxies } from "./lib/http/forwarded";

function option(names: string[], fallback: string): string {
  const i = process.argv.findIndex((a) => names.includes(a));
  return i >= 0 && process.argv[i + 1] ? process.argv[i + 1] : fallback;
}

const dev = process.argv.includes("--dev");
const hostname = option(["-H", "--hostname"], "127.0.0.1");
const port = Number(option(["-p", "--port"], process.env.PORT ?? "3000"));
const trusted = trustedProxies(process.env.TRUSTED_PROXIES);

const app = next({ dev, hostname, port, dir: import.meta.dirname });

async function main() {
  await app.prepare();
  const handle = app.getRequestHandler();
  const server = createServer((req, res) => {
    const peer = req.socket.remoteAddress ?? "";
    const client = clientAddress(peer, req.headers["x-forwarded-for"], trusted);
    if (!trusted.has(peer)) for (const name of FORWARDED_HEADERS) delete req.headers[name];
    req.headers["x-forwarded-for"] = client;
    void handle(req, res);
  });
  if (dev) server.on("upgrade", app.getUpgradeHandler()); // the dev server's live reload
  server.listen(port, hostname, () => {
    console.log(`Linkyard ${dev ? "(development) " : ""}on http://${hostname}:${port}`);
  });
  const stop = () => {
    server.close(() => process.exit(0));
    server.closeIdleConnections();
    setTimeout(() => process.exit(0), 5000).unref();
  };
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
