// The ladder of a motor on a shared drive: its output contactor closes only while the drive is stopped (the
// drive's RUNNING contact, normally closed, in parallel with the contactor's own seal-in), the drive is enabled
// only through the contactor's auxiliary contact, and the motor's own overload relay opens its coil. Opening or
// closing an output contactor on a running drive output draws an inrush the drive sees as a fault and can
// damage it (common practice; the drive's instructions govern). Pure TypeScript.
import { el, par, ser } from './ladder';
import type { LadderKit } from './ladder-kit';

export function sharedDriveMemberLadder(k: LadderKit, driveTag: string): string {
  const { circuits, notes, d, dev, field, coil, no, light, status, ol } = k;
  const M = d('M');
  dev(driveTag, `Shared adjustable-speed drive ${driveTag} (drawn with its own bucket's devices)`);
  const stopped = el({ kind: 'contact', device: driveTag, contact: 'nc', label: 'RUNNING' });
  circuits.push({
    ends: 'rail',
    body: ser(
      field('Motor select (maintained, by others)', true),
      par(stopped, no(M, 'SEAL')),
      ...ol([coil(M, 'M', `Output contactor of ${driveTag}`)]),
    ),
    note: `Output contactor: closes only while ${driveTag} is stopped`,
  });
  circuits.push({
    ends: 'open',
    body: ser(
      el({ kind: 'input', device: driveTag, label: 'ENABLE COM' }),
      no(M, 'ENABLE'),
      el({ kind: 'input', device: driveTag, label: 'DI ENABLE' }),
    ),
    note: `Enable of ${driveTag} through this output contactor`,
  });
  circuits.push({ ends: 'rail', body: ser(no(M), light(d('PL1'), 'R', 'RUN')) });
  status(no(M), 'Selected on the drive');
  notes.push(
    `${driveTag} is stopped or disabled before this output contactor opens or closes: starting a motor onto a running drive output draws an inrush the drive sees as an overcurrent fault and can damage it.`,
    `This motor's own overload relay opens its contactor coil; wire its alarm contact to ${driveTag}'s stop input so the drive stops first (common practice, the drive's instructions govern). The drive's electronic overload protects one motor only: set or disable it as its instructions say.`,
  );
  return `Output contactor on shared drive ${driveTag}`;
}
