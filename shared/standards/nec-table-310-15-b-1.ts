// NEC 2023 Table 310.15(B)(1)(1), Ambient Temperature Correction Factors Based on 30 °C (86 °F)
// (NEC 2020: Table 310.15(B)(1)). Factors for 60/75/90 °C conductors. Transcribed from memory.

import { OutsideTableError } from '../errors';
import type { CodeEdition } from './code-edition';
import type { TempRating } from './nec-table-310-16';

export function table310_15B1(edition: CodeEdition): string {
  return edition === '2023' ? 'Table 310.15(B)(1)(1)' : 'Table 310.15(B)(1)';
}

// [upper bound of the ambient band °C, f60, f75, f90]; null = conductor not usable.
const BANDS: ReadonlyArray<readonly [number, number | null, number | null, number | null]> = [
  [10, 1.29, 1.2, 1.15],
  [15, 1.22, 1.15, 1.12],
  [20, 1.15, 1.11, 1.08],
  [25, 1.08, 1.05, 1.04],
  [30, 1.0, 1.0, 1.0],
  [35, 0.91, 0.94, 0.96],
  [40, 0.82, 0.88, 0.91],
  [45, 0.71, 0.82, 0.87],
  [50, 0.58, 0.75, 0.82],
  [55, 0.41, 0.67, 0.76],
  [60, null, 0.58, 0.71],
  [65, null, 0.47, 0.65],
  [70, null, 0.33, 0.58],
  [75, null, null, 0.5],
  [80, null, null, 0.41],
  [85, null, null, 0.29],
];

export function ambientCorrectionFactor(ambientC: number, temp: TempRating, edition: CodeEdition = '2023'): number {
  const band = BANDS.find((b) => ambientC <= b[0]);
  const f = band ? band[temp === 60 ? 1 : temp === 75 ? 2 : 3] : null;
  if (f === null || f === undefined) {
    throw new OutsideTableError(table310_15B1(edition), `no correction factor for ${temp} °C conductors at ${ambientC} °C ambient`);
  }
  return f;
}
