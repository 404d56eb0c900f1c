// The SCCR worksheet of the panel checks (UL 508A SB4, NEC 409.22), with its ways out.
import type { PanelChecks as Checks } from '../../../../shared/schemas/checks';
import type { SccrRow, SccrWayOut } from '../../../../shared/calc/sccr';
import { formatMoney } from '../../../../shared/format/money';
import { Verdict } from '../../../components/ui/status';
import { Basis, Notes, Section, fmt, td, th } from './section-parts';

const SOURCE_WORDS: Record<SccrRow['source'], string> = {
  marked: 'Marked',
  assumed: 'Assumed (unmarked)',
  combination: 'Tested combination',
  'current-limiting': 'Raised by current-limiting feeder',
  none: 'No rating',
};

function SccrVerdict({ sccr }: { sccr: Checks['sccr'] }) {
  switch (sccr.verdict) {
    case 'adequate':
      return <Verdict ok okText={`Panel SCCR ${fmt(sccr.panelSccrKa)} kA ≥ available ${fmt(sccr.availableFaultKa)} kA`} badText="" />;
    case 'below-available':
      return (
        <Verdict
          ok={false}
          okText=""
          badText={`Panel SCCR ${fmt(sccr.panelSccrKa)} kA is below the available ${fmt(sccr.availableFaultKa)} kA`}
        />
      );
    case 'no-available-fault-current':
      return (
        <span className="text-sm font-semibold text-state-review">
          ⚠ Panel SCCR {fmt(sccr.panelSccrKa)} kA; the job has no available fault current to compare
        </span>
      );
    default:
      return <span className="text-sm font-semibold text-state-returned">✖ Panel SCCR not established: a component has no rating</span>;
  }
}

function WayOut({ w }: { w: SccrWayOut }) {
  return (
    <li className="flex flex-wrap items-baseline gap-x-3 gap-y-1 border-b border-line py-1.5 last:border-0">
      <span className="min-w-0 flex-1 text-sm">{w.description}</span>
      {w.resultingSccrKa !== null ? (
        <span className="text-xs whitespace-nowrap">
          Panel then {fmt(w.resultingSccrKa)} kA ·{' '}
          {w.resolves ? (
            <strong className="text-state-signed">✔ resolves</strong>
          ) : (
            <strong className="text-state-review">⚠ not enough on its own</strong>
          )}
        </span>
      ) : null}
      <span className="w-28 text-right font-dense text-sm tabular-nums whitespace-nowrap" title="Cost difference at catalogue prices">
        {w.costDifference === null ? '' : formatMoney(w.costDifference, { signed: true })}
      </span>
    </li>
  );
}

export function SccrSection({ sccr }: { sccr: Checks['sccr'] }) {
  const costed = sccr.waysOut.filter((w) => w.kind !== 'advice');
  const advice = sccr.waysOut.filter((w) => w.kind === 'advice');
  return (
    <Section title="Short-circuit current rating worksheet" id="checks-sccr" aside={<SccrVerdict sccr={sccr} />}>
      <p className="mb-2 text-sm text-ink-soft">
        Every power-circuit component with its rating and where the rating comes from. The panel is rated at its weakest component
        {sccr.limiting.length > 0 ? (
          <>
            : <strong className="text-ink">{[...new Set(sccr.limiting.map((r) => `${r.location} ${r.code}`))].join(', ')}</strong> at{' '}
            {fmt(sccr.panelSccrKa)} kA
          </>
        ) : null}
        .
      </p>
      <div className="overflow-x-auto">
        <table className="dense w-full text-sm" aria-label="SCCR worksheet">
          <thead className="border-b border-line bg-surface text-left text-xs tracking-wide text-ink-soft uppercase">
            <tr>
              <th className={th}>Location</th>
              <th className={th}>Part</th>
              <th className={th}>Description</th>
              <th className={`${th} text-right`}>Qty</th>
              <th className={`${th} text-right`}>Rating (kA)</th>
              <th className={th}>Source</th>
              <th className={th}>Basis</th>
              <th className={th}>Status</th>
            </tr>
          </thead>
          <tbody>
            {sccr.rows.map((r, i) => (
              <tr
                key={`${r.location}-${r.code}-${i}`}
                className={`border-b border-line ${r.limiting ? 'bg-copper-50 font-semibold' : ''}`}
                aria-label={r.limiting ? `Limiting component ${r.code}` : undefined}
              >
                <td className={td}>{r.location === 'feeder' ? 'Feeder' : r.location}</td>
                <td className={`${td} whitespace-nowrap`}>{r.code}</td>
                <td className={`${td} font-normal`}>{r.description}</td>
                <td className={`${td} text-right`}>{fmt(r.qty, 2)}</td>
                <td className={`${td} text-right`}>
                  {fmt(r.ratingKa)}
                  {r.unraisedKa !== undefined ? (
                    <span className="block text-xs font-normal text-ink-soft">was {fmt(r.unraisedKa)}</span>
                  ) : null}
                </td>
                <td className={td}>{SOURCE_WORDS[r.source]}</td>
                <td className={`${td} max-w-72 text-xs font-normal text-ink-soft`}>{r.basis}</td>
                <td className={`${td} whitespace-nowrap`}>
                  {r.limiting ? <span className="text-copper-700">◆ Limiting</span> : null}
                  {r.belowAvailable ? <span className="block text-state-returned">✖ Below available</span> : null}
                  {!r.limiting && !r.belowAvailable ? <span className="font-normal text-ink-soft">—</span> : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {sccr.excluded.length > 0 ? (
        <details className="mt-2 text-xs text-ink-soft">
          <summary className="cursor-pointer">Left out of the power circuit ({sccr.excluded.length} lines)</summary>
          <ul className="mt-1 list-disc pl-5">
            {sccr.excluded.map((e, i) => (
              <li key={i}>
                {e.location} {e.code ?? ''} — {e.reason}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
      {sccr.verdict === 'below-available' ? (
        <div className="mt-3">
          <h3 className="text-sm font-semibold">Ways out (cost difference at catalogue prices)</h3>
          {costed.length > 0 ? (
            <ul className="mt-1">
              {costed.map((w, i) => (
                <WayOut key={i} w={w} />
              ))}
            </ul>
          ) : (
            <p className="text-sm text-ink-soft">
              No drop-in part in the catalogue raises a weak component to the available fault current.
            </p>
          )}
          {advice.length > 0 ? (
            <ul className="mt-1 list-disc pl-5 text-sm">
              {advice.map((w) => (
                <li key={w.description}>{w.description}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      <Notes notes={sccr.notes} />
      <Basis>{sccr.basis}</Basis>
    </Section>
  );
}
