import type { PanelChecks } from '../../../../shared/schemas/checks';
import { Verdict } from '../../../components/ui/status';

const th = 'px-2 py-1.5 font-semibold';
const td = 'px-2 py-1.5 align-top';

/** Each control conductor of the bill of materials against its protecting device (NEC 430.72(A), (B), Table 430.72(B)). */
export function ControlConductorsSection({ cc }: { cc: PanelChecks['controlConductors'] }) {
  const bad = cc.rows.filter((r) => r.ok === false).length;
  return (
    <section aria-labelledby="checks-control-conductors" className="rounded border border-line bg-panel p-4">
      <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="checks-control-conductors" className="text-lg font-semibold">
          Control-circuit conductors
        </h2>
        {cc.rows.length ? (
          <Verdict
            ok={bad === 0}
            okText="every control conductor within Table 430.72(B)"
            badText={`${bad} control conductor${bad === 1 ? '' : 's'} too small for the upstream device`}
          />
        ) : null}
      </div>
      {cc.rows.length === 0 ? (
        <p className="text-sm">No control wiring in the bill of materials.</p>
      ) : (
        <table className="dense w-full text-sm" aria-label="Control conductors">
          <thead className="border-b border-line bg-surface text-left text-xs tracking-wide text-ink-soft uppercase">
            <tr>
              <th className={th}>Bucket</th>
              <th className={th}>Conductor</th>
              <th className={th}>Protected by</th>
              <th className={th}>Table 430.72(B)</th>
              <th className={`${th} text-right`}>Max (A)</th>
              <th className={th}>Verdict</th>
            </tr>
          </thead>
          <tbody>
            {cc.rows.map((r, i) => (
              <tr key={`${r.bucket}-${i}`} className="border-t border-line/60">
                <td className={`${td} font-semibold`}>{r.bucket}</td>
                <td className={td}>
                  {r.conductor} {r.material === 'cu' ? 'Cu' : 'Al'}
                </td>
                <td className={td}>
                  {r.device.kind}
                  {r.device.amps !== null ? ` ${r.device.amps} A` : ''} <span className="text-ink-soft">{r.device.description}</span>
                </td>
                <td className={td} title={r.basis}>
                  column {r.column}
                </td>
                <td className={`${td} text-right`}>{r.maxAmps ?? '—'}</td>
                <td className={td}>
                  {r.ok === null ? '◔ not checked' : r.ok ? '✔ OK' : <span className="font-semibold text-state-returned">✖ too small</span>}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {cc.findings.length ? (
        <ul className="mt-2 list-disc pl-5 text-sm">
          {cc.findings.map((f) => (
            <li key={f}>{f}</li>
          ))}
        </ul>
      ) : null}
      <p className="mt-2 text-xs text-ink-soft">
        Basis: {cc.basis}. Column A: separate protection; B: within the enclosure; C: extending beyond it, both protected by the branch
        device.
      </p>
    </section>
  );
}
