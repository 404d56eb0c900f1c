// Part of `npm run lint`: every comment that silences a checker says why, on the same line.
// - a Biome suppression needs `: reason` after its rule name (Biome itself refuses one without)
// - a TypeScript expect-error needs a reason after it; ts-ignore and ts-nocheck are not used
// - ESLint's disable comments: the project runs no ESLint, so such a comment silences nothing
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';

const files = execFileSync('git', ['ls-files', '--cached', '--others', '--exclude-standard', '*.ts', '*.tsx', '*.js', '*.cjs', '*.mjs'], {
  encoding: 'utf8',
})
  .split('\n')
  .filter(Boolean);

const CHECKS: Array<{ pattern: RegExp; unless?: RegExp; problem: string }> = [
  { pattern: /eslint-disable/, problem: 'an eslint-disable comment silences nothing here (the project lints with Biome)' },
  { pattern: /@ts-(ignore|nocheck)\b/, problem: 'use @ts-expect-error with a reason' },
  { pattern: /@ts-expect-error(?!\s+\S)/, problem: '@ts-expect-error without a reason on the same line' },
  {
    pattern: /biome-ignore/,
    unless: /biome-ignore(-all|-start|-end)?\s+[^\s:]+:\s*\S/,
    problem: 'biome-ignore without a reason on the same line',
  },
];

// the patterns above, as they appear in this file, are not suppressions
const SELF = 'scripts/check-suppressions.ts';
const problems: string[] = [];
for (const file of files) {
  if (file === SELF) continue;
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch {
    continue; // deleted in the working tree
  }
  text.split('\n').forEach((line, i) => {
    for (const { pattern, unless, problem } of CHECKS)
      if (pattern.test(line) && !unless?.test(line)) problems.push(`${file}:${i + 1}: ${problem}`);
  });
}
if (problems.length) {
  console.error(problems.join('\n'));
  process.exit(1);
}
