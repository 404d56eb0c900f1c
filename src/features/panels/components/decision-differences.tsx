import type { SelectionDifference } from '../../../../shared/calc/selection-diff';

/** Motor by motor, the decisions that differ between two selections: "Motor · Decision · before · after". */
export function DecisionDifferences({
  motors,
  before,
  after,
  label,
  className = 'text-sm',
}: {
  motors: ReadonlyArray<{ tag: string; differences: SelectionDifference[] }>;
  before: string;
  after: string;
  label: string;
  className?: string;
}) {
  return (
    <table className={`dense w-full ${className}`} aria-label={label}>
      <thead className="text-left text-xs uppercase text-ink-soft">
        <tr>
          <th className="py-1">Motor</th>
          <th>Decision</th>
          <th>{before}</th>
          <th>{after}</th>
        </tr>
      </thead>
      <tbody>
        {motors.flatMap((m) =>
          m.differences.map((d, i) => (
            <tr key={`${m.tag}-${d.field}`} className="border-t border-line/60 align-top">
              <td className="py-0.5 font-semibold">{i === 0 ? m.tag : ''}</td>
              <td>{d.label}</td>
              <td>{d.from}</td>
              <td className="font-semibold">{d.to}</td>
            </tr>
          )),
        )}
      </tbody>
    </table>
  );
}
