import { createServer } from 'node:net';

// Asks the OS for an unused loopback port. Another process could take it before we bind,
// so callers that can bind to port 0 themselves should prefer that.
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.unref();
    probe.once('error', reject);
    probe.listen({ host: '127.0.0.1', port: 0 }, () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => (port ? resolve(port) : reject(new Error('could not read a free port'))));
    });
  });
}

export function isPortTaken(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = createServer();
    probe.unref();
    probe.once('error', () => resolve(true));
    probe.listen({ host, port }, () => probe.close(() => resolve(false)));
  });
}
