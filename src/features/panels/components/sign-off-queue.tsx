import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import type { CurrentUser } from '../../../../shared/schemas/auth';
import type { PanelState, QueuePanel } from '../../../../shared/schemas/panel';
import { panelQueries } from '../api/panels';
import { SignOffState } from '../../../components/ui/status';

interface List {
  state: PanelState;
  title: string;
  empty: string;
  /** the panel section the person acting on it opens */
  section: string;
}

const LISTS: Record<'in_review' | 'returned' | 'signed_off', List> = {
  in_review: { state: 'in_review', title: 'Waiting for sign-off', empty: 'Nothing waits for an engineer.', section: 'protection' },
  returned: { state: 'returned', title: 'Returned to the panel builder', empty: 'No panel is returned.', section: 'sign-off' },
  signed_off: { state: 'signed_off', title: 'Signed off, last 14 days', empty: 'No panel signed off lately.', section: 'sign-off' },
};

/** The lists in the order that puts the person's own work first. */
function order(me: CurrentUser | null | undefined): Array<List & { mine: boolean }> {
  const roles = me?.roles ?? [];
  const first = roles.includes('engineer')
    ? 'in_review'
    : roles.includes('designer') || roles.includes('admin')
      ? 'returned'
      : roles.includes('estimator')
        ? 'signed_off'
        : null;
  const keys = (['in_review', 'returned', 'signed_off'] as const).slice().sort((a, b) => Number(b === first) - Number(a === first));
  return keys.map((k) => ({ ...LISTS[k], mine: k === first }));
}

const SHOWN = 6;

/** Panels that wait on someone, across the shop's jobs: the engineer's, the panel builder's and the estimator's next work. */
export function SignOffQueue({ me }: { me: CurrentUser | null | undefined }) {
  const queue = useQuery(panelQueries.queue());
  if (!queue.data) return null;
  return (
    <section aria-label="Sign-off queue" className="mb-4 grid gap-3 md:grid-cols-3">
      {order(me).map((list) => {
        const items = queue.data.filter((p) => p.status === list.state);
        // oldest wait first, except signed off: newest first
        const shown = (list.state === 'signed_off' ? [...items].reverse() : items).slice(0, SHOWN);
        return (
          <div
            key={list.state}
            role="group"
            aria-label={list.title}
            className={`rounded border bg-panel p-3 ${list.mine && items.length ? 'border-copper-500/60' : 'border-line'}`}
          >
            <h2 className="mb-1 flex items-baseline gap-2 text-xs font-semibold uppercase tracking-wide text-ink-soft">
              {list.title} <span className="text-ink">({items.length})</span>
              {list.mine ? <span className="ml-auto normal-case tracking-normal text-copper-700">your next work</span> : null}
            </h2>
            {items.length === 0 ? (
              <p className="text-sm text-ink-soft">{list.empty}</p>
            ) : (
              <ul className="space-y-1.5">
                {shown.map((p) => (
                  <QueueItem key={p.panelId} p={p} section={list.section} />
                ))}
              </ul>
            )}
            {items.length > SHOWN ? <p className="mt-1 text-xs text-ink-soft">and {items.length - SHOWN} more</p> : null}
          </div>
        );
      })}
    </section>
  );
}

function QueueItem({ p, section }: { p: QueuePanel; section: string }) {
  return (
    <li className="text-sm">
      <div className="flex flex-wrap items-baseline gap-x-2">
        <Link to={`/jobs/${p.jobId}/panels/${p.panelId}/${section}`} className="font-semibold text-copper-700 hover:underline">
          {p.jobNumber} · {p.panelName}
        </Link>
        <SignOffState state={p.status} />
        {p.status === 'signed_off' && p.revisionNumber !== null ? <span className="text-xs font-semibold">R{p.revisionNumber}</span> : null}
      </div>
      <p className="text-xs text-ink-soft">
        {p.motorCount} motor{p.motorCount === 1 ? '' : 's'} · {p.status === 'in_review' ? 'submitted' : 'since'}{' '}
        {new Date(p.since).toLocaleDateString()}
        {p.note ? (
          <span className="block truncate" title={p.note.body}>
            “{p.note.body}”{p.note.author ? ` — ${p.note.author}` : ''}
          </span>
        ) : null}
      </p>
    </li>
  );
}
