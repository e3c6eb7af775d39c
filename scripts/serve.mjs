#!/usr/bin/env node
// Serves the built app (`next start`'s job) through Next's documented custom-server entry, for one
// reason: `next start` only fills X-Forwarded-For when the request has none, so a client talking to
// the app directly could write any address there and get a fresh sign-in and solve budget with
// every request. Here every request's X-Forwarded-For gets the address of the peer that connected
// appended, as a proxy would: the last entry is then always the real hop, and lib/client-address.ts
// walks left from it past TRUSTED_PROXIES only.
//
//   node scripts/serve.mjs -H 127.0.0.1 -p 3000     (NEXT_DIST_DIR picks the build folder)
import { createServer } from "node:http";

/** The X-Forwarded-For a request should carry: what came in (if anything), then the connecting peer. */
export function appendPeer(incoming, peer) {
  const prior = (Array.isArray(incoming) ? incoming.join(", ") : incoming ?? "").trim();
  if (!peer) return prior || undefined;
  return prior ? `${prior}, ${peer}` : peer;
}

function option(args, flag, fallback) {
  const i = args.indexOf(flag);
  return i >= 0 && args[i + 1] ? args[i + 1] : fallback;
}

async function main() {
  const args = process.argv.slice(2);
  const hostname = option(args, "-H", process.env.HOST || "127.0.0.1");
  const port = Number(option(args, "-p", process.env.PORT || "3000"));
  const { default: next } = await import("next");
  const app = next({ dev: false, hostname, port });
  const handle = app.getRequestHandler();
  await app.prepare();
  const server = createServer((req, res) => {
    const forwarded = appendPeer(req.headers["x-forwarded-for"], req.socket.remoteAddress);
    if (forwarded) req.headers["x-forwarded-for"] = forwarded;
    else delete req.headers["x-forwarded-for"];
    handle(req, res);
  });
  server.listen(port, hostname, () => console.log(`[serve] listening on http://${hostname}:${port}`));
  const stop = () => {
    server.close(() => process.exit(0));
    server.closeAllConnections();
  };
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  main().catch((err) => {
    console.error(`[serve] ${err.stack || err.message}`);
    process.exit(1);
  });
}
