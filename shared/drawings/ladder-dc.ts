// The ladder of a DC armature-resistance starter, with or without reversing contactors. Pure TypeScript.
import { el, par, ser } from './ladder';
import type { LadderKit } from './ladder-kit';

/** DC armature-resistance starter: armature contactor(s) and the starter's overload trip */
export function dcStarterLadder(k: LadderKit): string {
  const { s, notes, circuits, interlocked, d, dev, command, head, coil, nc, no, light, status, cmdLabel } = k;
  const A = d('A');
  const trip = el({
    kind: 'contact',
    device: dev(d('DCS'), 'DC starter (accelerating resistors, built-in overload)'),
    contact: 'nc',
    label: 'OL TRIP',
  });
  if (s.starter.reversingContactors) {
    const F = d('AF');
    const R = d('AR');
    circuits.push({
      ends: 'rail',
      body: ser(
        ...head(),
        par(
          ser(command(F, 'FWD', 'PB2', 'Remote forward (maintained)'), nc(R), coil(F, 'AF', 'Armature contactor, forward')),
          ser(command(R, 'REV', 'PB3', 'Remote reverse (maintained)'), nc(F), coil(R, 'AR', 'Armature contactor, reverse')),
        ),
        trip,
      ),
      note: 'Armature forward / reverse',
    });
    interlocked.push([F, R]);
    circuits.push({ ends: 'rail', body: ser(par(no(F), no(R)), light(d('PL1'), 'R', 'RUN')) });
    status(par(no(F), no(R)), 'Running');
    notes.push('Reversal by the armature current (A1 and A2 interchanged by AF / AR); the field keeps its polarity. Never reverse both.');
  } else {
    circuits.push({
      ends: 'rail',
      body: ser(...head(), command(A, 'START', 'PB2', cmdLabel), coil(A, 'A', 'Armature contactor'), trip),
      note: 'Armature contactor',
    });
    circuits.push({ ends: 'rail', body: ser(no(A), light(d('PL1'), 'R', 'RUN')) });
    status(no(A), 'Running');
  }
  return 'DC armature-resistance starter';
}
