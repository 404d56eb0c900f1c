// Browser test set-up: Debian's chromium (installed when missing), the built client, a fresh seeded
// database, the mail fake and the server on a free loopback port.
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import type { TestProject } from 'vitest/node';
import { acquireCluster, createDatabase, dropDatabase, releaseCluster, serverUrl } from '../../scripts/postgres';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    e2eDatabaseUrl: string;
  }
}

const root = path.resolve(import.meta.dirname, '..', '..');

function ensureChromium() {
  if (fs.existsSync('/usr/bin/chromium')) return;
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  execFileSync('apt-get', ['install', '-y', '-qq', 'chromium'], { stdio: 'inherit', env });
}

export default async function setup(project: TestProject) {
  process.env.PW_QUIET = '1';
  ensureChromium();
  execFileSync(process.execPath, [path.join(root, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', '--logLevel', 'error'], {
    cwd: root,
    stdio: 'inherit',
  });

  const name = `pw_e2e_${process.pid}_${Date.now().toString(36)}`;
  const admin = await acquireCluster();
  await createDatabase(admin, name);
  const url = serverUrl(name);

  const smtpPort = 20000 + Math.floor(Math.random() * 20000);
  process.env.PW_SMTP_FAKE_PORT = String(smtpPort);
  process.env.PW_SIGNIN_LIMIT = '1000';
  const { resetEnvCache } = await import('../../server/config/env');
  resetEnvCache();
  const { prepareDatabase } = await import('../../server/boot');
  const { closeDatabase } = await import('../../server/db/sequelize');
  const { createApp } = await import('../../server/app');
  const { startFakeSmtp } = await import('../../server/modules/mail/fake-smtp');
  const { changeFeed } = await import('../../server/db/change-feed');
  await prepareDatabase(url, { seed: true });
  const smtp = await startFakeSmtp(smtpPort);
  void changeFeed().start(url);
  const app = createApp({ databaseUrl: url, sessionSecret: 'e2e-session-secret-1234', serveClient: true });
  const server = app.listen(0, '127.0.0.1');
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  const port = (server.address() as AddressInfo).port;
  project.provide('baseUrl', `http://127.0.0.1:${port}`);
  project.provide('e2eDatabaseUrl', url);

  return async () => {
    await new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeAllConnections?.();
    await new Promise<void>((resolve) => smtp.close(() => resolve()));
    await (app.locals.changeFeed as { stop(): Promise<void> }).stop();
    await (app.locals.sessionPool as { end(): Promise<void> }).end();
    await closeDatabase();
    await dropDatabase(admin, name).catch(() => undefined);
    releaseCluster();
  };
}
