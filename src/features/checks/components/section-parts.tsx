// The pieces every section of the panel checks is made of: the section frame, basis, notes, figures and number format.
import type { ReactNode } from 'react';

export const fmt = (x: number | null | undefined, d = 1): string =>
  x === null || x === undefined || !Number.isFinite(x)
    ? '—'
    : (Math.round(x * 10 ** d) / 10 ** d).toLocaleString('en-US', { maximumFractionDigits: d });

export const th = 'px-2 py-1.5 font-semibold';
export const td = 'px-2 py-1.5 align-top';

export function Section({ title, id, children, aside }: { title: string; id: string; children: ReactNode; aside?: ReactNode }) {
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

export function Basis({ children }: { children: ReactNode }) {
  return <p className="mt-2 text-xs text-ink-soft">Basis: {children}</p>;
}

export function Notes({ notes }: { notes: string[] }) {
  if (notes.length === 0) return null;
  return (
    <ul className="mt-2 list-disc space-y-0.5 pl-5 text-xs text-ink-soft">
      {notes.map((n) => (
        <li key={n}>{n}</li>
      ))}
    </ul>
  );
}

export function Figures({ rows }: { rows: Array<[string, ReactNode]> }) {
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
