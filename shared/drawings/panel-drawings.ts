// The drawings of one panel from its stored selections and its bill of materials: a control schematic
// per bucket (rung numbers continuous on the panel, wire numbers unique on the panel), the terminal plan
// (every terminal block of the bill of materials, one source for the count) and the wire list.
// Pure TypeScript.
import type { BomLine } from '../schemas/catalogue';
import { PANEL_BUCKET } from '../schemas/catalogue';
import type { LoadSelection } from '../schemas/selection';
import type { ConnectionCard } from '../calc/connections';
import {
  buildBucketSchematic,
  COLOUR,
  COLOUR_PRACTICE,
  deviceOf,
  terminalOf,
  type BucketSchematic,
  type FieldPoint,
  type PowerBand,
} from './schematic';

export interface DrawingBucketInput {
  selection: LoadSelection;
  card: ConnectionCard | null;
  jogging: boolean;
}

export interface PanelDrawingInput {
  jobNumber: string;
  jobName: string;
  panelName: string;
  revision: string;
  date: string;
  supply: { volts: number; phases: number; hz: number };
  controlVolts: number;
  buckets: DrawingBucketInput[];
  bom: readonly BomLine[];
  /** the shop's name for the title block (a placeholder until it is set) */
  shopName?: string;
}

export interface TerminalRow {
  strip: string;
  number: number;
  /** "TB3:4" */
  ref: string;
  block: 'feed-through' | 'ground';
  wire: string;
  purpose: string;
  group: FieldPoint['group'] | 'spare';
  panelSide: string;
  field: string;
  conductor: string;
  colour: string;
  /** false: the schematic needs it and the bill of materials does not hold it */
  inBom: boolean;
  bucket: string;
}

export interface WireRow {
  wire: string;
  from: string;
  to: string;
  conductor: string;
  colour: string;
  bucket: string;
  sheet: string;
}

export interface SheetRef {
  number: string;
  title: string;
  kind: 'supply' | 'schematic' | 'terminals' | 'wires' | 'nameplate';
  tag?: string;
}

export interface PanelDrawings {
  drawingNumber: string;
  title: { job: string; panel: string; revision: string; date: string; shop: string };
  supply: PanelDrawingInput['supply'];
  controlVolts: number;
  buckets: BucketSchematic[];
  terminals: TerminalRow[];
  wires: WireRow[];
  sheets: SheetRef[];
  warnings: string[];
  colourPractice: string;
  standard: string;
  /** terminal blocks in the bill of materials (sum of quantities) */
  bomTerminalBlocks: number;
}

export const SYMBOL_STANDARD = 'Symbols: IEEE 315 / NEMA ICS 19 (ladder diagram, US practice)';
export const SHOP_FALLBACK = '[Shop name]';

/** A drawing number from the job number and panel name: letters, digits and dashes. */
export function drawingNumber(jobNumber: string, panelName: string): string {
  const clean = (x: string) =>
    x
      .normalize('NFKD')
      .replace(/[^A-Za-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .toUpperCase();
  return `${clean(jobNumber) || 'JOB'}-${clean(panelName).slice(0, 24) || 'PANEL'}-E`;
}

const isGround = (l: BomLine) => /ground/i.test(`${l.description} ${l.requiredRatings ?? ''}`);

export function buildPanelDrawings(input: PanelDrawingInput): PanelDrawings {
  const warnings: string[] = [];
  const byBucket = new Map<string, BomLine[]>();
  for (const l of input.bom) {
    const list = byBucket.get(l.bucket) ?? [];
    list.push(l);
    byBucket.set(l.bucket, list);
  }
  const number = drawingNumber(input.jobNumber, input.panelName);
  const buckets: BucketSchematic[] = [];
  let rung = 1;
  input.buckets.forEach((bi, i) => {
    const sch = buildBucketSchematic(
      { index: i + 1, selection: bi.selection, bom: byBucket.get(bi.selection.tag) ?? [], card: bi.card, jogging: bi.jogging },
      rung,
    );
    rung = Math.ceil((rung + sch.layout.rows) / 10) * 10 + 1;
    buckets.push(sch);
  });

  // ------------------------------------------------------------ terminal plan: the BOM's terminal blocks
  const terminals: TerminalRow[] = [];
  let bomTerminalBlocks = 0;
  for (const l of input.bom) if (l.category === 'terminal-block') bomTerminalBlocks += l.quantity;
  for (const sch of buckets) {
    const strip = `TB${sch.index}`;
    const lines = (byBucket.get(sch.tag) ?? []).filter((l) => l.category === 'terminal-block');
    let ground = lines.filter(isGround).reduce((a, l) => a + l.quantity, 0);
    let feed = lines.filter((l) => !isGround(l)).reduce((a, l) => a + l.quantity, 0);
    let n = 0;
    const push = (p: FieldPoint | null, block: TerminalRow['block']) => {
      const inBom = block === 'ground' ? ground-- > 0 : feed-- > 0;
      n++;
      terminals.push({
        strip,
        number: n,
        ref: `${strip}:${n}`,
        block,
        wire: p?.wire ?? '',
        purpose: p?.purpose ?? 'Spare',
        group: p?.group ?? 'spare',
        panelSide: p?.panelSide ?? '',
        field: p?.field ?? '',
        conductor: p?.conductor ?? '',
        colour: p?.colour ?? '',
        inBom,
        bucket: sch.tag,
      });
    };
    for (const g of ['motor', 'ground', 'remote', 'plc'] as const)
      for (const p of sch.fieldPoints.filter((x) => x.group === g)) push(p, g === 'ground' ? 'ground' : 'feed-through');
    const short = terminals.filter((t) => t.bucket === sch.tag && !t.inBom).length;
    if (short > 0)
      warnings.push(
        `${sch.tag}: the schematic lands ${short} more field conductor${short === 1 ? '' : 's'} than the bill of materials has terminal blocks for; regenerate the bill of materials or add them.`,
      );
    while (feed > 0) push(null, 'feed-through');
    while (ground > 0) push(null, 'ground');
  }
  const extra = input.bom.filter((l) => l.category === 'terminal-block' && !buckets.some((b) => b.tag === l.bucket));
  for (const l of extra) {
    for (let k = 1; k <= l.quantity; k++) {
      terminals.push({
        strip: 'TB0',
        number: k,
        ref: `TB0:${k}`,
        block: isGround(l) ? 'ground' : 'feed-through',
        wire: '',
        purpose: `Spare (${l.bucket === PANEL_BUCKET ? 'panel' : l.bucket} line of the bill of materials)`,
        group: 'spare',
        panelSide: '',
        field: '',
        conductor: '',
        colour: '',
        inBom: true,
        bucket: l.bucket,
      });
    }
  }

  // ------------------------------------------------------------ wire list
  const wires: WireRow[] = [];
  const sheetOf = (i: number) => `${number}-${String(i + 2).padStart(2, '0')}`;
  const supplySheet = `${number}-01`;
  const phases = input.supply.phases === 1 ? ['L1', 'L2'] : ['L1', 'L2', 'L3'];
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
  buckets.forEach((sch, i) => {
    const sheet = sheetOf(i);
    const size = sch.power.lines.length ? input.buckets[i]!.selection.conductor.size : '';
    const leadSize = input.buckets[i]!.selection.conductor.motorLeads?.size ?? size;
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
  });

  const sheets: SheetRef[] = [
    { number: supplySheet, title: 'Supply, main disconnect and control power', kind: 'supply' },
    ...buckets.map((b, i) => ({
      number: sheetOf(i),
      title: `${b.tag} control schematic — ${b.starter}`,
      kind: 'schematic' as const,
      tag: b.tag,
    })),
    { number: `${number}-${String(buckets.length + 2).padStart(2, '0')}`, title: 'Terminal plan', kind: 'terminals' },
    { number: `${number}-${String(buckets.length + 3).padStart(2, '0')}`, title: 'Wire list', kind: 'wires' },
    { number: `${number}-${String(buckets.length + 4).padStart(2, '0')}`, title: 'Panel marking (nameplate)', kind: 'nameplate' },
  ];
  return {
    drawingNumber: number,
    title: {
      job: `${input.jobNumber} ${input.jobName}`.trim(),
      panel: input.panelName,
      revision: input.revision,
      date: input.date,
      shop: input.shopName?.trim() || SHOP_FALLBACK,
    },
    supply: input.supply,
    controlVolts: input.controlVolts,
    buckets,
    terminals,
    wires,
    sheets,
    warnings,
    colourPractice: COLOUR_PRACTICE,
    standard: SYMBOL_STANDARD,
    bomTerminalBlocks,
  };
}

function terminalNumber(terminals: TerminalRow[], tag: string, wire: string): string {
  const t = terminals.find((x) => x.bucket === tag && x.wire === wire && x.group === 'motor');
  return t ? String(t.number) : '?';
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

const csvCell = (v: unknown) => {
  const s = String(v ?? '');
  return /[",\n\r]/.test(s) || /^[=+\-@]/.test(s) ? `"${(/^[=+\-@]/.test(s) ? `'${s}` : s).replace(/"/g, '""')}"` : s;
};

export const TERMINAL_COLUMNS = [
  'terminal',
  'strip',
  'number',
  'block',
  'wire',
  'purpose',
  'group',
  'panel side',
  'field side',
  'conductor',
  'colour',
  'in bill of materials',
  'bucket',
] as const;
export const WIRE_COLUMNS = ['wire', 'from', 'to', 'conductor', 'colour', 'bucket', 'sheet'] as const;

export function terminalRowsFor(d: PanelDrawings): unknown[][] {
  return d.terminals.map((t) => [
    t.ref,
    t.strip,
    t.number,
    t.block,
    t.wire,
    t.purpose,
    t.group,
    t.panelSide,
    t.field,
    t.conductor,
    t.colour,
    t.inBom ? 'yes' : 'NO',
    t.bucket,
  ]);
}
export function wireRowsFor(d: PanelDrawings): unknown[][] {
  return d.wires.map((w) => [w.wire, w.from, w.to, w.conductor, w.colour, w.bucket, w.sheet]);
}

export function toCsv(header: readonly string[], rows: unknown[][]): string {
  return `${[header, ...rows].map((r) => r.map(csvCell).join(',')).join('\r\n')}\r\n`;
}

/** The answer of GET /api/panels/:panelId/drawings. */
export interface DrawingsView {
  drawingNumber: string;
  sheets: SheetRef[];
  standard: string;
  colourPractice: string;
  warnings: string[];
  bomTerminalBlocks: number;
  terminals: TerminalRow[];
  wires: WireRow[];
  buckets: Array<{
    tag: string;
    starter: string;
    scheme: string;
    firstRung: number;
    rungs: number;
    overload: string;
    interlocked: Array<[string, string]>;
  }>;
}

/** The drawing pages of a submittal: the SVG sheets, the terminal plan and the panel marking. */
export interface SubmittalDrawings {
  drawingNumber: string;
  /** SVG sheets in order: supply, then one per bucket */
  sheets: string[];
  terminals: TerminalRow[];
  bomTerminalBlocks: number;
  colourPractice: string;
  nameplateSvg: string | null;
}
