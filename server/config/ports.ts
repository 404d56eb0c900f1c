// Local ports for the development services (the project's PostgreSQL, the mail fake): the preferred
// port when free; when another program holds it (another checkout, say), the next free one above it,
// unless the port was asked for explicitly with its variable, which is then an error naming it.
import net from 'node:net';

/** Whether nothing listens on 127.0.0.1:port. */
export function portFree(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = net.createServer();
    probe.once('error', () => resolve(false));
    probe.listen(port, '127.0.0.1', () => probe.close(() => resolve(true)));
  });
}

/**
 * The port to listen on: `preferred` when free, else the next free one up to 200 above it.
 * `explicit` names the variable that asked for the port (e.g. "PW_PG_PORT"): a held port is then refused.
 */
export async function choosePort(preferred: number, explicit: string | null, what = 'the service'): Promise<number> {
  if (await portFree(preferred)) return preferred;
  if (explicit) throw new Error(`Port ${preferred} (${explicit}) is held by another program: stop it or choose another port`);
  for (let port = preferred + 1; port <= preferred + 200 && port < 65536; port++) {
    if (await portFree(port)) return port;
  }
  throw new Error(`No free port for ${what} between ${preferred} and ${preferred + 200}`);
}
