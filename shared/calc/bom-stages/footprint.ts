// What a bucket asks of the enclosure beyond the room its parts take on the backplate (shared/calc/layout
// lays those out): the depth its devices need, from the common-practice table of shared/standards/panel-layout.ts.
import type { LoadSelection } from '../../schemas/selection';
import { ENCLOSURE_DEPTH, stepValue } from '../../standards/panel-layout';

/** The enclosure depth a bucket's devices need, mm. */
export function bucketMinDepthMm(s: LoadSelection): number {
  const type = s.starter.type;
  const amps = type === 'VFD' ? (s.vfd?.minOutputAmps ?? s.flcAmps) : type === 'RVSS' ? (s.softStarter?.minAmps ?? s.flcAmps) : s.flcAmps;
  if (type === 'VFD' || type === 'RVSS' || type === 'dc-drive') return stepValue(ENCLOSURE_DEPTH.electronicByAmps, amps);
  if (s.starter.nemaSize && ENCLOSURE_DEPTH.largeContactorNemaSizes.includes(s.starter.nemaSize)) return ENCLOSURE_DEPTH.largeContactorMm;
  return ENCLOSURE_DEPTH.minMm;
}
