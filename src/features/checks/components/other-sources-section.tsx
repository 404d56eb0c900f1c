// The motors at another voltage than the supply: the transformers and DC supplies in the panel.
import type { PanelChecks as Checks } from '../../../../shared/schemas/checks';
import { Basis, Notes, Section } from './section-parts';

export function OtherSourcesSection({ os }: { os: Checks['otherSources'] }) {
  if (os.sources.length === 0 && os.externalMotors.length === 0) return null;
  return (
    <Section title="Motors at another voltage" id="checks-other-sources">
      {os.sources.length > 0 ? (
        <div className="overflow-x-auto">
          <table className="dense w-full text-sm" aria-label="Other sources in the panel">
            <thead className="border-b border-line text-left text-xs uppercase tracking-wide text-ink-soft">
              <tr>
                <th className="px-2 py-1">Source</th>
                <th className="px-2 py-1">Feeds</th>
                <th className="px-2 py-1 text-right">Rating</th>
                <th className="px-2 py-1 text-right">Primary (A)</th>
                <th className="px-2 py-1">Primary device</th>
                <th className="px-2 py-1">Secondary device</th>
              </tr>
            </thead>
            <tbody>
              {os.sources.map((s) => (
                <tr key={s.tag} className="border-b border-line/60 align-top last:border-0">
                  <td className="px-2 py-1">
                    <strong>{s.tag}</strong>{' '}
                    {s.kind === 'transformer' ? `transformer ${s.primaryVolts}-${s.secondaryLabel}` : `DC supply, ${s.secondaryLabel}`}
                  </td>
                  <td className="px-2 py-1">{s.motors.map((m) => m.tag).join(', ')}</td>
                  <td className="px-2 py-1 text-right">
                    {s.kind === 'transformer' ? `${s.kva} kVA (load ${s.loadKva} kVA)` : `≥ ${s.secondaryAmps} A (${s.loadKva} kW)`}
                  </td>
                  <td className="px-2 py-1 text-right">{s.primaryAmps}</td>
                  <td className="px-2 py-1" title={s.primaryProtection.basis}>
                    {s.primaryProtection.ratingAmps} A ({s.primaryProtection.percent} % limit {s.primaryProtection.maxAmps} A)
                  </td>
                  <td className="px-2 py-1" title={s.secondaryProtection?.basis}>
                    {s.secondaryProtection
                      ? `${s.secondaryProtection.ratingAmps} A (${s.secondaryProtection.percent} % limit ${s.secondaryProtection.maxAmps} A)`
                      : '—'}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <Notes
            notes={os.sources.flatMap((s) => [
              s.primaryProtection.basis,
              ...(s.secondaryProtection ? [s.secondaryProtection.basis] : []),
              ...s.notes.map((n) => `${s.tag}: ${n}`),
            ])}
          />
        </div>
      ) : null}
      {os.externalMotors.length > 0 ? (
        <ul className="mt-2 space-y-1 text-sm" aria-label="Motors fed from outside the panel">
          {os.externalMotors.map((m) => (
            <li key={m.tag}>
              ◔ <strong>{m.tag}</strong> ({m.volts} V {m.supply === 'dc' ? 'DC' : m.supply === 'ac1' ? 'single-phase' : 'three-phase'})
              needs {m.needs}: fed from a source outside the panel, left out of the feeder and the panel's full-load current.
            </li>
          ))}
        </ul>
      ) : null}
      <Basis>
        the sources' kVA counts the motors as NEC 2023 430.24 does (largest at 125 %); their protection per NEC 2023 Table 450.3(B); their
        primary current is in the feeder (430.24, 430.62(A), 430.63) and the nameplate full-load current (409.110).
      </Basis>
    </Section>
  );
}
