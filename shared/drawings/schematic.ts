// A bucket's control schematic and power circuit, generated from its stored selection, its answers
// (control scheme, jogging) and its lines of the bill of materials. Reference designations and contact
// numbers as a US panel shop marks them (IEEE 315 / NEMA ICS 19 symbols; aux contacts 13-14 NO, 21-22 NC,
// overload trip 95-96, coil A1-A2: common practice). Pure TypeScript.
import { crossReferences } from './cross-references';
import { fieldPointsOf } from './field-points';
import { layoutLadder } from './ladder';
import { ladderKit, type LadderKit } from './ladder-kit';
import { fvnrLadder } from './ladder-contactor';
import { dcStarterLadder } from './ladder-dc';
import { controllerLadder } from './ladder-drive';
import { sharedDriveMemberLadder } from './ladder-shared-drive';
import { partWindingLadder, partWindingOverloads, wyeDeltaLadder } from './ladder-reduced-voltage';
import { reversingLadder } from './ladder-reversing';
import { powerCircuit } from './power-circuit';
import type { BucketInput, BucketSchematic } from './schematic-model';
import { numberLadderNodes } from './wire-numbers';

export { deviceOf, terminalOf } from './field-points';
export {
  type BucketInput,
  type BucketSchematic,
  COLOUR,
  COLOUR_PRACTICE,
  type ControlScheme,
  type CrossRef,
  type FieldPoint,
  type PowerBand,
  type PowerCircuit,
  type PowerColumn,
} from './schematic-model';

/** the control circuits of the bucket's starter family; returns the starter's name on the drawing */
function starterLadder(k: LadderKit): string {
  if (k.input.sharedDrive && k.t === 'VFD') return sharedDriveMemberLadder(k, k.input.sharedDrive);
  switch (k.t) {
    case 'FVNR':
      return fvnrLadder(k);
    case 'dc-armature-resistance':
      return dcStarterLadder(k);
    case 'RVSS':
    case 'VFD':
    case 'dc-drive':
      return controllerLadder(k);
    case 'FVR':
    case 'two-speed':
      return reversingLadder(k);
    case 'wye-delta':
      return wyeDeltaLadder(k);
    case 'part-winding':
      return partWindingLadder(k);
    default:
      return k.t;
  }
}

export function buildBucketSchematic(input: BucketInput, firstRung: number): BucketSchematic {
  const k = ladderKit(input);
  const { s, b, t, scheme, notes, circuits, devices, OL, d, dev } = k;
  const starterText = starterLadder(k);

  if (scheme === 'two-wire')
    notes.push(
      'Two-wire control restarts the motor when power returns: the engineer confirms that this is safe (NFPA 79 7.5, from memory).',
    );
  notes.push('Emergency stop: by the machine builder where the machine calls for one (NFPA 79 stop categories); not in this bucket.');

  if (t === 'part-winding' && OL) partWindingOverloads(k);

  // circuits between the rails first, then the isolated ones (dry contacts, drive inputs) below the rails' ends
  circuits.sort((a, z) => (a.ends === z.ends ? 0 : a.ends === 'rail' ? -1 : 1));
  const layout = layoutLadder(circuits);

  // ---------------------------------------------------------------- wire numbers
  // b01… for the power circuit, then the control nodes; the fused rail and X2 are named
  let seq = 0;
  const nextWire = () => String(b * 100 + ++seq);
  const power = powerCircuit(input, d, nextWire, dev);
  const { nodeWire, order } = numberLadderNodes(layout, nextWire);
  const controlSize = '14 AWG';
  const fieldPoints = fieldPointsOf(s, power, layout, order, nodeWire, controlSize);

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
    xrefs: crossReferences(layout, firstRung),
    fieldPoints,
    notes,
    devices,
    overload: k.overload,
    interlocked: k.interlocked,
    controlWireSize: controlSize,
  };
}
