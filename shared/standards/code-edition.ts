// The NEC edition a selection is computed under. Every basis string names it.

export type CodeEdition = '2023' | '2020';

export const DEFAULT_CODE_EDITION: CodeEdition = '2023';

/** "NEC 2023 430.52(C)(1), Table 430.52" */
export function nec(edition: CodeEdition, clauses: string): string {
  return `NEC ${edition} ${clauses}`;
}
