// The power circuit of a bucket: the short-circuit protective device, the starter's contactors, overload
// relay, soft starter or drive, the terminal strip and the motor leads, with their wire numbers.
// Pure TypeScript.
import type { LoadSelection, StarterType } from '../schemas/selection';
import { type BucketInput, hasLine, type PowerBand, type PowerCircuit } from './schematic-model';

/** what the power circuit of each starter family draws with */
interface PowerKit {
  s: LoadSelection;
  t: StarterType;
  d: (name: string) => string;
  dev: (tag: string, description: string) => string;
  /** an overload relay in the bill of materials */
  relay: boolean;
  extras: string[];
  wires: (k?: number) => string[];
  ol: (name?: string) => PowerBand;
  contactor: (name: string, label: string) => PowerBand;
  terms: (marks: string[]) => PowerBand;
  /** the motor lead marks, from the connection card where there is one */
  leadNames: () => string[];
  /** the shared drive that feeds the motor through its output contactor */
  sharedDrive?: string;
}

type PowerPath = Pick<PowerCircuit, 'split' | 'tail' | 'motorLeads'>;

export function powerCircuit(
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
  // a motor on a shared drive has no protective device of its own: the drive's input device protects the circuit;
  // a grouped motor (430.53) taps the group's one device, drawn under the group's tag and listed with the group
  const head = input.sharedDrive
    ? []
    : input.branchGroup
      ? [groupDeviceBand(input.branchGroup, wires)]
      : protectionBands(input, d, dev, poles, wires);
  if (hasLine(input.bom, 'phase-monitor-relay')) head.push({ kind: 'pmr', device: d('PMR'), label: 'monitors', wires: [] });
  const ol = (name = 'OL'): PowerBand => ({ kind: 'ol', device: d(name), label: `class ${s.overload.tripClass}`, wires: wires() });
  const contactor = (name: string, label: string): PowerBand => ({ kind: 'contactor', device: d(name), label, wires: wires() });
  const terms = (marks: string[]): PowerBand => ({ kind: 'terminals', device: `TB${input.index}`, label: 'field', wires: [], marks });
  const kit: PowerKit = {
    s,
    t,
    d,
    dev,
    relay: hasLine(input.bom, 'overload-relay'),
    extras: [],
    wires,
    ol,
    contactor,
    terms,
    leadNames: () => leadNamesOf(input),
    ...(input.sharedDrive ? { sharedDrive: input.sharedDrive } : {}),
  };
  const path = starterPower(kit);
  const motorLeads = dcMotorCircuit(kit, path);
  numberThroughTerminals(s, head, inLines, path, nextWire);
  return {
    lines: inLines,
    head,
    split: path.split,
    tail: path.tail,
    motorLeads,
    extras: kit.extras,
    motorLabel: `${s.tag} ${s.hp !== null ? `${s.hp} hp` : ''} ${s.volts} V`.trim(),
  };
}

/** the short-circuit protective device (and the phase monitor relay across the lines) */
/** The group's device a grouped motor's tap comes from: not a part of the motor's bucket. */
function groupDeviceBand(g: NonNullable<BucketInput['branchGroup']>, wires: () => string[]): PowerBand {
  const kind = g.type === 'inverse-time-breaker' ? 'cb' : 'fuse';
  return {
    kind,
    device: `${g.tag}-${kind === 'cb' ? 'CB' : 'FU'}`,
    label: `group ${g.tag} ${g.ratingAmps} A, ${g.clause} (tap)`,
    wires: wires(),
  };
}

function protectionBands(
  input: BucketInput,
  d: (n: string) => string,
  dev: (tag: string, description: string) => string,
  poles: number,
  wires: () => string[],
): PowerBand[] {
  const s = input.selection;
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
  return head;
}

function leadNamesOf(input: BucketInput): string[] {
  const s = input.selection;
  const runGroups = input.card?.steps[input.card.steps.length - 1]?.lineGroups;
  if (s.supply === 'dc') return ['A1', s.dc?.field === 'series' || s.dc?.field === 'compound' ? 'S2' : 'A2'];
  if (runGroups) {
    const keys = (s.supply === 'ac3' ? ['L1', 'L2', 'L3'] : ['L1', 'L2']) as Array<keyof typeof runGroups>;
    return keys.map((k) => (runGroups[k] ?? []).join('+') || 'T?');
  }
  return s.supply === 'ac3' ? ['T1', 'T2', 'T3'] : ['T1', 'T4'];
}

function starterPower(k: PowerKit): PowerPath {
  switch (k.t) {
    case 'FVNR':
    case 'FVR':
    case 'two-speed':
      return contactorPower(k);
    case 'wye-delta':
    case 'part-winding':
      return reducedVoltagePower(k);
    default:
      return electronicPower(k);
  }
}

/** full-voltage starters: non-reversing, reversing, two-speed */
function contactorPower(k: PowerKit): PowerPath {
  const { s, t, d, relay, extras, ol, contactor, terms, leadNames } = k;
  if (t === 'FVNR') {
    const tail = [contactor('M', 'M'), ...(relay ? [ol()] : [])];
    const motorLeads = leadNames();
    tail.push(terms(motorLeads));
    return { split: null, tail, motorLeads };
  }
  let split: PowerCircuit['split'];
  let tail: PowerBand[] = [];
  let motorLeads: string[];
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
  return { split, tail, motorLeads };
}

/** wye-delta and part-winding: two contactor paths to two sets of motor leads */
function reducedVoltagePower(k: PowerKit): PowerPath {
  const { t, d, relay, extras, wires, ol, contactor, terms } = k;
  if (t === 'wye-delta') {
    const split: PowerCircuit['split'] = {
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
    const motorLeads = ['T1', 'T2', 'T3', 'T6', 'T4', 'T5'];
    extras.push(
      'Delta contactor D closes L1–T6, L2–T4, L3–T5; star contactor S joins T4-T5-T6 (NEMA MG 1 lead markings). The overload relay in the line leads carries FLA/√3 in the delta (set at the relay’s dial as the protection card says).',
    );
    return { split, tail: [], motorLeads };
  }
  const split: PowerCircuit['split'] = {
    left: { device: d('M1'), bands: [contactor('M1', 'M1'), ...(relay ? [ol('OL1')] : []), terms(['T1', 'T2', 'T3'])] },
    right: { device: d('M2'), bands: [contactor('M2', 'M2'), ...(relay ? [ol('OL2')] : []), terms(['T7', 'T8', 'T9'])] },
    rejoin: false,
    swap: false,
    interlock: false,
  };
  const motorLeads = ['T1', 'T2', 'T3', 'T7', 'T8', 'T9'];
  extras.push('Both contactors close in the same phase order; T4-T5-T6 joined in the motor box.');
  return { split, tail: [], motorLeads };
}

/** soft starter, drives and the DC armature-resistance starter */
function electronicPower(k: PowerKit): PowerPath {
  const { s, t, d, dev, relay, wires, ol, terms, leadNames } = k;
  const split = null;
  let tail: PowerBand[];
  let motorLeads: string[];
  switch (t) {
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
      return { split, tail, motorLeads };
    case 'VFD':
      if (k.sharedDrive) {
        // the shared drive's output, then this motor's output contactor and its own overload relay
        tail = [
          { kind: 'vfd', device: k.sharedDrive, label: 'shared drive output U V W', wires: wires(), marks: ['U', 'V', 'W'] },
          k.contactor('M', 'M'),
          ...(relay ? [ol()] : []),
        ];
        motorLeads = leadNames();
        tail.push(terms(motorLeads));
        return { split, tail, motorLeads };
      }
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
      return { split, tail, motorLeads };
    case 'dc-drive':
      tail = [{ kind: 'dc-drive', device: d('DCD'), label: 'AC in → A+ A−', wires: wires(2), marks: ['A+', 'A−'] }];
      motorLeads = leadNames();
      tail.push(terms(motorLeads));
      return { split, tail, motorLeads };
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
      return { split, tail, motorLeads };
  }
}

/** the DC motor's shunt field, dynamic braking and cautions; returns the motor leads with the field's */
function dcMotorCircuit(k: PowerKit, path: PowerPath): string[] {
  const { s, t, d, dev, extras } = k;
  const { tail } = path;
  let motorLeads = path.motorLeads;
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
  return motorLeads;
}

/** wire numbers through the terminal strip to the motor: a wire keeps its number through terminals */
function numberThroughTerminals(s: LoadSelection, head: PowerBand[], inLines: string[], path: PowerPath, nextWire: () => string): void {
  const { split, tail } = path;
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
}
