// The project's own PostgreSQL must start even when another program (another checkout's cluster)
// holds its usual port: it takes the next free port, unless the port was asked for explicitly.
import net from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { choosePort, portFree } from '../../scripts/postgres';

describe('the cluster port', () => {
  let holder: net.Server;
  let held = 0;
  beforeAll(async () => {
    holder = net.createServer();
    await new Promise<void>((resolve) => holder.listen(0, '127.0.0.1', () => resolve()));
    held = (holder.address() as net.AddressInfo).port;
  });
  afterAll(async () => {
    await new Promise<void>((resolve) => holder.close(() => resolve()));
  });

  it('sees a held port as taken', async () => {
    expect(await portFree(held)).toBe(false);
  });

  it('keeps a free preferred port', async () => {
    const probe = net.createServer();
    await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', () => resolve()));
    const free = (probe.address() as net.AddressInfo).port;
    await new Promise<void>((resolve) => probe.close(() => resolve()));
    expect(await choosePort(free, false)).toBe(free);
  });

  it('moves past a held port to a free one above it', async () => {
    const port = await choosePort(held, false);
    expect(port).toBeGreaterThan(held);
    expect(await portFree(port)).toBe(true);
  });

  it('refuses a held port asked for with PW_PG_PORT, naming it', async () => {
    await expect(choosePort(held, true)).rejects.toThrow(`Port ${held} (PW_PG_PORT) is held by another program`);
  });
});
