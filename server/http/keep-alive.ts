import type { Server } from 'node:http';

/**
 * How long an idle kept-alive connection stays open, on our side. Node's own server default (5 s)
 * equals the idle time of Node's default client agent (keep-alive on since Node 19, 5 s), so a
 * client could send a request on a socket in the same moment the server closes it, and get
 * ECONNRESET instead of an answer. Our side waits longer than the clients and proxies in front of
 * it (HAProxy's and most load balancers' idle times are shorter than a minute), so the closing is
 * always theirs. 65 s: common practice, no source.
 */
export const KEEP_ALIVE_MS = 65_000;

/** Applies KEEP_ALIVE_MS; the headers timeout must be longer than the keep-alive one (Node's documentation of `server.headersTimeout`). */
export function keepConnectionsLonger(server: Server): Server {
  server.keepAliveTimeout = KEEP_ALIVE_MS;
  server.headersTimeout = KEEP_ALIVE_MS + 1_000;
  return server;
}
