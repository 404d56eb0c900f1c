// The control power transformer of the panel checks (NEC 430.72(C), 450.3(B)).
import type { PanelChecks as Checks } from '../../../../shared/schemas/checks';
import type { ProtectionChoice } from '../../../../shared/calc/control-power';
import { Verdict } from '../../../components/ui/status';
import { Basis, Figures, Notes, Section, fmt, td, th } from './section-parts';

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

export function ControlPowerSection({ cp }: { cp: Checks['controlPower'] }) {
  const r = cp.result;
  if (!r) {
    return (
      <Section title="Control power transformer" id="checks-cpt">
        <p className="text-sm">⚠ {cp.reason}</p>
      </Section>
    );
  }
  return (
    <Section
      title="Control power transformer"
      id="checks-cpt"
      aside={<Verdict ok={r.inrushOk} okText={`${r.sizeVa} VA carries the inrush`} badText={`${r.sizeVa} VA does not carry the inrush`} />}
    >
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
              {cp.fitted.adequate === null ? null : cp.fitted.adequate ? (
                <strong className="text-state-signed">✔ large enough</strong>
              ) : (
                <strong className="text-state-returned">✖ smaller than {r.sizeVa} VA</strong>
              )}
            </p>
          ) : null}
        </div>
      </div>
      <Notes notes={[cp.basis, ...r.notes]} />
      <Basis>{r.basis.join('; ')}</Basis>
    </Section>
  );
}
