/**
 * An idle kept-alive connection is closed by the client, not by us: Node's server default (5 s)
 * equals the idle time of Node's own client agent, and a request sent on a socket in the moment the
 * server closes it fails with ECONNRESET (this happened to a browser test's API call in CI). The
 * test keeps one socket idle for longer than Node's default and sends a second request on it.
 */
import http from 'node:http';
import type { AddressInfo, Socket } from 'node:net';
import { KEEP_ALIVE_MS, keepConnectionsLonger } from '../../server/http/keep-alive';

const NODE_DEFAULT_MS = 5_000; // Node's documentation of server.keepAliveTimeout: "Default: 5000".

function get(port: number, agent: http.Agent): Promise<{ status: number; socket: Socket }> {
  return new Promise((resolve, reject) => {
    const req = http.get({ host: '127.0.0.1', port, path: '/', agent }, (res) => {
      res.resume();
      res.on('end', () => resolve({ status: res.statusCode ?? 0, socket: req.socket as Socket }));
    });
    req.on('error', reject);
  });
}

describe('kept-alive connections', () => {
  it('outlast Node\'s default and the headers timeout outlasts them', () => {
    const server = keepConnectionsLonger(http.createServer());
    expect(server.keepAliveTimeout).toBe(KEEP_ALIVE_MS);
    expect(KEEP_ALIVE_MS).toBeGreaterThan(NODE_DEFAULT_MS);
    expect(server.headersTimeout).toBeGreaterThan(server.keepAliveTimeout);
  });

  it('stay open past five idle seconds, so the next request goes on the same socket', async () => {
    const server = keepConnectionsLonger(http.createServer((_req, res) => res.end('ok')));
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.address() as AddressInfo;
    // An agent that itself waits longer than the server would by default, so only the server could close.
    const agent = new http.Agent({ keepAlive: true, maxSockets: 1, timeout: 30_000 });
    try {
      const first = await get(port, agent);
      expect(first.status).toBe(200);
      let closed = false;
      first.socket.once('close', () => { closed = true; });
      await new Promise((r) => setTimeout(r, NODE_DEFAULT_MS + 1_000));
      expect(closed).toBe(false);
      const second = await get(port, agent);
      expect(second.status).toBe(200);
      expect(second.socket).toBe(first.socket);
    } finally {
      agent.destroy();
      server.closeAllConnections();
      await new Promise((r) => server.close(r));
    }
  }, 20_000);
});
