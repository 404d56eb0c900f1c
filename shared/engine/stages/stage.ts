// What every selection stage shares: the load being selected and what a stage hands back (its part
// of the trace, its cautions and its errors). Stages are pure: they read their inputs and return.

import { DomainError } from '../../errors';
import type { Load, Supply } from '../../schemas/load';
import type { TraceEntry } from '../../schemas/selection';
import type { CodeEdition } from '../../standards/code-edition';

export interface StageContext {
  load: Load;
  supply: Supply;
  edition: CodeEdition;
  /** AC motor (single- or three-phase) */
  ac: boolean;
  phases: 1 | 3;
}

/** A stage's part of the selection's trace, cautions and errors, in the order it produced them. */
export interface StageReport {
  trace: TraceEntry[];
  cautions: string[];
  errors: string[];
}

export function emptyReport(): StageReport {
  return { trace: [], cautions: [], errors: [] };
}

export { round2 } from '../../calc/round';

/** Runs a sizing step; a value outside a table becomes an error on this load, not a crash. */
export function step<T>(report: StageReport, what: string, fn: () => T): T | null {
  try {
    return fn();
  } catch (e) {
    if (e instanceof DomainError) {
      report.errors.push(`${what}: ${e.message}`);
      return null;
    }
    throw e;
  }
}
