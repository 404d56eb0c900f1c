// Server modules depend one way: every import in server/modules goes to the same module or to a module in a
// lower layer of server/modules/order.json. A new module needs its place in the order first.
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import order from '../../../server/modules/order.json';

const MODULES = path.resolve(import.meta.dirname, '../../../server/modules');
const layerOf = new Map<string, number>(order.layers.flatMap((layer, i) => layer.map((m) => [m, i] as const)));

/** [from module, to module, file] for every import between two modules. */
function crossImports(): Array<[string, string, string]> {
  const out: Array<[string, string, string]> = [];
  for (const mod of fs.readdirSync(MODULES, { withFileTypes: true }).filter((d) => d.isDirectory())) {
    for (const file of fs.readdirSync(path.join(MODULES, mod.name)).filter((f) => /\.tsx?$/.test(f))) {
      const text = fs.readFileSync(path.join(MODULES, mod.name, file), 'utf8');
      // static imports and re-exports, and dynamic import() too: a lazy import does not break a cycle
      for (const m of text.matchAll(/(?:from|import\()\s*'\.\.\/([a-z0-9-]+)\//g)) {
        if (m[1] !== mod.name) out.push([mod.name, m[1]!, `${mod.name}/${file}`]);
      }
    }
  }
  return out;
}

describe('server module order (server/modules/order.json)', () => {
  it('places every module folder in exactly one layer', () => {
    const folders = fs
      .readdirSync(MODULES, { withFileTypes: true })
      .filter((d) => d.isDirectory())
      .map((d) => d.name)
      .sort();
    const listed = order.layers.flat();
    expect(new Set(listed).size).toBe(listed.length);
    expect([...listed].sort()).toEqual(folders);
  });

  it('finds the imports it judges (the bill of materials uses panels, the checks use the bill of materials)', () => {
    const pairs = new Set(crossImports().map(([a, b]) => `${a}->${b}`));
    expect(pairs.has('bom->panels')).toBe(true);
    expect(pairs.has('checks->bom')).toBe(true);
  });

  it('has every import between modules go down the order', () => {
    const upward = crossImports()
      .filter(([from, to]) => !(layerOf.get(to)! < layerOf.get(from)!))
      .map(([from, to, file]) => `${file} imports ${to} (layer ${layerOf.get(to)}) from layer ${layerOf.get(from)}`);
    expect(upward).toEqual([]);
  });
});
