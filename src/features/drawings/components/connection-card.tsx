import type { ConnectionCard as Card, ConnectionStep, LineName } from '../../../../shared/calc/connections';

const SLATE = '#334155';
const COPPER = '#b87333';
const FONT = "'Barlow', sans-serif";
const LINE_ORDER: LineName[] = ['L1', 'L2', 'L3', 'A+', 'A-'];

const COL = 92;
const LEAD_H = 20;

function stepHeight(step: ConnectionStep): number {
  const lines = LINE_ORDER.filter((l) => step.lineGroups[l]);
  const maxLeads = Math.max(1, ...lines.map((l) => step.lineGroups[l]!.length));
  const joinedRows = step.joined.length + (step.insulated.length > 0 ? 1 : 0);
  return 34 + maxLeads * LEAD_H + (joinedRows > 0 ? 26 + joinedRows * LEAD_H : 0) + 12;
}

function Step({ step, y }: { step: ConnectionStep; y: number }) {
  const lines = LINE_ORDER.filter((l) => step.lineGroups[l]);
  const maxLeads = Math.max(1, ...lines.map((l) => step.lineGroups[l]!.length));
  const joinedY = y + 34 + maxLeads * LEAD_H + 26;
  return (
    <g fontFamily={FONT}>
      <text x={12} y={y + 12} fontSize={12} fontWeight={600} fill={SLATE}>
        {step.label}
      </text>
      {lines.map((l, i) => {
        const x = 12 + i * COL;
        const leads = step.lineGroups[l]!;
        return (
          <g key={l}>
            <rect x={x} y={y + 18} width={COL - 12} height={16} fill={COPPER} rx={2} />
            <text x={x + (COL - 12) / 2} y={y + 30} fontSize={11} textAnchor="middle" fill="#fff" fontWeight={600}>
              {l}
            </text>
            <line x1={x + 10} y1={y + 34} x2={x + 10} y2={y + 34 + leads.length * LEAD_H - 8} stroke={SLATE} strokeWidth={2} />
            {leads.map((lead, j) => (
              <g key={lead}>
                <circle cx={x + 10} cy={y + 34 + j * LEAD_H + 10} r={3} fill={SLATE} />
                <text x={x + 20} y={y + 34 + j * LEAD_H + 14} fontSize={11} fill={SLATE}>
                  {lead}
                </text>
              </g>
            ))}
          </g>
        );
      })}
      {step.joined.length > 0 || step.insulated.length > 0 ? (
        <text x={12} y={joinedY - 14} fontSize={10} fill={SLATE}>
          Joined and insulated together
        </text>
      ) : null}
      {step.joined.map((group, k) => {
        const gy = joinedY + k * LEAD_H + 8;
        return (
          <g key={group.join('-')}>
            <line x1={20} y1={gy} x2={20 + (group.length - 1) * 44} y2={gy} stroke={COPPER} strokeWidth={3} />
            {group.map((lead, j) => (
              <g key={lead}>
                <circle cx={20 + j * 44} cy={gy} r={4} fill="#fff" stroke={SLATE} strokeWidth={2} />
                <text x={20 + j * 44 + 7} y={gy - 5} fontSize={10} fill={SLATE}>
                  {lead}
                </text>
              </g>
            ))}
          </g>
        );
      })}
      {step.insulated.length > 0 ? (
        <text x={12} y={joinedY + step.joined.length * LEAD_H + 12} fontSize={10} fill={SLATE}>
          {`Insulated separately: ${step.insulated.join(', ')}`}
        </text>
      ) : null}
    </g>
  );
}

export interface ConnectionCardProps {
  card: Card;
  width?: number;
}

/** A motor lead connection card (NEMA MG 1 markings) as SVG. */
export function ConnectionCardDrawing({ card, width = 420 }: ConnectionCardProps) {
  let y = 30;
  const placed = card.steps.map((s) => {
    const at = y;
    y += stepHeight(s);
    return { s, at };
  });
  const textLines = [`To reverse: ${card.reverse}`, ...card.cautions];
  const height = y + textLines.length * 16 + 12;
  const titleId = `connection-card-${card.title.replace(/[^a-z0-9]+/gi, '-').toLowerCase()}`;
  const summary = placed
    .map(
      ({ s }) =>
        `${s.label}: ${LINE_ORDER.filter((l) => s.lineGroups[l])
          .map((l) => `${l}=${s.lineGroups[l]!.join(',')}`)
          .join(' ')}${s.joined.length ? `; join ${s.joined.map((g) => g.join('-')).join(', ')}` : ''}`,
    )
    .join('. ');
  return (
    <svg
      role="img"
      aria-labelledby={titleId}
      viewBox={`0 0 ${width} ${height}`}
      width={width}
      height={height}
      xmlns="http://www.w3.org/2000/svg"
    >
      <title id={titleId}>{`${card.title}. ${summary}`}</title>
      <rect x={1} y={1} width={width - 2} height={height - 2} fill="#fff" stroke={SLATE} rx={4} />
      <text x={12} y={20} fontSize={13} fontWeight={700} fill={SLATE} fontFamily={FONT}>
        {card.title}
      </text>
      {placed.map(({ s, at }) => (
        <Step key={s.label} step={s} y={at} />
      ))}
      {textLines.map((t, i) => (
        <text key={t} x={12} y={y + 4 + i * 16} fontSize={10} fill={i === 0 ? COPPER : SLATE} fontFamily={FONT}>
          {t}
        </text>
      ))}
    </svg>
  );
}
