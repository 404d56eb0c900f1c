// The ladder of a full-voltage non-reversing contactor starter. Pure TypeScript.
import { ser } from './ladder';
import type { LadderKit } from './ladder-kit';

/** FVNR: start / stop with seal-in, run light, running contact */
export function fvnrLadder(k: LadderKit): string {
  const { s, circuits, d, command, head, coil, no, light, status, ol, cmdLabel } = k;
  const M = d('M');
  circuits.push({
    ends: 'rail',
    body: ser(...head(), command(M, 'START', 'PB2', cmdLabel), ...ol([coil(M, 'M', `Contactor, NEMA size ${s.starter.nemaSize ?? '—'}`)])),
    note: 'Motor run',
  });
  circuits.push({ ends: 'rail', body: ser(no(M), light(d('PL1'), 'R', 'RUN')) });
  status(no(M), 'Running');
  return 'Full-voltage non-reversing';
}
