// The panel nameplate and feeder of the panel checks (NEC 409.110, 409.21), printable on its own.
import type { PanelChecks as Checks } from '../../../../shared/schemas/checks';
import { Button } from '../../../components/ui/button';
import { Section, fmt, td, th } from './section-parts';

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

export function NameplateSection({ np }: { np: Checks['nameplate'] }) {
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
        <div
          className="pw-nameplate w-[22rem] self-start rounded border-2 border-ink bg-white p-3 font-dense text-ink"
          role="group"
          aria-label="Nameplate label preview"
        >
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
