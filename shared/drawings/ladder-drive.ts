// The ladder of a soft starter or a drive: an interposing run relay, fault and speed reference. Pure TypeScript.
import { el, ser } from './ladder';
import type { LadderKit } from './ladder-kit';
import { hasLine } from './schematic-model';

/** soft starter, AC drive and DC drive */
export function controllerLadder(k: LadderKit): string {
  const { input, s, t, drive, notes, circuits, d, dev, command, head, coil, no, light, status, ol, cmdLabel } = k;
  let starterText: string;
  // soft starter and drives: an interposing relay gives the run command to the controller's input
  const CR = d('CR');
  const ctrl = t === 'RVSS' ? d('SST') : t === 'VFD' ? d('VFD') : d('DCD');
  dev(ctrl, t === 'RVSS' ? `Soft starter${s.softStarter?.bypass ? ', bypass' : ''}` : t === 'VFD' ? 'Adjustable-speed drive' : 'DC drive');
  const fault = el({ kind: 'contact', device: ctrl, contact: 'nc', label: 'FAULT' });
  circuits.push({
    ends: 'rail',
    body: ser(...head(), command(CR, 'START', 'PB2', cmdLabel), fault, ...ol([coil(CR, 'CR', 'Run relay')])),
    note: 'Run command',
  });
  circuits.push({
    ends: 'open',
    body: ser(
      el({ kind: 'input', device: ctrl, label: 'DI COM' }),
      no(CR, 'RUN'),
      el({ kind: 'input', device: ctrl, label: 'DI1 RUN/ENABLE' }),
    ),
    note: `Run/enable input of ${ctrl}`,
  });
  circuits.push({ ends: 'rail', body: ser(no(CR), light(d('PL1'), 'R', 'RUN')) });
  if (drive)
    circuits.push({
      ends: 'rail',
      body: ser(el({ kind: 'contact', device: ctrl, contact: 'no', label: 'FAULT' }), light(d('PL2'), 'A', 'FAULT')),
    });
  status(no(CR), 'Running');
  if (drive) {
    status(el({ kind: 'contact', device: ctrl, contact: 'no', label: 'FAULT' }), 'Drive fault');
    circuits.push({
      ends: 'open',
      body: ser(
        el({ kind: 'terminal', label: 'Speed reference 4-20 mA + (by others)' }),
        el({ kind: 'input', device: ctrl, label: 'AI1 +' }),
      ),
      note: 'Speed reference from the plant control system (shielded pair, shield at the drive end)',
    });
    circuits.push({
      ends: 'open',
      body: ser(el({ kind: 'terminal', label: 'Speed reference 4-20 mA −' }), el({ kind: 'input', device: ctrl, label: 'AI COM' })),
    });
  }
  if (t === 'RVSS') {
    if (s.softStarter?.bypass) {
      const internal = input.bom.some((l) => l.category === 'soft-starter' && /bypass/i.test(l.description));
      if (internal || !hasLine(input.bom, 'contactor'))
        notes.push('Bypass contactor inside the soft starter (closed by the starter at the end of the ramp).');
      else {
        circuits.push({
          ends: 'rail',
          body: ser(
            el({ kind: 'contact', device: ctrl, contact: 'no', label: 'END OF RAMP' }),
            ...ol([coil(d('BP'), 'BP', 'Bypass contactor')]),
          ),
          note: 'Bypass at the end of the ramp',
        });
      }
    }
    notes.push('The soft starter’s fault output opens the run relay circuit.');
    starterText = 'Solid-state reduced-voltage (soft starter)';
  } else starterText = t === 'VFD' ? 'Adjustable-speed drive' : 'DC drive';
  if (t === 'dc-drive' && s.starter.reversingContactors)
    notes.push(
      'Reversal by the drive (armature reversal in a four-quadrant drive, or a field reversal as its instructions say); no reversing contactors.',
    );
  return starterText;
}
