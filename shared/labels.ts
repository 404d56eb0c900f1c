// Words for people: one table of labels for every key the product shows (answers, catalogue
// ratings, the rules' decisions and their values), so no raw key reaches a screen, an import
// preview or an error sentence. tests/unit/labels.test.ts walks every rule file's decision values
// and every catalogue rating key and fails on one without a label here.
//
// Trade terms stay as the trade writes them (FVNR, FVR, RVSS, VFD, AC-3, NEMA Type 4X …).

import type { LoadInput } from './schemas/load';
import type { DecisionKey } from './engine/decisions';
import type { STARTER_TYPES } from './engine/decisions';

type StarterType = (typeof STARTER_TYPES)[number];

/** The motor's answers (shared/schemas/load.ts), as the wizard and the import preview name them. */
export const ANSWER_LABELS: Record<keyof LoadInput, string> = {
  tag: 'Tag',
  description: 'Description',
  supply: 'Supply',
  hp: 'Horsepower',
  kw: 'Kilowatts',
  volts: 'Rated voltage',
  hz: 'Frequency',
  fla: 'Nameplate FLA',
  serviceFactor: 'Service factor',
  tempRiseC: 'Temperature rise',
  lockedRotorWithstandS: 'Locked-rotor withstand time',
  codeLetter: 'NEMA code letter',
  design: 'NEMA design',
  energyEfficient: 'Energy-efficient Design B',
  poles: 'Poles',
  rotor: 'Rotor',
  singlePhaseType: 'Single-phase type',
  fedFrom: 'Fed from',
  controlScheme: 'Control scheme',
  dcField: 'DC field',
  leads: 'Leads',
  connection: 'Winding connection',
  duty: 'Duty',
  jogging: 'Jogging',
  plugging: 'Plugging',
  reversing: 'Runs in both directions',
  speedControl: 'Speed',
  turndown: 'Turndown',
  torque: 'Load torque',
  startingLimit: 'Starting',
  inertia: 'Load inertia',
  reverseRotationHazard: 'Reverse-rotation hazard',
  critical: 'Critical load',
  environment: 'Environment',
  scpdType: 'Branch protective device',
  conductor: 'Conductors',
  cableLengthFt: 'Cable length to the motor',
  twoSpeed: 'Two-speed motor',
  starterPreference: 'Reduced-voltage method',
  insideDelta: 'Soft starter inside the delta',
  quickStop: 'Quick stops',
  driveInputAmps: 'Drive input current',
  sharedDrive: 'Shared drive',
  scpdOverride: 'Protective-device limit override',
  branchGroup: 'Branch-circuit group',
  groupListedMaxAmps: 'Group-installation listing, largest device',
};

/** Nested answers and the motor-list import's own column names. */
const NESTED_ANSWER_LABELS: Record<string, string> = {
  'conductor.material': 'Conductor material',
  'conductor.tempRatingC': 'Termination temperature',
  'scpdOverride.maxPercent': 'Override limit',
  'scpdOverride.reason': 'Override reason',
  conductorMaterial: 'Conductor material',
  conductorTempC: 'Termination temperature',
  scpdOverridePercent: 'Override limit',
  scpdOverrideReason: 'Override reason',
};

import { RATING_LABELS, RATING_UNITS } from './schemas/catalogue-items';

export { RATING_LABELS, RATING_UNITS };

/** Fields of the other forms (catalogue item, job, panel, people, combinations), for error sentences. */
const FORM_FIELD_LABELS: Record<string, string> = {
  code: 'Code',
  category: 'Category',
  unit: 'Unit',
  ratings: 'Ratings',
  sccrKa: 'SCCR',
  heatLossW: 'Heat loss',
  unitCost: 'Unit cost',
  labourHours: 'Labour adder',
  terminations: 'Terminations',
  leadTimeDays: 'Lead time',
  active: 'Active',
  number: 'Job number',
  name: 'Name',
  customer: 'Customer',
  site: 'Site',
  notes: 'Notes',
  email: 'E-mail',
  password: 'Password',
  roles: 'Roles',
  token: 'Invitation',
  componentCodes: 'Parts',
  parts: 'Parts',
  ratingKa: 'Rating',
  maxVolts: 'Maximum voltage',
  source: 'Source',
  justification: 'Justification',
  comment: 'Comment',
  body: 'Comment',
  version: 'Version',
  quantity: 'Quantity',
  markupPercent: 'Markup',
  labourRate: 'Labour rate',
  availableFaultKa: 'Available fault current',
  ambientC: 'Ambient temperature',
  phases: 'Phases',
  voltageUnbalancePercent: 'Voltage unbalance',
  mounting: 'Mounting',
  file: 'File',
};

/** The decisions a rule may set (shared/engine/decisions.ts). */
export const DECISION_LABELS: Record<DecisionKey, string> = {
  'starter.type': 'Starter type',
  'starter.reversingContactors': 'Reversing contactors',
  'starter.interlock': 'Interlock',
  'starter.nemaDuty': 'Contactor duty',
  'starter.iecCategory': 'IEC utilisation category',
  'overload.tripClass': 'Overload trip class',
  'overload.providedByDrive': 'Overload by the drive',
  'relays.phaseLoss': 'Phase-loss relay',
  'relays.phaseReversal': 'Phase-reversal relay',
  'relays.phaseLossByOverload': 'Phase loss by the overload',
  'enclosure.nemaType': 'Enclosure type',
  'enclosure.flagForEngineer': 'Enclosure for the engineer',
  'vfd.duty': 'Drive duty',
  'vfd.inverterDutyMotor': 'Inverter-duty motor',
  'vfd.outputFilter': 'Drive output filter',
  'softStarter.bypass': 'Soft starter bypass',
  'softStarter.insideDelta': 'Soft starter inside the delta',
  'dc.fieldLossProtection': 'Field-loss protection',
  'dc.dynamicBraking': 'Dynamic braking',
};

/** Starter types: the trade's letters where it has them, words otherwise. */
export const STARTER_TYPE_LABELS: Record<StarterType, string> = {
  FVNR: 'FVNR',
  FVR: 'FVR',
  RVSS: 'RVSS',
  VFD: 'VFD',
  'wye-delta': 'Wye-delta',
  'part-winding': 'Part-winding',
  'two-speed': 'Two-speed',
  'dc-armature-resistance': 'DC armature-resistance starter',
  'dc-drive': 'DC drive',
};

/** The text values of the rules' decisions, by decision. Booleans read yes/no, trip classes "class N". */
export const DECISION_VALUE_LABELS: Partial<Record<DecisionKey, Record<string, string>>> = {
  'starter.type': STARTER_TYPE_LABELS,
  'starter.nemaDuty': { normal: 'Normal duty', 'plugging-jogging': 'Plugging and jogging duty' },
  'starter.iecCategory': { 'AC-3': 'AC-3', 'AC-4': 'AC-4' },
  'vfd.duty': { normal: 'Normal duty', heavy: 'Heavy duty' },
  'vfd.outputFilter': { none: 'No output filter', 'dv-dt': 'dV/dt filter', 'sine-wave': 'Sine-wave filter' },
  'enclosure.nemaType': Object.fromEntries(
    ['1', '2', '3', '3R', '3S', '4', '4X', '5', '6', '6P', '7', '9', '12', '12K', '13'].map((t) => [t, `NEMA Type ${t}`]),
  ),
};

/** Words for the answers' own choices (supply, duty, protective device …), for lists and previews. */
export const ANSWER_VALUE_LABELS: Record<string, Record<string, string>> = {
  supply: { ac3: 'Three-phase AC', ac1: 'Single-phase AC', dc: 'DC' },
  scpdType: {
    'inverse-time-breaker': 'Inverse-time circuit breaker',
    'instantaneous-trip-breaker': 'Instantaneous-trip breaker',
    'dual-element-fuse': 'Dual-element time-delay fuse',
    'non-time-delay-fuse': 'Non-time-delay fuse',
  },
  environment: {
    'indoor-dry': 'Indoor, dry and clean',
    'indoor-dusty': 'Indoor, dust or dripping',
    outdoor: 'Outdoor',
    washdown: 'Washdown (hose-directed water)',
    corrosive: 'Corrosive',
    'class1-div1': 'Hazardous: Class I Division 1 (gas)',
    'class1-div2': 'Hazardous: Class I Division 2 (gas)',
    'class2-div1': 'Hazardous: Class II Division 1 (dust)',
    'class2-div2': 'Hazardous: Class II Division 2 (dust)',
  },
  dcField: { shunt: 'Shunt', series: 'Series', compound: 'Compound' },
  torque: { variable: 'Variable torque', constant: 'Constant torque' },
  codeLetter: { none: 'none' },
  controlScheme: {
    'three-wire': 'Three-wire: stop/start with seal-in',
    'two-wire': 'Two-wire: a maintained contact (restarts by itself)',
    'hand-off-auto': 'Hand-off-auto selector',
  },
  fedFrom: { panel: "The panel's own transformer or DC supply", external: 'A source outside the panel' },
};

/** Text ratings' values (kind, function) of the catalogue seed, in words. */
export const RATING_VALUE_LABELS: Record<string, string> = {
  'wall-mount': 'wall-mount',
  'free-standing': 'free-standing',
  thermal: 'thermal',
  electronic: 'electronic',
  iec: 'IEC',
  nema: 'NEMA',
  power: 'power',
  control: 'control',
  ground: 'ground',
  'feed-through': 'feed-through',
  front: 'front-mounted',
  'sine-wave': 'sine-wave filter',
  'dv-dt': 'dV/dt filter',
  'air-conditioner': 'air conditioner',
  'filter-fan': 'filter fan',
  'push-button': 'push-button',
  'pilot-light': 'pilot light',
  'selector-switch': 'selector switch',
  'run-light': 'run light',
  'fault-light': 'fault light',
  start: 'start',
  stop: 'stop',
  slow: 'slow',
  fast: 'fast',
  forward: 'forward',
  reverse: 'reverse',
  'hand-off-auto': 'hand-off-auto',
  'forward-off-reverse': 'forward-off-reverse',
  'single-phase': 'single-phase',
  'three-phase': 'three-phase',
};

/** A text rating's value in words; a value of the shop's own (not in the table) is shown as typed, hyphens as spaces. */
export function ratingValueLabel(value: string): string {
  return RATING_VALUE_LABELS[value] ?? value.replace(/-/g, ' ');
}

export function starterTypeLabel(type: string): string {
  return (STARTER_TYPE_LABELS as Record<string, string>)[type] ?? type;
}

/** A decision's value in words; undefined for a text value the table does not know (the test's catch). */
export function decisionValueLabel(key: DecisionKey, value: unknown): string | undefined {
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (key === 'overload.tripClass' && typeof value === 'number') return `class ${value}`;
  return DECISION_VALUE_LABELS[key]?.[String(value)];
}

/** A value of a selection's field (an override's "was" and "value", a change report's cell) in words. */
export function selectionValueLabel(field: string, value: unknown): string {
  if (value === null || value === undefined) return '—';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (field === 'starter.type') return starterTypeLabel(String(value));
  if (field === 'scpd.type') return answerValueLabel('scpdType', value);
  if (field === 'enclosure.nemaType') return `NEMA Type ${String(value)}`;
  if (field === 'overload.tripClass') return `class ${String(value)}`;
  return String(value);
}

/** An answer's value in words (the value itself when it is a number or has no entry). */
export function answerValueLabel(key: string, value: unknown): string {
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return ANSWER_VALUE_LABELS[key]?.[String(value)] ?? String(value);
}

/**
 * A field's label from its key or path ("hp", "answers.hp", "ratings.coilVolts", "loads[3].hp",
 * "conductor.tempRatingC"); undefined when no table has it.
 */
export function fieldLabel(path: string): string | undefined {
  const clean = path.replace(/\[\d+\]/g, '').replace(/^(body|query|params)\./, '');
  if (clean === '' || /^(body|query|params)$/.test(clean)) return undefined;
  const parts = clean.split('.');
  const one = (k: string) =>
    NESTED_ANSWER_LABELS[k] ??
    (ANSWER_LABELS as Record<string, string>)[k] ??
    (RATING_LABELS as Record<string, string>)[k] ??
    FORM_FIELD_LABELS[k];
  // the longest known tail first ("conductor.tempRatingC" before "tempRatingC"), then any known segment
  for (let i = 0; i < parts.length; i++) {
    const found = one(parts.slice(i).join('.'));
    if (found) return found;
  }
  for (let j = parts.length - 1; j >= 0; j--) {
    const found = one(parts[j]!);
    if (found) return found;
  }
  return undefined;
}
