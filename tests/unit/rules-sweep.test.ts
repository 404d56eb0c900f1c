// Sweep: every file under rules/ must be a valid rule file (and the whole set must build an engine).
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { validateRuleFile } from '../../shared/engine/rule-file';
import { createSelector } from '../../shared/engine/selector';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? walk(path.join(dir, e.name)) : [path.join(dir, e.name)],
  );
}

const ruleFiles = walk(path.join(root, 'rules')).map((f) => path.relative(root, f).split(path.sep).join('/'));

describe('rules/ sweep', () => {
  it('holds rule files', () => {
    expect(ruleFiles.length).toBeGreaterThan(20);
  });
  it.each(ruleFiles)('%s is a valid rule file in rules/<concern>/<rule-id>.json', (file) => {
    expect(file).toMatch(/^rules\/[a-z0-9-]+\/[a-z0-9-]+\.json$/);
    const content = JSON.parse(readFileSync(path.join(root, file), 'utf8')) as unknown;
    const rule = validateRuleFile(file, content);
    expect(rule.event.params.basis.trim()).not.toBe('');
  });
  it('the whole set builds one engine (ids unique)', () => {
    const s = createSelector(
      ruleFiles.map((file) => ({ file, content: JSON.parse(readFileSync(path.join(root, file), 'utf8')) as unknown })),
    );
    expect(s.ruleCount).toBe(ruleFiles.length);
  });
});
