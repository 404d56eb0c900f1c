// npm run -s select -- FILE.json
// Reads { "supply": {...}, "loads": [...] }, prints { "results": [...], "panel": {...} }.
// Exit 0 on success; 2 with { "errors": [{ "path", "message" }] } on invalid input (a motor the
// engine cannot size among it: a rated voltage no FLC table covers and no nameplate FLA), an
// unreadable file or bad JSON; 3 with the results and { "errors": [...] } when a result or the panel
// roll-up carries errors; 1 with { "errors": [...] } when the rule files are invalid. Never a stack trace.

import { readFileSync } from 'node:fs';
import { DomainError, ValidationError } from '../../shared/errors';
import { getSelector } from '../engine/rule-files';
import '../../shared/plain-messages';

type CliError = { path: string; message: string };

/** Prints the answer and sets the exit status; the process ends once stdout has drained (a process.exit()
 *  here would cut the output to a pipe at 64 KiB). */
function finish(code: number, body: unknown): void {
  process.exitCode = code;
  process.stdout.write(`${JSON.stringify(body, null, 2)}\n`);
}

async function main(argv: string[]): Promise<void> {
  const file = argv[0];
  if (!file || argv.length > 1) {
    return finish(2, { errors: [{ path: '', message: 'usage: npm run -s select -- FILE.json' }] satisfies CliError[] });
  }
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    return finish(2, { errors: [{ path: '', message: `cannot read ${file}${code ? ` (${code})` : ''}` }] });
  }
  let input: unknown;
  try {
    input = JSON.parse(text);
  } catch (e) {
    return finish(2, { errors: [{ path: '', message: `${file} is not valid JSON: ${(e as Error).message}` }] });
  }
  try {
    const out = await getSelector().selectPanel(input as never);
    const errors: CliError[] = [
      ...out.results.flatMap((r, i) => r.errors.map((message) => ({ path: `loads[${i}]`, message: `${r.tag}: ${message}` }))),
      ...(out.panel.errors ?? []).map((message) => ({ path: 'panel', message })),
    ];
    return finish(errors.length ? 3 : 0, {
      results: out.results,
      panel: out.panel,
      codeEdition: out.codeEdition,
      ...(errors.length ? { errors } : {}),
    });
  } catch (e) {
    if (e instanceof ValidationError) return finish(2, { errors: e.details });
    if (e instanceof DomainError) return finish(1, { errors: [{ path: '', message: e.message, code: e.code }] });
    return finish(1, { errors: [{ path: '', message: `internal error: ${(e as Error)?.message ?? String(e)}` }] });
  }
}

process.on('uncaughtException', (e) => finish(1, { errors: [{ path: '', message: `internal error: ${e.message}` }] }));
void main(process.argv.slice(2));
