// The ladders of the wye-delta and part-winding starters, with their transition timers. Pure TypeScript.
import { el, par, ser, type Net } from './ladder';
import type { LadderKit } from './ladder-kit';

/** wye start, open transition to delta */
export function wyeDeltaLadder(k: LadderKit): string {
  const { notes, circuits, interlocked, OL, d, dev, command, head, coil, nc, no, light, status, cmdLabel } = k;
  const M = d('M');
  const S = d('S');
  const D = d('D');
  const TR = d('TR');
  dev(TR, 'Transition timer (on-delay)');
  circuits.push({
    ends: 'rail',
    body: ser(
      ...head(),
      command(M, 'START', 'PB2', cmdLabel),
      par(
        ser(el({ kind: 'contact', device: TR, contact: 'nc-to', label: 'TR' }), nc(D), coil(S, 'S', 'Star contactor')),
        ser(par(no(S), no(M)), coil(M, 'M', 'Line contactor')),
        ser(no(M), coil(TR, 'TR', 'Transition timer')),
        ser(el({ kind: 'contact', device: TR, contact: 'no-tc', label: 'TR' }), nc(S), coil(D, 'D', 'Delta contactor')),
      ),
      ...(OL ? [OL] : []),
    ),
    note: 'Wye start, open transition to delta',
  });
  interlocked.push([S, D]);
  circuits.push({ ends: 'rail', body: ser(no(D), light(d('PL1'), 'R', 'RUN')) });
  status(no(M), 'Running');
  notes.push(
    'Set the transition timer to the motor’s acceleration time; the star contactor drops before the delta contactor closes (open transition), mechanically and electrically interlocked.',
  );
  return 'Wye-delta, open transition';
}

/** part-winding start: the second winding after the timer */
export function partWindingLadder(k: LadderKit): string {
  const { notes, circuits, OL, d, dev, command, head, coil, no, light, status, cmdLabel } = k;
  const M1 = d('M1');
  const M2 = d('M2');
  const TR = d('TR');
  dev(TR, 'Part-winding timer (on-delay, 1–3 s typical)');
  circuits.push({
    ends: 'rail',
    body: ser(
      ...head(),
      command(M1, 'START', 'PB2', cmdLabel),
      par(
        ser(coil(M1, 'M1', 'Contactor, first winding')),
        ser(coil(TR, 'TR', 'Part-winding timer')),
        ser(el({ kind: 'contact', device: TR, contact: 'no-tc', label: 'TR' }), coil(M2, 'M2', 'Contactor, second winding')),
      ),
      ...(OL ? [OL] : []),
    ),
    note: 'Part-winding start',
  });
  circuits.push({ ends: 'rail', body: ser(no(M2), light(d('PL1'), 'R', 'RUN')) });
  status(no(M1), 'Running');
  notes.push('Both windings’ overload relays open the circuit (95-96 of each in series).');
  return 'Part-winding';
}

/** the overload relays of a part-winding motor: one per winding, both in series */
export function partWindingOverloads(k: LadderKit): void {
  const { devices, circuits, d } = k;
  const c = circuits[0]!;
  c.body = ser(
    ...(c.body as { items: Net[] }).items.slice(0, -1),
    el({ kind: 'overload', device: d('OL1') }),
    el({ kind: 'overload', device: d('OL2') }),
  );
  devices.splice(
    devices.findIndex((x) => x.tag === d('OL')),
    1,
    { tag: d('OL1'), description: 'Overload relay, first winding' },
    { tag: d('OL2'), description: 'Overload relay, second winding' },
  );
}
