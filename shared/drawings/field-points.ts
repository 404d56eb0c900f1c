// The field points of a bucket (its terminal plan): motor leads, the frame ground, remote devices and the
// dry contacts and signals to the plant control system; and the device terminal marks they land on.
// Pure TypeScript.
import type { LoadSelection } from '../schemas/selection';
import type { Element, LadderLayout, PlacedElement } from './ladder';
import { COLOUR, type FieldPoint, type PowerCircuit } from './schematic-model';

export function fieldPointsOf(
  s: LoadSelection,
  power: PowerCircuit,
  layout: LadderLayout,
  order: readonly PlacedElement[],
  nodeWire: string[],
  controlSize: string,
): FieldPoint[] {
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
  return fieldPoints;
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
