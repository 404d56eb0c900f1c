// The model of a bucket's drawing: its power circuit, ladder, cross-references and field points, and the
// conductor colours. Pure TypeScript.
import type { BomLine } from '../schemas/catalogue';
import type { LoadSelection } from '../schemas/selection';
import type { ConnectionCard } from '../calc/connections';
import type { Circuit, LadderLayout } from './ladder';

export type ControlScheme = 'three-wire' | 'two-wire' | 'hand-off-auto';

export interface BucketInput {
  /** bucket number on the panel, 1-based: the prefix of its devices, wires and terminal strip */
  index: number;
  selection: LoadSelection;
  /** the bucket's lines of the bill of materials */
  bom: readonly BomLine[];
  card: ConnectionCard | null;
  jogging: boolean;
  /** the tag of the shared drive that feeds the motor through its output contactor (absent: its own controller) */
  sharedDrive?: string;
  /** the 430.53 group whose one device protects this motor's branch (absent: the motor's own device) */
  branchGroup?: BranchGroupDevice;
}

/** A group's branch short-circuit and ground-fault protective device, as a grouped motor's power circuit draws it. */
export interface BranchGroupDevice {
  tag: string;
  type: 'inverse-time-breaker' | 'dual-element-fuse' | 'non-time-delay-fuse';
  ratingAmps: number;
  /** "430.53(B)" */
  clause: string;
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

export const hasLine = (bom: readonly BomLine[], category: string) => bom.some((l) => l.category === category && l.quantity > 0);

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
