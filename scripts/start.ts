// `npm start`: the project's PostgreSQL on loopback, the client build, then the server with demo data.
// Stopped (Ctrl-C, SIGTERM), it stops the PostgreSQL it had to start; one already running is left
// running, and PW_KEEP_DB=1 keeps even its own (scripts/postgres.ts).
import { spawn } from 'node:child_process';
import path from 'node:path';
import { ensureDatabase } from './postgres';

const root = path.resolve(import.meta.dirname, '..');

// Until the server takes over the signals (it closes its connections first), a signal ends the
// start-up at once; the exit hook of scripts/postgres.ts then stops the cluster if we started it.
let build: ReturnType<typeof spawn> | null = null;
const early = (signal: NodeJS.Signals) => {
  console.log(`\n${signal}: stopping`);
  build?.kill('SIGTERM');
  process.exit(signal === 'SIGINT' ? 130 : 143);
};
process.on('SIGINT', early);
process.on('SIGTERM', early);

function buildClient(): Promise<void> {
  return new Promise((resolve, reject) => {
    build = spawn(process.execPath, [path.join(root, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', '--logLevel', 'warn'], {
      cwd: root,
      stdio: 'inherit',
    });
    build.once('error', reject);
    build.once('exit', (code) => {
      build = null;
      if (code === 0) resolve();
      else reject(new Error(`the client build failed (exit ${code})`));
    });
  });
}

async function main() {
  const url = await ensureDatabase(undefined, { hold: true });
  process.env.DATABASE_URL = url;
  if (!process.env.PW_SKIP_BUILD) {
    console.log('[start] building the client …');
    await buildClient();
  }
  const { startServer } = await import('../server/index');
  await startServer(url); // from here its own handlers close the server, then exit
  process.off('SIGINT', early);
  process.off('SIGTERM', early);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
