// The production server: Next's request handler behind a plain node:http server that
// appends the connecting peer's address to X-Forwarded-For, as a proxy does.
//
// Why not `next start`: Next only sets X-Forwarded-For when the request has none
// (`??=` in next/dist/server/base-server.js), so once a client writes the header a
// route handler can no longer see the socket address, and every per-address limit
// would key on whatever the client chose. With the peer always last, lib/auth/rate-limit.ts
// counts from the right (TRUST_PROXY_HOPS entries are the proxies in front).
//
// It also keeps the public pages a signed-out reader sees (response-cache.mjs says which,
// and when they are dropped); RESPONSE_CACHE=off serves every page from Next.
//
//   node scripts/server.mjs [-p PORT] [-H HOST]
import http from 'node:http';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { createResponseCache, GLOBAL_KEY, INSTANCE_ID } from './response-cache.mjs';

/** Adds the socket's peer to the request's X-Forwarded-For (Node joins repeated headers with ", "). */
export function appendPeer(req) {
  const peer = req.socket?.remoteAddress ?? 'unknown';
  const prior = req.headers['x-forwarded-for'];
  const list = Array.isArray(prior) ? prior.join(', ') : prior;
  req.headers['x-forwarded-for'] = list && list.trim() ? `${list}, ${peer}` : peer;
}

/** A node:http server that hands every request, peer appended, to `handle`. */
export function peerAwareServer(handle) {
  return http.createServer((req, res) => {
    appendPeer(req);
    Promise.resolve(handle(req, res)).catch((err) => {
      console.error(`server: request failed: ${err instanceof Error ? err.message : String(err)}`);
      if (!res.headersSent) res.writeHead(500, { 'content-type': 'text/plain' });
      res.end();
    });
  });
}

function arg(flag, long, fallback) {
  const argv = process.argv.slice(2);
  const i = argv.findIndex((a) => a === flag || a === long);
  return i >= 0 && argv[i + 1] ? argv[i + 1] : fallback;
}

/**
 * The response cache, shared by every instance through Redis when REDIS_URL is set (a
 * write on one empties all), and reachable from the app's page-stale hook (instrumentation.ts).
 */
async function responseCache() {
  if (process.env.RESPONSE_CACHE === 'off') return null;
  let channel = null;
  const cache = createResponseCache({
    maxAgeMs: Number(process.env.RESPONSE_CACHE_MAX_AGE_S ?? 60) * 1000,
    maxBytes: Number(process.env.RESPONSE_CACHE_MB ?? 64) * 1024 * 1024,
    available: () => !channel || channel.connected(),
    onClear: (reason) => channel?.publish(reason),
  });
  if (process.env.REDIS_URL) {
    const { redisInvalidation } = await import('./response-cache-redis.mjs');
    channel = redisInvalidation(process.env.REDIS_URL, INSTANCE_ID, (reason) => cache.clear(reason, { local: true }));
  }
  globalThis[GLOBAL_KEY] = { clear: (reason) => cache.clear(reason), renderFailed: (id) => cache.renderFailed(id) };
  return cache;
}

async function main() {
  const port = Number(arg('-p', '--port', process.env.PORT ?? 3000));
  // like `next start`: every interface unless -H names one
  const hostname = arg('-H', '--hostname', undefined);
  process.env.NODE_ENV = 'production';
  const { default: next } = await import('next');
  const dir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
  const app = next({ dev: false, dir, hostname: hostname ?? 'localhost', port });
  await app.prepare();
  const handle = app.getRequestHandler();
  const cache = await responseCache();
  const server = peerAwareServer(cache ? cache.wrap(handle) : (req, res) => handle(req, res));
  server.listen(port, hostname, () => console.log(`Clackwater listening on http://${hostname ?? 'localhost'}:${port}`));
  const stop = () => {
    server.close(() => process.exit(0));
    // keep-alive sockets would hold close() open
    server.closeIdleConnections?.();
    setTimeout(() => process.exit(0), 5_000).unref();
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  main().catch((err) => {
    console.error(err);
    process.exit(1);
  });
}
