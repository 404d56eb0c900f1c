// What a bucket takes of the enclosure: the back-panel footprint of its power devices and the depth they
// need, from the common-practice allowances of shared/standards/panel-layout.ts.
import type { LoadSelection } from '../../schemas/selection';
import {
  BRANCH_DEVICE_AREA_BY_AMPS,
  CONTACTOR_AREA_BY_AMPS,
  CONTACTOR_AREA_BY_NEMA_SIZE,
  DC_DRIVE_AREA_BY_AMPS,
  DC_STARTER_AREA_MM2,
  ENCLOSURE_DEPTH,
  OUTPUT_FILTER_AREA_BY_AMPS,
  SOFT_STARTER_AREA_BY_AMPS,
  stepValue,
  VFD_AREA_BY_AMPS,
} from '../../standards/panel-layout';
import { contactorCount } from './control-scheme';

/** One contactor with its overload, by NEMA size where given, else by its IEC current (or the motor's FLC). */
function contactorAreaMm2(s: LoadSelection): number {
  const bySize = s.starter.nemaSize ? CONTACTOR_AREA_BY_NEMA_SIZE[s.starter.nemaSize] : undefined;
  return bySize ?? stepValue(CONTACTOR_AREA_BY_AMPS, s.starter.iecAmps ?? s.flcAmps);
}

/** Back-panel footprint of a bucket's power devices, mm² (common practice estimate, documented in catalog/README.md). */
export function bucketFootprintMm2(s: LoadSelection): number {
  const type = s.starter.type;
  let area = 0;
  const contactors = contactorCount(type);
  if (contactors > 0) area += contactors * contactorAreaMm2(s);
  if (type === 'VFD') {
    const amps = s.vfd?.minOutputAmps ?? s.flcAmps;
    area += stepValue(VFD_AREA_BY_AMPS, amps);
    if (s.vfd && s.vfd.outputFilter !== 'none') area += stepValue(OUTPUT_FILTER_AREA_BY_AMPS, amps);
  }
  if (type === 'RVSS') area += stepValue(SOFT_STARTER_AREA_BY_AMPS, s.softStarter?.minAmps ?? s.flcAmps);
  if (type === 'dc-drive') area += stepValue(DC_DRIVE_AREA_BY_AMPS, s.flcAmps);
  if (type === 'dc-armature-resistance') area += DC_STARTER_AREA_MM2;
  area += stepValue(BRANCH_DEVICE_AREA_BY_AMPS, s.scpd.ratingAmps);
  return area;
}

/** The enclosure depth a bucket's devices need, mm. */
export function bucketMinDepthMm(s: LoadSelection): number {
  const type = s.starter.type;
  const amps = type === 'VFD' ? (s.vfd?.minOutputAmps ?? s.flcAmps) : type === 'RVSS' ? (s.softStarter?.minAmps ?? s.flcAmps) : s.flcAmps;
  if (type === 'VFD' || type === 'RVSS' || type === 'dc-drive') return stepValue(ENCLOSURE_DEPTH.electronicByAmps, amps);
  if (s.starter.nemaSize && ENCLOSURE_DEPTH.largeContactorNemaSizes.includes(s.starter.nemaSize)) return ENCLOSURE_DEPTH.largeContactorMm;
  return ENCLOSURE_DEPTH.minMm;
}
