// The selection engine in the browser: the same shared selector and rule files as the server,
// bundled with the wizard's chunk, built once per code edition.
import { createSelector, type Selector } from '../../shared/engine/selector';
import type { CodeEdition } from '../../shared/standards/code-edition';

const files = import.meta.glob('../../rules/**/*.json', { eager: true, import: 'default' }) as Record<string, unknown>;
const ruleFiles = Object.entries(files).map(([file, content]) => ({ file: file.replace('../../', ''), content }));
const selectors = new Map<CodeEdition, Selector>();

export function browserSelector(edition: CodeEdition = '2023'): Selector {
  let s = selectors.get(edition);
  if (!s) {
    s = createSelector(ruleFiles, { codeEdition: edition });
    selectors.set(edition, s);
  }
  return s;
}
