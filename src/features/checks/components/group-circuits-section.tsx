// Motors on one branch circuit (NEC 430.53): each group's path, device, conductor, taps and overloads, or its refusal.
import type { PanelChecks as Checks } from '../../../../shared/schemas/checks';
import type { GroupCircuit } from '../../../../shared/schemas/group-circuit';
import { answerValueLabel } from '../../../../shared/labels';
import { Verdict } from '../../../components/ui/status';
import { Basis, Notes, Section, td, th } from './section-parts';

function GroupCard({ g }: { g: GroupCircuit }) {
  return (
    <div className="rounded border border-line/60 p-3">
      <h3 className="font-semibold">
        {g.group}: {g.motors.join(', ')} at {g.volts} V
      </h3>
      {g.device ? (
        <p className="text-sm">
          ✔ 430.53({g.path}) applies: one {answerValueLabel('scpdType', g.device.type).toLowerCase()} of {g.device.ratingAmps} A{' '}
          <span className="text-ink-soft">({g.device.basis})</span>
        </p>
      ) : (
        <p className="text-sm font-semibold text-state-returned">✖ Refused: {g.refusal}</p>
      )}
      {g.conductor ? (
        <p className="text-sm" title={g.conductor.basis}>
          Group conductor to the taps: {g.conductor.size} ({g.conductor.ampacity} A, at least {g.conductor.minAmpacity} A by 430.24)
        </p>
      ) : null}
      {g.paths.length ? (
        <ul className="mt-1 space-y-0.5 text-sm" aria-label={`${g.group} paths of 430.53`}>
          {g.paths.map((p) => (
            <li key={p.path}>
              {p.allowed ? '✔' : '✖'} ({p.path}) {p.conditions}
              {p.ratingAmps !== null ? ` — ${p.ratingAmps} A` : ''}
              {p.reasons.length ? <span className="text-ink-soft"> — {p.reasons.join('; ')}</span> : null}
            </li>
          ))}
        </ul>
      ) : null}
      {g.taps.length ? (
        <table className="dense mt-2 w-full text-sm" aria-label={`${g.group} taps and overloads`}>
          <thead className="border-b border-line bg-surface text-left text-xs tracking-wide text-ink-soft uppercase">
            <tr>
              <th className={th}>Motor</th>
              <th className={`${th} text-right`}>FLC (A)</th>
              <th className={th}>Tap (430.53(D))</th>
              <th className={`${th} text-right`}>Overload max (A)</th>
            </tr>
          </thead>
          <tbody>
            {g.taps.map((t) => (
              <tr key={t.tag} className="border-t border-line/60">
                <td className={`${td} font-semibold`}>{t.tag}</td>
                <td className={`${td} text-right`}>{t.flcAmps}</td>
                <td className={td} title={t.basis}>
                  {t.size} ({t.rule}){t.size !== t.ownSize ? `, larger than its own ${t.ownSize}` : ''}
                </td>
                <td className={`${td} text-right`}>{g.overloads.find((o) => o.tag === t.tag)?.maxSettingAmps ?? '—'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      <Notes notes={g.verify} />
    </div>
  );
}

export function GroupCircuitsSection({ gc }: { gc: NonNullable<Checks['groupCircuits']> }) {
  if (gc.groups.length === 0) return null;
  const refused = gc.groups.filter((g) => g.refusal !== null).length;
  return (
    <Section
      title="Motors on one branch circuit"
      id="checks-group-circuits"
      aside={
        <Verdict
          ok={gc.findings.length === 0}
          okText="every group allowed by 430.53"
          badText={refused ? `${refused} group${refused === 1 ? '' : 's'} refused` : 'the bill of materials needs a rebuild'}
        />
      }
    >
      <div className="space-y-3">
        {gc.groups.map((g) => (
          <GroupCard key={g.group} g={g} />
        ))}
      </div>
      {gc.findings.length ? (
        <ul className="mt-2 list-disc pl-5 text-sm">
          {gc.findings.map((f) => (
            <li key={f}>⚠ {f}</li>
          ))}
        </ul>
      ) : null}
      <Basis>{gc.basis}</Basis>
    </Section>
  );
}
