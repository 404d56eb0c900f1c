// One motor's bucket on the drawings page: its one-line (from the feeder bus, or through the panel's other
// source for a motor at another voltage) and its connection card.
import type { PanelChecks } from '../../../../shared/schemas/checks';
import type { LoadView } from '../../../../shared/schemas/panel';
import type { SharedDrive } from '../../../../shared/schemas/selection';
import type { GroupCircuit } from '../../../../shared/schemas/group-circuit';
import { OneLine, type MotorFeed } from './one-line';
import { ConnectionCardDrawing } from './connection-card';

const ROTATION = 'Check rotation before coupling the load.';

export function Bucket({
  load,
  card,
  feed,
  drive = null,
  group = null,
}: {
  load: LoadView;
  card: PanelChecks['connectionCards'][number] | undefined;
  feed: MotorFeed;
  /** the shared drive that feeds the motor, if any */
  drive?: SharedDrive | null;
  /** the group whose device serves the motor (430.53); null: its own branch device */
  group?: GroupCircuit | null;
}) {
  const s = load.effective ?? load.selection;
  const answers = load.answers as { description?: string; hp?: number; kw?: number; volts?: number; supply?: string };
  const rating = [
    answers.hp !== undefined ? `${answers.hp} hp` : answers.kw !== undefined ? `${answers.kw} kW` : null,
    answers.volts !== undefined ? `${answers.volts} V` : null,
    answers.supply === 'dc' ? 'DC' : answers.supply === 'ac1' ? '1φ' : '3φ',
  ]
    .filter(Boolean)
    .join(' · ');
  return (
    <article aria-labelledby={`bucket-${load.id}`} className="rounded border border-line bg-panel p-4">
      <header className="mb-3 flex flex-wrap items-baseline gap-x-3 border-b border-line pb-2">
        <h2 id={`bucket-${load.id}`} className="text-lg font-semibold">
          {load.tag}
        </h2>
        <span className="text-sm text-ink-soft">{answers.description ?? ''}</span>
        <span className="ml-auto font-dense text-sm text-ink-soft">{rating}</span>
      </header>
      <div className="grid gap-6 lg:grid-cols-2">
        <div>
          <h3 className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">One-line</h3>
          {s && s.errors.length === 0 ? (
            <OneLine selection={s} feed={feed} drive={drive} group={group} />
          ) : (
            <p className="text-sm text-state-returned">
              ✖ No one-line until the motor’s selection is fixed{s ? `: ${s.errors.join('; ')}` : ''}.
            </p>
          )}
        </div>
        <div>
          <h3 className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">Motor lead connection</h3>
          {card?.card ? (
            <>
              <div className="max-w-full overflow-x-auto">
                <ConnectionCardDrawing card={card.card} width={600} />
              </div>
              <dl className="mt-2 space-y-1 text-sm">
                <div>
                  <dt className="inline font-semibold">To reverse: </dt>
                  <dd className="inline">{card.card.reverse}</dd>
                </div>
              </dl>
              {card.assumptions.length > 0 ? (
                <ul className="mt-1 space-y-0.5 text-xs text-state-review">
                  {card.assumptions.map((a) => (
                    <li key={a}>⚠ {a}</li>
                  ))}
                </ul>
              ) : null}
              {card.card.notes.length > 0 ? (
                <p className="mt-1 text-xs text-ink-soft">
                  {card.card.notes.join(' ')} ({card.card.basis})
                </p>
              ) : null}
            </>
          ) : (
            <p className="text-sm">⚠ {card?.reason ?? 'No connection card for this motor.'}</p>
          )}
          <p className="mt-2 rounded border border-state-review/40 bg-warn-bg px-2 py-1 text-sm font-semibold" role="note">
            ⚠ {ROTATION}
          </p>
        </div>
      </div>
    </article>
  );
}
