// The one-line of a bucket as a list of elements, supply to motor: drawn on screen (SVG) and in the
// submittal (PDF vector drawing) from the same list.
import type { LoadSelection } from '../schemas/selection';
import { relayWiringText } from './overload';
import { SCPD_WORDS } from './scpd';

export type OneLineKind =
  | 'bus'
  | 'disconnect'
  | 'fuse'
  | 'breaker'
  | 'contactor'
  | 'overload'
  | 'vfd'
  | 'soft-starter'
  | 'motor';

export interface OneLineElement {
  kind: OneLineKind;
  label: string;
  detail?: string;
  /** contactor names drawn side by side (e.g. F and R of a reversing pair) */
  poles?: string[];
  interlocked?: boolean;
}


function contactorPoles(s: LoadSelection): { poles: string[]; label: string } {
  switch (s.starter.type) {
    case 'FVR':
      return { poles: ['F', 'R'], label: 'Reversing contactors' };
    case 'wye-delta':
      return { poles: ['M', 'Δ', 'Y'], label: 'Wye-delta contactors' };
    case 'part-winding':
      return { poles: ['M1', 'M2'], label: 'Part-winding contactors' };
    case 'two-speed':
      return { poles: ['F', 'S'], label: 'Two-speed contactors' };
    default:
      return { poles: ['M'], label: 'Contactor' };
  }
}

/** The one-line of a bucket, top (supply) to bottom (motor). Pure: same selection, same list. */
export function oneLineElements(s: LoadSelection): OneLineElement[] {
  const out: OneLineElement[] = [{ kind: 'bus', label: 'Feeder bus', detail: `${s.volts} V` }];
  out.push({
    kind: 'disconnect',
    label: 'Disconnect',
    detail: `≥ ${s.disconnect.minAmps} A${s.disconnect.minHp !== null ? `, ≥ ${s.disconnect.minHp} hp` : ''}`,
  });
  out.push({
    kind: s.scpd.type.endsWith('fuse') ? 'fuse' : 'breaker',
    label: `${s.scpd.ratingAmps} A ${SCPD_WORDS[s.scpd.type]}`,
    detail: s.scpd.basis,
  });
  if (s.starter.type === 'VFD' || s.starter.type === 'dc-drive') {
    out.push({
      kind: 'vfd',
      label: s.starter.type === 'VFD' ? 'Variable-frequency drive' : 'DC drive',
      detail: s.vfd ? `≥ ${s.vfd.minOutputAmps} A, ${s.vfd.duty} duty${s.vfd.outputFilter !== 'none' ? `, ${s.vfd.outputFilter} filter` : ''}` : undefined,
    });
  } else if (s.starter.type === 'RVSS') {
    out.push({
      kind: 'soft-starter',
      label: 'Soft starter',
      detail: s.softStarter
        ? `≥ ${s.softStarter.minAmps} A${s.softStarter.bypass ? ', bypass contactor' : ''}${s.softStarter.insideDelta ? ', inside delta' : ''}`
        : undefined,
    });
  } else {
    const c = contactorPoles(s);
    out.push({
      kind: 'contactor',
      label: `${c.label}${s.starter.nemaSize !== null ? `, NEMA size ${s.starter.nemaSize}` : ''}`,
      detail: s.starter.iecAmps !== null ? `${s.starter.iecCategory} ${s.starter.iecAmps} A` : undefined,
      poles: c.poles,
      interlocked: s.starter.interlock,
    });
  }
  if (!s.overload.providedByDrive) {
    out.push({
      kind: 'overload',
      label: `Overload, class ${s.overload.tripClass}`,
      detail: relayWiringText(s) ?? `max ${s.overload.maxSettingAmps} A (${s.overload.maxPercent} % FLA)`,
    });
  }
  const relays: string[] = [];
  if (s.relays.phaseReversal) relays.push('47 phase-sequence');
  if (s.relays.phaseLoss && !s.relays.phaseLossByOverload) relays.push('46/47 phase-loss');
  if (s.relays.phaseLoss && s.relays.phaseLossByOverload) relays.push('phase loss by the overload relay');
  out.push({
    kind: 'motor',
    label: `${s.tag}${s.hp !== null ? ` — ${s.hp} hp` : ''}`,
    detail: [`FLC ${s.flcAmps} A`, ...(s.conductor.motorLeads ? [`${s.conductor.motorLeads.count} leads ${s.conductor.motorLeads.size}`] : []), ...relays].join(' · '),
  });
  return out;
}
