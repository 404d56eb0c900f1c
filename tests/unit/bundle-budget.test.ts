// The first page's JavaScript stays under 250 kB gzipped, and every route is its own chunk: the
// wizard's selector and rule files load with the wizard, not with the first page.
// Uses dist/ when it is newer than the client sources (the browser tests build it); otherwise
// builds with vite's API into a temporary folder (PW_BUNDLE_REBUILD=1 forces that build).
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const root = path.resolve(import.meta.dirname, '..', '..');
const BUDGET_GZIP_BYTES = 250 * 1024;

function newestMtime(p: string): number {
  const st = fs.statSync(p);
  if (!st.isDirectory()) return st.mtimeMs;
  return fs.readdirSync(p).reduce((m, f) => Math.max(m, newestMtime(path.join(p, f))), st.mtimeMs);
}

function ruleIds(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) return ruleIds(p);
    if (!e.name.endsWith('.json')) return [];
    const content = JSON.parse(fs.readFileSync(p, 'utf8')) as { id?: string } | Array<{ id?: string }>;
    return (Array.isArray(content) ? content : [content]).map((r) => r.id).filter((x): x is string => !!x);
  });
}

describe('client bundle budget', () => {
  let outDir = path.join(root, 'dist');
  let temp: string | null = null;

  beforeAll(async () => {
    const sources = ['src', 'shared', 'rules', 'index.html', 'vite.config.ts', 'package.json']
      .map((p) => path.join(root, p))
      .filter((p) => fs.existsSync(p));
    const fresh =
      fs.existsSync(path.join(outDir, 'index.html')) &&
      newestMtime(path.join(outDir, 'index.html')) >= Math.max(...sources.map(newestMtime));
    if (!fresh || process.env.PW_BUNDLE_REBUILD === '1') {
      temp = fs.mkdtempSync(path.join(os.tmpdir(), 'pw-bundle-'));
      outDir = temp;
      const { build } = await import('vite');
      await build({ root, configFile: path.join(root, 'vite.config.ts'), logLevel: 'error', build: { outDir, emptyOutDir: true } });
    }
  }, 120_000);

  afterAll(() => {
    if (temp) fs.rmSync(temp, { recursive: true, force: true });
  });

  function entryFiles(): string[] {
    const html = fs.readFileSync(path.join(outDir, 'index.html'), 'utf8');
    const scripts = [...html.matchAll(/<script[^>]+type="module"[^>]+src="([^"]+)"/g)].map((m) => m[1]!);
    const preloads = [...html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+)"/g)].map((m) => m[1]!);
    return [...new Set([...scripts, ...preloads])].map((u) => path.join(outDir, u.replace(/^\//, '')));
  }

  function jsChunks(): string[] {
    return fs.readdirSync(path.join(outDir, 'assets')).filter((f) => f.endsWith('.js'));
  }

  it('loads under 250 kB of gzipped JavaScript on the first page', () => {
    const files = entryFiles();
    expect(files.length).toBeGreaterThan(0);
    const gz = files.map((f) => ({ file: path.basename(f), bytes: zlib.gzipSync(fs.readFileSync(f), { level: 9 }).length }));
    const total = gz.reduce((n, f) => n + f.bytes, 0);
    console.log(
      `first page JavaScript: ${(total / 1024).toFixed(1)} kB gzipped in ${gz.length} file(s): ${gz.map((f) => `${f.file} ${(f.bytes / 1024).toFixed(1)} kB`).join(', ')}`,
    );
    expect(total).toBeGreaterThan(10 * 1024); // the React runtime alone is more: the files were found
    expect(total).toBeLessThan(BUDGET_GZIP_BYTES);
  });

  it('gives every lazy route of the router its own chunk', () => {
    const router = fs.readFileSync(path.join(root, 'src', 'app', 'router.tsx'), 'utf8');
    const routes = [...new Set([...router.matchAll(/import\('\.\/routes\/([^']+)'\)/g)].map((m) => path.basename(m[1]!)))];
    expect(routes.length).toBeGreaterThan(10);
    const chunks = jsChunks();
    const entry = new Set(entryFiles().map((f) => path.basename(f)));
    const missing = routes.filter((r) => !chunks.some((c) => c.startsWith(`${r}-`) && !entry.has(c)));
    expect(missing).toEqual([]);
    expect(chunks.length - entry.size).toBeGreaterThanOrEqual(routes.length);
  });

  it('keeps the selector and the rule files out of the first page', () => {
    const ids = ruleIds(path.join(root, 'rules'));
    expect(ids.length).toBeGreaterThan(10);
    const entryText = entryFiles()
      .map((f) => fs.readFileSync(f, 'utf8'))
      .join('\n');
    // the minifier may quote a string with ", ' or `
    const quoted = (text: string, id: string) => ['"', "'", '`'].some((q) => text.includes(`${q}${id}${q}`));
    const inEntry = ids.filter((id) => quoted(entryText, id));
    expect(inEntry).toEqual([]);
    // the rule ids are in the build: the search above can find them
    const entry = new Set(entryFiles().map((f) => path.basename(f)));
    const wizard = jsChunks()
      .filter((c) => !entry.has(c))
      .find((c) => {
        const text = fs.readFileSync(path.join(outDir, 'assets', c), 'utf8');
        return ids.every((id) => quoted(text, id));
      });
    expect(wizard).toBeDefined();
  });
});
