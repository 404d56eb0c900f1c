// What every starter family's ladder is drawn with: the bucket's device tags, the command (start/stop,
// two-wire or hand-off-auto), coils, contacts, pilot lights and the status contacts to the plant, and
// the notes and devices the drawing collects. Pure TypeScript.
import type { LoadSelection, StarterType } from '../schemas/selection';
import { el, par, ser, type Circuit, type Net } from './ladder';
import { type BucketInput, type BucketSchematic, type ControlScheme, hasLine } from './schematic-model';

export interface LadderKit {
  input: BucketInput;
  s: LoadSelection;
  t: StarterType;
  b: number;
  scheme: ControlScheme;
  drive: boolean;
  overload: BucketSchematic['overload'];
  notes: string[];
  devices: BucketSchematic['devices'];
  circuits: Circuit[];
  interlocked: Array<[string, string]>;
  /** the overload relay's trip contact, when the bill of materials has a relay */
  OL: Net | null;
  /** the bucket's device tag of a name: 3 and M give 3M */
  d: (name: string) => string;
  /** list a device with its description (once) and return its tag */
  dev: (tag: string, description: string) => string;
  field: (label: string, maintained?: boolean) => Net;
  command: (coil: string, startLabel: string, pb: string, remoteLabel: string) => Net;
  /** the protection and stop contacts that open every coil's rung */
  head: () => Net[];
  coil: (device: string, label: string, description: string) => Net;
  nc: (device: string) => Net;
  no: (device: string, label?: string) => Net;
  light: (device: string, colour: 'R' | 'G' | 'A', label: string) => Net;
  status: (n: Net, what: string) => void;
  /** a rung's elements with the overload contact after them */
  ol: (n: Net[]) => Net[];
  cmdLabel: string;
}

export function ladderKit(input: BucketInput): LadderKit {
  const s = input.selection;
  const b = input.index;
  const t = s.starter.type;
  const drive = t === 'VFD' || t === 'dc-drive';
  // a selection stored before the answer existed: the devices its bill of materials was priced with
  // (hand-off-auto on a drive, three-wire otherwise)
  const scheme: ControlScheme = s.controlScheme ?? (drive ? 'hand-off-auto' : 'three-wire');
  const d = (name: string) => `${b}${name}`;
  const notes: string[] = [];
  const overload: BucketSchematic['overload'] = hasLine(input.bom, 'overload-relay') ? 'relay' : drive ? 'drive' : 'starter';
  const devices: BucketSchematic['devices'] = [];
  const dev = (tag: string, description: string) => {
    if (!devices.some((x) => x.tag === tag)) devices.push({ tag, description });
    return tag;
  };
  const { OL, prefix } = protectionContacts(input, overload, d, dev, notes);
  const stop = () => el({ kind: 'push', device: dev(d('PB1'), 'Stop push-button'), contact: 'nc', label: 'STOP' });
  let fieldSeq = 0;
  const field = (label: string, maintained = false): Net => {
    fieldSeq++;
    return el({ kind: 'field', label, terminals: [`F${fieldSeq}a`, `F${fieldSeq}b`], maintained });
  };
  const remoteStop = () => field('Remote stop (jumper when unused)');
  const circuits: Circuit[] = [];
  const interlocked: Array<[string, string]> = [];
  const ol = (n: Net[]) => (OL ? [...n, OL] : n);
  const cmdLabel = scheme === 'three-wire' ? 'START' : scheme === 'two-wire' ? 'Remote run (maintained)' : 'Auto run (maintained)';

  const command = commandOf(input, scheme, d, dev, field, notes);
  const head = (): Net[] => [
    ...prefix,
    ...(scheme === 'three-wire'
      ? [stop(), remoteStop()]
      : scheme === 'hand-off-auto' && (t === 'FVR' || t === 'two-speed')
        ? [stop()]
        : []),
  ];
  const coil = (device: string, label: string, description: string) => el({ kind: 'coil', device: dev(device, description), label });
  const nc = (device: string) => el({ kind: 'contact', device, contact: 'nc', label: 'IL' });
  const no = (device: string, label?: string) => el({ kind: 'contact', device, contact: 'no', ...(label ? { label } : {}) });
  const light = (device: string, colour: 'R' | 'G' | 'A', label: string) =>
    el({ kind: 'light', device: dev(device, `Pilot light, ${label.toLowerCase()}`), colour, label });
  const status = (n: Net, what: string) =>
    circuits.push({
      ends: 'open',
      body: ser(
        el({ kind: 'terminal', label: `${what} (to plant control, by others)` }),
        n,
        el({ kind: 'terminal', label: `${what} return` }),
      ),
      note: `${what}: dry contact to the plant control system`,
    });

  return {
    input,
    s,
    t,
    b,
    scheme,
    drive,
    overload,
    notes,
    devices,
    circuits,
    interlocked,
    OL,
    d,
    dev,
    field,
    command,
    head,
    coil,
    nc,
    no,
    light,
    status,
    ol,
    cmdLabel,
  };
}

/** the overload contact and the relays' contacts ahead of every coil (phase monitor, field loss) */
function protectionContacts(
  input: BucketInput,
  overload: BucketSchematic['overload'],
  d: (name: string) => string,
  dev: (tag: string, description: string) => string,
  notes: string[],
): { OL: Net | null; prefix: Net[] } {
  const s = input.selection;
  const t = s.starter.type;
  const pmr = hasLine(input.bom, 'phase-monitor-relay');
  const fieldLoss = hasLine(input.bom, 'field-loss-relay');
  const OL: Net | null =
    overload === 'relay' ? el({ kind: 'overload', device: dev(d('OL'), `Overload relay, trip class ${s.overload.tripClass}`) }) : null;
  if (overload === 'drive')
    notes.push(
      'Motor overload by the drive’s electronic overload (NEC 2023 430.124 where the drive is listed for it): no separate overload contact.',
    );
  if (overload === 'starter')
    notes.push(
      t === 'RVSS'
        ? 'Overload protection inside the soft starter: its fault contact opens the run relay circuit.'
        : 'Overload protection inside the starter: its trip contact is drawn in series with the coil.',
    );
  const prefix: Net[] = [];
  if (pmr) {
    const what = [
      s.relays.phaseLoss && !s.relays.phaseLossByOverload ? 'phase loss' : null,
      s.relays.phaseReversal ? 'phase reversal' : null,
    ]
      .filter(Boolean)
      .join(' / ');
    prefix.push(el({ kind: 'contact', device: dev(d('PMR'), `Phase monitor relay (${what})`), contact: 'no', label: 'OK' }));
  }
  if (s.relays.phaseLossByOverload)
    notes.push(
      overload === 'relay'
        ? 'Phase loss detected by the electronic overload relay (its 95-96 contact opens).'
        : 'Phase loss detected by the drive or starter’s own protection (its fault contact opens).',
    );
  if (fieldLoss) prefix.push(el({ kind: 'contact', device: dev(d('FL'), 'Field-loss relay'), contact: 'no', label: 'FIELD' }));
  return { OL, prefix };
}

/** the command for one coil (or one direction): start with seal-in, maintained remote contact, or HOA */
function commandOf(
  input: BucketInput,
  scheme: ControlScheme,
  d: (name: string) => string,
  dev: (tag: string, description: string) => string,
  field: (label: string, maintained?: boolean) => Net,
  notes: string[],
): LadderKit['command'] {
  const t = input.selection.starter.type;
  return (coil: string, startLabel: string, pb: string, remoteLabel: string): Net => {
    if (scheme === 'two-wire') return field(remoteLabel, true);
    const start = el({ kind: 'push', device: dev(d(pb), `${startLabel} push-button`), contact: 'no', label: startLabel });
    const seal = el({ kind: 'contact', device: coil, contact: 'no', label: 'SEAL' });
    if (scheme === 'hand-off-auto') {
      const hand = el({ kind: 'selector', device: dev(d('SS'), 'Hand-off-auto selector'), position: 'H', label: 'HAND' });
      const auto = ser(el({ kind: 'selector', device: d('SS'), position: 'A', label: 'AUTO' }), field(remoteLabel, true));
      const twoDirections = t === 'FVR' || t === 'two-speed';
      return par(twoDirections ? ser(hand, par(start, seal)) : hand, auto);
    }
    if (input.jogging) {
      const jog = dev(
        d(pb === 'PB3' ? 'PB8' : 'PB9'),
        `Jog ${startLabel === 'START' ? '' : `${startLabel.toLowerCase()} `}push-button (one NO, one NC)`,
      );
      if (!notes.some((x) => x.startsWith('Jog')))
        notes.push(
          'Jog: the jog push-button’s NC contact opens the seal-in while its NO contact runs the coil; add the jog push-buttons to the bill of materials (it does not list them).',
        );
      return par(
        start,
        ser(seal, el({ kind: 'push', device: jog, contact: 'nc', label: 'JOG' })),
        el({ kind: 'push', device: jog, contact: 'no', label: 'JOG' }),
      );
    }
    return par(start, seal);
  };
}
