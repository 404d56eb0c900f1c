// NEMA 250 enclosure types (non-hazardous and hazardous locations) with the approximate IP code
// of IEC 60529 that NEMA publishes for comparison. The comparison is one-way only: a NEMA type
// meets or exceeds the IP code, not the reverse, and Types 7 and 9 have no IP equivalent.
// IP equivalents written from memory of NEMA's comparison table.

import { OutsideTableError } from '../errors';

export const NEMA_250 = 'NEMA 250';

export interface EnclosureType {
  nemaType: string;
  use: string;
  ipCode: string;
}

export const ENCLOSURE_TYPES: readonly EnclosureType[] = [
  { nemaType: '1', use: 'indoor, general purpose', ipCode: 'IP10' },
  { nemaType: '2', use: 'indoor, dripping and light splashing', ipCode: 'IP11' },
  { nemaType: '3', use: 'outdoor, rain, sleet, windblown dust', ipCode: 'IP54' },
  { nemaType: '3R', use: 'outdoor, rain, sleet, ice', ipCode: 'IP14' },
  { nemaType: '3S', use: 'outdoor, rain, sleet, windblown dust, mechanisms operable when ice-laden', ipCode: 'IP54' },
  { nemaType: '4', use: 'indoor or outdoor, hose-directed water, windblown dust and rain', ipCode: 'IP66' },
  { nemaType: '4X', use: 'as Type 4 plus corrosion resistance', ipCode: 'IP66' },
  { nemaType: '5', use: 'indoor, settling dust, dripping non-corrosive liquids', ipCode: 'IP52' },
  { nemaType: '6', use: 'temporary submersion', ipCode: 'IP67' },
  { nemaType: '6P', use: 'prolonged submersion', ipCode: 'IP68' },
  { nemaType: '7', use: 'Class I, Division 1 hazardous locations (explosionproof)', ipCode: 'none (hazardous location)' },
  { nemaType: '9', use: 'Class II hazardous locations (dust-ignition-proof)', ipCode: 'none (hazardous location)' },
  { nemaType: '12', use: 'indoor, dust, dirt, dripping non-corrosive liquids', ipCode: 'IP52' },
  { nemaType: '12K', use: 'as Type 12, with knockouts', ipCode: 'IP52' },
  { nemaType: '13', use: 'indoor, dust, spraying water, oil and non-corrosive coolant', ipCode: 'IP54' },
];

export function enclosureType(nemaType: string): EnclosureType {
  const t = ENCLOSURE_TYPES.find((e) => e.nemaType === nemaType);
  if (!t) throw new OutsideTableError(NEMA_250, `Type "${nemaType}" is not a NEMA 250 enclosure type`);
  return t;
}
