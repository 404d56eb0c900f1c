import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { checkQueries } from '../api/checks';
import type { PanelChecks as Checks } from '../../../../shared/schemas/checks';
import { Caution, ErrorNote, Loading } from '../../../components/ui/feedback';
import { Verdict } from '../../../components/ui/status';
import { Button } from '../../../components/ui/button';
import { ControlConductorsSection } from './control-conductors';
import type { SccrRow, SccrWayOut } from '../../../../shared/calc/sccr';
import type { ProtectionChoice } from '../../../../shared/calc/control-power';
import { formatMoney } from '../../../../shared/format/money';

const fmt = (x: number | null | undefined, d = 1): string =>
  x === null || x === undefined || !Number.isFinite(x) ? '—' : (Math.round(x * 10 ** d) / 10 ** d).toLocaleString('en-US', { maximumFractionDigits: d });


const SOURCE_WORDS: Record<SccrRow['source'], string> = {
  marked: 'Marked',
  assumed: 'Assumed (unmarked)',
  combination: 'Tested combination',
  'current-limiting': 'Raised by current-limiting feeder',
  none: 'No rating',
};

const th = 'px-2 py-1.5 font-semibold';
const td = 'px-2 py-1.5 align-top';

function Section({ title, id, children, aside }: { title: string; id: string; children: ReactNode; aside?: ReactNode }) {
  return (
    <section aria-labelledby={id} className="rounded border border-line bg-panel p-4">
      <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={id} className="text-lg font-semibold">
          {title}
        </h2>
        {aside}
      </div>
      {children}
    </section>
  );
}

function Basis({ children }: { children: ReactNode }) {
  return <p className="mt-2 text-xs text-ink-soft">Basis: {children}</p>;
}

function Notes({ notes }: { notes: string[] }) {
  if (notes.length === 0) return null;
  return (
    <ul className="mt-2 list-disc space-y-0.5 pl-5 text-xs text-ink-soft">
      {notes.map((n) => (
        <li key={n}>{n}</li>
      ))}
    </ul>
  );
}

// ------------------------------------------------------------------------------------------------ SCCR

function SccrVerdict({ sccr }: { sccr: Checks['sccr'] }) {
  switch (sccr.verdict) {
    case 'adequate':
      return <Verdict ok okText={`Panel SCCR ${fmt(sccr.panelSccrKa)} kA ≥ available ${fmt(sccr.availableFaultKa)} kA`} badText="" />;
    case 'below-available':
      return <Verdict ok={false} okText="" badText={`Panel SCCR ${fmt(sccr.panelSccrKa)} kA is below the available ${fmt(sccr.availableFaultKa)} kA`} />;
    case 'no-available-fault-current':
      return <span className="text-sm font-semibold text-state-review">⚠ Panel SCCR {fmt(sccr.panelSccrKa)} kA; the job has no available fault current to compare</span>;
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
          Panel then {fmt(w.resultingSccrKa)} kA · {w.resolves ? <strong className="text-state-signed">✔ resolves</strong> : <strong className="text-state-review">⚠ not enough on its own</strong>}
        </span>
      ) : null}
      <span className="w-28 text-right font-dense text-sm tabular-nums whitespace-nowrap" title="Cost difference at catalogue prices">
        {w.costDifference === null ? '' : formatMoney(w.costDifference, { signed: true })}
      </span>
    </li>
  );
}

function SccrSection({ sccr }: { sccr: Checks['sccr'] }) {
  const costed = sccr.waysOut.filter((w) => w.kind !== 'advice');
  const advice = sccr.waysOut.filter((w) => w.kind === 'advice');
  return (
    <Section title="Short-circuit current rating worksheet" id="checks-sccr" aside={<SccrVerdict sccr={sccr} />}>
      <p className="mb-2 text-sm text-ink-soft">
        Every power-circuit component with its rating and where the rating comes from. The panel is rated at its weakest component
        {sccr.limiting.length > 0 ? (
          <>
            : <strong className="text-ink">{[...new Set(sccr.limiting.map((r) => `${r.location} ${r.code}`))].join(', ')}</strong> at {fmt(sccr.panelSccrKa)} kA
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
                  {r.unraisedKa !== undefined ? <span className="block text-xs font-normal text-ink-soft">was {fmt(r.unraisedKa)}</span> : null}
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
          {costed.length > 0 ? <ul className="mt-1">{costed.map((w, i) => <WayOut key={i} w={w} />)}</ul> : <p className="text-sm text-ink-soft">No drop-in part in the catalogue raises a weak component to the available fault current.</p>}
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

// ------------------------------------------------------------------------------------------------ Heat

function HeatChart({ byBucket }: { byBucket: Array<{ bucketTag: string; watts: number }> }) {
  const rows = [...byBucket].sort((a, b) => b.watts - a.watts);
  const max = Math.max(1, ...rows.map((r) => r.watts));
  const labelW = 80;
  const barW = 300;
  const rowH = 22;
  const height = rows.length * rowH + 8;
  const width = labelW + barW + 70;
  return (
    <svg role="img" aria-label={`Heat by bucket: ${rows.map((r) => `${r.bucketTag} ${fmt(r.watts)} W`).join(', ')}`} viewBox={`0 0 ${width} ${height}`} width={width} height={height} className="max-w-full">
      {rows.map((r, i) => {
        const y = i * rowH + 4;
        const w = Math.max(1, (r.watts / max) * barW);
        return (
          <g key={r.bucketTag}>
            <text x={labelW - 6} y={y + 14} textAnchor="end" fontSize={12} fill="#1f2731" fontFamily="'Barlow Semi Condensed', sans-serif">
              {r.bucketTag}
            </text>
            <rect x={labelW} y={y + 2} width={w} height={rowH - 6} fill="#c4814a" rx={2} />
            <text x={labelW + w + 6} y={y + 14} fontSize={12} fill="#55606c" fontFamily="'Barlow Semi Condensed', sans-serif">
              {fmt(r.watts)} W
            </text>
          </g>
        );
      })}
    </svg>
  );
}

function Figures({ rows }: { rows: Array<[string, ReactNode]> }) {
  return (
    <dl className="grid grid-cols-[auto_auto] gap-x-4 gap-y-1 text-sm">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-soft">{k}</dt>
          <dd className="text-right font-dense tabular-nums">{v}</dd>
        </div>
      ))}
    </dl>
  );
}

function HeatSection({ heat }: { heat: Checks['heat'] }) {
  const r = heat.result;
  if (!r || !heat.enclosure) {
    return (
      <Section title="Heat load" id="checks-heat">
        <p className="text-sm">⚠ {heat.reason}</p>
      </Section>
    );
  }
  const e = heat.enclosure;
  return (
    <Section
      title="Heat load"
      id="checks-heat"
      aside={<Verdict ok={!r.exceeded} okText={`Inside ${fmt(r.internalTempC)} °C ≤ limit ${r.internalLimitC} °C`} badText={`Inside ${fmt(r.internalTempC)} °C exceeds the ${r.internalLimitC} °C limit`} />}
    >
      <div className="grid gap-6 md:grid-cols-2">
        <div>
          <p className="mb-2 text-sm text-ink-soft">
            {e.code} · {fmt(e.heightMm, 0)} × {fmt(e.widthMm, 0)} × {fmt(e.depthMm, 0)} mm (H × W × D){e.sections > 1 ? `, ${e.sections} sections` : ''} · {e.mounting.replace(/-/g, ' ')}
          </p>
          <Figures
            rows={[
              ['Component losses P', `${fmt(r.totalLossW)} W`],
              ['Effective cooling surface Ae', `${fmt(r.aeM2, 2)} m²`],
              ['Heat transfer k', `${r.k} W/(m²·K)`],
              ['Temperature rise ΔT = P / (k · Ae)', `${fmt(r.deltaTK)} K`],
              ['Ambient', `${fmt(r.ambientC)} °C`],
              ['Inside (ambient + ΔT)', `${fmt(r.internalTempC)} °C`],
              ['Components’ limit', `${r.internalLimitC} °C`],
              ['Surface can shed at the limit', `${fmt(r.surfaceDissipationW)} W`],
            ]}
          />
          {r.cooling ? (
            <div className="mt-3 rounded border border-state-review/40 bg-warn-bg p-2 text-sm">
              <strong>⚠ Cooling needed:</strong> remove {fmt(r.cooling.excessW)} W.{' '}
              {r.cooling.fan ? (
                <>
                  Filter fan ≥ {fmt(r.cooling.fan.cfm)} cfm ({fmt(r.cooling.fan.m3h)} m³/h), or an air conditioner ≥ {fmt(r.cooling.airConditionerW)} W.
                </>
              ) : (
                <>Air conditioner ≥ {fmt(r.cooling.airConditionerW)} W.</>
              )}
              <span className="block text-xs text-ink-soft">{r.cooling.basis}</span>
            </div>
          ) : null}
        </div>
        <div>
          <h3 className="mb-1 text-sm font-semibold">Heat by bucket</h3>
          <HeatChart byBucket={r.byBucket} />
        </div>
      </div>
      <Notes notes={r.notes} />
      <Basis>{r.basis}</Basis>
    </Section>
  );
}

// ------------------------------------------------------------------------------------------------ Control power

function ProtectionRow({ side, p }: { side: string; p: ProtectionChoice }) {
  return (
    <tr className="border-b border-line">
      <td className={td}>{side}</td>
      <td className={`${td} text-right`}>{fmt(p.currentA, 3)}</td>
      <td className={`${td} text-right`}>{p.maxPercent}</td>
      <td className={`${td} text-right`}>{fmt(p.maxAmps, 2)}</td>
      <td className={`${td} text-right font-semibold`}>{fmt(p.ratingAmps, 2)}</td>
      <td className={`${td} text-xs text-ink-soft`}>{p.basis}</td>
    </tr>
  );
}

function ControlPowerSection({ cp }: { cp: Checks['controlPower'] }) {
  const r = cp.result;
  if (!r) {
    return (
      <Section title="Control power transformer" id="checks-cpt">
        <p className="text-sm">⚠ {cp.reason}</p>
      </Section>
    );
  }
  return (
    <Section title="Control power transformer" id="checks-cpt" aside={<Verdict ok={r.inrushOk} okText={`${r.sizeVa} VA carries the inrush`} badText={`${r.sizeVa} VA does not carry the inrush`} />}>
      <div className="grid gap-6 md:grid-cols-[auto_1fr]">
        <Figures
          rows={[
            ['Sealed VA (coils, lights, relays)', `${fmt(r.sealedVa)} VA`],
            ['Inrush VA (largest coil)', `${fmt(r.inrushVa)} VA`],
            ['√(sealed² + inrush²)', `${fmt(r.selectionVa)} VA`],
            ['Next standard size ≥ sealed', `${r.continuousSizeVa} VA`],
            ['Size that passes both', `${r.sizeVa} VA`],
            ['Inrush it carries', `${fmt(r.inrushCapacityVa)} VA`],
          ]}
        />
        <div>
          <table className="dense w-full text-sm" aria-label="Transformer protection">
            <thead className="border-b border-line bg-surface text-left text-xs tracking-wide text-ink-soft uppercase">
              <tr>
                <th className={th}>Side</th>
                <th className={`${th} text-right`}>Rated current (A)</th>
                <th className={`${th} text-right`}>Max (%)</th>
                <th className={`${th} text-right`}>Max (A)</th>
                <th className={`${th} text-right`}>Fuse (A)</th>
                <th className={th}>Basis</th>
              </tr>
            </thead>
            <tbody>
              <ProtectionRow side="Primary" p={r.primary} />
              <ProtectionRow side="Secondary" p={r.secondary} />
            </tbody>
          </table>
          {cp.fitted ? (
            <p className="mt-2 text-sm">
              In the bill of materials: {cp.fitted.code} ({cp.fitted.va === null ? 'size unknown' : `${cp.fitted.va} VA`}){' '}
              {cp.fitted.adequate === null ? null : cp.fitted.adequate ? <strong className="text-state-signed">✔ large enough</strong> : <strong className="text-state-returned">✖ smaller than {r.sizeVa} VA</strong>}
            </p>
          ) : null}
        </div>
      </div>
      <Notes notes={[cp.basis, ...r.notes]} />
      <Basis>{r.basis.join('; ')}</Basis>
    </Section>
  );
}

// ------------------------------------------------------------------------------------------------ Nameplate

const PRINT_CSS = `@media print {
  body[data-print="nameplate"] * { visibility: hidden !important; }
  body[data-print="nameplate"] .pw-nameplate, body[data-print="nameplate"] .pw-nameplate * { visibility: visible !important; }
  body[data-print="nameplate"] .pw-nameplate { position: absolute; left: 0; top: 0; }
}`;

function printNameplate() {
  document.body.dataset.print = 'nameplate';
  const done = () => {
    delete document.body.dataset.print;
    window.removeEventListener('afterprint', done);
  };
  window.addEventListener('afterprint', done);
  window.print();
}

function NameplateSection({ np }: { np: Checks['nameplate'] }) {
  const r = np.result;
  if (!r) {
    return (
      <Section title="Nameplate, feeder and main" id="checks-nameplate">
        <p className="text-sm">⚠ {np.reason}</p>
      </Section>
    );
  }
  return (
    <Section
      title="Nameplate, feeder and main"
      id="checks-nameplate"
      aside={
        <Button variant="secondary" onClick={printNameplate}>
          Print nameplate label
        </Button>
      }
    >
      <style>{PRINT_CSS}</style>
      <div className="grid gap-6 md:grid-cols-[auto_1fr]">
        <div className="pw-nameplate w-[22rem] self-start rounded border-2 border-ink bg-white p-3 font-dense text-ink" role="group" aria-label="Nameplate label preview">
          <p className="border-b border-ink pb-1 text-center text-sm font-bold tracking-widest">{r.label[0]}</p>
          <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
            {r.lines.map((l) => (
              <div key={l.label} className="contents">
                <dt className="font-semibold">{l.label}</dt>
                <dd>{l.value}</dd>
              </div>
            ))}
          </dl>
        </div>
        <div className="text-sm">
          <table className="dense w-full" aria-label="Feeder and main">
            <tbody>
              <tr className="border-b border-line">
                <th className={`${th} text-left`}>Feeder conductors</th>
                <td className={td}>
                  {r.feeder.conductor.size} (≥ {fmt(r.feeder.conductor.minAmpacity)} A)
                </td>
                <td className={`${td} text-xs text-ink-soft`}>{r.feeder.conductor.basis}</td>
              </tr>
              <tr className="border-b border-line">
                <th className={`${th} text-left`}>Supply protective device</th>
                <td className={td}>≤ {fmt(r.feeder.supplyProtection.maxAmps, 0)} A</td>
                <td className={`${td} text-xs text-ink-soft`}>{r.feeder.supplyProtection.basis}</td>
              </tr>
              <tr className="border-b border-line">
                <th className={`${th} text-left`}>Main disconnect</th>
                <td className={td}>
                  {r.feeder.mainDisconnect.sizeAmps} A (≥ {fmt(r.feeder.mainDisconnect.minAmps)} A)
                </td>
                <td className={`${td} text-xs text-ink-soft`}>{r.feeder.mainDisconnect.basis}</td>
              </tr>
            </tbody>
          </table>
          <ul className="mt-2 space-y-0.5 text-xs text-ink-soft">
            {r.lines.map((l) => (
              <li key={l.label}>
                {l.label}: {l.basis}
              </li>
            ))}
          </ul>
          {r.warnings.length > 0 ? (
            <ul className="mt-2 space-y-0.5 text-sm text-state-review">
              {r.warnings.map((w) => (
                <li key={w}>⚠ {w}</li>
              ))}
            </ul>
          ) : null}
        </div>
      </div>
    </Section>
  );
}

// ------------------------------------------------------------------------------------------------ other sources

function OtherSourcesSection({ os }: { os: Checks['otherSources'] }) {
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
                  <td className="px-2 py-1"><strong>{s.tag}</strong> {s.kind === 'transformer' ? `transformer ${s.primaryVolts}-${s.secondaryLabel}` : `DC supply, ${s.secondaryLabel}`}</td>
                  <td className="px-2 py-1">{s.motors.map((m) => m.tag).join(', ')}</td>
                  <td className="px-2 py-1 text-right">{s.kind === 'transformer' ? `${s.kva} kVA (load ${s.loadKva} kVA)` : `≥ ${s.secondaryAmps} A (${s.loadKva} kW)`}</td>
                  <td className="px-2 py-1 text-right">{s.primaryAmps}</td>
                  <td className="px-2 py-1" title={s.primaryProtection.basis}>{s.primaryProtection.ratingAmps} A ({s.primaryProtection.percent} % limit {s.primaryProtection.maxAmps} A)</td>
                  <td className="px-2 py-1" title={s.secondaryProtection?.basis}>{s.secondaryProtection ? `${s.secondaryProtection.ratingAmps} A (${s.secondaryProtection.percent} % limit ${s.secondaryProtection.maxAmps} A)` : '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <Notes notes={os.sources.flatMap((s) => [s.primaryProtection.basis, ...(s.secondaryProtection ? [s.secondaryProtection.basis] : []), ...s.notes.map((n) => `${s.tag}: ${n}`)])} />
        </div>
      ) : null}
      {os.externalMotors.length > 0 ? (
        <ul className="mt-2 space-y-1 text-sm" aria-label="Motors fed from outside the panel">
          {os.externalMotors.map((m) => (
            <li key={m.tag}>
              ◔ <strong>{m.tag}</strong> ({m.volts} V {m.supply === 'dc' ? 'DC' : m.supply === 'ac1' ? 'single-phase' : 'three-phase'}) needs {m.needs}: fed from a source outside the panel, left out of the feeder and the panel's full-load current.
            </li>
          ))}
        </ul>
      ) : null}
      <Basis>the sources' kVA counts the motors as NEC 2023 430.24 does (largest at 125 %); their protection per NEC 2023 Table 450.3(B); their primary current is in the feeder (430.24, 430.62(A), 430.63) and the nameplate full-load current (409.110).</Basis>
    </Section>
  );
}

// ------------------------------------------------------------------------------------------------

/** The engineer's panel checks: SCCR worksheet, heat load, control power transformer, nameplate and feeder. */
export function PanelChecks({ panelId }: { panelId: number }) {
  const q = useQuery(checkQueries.panel(panelId));
  if (q.isPending) return <Loading what="Working out the panel checks" />;
  if (q.isError) return <ErrorNote error={q.error} />;
  const c = q.data;
  return (
    <div className="space-y-4">
      {c.bom.note || c.motorsWithErrors.length > 0 || c.bom.unmatchedLines > 0 ? (
        <div className="rounded border border-state-review/40 bg-warn-bg px-3 py-2 text-sm">
          {c.bom.note ? <p>⚠ {c.bom.note}</p> : null}
          {c.bom.unmatchedLines > 0 ? <p>⚠ {c.bom.unmatchedLines} bill-of-materials line{c.bom.unmatchedLines > 1 ? 's have' : ' has'} no catalogue part: ratings and losses of those lines are assumed or missing.</p> : null}
          {c.motorsWithErrors.length > 0 ? <p>✖ Left out until fixed: {c.motorsWithErrors.join(', ')}</p> : null}
        </div>
      ) : null}
      <SccrSection sccr={c.sccr} />
      <HeatSection heat={c.heat} />
      <ControlPowerSection cp={c.controlPower} />
      <OtherSourcesSection os={c.otherSources} />
      {c.controlConductors ? <ControlConductorsSection cc={c.controlConductors} /> : null}
      <NameplateSection np={c.nameplate} />
      <Caution />
    </div>
  );
}
