// A bucket's control schematic and power circuit, generated from its stored selection, its answers
// (control scheme, jogging) and its lines of the bill of materials. Reference designations and contact
// numbers as a US panel shop marks them (IEEE 315 / NEMA ICS 19 symbols; aux contacts 13-14 NO, 21-22 NC,
// overload trip 95-96, coil A1-A2: common practice). Pure TypeScript.
import type { BomLine } from '../schemas/catalogue';
import type { LoadSelection } from '../schemas/selection';
import type { ConnectionCard } from '../calc/connections';
import { el, layoutLadder, par, ser, type Circuit, type Element, type LadderLayout, type Net } from './ladder';

export type ControlScheme = 'three-wire' | 'two-wire' | 'hand-off-auto';

export interface BucketInput {
  /** bucket number on the panel, 1-based: the prefix of its devices, wires and terminal strip */
  index: number;
  selection: LoadSelection;
  /** the bucket's lines of the bill of materials */
  bom: readonly BomLine[];
  card: ConnectionCard | null;
  jogging: boolean;
}

/** One phase or pole of the power circuit between two devices. */
export interface PowerBand {
  kind: 'cb' | 'mcp' | 'fuse' | 'contactor' | 'ol' | 'sst' | 'vfd' | 'dc-drive' | 'dc-starter' | 'filter' | 'pmr' | 'star' | 'terminals';
  device: string;
  label: string;
  /** wire numbers leaving the band, one per line */
  wires: string[];
  /** terminal marks on the band's outputs (terminals: strip references; drives: U V W) */
  marks?: string[];
}

export interface PowerColumn {
  device: string;
  bands: PowerBand[];
}

export interface PowerCircuit {
  /** line names of the supply into the bucket, e.g. 1L1 1L2 1L3 */
  lines: string[];
  head: PowerBand[];
  /** two contactor paths side by side (reversing, wye-delta, part-winding, two-speed) */
  split: null | { left: PowerColumn; right: PowerColumn; rejoin: boolean; swap: boolean; interlock: boolean };
  tail: PowerBand[];
  /** motor lead marks at the motor (NEMA MG 1), in the order of the lines that reach it */
  motorLeads: string[];
  /** extra motor circuits (DC field, dynamic braking) written out */
  extras: string[];
  motorLabel: string;
}

export interface FieldPoint {
  /** wire number at the terminal */
  wire: string;
  purpose: string;
  group: 'motor' | 'ground' | 'remote' | 'plc' | 'supply';
  /** what lands on the field side */
  field: string;
  /** device terminal on the panel side */
  panelSide: string;
  conductor: string;
  colour: string;
}

export interface CrossRef {
  device: string;
  coilRung: number;
  no: number[];
  nc: number[];
}

export interface BucketSchematic {
  tag: string;
  index: number;
  title: string;
  starter: string;
  scheme: ControlScheme;
  circuits: Circuit[];
  layout: LadderLayout;
  /** the panel rung number of the layout's first row */
  firstRung: number;
  /** wire number of each ladder node id */
  nodeWire: string[];
  power: PowerCircuit;
  xrefs: CrossRef[];
  fieldPoints: FieldPoint[];
  notes: string[];
  /** devices in the bucket with their description */
  devices: Array<{ tag: string; description: string }>;
  /** the overload protection: a relay in the bill of materials, the drive's, or the starter's own */
  overload: 'relay' | 'drive' | 'starter';
  /** the contactors that must be interlocked against each other: [a, b] pairs */
  interlocked: Array<[string, string]>;
  controlWireSize: string;
}

const hasLine = (bom: readonly BomLine[], category: string) => bom.some((l) => l.category === category && l.quantity > 0);

/** Power conductor colour and control colours, NFPA 79 2024 13.2.4 (from memory). */
export const COLOUR = {
  power: 'black',
  control: 'red',
  grounded: 'white',
  dcControl: 'blue',
  ground: 'green/yellow',
  foreign: 'orange',
} as const;

export const COLOUR_PRACTICE =
  'Conductor colours per NFPA 79 2024 13.2.4 (from memory): black AC/DC power; red ungrounded AC control; white grounded AC control (X2); green/yellow equipment ground; orange circuits that stay live with the disconnect open (fed from outside the panel).';

export function buildBucketSchematic(input: BucketInput, firstRung: number): BucketSchematic {
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
  const pmr = hasLine(input.bom, 'phase-monitor-relay');
  const fieldLoss = hasLine(input.bom, 'field-loss-relay');
  const devices: BucketSchematic['devices'] = [];
  const dev = (tag: string, description: string) => {
    if (!devices.some((x) => x.tag === tag)) devices.push({ tag, description });
    return tag;
  };

  // ---------------------------------------------------------------- control circuit
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

  /** the command for one coil (or one direction): start with seal-in, maintained remote contact, or HOA */
  const command = (coil: string, startLabel: string, pb: string, remoteLabel: string): Net => {
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

  let starterText: string = t;
  if (t === 'FVNR' || t === 'RVSS' || t === 'VFD' || t === 'dc-drive' || t === 'dc-armature-resistance') {
    if (t === 'FVNR') {
      const M = d('M');
      circuits.push({
        ends: 'rail',
        body: ser(
          ...head(),
          command(M, 'START', 'PB2', cmdLabel),
          ...ol([coil(M, 'M', `Contactor, NEMA size ${s.starter.nemaSize ?? '—'}`)]),
        ),
        note: 'Motor run',
      });
      circuits.push({ ends: 'rail', body: ser(no(M), light(d('PL1'), 'R', 'RUN')) });
      status(no(M), 'Running');
      starterText = 'Full-voltage non-reversing';
    } else if (t === 'dc-armature-resistance') {
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
        notes.push(
          'Reversal by the armature current (A1 and A2 interchanged by AF / AR); the field keeps its polarity. Never reverse both.',
        );
      } else {
        circuits.push({
          ends: 'rail',
          body: ser(...head(), command(A, 'START', 'PB2', cmdLabel), coil(A, 'A', 'Armature contactor'), trip),
          note: 'Armature contactor',
        });
        circuits.push({ ends: 'rail', body: ser(no(A), light(d('PL1'), 'R', 'RUN')) });
        status(no(A), 'Running');
      }
      starterText = 'DC armature-resistance starter';
    } else {
      // soft starter and drives: an interposing relay gives the run command to the controller's input
      const CR = d('CR');
      const ctrl = t === 'RVSS' ? d('SST') : t === 'VFD' ? d('VFD') : d('DCD');
      dev(
        ctrl,
        t === 'RVSS' ? `Soft starter${s.softStarter?.bypass ? ', bypass' : ''}` : t === 'VFD' ? 'Adjustable-speed drive' : 'DC drive',
      );
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
    }
  } else if (t === 'FVR' || t === 'two-speed') {
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
    starterText = two ? 'Two-speed' : 'Full-voltage reversing';
  } else if (t === 'wye-delta') {
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
    starterText = 'Wye-delta, open transition';
  } else if (t === 'part-winding') {
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
    starterText = 'Part-winding';
  }

  if (scheme === 'two-wire')
    notes.push(
      'Two-wire control restarts the motor when power returns: the engineer confirms that this is safe (NFPA 79 7.5, from memory).',
    );
  notes.push('Emergency stop: by the machine builder where the machine calls for one (NFPA 79 stop categories); not in this bucket.');

  // the overload relays of a part-winding motor: one per winding, both in series
  if (t === 'part-winding' && OL) {
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

  // circuits between the rails first, then the isolated ones (dry contacts, drive inputs) below the rails' ends
  circuits.sort((a, z) => (a.ends === z.ends ? 0 : a.ends === 'rail' ? -1 : 1));
  const layout = layoutLadder(circuits);

  // ---------------------------------------------------------------- wire numbers
  // b01… for the power circuit, then the control nodes; the fused rail and X2 are named
  let seq = 0;
  const nextWire = () => String(b * 100 + ++seq);
  const power = powerCircuit(input, d, nextWire, dev);
  const nodeWire: string[] = new Array(layout.nodeCount).fill('');
  nodeWire[0] = nextWire();
  nodeWire[1] = 'X2';
  const order = [...layout.elements].sort((a, z) => a.row - z.row || a.col - z.col);
  for (const e of order) for (const n of [e.left, e.right]) if (!nodeWire[n]) nodeWire[n] = nextWire();

  // ---------------------------------------------------------------- cross-references
  const coils = new Map<string, CrossRef>();
  for (const e of layout.elements)
    if (e.el.kind === 'coil') coils.set(e.el.device, { device: e.el.device, coilRung: firstRung + e.row, no: [], nc: [] });
  for (const e of layout.elements) {
    if (e.el.kind !== 'contact') continue;
    const x = coils.get(e.el.device);
    if (!x) continue;
    (e.el.contact === 'no' || e.el.contact === 'no-tc' ? x.no : x.nc).push(firstRung + e.row);
  }

  // ---------------------------------------------------------------- field points (terminal plan)
  const controlSize = '14 AWG';
  const fieldPoints: FieldPoint[] = [];
  const leadSize = s.conductor.motorLeads?.size ?? s.conductor.size;
  const motorTerms = power.motorLeads;
  const termBand = [...power.tail, ...(power.split ? [...power.split.left.bands, ...power.split.right.bands] : [])].filter(
    (x) => x.kind === 'terminals',
  );
  const wiresAtTerms = termBand.flatMap((x) => x.wires);
  const sets = /^\s*(\d+)\s*[×x]/.exec(s.conductor.size);
  const nSets = sets ? Number(sets[1]) : 1;
  motorTerms.forEach((lead, i) => {
    for (let k = 0; k < nSets; k++) {
      fieldPoints.push({
        wire: wiresAtTerms[i] ?? '',
        purpose: `Motor lead ${lead}${nSets > 1 ? ` (set ${k + 1})` : ''}`,
        group: 'motor',
        field: `${s.tag} ${lead}`,
        panelSide: termPanelSide(power, i),
        conductor: leadSize,
        colour: COLOUR.power,
      });
    }
  });
  fieldPoints.push({
    wire: 'PE',
    purpose: 'Motor frame ground',
    group: 'ground',
    field: `${s.tag} frame`,
    panelSide: 'ground bar',
    conductor: `${leadSize} (size by NEC 250.122)`,
    colour: COLOUR.ground,
  });
  for (const e of order) {
    if (e.el.kind === 'field') {
      const purpose = e.el.label;
      fieldPoints.push({
        wire: nodeWire[e.left]!,
        purpose: `${purpose}: out`,
        group: 'remote',
        field: `${purpose} (by others)`,
        panelSide: neighbour(layout, e.left, e, nodeWire),
        conductor: controlSize,
        colour: COLOUR.control,
      });
      fieldPoints.push({
        wire: nodeWire[e.right]!,
        purpose: `${purpose}: return`,
        group: 'remote',
        field: `${purpose} (by others)`,
        panelSide: neighbour(layout, e.right, e, nodeWire),
        conductor: controlSize,
        colour: COLOUR.control,
      });
    }
    if (e.el.kind === 'terminal') {
      const n =
        e.left === e.right ? e.left : layout.elements.some((x) => x !== e && (x.left === e.left || x.right === e.left)) ? e.left : e.right;
      fieldPoints.push({
        wire: nodeWire[n]!,
        purpose: e.el.label,
        group: 'plc',
        field: e.el.label,
        panelSide: neighbour(layout, n, e, nodeWire),
        conductor: /4-20/.test(e.el.label) ? '18 AWG shielded pair' : controlSize,
        colour: COLOUR.foreign,
      });
    }
  }

  return {
    tag: s.tag,
    index: b,
    title: `${s.tag}${s.description ? ` ${s.description}` : ''}`,
    starter: starterText,
    scheme,
    circuits,
    layout,
    firstRung,
    nodeWire,
    power,
    xrefs: [...coils.values()],
    fieldPoints,
    notes,
    devices,
    overload,
    interlocked,
    controlWireSize: controlSize,
  };
}

function termPanelSide(power: PowerCircuit, i: number): string {
  const src = power.split && !power.split.rejoin ? [...power.split.left.bands, ...power.split.right.bands] : power.tail;
  const before = src.filter((x) => x.kind !== 'terminals' && x.kind !== 'star');
  const last = before[before.length - 1];
  return last ? `${last.device}:${['T1', 'T2', 'T3'][i % 3]}` : '—';
}

/** the panel-side device terminal on a node, other than e itself */
function neighbour(layout: LadderLayout, node: number, self: { el: Element }, nodeWire: string[]): string {
  const other = layout.elements.find((x) => x.el !== self.el && (x.left === node || x.right === node));
  if (!other) return node === layout.railNode ? `rail ${nodeWire[node]}` : '—';
  return `${deviceOf(other.el)}:${terminalOf(other.el, other.left === node ? 'left' : 'right')}`;
}

export function deviceOf(e: Element): string {
  return 'device' in e ? e.device : e.kind === 'field' ? 'field' : 'TB';
}

/** Terminal marks of a device's contact or coil (common practice marking). */
export function terminalOf(e: Element, side: 'left' | 'right'): string {
  const l = side === 'left';
  switch (e.kind) {
    case 'coil':
      return l ? 'A1' : 'A2';
    case 'overload':
      return l ? '95' : '96';
    case 'contact':
      return e.contact === 'no' || e.contact === 'no-tc' ? (l ? '13' : '14') : l ? '21' : '22';
    case 'push':
      return e.contact === 'no' ? (l ? '3' : '4') : l ? '1' : '2';
    case 'selector':
      return e.position === 'H' ? (l ? '1' : '2') : l ? '3' : '4';
    case 'light':
      return l ? 'X1' : 'X2';
    case 'fuse':
      return l ? '1' : '2';
    case 'input':
      return e.label.split(' ')[0]!;
    default:
      return '';
  }
}

function powerCircuit(
  input: BucketInput,
  d: (n: string) => string,
  nextWire: () => string,
  dev: (tag: string, description: string) => string,
): PowerCircuit {
  const s = input.selection;
  const t = s.starter.type;
  const poles = s.supply === 'ac3' ? 3 : s.supply === 'ac1' && s.volts <= 120 ? 1 : 2;
  const lines =
    s.supply === 'ac3'
      ? ['1L1', '1L2', '1L3']
      : s.supply === 'dc' && t !== 'dc-drive'
        ? ['DC+', 'DC−']
        : poles === 1
          ? ['1L1', 'N']
          : ['1L1', '1L2'];
  const n = t === 'dc-drive' ? 3 : lines.length;
  const inLines = t === 'dc-drive' ? ['1L1', '1L2', '1L3'] : lines;
  const wires = (k = n) => Array.from({ length: k }, nextWire);
  const head: PowerBand[] = [];
  const scpd = s.scpd;
  const scpdText = `${scpd.ratingAmps} A`;
  if (scpd.type === 'inverse-time-breaker')
    head.push({
      kind: 'cb',
      device: dev(d('CB'), `Inverse-time breaker ${scpdText}, ${poles}-pole`),
      label: `${scpdText}`,
      wires: wires(),
    });
  else if (scpd.type === 'instantaneous-trip-breaker')
    head.push({
      kind: 'mcp',
      device: dev(d('MCP'), `Motor circuit protector, trip ≤ ${scpdText}`),
      label: `≤ ${scpdText}`,
      wires: wires(),
    });
  else
    head.push({
      kind: 'fuse',
      device: dev(d('FU'), `${scpd.type === 'dual-element-fuse' ? 'Dual-element' : 'Non-time-delay'} fuses ${scpdText}`),
      label: scpdText,
      wires: wires(),
    });
  if (hasLine(input.bom, 'phase-monitor-relay')) head.push({ kind: 'pmr', device: d('PMR'), label: 'monitors', wires: [] });
  const ol = (name = 'OL'): PowerBand => ({ kind: 'ol', device: d(name), label: `class ${s.overload.tripClass}`, wires: wires() });
  const contactor = (name: string, label: string): PowerBand => ({ kind: 'contactor', device: d(name), label, wires: wires() });
  const terms = (marks: string[]): PowerBand => ({ kind: 'terminals', device: `TB${input.index}`, label: 'field', wires: [], marks });
  const relay = hasLine(input.bom, 'overload-relay');
  const extras: string[] = [];
  let split: PowerCircuit['split'] = null;
  let tail: PowerBand[] = [];
  let motorLeads: string[];

  const runGroups = input.card?.steps[input.card.steps.length - 1]?.lineGroups;
  const leadNames = (): string[] => {
    if (s.supply === 'dc') return ['A1', s.dc?.field === 'series' || s.dc?.field === 'compound' ? 'S2' : 'A2'];
    if (runGroups) {
      const keys = (s.supply === 'ac3' ? ['L1', 'L2', 'L3'] : ['L1', 'L2']) as Array<keyof typeof runGroups>;
      return keys.map((k) => (runGroups[k] ?? []).join('+') || 'T?');
    }
    return s.supply === 'ac3' ? ['T1', 'T2', 'T3'] : ['T1', 'T4'];
  };

  switch (t) {
    case 'FVNR':
      tail = [contactor('M', 'M'), ...(relay ? [ol()] : [])];
      motorLeads = leadNames();
      tail.push(terms(motorLeads));
      break;
    case 'FVR':
    case 'two-speed':
      if (t === 'FVR') {
        const f = contactor('F', 'F');
        // the reverse contactor's outputs are the forward contactor's: one node, one number
        split = {
          left: { device: d('F'), bands: [f] },
          right: { device: d('R'), bands: [{ kind: 'contactor', device: d('R'), label: 'R', wires: f.wires }] },
          rejoin: true,
          swap: true,
          interlock: true,
        };
        tail = [...(relay ? [ol()] : [])];
        motorLeads = leadNames();
        tail.push(terms(motorLeads));
        if (s.supply === 'ac1')
          extras.push('Single-phase reversal: interchange the start winding leads T5 and T8 (see the connection card), not the line.');
      } else {
        split = {
          left: { device: d('FM'), bands: [contactor('FM', 'FM'), ...(relay ? [ol('OLF')] : []), terms(['T11', 'T12', 'T13'])] },
          right: { device: d('SM'), bands: [contactor('SM', 'SM'), ...(relay ? [ol('OLS')] : []), terms(['T1', 'T2', 'T3'])] },
          rejoin: false,
          swap: false,
          interlock: true,
        };
        motorLeads = ['T11', 'T12', 'T13', 'T1', 'T2', 'T3'];
        extras.push('Two-speed, separate windings drawn (T1–T3 slow, T11–T13 fast); a consequent-pole motor follows its own lead diagram.');
      }
      break;
    case 'wye-delta':
      split = {
        left: { device: d('M'), bands: [contactor('M', 'M'), ...(relay ? [ol()] : []), terms(['T1', 'T2', 'T3'])] },
        right: {
          device: d('D'),
          bands: [
            contactor('D', 'D'),
            { kind: 'star', device: d('S'), label: `mech. interlocked with ${d('D')}`, wires: wires(1) },
            terms(['T6', 'T4', 'T5']),
          ],
        },
        rejoin: false,
        swap: false,
        interlock: false,
      };
      motorLeads = ['T1', 'T2', 'T3', 'T6', 'T4', 'T5'];
      extras.push(
        'Delta contactor D closes L1–T6, L2–T4, L3–T5; star contactor S joins T4-T5-T6 (NEMA MG 1 lead markings). The overload relay in the line leads carries FLA/√3 in the delta (set at the relay’s dial as the protection card says).',
      );
      break;
    case 'part-winding':
      split = {
        left: { device: d('M1'), bands: [contactor('M1', 'M1'), ...(relay ? [ol('OL1')] : []), terms(['T1', 'T2', 'T3'])] },
        right: { device: d('M2'), bands: [contactor('M2', 'M2'), ...(relay ? [ol('OL2')] : []), terms(['T7', 'T8', 'T9'])] },
        rejoin: false,
        swap: false,
        interlock: false,
      };
      motorLeads = ['T1', 'T2', 'T3', 'T7', 'T8', 'T9'];
      extras.push('Both contactors close in the same phase order; T4-T5-T6 joined in the motor box.');
      break;
    case 'RVSS':
      tail = [
        {
          kind: 'sst',
          device: d('SST'),
          label: s.softStarter?.insideDelta ? 'inside delta' : 'in line',
          wires: wires(),
          marks: ['T1', 'T2', 'T3'],
        },
        ...(relay ? [ol()] : []),
      ];
      motorLeads = leadNames();
      tail.push(terms(motorLeads));
      break;
    case 'VFD':
      tail = [{ kind: 'vfd', device: d('VFD'), label: 'L1 L2 L3 → U V W', wires: wires(), marks: ['U', 'V', 'W'] }];
      if (s.vfd && s.vfd.outputFilter !== 'none')
        tail.push({
          kind: 'filter',
          device: dev(d('FLT'), s.vfd.outputFilter === 'dv-dt' ? 'dV/dt output filter' : 'Sine-wave output filter'),
          label: s.vfd.outputFilter,
          wires: wires(),
        });
      if (relay) tail.push(ol());
      motorLeads = leadNames();
      tail.push(terms(motorLeads));
      break;
    case 'dc-drive':
      tail = [{ kind: 'dc-drive', device: d('DCD'), label: 'AC in → A+ A−', wires: wires(2), marks: ['A+', 'A−'] }];
      motorLeads = leadNames();
      tail.push(terms(motorLeads));
      break;
    default: // dc-armature-resistance
      tail = [
        {
          kind: 'dc-starter',
          device: d('DCS'),
          label: s.starter.reversingContactors ? 'AF / AR, resistors, OL' : 'A, resistors, OL',
          wires: wires(),
          marks: ['A+', 'A−'],
        },
      ];
      motorLeads = leadNames();
      tail.push(terms(motorLeads));
      break;
  }
  if (s.dc) {
    if (s.dc.field !== 'series') {
      motorLeads = [...motorLeads, 'F1', 'F2'];
      const last = [...tail].reverse().find((x) => x.kind === 'terminals');
      if (last) last.marks = [...(last.marks ?? []), 'F1', 'F2'];
      extras.push(
        `Shunt field F1–F2 fed from the ${t === 'dc-drive' ? 'drive’s field supply' : 'field supply'}${s.dc.fieldLossProtection ? ', through the field-loss relay FL' : ''}.`,
      );
    }
    if (s.dc.dynamicBraking) dev(d('DB'), 'Dynamic braking resistor');
    if (t === 'dc-armature-resistance' && s.starter.reversingContactors)
      extras.push('Reversing contactors AF / AR: check that the DC starter provides them; the bill of materials lists the starter only.');
    if (s.dc.dynamicBraking)
      extras.push(
        `Dynamic braking: resistor ${d('DB')} across the armature through a normally closed armature contact (closes when the armature contactor opens).`,
      );
    if (s.dc.field === 'series' || s.dc.field === 'compound') extras.push('Never run a DC series motor unloaded: it runs away.');
  }
  // wire numbers through the terminal strip to the motor: a wire keeps its number through terminals
  const feed = (bands: PowerBand[], from: string[]) => {
    let cur = from;
    for (const band of bands) {
      if (band.kind === 'terminals') band.wires = cur.slice(0, band.marks?.length ?? cur.length);
      else if (band.kind === 'star' || band.kind === 'pmr') band.wires = band.wires.length ? band.wires : [];
      else cur = band.wires.length ? band.wires : cur;
    }
    return cur;
  };
  const afterHead = feed(head, inLines);
  if (split) {
    feed(split.left.bands, afterHead);
    feed(split.right.bands, afterHead);
    if (split.rejoin) feed(tail, split.left.bands[split.left.bands.length - 1]!.wires);
  } else {
    const out = feed(tail, afterHead);
    const tb = tail.find((x) => x.kind === 'terminals');
    if (tb && s.dc && s.dc.field !== 'series') tb.wires = [...out.slice(0, 2), nextWire(), nextWire()];
  }
  return {
    lines: inLines,
    head,
    split,
    tail,
    motorLeads,
    extras,
    motorLabel: `${s.tag} ${s.hp !== null ? `${s.hp} hp` : ''} ${s.volts} V`.trim(),
  };
}
