// `npm start`: the project's PostgreSQL on loopback, the client build, then the server with demo data.
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { ensureDatabase } from './postgres';

const root = path.resolve(import.meta.dirname, '..');

async function main() {
  const url = await ensureDatabase();
  process.env.DATABASE_URL = url;
  if (!process.env.PW_SKIP_BUILD) {
    console.log('[start] building the client …');
    execFileSync(process.execPath, [path.join(root, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', '--logLevel', 'warn'], { cwd: root, stdio: 'inherit' });
  }
  const { startServer } = await import('../server/index');
  await startServer(url);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
