// The drawings of one panel from its stored selections and its bill of materials: a control schematic
// per bucket (rung numbers continuous on the panel, wire numbers unique on the panel), the terminal plan
// (every terminal block of the bill of materials, one source for the count) and the wire list.
// Pure TypeScript.
import type { BomLine } from '../schemas/catalogue';
import { COLOUR_PRACTICE, buildBucketSchematic, type BucketSchematic } from './schematic';
import {
  SHOP_FALLBACK,
  SYMBOL_STANDARD,
  type PanelDrawingInput,
  type PanelDrawings,
  type SheetRef,
  type WireRow,
} from './panel-drawings-model';
import { terminalPlan } from './terminal-plan';
import { bucketControlWires, bucketPowerWires, supplyWires } from './wire-list';

export {
  type DrawingBucketInput,
  type DrawingsView,
  type LayoutSummary,
  type PanelDrawingInput,
  type PanelDrawings,
  SHOP_FALLBACK,
  type SheetRef,
  type SubmittalDrawings,
  SYMBOL_STANDARD,
  type TerminalRow,
  type WireRow,
} from './panel-drawings-model';
import { drawingNumber as schemeNumber } from '../schemas/settings';
export { TERMINAL_COLUMNS, terminalRowsFor, toCsv, WIRE_COLUMNS, wireRowsFor } from './drawing-tables';
export { wireNumberUse } from './wire-list';

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

export function buildPanelDrawings(input: PanelDrawingInput): PanelDrawings {
  const warnings: string[] = [];
  const byBucket = new Map<string, BomLine[]>();
  for (const l of input.bom) {
    const list = byBucket.get(l.bucket) ?? [];
    list.push(l);
    byBucket.set(l.bucket, list);
  }
  const scheme = input.numberScheme;
  const parts = (sheet: number) => ({ job: input.jobNumber, panel: input.panelName, rev: scheme?.revisionCode ?? 'D', sheet });
  // the set's number: the scheme without its sheet part ("{job}-{panel}-{sheet:2}" → "J-2041-MCC-1")
  const number = scheme
    ? schemeNumber(scheme.scheme.replace(/[-_./ ]?\{sheet(:\d)?\}/, ''), parts(1))
    : drawingNumber(input.jobNumber, input.panelName);
  const sheetNumber = (n: number) => (scheme ? schemeNumber(scheme.scheme, parts(n)) : `${number}-${String(n).padStart(2, '0')}`);
  const buckets: BucketSchematic[] = [];
  let rung = 1;
  input.buckets.forEach((bi, i) => {
    const sch = buildBucketSchematic(
      {
        index: i + 1,
        selection: bi.selection,
        bom: byBucket.get(bi.selection.tag) ?? [],
        card: bi.card,
        jogging: bi.jogging,
        ...(bi.sharedDrive ? { sharedDrive: bi.sharedDrive } : {}),
        ...(bi.branchGroup ? { branchGroup: bi.branchGroup } : {}),
      },
      rung,
    );
    rung = Math.ceil((rung + sch.layout.rows) / 10) * 10 + 1;
    buckets.push(sch);
  });

  // ------------------------------------------------------------ terminal plan: the BOM's terminal blocks
  const { terminals, bomTerminalBlocks } = terminalPlan(input.bom, buckets, byBucket, warnings);

  // ------------------------------------------------------------ wire list
  const wires: WireRow[] = [];
  const sheetOf = (i: number) => sheetNumber(i + 2);
  const supplySheet = sheetNumber(1);
  wires.push(...supplyWires(input.supply.phases, supplySheet));
  buckets.forEach((sch, i) => {
    const sheet = sheetOf(i);
    bucketPowerWires(wires, sch, input.buckets[i]!.selection, terminals, sheet);
    bucketControlWires(wires, sch, terminals, sheet);
  });

  const sheets: SheetRef[] = [
    { number: supplySheet, title: 'Supply, main disconnect and control power', kind: 'supply' },
    ...buckets.map((b, i) => ({
      number: sheetOf(i),
      title: `${b.tag} control schematic — ${b.starter}`,
      kind: 'schematic' as const,
      tag: b.tag,
    })),
    { number: sheetNumber(buckets.length + 2), title: 'Backplate layout', kind: 'layout' },
    { number: sheetNumber(buckets.length + 3), title: 'Terminal plan', kind: 'terminals' },
    { number: sheetNumber(buckets.length + 4), title: 'Wire list', kind: 'wires' },
    { number: sheetNumber(buckets.length + 5), title: 'Panel marking (nameplate)', kind: 'nameplate' },
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
    layout: input.layout ?? null,
  };
}
