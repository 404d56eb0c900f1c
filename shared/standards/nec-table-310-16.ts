// NEC 2023 Table 310.16, Ampacities of Insulated Conductors with Not More Than Three
// Current-Carrying Conductors in Raceway, Cable, or Earth (Directly Buried), Based on Ambient
// Temperature of 30 °C (86 °F). Copper and aluminum (or copper-clad aluminum), 60/75/90 °C columns,
// 14 AWG (Cu) / 12 AWG (Al) to 1000 kcmil. Same numbering and values in NEC 2020.
// Also NEC 2023 240.4(D) small-conductor overcurrent limits (not applied to motor circuits:
// 240.4(G) sends motor branch and feeder conductors to Article 430).
// Values transcribed from memory of the published table.

import { OutsideTableError } from '../errors';

export const TABLE_310_16 = 'Table 310.16';

export type ConductorMaterial = 'cu' | 'al';
export type TempRating = 60 | 75 | 90;

/** Sizes in ascending order. */
export const SIZES = [
  '14 AWG',
  '12 AWG',
  '10 AWG',
  '8 AWG',
  '6 AWG',
  '4 AWG',
  '3 AWG',
  '2 AWG',
  '1 AWG',
  '1/0 AWG',
  '2/0 AWG',
  '3/0 AWG',
  '4/0 AWG',
  '250 kcmil',
  '300 kcmil',
  '350 kcmil',
  '400 kcmil',
  '500 kcmil',
  '600 kcmil',
  '700 kcmil',
  '750 kcmil',
  '800 kcmil',
  '900 kcmil',
  '1000 kcmil',
] as const;
export type ConductorSize = (typeof SIZES)[number];

type Triple = readonly [c60: number, c75: number, c90: number];

const CU: Record<ConductorSize, Triple> = {
  '14 AWG': [15, 20, 25],
  '12 AWG': [20, 25, 30],
  '10 AWG': [30, 35, 40],
  '8 AWG': [40, 50, 55],
  '6 AWG': [55, 65, 75],
  '4 AWG': [70, 85, 95],
  '3 AWG': [85, 100, 115],
  '2 AWG': [95, 115, 130],
  '1 AWG': [110, 130, 145],
  '1/0 AWG': [125, 150, 170],
  '2/0 AWG': [145, 175, 195],
  '3/0 AWG': [165, 200, 225],
  '4/0 AWG': [195, 230, 260],
  '250 kcmil': [215, 255, 290],
  '300 kcmil': [240, 285, 320],
  '350 kcmil': [260, 310, 350],
  '400 kcmil': [280, 335, 380],
  '500 kcmil': [320, 380, 430],
  '600 kcmil': [350, 420, 475],
  '700 kcmil': [385, 460, 520],
  '750 kcmil': [400, 475, 535],
  '800 kcmil': [410, 490, 555],
  '900 kcmil': [435, 520, 585],
  '1000 kcmil': [455, 545, 615],
};

const AL: Partial<Record<ConductorSize, Triple>> = {
  '12 AWG': [15, 20, 25],
  '10 AWG': [25, 30, 35],
  '8 AWG': [35, 40, 45],
  '6 AWG': [40, 50, 55],
  '4 AWG': [55, 65, 75],
  '3 AWG': [65, 75, 85],
  '2 AWG': [75, 90, 100],
  '1 AWG': [85, 100, 115],
  '1/0 AWG': [100, 120, 135],
  '2/0 AWG': [115, 135, 150],
  '3/0 AWG': [130, 155, 175],
  '4/0 AWG': [150, 180, 205],
  '250 kcmil': [170, 205, 230],
  '300 kcmil': [195, 230, 260],
  '350 kcmil': [210, 250, 280],
  '400 kcmil': [225, 270, 305],
  '500 kcmil': [260, 310, 350],
  '600 kcmil': [285, 340, 385],
  '700 kcmil': [315, 375, 425],
  '750 kcmil': [320, 385, 435],
  '800 kcmil': [330, 395, 445],
  '900 kcmil': [355, 425, 480],
  '1000 kcmil': [375, 445, 500],
};

function col(t: TempRating): 0 | 1 | 2 {
  return t === 60 ? 0 : t === 75 ? 1 : 2;
}

/** Sizes the table lists for a material, ascending. */
export function sizesFor(material: ConductorMaterial): ConductorSize[] {
  return SIZES.filter((s) => (material === 'cu' ? CU[s] : AL[s]) !== undefined);
}

export function ampacity310_16(size: string, material: ConductorMaterial, temp: TempRating): number {
  const table = material === 'cu' ? CU : AL;
  const row = (table as Record<string, Triple | undefined>)[size];
  if (!row) throw new OutsideTableError(TABLE_310_16, `${size} ${material === 'cu' ? 'copper' : 'aluminum'} is not in the table`);
  if (temp !== 60 && temp !== 75 && temp !== 90) throw new OutsideTableError(TABLE_310_16, `${temp} °C is not a column of the table`);
  return row[col(temp)];
}

/** 240.4(D): maximum overcurrent protection of small conductors (general circuits, not motor circuits). */
export function smallConductorOcpdLimit(size: string, material: ConductorMaterial): number | null {
  const cu: Record<string, number> = { '18 AWG': 7, '16 AWG': 10, '14 AWG': 15, '12 AWG': 20, '10 AWG': 30 };
  const al: Record<string, number> = { '12 AWG': 15, '10 AWG': 25 };
  return (material === 'cu' ? cu : al)[size] ?? null;
}
