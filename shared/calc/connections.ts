// Motor lead connection cards by NEMA MG 1 lead markings (T-leads for AC, A/S/F for DC).

export type LineName = 'L1' | 'L2' | 'L3' | 'A+' | 'A-';

export interface ConnectionStep {
  /** e.g. "Run", "Start (wye)" */
  label: string;
  /** the line terminals and the leads under each, in order */
  lineGroups: Partial<Record<LineName, string[]>>;
  /** leads joined together (and insulated as a group) */
  joined: string[][];
  /** single leads taped / insulated on their own */
  insulated: string[];
}

export interface ConnectionCard {
  title: string;
  motor: 'three-phase' | 'single-phase' | 'dc';
  leads: number;
  connection: string;
  voltage: 'low' | 'high' | 'single';
  ratedVolts?: number;
  steps: ConnectionStep[];
  reverse: string;
  cautions: string[];
  basis: string;
  notes: string[];
}

export type ConnectionRequest =
  | { motor: 'three-phase'; leads: 9 | 12; winding: 'wye' | 'delta'; voltage: 'low' | 'high'; ratedVolts?: number }
  | { motor: 'three-phase'; leads: 9; winding: 'wye'; voltage: 'low'; method: 'part-winding'; ratedVolts?: number }
  | { motor: 'three-phase'; leads: 6; method: 'wye-delta'; ratedVolts?: number }
  | { motor: 'three-phase'; leads: 3; ratedVolts?: number }
  | { motor: 'single-phase'; leads: 8; voltage: 'low' | 'high'; ratedVolts?: number }
  | { motor: 'dc'; field: 'shunt' | 'series' | 'compound'; ratedVolts?: number };

const ROTATION = 'Check rotation before coupling the load.';
const LOCKOUT = 'De-energise and lock out before working on the leads.';
const MG1 = 'NEMA MG 1 lead markings';
const THREE_PHASE_REVERSE = 'Interchange any two line leads (L1 and L3 by habit).';

/** One connection step; lineGroups as given, nothing joined or insulated unless said. */
function step(label: string, lineGroups: ConnectionStep['lineGroups'], joined: string[][] = [], insulated: string[] = []): ConnectionStep {
  return { label, lineGroups, joined, insulated };
}

/** T1, T2, T3 alone on L1, L2, L3 */
const lineOneLeadEach = (): ConnectionStep['lineGroups'] => ({ L1: ['T1'], L2: ['T2'], L3: ['T3'] });

/** the winding halves in series: T4–T7, T5–T8, T6–T9 */
const seriesJoints = (): string[][] => [
  ['T4', 'T7'],
  ['T5', 'T8'],
  ['T6', 'T9'],
];

/** nine leads, high voltage: the same joints for wye and delta */
const NINE_HIGH = step('Run (high voltage, halves in series)', lineOneLeadEach(), seriesJoints());

const NINE: Record<'wye' | 'delta', Record<'low' | 'high', ConnectionStep>> = {
  wye: {
    low: step('Run (low voltage, halves in parallel)', { L1: ['T1', 'T7'], L2: ['T2', 'T8'], L3: ['T3', 'T9'] }, [['T4', 'T5', 'T6']]),
    high: NINE_HIGH,
  },
  delta: {
    low: step('Run (low voltage, halves in parallel)', { L1: ['T1', 'T6', 'T7'], L2: ['T2', 'T4', 'T8'], L3: ['T3', 'T5', 'T9'] }),
    high: NINE_HIGH,
  },
};

const TWELVE: Record<'wye' | 'delta', Record<'low' | 'high', ConnectionStep>> = {
  wye: {
    low: step('Run (low voltage, parallel wye)', { L1: ['T1', 'T7'], L2: ['T2', 'T8'], L3: ['T3', 'T9'] }, [
      ['T4', 'T5', 'T6'],
      ['T10', 'T11', 'T12'],
    ]),
    high: step('Run (high voltage, series wye)', lineOneLeadEach(), [...seriesJoints(), ['T10', 'T11', 'T12']]),
  },
  delta: {
    low: step('Run (low voltage, parallel delta)', {
      L1: ['T1', 'T6', 'T7', 'T12'],
      L2: ['T2', 'T4', 'T8', 'T10'],
      L3: ['T3', 'T5', 'T9', 'T11'],
    }),
    high: step('Run (high voltage, series delta)', { L1: ['T1', 'T12'], L2: ['T2', 'T10'], L3: ['T3', 'T11'] }, seriesJoints()),
  },
};

export function connectionCard(req: ConnectionRequest): ConnectionCard {
  const ratedVolts = req.ratedVolts;
  if (req.motor === 'three-phase') {
    if (req.leads === 3) {
      return {
        title: 'Three-phase, three leads',
        motor: 'three-phase',
        leads: 3,
        connection: 'single voltage',
        voltage: 'single',
        ratedVolts,
        steps: [step('Run', lineOneLeadEach())],
        reverse: THREE_PHASE_REVERSE,
        cautions: [ROTATION, LOCKOUT],
        basis: MG1,
        notes: [],
      };
    }
    if (req.leads === 6) {
      return {
        title: 'Three-phase, six leads, wye start / delta run',
        motor: 'three-phase',
        leads: 6,
        connection: 'wye-delta',
        voltage: 'single',
        ratedVolts,
        steps: [
          step('Start (wye)', lineOneLeadEach(), [['T4', 'T5', 'T6']]),
          step('Run (delta)', { L1: ['T1', 'T6'], L2: ['T2', 'T4'], L3: ['T3', 'T5'] }),
        ],
        reverse: `${THREE_PHASE_REVERSE} Swap the same two lines ahead of both the main and the delta contactor.`,
        cautions: [
          ROTATION,
          LOCKOUT,
          'The motor must be wound to run in delta at the supply voltage.',
          'Keep the phase order of the delta contactor as drawn: a wrong order short-circuits the winding at transition.',
        ],
        basis: MG1,
        notes: ['The starter makes the wye (start) and delta (run) joints; the motor box holds T1–T6 only.'],
      };
    }
    if ('method' in req && req.method === 'part-winding') {
      return {
        title: 'Three-phase, nine leads, wye, part-winding start (low voltage)',
        motor: 'three-phase',
        leads: 9,
        connection: 'part-winding',
        voltage: 'low',
        ratedVolts,
        steps: [
          step('Start (first winding)', lineOneLeadEach(), [['T4', 'T5', 'T6']], ['T7', 'T8', 'T9']),
          { ...NINE.wye.low, label: 'Run (both windings)' },
        ],
        reverse: `${THREE_PHASE_REVERSE} Swap the same two lines for both windings.`,
        cautions: [ROTATION, LOCKOUT, 'Both contactors must close in the same phase order.'],
        basis: MG1,
        notes: ['T7, T8, T9 are live through the second contactor, not insulated in service.'],
      };
    }
    const table = req.leads === 9 ? NINE : TWELVE;
    const run = table[req.winding][req.voltage];
    const insulatedNote =
      req.voltage === 'low' ? 'Low voltage puts the winding halves in parallel.' : 'High voltage puts the winding halves in series.';
    return {
      title: `Three-phase, ${req.leads} leads, ${req.winding}, ${req.voltage} voltage`,
      motor: 'three-phase',
      leads: req.leads,
      connection: req.winding,
      voltage: req.voltage,
      ratedVolts,
      steps: [run],
      reverse: THREE_PHASE_REVERSE,
      cautions: [ROTATION, LOCKOUT],
      basis: MG1,
      notes: [insulatedNote],
    };
  }

  if (req.motor === 'single-phase') {
    // Counter-clockwise rotation facing the end opposite the drive (from memory: check the motor's own diagram).
    const run =
      req.voltage === 'low'
        ? step('Run (low voltage, run halves in parallel)', { L1: ['T1', 'T3', 'T8'], L2: ['T2', 'T4', 'T5'] })
        : step('Run (high voltage, run halves in series)', { L1: ['T1'], L2: ['T4', 'T5'] }, [['T2', 'T3', 'T8']]);
    return {
      title: `Single-phase dual voltage, ${req.voltage} voltage`,
      motor: 'single-phase',
      leads: 8,
      connection: 'dual voltage',
      voltage: req.voltage,
      ratedVolts,
      steps: [run],
      reverse: 'Interchange T5 and T8 (the start winding); never reverse both windings.',
      cautions: [ROTATION, LOCKOUT],
      basis: MG1,
      notes: [
        'Run-winding halves T1–T2 and T3–T4; start winding T5–T8 across one half.',
        'Rotation as drawn: counter-clockwise facing the end opposite the drive (from memory: check the motor’s diagram).',
      ],
    };
  }

  // DC
  const field = req.field;
  const steps: Record<typeof field, ConnectionStep> = {
    shunt: step('Run (shunt)', { 'A+': ['A1', 'F1'], 'A-': ['A2', 'F2'] }),
    series: step('Run (series)', { 'A+': ['A1'], 'A-': ['S2'] }, [['A2', 'S1']]),
    compound: step('Run (cumulative compound)', { 'A+': ['A1', 'F1'], 'A-': ['S2', 'F2'] }, [['A2', 'S1']]),
  };
  const cautions = [ROTATION, LOCKOUT];
  if (field === 'series' || field === 'compound') cautions.push('Never run a DC series motor unloaded: it runs away.');
  if (field === 'shunt' || field === 'compound') cautions.push('Provide field-loss protection: the motor overspeeds on loss of field.');
  return {
    title: `DC ${field} motor`,
    motor: 'dc',
    leads: field === 'compound' ? 6 : 4,
    connection: field,
    voltage: 'single',
    ratedVolts,
    steps: [steps[field]],
    reverse: 'Reverse the armature current: interchange A1 and A2. Never reverse both the armature and the field.',
    cautions,
    basis: MG1,
    notes: [
      'Armature A1–A2, series field S1–S2, shunt field F1–F2.',
      'Polarity as drawn: counter-clockwise facing the end opposite the drive (from memory: check the motor’s diagram).',
    ],
  };
}
