import net from 'node:net';

/** Resolves when nothing listens on 127.0.0.1:port; rejects with a message naming the port otherwise. */
export function assertPortFree(port: number, service: string, envVar: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', (err: NodeJS.ErrnoException) => {
      const why = err.code === 'EADDRINUSE' ? 'is already in use' : `cannot be opened (${err.code})`;
      reject(new Error(`Port ${port} for ${service} ${why}. Stop whatever uses it, or choose another port with ${envVar}=<port>.`));
    });
    server.listen(port, '127.0.0.1', () => server.close(() => resolve()));
  });
}

/** Asks the system for a free port on 127.0.0.1. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

/** Waits until something accepts TCP connections on 127.0.0.1:port. */
export async function waitForPort(port: number, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const open = await new Promise<boolean>((resolve) => {
      const socket = net.connect(port, '127.0.0.1');
      socket.once('connect', () => {
        socket.destroy();
        resolve(true);
      });
      socket.once('error', () => resolve(false));
    });
    if (open) return;
    if (Date.now() > deadline) throw new Error(`nothing answered on 127.0.0.1:${port} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 100));
  }
}
