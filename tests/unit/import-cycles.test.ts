// No import cycles, type-only imports included. dependency-cruiser (npm run lint) reads the files
// through Babel, which drops `import type`, so it sees only the imports that run; this test reads every
// relative import of shared/, server/, src/, scripts/ and tests/ as written and looks for a loop among the files.
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = path.resolve(import.meta.dirname, '../..');
const DIRS = ['shared', 'server', 'src', 'scripts', 'tests'];

function sources(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) return sources(p);
    return /\.tsx?$/.test(e.name) && !e.name.endsWith('.d.ts') ? [p] : [];
  });
}

function resolve(from: string, spec: string): string | null {
  const base = path.resolve(path.dirname(from), spec);
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, path.join(base, 'index.ts'), path.join(base, 'index.tsx')]) {
    if (/\.tsx?$/.test(candidate) && fs.existsSync(candidate) && fs.statSync(candidate).isFile()) return candidate;
  }
  return null;
}

/** file -> the files it imports (static, type-only, re-exports and import()) */
function importGraph(files: readonly string[]): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  for (const file of files) {
    const text = fs.readFileSync(file, 'utf8');
    const targets = [...text.matchAll(/(?:\bfrom\s*|\bimport\s*\(\s*|^\s*import\s+)'(\.{1,2}\/[^']+)'/gm)]
      .map((m) => resolve(file, m[1] as string))
      .filter((t): t is string => t !== null);
    graph.set(file, [...new Set(targets)]);
  }
  return graph;
}

/** the strongly connected components of more than one file, or of one file importing itself (Tarjan) */
function cycles(graph: Map<string, string[]>): string[][] {
  let next = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const out: string[][] = [];
  const visit = (v: string) => {
    index.set(v, next);
    low.set(v, next++);
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, index.get(w)!));
    }
    if (low.get(v) === index.get(v)) {
      const scc: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        scc.push(w);
      } while (w !== v);
      if (scc.length > 1 || (graph.get(v) ?? []).includes(v)) out.push(scc.map((f) => path.relative(ROOT, f)).sort());
    }
  };
  for (const v of graph.keys()) if (!index.has(v)) visit(v);
  return out;
}

describe('import cycles, type-only imports included', () => {
  const files = DIRS.flatMap((d) => sources(path.join(ROOT, d)));
  const graph = importGraph(files);

  it('reads the imports, type-only ones too (the panel model takes the job model as a type)', () => {
    const panel = path.join(ROOT, 'server/db/models/panel.ts');
    expect(graph.get(panel)).toContain(path.join(ROOT, 'server/db/models/job.ts'));
    expect(files.length).toBeGreaterThan(300);
  });

  it('finds a loop when there is one', () => {
    const a = path.join(ROOT, 'a.ts');
    const b = path.join(ROOT, 'b.ts');
    expect(
      cycles(
        new Map([
          [a, [b]],
          [b, [a]],
        ]),
      ),
    ).toEqual([['a.ts', 'b.ts']]);
  });

  it('has no loop among the files of shared/, server/, src/, scripts/ and tests/', () => {
    expect(cycles(graph)).toEqual([]);
  });
});
