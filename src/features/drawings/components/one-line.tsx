import type { LoadSelection } from '../../../../shared/schemas/selection';
import { oneLineElements, type MotorFeed, type OneLineElement } from '../../../../shared/calc/one-line';
import { sharedDriveOneLine } from '../../../../shared/calc/shared-drive-one-line';
import type { SharedDrive } from '../../../../shared/schemas/selection';
import type { GroupCircuit } from '../../../../shared/schemas/group-circuit';

export { oneLineElements };
export type { MotorFeed };

const SLATE = '#334155';
const COPPER = '#b87333';
const FONT = "'Barlow', sans-serif";

const STEP = 62;
const X = 70;

function ElementSymbol({ e, y }: { e: OneLineElement; y: number }) {
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
    case 'transformer':
      return (
        <g stroke={SLATE} strokeWidth={2} fill="none">
          <line x1={X} y1={y} x2={X} y2={mid - 22} />
          <circle cx={X} cy={mid - 9} r={13} fill="#fff" />
          <circle cx={X} cy={mid + 9} r={13} fill="none" stroke={COPPER} />
          <line x1={X} y1={mid + 22} x2={X} y2={y + STEP} />
        </g>
      );
    case 'dc-supply':
      return (
        <g stroke={SLATE} strokeWidth={2} fill="none">
          <line x1={X} y1={y} x2={X} y2={mid - 16} />
          <rect x={X - 24} y={mid - 16} width={48} height={32} fill="#fff" />
          <line x1={X - 24} y1={mid + 16} x2={X + 24} y2={mid - 16} strokeWidth={1} />
          <text x={X - 12} y={mid - 3} fontSize={9} textAnchor="middle" fill={COPPER} stroke="none" fontFamily={FONT}>
            AC
          </text>
          <text x={X + 12} y={mid + 11} fontSize={9} textAnchor="middle" fill={COPPER} stroke="none" fontFamily={FONT}>
            DC
          </text>
          <line x1={X} y1={mid + 16} x2={X} y2={y + STEP} />
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
  /** what the bucket is fed from (motorFeed of the panel roll-up); null: the feeder bus */
  feed?: MotorFeed;
  /** the shared drive that feeds the motor (the drive, its output, the motor's contactor and overload) */
  drive?: SharedDrive | null;
  /** the group whose device serves the motor (motorGroup of the panel roll-up, 430.53); null: its own device */
  group?: GroupCircuit | null;
  width?: number;
}

/** One-line diagram of a bucket as SVG. */
export function OneLine({ selection, feed = null, drive = null, group = null, width = 420 }: OneLineProps) {
  const elements = drive ? sharedDriveOneLine(selection, drive) : oneLineElements(selection, feed, group);
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
            <ElementSymbol e={e} y={y} />
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
