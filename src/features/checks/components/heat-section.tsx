// The heat load of the panel checks (IEC TR 60890 simplified), with the heat by bucket.
import type { PanelChecks as Checks } from '../../../../shared/schemas/checks';
import { Verdict } from '../../../components/ui/status';
import { Basis, Figures, Notes, Section, fmt } from './section-parts';

function HeatChart({ byBucket }: { byBucket: Array<{ bucketTag: string; watts: number }> }) {
  const rows = [...byBucket].sort((a, b) => b.watts - a.watts);
  const max = Math.max(1, ...rows.map((r) => r.watts));
  const labelW = 80;
  const barW = 300;
  const rowH = 22;
  const height = rows.length * rowH + 8;
  const width = labelW + barW + 70;
  return (
    <svg
      role="img"
      aria-label={`Heat by bucket: ${rows.map((r) => `${r.bucketTag} ${fmt(r.watts)} W`).join(', ')}`}
      viewBox={`0 0 ${width} ${height}`}
      width={width}
      height={height}
      className="max-w-full"
    >
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

export function HeatSection({ heat }: { heat: Checks['heat'] }) {
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
      aside={
        <Verdict
          ok={!r.exceeded}
          okText={`Inside ${fmt(r.internalTempC)} °C ≤ limit ${r.internalLimitC} °C`}
          badText={`Inside ${fmt(r.internalTempC)} °C exceeds the ${r.internalLimitC} °C limit`}
        />
      }
    >
      <div className="grid gap-6 md:grid-cols-2">
        <div>
          <p className="mb-2 text-sm text-ink-soft">
            {e.code} · {fmt(e.heightMm, 0)} × {fmt(e.widthMm, 0)} × {fmt(e.depthMm, 0)} mm (H × W × D)
            {e.sections > 1 ? `, ${e.sections} sections` : ''} · {e.mounting.replace(/-/g, ' ')}
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
                  Filter fan ≥ {fmt(r.cooling.fan.cfm)} cfm ({fmt(r.cooling.fan.m3h)} m³/h), or an air conditioner ≥{' '}
                  {fmt(r.cooling.airConditionerW)} W.
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
