import type { PanelDetail } from '../../../../../shared/schemas/panel';
import { OVERRIDE_FIELDS } from '../../../../../shared/schemas/override';

/** Every override on the panel's motors, with who made it and why, for the sign-off. */
export function OverrideList({ loads }: { loads: PanelDetail['loads'] }) {
  const overrides = loads.flatMap((l) => l.overrides.map((o) => ({ tag: l.tag, ...o })));
  return (
    <div aria-label="Overrides" role="group">
      <p className="text-xs font-semibold uppercase text-ink-soft">Overrides</p>
      {overrides.length === 0 ? (
        <p className="text-ink-soft">None: every decision is the engine's.</p>
      ) : (
        <ul className="space-y-1">
          {overrides.map((o) => (
            <li key={`${o.tag}-${o.field}`}>
              <strong>{o.tag}</strong> · {OVERRIDE_FIELDS[o.field]}: {String(o.was ?? '—')} → <strong>{String(o.value)}</strong>
              <span className="block text-xs text-ink-soft">
                “{o.justification}” ({o.by})
                {o.warnings.length ? <span className="text-state-review"> ◔ {o.warnings.join('; ')}</span> : null}
              </span>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
