// Reads the rule files (rules/**/*.json) with node fs, once per process, and hands them to the
// shared selector as { file, content }. A file that is not valid JSON is refused with its name.

import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { RuleFileError } from '../../shared/errors';
import { createSelector, type RuleFileInput, type Selector } from '../../shared/engine/selector';
import type { CodeEdition } from '../../shared/standards/code-edition';

export const DEFAULT_RULES_DIR = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../rules');

function listJson(dir: string): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) out.push(...listJson(full));
    else if (entry.isFile() && entry.name.endsWith('.json')) out.push(full);
  }
  return out.sort();
}

const cache = new Map<string, RuleFileInput[]>();

/** Every rule file under dir (default: the repository's rules/), file names relative to dir's parent. */
export function loadRuleFiles(dir: string = DEFAULT_RULES_DIR): RuleFileInput[] {
  const key = path.resolve(dir);
  const hit = cache.get(key);
  if (hit) return hit;
  const base = path.dirname(key);
  const files = listJson(key).map((full) => {
    const file = path.relative(base, full).split(path.sep).join('/');
    let text: string;
    try {
      text = readFileSync(full, 'utf8');
    } catch (e) {
      throw new RuleFileError(file, `cannot be read (${(e as NodeJS.ErrnoException).code ?? 'error'})`);
    }
    try {
      return { file, content: JSON.parse(text) as unknown };
    } catch (e) {
      throw new RuleFileError(file, `is not valid JSON (${(e as Error).message})`);
    }
  });
  cache.set(key, files);
  return files;
}

const selectors = new Map<CodeEdition, Selector>();

/** The process-wide selector over the repository's rules, built once per code edition. */
export function getSelector(codeEdition: CodeEdition = '2023'): Selector {
  let s = selectors.get(codeEdition);
  if (!s) {
    s = createSelector(loadRuleFiles(), { codeEdition });
    selectors.set(codeEdition, s);
  }
  return s;
}
