// NEC Chapter 9 Table 8, Conductor Properties: direct-current resistance at 75 °C, ohms per 1000 ft,
// stranded uncoated copper and aluminum. Same values in NEC 2020 and 2023.
// Values transcribed from memory of the published table; check them against the edition in use.

import { OutsideTableError } from '../errors';
import type { ConductorMaterial } from './nec-table-310-16';

export const CHAPTER_9_TABLE_8 = 'Chapter 9 Table 8';

const CU: Record<string, number> = {
  '14 AWG': 3.07,
  '12 AWG': 1.93,
  '10 AWG': 1.21,
  '8 AWG': 0.764,
  '6 AWG': 0.491,
  '4 AWG': 0.308,
  '3 AWG': 0.245,
  '2 AWG': 0.194,
  '1 AWG': 0.154,
  '1/0 AWG': 0.122,
  '2/0 AWG': 0.0967,
  '3/0 AWG': 0.0766,
  '4/0 AWG': 0.0608,
  '250 kcmil': 0.0515,
  '300 kcmil': 0.0429,
  '350 kcmil': 0.0367,
  '400 kcmil': 0.0321,
  '500 kcmil': 0.0258,
  '600 kcmil': 0.0214,
  '700 kcmil': 0.0184,
  '750 kcmil': 0.0171,
  '800 kcmil': 0.0161,
  '900 kcmil': 0.0143,
  '1000 kcmil': 0.0129,
};

const AL: Record<string, number> = {
  '12 AWG': 3.18,
  '10 AWG': 2.0,
  '8 AWG': 1.26,
  '6 AWG': 0.808,
  '4 AWG': 0.508,
  '3 AWG': 0.403,
  '2 AWG': 0.319,
  '1 AWG': 0.253,
  '1/0 AWG': 0.201,
  '2/0 AWG': 0.159,
  '3/0 AWG': 0.126,
  '4/0 AWG': 0.1,
  '250 kcmil': 0.0847,
  '300 kcmil': 0.0707,
  '350 kcmil': 0.0605,
  '400 kcmil': 0.0529,
  '500 kcmil': 0.0424,
  '600 kcmil': 0.0353,
  '700 kcmil': 0.0303,
  '750 kcmil': 0.0282,
  '800 kcmil': 0.0265,
  '900 kcmil': 0.0235,
  '1000 kcmil': 0.0212,
};

/** DC resistance at 75 °C, Ω per 1000 ft, of one conductor. */
export function resistanceOhmsPerKft(size: string, material: ConductorMaterial): number {
  const r = (material === 'cu' ? CU : AL)[size];
  if (r === undefined)
    throw new OutsideTableError(CHAPTER_9_TABLE_8, `${size} ${material === 'cu' ? 'copper' : 'aluminum'} is not in the table`);
  return r;
}
