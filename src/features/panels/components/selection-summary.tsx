import type { LoadSelection } from '../../../../shared/schemas/selection';
import type { GroupCircuit } from '../../../../shared/schemas/group-circuit';
import { relayOf, relayWiringText } from '../../../../shared/calc/overload';
import { perWindingText } from '../../../../shared/calc/scpd';
import { motorLeadText, termination60Text, voltageDropText } from '../../../../shared/calc/conductor';
import { unbalanceText } from '../../../../shared/standards/nema-mg1-voltage-unbalance';
import { answerValueLabel, decisionValueLabel, fieldLabel, starterTypeLabel } from '../../../../shared/labels';

const SCPD_SHORT: Record<string, string> = {
  'inverse-time-breaker': 'Inverse-time CB',
  'instantaneous-trip-breaker': 'Instantaneous-trip CB (MCP)',
  'dual-element-fuse': 'Dual-element fuse',
  'non-time-delay-fuse': 'Non-time-delay fuse',
};

export function scpdLabel(type: string) {
  return SCPD_SHORT[type] ?? type;
}

export function starterLabel(s: LoadSelection) {
  return `${starterTypeLabel(s.starter.type)}${s.starter.nemaSize ? ` size ${s.starter.nemaSize}` : ''}`;
}

/**
 * The overload in a list: the relay's own maximum dial setting, so that a wye-delta relay (in the delta
 * windings, FLA/√3) or a part-winding pair (half each) is never read at the line value.
 */
export function overloadLabel(s: LoadSelection): string {
  if (s.overload.providedByDrive) return 'drive';
  const relay = relayOf(s);
  const mark = relay.share === 1 ? '' : relay.share === 0.5 ? ' (2×, per half-winding)' : ' (in Δ)';
  return `${relay.maxAmps}${mark} · C${s.overload.tripClass}`;
}

export function relayLabel(s: LoadSelection) {
  const r: string[] = [];
  if (s.relays.phaseLoss) r.push(s.relays.phaseLossByOverload ? 'Phase loss (in OL)' : 'Phase loss');
  if (s.relays.phaseReversal) r.push('Phase reversal');
  return r.length ? r.join(', ') : '—';
}

/** The key results of one motor's selection, with reasons and citations: the live preview and the review card. */
export function SelectionSummary({
  selection,
  overridden = [],
  group = null,
}: {
  selection: LoadSelection;
  overridden?: string[];
  /** the group whose one device serves this motor (430.53); null: its own branch circuit */
  group?: GroupCircuit | null;
}) {
  const s = selection;
  // the relay's dial: the current it carries at full load (nameplate FLA, or its share in a wye-delta or
  // part-winding starter); the trip then falls within the 430.32 limit (common practice; the maker's instructions govern)
  const relay = relayOf(s);
  const wiring = s.overload.providedByDrive ? null : (relayWiringText(s) ?? `dial at ${relay.settingAmps} A (nameplate FLA)`);
  const mark = (field: string) =>
    overridden.includes(field) ? (
      <span className="ml-1 rounded bg-copper-100 px-1 text-[10px] font-bold text-copper-700" title="Overridden by the designer">
        OVERRIDE
      </span>
    ) : null;
  const rows: Array<[string, React.ReactNode, string]> = [
    ['Full-load current (table)', `${s.flcAmps} A`, s.flcSource],
    [
      'Starter',
      <>
        {starterLabel(s)}
        {mark('starter.type')}
        {mark('starter.nemaSize')}
        {s.starter.reversingContactors ? ' · reversing pair, mech. + elec. interlock' : ''}
      </>,
      s.starter.basis,
    ],
    [
      'Overload',
      <>
        {s.overload.providedByDrive ? 'by the drive' : `≤ ${s.overload.maxSettingAmps} A (${s.overload.maxPercent} %)`}, class{' '}
        {s.overload.tripClass}
        {mark('overload.tripClass')}
        {wiring ? (
          <span className="block text-ink-soft" data-testid="overload-relay">
            {wiring}
          </span>
        ) : null}
      </>,
      wiring
        ? `${s.overload.basis}; dial: ${relay.share === 1 ? 'common practice' : relay.basis}, the relay maker's instructions govern`
        : s.overload.basis,
    ],
    [
      'Branch protection',
      <>
        {scpdLabel(s.scpd.type)} {s.scpd.ratingAmps} A{mark('scpd.ratingAmps')}
        {mark('scpd.type')}{' '}
        <span className="text-ink-soft">
          (max {s.scpd.maxPercent} % = {s.scpd.computedMaxAmps} A)
        </span>
        {group?.device ? (
          <span className="block font-semibold">
            On group {group.group}: one {answerValueLabel('scpdType', group.device.type).toLowerCase()} of {group.device.ratingAmps} A
            serves {group.motors.join(', ')} (430.53({group.path})); the value above is this motor's own, for reference
          </span>
        ) : null}
        {perWindingText(s) ? (
          <span className="block text-ink-soft" data-testid="scpd-per-winding">
            {perWindingText(s)}
          </span>
        ) : null}
      </>,
      s.scpd.perWinding ? `${s.scpd.basis}; per half-winding: ${s.scpd.perWinding.basis}` : s.scpd.basis,
    ],
    [
      'Conductors',
      <>
        {s.conductor.size} {s.conductor.material === 'cu' ? 'Cu' : 'Al'} {s.conductor.tempRatingC} °C ({s.conductor.ampacity} A ≥{' '}
        {s.conductor.minAmpacity} A){mark('conductor.size')}
        {termination60Text(s) ? (
          <span className="block text-state-review" data-testid="termination-60c">
            ◔ {termination60Text(s)}: the engineer decides which holds
          </span>
        ) : null}
        {motorLeadText(s) ? (
          <span className="block text-ink-soft" data-testid="motor-leads">
            {motorLeadText(s)}
          </span>
        ) : null}
        {voltageDropText(s) ? (
          <span className="block text-ink-soft" data-testid="voltage-drop">
            {voltageDropText(s)}
          </span>
        ) : null}
      </>,
      [
        s.conductor.motorLeads ? `line side: ${s.conductor.basis}; ${s.conductor.motorLeads.basis}` : s.conductor.basis,
        s.conductor.termination60C ? `at 60 °C terminations: ${s.conductor.termination60C.basis}` : null,
        s.conductor.voltageDrop ? `voltage drop: ${s.conductor.voltageDrop.basis}` : null,
      ]
        .filter(Boolean)
        .join('; '),
    ],
    ['Disconnect', `≥ ${s.disconnect.minAmps} A${s.disconnect.minHp ? `, ≥ ${s.disconnect.minHp} hp` : ''}`, s.disconnect.basis],
    [
      'Relays',
      <>
        {relayLabel(s)}
        {mark('relays.phaseLoss')}
        {mark('relays.phaseReversal')}
      </>,
      'common practice',
    ],
    [
      'Enclosure',
      <>
        NEMA Type {s.enclosure.nemaType} <span className="text-ink-soft">(≈ {s.enclosure.ipCode}, one-way comparison)</span>
        {mark('enclosure.nemaType')}
        {s.enclosure.flagForEngineer ? ' ⚑ engineer to confirm' : ''}
      </>,
      'NEMA 250',
    ],
  ];
  if (s.unbalance) rows.push(['Voltage unbalance', unbalanceText(s.unbalance), s.unbalance.basis]);
  if (s.vfd)
    rows.push([
      'Drive',
      `≥ ${s.vfd.minOutputAmps} A ${decisionValueLabel('vfd.duty', s.vfd.duty)?.toLowerCase()}${s.vfd.inverterDutyMotor ? ' · inverter-duty motor' : ''}${s.vfd.outputFilter !== 'none' ? ` · ${decisionValueLabel('vfd.outputFilter', s.vfd.outputFilter)}` : ''}`,
      s.vfd.basis,
    ]);
  if (s.softStarter)
    rows.push([
      'Soft starter',
      `≥ ${s.softStarter.minAmps} A${s.softStarter.insideDelta ? ' inside delta' : ''}${s.softStarter.bypass ? ' · bypass contactor' : ''}`,
      'common practice',
    ]);
  if (s.dc)
    rows.push([
      'DC',
      `${answerValueLabel('dcField', s.dc.field)} field${s.dc.fieldLossProtection ? ' · field-loss protection' : ''}${s.dc.dynamicBraking ? ' · dynamic braking' : ''}`,
      'common practice',
    ]);
  return (
    <div className="space-y-3">
      {s.errors.length ? (
        <div role="alert" className="rounded border border-state-returned/40 bg-bad-bg px-3 py-2 text-sm text-state-returned">
          {s.errors.map((e) => (
            <p key={e}>✖ {e}</p>
          ))}
        </div>
      ) : null}
      <table className="dense w-full text-sm">
        <tbody>
          {rows.map(([k, v, basis]) => (
            <tr key={k} className="border-b border-line/60 align-top">
              <th scope="row" className="w-36 py-1.5 pr-2 text-left text-xs font-semibold uppercase text-ink-soft">
                {k}
              </th>
              <td className="py-1.5">
                <div className="font-semibold">{v}</div>
                <div className="text-xs text-ink-soft">{basis}</div>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {s.assumed.length ? (
        <div className="rounded border border-state-review/40 bg-warn-bg px-3 py-2 text-xs">
          <p className="font-semibold">◔ Assumed inputs ({s.assumed.length})</p>
          <ul className="mt-1 list-disc pl-4">
            {s.assumed.map((a) => (
              <li key={a.field}>
                <strong>{fieldLabel(a.field) ?? a.field}</strong> = {answerValueLabel(a.field, a.assumed)}: {a.note}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {s.cautions.length ? (
        <ul className="space-y-1 text-xs">
          {s.cautions.map((c) => (
            <li key={c} className="rounded bg-warn-bg px-2 py-1">
              ⚠ {c}
            </li>
          ))}
        </ul>
      ) : null}
      <details className="text-xs">
        <summary className="cursor-pointer font-semibold text-ink-soft">Reasoning ({s.trace.length} steps)</summary>
        <ol className="mt-1 space-y-1">
          {s.trace.map((t, i) => (
            <li key={`${t.ruleId}-${i}`} className="border-l-2 border-copper-100 pl-2">
              <span className="font-semibold">{t.words ?? t.decision}</span> — {t.reason}{' '}
              <span className="text-ink-soft" title={`rule ${t.ruleId}`}>
                [{t.basis}]
              </span>
            </li>
          ))}
        </ol>
      </details>
    </div>
  );
}
