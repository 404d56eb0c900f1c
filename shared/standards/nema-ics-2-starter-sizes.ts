// NEMA ICS 2, horsepower ratings of magnetic controllers (full-voltage starters) by NEMA size:
// maximum horsepower at 60 Hz for normal starting duty and the lower ratings for plug-stop,
// plug-reverse or jogging duty, plus the continuous current rating of each size.
// Values transcribed from memory of the published ratings; sizes 7–9 carry no plugging/jogging
// ratings here. Single-phase ratings at 115 and 230 V; three-phase at 200, 230 and 460/575 V.

import { OutsideTableError } from '../errors';

export const NEMA_ICS_2 = 'NEMA ICS 2 horsepower ratings';

export type NemaColumn = '1ph-115' | '1ph-230' | '3ph-200' | '3ph-230' | '3ph-460-575';
export type NemaDuty = 'normal' | 'plugging-jogging';

interface SizeRow {
  size: string;
  continuousAmps: number;
  normal: Partial<Record<NemaColumn, number>>;
  pluggingJogging: Partial<Record<NemaColumn, number>>;
}

export const NEMA_SIZES: readonly SizeRow[] = [
  {
    size: '00',
    continuousAmps: 9,
    normal: { '1ph-115': 1 / 3, '1ph-230': 1, '3ph-200': 1.5, '3ph-230': 1.5, '3ph-460-575': 2 },
    pluggingJogging: {},
  },
  {
    size: '0',
    continuousAmps: 18,
    normal: { '1ph-115': 1, '1ph-230': 2, '3ph-200': 3, '3ph-230': 3, '3ph-460-575': 5 },
    pluggingJogging: { '1ph-115': 0.5, '1ph-230': 1, '3ph-200': 1.5, '3ph-230': 1.5, '3ph-460-575': 2 },
  },
  {
    size: '1',
    continuousAmps: 27,
    normal: { '1ph-115': 2, '1ph-230': 3, '3ph-200': 7.5, '3ph-230': 7.5, '3ph-460-575': 10 },
    pluggingJogging: { '1ph-115': 1, '1ph-230': 2, '3ph-200': 3, '3ph-230': 3, '3ph-460-575': 5 },
  },
  { size: '1P', continuousAmps: 36, normal: { '1ph-115': 3, '1ph-230': 5 }, pluggingJogging: {} },
  {
    size: '2',
    continuousAmps: 45,
    normal: { '1ph-115': 3, '1ph-230': 7.5, '3ph-200': 10, '3ph-230': 15, '3ph-460-575': 25 },
    pluggingJogging: { '1ph-115': 2, '1ph-230': 5, '3ph-200': 7.5, '3ph-230': 10, '3ph-460-575': 15 },
  },
  {
    size: '3',
    continuousAmps: 90,
    normal: { '1ph-115': 7.5, '1ph-230': 15, '3ph-200': 25, '3ph-230': 30, '3ph-460-575': 50 },
    pluggingJogging: { '3ph-200': 15, '3ph-230': 20, '3ph-460-575': 30 },
  },
  {
    size: '4',
    continuousAmps: 135,
    normal: { '3ph-200': 40, '3ph-230': 50, '3ph-460-575': 100 },
    pluggingJogging: { '3ph-200': 25, '3ph-230': 30, '3ph-460-575': 60 },
  },
  {
    size: '5',
    continuousAmps: 270,
    normal: { '3ph-200': 75, '3ph-230': 100, '3ph-460-575': 200 },
    pluggingJogging: { '3ph-200': 60, '3ph-230': 75, '3ph-460-575': 150 },
  },
  {
    size: '6',
    continuousAmps: 540,
    normal: { '3ph-200': 150, '3ph-230': 200, '3ph-460-575': 400 },
    pluggingJogging: { '3ph-200': 125, '3ph-230': 150, '3ph-460-575': 300 },
  },
  { size: '7', continuousAmps: 810, normal: { '3ph-230': 300, '3ph-460-575': 600 }, pluggingJogging: {} },
  { size: '8', continuousAmps: 1215, normal: { '3ph-230': 450, '3ph-460-575': 900 }, pluggingJogging: {} },
  { size: '9', continuousAmps: 2250, normal: { '3ph-230': 800, '3ph-460-575': 1600 }, pluggingJogging: {} },
];

/** Motor rated voltage -> ICS 2 column. 200–208 V three-phase uses the 200 V column. */
export function nemaColumn(phases: 1 | 3, volts: number): NemaColumn {
  if (phases === 1) {
    if (volts >= 110 && volts <= 120) return '1ph-115';
    if (volts >= 220 && volts <= 240) return '1ph-230';
  } else {
    if (volts >= 200 && volts <= 208) return '3ph-200';
    if (volts >= 220 && volts <= 240) return '3ph-230';
    if ((volts >= 440 && volts <= 480) || (volts >= 550 && volts <= 600)) return '3ph-460-575';
  }
  throw new OutsideTableError(NEMA_ICS_2, `no ${phases === 1 ? 'single' : 'three'}-phase rating column for ${volts} V`);
}

/** Smallest NEMA size whose hp rating at the column and duty covers hp and whose continuous rating covers amps. */
export function nemaSizeFor(
  hp: number,
  column: NemaColumn,
  duty: NemaDuty,
  amps: number,
): { size: string; continuousAmps: number; ratedHp: number } {
  for (const row of NEMA_SIZES) {
    const rated = (duty === 'normal' ? row.normal : row.pluggingJogging)[column];
    if (rated === undefined) continue;
    if (rated + 1e-9 >= hp && row.continuousAmps + 1e-9 >= amps)
      return { size: row.size, continuousAmps: row.continuousAmps, ratedHp: rated };
  }
  throw new OutsideTableError(NEMA_ICS_2, `no size rated for ${hp} hp at ${column} (${duty} duty)`);
}
