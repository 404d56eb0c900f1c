// The terminal plan of a panel: every terminal block of the bill of materials (one source for the count),
// the bucket's field points landed on its strip in order, spares after them. Pure TypeScript.
import type { BomLine } from '../schemas/catalogue';
import { PANEL_BUCKET } from '../schemas/catalogue';
import type { TerminalRow } from './panel-drawings-model';
import type { BucketSchematic, FieldPoint } from './schematic-model';

const isGround = (l: BomLine) => /ground/i.test(`${l.description} ${l.requiredRatings ?? ''}`);

export function terminalPlan(
  bom: readonly BomLine[],
  buckets: readonly BucketSchematic[],
  byBucket: Map<string, BomLine[]>,
  warnings: string[],
): { terminals: TerminalRow[]; bomTerminalBlocks: number } {
  const terminals: TerminalRow[] = [];
  let bomTerminalBlocks = 0;
  for (const l of bom) if (l.category === 'terminal-block') bomTerminalBlocks += l.quantity;
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
  terminals.push(...spareTerminals(bom, buckets));
  return { terminals, bomTerminalBlocks };
}

/** terminal blocks on lines of the bill of materials outside the buckets: spares on TB0 */
function spareTerminals(bom: readonly BomLine[], buckets: readonly BucketSchematic[]): TerminalRow[] {
  const terminals: TerminalRow[] = [];
  const extra = bom.filter((l) => l.category === 'terminal-block' && !buckets.some((b) => b.tag === l.bucket));
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
  return terminals;
}

/** the terminal number a motor lead's wire lands on */
export function terminalNumber(terminals: readonly TerminalRow[], tag: string, wire: string): string {
  const t = terminals.find((x) => x.bucket === tag && x.wire === wire && x.group === 'motor');
  return t ? String(t.number) : '?';
}
