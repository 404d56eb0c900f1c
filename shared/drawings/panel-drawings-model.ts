// The drawings of one panel as data: its input, the terminal plan and wire list rows, the sheet list, and
// the views the API and the submittal take from them. Pure TypeScript.
import type { BomLine } from '../schemas/catalogue';
import type { BackplateLayout } from '../calc/layout/backplate';
import type { UnplacedPart } from '../calc/layout/layout-units';
import type { LoadSelection } from '../schemas/selection';
import type { ConnectionCard } from '../calc/connections';
import type { BranchGroupDevice, BucketSchematic, FieldPoint } from './schematic-model';

export interface DrawingBucketInput {
  selection: LoadSelection;
  card: ConnectionCard | null;
  jogging: boolean;
  /** the tag of the shared drive that feeds the motor (absent: its own controller) */
  sharedDrive?: string;
  /** the 430.53 group whose device protects the motor's branch (absent: its own device) */
  branchGroup?: BranchGroupDevice;
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
  /** the shop's drawing-number scheme (shop settings, e.g. `{job}-{panel}-{sheet:2}`) and the revision's code
   *  ("R1", or "D" for a draft): the sheets then carry the same numbers as the submittal's pages do */
  numberScheme?: { scheme: string; revisionCode: string };
  /** the backplate layout of the bill of materials (shared/calc/layout/backplate.ts); absent: not drawn */
  layout?: BackplateLayout | null;
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
  kind: 'supply' | 'schematic' | 'layout' | 'terminals' | 'wires' | 'nameplate';
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
  layout: BackplateLayout | null;
}

/** What the drawings page shows of the backplate layout beside its sheet. */
export interface LayoutSummary {
  enclosure: { code: string; description: string; heightMm: number; widthMm: number; depthMm: number } | null;
  sections: number;
  placedCount: number;
  unplaced: UnplacedPart[];
}

export const SYMBOL_STANDARD = 'Symbols: IEEE 315 / NEMA ICS 19 (ladder diagram, US practice)';
export const SHOP_FALLBACK = '[Shop name]';

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
  layout: LayoutSummary | null;
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
  /** the backplate layout sheet (null where the panel has no layout to draw) */
  layoutSvg?: string | null;
  terminals: TerminalRow[];
  bomTerminalBlocks: number;
  colourPractice: string;
  nameplateSvg: string | null;
}
