// Drives that feed several motors: the drive sized for the sum, its input circuit, and each motor's own
// overload relay, output contactor and conductors, with the drive's cautions.
import type { PanelChecks as Checks } from '../../../../shared/schemas/checks';
import { Basis, fmt, Notes, Section, td, th } from './section-parts';

export function SharedDrivesSection({ sd }: { sd: Checks['sharedDrives'] }) {
  if (!sd || (sd.drives.length === 0 && sd.errors.length === 0)) return null;
  return (
    <Section title="Motors on a shared drive" id="checks-shared-drives">
      {sd.errors.length > 0 ? (
        <ul className="mb-2 space-y-1 text-sm" aria-label="Shared drive problems">
          {sd.errors.map((e) => (
            <li key={e}>✖ {e}</li>
          ))}
        </ul>
      ) : null}
      {sd.drives.map((d) => (
        <div key={d.tag} className="mb-3 overflow-x-auto">
          <p className="text-sm">
            <strong>{d.tag}</strong>: {d.motors.length} motors at {d.volts} V — sum of FLC {fmt(d.sumFlcAmps, 2)} A, sum of FLA{' '}
            {fmt(d.sumFlaAmps, 2)} A; drive output at least {fmt(d.output.minOutputAmps, 2)} A ({d.output.duty} duty); input{' '}
            {d.input.protection.ratingAmps} A device, {d.input.conductor.size} conductors (≥ {fmt(d.input.conductor.minAmpacity, 2)} A)
            {d.input.ratedInputAmps === null ? ' — the drive’s rated input current is not given: the motors’ FLC sum stands in' : ''}.
          </p>
          <table className="dense mt-1 w-full text-sm" aria-label={`Motors on ${d.tag}`}>
            <thead className="border-b border-line text-left text-xs uppercase tracking-wide text-ink-soft">
              <tr>
                <th className={th}>Motor</th>
                <th className={`${th} text-right`}>FLC (A)</th>
                <th className={`${th} text-right`}>FLA (A)</th>
                <th className={th}>Overload relay</th>
                <th className={th}>Output contactor</th>
                <th className={th}>Conductors</th>
              </tr>
            </thead>
            <tbody>
              {d.motors.map((m) => (
                <tr key={m.tag} className="border-b border-line/60 last:border-0">
                  <td className={td}>{m.tag}</td>
                  <td className={`${td} text-right`}>{fmt(m.flcAmps, 2)}</td>
                  <td className={`${td} text-right`}>{fmt(m.flaAmps, 2)}</td>
                  <td className={td} title={m.overload.basis}>
                    set {fmt(m.overload.settingAmps, 2)} A, max {fmt(m.overload.maxSettingAmps, 2)} A, class {m.overload.tripClass}
                  </td>
                  <td className={td} title={m.outputContactor.basis}>
                    AC-3 ≥ {fmt(m.outputContactor.minAc3Amps, 2)} A, interlocked with the drive’s enable
                  </td>
                  <td className={td} title={m.conductor.basis}>
                    {m.conductor.size} ({m.conductor.ampacity} A ≥ {fmt(m.conductor.minAmpacity, 2)} A)
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <ul className="mt-2 space-y-1 text-sm" aria-label={`Cautions for ${d.tag}`}>
            {d.cautions.map((c) => (
              <li key={c}>⚠ {c}</li>
            ))}
          </ul>
          <Notes notes={[d.output.basis, d.input.conductor.basis, d.input.protection.basis, d.outputConductor.basis]} />
        </div>
      ))}
      <Basis>
        the drive for the sum of its motors’ nameplate currents (common practice); its input circuit per NEC 2023 430.122(A) and 430.130;
        each motor’s overload relay per 430.32(A)(1) and its conductors per 430.22; the feeder counts the drive once (430.24, 430.62(A)).
      </Basis>
    </Section>
  );
}
