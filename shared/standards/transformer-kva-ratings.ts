// Preferred kVA ratings of dry-type distribution transformers (ANSI/IEEE C57.12.01 and NEMA ST 20
// list these; written from memory). Single-phase and three-phase units have their own series.

import { OutsideTableError } from '../errors';
import { round2 } from '../calc/round';

export const TRANSFORMER_KVA_SOURCE = 'standard dry-type transformer kVA ratings (IEEE C57.12.01 / NEMA ST 20, from memory)';

export const SINGLE_PHASE_KVA = [0.5, 0.75, 1, 1.5, 2, 3, 5, 7.5, 10, 15, 25, 37.5, 50, 75, 100, 167] as const;
export const THREE_PHASE_KVA = [3, 6, 9, 15, 30, 45, 75, 112.5, 150, 225, 300, 500] as const;

/** The smallest standard kVA rating at or above kva. */
export function nextStandardKva(kva: number, phases: 1 | 3): number {
  const list: readonly number[] = phases === 1 ? SINGLE_PHASE_KVA : THREE_PHASE_KVA;
  if (!(kva > 0) || !Number.isFinite(kva)) throw new OutsideTableError(TRANSFORMER_KVA_SOURCE, `${kva} kVA is not a load`);
  const r = list.find((v) => v >= kva - 1e-9);
  if (r === undefined)
    throw new OutsideTableError(
      TRANSFORMER_KVA_SOURCE,
      `${round2(kva)} kVA is above the largest ${phases === 1 ? 'single' : 'three'}-phase rating listed (${list.at(-1)} kVA)`,
    );
  return r;
}
