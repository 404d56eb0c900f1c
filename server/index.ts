// The server process: database, optional development mail fake, HTTP listen and graceful shutdown.
import type { Server } from 'node:http';
import { createApp } from './app';
import { prepareDatabase } from './boot';
import { closeDatabase } from './db/sequelize';
import { changeFeed } from './db/change-feed';
import { env, listenUrl } from './config/env';
import { fakeSmtpPortOf, startFakeSmtp } from './modules/mail/fake-smtp';
import { DEMO_USERS } from './db/seeders/demo';

export async function startServer(databaseUrl: string): Promise<Server> {
  const e = env();
  await prepareDatabase(databaseUrl, { seed: true });
  const smtp = e.SMTP_URL
    ? null
    : await startFakeSmtp(e.PW_SMTP_FAKE_PORT, {
        explicit: process.env.PW_SMTP_FAKE_PORT !== undefined ? 'PW_SMTP_FAKE_PORT' : null,
      }).catch((err: Error) => {
        console.warn(`[mail] development mail server not started: ${err.message}`);
        return null;
      });
  const feed = changeFeed();
  void feed.start(databaseUrl);
  const app = createApp({ databaseUrl, serveClient: true });
  const server = app.listen(e.PORT, e.HOST);
  await new Promise<void>((resolve, reject) => {
    server.once('listening', resolve);
    server.once('error', reject);
  });
  console.log(`\nPanelwright is running at ${listenUrl(e.HOST, e.PORT)}`);
  if (e.NODE_ENV !== 'production') {
    console.log('Demo sign-ins (demo data only, change them before real use):');
    for (const u of DEMO_USERS) console.log(`  ${u.roles.join(',').padEnd(10)} ${u.email.padEnd(28)} ${u.password}`);
    if (smtp) {
      const port = fakeSmtpPortOf(smtp);
      const moved = port !== e.PW_SMTP_FAKE_PORT ? ` (port ${e.PW_SMTP_FAKE_PORT} is held by another program)` : '';
      console.log(`Development mail is captured on smtp://127.0.0.1:${port}${moved} and shown under Outbox (admin).`);
    }
  }
  const shutdown = (signal: string) => {
    console.log(`\n${signal}: closing`);
    server.close(async () => {
      smtp?.close(() => undefined);
      await feed.stop();
      await closeDatabase();
      process.exit(0);
    });
    setTimeout(() => process.exit(1), 10_000).unref();
  };
  process.once('SIGINT', () => shutdown('SIGINT'));
  process.once('SIGTERM', () => shutdown('SIGTERM'));
  return server;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const url = process.env.DATABASE_URL;
  if (!url) {
    console.error('DATABASE_URL is not set: use `npm start`, which starts the project database first.');
    process.exit(1);
  }
  startServer(url).catch((err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
}
