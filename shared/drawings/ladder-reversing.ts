// The ladder of a reversing or two-speed starter: two interlocked contactors. Pure TypeScript.
import { par, ser } from './ladder';
import type { LadderKit } from './ladder-kit';

/** FVR and two-speed: two commands, electrically interlocked */
export function reversingLadder(k: LadderKit): string {
  const { s, t, notes, circuits, interlocked, OL, d, command, head, coil, nc, no, light, status } = k;
  const two = t === 'two-speed';
  const F = d(two ? 'FM' : 'F');
  const R = d(two ? 'SM' : 'R');
  const lf = two ? 'FAST' : 'FWD';
  const lr = two ? 'SLOW' : 'REV';
  const descr = (what: string) => `Contactor ${what}, NEMA size ${s.starter.nemaSize ?? '—'}`;
  circuits.push({
    ends: 'rail',
    body: ser(
      ...head(),
      par(
        ser(
          command(F, lf, 'PB2', `Remote ${lf.toLowerCase()} (maintained)`),
          nc(R),
          coil(F, two ? 'FM' : 'F', descr(two ? 'fast' : 'forward')),
        ),
        ser(
          command(R, lr, 'PB3', `Remote ${lr.toLowerCase()} (maintained)`),
          nc(F),
          coil(R, two ? 'SM' : 'R', descr(two ? 'slow' : 'reverse')),
        ),
      ),
      ...(OL ? [OL] : []),
    ),
    note: two ? 'Fast / slow (interlocked)' : 'Forward / reverse (interlocked)',
  });
  interlocked.push([F, R]);
  circuits.push({ ends: 'rail', body: ser(no(F), light(d('PL1'), 'R', lf)) });
  circuits.push({ ends: 'rail', body: ser(no(R), light(d('PL2'), 'R', lr)) });
  status(par(no(F), no(R)), 'Running');
  if (!two)
    notes.push(
      'Reverse only after stop: the push-buttons do not plug-reverse (common practice) unless the machine is meant to be plugged.',
    );
  return two ? 'Two-speed' : 'Full-voltage reversing';
}
