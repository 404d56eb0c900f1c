import type { ReactNode } from 'react';
import { ApiError } from '../../lib/api-client';

export function Loading({ what = 'Loading' }: { what?: string }) {
  return (
    <div role="status" className="flex items-center gap-2 p-6 text-sm text-ink-soft">
      <span className="inline-block h-3 w-3 animate-spin rounded-full border-2 border-copper-500 border-t-transparent" aria-hidden />
      {what}…
    </div>
  );
}

export function Empty({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded border border-dashed border-line bg-panel p-8 text-center">
      <p className="font-semibold">{title}</p>
      {children ? <div className="mt-2 text-sm text-ink-soft">{children}</div> : null}
    </div>
  );
}

export function ErrorNote({ error }: { error: unknown }) {
  const message = error instanceof ApiError ? error.message : error instanceof Error ? error.message : 'Something went wrong';
  return (
    <div role="alert" className="rounded border border-state-returned/40 bg-bad-bg px-3 py-2 text-sm text-state-returned">
      ✖ {message}
    </div>
  );
}

/** The standing caution wherever results are shown. */
export function Caution({ compact = false }: { compact?: boolean }) {
  return (
    <aside className="rounded border border-state-review/40 bg-warn-bg px-3 py-2 text-xs text-ink" aria-label="Caution">
      <strong className="mr-1">⚠ Caution.</strong>
      Results support, not replace, a qualified person's design; a qualified person verifies them. Local codes, the authority having
      jurisdiction, and the listing and instructions of the equipment take precedence.
      {compact ? null : ' De-energise and lock out before work. Check motor rotation before coupling the load.'}
    </aside>
  );
}

export function PageHeader({ title, subtitle, actions }: { title: ReactNode; subtitle?: ReactNode; actions?: ReactNode }) {
  return (
    <div className="mb-4 flex flex-wrap items-end justify-between gap-3 border-b border-line pb-3">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
        {subtitle ? <p className="text-sm text-ink-soft">{subtitle}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </div>
  );
}
