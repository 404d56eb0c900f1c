// A strip across the top of every page while the server says its database is unreachable: the
// queries that failed for that reason are asked again by themselves, and the strip goes once one
// answers. Writes are never repeated by themselves; their form shows the server's message.
import { useSyncExternalStore } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { DATABASE_UNREACHABLE, isDatabaseUnavailable } from '../../lib/api-client';

export function DatabaseStatus() {
  const qc = useQueryClient();
  const cache = qc.getQueryCache();
  const unreachable = useSyncExternalStore(
    (notify) => cache.subscribe(notify),
    () =>
      cache
        .getAll()
        .some(
          (q) => isDatabaseUnavailable(q.state.fetchFailureReason) || (q.state.status === 'error' && isDatabaseUnavailable(q.state.error)),
        ),
  );
  if (!unreachable) return null;
  return (
    <div
      role="status"
      aria-live="polite"
      className="sticky top-0 z-40 border-b border-state-review/40 bg-warn-bg px-4 py-2 text-center text-sm text-ink"
    >
      <strong>⚠ {DATABASE_UNREACHABLE}</strong> Nothing is lost: what you see is what was last saved. Changes cannot be saved until it is
      back.
    </div>
  );
}
