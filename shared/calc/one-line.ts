// The one-line of a bucket as a list of elements, supply to motor: drawn on screen (SVG) and in the
// submittal (PDF vector drawing) from the same list.
import type { GroupCircuit } from '../schemas/group-circuit';
import type { LoadSelection } from '../schemas/selection';
import { relayWiringText } from './overload';
import { SCPD_WORDS } from './scpd';
import { decisionValueLabel } from '../labels';
import type { motorFeed } from './other-sources';

export type OneLineKind =
  | 'bus'
  | 'disconnect'
  | 'fuse'
  | 'breaker'
  | 'contactor'
  | 'overload'
  | 'vfd'
  | 'soft-starter'
  | 'transformer'
  | 'dc-supply'
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

export type MotorFeed = ReturnType<typeof motorFeed>;

/** Where the bucket takes its power: the feeder bus, or — for a motor at another voltage — the panel's
 *  transformer or DC supply (feeder bus, primary device, the source, its secondary bus), or a source outside the panel. */
function feedElements(s: LoadSelection, feed: MotorFeed): OneLineElement[] {
  if (!feed) return [{ kind: 'bus', label: 'Feeder bus', detail: `${s.volts} V` }];
  if (feed.external) return [{ kind: 'bus', label: 'Outside source (not from this panel)', detail: `${feed.external.needs}` }];
  const src = feed.source;
  const out: OneLineElement[] = [
    { kind: 'bus', label: 'Feeder bus', detail: `${src.primaryVolts} V` },
    { kind: 'breaker', label: `${src.primaryProtection.ratingAmps} A ${src.tag} primary breaker`, detail: src.primaryProtection.basis },
    src.kind === 'transformer'
      ? { kind: 'transformer', label: `${src.tag} — ${src.kva} kVA transformer`, detail: `${src.primaryVolts}-${src.secondaryLabel}` }
      : {
          kind: 'dc-supply',
          label: `${src.tag} — DC supply`,
          detail: `${src.primaryVolts} V in, ${src.secondaryLabel} ≥ ${src.secondaryAmps} A out`,
        },
  ];
  if (src.secondaryProtection)
    out.push({
      kind: 'breaker',
      label: `${src.secondaryProtection.ratingAmps} A ${src.tag} secondary breaker`,
      detail: src.secondaryProtection.basis,
    });
  out.push({
    kind: 'bus',
    label: `${src.tag} secondary bus`,
    detail: src.kind === 'transformer' ? `${src.secondaryLabel}` : src.secondaryLabel,
  });
  return out;
}

/** The group's one device feeding several buckets (430.53), then this motor's tap to its overload relay. */
function groupElements(s: LoadSelection, g: GroupCircuit): OneLineElement[] {
  const d = g.device as NonNullable<GroupCircuit['device']>;
  const tap = g.taps.find((t) => t.tag === s.tag);
  const others = g.motors.filter((t) => t !== s.tag);
  return [
    {
      kind: d.type.endsWith('fuse') ? 'fuse' : 'breaker',
      label: `${d.ratingAmps} A ${SCPD_WORDS[d.type]}, group ${g.group} (430.53(${g.path}))`,
      detail: `also feeds ${others.join(', ')}; group conductor ${g.conductor?.size ?? '—'}; ${d.basis}`,
    },
    ...(tap ? [{ kind: 'bus' as const, label: `Tap ${tap.size} (430.53(${tap.rule}))`, detail: tap.basis }] : []),
  ];
}

/** The one-line of a bucket, top (supply) to bottom (motor). Pure: same selection, feed and group, same list.
 *  A motor of a group (430.53) shows the group's device and its tap in place of a device of its own. */
export function oneLineElements(s: LoadSelection, feed: MotorFeed = null, group: GroupCircuit | null = null): OneLineElement[] {
  const out: OneLineElement[] = feedElements(s, feed);
  out.push({
    kind: 'disconnect',
    label: 'Disconnect',
    detail: `≥ ${s.disconnect.minAmps} A${s.disconnect.minHp !== null ? `, ≥ ${s.disconnect.minHp} hp` : ''}`,
  });
  if (group?.device) out.push(...groupElements(s, group));
  else
    out.push({
      kind: s.scpd.type.endsWith('fuse') ? 'fuse' : 'breaker',
      label: `${s.scpd.ratingAmps} A ${SCPD_WORDS[s.scpd.type]}`,
      detail: s.scpd.basis,
    });
  if (s.starter.type === 'VFD' || s.starter.type === 'dc-drive') {
    out.push({
      kind: 'vfd',
      label: s.starter.type === 'VFD' ? 'Variable-frequency drive' : 'DC drive',
      detail: s.vfd
        ? `≥ ${s.vfd.minOutputAmps} A, ${decisionValueLabel('vfd.duty', s.vfd.duty)?.toLowerCase()}${s.vfd.outputFilter !== 'none' ? `, ${decisionValueLabel('vfd.outputFilter', s.vfd.outputFilter)}` : ''}`
        : undefined,
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
    detail: [
      `FLC ${s.flcAmps} A`,
      ...(s.conductor.motorLeads ? [`${s.conductor.motorLeads.count} leads ${s.conductor.motorLeads.size}`] : []),
      ...relays,
    ].join(' · '),
  });
  return out;
}
