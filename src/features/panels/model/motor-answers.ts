// The motor wizard's answers: where a new motor starts, and what the wizard sends on save. Kept out
// of the page so a unit test can check the wizard gives the same selection as the import and the CLI.
import type { Resolver } from 'react-hook-form';
import { formResolver as zodResolver } from '../../../lib/form-resolver';
import { LoadSchema, loadDefaults, type LoadInput } from '../../../../shared/schemas/load';

/**
 * A new motor starts from the schema's own defaults (the same the import and the CLI get) and nothing
 * else: no supply, voltage or service factor the user has not given, and nothing the engine would
 * otherwise flag as assumed (service factor, environment …), so the live preview shows those flags.
 */
export const newMotorAnswers = (): LoadInput => ({ tag: '', ...loadDefaults() }) as LoadInput;

/** Drops empty strings and NaN that form inputs leave behind, so the schema sees "not given". */
export function cleanAnswers(v: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [k, x] of Object.entries(v)) {
    if (x === '' || x === undefined || (typeof x === 'number' && Number.isNaN(x))) continue;
    out[k] = x;
  }
  return out;
}

/**
 * Checks the answers with the shared schema and hands back the answers as given (`raw`), not the
 * parsed ones: a default the schema fills in (service factor 1.0) is then not stored as if the user
 * had said so, and the engine flags it, as it does for an imported motor.
 */
// cast: with `raw: true` the resolver hands back the input type, which @hookform/resolvers types as the schema's output
export const motorResolver = zodResolver(LoadSchema, undefined, { raw: true }) as unknown as Resolver<LoadInput>;
