import type { LoadSelection } from '../../../../shared/schemas/selection';
import { relayWiringText } from '../../../../shared/calc/overload';
import { SCPD_WORDS } from '../../../../shared/calc/scpd';
import { decisionValueLabel } from '../../../../shared/labels';

const SLATE = '#334155';
const COPPER = '#b87333';
const FONT = "'Barlow', sans-serif";

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
      detail: s.vfd ? `≥ ${s.vfd.minOutputAmps} A, ${decisionValueLabel('vfd.duty', s.vfd.duty)?.toLowerCase()}${s.vfd.outputFilter !== 'none' ? `, ${decisionValueLabel('vfd.outputFilter', s.vfd.outputFilter)}` : ''}` : undefined,
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

const STEP = 62;
const X = 70;

function Symbol({ e, y }: { e: OneLineElement; y: number }) {
  const mid = y + STEP / 2;
  switch (e.kind) {
    case 'bus':
      return <line x1={X - 40} y1={y + 20} x2={X + 40} y2={y + 20} stroke={COPPER} strokeWidth={5} />;
    case 'disconnect':
      return (
        <g stroke={SLATE} strokeWidth={2} fill="none">
          <line x1={X} y1={y} x2={X} y2={mid - 12} />
          <line x1={X} y1={mid - 12} x2={X + 14} y2={mid + 10} />
          <line x1={X} y1={mid + 12} x2={X} y2={y + STEP} />
        </g>
      );
    case 'fuse':
      return (
        <g stroke={SLATE} strokeWidth={2} fill="none">
          <line x1={X} y1={y} x2={X} y2={y + STEP} />
          <rect x={X - 7} y={mid - 16} width={14} height={32} fill="#fff" />
        </g>
      );
    case 'breaker':
      return (
        <g stroke={SLATE} strokeWidth={2} fill="none">
          <line x1={X} y1={y} x2={X} y2={mid - 14} />
          <path d={`M ${X} ${mid - 14} Q ${X + 18} ${mid} ${X} ${mid + 14}`} />
          <line x1={X} y1={mid + 14} x2={X} y2={y + STEP} />
        </g>
      );
    case 'contactor': {
      const poles = e.poles ?? ['M'];
      const gap = 30;
      const x0 = X - ((poles.length - 1) * gap) / 2;
      return (
        <g stroke={SLATE} strokeWidth={2} fill="none">
          <line x1={X} y1={y} x2={X} y2={y + 10} />
          <line x1={x0} y1={y + 10} x2={x0 + (poles.length - 1) * gap} y2={y + 10} />
          <line x1={x0} y1={y + STEP - 10} x2={x0 + (poles.length - 1) * gap} y2={y + STEP - 10} />
          <line x1={X} y1={y + STEP - 10} x2={X} y2={y + STEP} />
          {poles.map((p, i) => {
            const px = x0 + i * gap;
            return (
              <g key={p}>
                <line x1={px} y1={y + 10} x2={px} y2={mid - 6} />
                <line x1={px - 8} y1={mid - 6} x2={px + 8} y2={mid - 6} />
                <line x1={px - 8} y1={mid + 6} x2={px + 8} y2={mid + 6} />
                <line x1={px} y1={mid + 6} x2={px} y2={y + STEP - 10} />
                <text x={px + 10} y={mid + 4} fontSize={10} fill={SLATE} stroke="none" fontFamily={FONT}>
                  {p}
                </text>
              </g>
            );
          })}
          {e.interlocked && poles.length > 1 ? (
            <line x1={x0} y1={mid} x2={x0 + (poles.length - 1) * gap} y2={mid} strokeDasharray="3 3" stroke={COPPER} />
          ) : null}
        </g>
      );
    }
    case 'overload':
      return (
        <g stroke={SLATE} strokeWidth={2} fill="none">
          <line x1={X} y1={y} x2={X} y2={mid - 10} />
          <path d={`M ${X} ${mid - 10} h 8 v 8 h -16 v 8 h 8`} />
          <line x1={X} y1={mid + 6} x2={X} y2={y + STEP} />
        </g>
      );
    case 'vfd':
    case 'soft-starter':
      return (
        <g stroke={SLATE} strokeWidth={2} fill="none">
          <line x1={X} y1={y} x2={X} y2={mid - 16} />
          <rect x={X - 24} y={mid - 16} width={48} height={32} fill="#fff" />
          <text x={X} y={mid + 4} fontSize={11} textAnchor="middle" fill={COPPER} stroke="none" fontFamily={FONT}>
            {e.kind === 'vfd' ? 'VFD' : 'RVSS'}
          </text>
          <line x1={X} y1={mid + 16} x2={X} y2={y + STEP} />
        </g>
      );
    case 'motor':
      return (
        <g stroke={SLATE} strokeWidth={2} fill="none">
          <line x1={X} y1={y} x2={X} y2={mid - 18} />
          <circle cx={X} cy={mid} r={18} fill="#fff" stroke={COPPER} />
          <text x={X} y={mid + 5} fontSize={14} textAnchor="middle" fill={SLATE} stroke="none" fontFamily={FONT}>
            M
          </text>
        </g>
      );
  }
}

export interface OneLineProps {
  selection: LoadSelection;
  width?: number;
}

/** One-line diagram of a bucket as SVG. */
export function OneLine({ selection, width = 420 }: OneLineProps) {
  const elements = oneLineElements(selection);
  const height = elements.length * STEP + 10;
  const titleId = `one-line-${selection.tag}`;
  return (
    <svg
      role="img"
      aria-labelledby={titleId}
      viewBox={`0 0 ${width} ${height}`}
      width={width}
      height={height}
      xmlns="http://www.w3.org/2000/svg"
    >
      <title id={titleId}>{`One-line of ${selection.tag}: ${elements.map((e) => e.label).join(', ')}`}</title>
      {elements.map((e, i) => {
        const y = i * STEP + 4;
        return (
          <g key={`${e.kind}-${i}`}>
            <Symbol e={e} y={y} />
            <text x={X + 56} y={y + STEP / 2 - 2} fontSize={12} fontWeight={600} fill={SLATE} fontFamily={FONT}>
              {e.label}
            </text>
            {e.detail ? (
              <text x={X + 56} y={y + STEP / 2 + 13} fontSize={10} fill={SLATE} fontFamily={FONT}>
                {e.detail.length > 60 ? `${e.detail.slice(0, 57)}…` : e.detail}
              </text>
            ) : null}
          </g>
        );
      })}
    </svg>
  );
}
