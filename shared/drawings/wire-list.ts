// The wire list of a panel: the supply and control power wiring, each bucket's power circuit from the
// distribution block to the motor terminals, and its control wiring node by node. Pure TypeScript.
import { PANEL_BUCKET } from '../schemas/catalogue';
import type { LoadSelection } from '../schemas/selection';
import type { PanelDrawings, TerminalRow, WireRow } from './panel-drawings-model';
import { deviceOf, terminalOf } from './field-points';
import { COLOUR, type BucketSchematic, type PowerBand } from './schematic-model';
import { terminalNumber } from './terminal-plan';

/** the supply's wires to the main device and distribution block, and the control power transformer's */
export function supplyWires(phaseCount: number, supplySheet: string): WireRow[] {
  const wires: WireRow[] = [];
  const phases = phaseCount === 1 ? ['L1', 'L2'] : ['L1', 'L2', 'L3'];
  phases.forEach((p, i) => {
    wires.push({
      wire: p,
      from: 'Supply (field, by others)',
      to: `MAIN:L${i + 1}`,
      conductor: 'feeder (see protection card)',
      colour: COLOUR.power,
      bucket: PANEL_BUCKET,
      sheet: supplySheet,
    });
    wires.push({
      wire: `1${p}`,
      from: `MAIN:T${i + 1}`,
      to: `PDB:${p}`,
      conductor: 'feeder',
      colour: COLOUR.power,
      bucket: PANEL_BUCKET,
      sheet: supplySheet,
    });
  });
  wires.push({
    wire: '11',
    from: 'PDB:L1',
    to: 'CPT-FU:1',
    conductor: '14 AWG',
    colour: COLOUR.power,
    bucket: PANEL_BUCKET,
    sheet: supplySheet,
  });
  wires.push({
    wire: '12',
    from: 'PDB:L2',
    to: 'CPT-FU:3',
    conductor: '14 AWG',
    colour: COLOUR.power,
    bucket: PANEL_BUCKET,
    sheet: supplySheet,
  });
  wires.push({
    wire: '13',
    from: 'CPT-FU:2',
    to: 'CPT:H1',
    conductor: '14 AWG',
    colour: COLOUR.power,
    bucket: PANEL_BUCKET,
    sheet: supplySheet,
  });
  wires.push({
    wire: '14',
    from: 'CPT-FU:4',
    to: 'CPT:H2',
    conductor: '14 AWG',
    colour: COLOUR.power,
    bucket: PANEL_BUCKET,
    sheet: supplySheet,
  });
  wires.push({
    wire: '15',
    from: 'CPT:X1',
    to: 'X1-FU:1',
    conductor: '14 AWG',
    colour: COLOUR.control,
    bucket: PANEL_BUCKET,
    sheet: supplySheet,
  });
  wires.push({
    wire: 'X1',
    from: 'X1-FU:2',
    to: 'control fuses of every bucket',
    conductor: '14 AWG',
    colour: COLOUR.control,
    bucket: PANEL_BUCKET,
    sheet: supplySheet,
  });
  wires.push({
    wire: 'X2',
    from: 'CPT:X2',
    to: 'X2 bus; bonded to the ground bar',
    conductor: '14 AWG',
    colour: COLOUR.grounded,
    bucket: PANEL_BUCKET,
    sheet: supplySheet,
  });
  return wires;
}

/** a bucket's power wiring, from the distribution block through its devices to the terminal strip */
export function bucketPowerWires(
  wires: WireRow[],
  sch: BucketSchematic,
  selection: LoadSelection,
  terminals: readonly TerminalRow[],
  sheet: string,
): void {
  const size = sch.power.lines.length ? selection.conductor.size : '';
  const leadSize = selection.conductor.motorLeads?.size ?? size;
  const chain = (bands: PowerBand[], start: { refs: string[]; wires: string[] }, sz: string) => {
    let { refs, wires: ws } = start;
    const row = (k: number, to: string) => {
      if (refs[k]) wires.push({ wire: ws[k] ?? '', from: refs[k]!, to, conductor: sz, colour: COLOUR.power, bucket: sch.tag, sheet });
    };
    for (const band of bands) {
      if (band.kind === 'pmr')
        refs.forEach((_, k) => {
          wires.push({
            wire: ws[k] ?? '',
            from: refs[k]!,
            to: `${band.device}:L${k + 1}`,
            conductor: '14 AWG',
            colour: COLOUR.power,
            bucket: sch.tag,
            sheet,
          });
        });
      else if (band.kind === 'terminals')
        (band.marks ?? []).forEach((_, k) => {
          row(k, `${band.device}:${terminalNumber(terminals, sch.tag, band.wires[k] ?? '')}`);
        });
      else if (band.kind === 'star')
        refs.forEach((_, k) => {
          row(k, `${band.device}:L${k + 1}`);
        });
      else {
        refs.forEach((_, k) => {
          row(k, `${band.device}:L${k + 1}`);
        });
        refs = band.wires.map((_, k) => `${band.device}:T${k + 1}`);
        ws = band.wires;
      }
    }
    return { refs, wires: ws };
  };
  const afterHead = chain(sch.power.head, { refs: sch.power.lines.map((l) => `PDB:${l}`), wires: sch.power.lines }, size);
  if (sch.power.split) {
    const sp = sch.power.split;
    const l = chain(sp.left.bands, afterHead, sp.rejoin ? size : leadSize);
    // reversing: the reverse contactor takes L1 and L3 (L1 and L2 single-phase) interchanged
    const sw = <T>(x: T[]) => (sp.swap ? [x[x.length - 1]!, ...x.slice(1, -1), x[0]!] : x);
    const r = chain(sp.right.bands, { refs: sw(afterHead.refs), wires: sw(afterHead.wires) }, sp.rejoin ? size : leadSize);
    if (sp.rejoin) {
      r.refs.forEach((ref, k) => {
        wires.push({ wire: l.wires[k] ?? '', from: ref, to: l.refs[k]!, conductor: size, colour: COLOUR.power, bucket: sch.tag, sheet });
      });
      chain(sch.power.tail, l, size);
    }
  } else chain(sch.power.tail, afterHead, size);
}

/** a bucket's control wiring: its control fuse to the rail, then every node's device terminals in order */
export function bucketControlWires(wires: WireRow[], sch: BucketSchematic, terminals: readonly TerminalRow[], sheet: string): void {
  // control: the bucket's control fuse feeds its rail
  wires.push({
    wire: 'X1',
    from: 'X1 bus',
    to: `${sch.index}CFU:1`,
    conductor: sch.controlWireSize,
    colour: COLOUR.control,
    bucket: sch.tag,
    sheet,
  });
  const nodes = new Map<number, string[]>();
  nodes.set(0, [`${sch.index}CFU:2`]);
  const order = [...sch.layout.elements].sort((a, z) => a.row - z.row || a.col - z.col);
  for (const e of order) {
    if (e.el.kind === 'terminal' || e.el.kind === 'field') continue;
    for (const side of ['left', 'right'] as const) {
      const node = side === 'left' ? e.left : e.right;
      const list = nodes.get(node) ?? [];
      list.push(`${deviceOf(e.el)}:${terminalOf(e.el, side)}`);
      nodes.set(node, list);
    }
  }
  for (const t of terminals.filter((x) => x.bucket === sch.tag && (x.group === 'remote' || x.group === 'plc'))) {
    const node = sch.nodeWire.indexOf(t.wire);
    if (node >= 0) nodes.get(node)?.push(t.ref);
  }
  const foreign = new Set<number>();
  for (const e of sch.layout.elements) if (e.el.kind === 'terminal' || e.el.kind === 'input') foreign.add(e.left).add(e.right);
  for (const [node, refs] of nodes) {
    const wire = sch.nodeWire[node]!;
    const colour = node === 1 ? COLOUR.grounded : foreign.has(node) ? COLOUR.foreign : COLOUR.control;
    const uniq = [...new Set(refs)];
    if (node === 1)
      for (const r of uniq) wires.push({ wire, from: r, to: 'X2 bus', conductor: sch.controlWireSize, colour, bucket: sch.tag, sheet });
    else
      for (let k = 1; k < uniq.length; k++)
        wires.push({
          wire,
          from: uniq[k - 1]!,
          to: uniq[k]!,
          conductor: /AI/.test(uniq[k]!) ? '18 AWG shielded pair' : sch.controlWireSize,
          colour,
          bucket: sch.tag,
          sheet,
        });
  }
}

/** Every wire number with the nodes it names: a number names exactly one node on the panel. */
export function wireNumberUse(d: PanelDrawings): Map<string, number> {
  const use = new Map<string, number>();
  for (const b of d.buckets) {
    const seen = new Set<string>();
    b.nodeWire.forEach((w, node) => {
      if (node === 1) return; // X2 is the panel's grounded rail, shared by design
      seen.add(w);
      use.set(w, (use.get(w) ?? 0) + 1);
    });
    const bands = [...b.power.head, ...b.power.tail, ...(b.power.split ? [...b.power.split.left.bands, ...b.power.split.right.bands] : [])];
    const power = new Set<string>();
    for (const band of bands) if (band.kind !== 'terminals') for (const w of band.wires) power.add(w);
    for (const w of power) use.set(w, (use.get(w) ?? 0) + 1);
  }
  return use;
}
