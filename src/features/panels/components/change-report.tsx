// The change report between two signed-off revisions: motors, decisions, totals and the bill-of-materials lines.
import { useQuery } from '@tanstack/react-query';
import { panelQueries } from '../api/panels';
import { DecisionDifferences } from './decision-differences';
import { ErrorNote, Loading } from '../../../components/ui/feedback';
import { formatMoney as money } from '../../../../shared/format/money';

export function ChangeReport({ panelId, from, to }: { panelId: number; from: number; to: number }) {
  const r = useQuery(panelQueries.changeReport(panelId, from, to));
  if (r.isPending) return <Loading what="Comparing revisions" />;
  if (r.isError) return <ErrorNote error={r.error} />;
  const d = r.data;
  const rows = [
    ...d.bom.added.map((e) => ({ kind: 'Added', e })),
    ...d.bom.removed.map((e) => ({ kind: 'Removed', e })),
    ...d.bom.changed.map((e) => ({ kind: 'Changed', e })),
  ];
  return (
    <div className="space-y-2" role="group" aria-label="Change report">
      <a
        className="text-sm font-semibold text-copper-700 underline"
        href={`/api/panels/${panelId}/change-report.xlsx?from=${from}&to=${to}`}
        download
      >
        Download R{from} → R{to} (.xlsx)
      </a>
      <p className="text-sm">
        Motors added: <strong>{d.motors.added.join(', ') || 'none'}</strong> · removed:{' '}
        <strong>{d.motors.removed.join(', ') || 'none'}</strong> · changed: <strong>{d.motors.changed.join(', ') || 'none'}</strong>
      </p>
      {d.motors.decisions.length ? (
        <DecisionDifferences motors={d.motors.decisions} before={`R${d.from}`} after={`R${d.to}`} label="Decisions that changed" />
      ) : null}
      <p className="text-sm">
        Material {money(d.totals.from.materialCost)} → {money(d.totals.to.materialCost)} (
        <strong>
          {d.totals.materialDelta >= 0 ? '+' : ''}
          {money(d.totals.materialDelta)}
        </strong>
        ) · Sell {money(d.totals.from.sell)} → {money(d.totals.to.sell)} (
        <strong data-testid="sell-delta">
          {d.totals.sellDelta >= 0 ? '+' : ''}
          {money(d.totals.sellDelta)}
        </strong>
        )
      </p>
      {rows.length === 0 ? (
        <p className="text-sm text-ink-soft">The bills of materials are the same.</p>
      ) : (
        <table className="dense w-full text-sm">
          <thead className="text-left text-xs uppercase text-ink-soft">
            <tr>
              <th className="py-1">Change</th>
              <th>Bucket</th>
              <th>Part</th>
              <th>Description</th>
              <th className="text-right">Qty before</th>
              <th className="text-right">Qty after</th>
              <th className="text-right">Cost Δ ($)</th>
            </tr>
          </thead>
          <tbody>
            {rows.map(({ kind, e }) => (
              <tr key={`${kind}-${e.key}`} className="border-t border-line/60">
                <td className="py-1 font-semibold">
                  {kind === 'Added' ? '+' : kind === 'Removed' ? '−' : '≠'} {kind}
                </td>
                <td>{e.bucket}</td>
                <td>{e.code ?? '—'}</td>
                <td>{e.description}</td>
                <td className="text-right">{e.before?.quantity ?? '—'}</td>
                <td className="text-right">{e.after?.quantity ?? '—'}</td>
                <td className="text-right">{e.costDelta.toFixed(2)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
